/**
 * Reads the candidates table back from a workbook this module exported (the inputs sheet),
 * so a list edited in a spreadsheet program can come back into the ledger. Columns are found
 * by their header words, not their position. A number column holding text keeps the text and
 * reports a problem (`Row 14, Declared LWA (dB): "12O" is not a number (use dB, e.g. 104.5)`);
 * nothing the user typed is dropped. Formulas count as their cached result; rich text as
 * its plain text.
 */
import ExcelJS from 'exceljs';
import type { Candidate } from '../../ledger/model/model.ts';
import { CANDIDATE_COLUMNS, type CandidateColumn } from './candidate-columns.ts';
import { INPUTS } from './inputs-sheet.ts';

export interface CandidateReadProblem {
  row: number;
  column: string;
  message: string;
}

export interface CandidateTableRead {
  candidates: Candidate[];
  /** Text found in number cells, keyed as the project's unread cells ("candidates/<id>/<field>"). */
  unreadCells: Record<string, string>;
  problems: CandidateReadProblem[];
}

/** Text columns that every candidate has (blank reads as the empty string). */
const REQUIRED_TEXT = new Set([
  'id',
  'dutyId',
  'label',
  'category',
  'declaration',
  'lwaOrigin',
  'source',
  'character',
  'energy',
]);

/** The plain value of a cell: formulas give their cached result, rich text its text. */
function plainValue(value: ExcelJS.CellValue): string | number | boolean | undefined {
  if (value === null || value === undefined) return undefined;
  if (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean') return value;
  if (value instanceof Date) return value.toISOString();
  if (typeof value === 'object') {
    if ('richText' in value && Array.isArray(value.richText)) return value.richText.map((r) => r.text).join('');
    if ('result' in value) return plainValue((value as { result?: ExcelJS.CellValue }).result ?? null);
    if ('text' in value && typeof (value as { text: unknown }).text === 'string')
      return (value as { text: string }).text;
    if ('error' in value) return undefined;
  }
  return undefined;
}

function matchColumns(header: ExcelJS.Row): Map<number, CandidateColumn> {
  const found = new Map<number, CandidateColumn>();
  header.eachCell((cell, column) => {
    const words = String(plainValue(cell.value) ?? '').trim();
    // Longest header first, so "Hire per day" does not match a longer header's column.
    const col = [...CANDIDATE_COLUMNS]
      .sort((a, b) => b.header.length - a.header.length)
      .find((c) => words === c.header || words.startsWith(`${c.header} (`) || c.formerly?.includes(words) === true);
    if (col && ![...found.values()].includes(col)) found.set(column, col);
  });
  return found;
}

/**
 * Reads the candidates table of an exported workbook.
 * @example (await readCandidateTable(await exportWorkbook(p, { evaluation }))).candidates.length // p.candidates.length
 */
export async function readCandidateTable(bytes: Uint8Array | ArrayBuffer): Promise<CandidateTableRead> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(bytes as ArrayBuffer);
  const ws = wb.getWorksheet(INPUTS);
  const out: CandidateTableRead = { candidates: [], unreadCells: {}, problems: [] };
  if (!ws) {
    out.problems.push({
      row: 0,
      column: '',
      message: `Workbook: no sheet named "${INPUTS}" (use a workbook exported by the ledger)`,
    });
    return out;
  }
  let headerRow = 0;
  ws.eachRow((row, n) => {
    if (headerRow === 0 && plainValue(row.getCell(1).value) === 'Candidate ID') headerRow = n;
  });
  if (headerRow === 0) {
    out.problems.push({
      row: 0,
      column: '',
      message: `Sheet "${INPUTS}": no candidates table (a header row starting "Candidate ID")`,
    });
    return out;
  }
  const columns = matchColumns(ws.getRow(headerRow));
  for (let n = headerRow + 1; n <= ws.rowCount; n++) {
    const row = ws.getRow(n);
    const target: Record<string, unknown> = {};
    let any = false;
    for (const [column, col] of columns) {
      const v = plainValue(row.getCell(column).value);
      if (v === undefined || v === '') continue;
      any = true;
      if (col.kind === 'number' && typeof v !== 'number') {
        const typed = String(v);
        const id = String(
          plainValue(row.getCell([...columns].find(([, c]) => c.field === 'id')?.[0] ?? 1).value) ?? '',
        );
        out.unreadCells[`candidates/${id}/${col.field}`] = typed;
        out.problems.push({
          row: n,
          column: col.header,
          message: `Row ${n}, ${col.header}: ${JSON.stringify(typed)} is not a number (use a number, e.g. 104.5)`,
        });
        col.set(target, NaN);
        continue;
      }
      if (col.kind === 'boolean' && typeof v !== 'boolean') {
        const word = String(v).trim().toLowerCase();
        col.set(target, word === 'true' || word === 'yes' || word === '1');
        continue;
      }
      col.set(target, col.kind === 'text' ? String(v) : v);
    }
    if (!any) break;
    for (const f of REQUIRED_TEXT) if (target[f] === undefined) target[f] = '';
    if (Array.isArray(target.bandsDb)) {
      const bands = target.bandsDb as unknown[];
      for (let b = 0; b < 8; b++) if (bands[b] === undefined) bands[b] = NaN;
    }
    if (target.cost === undefined) target.cost = { kind: 'hire', dayRate: NaN };
    if (target.runningPerDay === undefined) target.runningPerDay = 0;
    if (target.fixedCharges === undefined) target.fixedCharges = 0;
    out.candidates.push(target as unknown as Candidate);
  }
  return out;
}
