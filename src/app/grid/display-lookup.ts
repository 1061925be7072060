/**
 * Lookups over the display list (group headers and data rows in display
 * order) used by range operations: which data rows a range covers, the data
 * row above it, where a paste starts and which group new rows join.
 */
import type { DisplayRow, GridColumn } from './types.ts';
import type { DisplayView } from './table-model.ts';
import { cellText } from './cell-text.ts';
import type { RawTextFn } from './cell-text.ts';

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

/** Group key of the first data row at or below display row `index` (else the last one above). */
export function groupAtOrAfter<Row>(view: DisplayView<Row>, index: number): string | undefined {
  for (let i = Math.max(index, 0); i < view.rows.length; i++) {
    const line = view.rows[i];
    if (line?.kind === 'row') return line.group;
  }
  return lastGroup(view);
}

function lastGroup<Row>(view: DisplayView<Row>): string | undefined {
  for (let i = view.rows.length - 1; i >= 0; i--) {
    const line = view.rows[i];
    if (line?.kind === 'row') return line.group;
  }
  return undefined;
}

/**
 * The data rows a paste may write over: in a grouped view, only those of `group` (so a
 * long paste adds rows to that group instead of running into the next one), else all.
 */
export function pasteRowIds<Row>(view: DisplayView<Row>, group: string | undefined): readonly string[] {
  if (group === undefined) return view.dataIds;
  const ids: string[] = [];
  for (const line of view.rows) if (line.kind === 'row' && line.group === group) ids.push(line.id);
  return ids;
}
