/**
 * Turning a pasted block of text into cell changes.
 *
 * The block lands with its top-left cell on the active cell (or, when a
 * single value is pasted over a larger selection, fills the selection).
 * Cells past the last column are dropped, cells on read-only columns are
 * skipped, and rows past the last row become new rows: `rowId: null` with
 * `newRow` numbered 0, 1, 2 … in order. A pasted row that is entirely empty
 * does not create a new row. Cost O(cells in the block).
 */
import type { GridChange } from './types.ts';

/** The parts of a column the planners need. */
export interface EditTarget {
  id: string;
  editable: boolean;
}

export interface PasteTarget {
  /** Ids of the data rows in display order (group headers left out). */
  rowIds: readonly string[];
  /** Index into `rowIds` of the first row written. */
  startRow: number;
  /** Visible columns in display order. */
  columns: readonly EditTarget[];
  /** Index into `columns` of the first column written. */
  startCol: number;
  /** Size of the selected range; a single pasted value fills all of it. */
  fill?: { rows: number; cols: number };
  /** Group key to send with new rows. */
  group?: string;
}

function repeatSingle(block: string[][], fill: PasteTarget['fill']): string[][] {
  const single = block.length === 1 && block[0]?.length === 1;
  if (!single || !fill || fill.rows * fill.cols <= 1) return block;
  const text = block[0]?.[0] ?? '';
  return Array.from({ length: fill.rows }, () => Array.from({ length: fill.cols }, () => text));
}

/**
 * Plans the changes for pasting `block` (rows of cells) at the target.
 * @example planPaste([['1', '2']], { rowIds: ['a'], startRow: 0, columns: [{ id: 'x', editable: true }, { id: 'y', editable: true }], startCol: 0 })
 * // → [{ rowId: 'a', columnId: 'x', text: '1' }, { rowId: 'a', columnId: 'y', text: '2' }]
 */
export function planPaste(block: string[][], target: PasteTarget): GridChange[] {
  const cells = repeatSingle(block, target.fill);
  const changes: GridChange[] = [];
  let newRows = 0;
  for (let i = 0; i < cells.length; i++) {
    const line = cells[i] ?? [];
    const rowIndex = target.startRow + i;
    const rowId = target.rowIds[rowIndex];
    const lineChanges: GridChange[] = [];
    for (let j = 0; j < line.length; j++) {
      const column = target.columns[target.startCol + j];
      if (!column || !column.editable) continue;
      lineChanges.push({ rowId: rowId ?? null, columnId: column.id, text: line[j] ?? '' });
    }
    if (rowId === undefined) {
      if (lineChanges.every((change) => change.text === '')) continue;
      const newRow = newRows++;
      for (const change of lineChanges) {
        change.newRow = newRow;
        if (target.group !== undefined) change.group = target.group;
      }
    }
    changes.push(...lineChanges);
  }
  return changes;
}
