/**
 * Reading what a user typed or pasted into a cell. Numbers follow the project's decimal
 * separator; a reading either succeeds with a value or says what is wrong and what is
 * accepted, so the caller can keep the text and show the message.
 */
import { PERIOD_TIMES } from '../../ledger/catalogue/index.ts';
import { fail, ok, type DecimalSeparator, type Reading } from '../../ledger/catalogue/read-number.ts';

export {
  acceptedFor,
  fail,
  ok,
  readNumber,
  readNumberCell,
  type DecimalSeparator,
  type ReadRule as NumberRule,
  type Reading,
} from '../../ledger/catalogue/read-number.ts';

/** Writes a number with the project's decimal separator and no thousands marks, so it pastes back unchanged. */
export function formatNumber(value: number | undefined, separator: DecimalSeparator, maxDecimals = 6): string {
  if (value === undefined || Number.isNaN(value)) return '';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : '−∞';
  const rounded = Number(value.toFixed(maxDecimals));
  const text = String(rounded);
  return separator === ',' ? text.replace('.', ',') : text;
}

/** Writes a computed figure with a fixed number of decimals, or "not computed" for NaN. */
export function formatFigure(value: number | undefined, separator: DecimalSeparator, decimals: number): string {
  if (value === undefined || Number.isNaN(value)) return NOT_COMPUTED;
  if (!Number.isFinite(value)) return value > 0 ? '∞' : '−∞';
  const text = value.toFixed(decimals).replace('-', '−');
  return separator === ',' ? text.replace('.', ',') : text;
}

/** Writes a sum of money with thousands marks, e.g. "12,500" (or "12 500" with a decimal comma). */
export function formatMoney(value: number | undefined, separator: DecimalSeparator): string {
  if (value === undefined || Number.isNaN(value)) return NOT_COMPUTED;
  const whole = Math.round(value);
  const grouped = Math.abs(whole)
    .toString()
    .replace(/\B(?=(\d{3})+(?!\d))/g, separator === ',' ? '\u202f' : ',');
  return (whole < 0 ? '−' : '') + grouped;
}

/** What a computed cell shows when an input it needs is missing or unreadable. */
export const NOT_COMPUTED = 'not computed';

/** Reads a time of day "HH:MM" (also "7:00" and "07.00"); `accepted` is the catalogue's words for the field. */
export function readTime(text: string, accepted = `use ${PERIOD_TIMES.start.accepted}`): Reading<string> {
  const m = /^(\d{1,2})[:.h](\d{2})$/.exec(text.trim());
  if (!m) return fail('is not a time', accepted);
  const h = Number(m[1]);
  const min = Number(m[2]);
  if (h > 24 || min > 59 || (h === 24 && min > 0)) return fail('is not a time', accepted);
  return ok(`${String(h).padStart(2, '0')}:${m[2]}`);
}

/** Reads yes/no words and marks for a boolean cell. */
export function readBoolean(text: string): Reading<boolean> {
  const t = text.trim().toLowerCase();
  if (['yes', 'y', 'true', '1', 'x', '✓', 'ja', 'oui', 'si', 'sí'].includes(t)) return ok(true);
  if (['no', 'n', 'false', '0', '', 'nein', 'non'].includes(t)) return ok(false);
  return fail('is not yes or no', 'use yes or no');
}

/**
 * Reads one of a list of choices by value or label, ignoring case and surrounding spaces;
 * the first words of exactly one label also choose it ("Weekday daytime" for
 * "Weekday daytime 07:00–19:00").
 */
export function readChoice<T extends string>(
  text: string,
  choices: readonly { value: T; label: string }[],
): Reading<T> {
  const t = text.trim().toLowerCase();
  const found = choices.find((c) => c.value.toLowerCase() === t || c.label.toLowerCase() === t);
  if (found) return ok(found.value);
  // the start of one label only, e.g. a period's name without its hours
  const starting = t === '' ? [] : choices.filter((c) => c.label.toLowerCase().startsWith(`${t} `));
  if (starting.length === 1) return ok(starting[0]!.value);
  return fail('is not one of the choices', `use one of ${choices.map((c) => c.label).join(', ')}`);
}

/** Quotes what the user typed for a message, e.g. "12O"; nothing typed reads as "nothing". */
export function quoteTyped(text: string): string {
  return text.trim() === '' ? 'nothing' : JSON.stringify(text);
}

/**
 * The message for an unreadable cell, in the one pattern the app uses:
 * `Row 14, LWA: "12O" is not a number (use dB, e.g. 104.5)`. A row with a name is named by
 * it first (a row number alone changes when the view is re-sorted):
 * `"Breaker 2 t" (row 14), LWA: …`; an empty cell reads `…, Duty: not filled in (…)`.
 */
export function cellMessage(
  rowNumber: number,
  columnHeader: string,
  text: string,
  problem: string,
  accepted: string,
  rowName = '',
): string {
  const where = rowName.trim() === '' ? `Row ${rowNumber}` : `${JSON.stringify(rowName.trim())} (row ${rowNumber})`;
  if (text.trim() === '' && problem === 'is empty') return `${where}, ${columnHeader}: not filled in (${accepted})`;
  return `${where}, ${columnHeader}: ${quoteTyped(text)} ${problem} (${accepted})`;
}
