/**
 * Reading what a user typed or pasted into a cell. Numbers follow the project's decimal
 * separator; a reading either succeeds with a value or says what is wrong and what is
 * accepted, so the caller can keep the text and show the message.
 */
import { PERIOD_TIMES } from '../../ledger/catalogue/index.ts';

/** The decimal separator a project expects in typed and pasted numbers. */
export type DecimalSeparator = '.' | ',';

/** The outcome of reading one cell's text. */
export type Reading<T> =
  | { ok: true; value: T }
  | {
      ok: false;
      /** What is wrong, e.g. "is not a number". */
      problem: string;
      /** What would be accepted, e.g. "use dB, e.g. 104.5". */
      accepted: string;
    };

export const ok = <T>(value: T): Reading<T> => ({ ok: true, value });
export const fail = <T>(problem: string, accepted: string): Reading<T> => ({ ok: false, problem, accepted });

const PLAIN_NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
const GROUPED_POINT = /^[+-]?\d{1,3}(,\d{3})+(\.\d+)?$/; // 12,500.75
const GROUPED_COMMA = /^[+-]?\d{1,3}(\.\d{3})+(,\d+)?$/; // 12.500,75
const SPACES = /[\s\u00a0\u202f']/g; // spaces, no-break spaces and the apostrophe used as thousands marks
/** Spaces or apostrophes only between groups of three digits of the whole part: "12 500", "1'250'000,5". */
const MARKED_THOUSANDS = /^[+-]?\d{1,3}(?:[\s\u00a0\u202f']\d{3})+(?:[.,]\d*)?$/;

/**
 * Reads a number written with the given decimal separator, or undefined when the text is
 * not one. Thousands marks (spaces, apostrophes, or the other separator) are allowed only
 * between groups of three digits of the whole part; "10 4" or "1'0'4" is not read. With a decimal comma, a number with a point and no comma
 * (e.g. "104.5", as many data sheets print) is read as a decimal point too.
 *
 * @example readNumber('104,5', ',') // 104.5
 * @example readNumber('1.250,5', ',') // 1250.5
 * @example readNumber('104,5', '.') // undefined
 * @example readNumber('10 4', '.') // undefined (kept as typed and marked)
 */
export function readNumber(text: string, separator: DecimalSeparator): number | undefined {
  let t = text.trim().replace(/^\u2212/, '-');
  if (t === '') return undefined;
  if (/[\s\u00a0\u202f']/.test(t)) {
    // A mark anywhere else ("10 4", "1'0'4") is not a thousands mark: the text is not read.
    if (!MARKED_THOUSANDS.test(t)) return undefined;
    t = t.replace(SPACES, '');
  }
  if (separator === ',') {
    if (GROUPED_COMMA.test(t)) t = t.replace(/\./g, '').replace(',', '.');
    else if (t.includes(',')) {
      if (t.includes('.')) return undefined;
      t = t.replace(',', '.');
    }
  } else if (GROUPED_POINT.test(t)) {
    t = t.replace(/,/g, '');
  }
  if (!PLAIN_NUMBER.test(t)) return undefined;
  const value = Number(t);
  return Number.isFinite(value) ? value : undefined;
}

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

/** Options for {@link readNumberCell}. */
export interface NumberRule {
  /** Accepted input in words, written with a point; the project's separator replaces it, e.g. "use dB, e.g. 104.5". */
  accepted: string;
  min?: number;
  /** True when `min` itself is not allowed. */
  minExclusive?: boolean;
  max?: number;
  whole?: boolean;
  /** A unit or sign the user may type after the number, e.g. "dB", "%", "m". */
  suffixes?: readonly string[];
  /** Symbols the user may type before the number, e.g. currency signs. */
  prefixes?: readonly string[];
}

/** Rewrites an example "e.g. 104.5" for a project that writes decimal commas. */
export function acceptedFor(accepted: string, separator: DecimalSeparator): string {
  return separator === ',' ? accepted.replace(/(\d)\.(\d)/g, '$1,$2') : accepted;
}

/**
 * Reads a numeric cell: strips an allowed unit or currency sign, reads the number with
 * the project's separator, then checks range and wholeness.
 *
 * @example readNumberCell('104,5 dB', ',', { accepted: 'use dB, e.g. 104.5', suffixes: ['dB'] }) // { ok: true, value: 104.5 }
 */
export function readNumberCell(text: string, separator: DecimalSeparator, rule: NumberRule): Reading<number> {
  const accepted = acceptedFor(rule.accepted, separator);
  let t = text.trim();
  for (const s of rule.suffixes ?? []) {
    if (t.toLowerCase().endsWith(s.toLowerCase())) {
      t = t.slice(0, t.length - s.length).trim();
      break;
    }
  }
  for (const p of rule.prefixes ?? []) {
    if (t.startsWith(p)) {
      t = t.slice(p.length).trim();
      break;
    }
  }
  if (t === '') return fail('is empty', accepted);
  const value = readNumber(t, separator);
  if (value === undefined) {
    const hint =
      separator === '.' && /^\d+,\d{1,2}$/.test(t) ? 'is not a number with a decimal point' : 'is not a number';
    return fail(hint, accepted);
  }
  if (rule.whole && !Number.isInteger(value)) return fail('is not a whole number', accepted);
  if (rule.min !== undefined && (value < rule.min || (rule.minExclusive && value === rule.min))) {
    return fail('is out of range', accepted);
  }
  if (rule.max !== undefined && value > rule.max) return fail('is out of range', accepted);
  return ok(value);
}

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
