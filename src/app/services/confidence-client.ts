/**
 * Running the probability of compliance and the confidence optimiser off the main thread.
 * One module worker (src/app/workers/confidence.worker.ts) is started on first use and kept
 * (HiGHS is loaded in it only when the confidence optimiser first runs); each answer comes
 * back by its id. A run longer than CONFIDENCE_TIME_LIMIT_MS stops the worker.
 */
import type { Fleet, Project } from '../../ledger/model/model.ts';
import type { ComplianceConfidence } from '../../ledger/uncertainty/confidence.ts';
import type { ConfidenceFleetResult } from '../../ledger/optimise/confidence-fleet.ts';
import type { ConfidenceCurve } from '../../ledger/optimise/confidence-curve.ts';
import type { CandidateChance } from '../../ledger/uncertainty/candidate-chance.ts';
import { WorkerCalls } from './worker-calls.ts';

/** The figures of one fleet, as plain data (the model's spreads included). */
export type ConfidenceFigures = ComplianceConfidence;

/** A request without its id. */
export type ConfidenceAsk =
  | { kind: 'figures'; project: Project; fleet: Fleet }
  | { kind: 'fleet'; project: Project; confidence: number; budget?: number }
  | { kind: 'chances'; project: Project; fleet: Fleet; dutyId: string }
  | { kind: 'costs'; project: Project; fleet: Fleet; fleetName: string };

export type ConfidenceRequest = ConfidenceAsk & { id: number };

export type ConfidenceReply =
  | { id: number; ok: true; kind: 'figures'; result: ConfidenceFigures }
  | { id: number; ok: true; kind: 'fleet'; result: ConfidenceFleetResult }
  | { id: number; ok: true; kind: 'chances'; result: CandidateChance[] }
  | { id: number; ok: true; kind: 'costs'; result: ConfidenceCurve }
  | { id: number; ok: false; message: string };

export const CONFIDENCE_TIME_LIMIT_MS = 180_000;

const calls = new WorkerCalls<ConfidenceAsk, ConfidenceReply>({
  start: () =>
    new Worker(new URL('../workers/confidence.worker.ts', import.meta.url), {
      type: 'module',
      name: 'compliance-confidence',
    }),
  timeLimitMs: CONFIDENCE_TIME_LIMIT_MS,
  timeLimitMessage: `The run took longer than ${CONFIDENCE_TIME_LIMIT_MS / 1000} s and was stopped; try fewer draws.`,
  failedMessage: (detail) => `The simulation stopped (${detail || 'the worker failed'}); try again.`,
});

function send(request: ConfidenceAsk): Promise<ConfidenceReply> {
  return calls.call(request);
}

/** The probability of compliance of a fleet (the project's draws and seed). */
export async function confidenceInWorker(project: Project, fleet: Fleet): Promise<ConfidenceFigures> {
  const reply = await send({ kind: 'figures', project, fleet });
  if (!reply.ok || reply.kind !== 'figures') throw new Error('unexpected reply from the worker');
  return reply.result;
}

/** The cheapest fleet at a confidence, verified by simulation. */
export async function confidenceFleetInWorker(
  project: Project,
  confidence: number,
  budget?: number,
): Promise<ConfidenceFleetResult> {
  const reply = await send({ kind: 'fleet', project, confidence, ...(budget === undefined ? {} : { budget }) });
  if (!reply.ok || reply.kind !== 'fleet') throw new Error('unexpected reply from the worker');
  return reply.result;
}

/** The chance of full compliance with each candidate of a duty in the fleet (same draws for each). */
export async function candidateChancesInWorker(
  project: Project,
  fleet: Fleet,
  dutyId: string,
): Promise<CandidateChance[]> {
  const reply = await send({ kind: 'chances', project, fleet, dutyId });
  if (!reply.ok || reply.kind !== 'chances') throw new Error('unexpected reply from the worker');
  return reply.result;
}

/** What more confidence costs: the cheapest fleet at 50, 80, 90, 95 and 99 %, with the deterministic optimum and the assessed fleet. */
export async function confidenceCostsInWorker(
  project: Project,
  fleet: Fleet,
  fleetName: string,
): Promise<ConfidenceCurve> {
  const reply = await send({ kind: 'costs', project, fleet, fleetName });
  if (!reply.ok || reply.kind !== 'costs') throw new Error('unexpected reply from the worker');
  return reply.result;
}
