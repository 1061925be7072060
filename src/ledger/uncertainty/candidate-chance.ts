/**
 * Which machine of a duty most raises the chance that every limit is met, per unit of cost.
 *
 * For each candidate of the duty, the assessed fleet with that candidate in the duty's place
 * is simulated with the same seed (common random numbers: every fleet meets the same draws,
 * so the differences between candidates carry less sampling noise than the figures
 * themselves). Gain = P(all limits met) with the candidate − P with the fleet's own choice;
 * gain per 1,000 of extra cost where the candidate costs more.
 * Cost: O(candidates × draws × terms).
 */
import type { Fleet, Project } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import { own } from '../model/own.ts';
import { buildSpreadModel } from './spread-model.ts';
import { simulateCompliance } from './monte-carlo.ts';
import { uncertaintySettingsOf } from './settings.ts';

export interface CandidateChance {
  candidateId: string;
  label: string;
  /** P(every limit met at once) with this candidate in the duty. */
  probability: number;
  standardError: number;
  /** Draws simulated. */
  draws: number;
  /** probability − the fleet's own probability. */
  gain: number;
  /** Cost − the fleet's own choice's cost. */
  extraCost: number;
  /** gain (in percentage points) per 1,000 of extra cost; undefined when the candidate costs no more. */
  pointsPer1000?: number;
  /** The fleet's own choice for the duty. */
  current: boolean;
}

/**
 * The chance of full compliance with each candidate of a duty, best first (highest
 * probability, then cheapest). Draws default to a fifth of the project's (at least 1,000).
 */
export function candidateChances(
  project: Project,
  evaluation: Evaluation,
  fleet: Fleet,
  dutyId: string,
  options: { draws?: number; seed?: number } = {},
): CandidateChance[] {
  const settings = uncertaintySettingsOf(project);
  const draws = options.draws ?? Math.max(1000, Math.round(settings.draws / 5));
  const seed = options.seed ?? settings.seed;
  const duty = project.duties.find((d) => d.id === dutyId);
  if (!duty) return [];
  const currentId = own(fleet, dutyId) ?? duty.baselineCandidateId;
  const costOf = (id: string) => own(evaluation.costs, id)?.total ?? NaN;
  const run = (candidateId: string) =>
    simulateCompliance(buildSpreadModel(project, evaluation, { ...fleet, [dutyId]: candidateId }), {
      draws,
      seed,
      probabilitiesOnly: true,
    }).joint;
  const base = run(currentId);
  const rows = project.candidates
    .filter((c) => c.dutyId === dutyId)
    .map((c): CandidateChance => {
      const j = c.id === currentId ? base : run(c.id);
      const extraCost = costOf(c.id) - costOf(currentId);
      const gain = j.probability - base.probability;
      const row: CandidateChance = {
        candidateId: c.id,
        label: c.label,
        probability: j.probability,
        standardError: j.standardError,
        draws,
        gain,
        extraCost,
        current: c.id === currentId,
      };
      if (extraCost > 0 && Number.isFinite(gain)) row.pointsPer1000 = (100 * gain) / (extraCost / 1000);
      return row;
    });
  return rows.sort((a, b) =>
    Number.isNaN(a.probability)
      ? 1
      : Number.isNaN(b.probability)
        ? -1
        : b.probability - a.probability || a.extraCost - b.extraCost,
  );
}
