/**
 * Exhaustive enumeration of every fleet, for cross-checking the solver on small projects.
 *
 * Written apart from the solver model on purpose: it reads the project and the evaluation
 * directly, sums each phase's contributions with dbSum and compares levels with limits in
 * dB, so an error in the 0–1 model or its LP text shows up as a disagreement.
 * O(Π_d n_d · D·R): only for a few duties (refuses more than a million fleets).
 */
import type { Fleet, Project } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import { dbSum } from '../../core/decibel.ts';
import { own } from '../model/own.ts';
import { phasePeriods } from '../prediction/phase-periods.ts';
import { limitOf } from '../model/limits.ts';

export interface EnumeratedFleet {
  fleet: Fleet;
  cost: number;
  /** Least limit − level over every phase × receiver with a limit, dB (Infinity without any). */
  worstMarginDb: number;
}

const MAX_FLEETS = 1_000_000;

/** Every fleet the optimiser may choose (pins, exclusions, computable data), with cost and worst margin. */
export function enumerateFleets(project: Project, evaluation: Evaluation): EnumeratedFleet[] {
  // Per phase: each period its hours fall in, with the receivers that have a limit for it.
  const periodsOf = (phaseId: string) => {
    const phase = project.phases.find((p) => p.id === phaseId);
    if (!phase) return [];
    return phasePeriods(project, phase).periods.map((t) => ({
      ...t,
      receivers: project.receivers.filter((r) => limitOf(r, t.periodId) !== undefined),
    }));
  };
  const assessed = (phaseId: string) => periodsOf(phaseId).flatMap((t) => t.receivers);
  const choices = project.duties.map((duty) => {
    const offered = project.candidates.filter((c) => c.dutyId === duty.id && !c.excluded);
    const pinned = offered.filter((c) => c.pinned);
    return (pinned.length > 0 ? pinned : offered)
      .filter((c) => Number.isFinite(own(evaluation.costs, c.id)?.total))
      .filter((c) =>
        assessed(duty.phaseId).every(
          (r) =>
            Number.isFinite(evaluation.contributionDb(c.id, r.id)) ||
            evaluation.contributionDb(c.id, r.id) === -Infinity,
        ),
      )
      .map((c) => c.id);
  });
  const total = choices.reduce((n, c) => n * c.length, 1);
  if (total > MAX_FLEETS) throw new Error(`enumeration of ${total} fleets refused (at most ${MAX_FLEETS})`);
  const out: EnumeratedFleet[] = [];
  const index = choices.map(() => 0);
  if (choices.some((c) => c.length === 0)) return out;
  for (;;) {
    const fleet: Fleet = {};
    let cost = 0;
    project.duties.forEach((d, i) => {
      const id = (choices[i] as string[])[index[i] as number] as string;
      fleet[d.id] = id;
      cost += own(evaluation.costs, id)?.total as number;
    });
    let worstMarginDb = Infinity;
    for (const phase of project.phases) {
      const duties = project.duties.filter((d) => d.phaseId === phase.id);
      if (duties.length === 0) continue;
      for (const t of periodsOf(phase.id)) {
        for (const r of t.receivers) {
          const level =
            dbSum(duties.map((d) => evaluation.contributionDb(own(fleet, d.id) as string, r.id))) + t.shiftDb;
          worstMarginDb = Math.min(worstMarginDb, (limitOf(r, t.periodId) as number) - level);
        }
      }
    }
    out.push({ fleet, cost, worstMarginDb });
    let i = 0;
    while (i < index.length) {
      index[i] = (index[i] as number) + 1;
      if ((index[i] as number) < (choices[i] as string[]).length) break;
      index[i] = 0;
      i++;
    }
    if (i === index.length) return out;
  }
}

export interface EnumeratedBest {
  /** A fleet meets every limit within the budget. */
  feasible: boolean;
  cost: number;
  worstMarginDb: number;
}

/**
 * The enumeration's answer: least cost among fleets meeting every limit (margin ≥ 0) within
 * the budget; when none, the largest worst margin (within `toleranceDb`), then the least cost.
 * Undefined when no fleet fits the budget at all.
 */
export function bestByEnumeration(
  fleets: readonly EnumeratedFleet[],
  budget?: number,
  toleranceDb = 1e-6,
): EnumeratedBest | undefined {
  const affordable = fleets.filter((f) => budget === undefined || f.cost <= budget + 1e-9);
  if (affordable.length === 0) return undefined;
  const compliant = affordable.filter((f) => f.worstMarginDb >= 0);
  if (compliant.length > 0) {
    const cost = Math.min(...compliant.map((f) => f.cost));
    return {
      feasible: true,
      cost,
      worstMarginDb: Math.max(...compliant.filter((f) => f.cost === cost).map((f) => f.worstMarginDb)),
    };
  }
  const bestMargin = Math.max(...affordable.map((f) => f.worstMarginDb));
  const near = affordable.filter((f) => f.worstMarginDb >= bestMargin - toleranceDb);
  return { feasible: false, cost: Math.min(...near.map((f) => f.cost)), worstMarginDb: bestMargin };
}
