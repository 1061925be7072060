/**
 * The fleet choice as a pure 0–1 model, independent of any solver.
 *
 * One binary x[d][k] per duty d and usable candidate k, with Σ_k x[d][k] = 1.
 * For every phase p, every assessment period t its working hours fall in
 * (../phase-periods.ts) and every receiver r with a limit for t, the phase total must stay
 * at or under the limit. Contributions of incoherent sources add
 * energetically (L = 10·lg Σ 10^(Li/10), common practice; ISO 1996-1), so the total energy
 * is linear in x:
 *
 *   Σ_{d in p} Σ_k x[d][k] · 10^((L[k,r] + s[p,t])/10)  ≤  10^(limit[r,t]/10),
 *
 * where L is the contribution in the phase's own period and s[p,t] the shift of the level
 * from the own period to period t (10·lg of the hours share in t less that in the own
 * period; 0 for the own period).
 *
 * Each cell's row is divided by its limit energy, so a coefficient is the candidate's
 * energy ratio to the limit, ρ = 10^((L − limit)/10), and the right-hand side is 1.
 * This keeps coefficients near 1 whatever the absolute levels are.
 * The objective is Σ cost[k]·x[d][k]; pinned candidates are the only option of their duty,
 * excluded ones are left out; an optional budget adds Σ cost·x ≤ B.
 *
 * Building the model is O(C·R) for C candidates and R receivers.
 */
import type { Fleet, Project } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import { ratioFromDb } from '../../core/decibel.ts';
import { InputError } from '../../core/input-error.ts';
import { nonNegative } from '../../core/check.ts';
import { own } from '../model/own.ts';
import { phasePeriods } from '../prediction/phase-periods.ts';
import { limitOf } from '../model/limits.ts';

/** One usable candidate of a duty. */
export interface ProblemOption {
  candidateId: string;
  label: string;
  /** Total cost for the duty, project currency. */
  cost: number;
}

export interface ProblemDuty {
  id: string;
  name: string;
  phaseId: string;
  /** Usable candidates, in project order; a pinned candidate is the only option. */
  options: ProblemOption[];
  /** The project's baseline candidate id (it may be missing from `options`). */
  baselineCandidateId: string;
}

/** One candidate's share of a cell: duty index, option index and energy ratio to the limit. */
export interface CellTerm {
  duty: number;
  option: number;
  /** ρ = 10^((L − limit)/10), dimensionless. */
  ratio: number;
}

/** One phase × period × receiver with a limit: the constraint Σ ρ·x ≤ 1. */
export interface ProblemCell {
  phaseId: string;
  phaseName: string;
  /** The assessment period the limit is for. */
  periodId: string;
  periodName: string;
  /** True for the phase's own period. */
  ownPeriod: boolean;
  receiverId: string;
  receiverName: string;
  limitDb: number;
  /** Added to a contribution (given in the phase's own period) to give its level in this period, dB. */
  shiftDb: number;
  terms: CellTerm[];
  /** For a tender clause's limit: the clause's name ("Clause 7.3"), and each candidate's level there (the receiver may be a boundary point). */
  clause?: string;
  contributionDb?: (candidateId: string) => number;
}

/** A least share of the fleet (a tender's share clause): Σ weight·x over counted options ≥ least. */
export interface ProblemShare {
  /** The clause's id and name, e.g. "Clause 7.5". */
  clauseId: string;
  clause: string;
  terms: { duty: number; option: number; weight: number }[];
  /** The least weight the chosen counted options must reach. */
  least: number;
}

/** A candidate the optimiser leaves out, and why. */
export interface NotConsidered {
  candidateId: string;
  dutyId: string;
  reason: string;
}

export interface FleetProblem {
  duties: ProblemDuty[];
  cells: ProblemCell[];
  /** Candidates left out because their cost or a level they need is not computable. */
  notConsidered: NotConsidered[];
  /** Upper bound on the fleet cost, when given. */
  budget?: number;
  /** Share rows of tender clauses (./clause-constraints.ts). */
  shares?: ProblemShare[];
}

/** A choice: for each duty (in problem order) the index of its chosen option. */
export type Choice = number[];

/**
 * Builds the 0–1 model of the fleet choice from a project and its evaluation.
 * Throws an {@link InputError} when a duty has no usable candidate, two pinned ones, or a
 * pinned candidate that is excluded or not computable.
 * O(C·R).
 * @example buildFleetProblem(demoProject(), evaluateProject(demoProject())).cells.length // phases × receivers with a limit
 */
export function buildFleetProblem(project: Project, evaluation: Evaluation, budget?: number): FleetProblem {
  if (budget !== undefined) nonNegative('budget', budget, `an amount in ${project.currency} of 0 or more`);
  const phaseById = new Map(project.phases.map((p) => [p.id, p]));

  // Per phase, each period its hours fall in and the receivers with a finite limit for it.
  type Assessed = {
    periodId: string;
    periodName: string;
    own: boolean;
    shiftDb: number;
    receivers: { id: string; name: string; limitDb: number }[];
  };
  const assessed = new Map<string, Assessed[]>();
  for (const phase of project.phases) {
    const list: Assessed[] = [];
    for (const period of phasePeriods(project, phase).periods) {
      const receivers: Assessed['receivers'] = [];
      for (const r of project.receivers) {
        const limit = limitOf(r, period.periodId);
        if (limit !== undefined) receivers.push({ id: r.id, name: r.name, limitDb: limit });
      }
      const periodName = project.periods.find((p) => p.id === period.periodId)?.name ?? period.periodId;
      list.push({ periodId: period.periodId, periodName, own: period.own, shiftDb: period.shiftDb, receivers });
    }
    assessed.set(phase.id, list);
  }

  const notConsidered: NotConsidered[] = [];
  const duties: ProblemDuty[] = project.duties.map((duty) => {
    const receivers = (assessed.get(duty.phaseId) ?? []).flatMap((a) => a.receivers);
    const offered = project.candidates.filter((c) => c.dutyId === duty.id);
    const pinned = offered.filter((c) => c.pinned);
    if (pinned.length > 1) {
      throw new InputError(
        `duty "${duty.name}"`,
        pinned.map((c) => c.label),
        'has more than one pinned candidate',
        'pin at most one candidate per duty',
      );
    }
    const options: ProblemOption[] = [];
    for (const c of offered) {
      if (c.excluded) {
        if (c.pinned) {
          throw new InputError(
            `candidate "${c.label}" of duty "${duty.name}"`,
            'pinned and excluded',
            'is both pinned and excluded',
            'pin it or exclude it, not both',
          );
        }
        continue;
      }
      const reason = unusableReason(c.id, evaluation, receivers);
      if (reason !== undefined) {
        if (c.pinned)
          throw new InputError(
            `pinned candidate "${c.label}" of duty "${duty.name}"`,
            c.id,
            `cannot be used: ${reason}`,
            'correct its data or unpin it',
          );
        notConsidered.push({ candidateId: c.id, dutyId: duty.id, reason });
        continue;
      }
      if (pinned.length === 1 && !c.pinned) continue;
      options.push({ candidateId: c.id, label: c.label, cost: own(evaluation.costs, c.id)?.total as number });
    }
    if (options.length === 0) {
      throw new InputError(
        `duty "${duty.name}"`,
        offered.map((c) => c.label),
        'has no candidate the optimiser can choose',
        'offer at least one candidate that is not excluded and whose cost and levels are computable',
      );
    }
    return {
      id: duty.id,
      name: duty.name,
      phaseId: duty.phaseId,
      options,
      baselineCandidateId: duty.baselineCandidateId,
    };
  });

  const cells: ProblemCell[] = [];
  for (const phase of project.phases) {
    const dutyIndexes = duties.flatMap((d, i) => (d.phaseId === phase.id ? [i] : []));
    if (dutyIndexes.length === 0) continue;
    for (const a of assessed.get(phase.id) ?? []) {
      for (const r of a.receivers) {
        const terms: CellTerm[] = [];
        for (const di of dutyIndexes) {
          const duty = duties[di] as ProblemDuty;
          duty.options.forEach((o, k) => {
            const ratio = ratioFromDb(evaluation.contributionDb(o.candidateId, r.id) + a.shiftDb - r.limitDb);
            if (ratio > 0) terms.push({ duty: di, option: k, ratio });
          });
        }
        cells.push({
          phaseId: phase.id,
          phaseName: phaseById.get(phase.id)?.name ?? phase.id,
          periodId: a.periodId,
          periodName: a.periodName,
          ownPeriod: a.own,
          receiverId: r.id,
          receiverName: r.name,
          limitDb: r.limitDb,
          shiftDb: a.shiftDb,
          terms,
        });
      }
    }
  }
  return budget === undefined ? { duties, cells, notConsidered } : { duties, cells, notConsidered, budget };
}

/** Why a candidate cannot be chosen (cost or a needed level not computable), or undefined. */
function unusableReason(
  candidateId: string,
  evaluation: Evaluation,
  receivers: readonly { id: string; name: string }[],
): string | undefined {
  const cost = own(evaluation.costs, candidateId)?.total;
  if (typeof cost !== 'number' || !Number.isFinite(cost)) return 'its cost is not computable';
  for (const r of receivers) {
    const level = evaluation.contributionDb(candidateId, r.id);
    if (Number.isNaN(level) || level === Infinity) return `its level at ${r.name} is not computable`;
  }
  return undefined;
}

/** The fleet (duty id → candidate id) of a choice. O(D). */
export function fleetOfChoice(problem: FleetProblem, choice: Choice): Fleet {
  const fleet: Fleet = {};
  problem.duties.forEach((d, i) => {
    fleet[d.id] = (d.options[choice[i] as number] as ProblemOption).candidateId;
  });
  return fleet;
}

/** The cost of a choice. O(D). */
export function costOfChoice(problem: FleetProblem, choice: Choice): number {
  let total = 0;
  problem.duties.forEach((d, i) => {
    total += (d.options[choice[i] as number] as ProblemOption).cost;
  });
  return total;
}

/**
 * Energy ratio to the limit of every cell for a choice: Σ ρ over the chosen options.
 * A cell is met when its ratio is at most 1. O(number of terms).
 */
export function cellRatios(problem: FleetProblem, choice: Choice): number[] {
  return problem.cells.map((cell) => {
    let sum = 0;
    for (const t of cell.terms) if (choice[t.duty] === t.option) sum += t.ratio;
    return sum;
  });
}

/** True when a choice reaches every share row of the model (none: true). O(terms). */
export function sharesMet(problem: FleetProblem, choice: Choice): boolean {
  return (problem.shares ?? []).every((share) => {
    let sum = 0;
    for (const t of share.terms) if (choice[t.duty] === t.option) sum += t.weight;
    return sum >= share.least * (1 - 1e-12) - 1e-9;
  });
}
