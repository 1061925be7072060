/**
 * Writes the auditable workbook off the main thread: evaluates the project for its assessed
 * fleet (as the app does), builds every sheet with exceljs and compresses the file, sending
 * `{ id, progress }` after each sheet. The bytes go back transferred. The main thread may
 * terminate this worker at any time (cancel, time limit); it holds nothing else.
 */
import { exportWorkbook } from '../../io/workbook/index.ts';
import { assessedFleet } from '../../ledger/model/fleets.ts';
import { evaluateProject } from '../../ledger/prediction/evaluate.ts';
import type { WorkbookReply, WorkbookRequest } from '../services/workbook-client.ts';
import type { WorkerProgress } from '../services/worker-calls.ts';

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<WorkbookRequest>) => void) | null;
  postMessage(message: WorkbookReply | WorkerProgress, transfer?: Transferable[]): void;
};

scope.onmessage = (event) => {
  const { id, project, optimise } = event.data;
  const tell = (step: string, fraction: number) => scope.postMessage({ id, progress: { step, fraction } });
  void (async () => {
    try {
      tell('Predicting every level', 0);
      const assessed = assessedFleet(project);
      const evaluation = evaluateProject(project, assessed.fleet, { skipValidation: true });
      const bytes = await exportWorkbook(project, {
        evaluation,
        fleetName: assessed.name,
        ...(optimise ? { optimise } : {}),
        writer: 'memory',
        onProgress: (p) => tell(p.step, 0.05 + 0.95 * p.fraction),
      });
      const buffer = bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer;
      scope.postMessage({ id, ok: true, bytes: buffer }, [buffer]);
    } catch (e) {
      scope.postMessage({ id, ok: false, message: e instanceof Error ? e.message : String(e) });
    }
  })();
};
