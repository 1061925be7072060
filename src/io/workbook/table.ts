/**
 * A small table writer for the workbook: a section title, a styled header row, data rows,
 * borders, number formats, and the input fill on the columns a reviewer may change.
 */
import type { CellValue, Style, Worksheet } from 'exceljs';
import {
  CELL_BORDER,
  INPUT_FILL,
  CORE_FILL,
  STAND_IN_FILL,
  STAND_IN_FONT,
  styleHeaderRow,
  writeSection,
} from './styles.ts';
import { columnLetter } from './cells.ts';

/**
 * One style object per (role, number format), shared by every cell that uses it: exceljs
 * recognises a style object it has seen and skips re-serialising it, which keeps a
 * 5,000-row export fast. Cells holding a shared style must not have single properties
 * (fill, font…) changed afterwards; assign a whole style instead.
 */
const sharedStyles = new Map<string, Partial<Style>>();

export function sharedStyle(role: TableColumn['role'], numFmt?: string, wrap = false): Partial<Style> {
  const key = `${role}\u0000${numFmt ?? ''}\u0000${wrap}`;
  let style = sharedStyles.get(key);
  if (!style) {
    // Top-aligned, so a row made taller by one wrapped cell reads across from its top.
    style = { border: CELL_BORDER, alignment: wrap ? { wrapText: true, vertical: 'top' } : { vertical: 'top' } };
    if (role === 'input') style.fill = INPUT_FILL;
    else if (role === 'core') style.fill = CORE_FILL;
    else if (role === 'stand-in') {
      style.fill = STAND_IN_FILL;
      style.font = STAND_IN_FONT;
    }
    if (numFmt) style.numFmt = numFmt;
    // Frozen: setting cell.fill/font/numFmt on a cell that holds it throws instead of
    // silently restyling every other cell that shares it.
    Object.freeze(style);
    sharedStyles.set(key, style);
  }
  return style;
}

/** Characters of text per unit of column width, roughly, at the default font. */
const CHARACTERS_PER_WIDTH = 1.1;
/** Height of one line of text, points; and the padding of a row. */
const LINE_HEIGHT_PT = 13;
const ROW_PADDING_PT = 3;

/** The text a cell shows: its value, or a formula's cached result. */
function shownText(value: CellValue | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'object' && !(value instanceof Date)) {
    const result = (value as { result?: unknown }).result;
    return result === undefined || result === null || typeof result === 'object' ? '' : String(result);
  }
  return String(value);
}

/**
 * The height a row needs so that its wrapped text shows in full, or undefined for one line:
 * spreadsheet programs do not all fit row heights on opening a file, and a wrapped line
 * would otherwise print over the next row.
 */
function wrappedHeight(
  values: readonly CellValue[],
  wrapped: readonly { j: number; chars: number }[],
): number | undefined {
  let lines = 1;
  for (const { j, chars } of wrapped) lines = Math.max(lines, Math.ceil(shownText(values[j]).length / chars));
  return lines > 1 ? lines * LINE_HEIGHT_PT + ROW_PADDING_PT : undefined;
}

export interface TableColumn {
  header: string;
  /**
   * 'input': the project's data (input fill); 'core': a value the core computed (blue fill);
   * 'stand-in': the stand-in marker (amber, bold; written only where a stand-in applies);
   * 'formula' or 'text': derived.
   */
  role: 'input' | 'core' | 'stand-in' | 'formula' | 'text';
  numFmt?: string;
  /** Minimum column width, characters. */
  width?: number;
  /** Wrap long text in the cell. */
  wrap?: boolean;
}

export interface TablePlace {
  titleRow: number;
  headerRow: number;
  /** First data row (headerRow + 1). */
  firstRow: number;
  /** Last data row; firstRow − 1 when the table is empty. */
  lastRow: number;
}

/** Options of a table. */
export interface TableOptions {
  firstColumn?: number;
  sparse?: boolean;
  /**
   * Commit each row once written (streaming writer): for a sheet's last large table, when
   * nothing above it on the sheet changes afterwards and every column width is set.
   */
  commitRows?: boolean;
}

/** A table being written: its header is on the sheet; rows go below it one at a time. */
interface OpenTable {
  add(values: readonly CellValue[]): void;
  close(): TablePlace;
}

/** Writes a table's section title and header, and returns the writer of its rows. */
function openTable(
  ws: Worksheet,
  startRow: number,
  title: string,
  columns: readonly TableColumn[],
  options: TableOptions,
): OpenTable {
  const firstColumn = options.firstColumn ?? 1;
  const width = firstColumn - 1 + columns.length;
  writeSection(ws, startRow, title, Math.min(width, 12));
  const headerRow = startRow + 1;
  const header = ws.getRow(headerRow);
  columns.forEach((col, j) => {
    header.getCell(firstColumn + j).value = col.header;
    const column = ws.getColumn(firstColumn + j);
    const wanted = col.width ?? 10;
    if ((column.width ?? 0) < wanted) column.width = wanted;
  });
  styleHeaderRow(ws, headerRow, firstColumn, width);
  // Tall enough for the longest header at its column width (about 1.1 characters per width unit).
  const lines = Math.max(
    2,
    ...columns.map((col, j) => {
      const w = ws.getColumn(firstColumn + j).width ?? 10;
      return Math.ceil(col.header.length / Math.max(4, w * 0.95));
    }),
  );
  header.height = Math.min(6, lines) * 13 + 4;
  const styles = columns.map((col) => sharedStyle(col.role, col.numFmt, col.wrap));
  const wrapped = columns.flatMap((c, j) =>
    c.wrap ? [{ j, chars: Math.max(4, (ws.getColumn(firstColumn + j).width ?? 10) * CHARACTERS_PER_WIDTH) }] : [],
  );
  let count = 0;
  return {
    add(values) {
      const row = ws.getRow(headerRow + 1 + count);
      count++;
      columns.forEach((_, j) => {
        const v = values[j];
        if (options.sparse && (v === undefined || v === null || v === '')) return;
        const cell = row.getCell(firstColumn + j);
        // An empty text leaves the cell blank: the streaming writer (strings in their cells)
        // could not write an empty string cell, so both writers give a blank one.
        if (v !== undefined && v !== '') cell.value = v;
        cell.style = styles[j] as Partial<Style>;
      });
      const height = wrapped.length > 0 ? wrappedHeight(values, wrapped) : undefined;
      if (height !== undefined) row.height = height;
      // The streaming writer turns a committed row (and every row above it) into XML at once and
      // lets it go; the in-memory workbook ignores the call.
      if (options.commitRows) row.commit();
    },
    close() {
      if (options.sparse && count > 0) inputLook(ws, columns, firstColumn, headerRow, count);
      return { titleRow: startRow, headerRow, firstRow: headerRow + 1, lastRow: headerRow + count };
    },
  };
}

/**
 * Blank cells are not written (a 5,000-row table stays quick to export); one conditional
 * format gives every input column the input look, blanks included. Columns of other
 * roles between them keep their own look: the format covers each unbroken run of inputs.
 */
function inputLook(
  ws: Worksheet,
  columns: readonly TableColumn[],
  firstColumn: number,
  headerRow: number,
  count: number,
): void {
  const runs: string[] = [];
  let runStart = -1;
  columns.forEach((c, j) => {
    const input = c.role === 'input';
    if (input && runStart < 0) runStart = j;
    const next = columns[j + 1];
    if (input && (!next || next.role !== 'input')) {
      runs.push(
        `${columnLetter(firstColumn + runStart)}${headerRow + 1}:${columnLetter(firstColumn + j)}${headerRow + count}`,
      );
      runStart = -1;
    }
  });
  if (runs.length > 0) {
    ws.addConditionalFormatting({
      ref: runs.join(' '),
      rules: [
        { type: 'expression', priority: 99, formulae: ['TRUE'], style: { fill: INPUT_FILL, border: CELL_BORDER } },
      ],
    });
  }
}

/**
 * Writes a table starting at `startRow` (section title), header on the next row, then one
 * row per entry. Returns where it went. Column widths only grow.
 */
export function writeTable(
  ws: Worksheet,
  startRow: number,
  title: string,
  columns: readonly TableColumn[],
  rows: Iterable<readonly CellValue[]>,
  options: TableOptions = {},
): TablePlace {
  const table = openTable(ws, startRow, title, columns, options);
  for (const values of rows) table.add(values);
  return table.close();
}

/** Rows written between two pauses of a streamed table. */
const ROWS_PER_PAUSE = 256;

/**
 * Writes a large table as `writeTable` does, its rows made one at a time (`rows` may be a
 * generator) and committed as written, with `pause` awaited every few hundred rows: the
 * streaming writer's pause lets the rows already written be compressed and let go, so memory
 * holds a few hundred rows, not the sheet. Without `pause` (the in-memory workbook) nothing waits.
 */
export async function writeStreamedTable(
  ws: Worksheet,
  startRow: number,
  title: string,
  columns: readonly TableColumn[],
  rows: Iterable<readonly CellValue[]>,
  options: TableOptions & { pause?: (() => Promise<void>) | undefined } = {},
): Promise<TablePlace> {
  const table = openTable(ws, startRow, title, columns, { ...options, commitRows: true });
  let n = 0;
  for (const values of rows) {
    table.add(values);
    if (options.pause && ++n % ROWS_PER_PAUSE === 0) await options.pause();
  }
  return table.close();
}

/** The rows of `items`, each made when the table writer reaches it (nothing kept after). */
export function* rowsOf<T>(
  items: readonly T[],
  make: (item: T, index: number) => readonly CellValue[],
): Generator<readonly CellValue[]> {
  for (let i = 0; i < items.length; i++) yield make(items[i] as T, i);
}
