/**
 * Reading the first non-empty worksheet of an .xlsx workbook into raw rows, after the
 * archive has passed the checks of workbook-guard.ts. exceljs is loaded only here, with a
 * dynamic import. Formulas are never evaluated: a formula cell gives the result the
 * spreadsheet program stored with it, or, without one, its formula text (which then reads
 * as text, not as a number).
 */
import type { CellValue, Worksheet } from 'exceljs';
import { checkWorkbookArchive } from './workbook-guard.ts';
import { ImportRefusal, MAX_COLUMNS, MAX_ROWS, formatCount } from './limits.ts';
import type { RawCell, RawRow, RawTable } from './types.ts';
import { CANDIDATE_COLUMNS } from '../workbook/candidate-columns.ts';

/**
 * The candidate table inside a workbook this program exported (its inputs sheet holds
 * several tables one under another): the rows from the candidate header down to the
 * first empty row. Undefined for any other sheet.
 */
export function ownCandidateTable(rows: readonly RawRow[]): RawRow[] | undefined {
  const [first, second] = CANDIDATE_COLUMNS;
  const start = rows.findIndex((r) => r.cells[0] === first?.header && r.cells[1] === second?.header);
  if (start < 0) return undefined;
  const table = [rows[start] as RawRow];
  for (
    let i = start + 1;
    i < rows.length && (rows[i] as RawRow).rowNumber === (rows[i - 1] as RawRow).rowNumber + 1;
    i++
  )
    table.push(rows[i] as RawRow);
  return table;
}

function isoDate(d: Date): string {
  return Number.isNaN(d.getTime()) ? '' : d.toISOString().slice(0, 10);
}

/** One exceljs cell value as a raw cell. */
export function rawCellOf(value: CellValue): RawCell {
  if (value === null || value === undefined) return null;
  if (typeof value === 'number' || typeof value === 'boolean') return value;
  if (typeof value === 'string') return value === '' ? null : value;
  if (value instanceof Date) return isoDate(value);
  if (typeof value !== 'object') return String(value);
  if ('richText' in value && Array.isArray(value.richText))
    return value.richText.map((r) => String(r?.text ?? '')).join('') || null;
  if ('formula' in value || 'sharedFormula' in value) {
    const result = (value as { result?: unknown }).result;
    if (result === undefined || result === null) {
      const formula =
        (value as { formula?: unknown; sharedFormula?: unknown }).formula ??
        (value as { sharedFormula?: unknown }).sharedFormula;
      return `=${String(formula ?? '')}`;
    }
    return rawCellOf(result as CellValue);
  }
  if ('error' in value) return String((value as { error: unknown }).error);
  if ('text' in value) return rawCellOf((value as { text: CellValue }).text);
  return null;
}

function sheetRows(sheet: Worksheet, fileName: string): RawRow[] {
  const rows: RawRow[] = [];
  sheet.eachRow({ includeEmpty: false }, (row, rowNumber) => {
    const values = row.values as CellValue[] | undefined;
    if (!values) return;
    if (values.length - 1 > MAX_COLUMNS) {
      throw new ImportRefusal(
        `"${fileName}" has more than ${MAX_COLUMNS} columns in row ${rowNumber}; lists of up to ${MAX_COLUMNS} columns are accepted (delete unused columns)`,
      );
    }
    const cells: RawCell[] = [];
    let any = false;
    for (let i = 1; i < values.length; i++) {
      const cell = rawCellOf(values[i]);
      if (cell !== null && !(typeof cell === 'string' && cell.trim() === '')) any = true;
      cells.push(cell);
    }
    if (!any) return;
    if (rows.length >= MAX_ROWS) {
      throw new ImportRefusal(
        `"${fileName}" has more than ${formatCount(MAX_ROWS)} rows; lists of up to ${formatCount(MAX_ROWS)} rows are accepted (split the list)`,
      );
    }
    rows.push({ rowNumber, cells });
  });
  return rows;
}

/** Reads a workbook's first worksheet that holds data. Throws ImportRefusal with a message. */
export async function readXlsx(bytes: Uint8Array, fileName: string): Promise<RawTable> {
  await checkWorkbookArchive(bytes, fileName);
  const ExcelJS = (await import('exceljs')).default;
  const workbook = new ExcelJS.Workbook();
  try {
    // exceljs accepts any binary buffer; its type says Buffer.
    await workbook.xlsx.load(bytes as unknown as Parameters<typeof workbook.xlsx.load>[0], {
      ignoreNodes: [
        'dataValidations',
        'conditionalFormatting',
        'hyperlinks',
        'drawing',
        'picture',
        'legacyDrawing',
        'extLst',
      ],
    });
  } catch (e) {
    if (e instanceof ImportRefusal) throw e;
    const why = e instanceof Error ? e.message.split('\n')[0] : String(e);
    throw new ImportRefusal(
      `"${fileName}" could not be read as an .xlsx workbook (${why}); save it again as .xlsx, or as .csv`,
    );
  }
  const sheets = workbook.worksheets;
  const notes: string[] = [];
  for (const sheet of sheets) {
    const own = ownCandidateTable(sheetRows(sheet, fileName));
    if (!own) continue;
    const last = own[own.length - 1] as RawRow;
    notes.push(
      `Read the candidate table (rows ${own[0]?.rowNumber} to ${last.rowNumber}) of the sheet "${sheet.name}", written by this program.`,
    );
    const columnCount = own.reduce((w, r) => Math.max(w, r.cells.length), 0);
    return { fileName, kind: 'xlsx', sheetName: sheet.name, rows: own, columnCount, notes };
  }
  for (const sheet of sheets) {
    const rows = sheetRows(sheet, fileName);
    if (rows.length === 0) continue;
    const others = sheets.filter((s) => s !== sheet).map((s) => `"${s.name}"`);
    if (others.length > 0)
      notes.push(`Read the sheet "${sheet.name}"; the workbook's other sheets (${others.join(', ')}) were not read.`);
    const columnCount = rows.reduce((w, r) => Math.max(w, r.cells.length), 0);
    return { fileName, kind: 'xlsx', sheetName: sheet.name, rows, columnCount, notes };
  }
  throw new ImportRefusal(
    `"${fileName}" is empty: none of its sheets holds any data (a header row and one row per machine are expected)`,
  );
}
