/**
 * Reading numbers typed in supplier lists: decimal point or decimal comma, thousands
 * separators, a unit after the number ("104 dB(A)", "7.5 kW") and a currency sign on
 * money ("£1,250.00", "95 €").
 */
import type { RawCell } from './types.ts';

export type DecimalSeparator = '.' | ',';

/** What a cell held, for a number field. */
export type NumberReading = { kind: 'empty' } | { kind: 'number'; value: number } | { kind: 'unread'; text: string };

const PLAIN_NUMBER = /^-?\d{1,15}(?:\.\d{1,15})?$/;
const PLAIN_INTEGER = /^-?\d{1,15}$/;
const PLAIN_COMMA_NUMBER = /^-?\d{1,15},\d{1,15}$/;
/** Texts that mean "nothing given": empty, or a lone dash. */
const EMPTY_TEXTS = new Set(['', '-', '–', '—']);
const SPACES = /[\s\u00a0\u2007\u2009\u202f]+/g;
const CURRENCY = /^(?:[£€$¥]|GBP|EUR|USD|CHF)\s*|\s*(?:[£€$¥]|GBP|EUR|USD|CHF)$/i;

// Thousands groups: "1,234,567" / "1.234.567" / "1 234 567" / "1'234'567".
const DOT_DECIMAL = /^[+-]?(?:\d{1,3}(?:[,' ’]\d{3})+|\d+)(?:\.\d+)?(?:e[+-]?\d+)?$|^[+-]?\.\d+(?:e[+-]?\d+)?$/i;
const COMMA_DECIMAL = /^[+-]?(?:\d{1,3}(?:[.' ’]\d{3})+|\d+)(?:,\d+)?(?:e[+-]?\d+)?$|^[+-]?,\d+$/i;
// The other separator used once as a decimal mark, unambiguous because not followed by exactly 3 digits.
const OTHER_DECIMAL_DOT = /^[+-]?\d+\.(?:\d{1,2}|\d{4,})$/;
const OTHER_DECIMAL_COMMA = /^[+-]?\d+,(?:\d{1,2}|\d{4,})$/;

function stripUnit(text: string, units: readonly string[]): string {
  const lower = text.toLowerCase();
  for (const unit of units) {
    const u = unit.toLowerCase();
    if (lower.endsWith(u)) {
      const rest = text.slice(0, text.length - u.length).trimEnd();
      // Only a unit after a number: "104 dB", not the word "dB" alone or "xdB".
      if (rest.length > 0 && /[\d.,]$/.test(rest)) return rest;
    }
  }
  return text;
}

/**
 * Reads a number from a cell.
 * @param decimal the file's decimal separator; the other mark is still read as a decimal
 *   mark when it cannot be a thousands separator ("104,5" in a decimal-point file).
 * @param units unit words that may follow the number and are ignored (longest first).
 * @param money a currency sign or code before or after the number is ignored.
 * @example readNumber('1.234,5', ',') // { kind: 'number', value: 1234.5 }
 * @example readNumber('104 dB(A)', '.', ['dB(A)']) // { kind: 'number', value: 104 }
 */
export function readNumber(
  cell: RawCell,
  decimal: DecimalSeparator,
  units: readonly string[] = [],
  money = false,
): NumberReading {
  if (cell === null) return { kind: 'empty' };
  if (typeof cell === 'number')
    return Number.isFinite(cell) ? { kind: 'number', value: cell } : { kind: 'unread', text: String(cell) };
  if (typeof cell === 'boolean') return { kind: 'unread', text: cell ? 'TRUE' : 'FALSE' };
  // Fast path for the common plain forms "104", "104.5", "-3" (and "104,5" with a decimal comma).
  if (decimal === '.' ? PLAIN_NUMBER.test(cell) : PLAIN_INTEGER.test(cell))
    return { kind: 'number', value: Number(cell) };
  if (decimal === ',' && PLAIN_COMMA_NUMBER.test(cell))
    return { kind: 'number', value: Number(cell.replace(',', '.')) };
  const original = cell;
  let text = cell.trim();
  if (EMPTY_TEXTS.has(text)) return { kind: 'empty' };
  if (money) text = text.replace(CURRENCY, '').trim();
  text = stripUnit(text, units);
  if (money) text = text.replace(CURRENCY, '').trim();
  text = text.replace(/^\((.*)\)$/, '-$1'); // accounting negative "(12.00)"
  const compact = text.replace(SPACES, ' ');
  let normal: string | undefined;
  if (decimal === '.') {
    if (DOT_DECIMAL.test(compact)) normal = compact.replace(/[,' ’]/g, '');
    else if (OTHER_DECIMAL_COMMA.test(compact)) normal = compact.replace(',', '.');
  } else {
    if (COMMA_DECIMAL.test(compact)) normal = compact.replace(/[.' ’]/g, '').replace(',', '.');
    else if (OTHER_DECIMAL_DOT.test(compact)) normal = compact;
  }
  if (normal === undefined) return { kind: 'unread', text: original };
  const value = Number(normal);
  return Number.isFinite(value) ? { kind: 'number', value } : { kind: 'unread', text: original };
}

/**
 * Guesses a text file's decimal separator from its cells: counts cells that can only be
 * read with a decimal comma ("104,5") against those that can only be read with a point
 * ("104.5"). A semicolon-delimited file with no evidence either way gets a comma (the
 * usual pairing in continental European spreadsheets); anything else a point.
 * O(cells).
 */
export function guessDecimalSeparator(rows: readonly (readonly RawCell[])[], delimiter?: string): DecimalSeparator {
  let comma = 0;
  let point = 0;
  for (const row of rows) {
    for (const cell of row) {
      if (typeof cell !== 'string') continue;
      const t = cell.trim();
      if (t.length > 40) continue;
      if (OTHER_DECIMAL_COMMA.test(t)) comma++;
      else if (OTHER_DECIMAL_DOT.test(t)) point++;
    }
  }
  if (comma > point) return ',';
  if (point > comma) return '.';
  return delimiter === ';' ? ',' : '.';
}
