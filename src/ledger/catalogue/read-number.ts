/**
 * Reading a number a user typed, pasted or imported as text: the decimal separator, thousands
 * marks, the unit words and currency signs a field allows, its range. One reader for the
 * grids (`app/tables`), the register workbook (`io/register-workbook`) and the command line's
 * flags (`cli/flags.ts`), so each accepts and refuses the same text with the same words;
 * `readRule` turns a catalogue field into its rule.
 */
import { CURRENCY_SIGNS } from './suffixes.ts';
import type { NumberField } from './field.ts';

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
const SPACES = /[\s\u00a0\u202f'\u2019]/g; // spaces (no-break, thin, figure) and the apostrophes used as thousands marks
/** Spaces or apostrophes only between groups of three digits of the whole part: "12 500", "1'250'000,5", "1’250". */
const MARKED_THOUSANDS = /^[+-]?\d{1,3}(?:[\s\u00a0\u202f'\u2019]\d{3})+(?:[.,]\d*)?$/;

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
  if (/[\s\u00a0\u202f'\u2019]/.test(t)) {
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

/** Options for {@link readNumberCell}. */
export interface ReadRule {
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
export function readNumberCell(text: string, separator: DecimalSeparator, rule: ReadRule): Reading<number> {
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

/** A catalogue number as a reading rule: "use " + what is accepted, its range and unit words (or currency signs). */
export function readRule(field: NumberField): ReadRule {
  return {
    accepted: `use ${field.accepted}`,
    min: field.min,
    max: field.max,
    ...(field.aboveMin ? { minExclusive: true } : {}),
    ...(field.integer ? { whole: true } : {}),
    suffixes: field.money ? CURRENCY_SIGNS : field.suffixes,
    ...(field.money ? { prefixes: CURRENCY_SIGNS } : {}),
  };
}
