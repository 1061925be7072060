/**
 * Active cell and range selection: pure position arithmetic.
 *
 * Row −1 is the header row (reachable by the arrow keys so that sorting,
 * resizing and the column menu work from the keyboard); body rows are
 * 0 … rows−1 in display order. A range never includes the header row.
 */
import type { CellPos, CellRange } from './types.ts';
import type { MoveTarget } from './keyboard.ts';

/** Size of the grid as the user sees it. */
export interface GridBounds {
  /** Number of body rows in display order (group headers included). */
  rows: number;
  /** Number of visible columns. */
  cols: number;
}

const HEADER_ROW = -1;

function clampNumber(value: number, low: number, high: number): number {
  return Math.min(Math.max(value, low), high);
}

/**
 * Keeps a position inside the grid: rows −1 … rows−1, columns 0 … cols−1.
 * @example clampPos({ row: 9, col: -2 }, { rows: 5, cols: 3 }) // → { row: 4, col: 0 }
 */
export function clampPos(pos: CellPos, bounds: GridBounds): CellPos {
  return {
    row: clampNumber(pos.row, HEADER_ROW, Math.max(bounds.rows - 1, HEADER_ROW)),
    col: clampNumber(pos.col, 0, Math.max(bounds.cols - 1, 0)),
  };
}

/**
 * Moves by whole rows and columns, stopping at the edges. When `extend` is
 * set (Shift held) the move never enters the header row.
 * @example moveBy({ row: 0, col: 0 }, -1, 0, { rows: 5, cols: 3 }) // → { row: -1, col: 0 }
 */
export function moveBy(pos: CellPos, rows: number, cols: number, bounds: GridBounds, extend = false): CellPos {
  const moved = clampPos({ row: pos.row + rows, col: pos.col + cols }, bounds);
  if (extend && moved.row < 0 && bounds.rows > 0) return { row: 0, col: moved.col };
  return moved;
}

/**
 * Jumps to an edge: the start or end of the row, the first or last body row
 * of the column, or a corner of the grid.
 * @example moveTo({ row: 2, col: 1 }, 'colEnd', { rows: 5, cols: 3 }) // → { row: 4, col: 1 }
 */
export function moveTo(pos: CellPos, target: MoveTarget, bounds: GridBounds): CellPos {
  const lastRow = Math.max(bounds.rows - 1, 0);
  const lastCol = Math.max(bounds.cols - 1, 0);
  switch (target) {
    case 'rowStart':
      return { row: pos.row, col: 0 };
    case 'rowEnd':
      return { row: pos.row, col: lastCol };
    case 'colStart':
      return { row: 0, col: pos.col };
    case 'colEnd':
      return { row: lastRow, col: pos.col };
    case 'gridStart':
      return { row: 0, col: 0 };
    case 'gridEnd':
      return { row: lastRow, col: lastCol };
  }
}

/**
 * Tab order: right along the row, then to the first column of the next row;
 * Shift+Tab goes the other way. Stays put at the first and last cell.
 * @example tabFrom({ row: 0, col: 2 }, false, { rows: 5, cols: 3 }) // → { row: 1, col: 0 }
 */
export function tabFrom(pos: CellPos, backwards: boolean, bounds: GridBounds): CellPos {
  const lastCol = Math.max(bounds.cols - 1, 0);
  if (!backwards) {
    if (pos.col < lastCol) return { row: pos.row, col: pos.col + 1 };
    if (pos.row < bounds.rows - 1) return { row: pos.row + 1, col: 0 };
    return pos;
  }
  if (pos.col > 0) return { row: pos.row, col: pos.col - 1 };
  if (pos.row > HEADER_ROW) return { row: pos.row - 1, col: lastCol };
  return pos;
}

/**
 * The rectangle between the anchor (where Shift-selection began) and the
 * active cell, with the header row left out.
 * @example rangeOf({ row: 3, col: 2 }, { row: 1, col: 0 }) // → { top: 1, bottom: 3, left: 0, right: 2 }
 */
export function rangeOf(anchor: CellPos, active: CellPos): CellRange {
  return {
    top: Math.max(Math.min(anchor.row, active.row), 0),
    bottom: Math.max(anchor.row, active.row, 0),
    left: Math.min(anchor.col, active.col),
    right: Math.max(anchor.col, active.col),
  };
}

/** Whether a cell lies inside a range. */
export function inRange(range: CellRange, row: number, col: number): boolean {
  return row >= range.top && row <= range.bottom && col >= range.left && col <= range.right;
}

/** Number of cells in a range. */
export function rangeCellCount(range: CellRange): number {
  return (range.bottom - range.top + 1) * (range.right - range.left + 1);
}

/** Whether a range covers more than one cell. */
export function isMultiCell(range: CellRange): boolean {
  return rangeCellCount(range) > 1;
}

/**
 * Keeps a range inside the grid after rows were removed or columns hidden.
 * @example clampRange({ top: 2, bottom: 9, left: 0, right: 4 }, { rows: 5, cols: 3 }) // → { top: 2, bottom: 4, left: 0, right: 2 }
 */
export function clampRange(range: CellRange, bounds: GridBounds): CellRange {
  const lastRow = Math.max(bounds.rows - 1, 0);
  const lastCol = Math.max(bounds.cols - 1, 0);
  return {
    top: clampNumber(range.top, 0, lastRow),
    bottom: clampNumber(range.bottom, 0, lastRow),
    left: clampNumber(range.left, 0, lastCol),
    right: clampNumber(range.right, 0, lastCol),
  };
}
