/**
 * Fill down: copy the top cell of each selected column into the cells below
 * it. With a single selected row the cell above is copied into it instead,
 * as spreadsheet users expect. Read-only columns and cells that already hold
 * the text are left alone. Cost O(rows × columns of the selection).
 */
import type { GridChange } from './types.ts';
import type { EditTarget } from './paste.ts';

/**
 * Plans a fill down over the selected data rows.
 * @param rowIds data rows of the selection, in display order
 * @param columns selected columns
 * @param textOf text shown in a cell
 * @param rowAbove the data row just above the selection, used when one row is selected
 * @example planFillDown(['a', 'b'], [{ id: 'x', editable: true }], (r) => (r === 'a' ? '5' : ''))
 * // → [{ rowId: 'b', columnId: 'x', text: '5' }]
 */
export function planFillDown(
  rowIds: readonly string[],
  columns: readonly EditTarget[],
  textOf: (rowId: string, columnId: string) => string,
  rowAbove?: string,
): GridChange[] {
  const single = rowIds.length === 1;
  const source = single ? rowAbove : rowIds[0];
  if (source === undefined) return [];
  const targets = single ? rowIds : rowIds.slice(1);
  const changes: GridChange[] = [];
  for (const column of columns) {
    if (!column.editable) continue;
    const text = textOf(source, column.id);
    for (const rowId of targets) {
      if (textOf(rowId, column.id) !== text) changes.push({ rowId, columnId: column.id, text });
    }
  }
  return changes;
}
