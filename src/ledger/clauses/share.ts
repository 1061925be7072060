/**
 * The share of electric (or battery, or any named energy) plant in a fleet, by count of
 * units or by machine-hours on site.
 *
 * Weight of a duty: its units n (by count), or n × days × the phase's working hours a day
 * (by hours; an end before the start runs past midnight). The share is
 * Σ weight of duties whose chosen machine runs on a named energy / Σ weight of the duties
 * covered, in %. The weights do not depend on the machine chosen, so the share is linear
 * in the choice (the optimiser's constraint, ../optimise/clause-constraints.ts).
 */
import type { Candidate, Duty, Fleet, Project } from '../model/model.ts';
import type { Clause, Energy } from './clause.ts';
import { CLAUSE_DEFAULTS } from './clause.ts';
import { dutiesCovered } from './scope.ts';
import { workingSpanHours } from './working-hours.ts';
import { own } from '../model/own.ts';

/** One duty's part in a share. */
export interface ShareRow {
  dutyId: string;
  /** Units, or machine-hours. */
  weight: number;
  /** The chosen machine runs on a counted energy. */
  counted: boolean;
  candidateId: string;
}

export interface ShareOutcome {
  /** The share reached, %; NaN when nothing is covered or a weight is not computable. */
  sharePct: number;
  countedWeight: number;
  totalWeight: number;
  rows: ShareRow[];
}

/** The energies a share clause counts. */
export function countedEnergies(clause: Clause): readonly Energy[] {
  return clause.energies && clause.energies.length > 0 ? clause.energies : CLAUSE_DEFAULTS.energies;
}

/** A duty's weight under a share clause: units, or units × days × working hours a day. */
export function dutyWeight(project: Project, clause: Clause, duty: Duty): number {
  if ((clause.basis ?? CLAUSE_DEFAULTS.basis) === 'count') return duty.count;
  const phase = project.phases.find((p) => p.id === duty.phaseId);
  const hours = phase ? workingSpanHours(phase.start, phase.end) : NaN;
  return duty.count * duty.durationDays * hours;
}

/**
 * The share a fleet reaches under a share clause. O(duties).
 * @example shareOf(project, { kind: 'share', basis: 'count', … }, fleet).sharePct // 40
 */
export function shareOf(
  project: Project,
  clause: Clause,
  fleet: Fleet,
  byId: ReadonlyMap<string, Candidate>,
): ShareOutcome {
  const energies = countedEnergies(clause);
  const rows: ShareRow[] = dutiesCovered(project, clause).map((d) => {
    const candidateId = own(fleet, d.id) ?? d.baselineCandidateId;
    const energy = byId.get(candidateId)?.energy;
    return {
      dutyId: d.id,
      weight: dutyWeight(project, clause, d),
      counted: energy !== undefined && energies.includes(energy),
      candidateId,
    };
  });
  let counted = 0;
  let total = 0;
  for (const r of rows) {
    total += r.weight;
    if (r.counted) counted += r.weight;
  }
  return { sharePct: total > 0 ? (100 * counted) / total : NaN, countedWeight: counted, totalWeight: total, rows };
}

/** Allowance when comparing a share with its least value, percentage points (rounding of sums). */
export const SHARE_TOLERANCE_PCT = 1e-9;
