/**
 * The hand method: how a fleet is usually improved without a solver, kept for comparison.
 *
 * Start from the baseline fleet (with pinned candidates put in and excluded or
 * non-computable baselines replaced by their duty's cheapest usable candidate). While some
 * phase total is over its limit, look at the worst cell (largest energy ratio to its limit)
 * and take the single substitution in that phase with the most dB of reduction at that cell
 * per 1,000 of extra cost (a substitution that costs nothing extra and helps comes first,
 * the larger reduction winning). A duty never goes back to a candidate it left; a step
 * that would break the budget is not taken. Stop when every limit is met or no
 * substitution lowers the worst cell.
 *
 * O(steps · C · T) for C candidates and T terms of the worst cell; steps ≤ C.
 */
import type { FleetProblem, Choice, ProblemDuty } from './problem.ts';
import { cellRatios, costOfChoice } from './problem.ts';
import { dbFromRatio } from '../../core/decibel.ts';
import { LIMIT_TOLERANCE_RATIO } from './outcome.ts';

export interface HandStep {
  dutyId: string;
  candidateId: string;
  /** dB of reduction at the worst cell per 1,000 of extra cost; Infinity when the step costs nothing extra. */
  dbPer1000: number;
}

export interface HandResult {
  /** The starting choice (baseline with pins and exclusions applied). */
  start: Choice;
  choice: Choice;
  steps: HandStep[];
  compliant: boolean;
}

/** The baseline choice with pins and exclusions applied. O(C). */
export function startingChoice(problem: FleetProblem): Choice {
  return problem.duties.map((d) => {
    const k = d.options.findIndex((o) => o.candidateId === d.baselineCandidateId);
    return k >= 0 ? k : cheapestOption(d);
  });
}

function cheapestOption(duty: ProblemDuty): number {
  let best = 0;
  duty.options.forEach((o, k) => {
    if (o.cost < (duty.options[best] as ProblemDuty['options'][number]).cost) best = k;
  });
  return best;
}

/** Runs the hand method. */
export function handMethod(problem: FleetProblem): HandResult {
  const start = startingChoice(problem);
  const choice = [...start];
  const left = problem.duties.map((_, i) => new Set<number>([start[i] as number]));
  const steps: HandStep[] = [];
  const maxSteps = problem.duties.reduce((n, d) => n + d.options.length, 0);
  for (let step = 0; step < maxSteps; step++) {
    const ratios = cellRatios(problem, choice);
    let worst = -1;
    ratios.forEach((r, i) => {
      if (r > 1 + LIMIT_TOLERANCE_RATIO && (worst < 0 || r > (ratios[worst] as number))) worst = i;
    });
    if (worst < 0) return { start, choice, steps, compliant: true };
    const cell = problem.cells[worst] as FleetProblem['cells'][number];
    const before = ratios[worst] as number;
    // Each chosen term's ratio at the worst cell, and each option's, by duty.
    const termRatio = new Map<string, number>();
    for (const t of cell.terms) termRatio.set(`${t.duty}_${t.option}`, t.ratio);
    const cost = costOfChoice(problem, choice);
    let bestMove: { duty: number; option: number; score: number; reduction: number } | undefined;
    problem.duties.forEach((duty, di) => {
      if (duty.phaseId !== cell.phaseId) return;
      const current = choice[di] as number;
      const currentRatio = termRatio.get(`${di}_${current}`) ?? 0;
      const currentCost = (duty.options[current] as ProblemDuty['options'][number]).cost;
      duty.options.forEach((o, k) => {
        if (k === current || left[di]?.has(k)) return;
        const after = before - currentRatio + (termRatio.get(`${di}_${k}`) ?? 0);
        const reduction = after > 0 ? dbFromRatio(before / after) : Infinity;
        if (!(reduction > 1e-12)) return;
        const extra = o.cost - currentCost;
        if (problem.budget !== undefined && cost + extra > problem.budget) return;
        const score = extra <= 0 ? Infinity : reduction / (extra / 1000);
        const better =
          !bestMove || score > bestMove.score || (score === bestMove.score && reduction > bestMove.reduction);
        if (better) bestMove = { duty: di, option: k, score, reduction };
      });
    });
    if (!bestMove) return { start, choice, steps, compliant: false };
    const move = bestMove as { duty: number; option: number; score: number };
    left[move.duty]?.add(move.option);
    choice[move.duty] = move.option;
    const duty = problem.duties[move.duty] as ProblemDuty;
    steps.push({
      dutyId: duty.id,
      candidateId: (duty.options[move.option] as ProblemDuty['options'][number]).candidateId,
      dbPer1000: move.score,
    });
  }
  const compliant = cellRatios(problem, choice).every((r) => r <= 1 + LIMIT_TOLERANCE_RATIO);
  return { start, choice, steps, compliant };
}
