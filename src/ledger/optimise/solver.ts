/**
 * The solver seam: the optimiser takes any object that solves LP-format text the way the
 * HiGHS one-shot API (`highs.solve(text, options)`) does, so Node and a browser worker can
 * load HiGHS their own way and tests can count calls.
 */
import type { FleetProblem, Choice } from './problem.ts';
import { varName, WORST_RATIO_VAR } from './lp-format.ts';

/** The part of a HiGHS solution the optimiser reads. */
export interface LpSolution {
  /** HiGHS model status, e.g. "Optimal", "Infeasible", "Time limit reached". */
  Status: string;
  ObjectiveValue: number;
  Columns: Record<string, { Index: number; Primal?: number }>;
}

/** The part of a HiGHS persistent model the sweeps use (./capped-model.ts). */
export interface PersistentLpModel {
  readonly options: { set(values: Readonly<Record<string, string | number | boolean>>): unknown };
  getRowByName(name: string): number;
  getColByName(name: string): number;
  changeRowsBounds(
    selection: { kind: 'set'; indices: readonly number[] },
    lower: readonly number[],
    upper: readonly number[],
  ): unknown;
  run(): { modelStatus: number };
  getSolution(): { colValue: ArrayLike<number> };
  dispose(): void;
}

/**
 * Anything with the HiGHS one-shot `solve` (the object `await loadHighs()` returns). A solver that also offers
 * persistent models (`createModel`, with the model status codes by name) lets a sweep keep one model per part.
 */
export interface LpSolver {
  solve(problem: string, options?: Record<string, string | number | boolean>): LpSolution;
  createModel?(source: { format: 'lp'; data: string }): PersistentLpModel;
  readonly constants?: { readonly modelStatus: Readonly<Record<string, number>> };
}

/** Settings for each solve. */
export interface SolveSettings {
  /** Wall-clock limit per solve, s. */
  timeLimitS: number;
}

/**
 * Solver options: silent; gaps of zero so the optimum is proven exactly (not within the
 * default 0.01 % gap); tight feasibility tolerances so a returned fleet meets its limits
 * to within 1e-9 of the limit energy (4e-9 dB). The feasibility-jump heuristic and
 * symmetry detection are off: on 30 duties × 12 candidates they cost more than they save
 * (about 20 % less CPU time per solve without them, measured with the benchmark's sites).
 */
export function highsOptions(settings: SolveSettings): Record<string, string | number | boolean> {
  return {
    output_flag: false,
    mip_rel_gap: 0,
    mip_abs_gap: 1e-9,
    mip_feasibility_tolerance: 1e-9,
    primal_feasibility_tolerance: 1e-9,
    mip_heuristic_run_feasibility_jump: false,
    mip_detect_symmetry: false,
    time_limit: settings.timeLimitS,
  };
}

export interface SolveOutcome {
  /** A choice was found (optimal, or the best one when a limit stopped the solve). */
  choice?: Choice;
  /** Proven optimal. */
  proven: boolean;
  /** Proven to have no solution. */
  infeasible: boolean;
  /** Value of s, when the model has it. */
  worstRatio?: number;
  status: string;
}

/** Runs one model and reads the chosen option of every duty from the binaries. */
export function solveLp(solver: LpSolver, problem: FleetProblem, text: string, settings: SolveSettings): SolveOutcome {
  const solution = solver.solve(text, highsOptions(settings));
  const status = solution.Status;
  if (status === 'Infeasible' || status === 'Primal infeasible or unbounded') {
    return { proven: false, infeasible: true, status };
  }
  const choice: Choice = [];
  for (let i = 0; i < problem.duties.length; i++) {
    const options = (problem.duties[i] as FleetProblem['duties'][number]).options;
    let best = -1;
    let bestValue = -Infinity;
    for (let k = 0; k < options.length; k++) {
      const v = solution.Columns[varName(i, k)]?.Primal;
      if (typeof v === 'number' && v > bestValue) {
        bestValue = v;
        best = k;
      }
    }
    if (best < 0 || bestValue < 0.5) return { proven: false, infeasible: false, status };
    choice.push(best);
  }
  const s = solution.Columns[WORST_RATIO_VAR]?.Primal;
  const outcome: SolveOutcome = { choice, proven: status === 'Optimal', infeasible: false, status };
  if (typeof s === 'number') outcome.worstRatio = s;
  return outcome;
}
