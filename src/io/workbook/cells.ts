/**
 * Cell values and addresses for the exported workbook.
 *
 * Text is always written as a plain string cell (never a formula), with characters that
 * XML 1.0 cannot carry removed; formulas are built only from addresses, defined names and
 * the workbook's own words, never from text the user typed. A formula cell carries its
 * cached result so viewers that do not recalculate still show the number.
 */
import type { CellValue } from 'exceljs';

import { LONE_SURROGATE, NOT_IN_XML } from './text-changes.ts';

/** The same characters, for a test without the global flag's lastIndex. */
const HAS_NOT_IN_XML = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF\uD800-\uDFFF]/;

/**
 * A text cell value: the text as typed, minus characters XML cannot carry (half a surrogate
 * pair becomes U+FFFD); `text-changes.ts` lists every such text so the export can warn. A text that
 * begins with =, +, − or @ stays text: exceljs writes a string as a string cell, and this
 * module never turns text into a formula.
 * @example text('=HYPERLINK("x")') // '=HYPERLINK("x")' (a string cell)
 */
export function text(value: unknown): string {
  if (value === undefined || value === null) return '';
  const s = typeof value === 'string' ? value : String(value);
  return HAS_NOT_IN_XML.test(s) ? s.replace(NOT_IN_XML, '').replace(LONE_SURROGATE, '\uFFFD') : s;
}

/** A number cell value, or blank (null) when the number is missing or not finite. */
export function num(value: number | undefined | null): number | null {
  return typeof value === 'number' && Number.isFinite(value) ? value : null;
}

/**
 * A formula cell with its cached result. A result that is not a finite number is cached
 * as the error #N/A (what the formula gives when an input it needs is missing).
 */
export function formula(expression: string, result: number | string | boolean | undefined): CellValue {
  if (typeof result === 'number' && !Number.isFinite(result)) {
    return { formula: expression, result: { error: '#N/A' } } as unknown as CellValue;
  }
  if (result === undefined) return { formula: expression } as CellValue;
  return { formula: expression, result } as CellValue;
}

/** Column letters of a 1-based column number: 1 → A, 27 → AA. */
export function columnLetter(column: number): string {
  let n = column;
  let s = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

/** Absolute address on a sheet, e.g. abs('inputs', 3, 12) → "inputs!$C$12". */
export function abs(sheet: string, column: number, row: number): string {
  return `${sheet}!$${columnLetter(column)}$${row}`;
}

/** Relative address on the same sheet, e.g. rel(3, 12) → "C12". */
export function rel(column: number, row: number): string {
  return `${columnLetter(column)}${row}`;
}

/** Absolute range on a sheet over one column, e.g. "contributions!$F$5:$F$104". */
export function absColumnRange(sheet: string, column: number, firstRow: number, lastRow: number): string {
  const c = columnLetter(column);
  return `${sheet}!$${c}$${firstRow}:$${c}$${lastRow}`;
}

/** Absolute range on a sheet over one row, e.g. "inputs!$K$12:$R$12". */
export function absRowRange(sheet: string, firstColumn: number, lastColumn: number, row: number): string {
  return `${sheet}!$${columnLetter(firstColumn)}$${row}:$${columnLetter(lastColumn)}$${row}`;
}

/**
 * Shares formulas down a column: rows whose formula has the same template in an unbroken
 * run are written as one shared formula (the first row holds it, the others point at it),
 * which keeps a 5,000-row sheet small and quick to write. Every cell still has its own
 * cached result, and a spreadsheet shows each cell its own formula.
 *
 * A template uses {r} for the row of the cell itself and {i} for the row of the candidate on
 * the inputs sheet (the two differ by a fixed offset, so the references shift together).
 */
export class SharedColumnFormulas {
  private readonly runs = new Map<number, { template: string; master: string; lastRow: number }>();

  /**
   * @param inputsOffset row on the inputs sheet minus row on this sheet, for {i}
   * @param share write shared formulas (false: every cell its own full formula, for the
   *   streaming writer, which writes each row before it knows how far a run reaches)
   */
  constructor(
    private readonly inputsOffset: number,
    private readonly share = true,
  ) {}

  /** Templates split at their {r} and {i} marks (a handful of templates serve every row). */
  private readonly parts = new Map<string, string[]>();

  /** The formula text of a template at a row. */
  expand(template: string, row: number): string {
    let parts = this.parts.get(template);
    if (!parts) {
      parts = template.split(/(\{[ri]\})/);
      this.parts.set(template, parts);
    }
    const r = String(row);
    const i = String(row + this.inputsOffset);
    let out = '';
    for (const part of parts) out += part === '{r}' ? r : part === '{i}' ? i : part;
    return out;
  }

  /** The cell value at (column, row): a new formula, or a reference to the run's first formula. */
  cell(column: number, row: number, template: string, result: number | string | boolean): CellValue {
    if (!this.share) return formula(this.expand(template, row), result);
    const run = this.runs.get(column);
    const cached = typeof result === 'number' && !Number.isFinite(result) ? { error: '#N/A' } : result;
    if (run && run.template === template && run.lastRow === row - 1) {
      run.lastRow = row;
      return { sharedFormula: run.master, result: cached } as unknown as CellValue;
    }
    this.runs.set(column, { template, master: rel(column, row), lastRow: row });
    return formula(this.expand(template, row), result);
  }
}
