/**
 * The fleet optimiser off the main thread: evaluates the project, then finds the cheapest
 * compliant fleet, the hand method's fleet and the trade-off curve with HiGHS (WebAssembly,
 * loaded once from the bundled asset and kept for later runs). Results are plain data.
 */
import wasmUrl from 'highs/runtime?url';
import type { LpSolver } from '../../ledger/optimise/solver.ts';
import { loadHighsSolver } from '../../ledger/optimise/load-highs.ts';
import { optimiseFleet } from '../../ledger/optimise/optimise.ts';
import { evaluateProject } from '../../ledger/prediction/evaluate.ts';
import type { OptimiseReply, OptimiseRequest } from '../services/optimise-client.ts';

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<OptimiseRequest>) => void) | null;
  postMessage(message: OptimiseReply): void;
};

let solver: Promise<LpSolver> | undefined;

scope.onmessage = (event) => {
  const { id, project, options } = event.data;
  void (async () => {
    try {
      solver ??= loadHighsSolver({ locateFile: () => wasmUrl });
      const loaded = await solver;
      const evaluation = evaluateProject(project);
      scope.postMessage({ id, ok: true, result: optimiseFleet(project, evaluation, options, loaded) });
    } catch (e) {
      if (solver && !(e instanceof Error && e.name === 'InputError')) solver = undefined;
      scope.postMessage({ id, ok: false, message: e instanceof Error ? e.message : String(e) });
    }
  })();
};
