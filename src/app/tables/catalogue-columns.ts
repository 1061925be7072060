/**
 * Grid columns built from the field catalogue (`ledger/catalogue`): the header, its short
 * description, the unit, the range and the unit words all come from there, so the machine
 * grid and the register grid read a value exactly as validation and the importer do.
 */
import type { ChoiceField, NumberField, TimeField } from '../../ledger/catalogue/index.ts';
import { MACHINE_NUMBERS, gridChoices, readRule } from '../../ledger/catalogue/index.ts';
import type { LedgerColumn } from './column.ts';
import type { DecimalSeparator, NumberRule } from './parse.ts';
import { formatNumber, readNumberCell } from './parse.ts';
import { choiceColumn, numberColumn, timeColumn } from './cells.ts';

/** A catalogue number as the grid's reading rule (the catalogue's one reader, also the register workbook's and the flags'). */
export const gridRule = (field: NumberField): NumberRule => readRule(field);

export interface ColumnPlace {
  /** Column id; the field's last path part when not given. */
  id?: string;
  /** Where the value lives in the row when it differs from the catalogue's path (the register keeps "hire.dayRate"). */
  path?: string;
  /** A header of the grid's own when the catalogue's reads differently there (the register's "Hire per day"). */
  header?: string;
  /** The unit shown under the header; money columns pass the project's currency. */
  unit?: string;
  width: number;
  optional?: boolean;
}

/** A number column of a catalogue field. */
export function catalogueNumberColumn<Row>(
  field: NumberField,
  separator: DecimalSeparator,
  place: ColumnPlace,
  after?: (row: Row, value: number | undefined) => Row,
): LedgerColumn<Row> {
  const path = place.path ?? field.path;
  const unit = place.unit ?? (field.money ? undefined : field.unit);
  return numberColumn<Row>(
    {
      id: place.id ?? path.split('.').pop()!,
      header: place.header ?? field.header,
      ...(unit ? { unit } : {}),
      field: path,
      ...(place.optional ? { optional: true } : {}),
      width: place.width,
      describe: field.describe,
      rule: gridRule(field),
    },
    separator,
    after,
  );
}

/** A time-of-day column of a catalogue field (a period's or a phase's start or end). */
export function catalogueTimeColumn<Row>(field: TimeField, width: number): LedgerColumn<Row> {
  return timeColumn<Row>({
    id: field.path,
    header: field.header,
    field: field.path,
    width,
    describe: field.describe,
    accepted: `use ${field.accepted}`,
  });
}

/** A choice column of a catalogue field. */
export function catalogueChoiceColumn<Row, T extends string>(
  field: ChoiceField<T>,
  width: number,
  after?: (row: Row) => Row,
): LedgerColumn<Row> {
  return choiceColumn<Row, T>(
    { id: field.path.split('.').pop()!, header: field.header, field: field.path, width, describe: field.describe },
    gridChoices(field),
    after,
  );
}

/**
 * Octave-band Lw as eight numbers separated by spaces or semicolons, each read with the
 * catalogue's band range and unit words. Text that is not eight readable bands is kept and
 * marked (the bands hold NaN meanwhile).
 */
export function bandsColumn<Row extends { bandsDb?: number[] }>(separator: DecimalSeparator): LedgerColumn<Row> {
  const field = MACHINE_NUMBERS.bandDb;
  const rule = gridRule(field);
  const accepted = `use eight levels in dB from ${field.min} to ${field.max}, for 63 Hz to 8 kHz, separated by spaces or semicolons, e.g. 98 101 104 103 100 97 92 86`;
  return {
    id: 'bandsDb',
    header: field.header,
    unit: field.unit,
    width: 200,
    kind: 'text',
    editable: true,
    align: 'start',
    field: 'bandsDb',
    describe: `${field.describe}; ${accepted}`,
    value: (row) => row.bandsDb?.join(' '),
    display: (row) => (row.bandsDb ? row.bandsDb.map((b) => formatNumber(b, separator, 1)).join(' ') : ''),
    write(row, text) {
      const t = text.trim();
      if (t === '') {
        const { bandsDb: _drop, ...rest } = row;
        return { row: rest as Row };
      }
      const readings = t.split(/[\s;]+/).map((p) => readNumberCell(p, separator, rule));
      const nan = [NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN];
      if (readings.length !== 8 || readings.some((r) => !r.ok && r.problem !== 'is out of range'))
        return { row: { ...row, bandsDb: nan }, failure: { problem: 'is not eight numbers', accepted } };
      if (readings.some((r) => !r.ok))
        return { row: { ...row, bandsDb: nan }, failure: { problem: 'has a band out of range', accepted } };
      return { row: { ...row, bandsDb: readings.map((r) => (r.ok ? r.value : NaN)) } };
    },
  };
}
