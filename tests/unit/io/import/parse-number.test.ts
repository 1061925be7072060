import { describe, expect, it } from 'vitest';
import { guessDecimalSeparator, readNumber } from '../../../../src/io/import/index.ts';

describe('readNumber(cell, decimal, units, money)', () => {
  it.each([
    ['104.5', '.', 104.5],
    ['104,5', ',', 104.5],
    ['104,5', '.', 104.5], // a comma that cannot be a thousands separator is a decimal mark
    ['1,250', '.', 1250],
    ['1.250', ',', 1250],
    ['1.234,56', ',', 1234.56],
    ['1,234.56', '.', 1234.56],
    ['1 234,5', ',', 1234.5],
    ['12\u00a0500', '.', 12500],
    ['-3', '.', -3],
    ['2.5e-3', '.', 0.0025],
    ['.5', '.', 0.5],
  ] as const)('readNumber(%j, %j) is %d', (text, decimal, value) => {
    expect(readNumber(text, decimal)).toEqual({ kind: 'number', value });
  });

  it('readNumber ignores a unit the field accepts after the number', () => {
    expect(readNumber('104 dB(A)', '.', ['dB(A)', 'dBA', 'dB'])).toEqual({ kind: 'number', value: 104 });
    expect(readNumber('7,5 kW', ',', ['kW'])).toEqual({ kind: 'number', value: 7.5 });
    expect(readNumber('104 W', '.', ['dB'])).toEqual({ kind: 'unread', text: '104 W' });
  });

  it('readNumber ignores a currency sign or code on money only', () => {
    expect(readNumber('£1,250.00', '.', [], true)).toEqual({ kind: 'number', value: 1250 });
    expect(readNumber('95 €', ',', [], true)).toEqual({ kind: 'number', value: 95 });
    expect(readNumber('EUR 95,50', ',', [], true)).toEqual({ kind: 'number', value: 95.5 });
    expect(readNumber('£95', '.', [], false)).toEqual({ kind: 'unread', text: '£95' });
  });

  it.each(['', '  ', '-', '–', '—'])('readNumber(%j) is empty', (text) => {
    expect(readNumber(text, '.')).toEqual({ kind: 'empty' });
  });

  it.each(['12O', 'n/a', '1.2.3', '1,2,3', '100-110', '<85', '=1+2', 'NaN', 'Infinity'])(
    'readNumber(%j) is unread, its text kept',
    (text) => {
      expect(readNumber(text, '.')).toEqual({ kind: 'unread', text });
    },
  );

  it('readNumber of a stored number, an empty cell and a boolean', () => {
    expect(readNumber(101.3, ',')).toEqual({ kind: 'number', value: 101.3 });
    expect(readNumber(null, '.')).toEqual({ kind: 'empty' });
    expect(readNumber(true, '.')).toEqual({ kind: 'unread', text: 'TRUE' });
  });
});

describe('guessDecimalSeparator(rows, delimiter)', () => {
  it('guessDecimalSeparator counts cells readable only one way', () => {
    expect(guessDecimalSeparator([['104,5', '98,2'], ['1.250']])).toBe(',');
    expect(guessDecimalSeparator([['104.5', '1,250'], ['98.25']])).toBe('.');
  });
  it('guessDecimalSeparator with no evidence: comma for semicolon files, else point', () => {
    expect(guessDecimalSeparator([['104', '1,250']], ';')).toBe(',');
    expect(guessDecimalSeparator([['104']], ',')).toBe('.');
  });
});
