/**
 * Exact solves of the fleet model with a mixed-integer solver (HiGHS, branch and cut).
 *
 * - {@link cheapestUnderCap}: least cost with every cell's energy ratio ≤ cap (cap 1 = the
 *   limits themselves).
 * - {@link quietestThenCheapest}: lexicographic — first the least possible largest ratio
 *   s* (min s subject to Σ ρ·x ≤ s in every cell), then the least cost with every cell
 *   ≤ s*·(1 + 1e-7). Used when no fleet meets every limit, and for the quiet end of the
 *   trade-off curve.
 * Worst case exponential in the number of duties (0–1 programming is NP-hard); in practice
 * HiGHS proves 30 duties × 12 candidates in well under a second (see tests/bench/optimise.bench.ts).
 */
import type { FleetProblem } from './problem.ts';
import { lpText } from './lp-format.ts';
import { solveLp, type LpSolver, type SolveOutcome, type SolveSettings } from './solver.ts';
import { cellRatios } from './problem.ts';

/** Relative slack on s* when the cost is minimised at the least largest ratio. */
export const WORST_RATIO_SLACK = 1e-7;

/** Least cost with every cell's energy ratio at most `cap`. */
export function cheapestUnderCap(
  problem: FleetProblem,
  solver: LpSolver,
  settings: SolveSettings,
  cap: number | undefined,
  useBudget = true,
): SolveOutcome {
  return solveLp(
    solver,
    problem,
    lpText(problem, { objective: 'cost', ...(cap === undefined ? {} : { ratioCap: cap }), useBudget }),
    settings,
  );
}

export interface QuietestOutcome extends SolveOutcome {
  /** The least possible largest energy ratio over the cells, s*. */
  leastWorstRatio?: number;
}

/** Lexicographic: least largest ratio, then least cost at it. */
export function quietestThenCheapest(
  problem: FleetProblem,
  solver: LpSolver,
  settings: SolveSettings,
  useBudget = true,
): QuietestOutcome {
  const first = solveLp(solver, problem, lpText(problem, { objective: 'worst-ratio', useBudget }), settings);
  if (!first.choice) return first;
  // The true largest ratio of the choice, recomputed outside the solver.
  const sStar = Math.max(0, ...cellRatios(problem, first.choice));
  const second = cheapestUnderCap(problem, solver, settings, sStar * (1 + WORST_RATIO_SLACK) + 1e-12, useBudget);
  if (!second.choice) return { ...first, leastWorstRatio: sStar };
  return { ...second, proven: first.proven && second.proven, leastWorstRatio: sStar };
}
