/**
 * View model of the phase × receiver matrix: the text of every cell, read from the
 * ledger's Evaluation.matrix. Formatting only.
 */
import type { Project } from '../../ledger/model.ts';
import type { MatrixCell } from '../../ledger/results.ts';
import { describeMargin, formatLevel, formatLimit, formatSignedDb, NOT_COMPUTED, type DecimalSeparator } from './format.ts';
import { own } from '../../ledger/own.ts';

export type CellState = 'over' | 'under' | 'no-limit' | 'not-computed' | 'silent';

export interface MatrixCellView {
  phaseId: string;
  receiverId: string;
  level: string;
  limit: string;
  margin: string;
  state: CellState;
  worst: boolean;
  /** The whole cell in words, for assistive technology and the tooltip. */
  description: string;
}

export interface MatrixRowView {
  phaseId: string;
  phaseName: string;
  periodName: string;
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

/**
 * Rows (phases) of the matrix with one cell per receiver, in project order.
 * O(cells).
 */
export function matrixRows(
  project: Project,
  matrix: readonly MatrixCell[],
  worstReceiverByPhase: Readonly<Record<string, string>>,
  decimal: DecimalSeparator = project.settings?.decimalSeparator ?? '.',
): MatrixRowView[] {
  const byKey = new Map<string, MatrixCell>();
  for (const cell of matrix) byKey.set(`${cell.phaseId}\u0000${cell.receiverId}`, cell);
  const periodName = new Map(project.periods.map((p) => [p.id, p.name || p.id]));
  return project.phases.map((phase) => {
    const cells = project.receivers.map((receiver): MatrixCellView => {
      const cell = byKey.get(`${phase.id}\u0000${receiver.id}`);
      const state = cellState(cell);
      const worst = own(worstReceiverByPhase, phase.id) === receiver.id;
      const level = cell ? formatLevel(cell.levelDb, decimal) : NOT_COMPUTED;
      const limit = formatLimit(cell?.limitDb, decimal);
      const margin = state === 'under' || state === 'over' ? formatSignedDb(cell?.marginDb, decimal) : state === 'not-computed' && cell?.limitDb !== undefined ? NOT_COMPUTED : '';
      const parts = [`${phase.name || phase.id} at ${receiver.name || receiver.id}: ${level}`];
      if (state === 'over' || state === 'under') parts.push(`limit ${limit}`, describeMargin(cell?.marginDb, decimal));
      else if (state === 'no-limit') parts.push('no limit for this period');
      else if (state === 'not-computed') parts.push('an input it needs is missing or unreadable');
      else if (state === 'silent') parts.push('no duty runs in this phase');
      if (worst) parts.push('worst receiver of the phase');
      return { phaseId: phase.id, receiverId: receiver.id, level, limit, margin, state, worst, description: parts.join(', ') };
    });
    return { phaseId: phase.id, phaseName: phase.name || phase.id, periodName: periodName.get(phase.periodId) ?? phase.periodId, cells };
  });
}
