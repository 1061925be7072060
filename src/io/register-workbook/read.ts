/**
 * Reads the register sheet of a register workbook back into machines, so a register edited
 * in a spreadsheet program comes back. Columns are found by their header words. A number
 * column holding text keeps the text as an unread cell and reports it
 * (`Row 7, LWA (dB): "99?" is not a number (use a number, e.g. 104.5)`); nothing typed is dropped.
 */
import ExcelJS from 'exceljs';
import type { RegisterMachine } from '../../ledger/register/model.ts';
import { REGISTER_COLUMNS, figureSourcesFromText, setPath, type RegisterColumn } from './register-columns.ts';
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

/** Reads a register workbook. */
export async function readRegisterWorkbook(bytes: Uint8Array | ArrayBuffer): Promise<RegisterWorkbookRead> {
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
        unread.push([col.path, String(v)]);
        out.problems.push(
          `Row ${n}, ${col.header}: ${JSON.stringify(String(v))} is not a number (use a number, e.g. 104.5)`,
        );
        setPath(target, col.path, NaN);
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
