/**
 * Reads a supplier list off the main thread: the bytes arrive transferred, the raw table
 * and the suggested setup (header row, mapping, decimal separator) go back. A refused
 * file comes back as its message. The main thread may terminate this worker at any time
 * (cancel, time limit); it holds nothing else.
 */
import { ImportRefusal, prepareImport, readTable } from '../../io/import/index.ts';
import type { WorkerReply, WorkerRequest } from '../services/import-client.ts';

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<WorkerRequest>) => void) | null;
  postMessage(message: WorkerReply): void;
};

scope.onmessage = (event) => {
  const { id, bytes, fileName } = event.data;
  void (async () => {
    try {
      const table = await readTable(new Uint8Array(bytes), fileName);
      scope.postMessage({ id, ok: true, table, setup: prepareImport(table) });
    } catch (e) {
      const message =
        e instanceof ImportRefusal
          ? e.message
          : `"${fileName}" could not be read (${e instanceof Error ? e.message : String(e)}); an .xlsx workbook, or a .csv or .tsv text file is accepted`;
      scope.postMessage({ id, ok: false, message });
    }
  })();
};
