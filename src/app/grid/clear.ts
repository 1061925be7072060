/**
 * Clearing a selection (Delete or Backspace): every editable, non-empty cell
 * becomes the empty text. Read-only cells are left alone. Cost O(cells).
 */
import type { GridChange } from './types.ts';
import type { EditTarget } from './paste.ts';

/**
 * Plans the changes that clear the selected cells.
 * @example planClear(['a'], [{ id: 'x', editable: true }, { id: 'y', editable: false }], () => '7')
 * // → [{ rowId: 'a', columnId: 'x', text: '' }]
 */
export function planClear(
  rowIds: readonly string[],
  columns: readonly EditTarget[],
  textOf: (rowId: string, columnId: string) => string,
): GridChange[] {
  const changes: GridChange[] = [];
  for (const rowId of rowIds) {
    for (const column of columns) {
      if (column.editable && textOf(rowId, column.id) !== '') changes.push({ rowId, columnId: column.id, text: '' });
    }
  }
  return changes;
}
