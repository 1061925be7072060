/**
 * A supplier list's number cell, read by the field catalogue's one reader (the grid's and the
 * flags'): the file's decimal separator, thousands marks, the field's unit words, a currency
 * sign on money; a dash or nothing is empty; what cannot be read is kept as it is in the file.
 */
import { describe, expect, it } from 'vitest';
import { readNumberCell } from '../../../../src/io/import/read-cell.ts';
import type { ImportField } from '../../../../src/io/import/fields.ts';
import type { RawCell } from '../../../../src/io/import/types.ts';

const read = (cell: RawCell, decimal: '.' | ',', field: ImportField = 'dayRate') =>
  readNumberCell(cell, { rowNumber: 2, column: 0, columnName: 'x', field }, decimal);

describe('readNumberCell(cell, place, decimal) of the importer', () => {
  it.each([
    ['104.5', '.', 104.5],
    ['104,5', ',', 104.5],
    ['104.5', ',', 104.5], // a point and no comma in a decimal-comma file: a decimal point (data sheets print so)
    ['1,250', '.', 1250],
    ['1.250', ',', 1250],
    ['1.234,56', ',', 1234.56],
    ['1,234.56', '.', 1234.56],
    ['1 234,5', ',', 1234.5],
    ['12\u00a0500', '.', 12500],
    ['1’250', '.', 1250], // the typographic apostrophe as a thousands mark (Swiss practice)
    ['2.5e3', '.', 2500],
    ['.5', '.', 0.5],
  ] as const)('reads %j with a decimal %j as %d', (text, decimal, value) => {
    expect(read(text, decimal)).toEqual({ kind: 'value', value });
  });

  it('a comma in a decimal-point file is refused, not guessed: the file’s separator decides (the grid reads so too)', () => {
    expect(read('104,5', '.', 'lwaDb')).toMatchObject({ kind: 'unread', text: '104,5' });
  });

  it('ignores a unit the field takes after the number, and no other', () => {
    expect(read('104 dB(A)', '.', 'lwaDb')).toEqual({ kind: 'value', value: 104 });
    expect(read('7,5 kW', ',', 'netPowerKw')).toEqual({ kind: 'value', value: 7.5 });
    expect(read('104 W', '.', 'lwaDb')).toMatchObject({ kind: 'unread', text: '104 W' });
  });

  it('ignores a currency sign or code on money only', () => {
    expect(read('£1,250.00', '.')).toEqual({ kind: 'value', value: 1250 });
    expect(read('95 €', ',')).toEqual({ kind: 'value', value: 95 });
    expect(read('EUR 95,50', ',')).toEqual({ kind: 'value', value: 95.5 });
    expect(read('£95', '.', 'netPowerKw')).toMatchObject({ kind: 'unread', text: '£95' });
  });

  it.each(['', '  ', '-', '–', '—'])('%j is empty', (text) => {
    expect(read(text, '.')).toEqual({ kind: 'empty' });
  });

  it.each(['12O', 'n/a', '1.2.3', '1,2,3', '100-110', '<85', 'NaN', 'Infinity', '(12.00)'])(
    '%j is unread, its text kept, and says it is not a number',
    (text) => {
      const r = read(text, '.');
      expect(r).toMatchObject({ kind: 'unread', text });
      expect(r.kind === 'unread' && r.problem).toMatch(/is not a number/);
    },
  );

  it('a formula without its stored value says so', () => {
    expect(read('=1+2', '.')).toMatchObject({ kind: 'unread', text: '=1+2' });
    const r = read('=1+2', '.');
    expect(r.kind === 'unread' && r.problem).toMatch(/is a formula without a stored value/);
  });

  it('a stored number is taken as it is; a boolean is unread', () => {
    expect(read(101.3, ',')).toEqual({ kind: 'value', value: 101.3 });
    expect(read(null, '.')).toEqual({ kind: 'empty' });
    expect(read(true, '.')).toMatchObject({ kind: 'unread', text: 'TRUE' });
  });
});
