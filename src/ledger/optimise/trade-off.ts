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
 * The sweep is ./frontier.ts's with a step instead of the smallest one.
 * O(points) exact solves, points ≤ (quietest margin − baseline margin) / step + 2.
 * `onShare` hears, after each point, the share of the margin range swept so far (0 to 1).
 */
import type { Fleet } from '../model/model.ts';
import type { FleetProblem } from './problem.ts';
import type { LpSolver, SolveSettings } from './solver.ts';
import { exactFrontier } from './frontier.ts';
import { ratioFromDb } from '../../core/decibel.ts';

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
  // The start cap admits the baseline itself despite rounding in its margin.
  const startCap =
    startMarginDb !== undefined && Number.isFinite(startMarginDb)
      ? ratioFromDb(-startMarginDb) * (1 + 1e-9)
      : undefined;
  const sweep = exactFrontier(problem, solver, settings, {
    stepDb,
    ...(startCap === undefined ? {} : { startCap }),
    ...(onShare ? { onShare } : {}),
  });
  return { points: sweep.points, proven: sweep.proven };
}
