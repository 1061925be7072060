/**
 * Reads the register sheet of a register workbook back into machines, so a register edited
 * in a spreadsheet program comes back. Columns are found by their header words (or the words
 * an earlier version wrote). Text in a machine's number column is read as the grid reads it,
 * with the field catalogue's unit words and range ("104 dB" is 104); text that cannot be read
 * is kept as an unread cell and reported (`Row 7, Declared LWA (dB): "99?" is not a number
 * (use a sound power level in dB from 40 to 150, e.g. 104.5)`); nothing typed is dropped. A
 * choice is read by its value, its label or the words the catalogue lists for it; other words
 * are kept as written, for validation to mark.
 */
import ExcelJS from 'exceljs';
import type { RegisterMachine } from '../../ledger/register/model.ts';
import { REGISTER_COLUMNS, figureSourcesFromText, setPath, type RegisterColumn } from './register-columns.ts';
import { readNumberCell, readRule, type ChoiceField, type DecimalSeparator } from '../../ledger/catalogue/index.ts';
import { REGISTER_SHEET } from './write.ts';

export interface RegisterWorkbookRead {
  machines: RegisterMachine[];
  unreadCells: Record<string, string>;
  workingDaysPerYear?: number;
  operatorHoursPerDay?: number;
  problems: string[];
}

function plain(value: ExcelJS.CellValue): string | number | boolean | undefined {
  if (value === null || value === undefined) return undefined;
  if (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean') return value;
  if (value instanceof Date) return value.toISOString();
  if (typeof value === 'object') {
    if ('richText' in value && Array.isArray(value.richText)) return value.richText.map((r) => r.text).join('');
    if ('result' in value) return plain((value as { result?: ExcelJS.CellValue }).result ?? null);
    if ('text' in value && typeof (value as { text: unknown }).text === 'string')
      return (value as { text: string }).text;
  }
  return undefined;
}

/** A choice written by its value, its label or one of its words (any case); the text itself when none matches. */
function choiceValue(field: ChoiceField, text: string): string {
  const t = text.trim().toLowerCase();
  const found = field.choices.find(
    (c) => c.value.toLowerCase() === t || c.label.toLowerCase() === t || c.words.includes(t),
  );
  return found ? found.value : text;
}

/** What a number column's text stands for: the number read, or the problem with what is accepted. */
function numberFromText(col: RegisterColumn, text: string, separator: DecimalSeparator) {
  if (!col.number) return { ok: false as const, problem: 'is not a number', accepted: 'use a number, e.g. 104.5' };
  return readNumberCell(text, separator, readRule(col.number));
}

/**
 * Reads a register workbook. `separator` is the decimal separator of numbers written as text
 * (the register's setting); a number with a point is read either way.
 */
export async function readRegisterWorkbook(
  bytes: Uint8Array | ArrayBuffer,
  separator: DecimalSeparator = '.',
): Promise<RegisterWorkbookRead> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(bytes as ArrayBuffer);
  const out: RegisterWorkbookRead = { machines: [], unreadCells: {}, problems: [] };
  const ws = wb.getWorksheet(REGISTER_SHEET);
  if (!ws) {
    out.problems.push(
      `Workbook: no sheet named "${REGISTER_SHEET}" (use a workbook exported from the register, or import a supplier list)`,
    );
    return out;
  }
  let headerRow = 0;
  ws.eachRow((row, n) => {
    if (headerRow === 0 && plain(row.getCell(1).value) === 'Machine ID') headerRow = n;
    if (plain(row.getCell(1).value) === 'Working days a year') {
      const d = plain(row.getCell(2).value);
      const h = plain(row.getCell(4).value);
      if (typeof d === 'number') out.workingDaysPerYear = d;
      if (typeof h === 'number') out.operatorHoursPerDay = h;
    }
  });
  if (headerRow === 0) {
    out.problems.push(`Sheet "${REGISTER_SHEET}": no header row starting "Machine ID"`);
    return out;
  }
  const columns = new Map<number, RegisterColumn>();
  ws.getRow(headerRow).eachCell((cell, c) => {
    const words = String(plain(cell.value) ?? '').trim();
    const col = REGISTER_COLUMNS.find((x) => x.header === words || x.formerly?.includes(words));
    if (col) columns.set(c, col);
  });
  for (let n = headerRow + 1; n <= ws.rowCount; n++) {
    const row = ws.getRow(n);
    const target: Record<string, unknown> = {};
    const unread: [string, string][] = [];
    let any = false;
    for (const [c, col] of columns) {
      const v = plain(row.getCell(c).value);
      if (v === undefined || v === '') continue;
      any = true;
      if (col.path === 'figureSources') {
        const sources = figureSourcesFromText(String(v));
        if (sources) target.figureSources = sources;
      } else if (col.kind === 'number' && typeof v !== 'number') {
        const reading = numberFromText(col, String(v), separator);
        if (reading.ok) {
          setPath(target, col.path, reading.value);
          continue;
        }
        unread.push([col.path, String(v)]);
        out.problems.push(
          `Row ${n}, ${col.header}: ${JSON.stringify(String(v))} ${reading.problem} (${reading.accepted})`,
        );
        setPath(target, col.path, NaN);
      } else if (col.choice) {
        setPath(target, col.path, choiceValue(col.choice, String(v)));
      } else {
        setPath(target, col.path, col.kind === 'text' ? String(v) : v);
      }
    }
    if (!any) continue;
    const id = typeof target.id === 'string' && target.id !== '' ? target.id : `m${out.machines.length + 1}`;
    target.id = id;
    for (const [path, text] of unread) out.unreadCells[`machines/${id}/${path}`] = text;
    for (const [k, d] of [
      ['label', ''],
      ['category', ''],
      ['declaration', 'guaranteed'],
      ['lwaOrigin', 'declared'],
      ['character', 'none'],
      ['energy', 'other'],
      ['source', ''],
    ] as const) {
      if (target[k] === undefined) target[k] = d;
    }
    if (target.runningPerDay === undefined) target.runningPerDay = 0;
    if (Array.isArray(target.bandsDb)) {
      const b = target.bandsDb as unknown[];
      for (let i = 0; i < 8; i++) if (b[i] === undefined) b[i] = NaN;
    }
    const purchase = target.purchase as Record<string, unknown> | undefined;
    if (purchase) {
      purchase.price ??= NaN;
      purchase.resaleValue ??= 0;
      purchase.life ??= NaN;
      purchase.lifeUnit ??= 'years';
    }
    const hire = target.hire as Record<string, unknown> | undefined;
    if (hire) hire.dayRate ??= NaN;
    out.machines.push(target as unknown as RegisterMachine);
  }
  return out;
}
