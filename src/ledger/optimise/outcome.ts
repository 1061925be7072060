/**
 * What a fleet achieves: its cost, its worst margin and the cells still over their limit,
 * read from the model's energy ratios (phase total energy / limit energy per cell).
 */
import type { FleetOutcome } from '../model/results.ts';
import type { Fleet } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import type { Choice, FleetProblem } from './problem.ts';
import { cellRatios, costOfChoice, fleetOfChoice } from './problem.ts';
import { dbFromRatio, dbSum, ratioFromDb } from '../../core/decibel.ts';
import { own } from '../model/own.ts';

/**
 * Allowance when comparing a level with its limit, dB: the solver meets a limit to within
 * a relative 1e-9 of its energy (4e-9 dB), so a level counts as over only when it is more
 * than 1e-6 dB above the limit. Far below any figure shown to a user (0.1 dB).
 */
export const LIMIT_TOLERANCE_DB = 1e-6;

/** Energy ratio allowance matching {@link LIMIT_TOLERANCE_DB}: 10^(1e-6/10) − 1 ≈ 2.3e-7. */
export const LIMIT_TOLERANCE_RATIO = ratioFromDb(LIMIT_TOLERANCE_DB) - 1;

/** A cell over its limit, as results list it (with the clause it comes from, if any). */
function overEntry(cell: FleetProblem['cells'][number], levelDb: number): FleetOutcome['over'][number] {
  const entry: FleetOutcome['over'][number] = {
    phaseId: cell.phaseId,
    periodId: cell.periodId,
    receiverId: cell.receiverId,
    levelDb,
    limitDb: cell.limitDb,
  };
  if (cell.clause !== undefined) entry.clause = cell.clause;
  return entry;
}

/** A fleet outcome with the level at its governing cell (the one with the least margin). */
export interface ChoiceOutcome extends FleetOutcome {
  /** Level at the cell with the least margin, dB; −Infinity with no cell. */
  worstLevelDb: number;
  /** Largest energy ratio to a limit over the cells (0 with no cell). */
  worstRatio: number;
}

/**
 * The outcome of a choice. Margin of a cell = −10·lg ρ, with ρ its energy ratio to the limit.
 * O(number of terms).
 */
export function outcomeOfChoice(problem: FleetProblem, choice: Choice): ChoiceOutcome {
  const ratios = cellRatios(problem, choice);
  let worst = -1;
  let worstRatio = 0;
  const over: FleetOutcome['over'] = [];
  ratios.forEach((ratio, i) => {
    const cell = problem.cells[i] as FleetProblem['cells'][number];
    if (ratio > worstRatio) {
      worstRatio = ratio;
      worst = i;
    }
    if (ratio > 1 + LIMIT_TOLERANCE_RATIO) {
      over.push(overEntry(cell, cell.limitDb + dbFromRatio(ratio)));
    }
  });
  const governing = problem.cells[worst];
  return {
    fleet: fleetOfChoice(problem, choice),
    cost: costOfChoice(problem, choice),
    worstMarginDb: worst < 0 ? Infinity : -dbFromRatio(worstRatio),
    over,
    worstLevelDb: governing ? governing.limitDb + dbFromRatio(worstRatio) : -Infinity,
    worstRatio,
  };
}

/**
 * The outcome of any fleet, read from the evaluation's contributions (used for the
 * baseline, whose candidates may lie outside the model: excluded or not computable).
 * Phase totals are energetic sums of the duties' contributions; a level that is not
 * computable makes the margins NaN. O(D·R).
 */
export function outcomeOfFleet(
  problem: FleetProblem,
  evaluation: Evaluation,
  fleet: Fleet,
): FleetOutcome & { worstLevelDb: number } {
  let cost = 0;
  for (const d of problem.duties) {
    const id = own(fleet, d.id);
    const c = id === undefined ? NaN : own(evaluation.costs, id)?.total;
    cost += typeof c === 'number' ? c : NaN;
  }
  let worstMarginDb = Infinity;
  let worstLevelDb = -Infinity;
  const over: FleetOutcome['over'] = [];
  for (const cell of problem.cells) {
    const levels = problem.duties
      .filter((d) => d.phaseId === cell.phaseId)
      .map((d) => {
        const id = own(fleet, d.id);
        if (id === undefined) return NaN;
        return cell.contributionDb
          ? cell.contributionDb(id)
          : evaluation.contributionDb(id, cell.receiverId) + cell.shiftDb;
      });
    const level = levels.some((l) => Number.isNaN(l) || l === Infinity) ? NaN : dbSum(levels);
    const margin = cell.limitDb - level;
    if (Number.isNaN(margin)) {
      worstMarginDb = NaN;
      worstLevelDb = NaN;
      continue;
    }
    if (margin < worstMarginDb) {
      worstMarginDb = margin;
      worstLevelDb = level;
    }
    if (margin < -LIMIT_TOLERANCE_DB) over.push(overEntry(cell, level));
  }
  return { fleet: { ...fleet }, cost, worstMarginDb, over, worstLevelDb };
}
