/**
 * Running the fleet optimiser off the main thread. One module worker
 * (src/app/workers/optimise.worker.ts) is started on first use and kept, so HiGHS is
 * loaded and compiled once; requests queue in it and each answer comes back by its id.
 * A run that takes longer than OPTIMISE_TIME_LIMIT_MS stops the worker (the next run
 * starts a fresh one), and so does a worker that fails.
 */
import type { Project } from '../../ledger/model/model.ts';
import type { OptimiseOptions, OptimiseResult } from '../../ledger/model/results.ts';
import { WorkerCalls } from './worker-calls.ts';

/** Message to the worker. */
export interface OptimiseRequest {
  id: number;
  project: Project;
  options: OptimiseOptions;
}

/** Message from the worker: the result, or why there is none. */
export type OptimiseReply =
  { id: number; ok: true; result: OptimiseResult } | { id: number; ok: false; message: string };

/** Longest a run may take before the worker is stopped, ms. */
export const OPTIMISE_TIME_LIMIT_MS = 180_000;

const calls = new WorkerCalls<Omit<OptimiseRequest, 'id'>, OptimiseReply>({
  start: () =>
    new Worker(new URL('../workers/optimise.worker.ts', import.meta.url), { type: 'module', name: 'fleet-optimiser' }),
  timeLimitMs: OPTIMISE_TIME_LIMIT_MS,
  timeLimitMessage: `The optimiser took longer than ${OPTIMISE_TIME_LIMIT_MS / 1000} s and was stopped; try fewer candidates, or pin some choices.`,
  failedMessage: (detail) => `The optimiser stopped (${detail || 'the solver could not be loaded'}); try again.`,
});

/**
 * Finds the cheapest compliant fleet, the hand method's fleet and the trade-off curve in
 * the worker. Rejects with a message in words when the project cannot be optimised
 * (e.g. a duty with no usable candidate) or the run is stopped.
 */
export async function optimiseInWorker(
  project: Project,
  options: OptimiseOptions = {},
  signal?: AbortSignal,
): Promise<OptimiseResult> {
  const reply = await calls.call(
    { project, options },
    signal ? { signal, message: 'The optimiser run was cancelled.' } : undefined,
  );
  return reply.result;
}
