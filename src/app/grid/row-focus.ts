/**
 * What of the selection, the active cell and the edit concerns one body row, so that each
 * row is told only of changes on it: moving the active cell redraws the two rows it left and
 * entered, not every row on screen.
 */
import type { EditSession } from './edit-session.ts';
import type { CellPos, CellRange } from './types.ts';

/** Columns of a selection on one row: `left` … `right`, or an empty span (right < left) when the row is outside it. */
export interface RowSpan {
  left: number;
  right: number;
}

const NONE: RowSpan = { left: 0, right: -1 };

/**
 * The selected columns on display row `row`.
 * @example selectedColumnsOn({ top: 2, bottom: 4, left: 1, right: 3 }, 3) // → { left: 1, right: 3 }
 * @example selectedColumnsOn({ top: 2, bottom: 4, left: 1, right: 3 }, 5) // → { left: 0, right: -1 }
 */
export function selectedColumnsOn(range: CellRange, row: number): RowSpan {
  return row >= range.top && row <= range.bottom ? { left: range.left, right: range.right } : NONE;
}

/**
 * The active cell's column when it is on display row `row`, else −1.
 * @example activeColumnOn({ row: 3, col: 2 }, 3) // → 2
 */
export function activeColumnOn(active: CellPos, row: number): number {
  return active.row === row ? active.col : -1;
}

/** The edit in progress when it is in a cell of the row `rowId`, else null. */
export function editOn(edit: EditSession | null, rowId: string): EditSession | null {
  return edit !== null && edit.rowId === rowId ? edit : null;
}
