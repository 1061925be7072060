/**
 * One part's "least cost with every cell's energy ratio ≤ cap" model, kept in the solver between solves.
 *
 * The sweeps (./frontier.ts) solve the same part again and again with only the cap lower. When the solver
 * offers persistent models (`createModel`, the installed HiGHS does), the model is read once and each solve only
 * changes the upper bounds of the cell rows before running again; otherwise, and whenever the persistent model
 * fails, each solve writes and reads the model afresh (./exact.ts's {@link cheapestUnderCap}), which is also the
 * reference the persistent path is tested against. Call {@link CappedModel.dispose} at the end: the solver's
 * memory is not returned otherwise.
 *
 * The solver accepts a row that exceeds its bound by up to its feasibility tolerance (1e-9, absolute: see
 * ./solver.ts), while the exact frontier lowers the cap by a relative 1e-7 below the last fleet's ratio ρ. On a
 * site far under its limits (ρ below 0.01, every fleet more than 20 dB under) that step is smaller than the
 * tolerance, so the fleet just found still "fits" the lowered cap: a kept model, which starts from its last
 * answer, finds it again and the sweep stalls; a model read afresh does the same further down (ρ below about
 * 1e-4). So the cell rows are multiplied by a power of two (exact in floating point: the same model) that
 * writes the cap as 1 to 2 ({@link capScale}), and a kept model is read again when its cap falls below 1 in its
 * units (once per halving at most); the tolerance is then at most 1e-9 of the cap, a hundredth of the step.
 */
import type { Choice, FleetProblem } from './problem.ts';
import { lpText, varName } from './lp-format.ts';
import { cheapestUnderCap, prepare } from './exact.ts';
import { expandChoice, type ReducedProblem } from './dominance.ts';
import {
  highsOptions,
  type LpSolver,
  type PersistentLpModel,
  type SolveOutcome,
  type SolveSettings,
} from './solver.ts';

/** Cap written into the model text before the first solve sets the real one: above every ratio, finite. */
const NO_CAP_TEXT = 1e30;

/** Status names of the one-shot API, by the persistent API's model status names. */
const STATUS_TEXT: Record<string, string> = {
  optimal: 'Optimal',
  infeasible: 'Infeasible',
  unboundedOrInfeasible: 'Primal infeasible or unbounded',
  timeLimit: 'Time limit reached',
  interrupted: 'Interrupted by user',
};

export interface CappedModel {
  /** Least cost with every cell's energy ratio ≤ cap (undefined: no cap), choice in the part's option indexes. */
  solve(cap: number | undefined): SolveOutcome;
  dispose(): void;
}

interface Built {
  model: PersistentLpModel;
  /** The factor the rows were written with ({@link capScale}) and the model read. */
  scale: number;
  reduced: ReducedProblem;
  /** Row index of each capped cell row; column index of each binary, by duty and option. */
  rows: number[];
  columns: number[][];
  statusText: Map<number, string>;
}

/**
 * The power of two by which the cell rows are multiplied so that `cap` is written as 1 or more (between 1 and 2);
 * 1 for a cap of 1 or more, or none; at most 2^40 (a fleet 120 dB under its limits).
 * @example capScale(0.01) // 128: the cap 0.01 is written as 1.28
 */
export function capScale(cap: number | undefined): number {
  if (cap === undefined || !(cap > 0) || cap >= 1) return 1;
  return 2 ** Math.min(40, Math.ceil(-Math.log2(cap)));
}

/** The model with every cell term multiplied by `scale` (a power of two: exact). */
function scaledCells(problem: FleetProblem, scale: number): FleetProblem {
  if (scale === 1) return problem;
  return {
    ...problem,
    cells: problem.cells.map((cell) => ({ ...cell, terms: cell.terms.map((t) => ({ ...t, ratio: t.ratio * scale })) })),
  };
}

/**
 * The capped model of one part; `persistent` false always takes the one-shot path. Caps and choices are in the
 * part's own terms; the rows are scaled inside ({@link capScale}).
 */
export function cappedModel(
  part: FleetProblem,
  solver: LpSolver,
  settings: SolveSettings,
  persistent = true,
): CappedModel {
  // The scaled models met so far (caps only fall in a sweep: one per halving of the cap below 1 at most).
  const byScale = new Map<number, FleetProblem>();
  const scaledOf = (scale: number): FleetProblem => {
    let p = byScale.get(scale);
    if (!p) {
      p = scaledCells(part, scale);
      byScale.set(scale, p);
    }
    return p;
  };
  let built: Built | undefined;
  let usable = persistent && typeof solver.createModel === 'function' && prepare(part).parts.length <= 1;
  const oneShot = (cap: number | undefined) => {
    const scale = capScale(cap);
    return cheapestUnderCap(scaledOf(scale), solver, settings, cap === undefined ? undefined : cap * scale, false);
  };

  const build = (scale: number): Built => {
    const { reduced } = prepare(scaledOf(scale));
    const create = solver.createModel as NonNullable<LpSolver['createModel']>;
    const model = create({
      format: 'lp',
      data: lpText(reduced.problem, { objective: 'cost', ratioCap: NO_CAP_TEXT, useBudget: false }),
    });
    try {
      model.options.set(highsOptions(settings));
      const rows: number[] = [];
      reduced.problem.cells.forEach((cell, i) => {
        if (cell.terms.length > 0) rows.push(model.getRowByName(`c${i}`));
      });
      rows.sort((a, b) => a - b);
      const columns = reduced.problem.duties.map((d, i) => d.options.map((_, k) => model.getColByName(varName(i, k))));
      const statusText = new Map<number, string>();
      for (const [name, code] of Object.entries(solver.constants?.modelStatus ?? {}))
        statusText.set(code, STATUS_TEXT[name] ?? name);
      return { model, scale, reduced, rows, columns, statusText };
    } catch (error) {
      model.dispose();
      throw error;
    }
  };

  const solvePersistent = (b: Built, cap: number | undefined): SolveOutcome => {
    const { model, rows, columns, reduced } = b;
    if (rows.length > 0) {
      const upper = cap === undefined ? Infinity : cap * b.scale;
      model.changeRowsBounds(
        { kind: 'set', indices: rows },
        rows.map(() => -Infinity),
        rows.map(() => upper),
      );
    }
    const run = model.run();
    const status = b.statusText.get(run.modelStatus) ?? `status ${run.modelStatus}`;
    if (status === 'Infeasible' || status === 'Primal infeasible or unbounded')
      return { proven: false, infeasible: true, status };
    const values = model.getSolution().colValue;
    const choice: Choice = [];
    for (const cols of columns) {
      let best = -1;
      let bestValue = -Infinity;
      cols.forEach((c, k) => {
        const v = values[c];
        if (typeof v === 'number' && v > bestValue) {
          bestValue = v;
          best = k;
        }
      });
      if (best < 0 || bestValue < 0.5) return { proven: false, infeasible: false, status };
      choice.push(best);
    }
    return { choice: expandChoice(reduced, choice), proven: status === 'Optimal', infeasible: false, status };
  };

  return {
    solve(cap) {
      if (usable) {
        try {
          // A cap that fell below 1 in the model's units: the model is read again with rows in the new units.
          if (built && cap !== undefined && cap * built.scale < 1) {
            built.model.dispose();
            built = undefined;
          }
          built ??= build(capScale(cap));
          return solvePersistent(built, cap);
        } catch {
          // A persistent model that fails once is dropped; the one-shot path answers from here on.
          usable = false;
          built?.model.dispose();
          built = undefined;
        }
      }
      return oneShot(cap);
    },
    dispose() {
      built?.model.dispose();
      built = undefined;
    },
  };
}
