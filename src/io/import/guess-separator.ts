/**
 * Guessing a delimited text file's decimal separator from its cells, before any cell is read.
 * The cells are then read by the field catalogue's one reader (`ledger/catalogue/read-number.ts`)
 * with the separator guessed or chosen.
 */
import type { DecimalSeparator } from '../../ledger/catalogue/index.ts';
import type { RawCell } from './types.ts';

/** A comma or point used once as a decimal mark: not followed by exactly three digits, so not a thousands mark. */
const ONLY_DECIMAL_DOT = /^[+-]?\d+\.(?:\d{1,2}|\d{4,})$/;
const ONLY_DECIMAL_COMMA = /^[+-]?\d+,(?:\d{1,2}|\d{4,})$/;

/**
 * Guesses a text file's decimal separator from its cells: counts cells that can only be
 * read with a decimal comma ("104,5") against those that can only be read with a point
 * ("104.5"). A semicolon-delimited file with no evidence either way gets a comma (the
 * usual pairing in continental European spreadsheets); anything else a point.
 * O(cells).
 * @example guessDecimalSeparator([['104,5', '98,2']]) // ","
 */
export function guessDecimalSeparator(rows: readonly (readonly RawCell[])[], delimiter?: string): DecimalSeparator {
  let comma = 0;
  let point = 0;
  for (const row of rows) {
    for (const cell of row) {
      if (typeof cell !== 'string') continue;
      const t = cell.trim();
      if (t.length > 40) continue;
      if (ONLY_DECIMAL_COMMA.test(t)) comma++;
      else if (ONLY_DECIMAL_DOT.test(t)) point++;
    }
  }
  if (comma > point) return ',';
  if (point > comma) return '.';
  return delimiter === ';' ? ',' : '.';
}
