/**
 * Building blocks for input columns: text, number, choice, boolean and time cells, each
 * reading typed text with the project's decimal separator and writing it at a field path.
 */
import type { LedgerColumn, WriteOutcome } from './column.ts';
import {
  acceptedFor,
  formatNumber,
  readBoolean,
  readChoice,
  readNumberCell,
  readTime,
  type DecimalSeparator,
  type NumberRule,
} from './parse.ts';
import { getPath, setPath } from './column.ts';
import { PERIOD_TIMES } from '../../ledger/catalogue/index.ts';

type Base = { id: string; header: string; unit?: string; width?: number; describe?: string };

/** A free-text column; anything typed is accepted. `required` refuses an empty cell. */
export function textColumn<Row>(base: Base & { field: string; required?: string }): LedgerColumn<Row> {
  return {
    ...base,
    kind: 'text',
    editable: true,
    align: 'start',
    value: (row) => String(getPath(row, base.field) ?? ''),
    display: (row) => String(getPath(row, base.field) ?? ''),
    write(row, text): WriteOutcome<Row> {
      const t = text.trim();
      if (t === '' && base.required) return { row, failure: { problem: 'is empty', accepted: base.required } };
      return { row: setPath(row, base.field, t) };
    },
  };
}

/**
 * A number column. Unreadable text sets the field to NaN (results depending on it are not
 * computed) and reports the problem. An empty cell removes an optional value, or is a
 * problem for a required one.
 */
export function numberColumn<Row>(
  base: Base & { field: string; optional?: boolean; decimals?: number; rule: NumberRule },
  separator: DecimalSeparator,
  /** Further change to the row after a successful write (e.g. switching the cost basis). */
  after?: (row: Row, value: number | undefined) => Row,
): LedgerColumn<Row> {
  return {
    ...base,
    kind: 'number',
    editable: true,
    align: 'end',
    describe: base.describe ?? acceptedFor(base.rule.accepted, separator),
    value: (row) => {
      const v = getPath(row, base.field);
      return typeof v === 'number' && !Number.isNaN(v) ? v : undefined;
    },
    display: (row) => {
      const v = getPath(row, base.field);
      return typeof v === 'number' ? formatNumber(v, separator, base.decimals ?? 6) : '';
    },
    write(row, text): WriteOutcome<Row> {
      if (text.trim() === '' && base.optional) {
        const cleared = setPath(row, base.field, undefined);
        return { row: after ? after(cleared, undefined) : cleared };
      }
      const reading = readNumberCell(text, separator, base.rule);
      if (!reading.ok) {
        return {
          row: setPath(row, base.field, NaN),
          failure: { problem: reading.problem, accepted: reading.accepted },
        };
      }
      const written = setPath(row, base.field, reading.value);
      return { row: after ? after(written, reading.value) : written };
    },
  };
}

/** A column choosing one of a fixed list. Unreadable text leaves the stored value as it was. */
export function choiceColumn<Row, T extends string>(
  /** `optional`: an empty cell removes the value (the model's default applies). */
  base: Base & { field: string; optional?: boolean },
  choices: readonly { value: T; label: string }[],
  after?: (row: Row, value: T) => Row,
): LedgerColumn<Row> {
  const labelOf = (v: unknown) => choices.find((c) => c.value === v)?.label ?? String(v ?? '');
  return {
    ...base,
    kind: 'choice',
    editable: true,
    align: 'start',
    choices: choices.map((c) => ({ value: c.value, label: c.label })),
    describe: base.describe ?? `one of ${choices.map((c) => c.label).join(', ')}`,
    value: (row) => labelOf(getPath(row, base.field)),
    display: (row) => labelOf(getPath(row, base.field)),
    write(row, text): WriteOutcome<Row> {
      if (base.optional && text.trim() === '') return { row: setPath(row, base.field, undefined) };
      const reading = readChoice(text, choices);
      if (!reading.ok) return { row, failure: { problem: reading.problem, accepted: reading.accepted } };
      const written = setPath(row, base.field, reading.value);
      return { row: after ? after(written, reading.value) : written };
    },
  };
}

/** A yes/no column. */
export function booleanColumn<Row>(
  base: Base & { field: string },
  after?: (row: Row, value: boolean) => Row,
): LedgerColumn<Row> {
  return {
    ...base,
    kind: 'boolean',
    editable: true,
    align: 'start',
    describe: base.describe ?? 'yes or no',
    value: (row) => getPath(row, base.field) === true,
    display: (row) => (getPath(row, base.field) === true ? 'yes' : 'no'),
    write(row, text): WriteOutcome<Row> {
      const reading = readBoolean(text);
      if (!reading.ok) return { row, failure: { problem: reading.problem, accepted: reading.accepted } };
      const written = setPath(row, base.field, reading.value);
      return { row: after ? after(written, reading.value) : written };
    },
  };
}

/** A time-of-day column ("HH:MM"). */
export function timeColumn<Row>(base: Base & { field: string; accepted?: string }): LedgerColumn<Row> {
  const { accepted, ...column } = base;
  return {
    ...column,
    kind: 'text',
    editable: true,
    align: 'end',
    describe: base.describe ?? PERIOD_TIMES.start.accepted,
    value: (row) => String(getPath(row, base.field) ?? ''),
    display: (row) => String(getPath(row, base.field) ?? ''),
    write(row, text): WriteOutcome<Row> {
      const reading = readTime(text, accepted);
      if (!reading.ok) return { row, failure: { problem: reading.problem, accepted: reading.accepted } };
      return { row: setPath(row, base.field, reading.value) };
    },
  };
}
