/**
 * Exact solves of the fleet model with a mixed-integer solver (HiGHS, branch and cut).
 *
 * - {@link cheapestUnderCap}: least cost with every cell's energy ratio ≤ cap (cap 1 = the
 *   limits themselves).
 * - {@link quietestThenCheapest}: lexicographic — first the least possible largest ratio
 *   s* (min s subject to Σ ρ·x ≤ s in every cell), then the least cost with every cell
 *   ≤ s*·(1 + 1e-7). Used when no fleet meets every limit, and for the quiet end of the
 *   trade-off curve.
 * Each solve works on the model without dominated options (./dominance.ts), which has the same optima, and
 * solves its independent parts (./components.ts) one by one when no budget row links them.
 * Worst case exponential in the number of duties (0–1 programming is NP-hard); in practice
 * HiGHS proves 30 duties × 12 candidates in well under a second (see tests/bench/optimise.bench.ts).
 */
import type { Choice, FleetProblem } from './problem.ts';
import { lpText, type LpSpec } from './lp-format.ts';
import { solveLp, type LpSolver, type SolveOutcome, type SolveSettings } from './solver.ts';
import { cellRatios } from './problem.ts';
import { expandChoice, withoutDominated, type ReducedProblem } from './dominance.ts';
import { independentParts, type ProblemPart } from './components.ts';

/** Relative slack on s* when the cost is minimised at the least largest ratio. */
export const WORST_RATIO_SLACK = 1e-7;

/** The model without dominated options and its independent parts, worked once per model object. */
export interface Prepared {
  reduced: ReducedProblem;
  parts: ProblemPart[];
}
const preparedOf = new WeakMap<FleetProblem, Prepared>();
export function prepare(problem: FleetProblem): Prepared {
  let p = preparedOf.get(problem);
  if (!p) {
    const reduced = withoutDominated(problem);
    p = { reduced, parts: independentParts(reduced.problem) };
    preparedOf.set(problem, p);
  }
  return p;
}

/**
 * Solves the model without dominated options (./dominance.ts), part by part when no budget row links the
 * parts (./components.ts), and returns the choice in the original model's option indexes.
 */
function solveReduced(problem: FleetProblem, solver: LpSolver, settings: SolveSettings, spec: LpSpec): SolveOutcome {
  const { reduced, parts } = prepare(problem);
  const budgetRow = (spec.useBudget ?? true) && problem.budget !== undefined;
  if (budgetRow || parts.length <= 1) {
    const outcome = solveLp(solver, reduced.problem, lpText(reduced.problem, spec), settings);
    return outcome.choice ? { ...outcome, choice: expandChoice(reduced, outcome.choice) } : outcome;
  }
  const choice: Choice = new Array<number>(problem.duties.length).fill(0);
  let proven = true;
  let status = 'Optimal';
  let worstRatio: number | undefined;
  for (const part of parts) {
    const outcome = solveLp(solver, part.problem, lpText(part.problem, spec), settings);
    if (!outcome.choice) return outcome;
    proven &&= outcome.proven;
    if (outcome.status !== 'Optimal') status = outcome.status;
    outcome.choice.forEach((k, i) => (choice[part.duties[i] as number] = k));
    if (outcome.worstRatio !== undefined) worstRatio = Math.max(worstRatio ?? 0, outcome.worstRatio);
  }
  const outcome: SolveOutcome = { choice: expandChoice(reduced, choice), proven, infeasible: false, status };
  if (worstRatio !== undefined) outcome.worstRatio = worstRatio;
  return outcome;
}

/** Least cost with every cell's energy ratio at most `cap`. */
export function cheapestUnderCap(
  problem: FleetProblem,
  solver: LpSolver,
  settings: SolveSettings,
  cap: number | undefined,
  useBudget = true,
): SolveOutcome {
  return solveReduced(problem, solver, settings, {
    objective: 'cost',
    ...(cap === undefined ? {} : { ratioCap: cap }),
    useBudget,
  });
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
  const first = solveReduced(problem, solver, settings, { objective: 'worst-ratio', useBudget });
  if (!first.choice) return first;
  // The true largest ratio of the choice, recomputed outside the solver.
  const sStar = Math.max(0, ...cellRatios(problem, first.choice));
  const second = cheapestUnderCap(problem, solver, settings, sStar * (1 + WORST_RATIO_SLACK) + 1e-12, useBudget);
  if (!second.choice) return { ...first, leastWorstRatio: sStar };
  return { ...second, proven: first.proven && second.proven, leastWorstRatio: sStar };
}
