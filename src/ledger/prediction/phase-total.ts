/**
 * Phase totals for any fleet from an evaluation's contributions, without re-evaluating:
 * L_phase(r) = 10·lg Σ_u 10^(L[fleet(u), r]/10) over the phase's duties u.
 */
import type { Fleet, Project } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import { dbSumOrNaN } from './safe.ts';
import { own } from '../model/own.ts';

/**
 * Phase total LAeq,T at a receiver for a fleet (duties the fleet leaves out use their
 * baseline), dB; −Infinity when the phase has no duties, NaN when a contribution is not
 * computable. O(duties of the phase).
 */
export function phaseTotalDb(
  project: Project,
  evaluation: Evaluation,
  phaseId: string,
  receiverId: string,
  fleet: Fleet = evaluation.fleet,
): number {
  const levels: number[] = [];
  for (const d of project.duties) {
    if (d.phaseId !== phaseId) continue;
    levels.push(evaluation.contributionDb(own(fleet, d.id) ?? d.baselineCandidateId, receiverId));
  }
  return dbSumOrNaN(levels);
}

/** The fleet of baselines: every duty's baseline candidate. */
export function baselineFleet(project: Project): Fleet {
  return Object.fromEntries(project.duties.map((d) => [d.id, d.baselineCandidateId]));
}
