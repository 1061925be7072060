/**
 * Running the fleet optimiser off the main thread. One module worker
 * (src/app/workers/optimise.worker.ts) is started on first use and kept, so HiGHS is
 * loaded and compiled once; requests queue in it and each answer comes back by its id.
 * A run that takes longer than OPTIMISE_TIME_LIMIT_MS stops the worker (the next run
 * starts a fresh one), and so does a worker that fails.
 */
import type { Project } from '../../ledger/model.ts';
import type { OptimiseOptions, OptimiseResult } from '../../ledger/results.ts';

/** Message to the worker. */
export interface OptimiseRequest {
  id: number;
  project: Project;
  options: OptimiseOptions;
}

/** Message from the worker: the result, or why there is none. */
export type OptimiseReply = { id: number; ok: true; result: OptimiseResult } | { id: number; ok: false; message: string };

/** Longest a run may take before the worker is stopped, ms. */
export const OPTIMISE_TIME_LIMIT_MS = 180_000;

interface Pending {
  resolve(result: OptimiseResult): void;
  reject(error: Error): void;
  timer: ReturnType<typeof setTimeout>;
}

let worker: Worker | undefined;
let nextId = 1;
const pending = new Map<number, Pending>();

/** Stops the worker and fails every run still waiting on it. */
function stop(message: string): void {
  worker?.terminate();
  worker = undefined;
  for (const [id, p] of pending) {
    clearTimeout(p.timer);
    pending.delete(id);
    p.reject(new Error(message));
  }
}

function start(): Worker {
  const w = new Worker(new URL('../workers/optimise.worker.ts', import.meta.url), { type: 'module', name: 'fleet-optimiser' });
  w.onmessage = (event: MessageEvent<OptimiseReply>) => {
    const reply = event.data;
    const p = pending.get(reply.id);
    if (!p) return;
    pending.delete(reply.id);
    clearTimeout(p.timer);
    if (reply.ok) p.resolve(reply.result);
    else p.reject(new Error(reply.message));
  };
  w.onerror = (event) => {
    event.preventDefault();
    stop(`The optimiser stopped (${event.message || 'the solver could not be loaded'}); try again.`);
  };
  return w;
}

/**
 * Finds the cheapest compliant fleet, the hand method's fleet and the trade-off curve in
 * the worker. Rejects with a message in words when the project cannot be optimised
 * (e.g. a duty with no usable candidate) or the run is stopped.
 */
export function optimiseInWorker(project: Project, options: OptimiseOptions = {}, signal?: AbortSignal): Promise<OptimiseResult> {
  worker ??= start();
  const w = worker;
  const id = nextId++;
  return new Promise<OptimiseResult>((resolve, reject) => {
    const timer = setTimeout(
      () => stop(`The optimiser took longer than ${OPTIMISE_TIME_LIMIT_MS / 1000} s and was stopped; try fewer candidates, or pin some choices.`),
      OPTIMISE_TIME_LIMIT_MS,
    );
    pending.set(id, { resolve, reject, timer });
    signal?.addEventListener('abort', () => pending.has(id) && stop('The optimiser run was cancelled.'), { once: true });
    w.postMessage({ id, project, options } satisfies OptimiseRequest);
  });
}
