/**
 * Reading typed and pasted numbers with the project's decimal separator.
 * Writing conventions (decimal point vs decimal comma, thousands marks) are common
 * practice of spreadsheet locales; the check values below are those conventions.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  cellMessage,
  formatFigure,
  readBoolean,
  readChoice,
  readNumber,
  readNumberCell,
  readTime,
} from '../../../src/app/tables/parse.ts';

describe('readNumber', () => {
  it.each([
    // [text, separator, expected] — common practice of number writing in spreadsheet locales
    ['104.5', '.', 104.5],
    ['104,5', ',', 104.5],
    ['1,250.75', '.', 1250.75],
    ['1.250,75', ',', 1250.75],
    ['1 250,75', ',', 1250.75],
    ['-3,5', ',', -3.5],
    ['\u22123.5', '.', -3.5],
    ['104.5', ',', 104.5], // a data sheet's decimal point still reads in a comma project
    ['  98 ', '.', 98],
  ] as const)('readNumber(%j, %j) returns %d', (text, sep, expected) => {
    expect(readNumber(text, sep)).toBeCloseTo(expected, 10);
  });

  it.each([
    ['104,5', '.'],
    ['12O', '.'],
    ['', ','],
    ['1,2,3', ','],
    ['1.5,2', ','],
    ['abc', '.'],
    ['Infinity', '.'],
  ] as const)('readNumber(%j, %j) returns undefined', (text, sep) => {
    expect(readNumber(text, sep)).toBeUndefined();
  });
});

describe('readNumberCell', () => {
  const lwa = { accepted: 'use dB, e.g. 104.5', min: 0, max: 200, suffixes: ['dB'] };

  it('readNumberCell strips an allowed unit', () => {
    expect(readNumberCell('104,5 dB', ',', lwa)).toEqual({ ok: true, value: 104.5 });
  });

  it('readNumberCell reports "is not a number" with the accepted form in the project separator', () => {
    expect(readNumberCell('12O', ',', lwa)).toEqual({
      ok: false,
      problem: 'is not a number',
      accepted: 'use dB, e.g. 104,5',
    });
  });

  it('readNumberCell reports a range problem', () => {
    expect(readNumberCell('250', '.', lwa)).toMatchObject({ ok: false, problem: 'is out of range' });
  });

  it('readNumberCell refuses a fraction in a whole-number column', () => {
    expect(readNumberCell('1.5', '.', { accepted: 'use a whole number', whole: true })).toMatchObject({
      ok: false,
      problem: 'is not a whole number',
    });
  });

  it('readNumberCell names a decimal comma typed in a point project', () => {
    expect(readNumberCell('104,5', '.', lwa)).toMatchObject({
      ok: false,
      problem: 'is not a number with a decimal point',
    });
  });
});

describe('other readers', () => {
  it('readTime accepts 7:30 and writes 07:30', () => {
    expect(readTime('7:30')).toEqual({ ok: true, value: '07:30' });
  });
  it('readTime refuses 25:00', () => {
    expect(readTime('25:00').ok).toBe(false);
  });
  it('readBoolean reads yes and no', () => {
    expect(readBoolean('Yes')).toEqual({ ok: true, value: true });
    expect(readBoolean('no')).toEqual({ ok: true, value: false });
    expect(readBoolean('maybe').ok).toBe(false);
  });
  it('readChoice matches a label ignoring case', () => {
    expect(readChoice('Measured + K', [{ value: 'measured', label: 'measured + K' }])).toEqual({
      ok: true,
      value: 'measured',
    });
  });
  it('readChoice takes the first words of exactly one label (a period named without its hours)', () => {
    const periods = [
      { value: 't1', label: 'Weekday daytime 07:00–19:00' },
      { value: 't2', label: 'Weekday evening 19:00–23:00' },
    ];
    expect(readChoice('weekday daytime', periods)).toEqual({ ok: true, value: 't1' });
    // "Weekday" starts both labels: refused, never guessed
    expect(readChoice('Weekday', periods).ok).toBe(false);
  });
});

describe('messages and figures', () => {
  it('cellMessage follows the one pattern: row, column, text, problem, accepted', () => {
    expect(cellMessage(14, 'LWA', '12O', 'is not a number', 'use dB, e.g. 104.5')).toBe(
      'Row 14, LWA: "12O" is not a number (use dB, e.g. 104.5)',
    );
  });
  it('cellMessage names a row by its label first, then its row number', () => {
    expect(cellMessage(14, 'LWA', '12O', 'is not a number', 'use dB, e.g. 104.5', 'Breaker 2 t')).toBe(
      '"Breaker 2 t" (row 14), LWA: "12O" is not a number (use dB, e.g. 104.5)',
    );
  });
  it('cellMessage says an emptied required cell is not filled in (never "nothing is empty")', () => {
    expect(cellMessage(3, 'Duty', '', 'is empty', 'type a name for the duty')).toBe(
      'Row 3, Duty: not filled in (type a name for the duty)',
    );
  });
  it('formatFigure shows "not computed" for NaN, never 0', () => {
    expect(formatFigure(NaN, '.', 1)).toBe('not computed');
  });
  it('formatFigure writes the project separator', () => {
    expect(formatFigure(63.25, ',', 1)).toBe('63,3');
  });
});

describe('thousands marks only in thousands positions', () => {
  it.each([
    ['12 500', '.', 12500],
    ["12'500", '.', 12500],
    ['12\u202f500,5', ',', 12500.5],
    ['12.500', ',', 12500],
    ['12,500', '.', 12500],
    ["1'250'000", '.', 1250000],
  ] as const)('%j with decimal %j reads %d (common practice for grouped figures)', (text, sep, value) => {
    expect(readNumber(text, sep)).toBe(value);
  });

  it.each([['10 4'], ["1'0'4"], ['1 2345'], ['12 50'], ["'104"], ['1 000 00']])(
    '%j is not read (kept as typed and marked), never 104',
    (text) => {
      expect(readNumber(text, '.')).toBeUndefined();
      expect(readNumber(text, ',')).toBeUndefined();
    },
  );

  it('fuzz: a read number never comes from marks between other than three digits', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: 0, max: 9999 }), { minLength: 2, maxLength: 4 }),
        fc.constantFrom(' ', "'", '\u00a0'),
        (parts, mark) => {
          const text = parts.map(String).join(mark);
          const value = readNumber(text, '.');
          const grouped = parts.slice(1).every((p) => String(p).length === 3) && String(parts[0]).length <= 3;
          if (!grouped) expect(value).toBeUndefined();
          else expect(value).toBe(Number(parts.join('')));
        },
      ),
      { numRuns: 500 },
    );
  });
});
