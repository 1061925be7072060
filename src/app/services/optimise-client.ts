/**
 * Running the fleet optimiser off the main thread. One module worker
 * (src/app/workers/optimise.worker.ts) is started on first use and kept, so HiGHS is
 * loaded and compiled once; requests queue in it and each answer comes back by its id.
 * {@link warmOptimiser} starts the worker and loads HiGHS ahead of the first run. A run
 * reports its progress and can be cancelled (the worker is stopped; the next run or
 * warm-up starts a fresh one). A run that takes longer than OPTIMISE_TIME_LIMIT_MS stops
 * the worker, and so does a worker that fails.
 * A run traces the exact cost / worst-margin frontier: the worker sends the fleets as soon as they are
 * known, then each frontier point as it is found (cheapest first), so the chart fills in while the sweep
 * runs; stopping the worker keeps what was sent.
 */
import type { Project } from '../../ledger/model/model.ts';
import type { OptimiseOptions, OptimiseResult } from '../../ledger/model/results.ts';
import type { TradeOffPoint } from '../../ledger/optimise/trade-off.ts';
import { WorkerCalls, type Progress } from './worker-calls.ts';

/** Message to the worker: load the solver only, or run the optimiser. */
export type OptimiseRequest =
  { id: number; kind: 'warm' } | { id: number; kind: 'run'; project: Project; options: OptimiseOptions };

/** Message from the worker: the result (none for a warm-up), or why there is none. */
export type OptimiseReply =
  { id: number; ok: true; result?: OptimiseResult } | { id: number; ok: false; message: string };

/**
 * A piece of a run's answer known before the end: the result without its trade-off points (once, before the
 * sweep), then each frontier point in order of cost.
 */
export type OptimisePart =
  { kind: 'fleet'; result: OptimiseResult } | { kind: 'point'; point: TradeOffPoint; index: number };

/** Longest a run may take before the worker is stopped, ms. */
export const OPTIMISE_TIME_LIMIT_MS = 180_000;

type Ask = { kind: 'warm' } | { kind: 'run'; project: Project; options: OptimiseOptions };

const calls = new WorkerCalls<Ask, OptimiseReply, OptimisePart>({
  start: () =>
    new Worker(new URL('../workers/optimise.worker.ts', import.meta.url), { type: 'module', name: 'fleet-optimiser' }),
  timeLimitMs: OPTIMISE_TIME_LIMIT_MS,
  timeLimitMessage: `The optimiser took longer than ${OPTIMISE_TIME_LIMIT_MS / 1000} s and was stopped; try fewer candidates, or pin some choices.`,
  failedMessage: (detail) => `The optimiser stopped (${detail || 'the solver could not be loaded'}); try again.`,
});

let warming: Promise<unknown> | undefined;

/** Starts the worker and loads HiGHS in it, once; a failure is left for the first run to report. */
export function warmOptimiser(): void {
  warming ??= calls.call({ kind: 'warm' }).catch(() => (warming = undefined));
}

/**
 * Finds the cheapest compliant fleet, the best-buy-first fleet and the exact trade-off frontier in
 * the worker; `onPart` hears the fleets, then each frontier point, as they are found. Rejects with a
 * message in words when the project cannot be optimised (e.g. a duty with no usable candidate) or the
 * run is stopped or cancelled (what `onPart` heard stays true).
 */
export async function optimiseInWorker(
  project: Project,
  options: OptimiseOptions = {},
  signal?: AbortSignal,
  onProgress?: (progress: Progress) => void,
  onPart?: (part: OptimisePart) => void,
): Promise<OptimiseResult> {
  const reply = await calls.call(
    { kind: 'run', project, options },
    signal ? { signal, message: 'The optimiser run was cancelled.' } : undefined,
    onProgress,
    onPart,
  );
  // A cancelled run stops the worker; the next warm-up starts a fresh one.
  if (!reply.result) throw new Error('The optimiser answered without a fleet; try again.');
  return reply.result;
}

/** Forgets an earlier warm-up (after a cancel stopped the worker), so the next one loads the solver again. */
export function forgetWarmUp(): void {
  warming = undefined;
}
