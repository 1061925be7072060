import { describe, expect, it } from 'vitest';
import {
  describeMargin,
  formatLevel,
  formatMoney,
  formatReductionDb,
  formatSignedDb,
} from '../../../src/app/results/format.ts';
import { readBudget } from '../../../src/app/results/budget.ts';
import { readQuickCalcField } from '../../../src/app/results/quick-calc-form.ts';
import { logTicks, niceTicks } from '../../../src/app/results/chart-scale.ts';

describe('format', () => {
  it.each([
    [67.34, '67.3 dB'],
    [NaN, 'not computed'],
    [-Infinity, 'no machines'],
    [-0.04, '0.0 dB'],
  ])('formatLevel(%s) is %s', (value, text) => {
    expect(formatLevel(value)).toBe(text);
  });

  it('formatLevel(67.34, ",") writes a decimal comma', () => {
    expect(formatLevel(67.34, ',')).toBe('67,3 dB');
  });

  it.each([
    [2.06, '+2.1 dB'],
    [-3.42, '−3.4 dB'],
    [0.01, '0.0 dB'],
    [NaN, 'not computed'],
  ])('formatSignedDb(%s) is %s', (value, text) => {
    expect(formatSignedDb(value)).toBe(text);
  });

  it.each([
    [0, '0.0 dB'],
    [0.0437, '+0.044 dB'],
    [-0.0123, '−0.012 dB'],
    [0.004, '+0.0040 dB'],
    [2.06, '+2.1 dB'],
    [NaN, 'not computed'],
  ])('formatReductionDb(%s) is %s: a reduction that is not zero never reads "0.0 dB"', (value, text) => {
    expect(formatReductionDb(value)).toBe(text);
  });

  it('describeMargin says over or under in words', () => {
    expect(describeMargin(-3.42)).toBe('3.4 dB over the limit');
    expect(describeMargin(2.1)).toBe('2.1 dB under the limit');
    expect(describeMargin(undefined)).toBe('no limit');
  });

  it('formatMoney uses the project currency and falls back to the code for an unknown one', () => {
    expect(formatMoney(12500, 'GBP', 'en-GB')).toBe('£12,500');
    expect(formatMoney(12500, 'EUR', 'de-DE')).toBe('12.500\u00a0€');
    expect(formatMoney(NaN, 'GBP', 'en-GB')).toBe('not computed');
  });
});

describe('readBudget', () => {
  it.each([
    ['', undefined],
    ['25000', 25000],
    ['25,000', 25000],
    ['25 000.50', 25000.5],
  ])('readBudget(%j) reads %s', (text, budget) => {
    expect(readBudget(text, 'GBP', '.')).toEqual({ ok: true, budget });
  });

  it('readBudget("25.000", EUR, ",") reads the point as a thousands separator', () => {
    expect(readBudget('25.000', 'EUR', ',')).toEqual({ ok: true, budget: 25000 });
    expect(readBudget('25000,5', 'EUR', ',')).toEqual({ ok: true, budget: 25000.5 });
  });

  it('readBudget("-5") says the amount is out of range', () => {
    const r = readBudget('0', 'GBP', '.');
    expect(r.ok).toBe(false);
  });
});

describe('readQuickCalcField and ticks', () => {
  it('readQuickCalcField accepts a decimal comma or point and refuses a letter O', () => {
    expect(readQuickCalcField('lw', '104,5')).toBe(104.5);
    expect(readQuickCalcField('lw', '104.5 dB(A)')).toBe(104.5);
    expect(readQuickCalcField('lw', '12O')).toBe('is not a number');
    expect(readQuickCalcField('temperature', '−3')).toBe(-3);
  });

  it('readQuickCalcField reads Q, hours and the penalty with the catalogue’s ranges and unit words', () => {
    expect(readQuickCalcField('q', '4')).toBe(4);
    expect(readQuickCalcField('q', '16')).toBe('is out of range'); // Q is 1, 2, 4 or 8 (point-source spreading)
    expect(readQuickCalcField('hoursWorked', '7,5 h')).toBe(7.5);
    expect(readQuickCalcField('periodHours', '25')).toBe('is out of range'); // a period is within one day: 24 h
    expect(readQuickCalcField('penalty', '3 dB')).toBe(3);
    expect(readQuickCalcField('penalty', '9')).toBe('is out of range'); // common practice: 3 or 6 dB
  });

  it('niceTicks(61.3, 78.9) steps by 5 and logTicks(8, 300) by 1-2-5', () => {
    expect(niceTicks(61.3, 78.9, 5)).toEqual([60, 65, 70, 75, 80]);
    expect(logTicks(8, 300)).toEqual([10, 20, 50, 100, 200]);
  });
});
