/**
 * A small table writer for the workbook: a section title, a styled header row, data rows,
 * borders, number formats, and the input fill on the columns a reviewer may change.
 */
import type { CellValue, Worksheet } from 'exceljs';
import { CELL_BORDER, INPUT_FILL, CORE_FILL, styleHeaderRow, writeSection } from './styles.ts';

export interface TableColumn {
  header: string;
  /** 'input': the project's data (input fill); 'core': a value the core computed (blue fill); 'formula' or 'text': derived. */
  role: 'input' | 'core' | 'formula' | 'text';
  numFmt?: string;
  /** Minimum column width, characters. */
  width?: number;
}

export interface TablePlace {
  titleRow: number;
  headerRow: number;
  /** First data row (headerRow + 1). */
  firstRow: number;
  /** Last data row; firstRow − 1 when the table is empty. */
  lastRow: number;
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
  rows: readonly (readonly CellValue[])[],
  firstColumn = 1,
): TablePlace {
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
  rows.forEach((values, i) => {
    const row = ws.getRow(headerRow + 1 + i);
    columns.forEach((col, j) => {
      const cell = row.getCell(firstColumn + j);
      const v = values[j];
      if (v !== undefined) cell.value = v;
      cell.border = CELL_BORDER;
      if (col.role === 'input') cell.fill = INPUT_FILL;
      else if (col.role === 'core') cell.fill = CORE_FILL;
      if (col.numFmt) cell.numFmt = col.numFmt;
    });
  });
  return { titleRow: startRow, headerRow, firstRow: headerRow + 1, lastRow: headerRow + rows.length };
}
