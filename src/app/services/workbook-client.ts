/**
 * Writing the workbook off the main thread (src/app/workers/workbook.worker.ts; exceljs is
 * loaded there, never in the page). The worker is started on first use and kept; each
 * export reports its progress sheet by sheet and can be cancelled (the worker is stopped,
 * the next export starts a fresh one). An export longer than WORKBOOK_TIME_LIMIT_MS is stopped.
 */
import type { Project } from '../../ledger/model/model.ts';
import type { OptimiseResult } from '../../ledger/model/results.ts';
import { WorkerCalls, type Progress } from './worker-calls.ts';

/** Message to the worker: the project (its assessed fleet is written) and the optimiser's result when current. */
export interface WorkbookRequest {
  id: number;
  project: Project;
  optimise?: OptimiseResult;
}

/** Message from the worker: the file's bytes, or why there are none. */
export type WorkbookReply = { id: number; ok: true; bytes: ArrayBuffer } | { id: number; ok: false; message: string };

/** Longest an export may take before the worker is stopped, ms. */
export const WORKBOOK_TIME_LIMIT_MS = 300_000;

const calls = new WorkerCalls<Omit<WorkbookRequest, 'id'>, WorkbookReply>({
  start: () =>
    new Worker(new URL('../workers/workbook.worker.ts', import.meta.url), { type: 'module', name: 'workbook-writer' }),
  timeLimitMs: WORKBOOK_TIME_LIMIT_MS,
  timeLimitMessage: `Writing the workbook took longer than ${WORKBOOK_TIME_LIMIT_MS / 1000} s and was stopped; try again when the computer is less busy.`,
  failedMessage: (detail) => `Writing the workbook stopped (${detail || 'the worker failed'}); try again.`,
});

/** The workbook of the project's assessed fleet, as bytes. */
export async function workbookInWorker(
  project: Project,
  optimise: OptimiseResult | undefined,
  signal?: AbortSignal,
  onProgress?: (progress: Progress) => void,
): Promise<Uint8Array> {
  const reply = await calls.call(
    { project, ...(optimise ? { optimise } : {}) },
    signal ? { signal, message: 'The workbook export was cancelled.' } : undefined,
    onProgress,
  );
  return new Uint8Array(reply.bytes);
}
