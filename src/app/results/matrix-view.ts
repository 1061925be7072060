/**
 * View model of the phase × receiver matrix: one row per phase and period it is assessed
 * in (its own period first, then the periods its other working hours fall in), the text of
 * every cell, read from the ledger's Evaluation.matrix. A cell whose phase carries a
 * character penalty shows the rating level L_Ar,T with L_Aeq,T and the penalty beside it.
 * Formatting only.
 */
import type { Project } from '../../ledger/model/model.ts';
import { cellQuantity, type MatrixCell } from '../../ledger/model/results.ts';
import {
  describeMargin,
  fixed,
  formatLevel,
  formatLimit,
  formatSignedDb,
  NOT_COMPUTED,
  type DecimalSeparator,
} from './format.ts';
import { own } from '../../ledger/model/own.ts';

export type CellState = 'over' | 'under' | 'no-limit' | 'not-computed' | 'silent';

export interface MatrixCellView {
  phaseId: string;
  receiverId: string;
  level: string;
  /** "L_Ar,T" when the character penalty applies (the level is a rating level), else "L_Aeq,T". */
  quantity: 'L_Ar,T' | 'L_Aeq,T';
  /** With a penalty: "L_Aeq,T 66.0 dB + penalty 3.0 dB"; else empty. */
  rating: string;
  limit: string;
  margin: string;
  state: CellState;
  worst: boolean;
  /** The whole cell in words, for assistive technology and the tooltip. */
  description: string;
}

export interface MatrixRowView {
  /** Unique per row: phase id and period id. */
  key: string;
  phaseId: string;
  periodId: string;
  phaseName: string;
  periodName: string;
  /** The phase's own period (first row of the phase). */
  ownPeriod: boolean;
  /** e.g. "12 of 12 h worked" or "2 of 4 h worked, hours past its own period". */
  hours: string;
  cells: MatrixCellView[];
}

export interface MatrixColumnView {
  receiverId: string;
  name: string;
  detail: string;
}

function cellState(cell: MatrixCell | undefined): CellState {
  if (!cell || Number.isNaN(cell.levelDb)) return 'not-computed';
  if (cell.levelDb === -Infinity) return 'silent';
  if (cell.limitDb === undefined) return 'no-limit';
  if (cell.marginDb !== undefined && Number.isNaN(cell.marginDb)) return 'not-computed';
  return cell.over ? 'over' : 'under';
}

/** Columns (receivers) of the matrix, in project order. */
export function matrixColumns(project: Project): MatrixColumnView[] {
  return project.receivers.map((r) => ({
    receiverId: r.id,
    name: r.name || r.id,
    detail: `${r.kind}${r.facade ? ', façade' : ''}`,
  }));
}

const hoursText = (h: number, decimal: DecimalSeparator) =>
  Number.isFinite(h) ? fixed(h, Number.isInteger(h) ? 0 : 2, decimal) : '?';

/**
 * Rows of the matrix: for each phase in project order, its own period and then every other
 * period it is assessed in, with one cell per receiver. O(cells).
 */
export function matrixRows(
  project: Project,
  matrix: readonly MatrixCell[],
  worstReceiverByPhase: Readonly<Record<string, string>>,
  decimal: DecimalSeparator = project.settings?.decimalSeparator ?? '.',
): MatrixRowView[] {
  const byKey = new Map<string, MatrixCell>();
  // Periods of each phase in the order the matrix gives them (own first).
  const periodsOf = new Map<string, MatrixCell[]>();
  for (const cell of matrix) {
    byKey.set(`${cell.phaseId}\u0000${cell.periodId}\u0000${cell.receiverId}`, cell);
    const list = periodsOf.get(cell.phaseId) ?? [];
    if (!list.some((c) => c.periodId === cell.periodId)) list.push(cell);
    periodsOf.set(cell.phaseId, list);
  }
  const periodName = new Map(project.periods.map((p) => [p.id, p.name || p.id]));
  return project.phases.flatMap((phase) => {
    const periods = periodsOf.get(phase.id) ?? [
      { periodId: phase.periodId, ownPeriod: true, hoursWorked: NaN, periodHours: NaN } as MatrixCell,
    ];
    return periods.map((first): MatrixRowView => {
      const pName = periodName.get(first.periodId) ?? first.periodId;
      const cells = project.receivers.map((receiver): MatrixCellView => {
        const cell = byKey.get(`${phase.id}\u0000${first.periodId}\u0000${receiver.id}`);
        const state = cellState(cell);
        const worst = first.ownPeriod && own(worstReceiverByPhase, phase.id) === receiver.id;
        const level = cell ? formatLevel(cell.levelDb, decimal) : NOT_COMPUTED;
        const quantity = cell ? cellQuantity(cell) : 'L_Aeq,T';
        const rating =
          cell?.levelAeqDb !== undefined && Number.isFinite(cell.levelAeqDb)
            ? `L_Aeq,T ${formatLevel(cell.levelAeqDb, decimal)} + penalty ${formatLevel(cell.penaltyDb, decimal)}`
            : '';
        const limit = formatLimit(cell?.limitDb, decimal);
        const margin =
          state === 'under' || state === 'over'
            ? formatSignedDb(cell?.marginDb, decimal)
            : state === 'not-computed' && cell?.limitDb !== undefined
              ? NOT_COMPUTED
              : '';
        const where = first.ownPeriod ? '' : ` in the ${pName} period`;
        const parts = [`${phase.name || phase.id} at ${receiver.name || receiver.id}${where}: ${quantity} ${level}`];
        if (rating) parts.push(`rating level (ISO 1996-1) = ${rating}`);
        if (state === 'over' || state === 'under')
          parts.push(`limit ${limit}`, describeMargin(cell?.marginDb, decimal));
        else if (state === 'no-limit') parts.push('no limit for this period');
        else if (state === 'not-computed') parts.push('an input it needs is missing or unreadable');
        else if (state === 'silent') parts.push('no duty runs in this phase');
        if (worst) parts.push('worst receiver of the phase');
        return {
          phaseId: phase.id,
          receiverId: receiver.id,
          level,
          quantity,
          rating,
          limit,
          margin,
          state,
          worst,
          description: parts.join(', '),
        };
      });
      const hours = `${hoursText(first.hoursWorked, decimal)} of ${hoursText(first.periodHours, decimal)} h worked${first.ownPeriod ? '' : ', hours past its own period'}`;
      return {
        key: `${phase.id}\u0000${first.periodId}`,
        phaseId: phase.id,
        periodId: first.periodId,
        phaseName: phase.name || phase.id,
        periodName: pName,
        ownPeriod: first.ownPeriod,
        hours,
        cells,
      };
    });
  });
}

/** True when a cell of the matrix holds a rating level (a character penalty applies). */
export function matrixHasRatingLevels(matrix: readonly MatrixCell[]): boolean {
  return matrix.some((c) => c.levelAeqDb !== undefined);
}
