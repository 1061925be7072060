/**
 * Reading one cell for one field, with the problem message when it cannot be read.
 * Messages follow one pattern: `Row 14, LWA: "12O" is not a number (use dB, e.g. 104.5)`.
 */
import { describeValue } from '../../core/input-error.ts';
import { fieldSpec, type FieldSpec, type ImportField } from './fields.ts';
import { MAX_CELL_CHARS } from './limits.ts';
import {
  CURRENCY_SIGNS,
  readNumberCell as readNumberText,
  type DecimalSeparator,
} from '../../ledger/catalogue/index.ts';
import type { RawCell } from './types.ts';

/** Where a cell is, for messages. */
export interface CellPlace {
  rowNumber: number;
  column: number;
  columnName: string;
  field: ImportField;
}

export type CellReading<T> =
  | { kind: 'empty' }
  | { kind: 'value'; value: T; note?: string }
  /** Could not be read: `text` is the cell exactly as in the file, `problem` the message. */
  | { kind: 'unread'; text: string; problem: string };

/** The cell's text exactly as in the file (numbers as JavaScript writes them). */
export function cellText(cell: RawCell): string {
  if (cell === null) return '';
  if (typeof cell === 'boolean') return cell ? 'TRUE' : 'FALSE';
  return String(cell);
}

/** `Row 14, LWA: ` — the start of every cell message. */
export function where(place: CellPlace): string {
  return `Row ${place.rowNumber}, ${place.columnName}: `;
}

function specOf(field: ImportField): FieldSpec {
  const spec = fieldSpec(field);
  if (!spec) throw new Error(`unknown import field ${field}`);
  return spec;
}

/** Reads a text field; text longer than MAX_CELL_CHARS is cut, with a note. */
export function readTextCell(cell: RawCell, place: CellPlace): CellReading<string> {
  const text = cellText(cell)
    .replace(/\u0000/g, '')
    .trim();
  if (text === '') return { kind: 'empty' };
  if (text.length > MAX_CELL_CHARS) {
    return {
      kind: 'value',
      value: text.slice(0, MAX_CELL_CHARS),
      note: `${where(place)}text of ${text.length} characters cut to ${MAX_CELL_CHARS}`,
    };
  }
  return { kind: 'value', value: text };
}

/** Texts that mean "nothing given" in a supplier list: a lone dash. */
const DASHES = new Set(['-', '–', '—']);

/**
 * What a cell holds for a number field: a stored number as it is; text read by the field
 * catalogue's reader (the file's decimal separator, thousands marks, the field's unit words, a
 * currency sign on money), its range checked by the caller so its message can name the range.
 */
function numberOf(
  cell: RawCell,
  decimal: DecimalSeparator,
  spec: FieldSpec,
): { kind: 'empty' } | { kind: 'number'; value: number } | { kind: 'unread'; text: string } {
  if (cell === null) return { kind: 'empty' };
  if (typeof cell === 'number')
    return Number.isFinite(cell) ? { kind: 'number', value: cell } : { kind: 'unread', text: String(cell) };
  if (typeof cell === 'boolean') return { kind: 'unread', text: cellText(cell) };
  const text = cell.trim();
  if (text === '' || DASHES.has(text)) return { kind: 'empty' };
  const reading = readNumberText(cell, decimal, {
    accepted: '',
    suffixes: spec.money ? CURRENCY_SIGNS : (spec.units ?? []),
    ...(spec.money ? { prefixes: CURRENCY_SIGNS } : {}),
  });
  return reading.ok ? { kind: 'number', value: reading.value } : { kind: 'unread', text: cell };
}

/** Reads a number field, checking its range. */
export function readNumberCell(cell: RawCell, place: CellPlace, decimal: DecimalSeparator): CellReading<number> {
  const spec = specOf(place.field);
  const accepted = spec.accepted ?? 'a number';
  const reading = numberOf(cell, decimal, spec);
  if (reading.kind === 'empty') return { kind: 'empty' };
  if (reading.kind === 'unread') {
    const text = reading.text;
    const why = text.trimStart().startsWith('=')
      ? 'is a formula without a stored value, not a number'
      : 'is not a number';
    return { kind: 'unread', text, problem: `${where(place)}${describeValue(text)} ${why} (use ${accepted})` };
  }
  const value = reading.value;
  const belowMin = spec.min !== undefined && (spec.minExclusive ? value <= spec.min : value < spec.min);
  const aboveMax = spec.max !== undefined && value > spec.max;
  if (belowMin || aboveMax) {
    const hint =
      place.field === 'lwaDb' && value > 0 && value < spec.min!
        ? '; a sound power in watts belongs in a "Sound power, W" column'
        : '';
    return {
      kind: 'unread',
      text: cellText(cell),
      problem: `${where(place)}${describeValue(typeof cell === 'number' ? cell : cellText(cell))} is out of range (use ${accepted}${rangeWords(spec)}${hint})`,
    };
  }
  return { kind: 'value', value };
}

function rangeWords(spec: FieldSpec): string {
  if (spec.money) return '';
  if (spec.min !== undefined && spec.max !== undefined && !/from|between|greater|above/.test(spec.accepted ?? '')) {
    return `; accepted ${spec.minExclusive ? 'above' : 'from'} ${spec.min} to ${spec.max}`;
  }
  return '';
}

/** Reads a choice field by its words (case and spacing ignored). */
export function readChoiceCell(cell: RawCell, place: CellPlace): CellReading<string> {
  const spec = specOf(place.field);
  const text = cellText(cell).trim();
  if (text === '' || text === '-' || text === '–' || text === '—') return { kind: 'empty' };
  const key = text.toLowerCase().replace(/[\s_-]+/g, ' ');
  for (const choice of spec.choices ?? []) {
    if (choice.value === key || choice.words.includes(key)) return { kind: 'value', value: choice.value };
  }
  const list = (spec.choices ?? []).map((c) => c.value).join(', ');
  return {
    kind: 'unread',
    text: cellText(cell),
    problem: `${where(place)}${describeValue(text)} is not a known word (use one of ${list})`,
  };
}
