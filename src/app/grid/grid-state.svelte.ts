/**
 * The grid's interaction state: active cell, selected range, the cell being
 * edited, the open column menu and the status message read to screen
 * readers. Pure position and planning logic lives in selection.ts,
 * paste.ts, fill.ts, clear.ts and edit-session.ts; this class only holds
 * the current values as runes.
 */
import type { CellPos, CellRange, DisplayRow, GridColumn } from './types.ts';
import type { GridBounds } from './selection.ts';
import { clampPos, rangeOf } from './selection.ts';
import type { EditSession } from './edit-session.ts';
import type { DisplayView } from './table-model.ts';
import { cellText } from './cell-text.ts';
import type { RawTextFn } from './cell-text.ts';

export class GridState {
  active = $state<CellPos>({ row: 0, col: 0 });
  anchor = $state<CellPos>({ row: 0, col: 0 });
  edit = $state.raw<EditSession | null>(null);
  /** Column whose menu is open, or null. */
  menuColumn = $state<string | null>(null);
  /** Last message for the live region. */
  status = $state('');
  /** Whether keyboard focus is inside the grid (shows the strong focus ring). */
  focused = $state(false);

  /** The selected rectangle (header row never included). */
  range = $derived<CellRange>(rangeOf(this.anchor, this.active));

  /** Moves the active cell; keeps the anchor when extending a range. */
  select(pos: CellPos, extend: boolean, bounds: GridBounds): void {
    const next = clampPos(pos, bounds);
    this.active = next;
    if (!extend || next.row < 0) this.anchor = next;
  }

  /** Selects a whole rectangle, anchor at its top-left. */
  selectRange(range: CellRange): void {
    this.anchor = { row: range.top, col: range.left };
    this.active = { row: range.bottom, col: range.right };
  }

  /** Keeps the selection inside the grid after the body or the columns changed. */
  clampTo(bounds: GridBounds): void {
    const active = clampPos(this.active, bounds);
    const anchor = clampPos(this.anchor, bounds);
    if (active.row !== this.active.row || active.col !== this.active.col) this.active = active;
    if (anchor.row !== this.anchor.row || anchor.col !== this.anchor.col) this.anchor = anchor;
  }

  announce(message: string): void {
    // a repeated message must still be read, so clear first when equal
    this.status = this.status === message ? `${message} ` : message;
  }
}

/** Data rows of a display range, with a text reader for their cells. */
export interface RangeRows<Row> {
  rowIds: string[];
  rows: Map<string, Row>;
  textOf(rowId: string, columnId: string): string;
}

/**
 * Collects the data rows (group headers left out) of display rows
 * `top … bottom`, so that range operations read only the selected rows.
 */
export function rangeRows<Row>(
  view: DisplayView<Row>,
  top: number,
  bottom: number,
  columns: readonly GridColumn<Row>[],
  rawText?: RawTextFn,
): RangeRows<Row> {
  const rowIds: string[] = [];
  const rows = new Map<string, Row>();
  for (let i = Math.max(top, 0); i <= bottom && i < view.rows.length; i++) {
    const line = view.rows[i] as DisplayRow<Row>;
    if (line.kind !== 'row') continue;
    rowIds.push(line.id);
    rows.set(line.id, line.row);
  }
  const byId = new Map(columns.map((column) => [column.id, column]));
  return {
    rowIds,
    rows,
    textOf(rowId, columnId) {
      const row = rows.get(rowId);
      const column = byId.get(columnId);
      return row === undefined || column === undefined ? '' : cellText(column, row, rowId, rawText);
    },
  };
}

/** The nearest data row strictly above display row `index`, if any. */
export function dataRowAbove<Row>(view: DisplayView<Row>, index: number): { id: string; row: Row } | undefined {
  for (let i = index - 1; i >= 0; i--) {
    const line = view.rows[i];
    if (line?.kind === 'row') return { id: line.id, row: line.row };
  }
  return undefined;
}

/** Index in `view.dataIds` of the first data row at or below display row `index`. */
export function firstDataIndexFrom<Row>(view: DisplayView<Row>, index: number): number {
  for (let i = Math.max(index, 0); i < view.rows.length; i++) {
    const dataIndex = view.dataIndex[i] ?? -1;
    if (dataIndex >= 0) return dataIndex;
  }
  return view.dataIds.length;
}
