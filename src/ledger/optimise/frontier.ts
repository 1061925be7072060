/**
 * The exact cost / worst-margin frontier: every fleet that no other fleet beats on both cost and worst margin
 * (one fleet per point; fleets of equal cost and equal margin are one point).
 *
 * ε-constraint sweep with a moving cap on every cell's energy ratio:
 *   1. cap = none; solve "least cost subject to every cell ratio ≤ cap" (./exact.ts);
 *   2. the fleet found has cost c and largest ratio ρ (worst margin −10·lg ρ); it is a candidate point;
 *   3. cap = ρ·(1 − RESOLUTION), just below ρ, and repeat until no fleet fits (the quietest fleet has been
 *      passed).
 * A candidate point whose cost equals the next one's is beaten by it (same cost, more margin) and dropped, so a
 * point is only reported once the next solve costs more (or the sweep ends): points arrive in order of cost.
 *
 * Why this is the whole frontier (worked by hand): let the caps be k1 = ∞ > k2 > … and the solves' answers
 * (c_i, ρ_i), with ρ_i ≤ k_i and k_{i+1} = ρ_i·(1 − RESOLUTION).
 * - Each reported point is on the frontier: a fleet with ratio ≤ ρ_i fits cap k_i, so it costs at least c_i;
 *   one costing exactly c_i with ratio < ρ_i·(1 − RESOLUTION) would have been found by solve i+1 at cost c_i,
 *   and point i would have been dropped.
 * - No frontier point is missed: take a frontier fleet F (cost c, ratio ρ). Let i be the last solve with
 *   k_i ≥ ρ (solve 1 qualifies). Solve i's answer costs c_i ≤ c. If c_i < c, then F being on the frontier
 *   means ρ_i > ρ, so k_{i+1} ≥ ρ unless ρ_i·(1 − RESOLUTION) < ρ < ρ_i — contradicting that i was the last
 *   such solve in the first case, and in the second F's margin is within 10·lg(1/(1 − RESOLUTION)) ≈ 4.3e-7
 *   dB of point i's. If c_i = c, point i has ratio ≤ ρ with cost c: it is F's point (or beats F).
 * So the sweep finds every frontier point up to margins closer than 4.3e-7 dB to a neighbour (below
 * LIMIT_TOLERANCE_DB, far below any figure shown). Each solve is exact (HiGHS, gaps of zero; the cell rows are
 * written in units that put the cap at 1 to 2, so the solver's feasibility tolerance of 1e-9 stays a hundredth of
 * the step however far under its limits the site is: ./capped-model.ts); the number of
 * solves is the number of frontier points plus the dropped ones, plus one to find the quietest fleet (for
 * the progress share) and one that finds nothing.
 *
 * The sweep works on the model without dominated options, part by part (./exact.ts): a model that splits
 * into independent parts (no row shared) has, under a cap, a least cost that is the sum of the parts' least
 * costs and a largest ratio that is the largest of the parts'; lowering the cap below the largest ratio only
 * changes the parts at that ratio, so each step solves one small part again instead of the whole model.
 *
 * The budget does not cut the frontier (it shows what each further dB would cost); pins, exclusions and
 * clause rows apply.
 */
import type { Choice, FleetProblem } from './problem.ts';
import { cellRatios } from './problem.ts';
import { expandChoice } from './dominance.ts';
import type { LpSolver, SolveSettings } from './solver.ts';
import { prepare, quietestThenCheapest, WORST_RATIO_SLACK } from './exact.ts';
import { cappedModel } from './capped-model.ts';
import { outcomeOfChoice } from './outcome.ts';
import { dbFromRatio, ratioFromDb } from '../../core/decibel.ts';
import type { TradeOffPoint } from './trade-off.ts';

/** Relative step of the cap below the last fleet's largest ratio: margins closer than 4.3e-7 dB are one point. */
export const FRONTIER_RESOLUTION = 1e-7;

/** Relative tolerance under which two costs count as equal. */
const SAME_COST = 1e-9;

export interface FrontierOptions {
  /** Hears each frontier point as soon as it is known, in order of cost (and of margin). */
  onPoint?: (point: TradeOffPoint, index: number) => void;
  /** Hears the share of the margin range swept so far (0 to 1) after each solve. */
  onShare?: (fraction: number) => void;
  /**
   * Sweep in steps of this many dB of worst margin instead of just below each fleet's margin (the stepped
   * trade-off curve, ./trade-off.ts): its points are frontier points, not all of them.
   */
  stepDb?: number;
  /** First cap on every cell's energy ratio (absent: none, so the sweep starts at the cheapest fleet). */
  startCap?: number;
  /** Asked between solves; true stops the sweep with the points found so far. */
  stop?: () => boolean;
  /**
   * Keep one model per part in the solver and change only its cap between solves, when the solver offers
   * persistent models (./capped-model.ts); false reads each model afresh (the reference the kept models are
   * tested against: same points, same solves). Default true.
   */
  persistent?: boolean;
}

export interface FrontierResult {
  points: TradeOffPoint[];
  /** Every solve proved optimal and the sweep ran to its end. */
  proven: boolean;
  /** The sweep was stopped before its end. */
  stopped: boolean;
  /** Exact solves made. */
  solves: number;
}

/** Sweeps the exact frontier. O(frontier points) exact solves. */
export function exactFrontier(
  problem: FleetProblem,
  solver: LpSolver,
  settings: SolveSettings,
  options: FrontierOptions = {},
): FrontierResult {
  const points: TradeOffPoint[] = [];
  let solves = 0;
  let pending: TradeOffPoint | undefined;
  const emit = (p: TradeOffPoint) => {
    points.push(p);
    options.onPoint?.(p, points.length - 1);
  };
  const quietest = quietestThenCheapest(problem, solver, settings, false);
  solves += 2;
  if (!quietest.choice || quietest.leastWorstRatio === undefined)
    return { points, proven: false, stopped: false, solves };
  let proven = quietest.proven;
  const leastRatio = quietest.leastWorstRatio;
  const endMargin = leastRatio > 0 ? -dbFromRatio(leastRatio) : Infinity;
  let firstMargin: number | undefined;
  // A start cap below the quietest fleet (a baseline with a candidate the model leaves out) starts at it.
  let cap: number | undefined =
    options.startCap === undefined
      ? undefined
      : Math.max(options.startCap, leastRatio * (1 + WORST_RATIO_SLACK) + 1e-12);
  let stopped = false;
  const { reduced, parts: split } = prepare(problem);
  const parts = split.map((p) => ({
    ...p,
    model: cappedModel(p.problem, solver, settings, options.persistent ?? true),
    answer: undefined as Choice | undefined,
    worst: Infinity,
  }));
  try {
    return sweep();
  } finally {
    for (const part of parts) part.model.dispose();
  }

  function sweep(): FrontierResult {
    for (;;) {
      if (options.stop?.()) {
        stopped = true;
        break;
      }
      // Each independent part keeps its last answer while that answer fits the cap (it is still the part's least
      // cost there: the cap only fell); only the parts over the cap are solved again.
      let infeasible = false;
      for (const part of parts) {
        if (part.answer && (cap === undefined || part.worst <= cap)) continue;
        const r = part.model.solve(cap);
        solves++;
        if (!r.choice) {
          if (!r.infeasible) proven = false;
          infeasible = true;
          break;
        }
        proven &&= r.proven;
        part.answer = r.choice;
        part.worst = Math.max(0, ...cellRatios(part.problem, r.choice));
      }
      if (infeasible) break;
      const choice: Choice = new Array<number>(problem.duties.length).fill(0);
      for (const part of parts) (part.answer as Choice).forEach((k, i) => (choice[part.duties[i] as number] = k));
      const r = { choice: expandChoice(reduced, choice) };
      const o = outcomeOfChoice(problem, r.choice);
      const point: TradeOffPoint = {
        worstMarginDb: o.worstMarginDb,
        worstLevelDb: o.worstLevelDb,
        cost: o.cost,
        fleet: o.fleet,
      };
      if (pending && Math.abs(point.cost - pending.cost) > SAME_COST * Math.max(1, Math.abs(point.cost))) emit(pending);
      pending = point;
      firstMargin ??= o.worstMarginDb;
      if (options.onShare && Number.isFinite(endMargin) && endMargin > firstMargin)
        options.onShare(Math.min(1, Math.max(0, (o.worstMarginDb - firstMargin) / (endMargin - firstMargin))));
      // No cell, or a fleet with no energy anywhere: nothing quieter exists.
      if (o.worstRatio <= 0) break;
      if (options.stepDb === undefined) {
        cap = o.worstRatio * (1 - FRONTIER_RESOLUTION);
      } else {
        // Stepped sweep: the next target margin is this one plus the step, but never past the quietest fleet.
        if (o.worstRatio <= leastRatio * (1 + 1e-6)) break;
        cap = Math.max(ratioFromDb(-(o.worstMarginDb + options.stepDb)), leastRatio * (1 + WORST_RATIO_SLACK) + 1e-12);
      }
    }
    // A stopped sweep keeps back its last candidate point: a fleet of the same cost with more margin may follow.
    if (pending && !stopped) emit(pending);
    if (!stopped) options.onShare?.(1);
    return { points, proven: proven && !stopped, stopped, solves };
  }
}
