/**
 * One part's "least cost with every cell's energy ratio ≤ cap" model, kept in the solver between solves.
 *
 * The sweeps (./frontier.ts) solve the same part again and again with only the cap lower. When the solver
 * offers persistent models (`createModel`, the installed HiGHS does), the model is read once and each solve only
 * changes the upper bounds of the cell rows before running again; otherwise, and whenever the persistent model
 * fails, each solve writes and reads the model afresh (./exact.ts's {@link cheapestUnderCap}), which is also the
 * reference the persistent path is tested against. Call {@link CappedModel.dispose} at the end: the solver's
 * memory is not returned otherwise.
 */
import type { Choice, FleetProblem } from './problem.ts';
import { lpText, varName } from './lp-format.ts';
import { cheapestUnderCap, prepare } from './exact.ts';
import { expandChoice } from './dominance.ts';
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
  /** Row index of each capped cell row; column index of each binary, by duty and option. */
  rows: number[];
  columns: number[][];
  statusText: Map<number, string>;
}

/** The capped model of one part; `persistent` false always takes the one-shot path. */
export function cappedModel(
  problem: FleetProblem,
  solver: LpSolver,
  settings: SolveSettings,
  persistent = true,
): CappedModel {
  const { reduced, parts } = prepare(problem);
  let built: Built | undefined;
  let usable = persistent && typeof solver.createModel === 'function' && parts.length <= 1;
  const oneShot = (cap: number | undefined) => cheapestUnderCap(problem, solver, settings, cap, false);

  const build = (): Built => {
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
      return { model, rows, columns, statusText };
    } catch (error) {
      model.dispose();
      throw error;
    }
  };

  const solvePersistent = (b: Built, cap: number | undefined): SolveOutcome => {
    const { model, rows, columns } = b;
    if (rows.length > 0) {
      const upper = cap === undefined ? Infinity : cap;
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
          built ??= build();
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
