/**
 * The trade-off curve: the least cost for each achievable worst-case margin, from the
 * baseline's margin to the quietest fleet's.
 *
 * Parametric ε-constraint sweep: with a target margin m, solve min cost subject to every
 * cell's energy ratio ≤ 10^(−m/10). The fleet found has some margin m' ≥ m; the next target
 * is m' + step. The sweep starts at the baseline's worst margin and ends with the
 * quietest-then-cheapest fleet. Every point is therefore a least-cost fleet for its own
 * margin (a Pareto point); a point with the same cost as the next one is dominated (less
 * margin for the same money) and dropped. The budget does not cut the curve: it shows what
 * each further dB would cost. Pins and exclusions apply.
 *
 * O(points) exact solves, points ≤ (quietest margin − baseline margin) / step + 2.
 * `onShare` hears, after each point, the share of the margin range swept so far (0 to 1).
 */
import type { Fleet } from '../model/model.ts';
import type { FleetProblem, Choice } from './problem.ts';
import type { LpSolver, SolveSettings } from './solver.ts';
import { cheapestUnderCap, quietestThenCheapest } from './exact.ts';
import { outcomeOfChoice } from './outcome.ts';
import { dbFromRatio, ratioFromDb } from '../../core/decibel.ts';

export interface TradeOffPoint {
  worstMarginDb: number;
  worstLevelDb: number;
  cost: number;
  fleet: Fleet;
}

export interface TradeOffResult {
  points: TradeOffPoint[];
  /** Every solve proved optimal. */
  proven: boolean;
}

/** Default spacing of the sweep, dB. */
export const DEFAULT_TRADE_OFF_STEP_DB = 0.5;

/** Relative tolerance under which two costs count as equal. */
const SAME_COST = 1e-9;

/**
 * Sweeps the curve. `startMarginDb` is the baseline's worst margin (NaN or absent: start
 * from the cheapest fleet whatever its margin).
 */
export function tradeOffCurve(
  problem: FleetProblem,
  solver: LpSolver,
  settings: SolveSettings,
  startMarginDb: number | undefined,
  stepDb = DEFAULT_TRADE_OFF_STEP_DB,
  onShare?: (fraction: number) => void,
): TradeOffResult {
  const points: TradeOffPoint[] = [];
  let proven = true;
  const add = (choice: Choice) => {
    const o = outcomeOfChoice(problem, choice);
    const point: TradeOffPoint = {
      worstMarginDb: o.worstMarginDb,
      worstLevelDb: o.worstLevelDb,
      cost: o.cost,
      fleet: o.fleet,
    };
    const last = points[points.length - 1];
    if (last && point.worstMarginDb <= last.worstMarginDb) return last.worstMarginDb;
    if (last && Math.abs(point.cost - last.cost) <= SAME_COST * Math.max(1, Math.abs(point.cost))) points.pop();
    points.push(point);
    return o.worstMarginDb;
  };

  const quietest = quietestThenCheapest(problem, solver, settings, false);
  proven &&= quietest.proven;
  if (!quietest.choice || quietest.leastWorstRatio === undefined) return { points, proven: false };
  const leastRatio = quietest.leastWorstRatio;
  if (problem.cells.length === 0) {
    add(quietest.choice);
    return { points, proven };
  }

  // The start cap admits the baseline itself despite rounding in its margin.
  let cap =
    startMarginDb !== undefined && Number.isFinite(startMarginDb)
      ? ratioFromDb(-startMarginDb) * (1 + 1e-9)
      : undefined;
  const maxPoints = 10_000;
  // Share of the sweep done: how far the margin reached has gone from the first point's to the quietest's.
  const endMargin = -dbFromRatio(leastRatio);
  let firstMargin: number | undefined;
  for (let i = 0; i < maxPoints && (cap === undefined || cap > leastRatio * (1 + 1e-6)); i++) {
    const r = cheapestUnderCap(problem, solver, settings, cap, false);
    if (!r.choice) break;
    proven &&= r.proven;
    const margin = add(r.choice);
    firstMargin ??= margin;
    if (onShare && endMargin > firstMargin)
      onShare(Math.min(1, Math.max(0, (margin - firstMargin) / (endMargin - firstMargin))));
    cap = ratioFromDb(-(margin + stepDb));
  }
  add(quietest.choice);
  return { points, proven };
}
