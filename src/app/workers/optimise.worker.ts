/**
 * The fleet optimiser off the main thread: evaluates the project, then finds the cheapest
 * compliant fleet, the best-buy-first fleet and the exact trade-off frontier with HiGHS (WebAssembly,
 * loaded once from the bundled asset and kept for later runs). Results are plain data.
 * A `warm` request only loads the solver, so the first run does not wait for it; a run
 * sends `{ id, progress }` messages between solves, and `{ id, part }` messages: the fleets
 * once they are known, then each frontier point as the sweep finds it.
 */
import wasmUrl from 'highs/runtime?url';
import type { LpSolver } from '../../ledger/optimise/solver.ts';
import { loadHighsSolver } from '../../ledger/optimise/load-highs.ts';
import { optimiseFleet } from '../../ledger/optimise/optimise.ts';
import { evaluateProject } from '../../ledger/prediction/evaluate.ts';
import type { OptimisePart, OptimiseReply, OptimiseRequest } from '../services/optimise-client.ts';
import type { WorkerPart, WorkerProgress } from '../services/worker-calls.ts';

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<OptimiseRequest>) => void) | null;
  postMessage(message: OptimiseReply | WorkerProgress | WorkerPart<OptimisePart>): void;
};

let solver: Promise<LpSolver> | undefined;
let loaded: LpSolver | undefined;

/** Share of a run given to loading the solver when it is not loaded yet, and to evaluating the project. */
const SHARE_LOAD = 0.15;
const SHARE_EVALUATE = 0.05;

scope.onmessage = (event) => {
  const request = event.data;
  const { id } = request;
  const tell = (step: string, fraction: number) => scope.postMessage({ id, progress: { step, fraction } });
  void (async () => {
    try {
      const loadShare = loaded ? 0 : SHARE_LOAD;
      if (!loaded) tell('Loading the solver', 0);
      solver ??= loadHighsSolver({ locateFile: () => wasmUrl });
      loaded = await solver;
      if (request.kind === 'warm') {
        scope.postMessage({ id, ok: true });
        return;
      }
      tell('Predicting every level', loadShare);
      const evaluation = evaluateProject(request.project);
      const start = loadShare + SHARE_EVALUATE;
      const result = optimiseFleet(
        request.project,
        evaluation,
        {
          ...request.options,
          exactFrontier: true,
          onProgress: (p) => tell(p.step, start + (1 - start) * p.fraction),
          onFleetFound: (result) => scope.postMessage({ id, part: { kind: 'fleet', result } }),
          onFrontierPoint: (point, index) => scope.postMessage({ id, part: { kind: 'point', point, index } }),
        },
        loaded,
      );
      scope.postMessage({ id, ok: true, result });
    } catch (e) {
      if (solver && !loaded) solver = undefined;
      scope.postMessage({ id, ok: false, message: e instanceof Error ? e.message : String(e) });
    }
  })();
};
