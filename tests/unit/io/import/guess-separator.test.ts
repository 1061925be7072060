import { describe, expect, it } from 'vitest';
import { guessDecimalSeparator } from '../../../../src/io/import/index.ts';

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
