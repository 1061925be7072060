/**
 * Finding the header row of a supplier list: the first row whose cells look like
 * headers, so title rows ("Hire catalogue 2024", a blank line, a date) above it are
 * skipped.
 *
 * A row looks like a header when it has at least two filled cells, almost all of them
 * text that is not a number, and either at least two of them suggest a field, or it is
 * about as wide as the rows below it (at least 70 % of the widest of the next five). Only the first 30 rows are searched. O(30 × columns).
 */
import { suggestField } from './suggest-mapping.ts';
import type { RawCell, RawRow } from './types.ts';

/** Rows searched for a header. */
export const HEADER_SEARCH_ROWS = 30;

function filled(cell: RawCell | undefined): boolean {
  return cell !== null && cell !== undefined && String(cell).trim() !== '';
}

function isNumberLike(cell: RawCell | undefined): boolean {
  if (typeof cell === 'number') return true;
  if (typeof cell !== 'string') return false;
  return /^[+-]?[£€$]?\s*[\d.,\s]+\s*[£€$%]?$/.test(cell.trim()) && /\d/.test(cell);
}

function width(row: RawRow | undefined): number {
  if (!row) return 0;
  let n = 0;
  for (const c of row.cells) if (filled(c)) n++;
  return n;
}

/**
 * The index (into `rows`) of the header row; 0 when no row looks like a header.
 * @example detectHeaderRow([{ rowNumber: 1, cells: ['Plant hire list'] }, { rowNumber: 3, cells: ['Model', 'LWA'] }, { rowNumber: 4, cells: ['X', 101] }]) // 1
 */
export function detectHeaderRow(rows: readonly RawRow[]): number {
  const limit = Math.min(rows.length, HEADER_SEARCH_ROWS);
  for (let i = 0; i < limit; i++) {
    const row = rows[i] as RawRow;
    const cells = row.cells.filter(filled);
    if (cells.length < 2) continue;
    const texts = cells.filter((c) => typeof c === 'string' && !isNumberLike(c));
    if (texts.length < Math.max(2, Math.ceil(cells.length * 0.8))) continue;
    const known = texts.filter((c) => suggestField(String(c)) !== null).length;
    if (known >= 2) return i;
    let widest = 0;
    for (let j = i + 1; j < Math.min(rows.length, i + 6); j++) widest = Math.max(widest, width(rows[j]));
    if (widest > 0 && cells.length >= widest * 0.7) return i;
  }
  return 0;
}
