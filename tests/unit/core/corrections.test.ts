import { describe, expect, it } from 'vitest';
import {
  countCorrectionDb,
  FACADE_CORRECTION_DB,
  onTimeCorrectionDb,
  screeningReductionDb,
  SCREENING_HIDDEN_DB,
  SCREENING_TOP_VISIBLE_DB,
  workingHoursCorrectionDb,
  type ScreeningChoice,
} from '../../../src/core/corrections.ts';
import { InputError } from '../../../src/core/input-error.ts';

describe('onTimeCorrectionDb', () => {
  it('onTimeCorrectionDb(100) is 0 dB', () => {
    expect(onTimeCorrectionDb(100)).toBe(0); // common practice: full on-time, no correction
  });
  it('onTimeCorrectionDb(50) is −3.01 dB', () => {
    expect(onTimeCorrectionDb(50)).toBeCloseTo(-3.01, 2); // common practice: 10·lg 0.5
  });
  it('onTimeCorrectionDb(10) is −10 dB', () => {
    expect(onTimeCorrectionDb(10)).toBeCloseTo(-10, 10); // common practice: 10·lg 0.1
  });
  it.each([0, -5, 100.1, NaN, Infinity])('onTimeCorrectionDb(%s) throws an InputError naming on-time', (pct) => {
    expect(() => onTimeCorrectionDb(pct)).toThrow(InputError);
    expect(() => onTimeCorrectionDb(pct)).toThrow(/^on-time: .* \(use a percentage above 0 and up to 100\)$/);
  });
});

describe('countCorrectionDb', () => {
  it('two equal sources add 3.01 dB', () => {
    expect(countCorrectionDb(2)).toBeCloseTo(3.01, 2); // common practice
  });
  it('ten equal sources add 10 dB', () => {
    expect(countCorrectionDb(10)).toBeCloseTo(10, 10); // common practice
  });
  it.each([0, 1.5, -1, NaN])('countCorrectionDb(%s) throws an InputError', (n) => {
    expect(() => countCorrectionDb(n)).toThrow(/^count: /);
  });
});

describe('workingHoursCorrectionDb', () => {
  it('working the whole period adds nothing', () => {
    expect(workingHoursCorrectionDb(12, 12)).toBe(0); // common practice (ISO 1996-1 time averaging)
  });
  it('working 6 of 12 hours is −3.01 dB', () => {
    expect(workingHoursCorrectionDb(6, 12)).toBeCloseTo(-3.01, 2); // ISO 1996-1 LAeq,T over the period: 10·lg(6/12)
  });
  it.each([
    [13, 12, /working hours: 13 are longer than the period of 12/],
    [0, 12, /working hours: 0 is out of range/],
    [5, 0, /assessment period: 0 is out of range/],
  ])('workingHoursCorrectionDb(%s, %s) throws %s', (w, p, message) => {
    expect(() => workingHoursCorrectionDb(w, p)).toThrow(message);
  });
});

describe('façade and screening', () => {
  it('FACADE_CORRECTION_DB is 3 dB', () => {
    expect(FACADE_CORRECTION_DB).toBe(3); // common practice, 1 m in front of a façade (ISO 1996-2 discusses it)
  });
  it.each<[ScreeningChoice, number]>([
    [{ kind: 'none' }, 0],
    [{ kind: 'top-visible' }, 5], // common practice (UK and Hong Kong construction guidance): top just visible −5 dB
    [{ kind: 'hidden' }, 10], // common practice: fully hidden −10 dB
    [{ kind: 'explicit', db: 7.5 }, 7.5],
  ])('screeningReductionDb(%j) is %s dB', (s, expected) => {
    expect(screeningReductionDb(s)).toBe(expected);
  });
  it('the rule-of-thumb constants are 5 and 10 dB', () => {
    expect([SCREENING_TOP_VISIBLE_DB, SCREENING_HIDDEN_DB]).toEqual([5, 10]); // common practice
  });
  it.each([-1, 41, NaN])('an explicit screening of %s dB throws an InputError', (db) => {
    expect(() => screeningReductionDb({ kind: 'explicit', db })).toThrow(
      /^screening: .* \(use a reduction from 0 to 40 dB\)$/,
    );
  });
  it('an unknown screening kind throws an InputError listing the choices', () => {
    expect(() => screeningReductionDb({ kind: 'wall' } as unknown as ScreeningChoice)).toThrow(
      /use none, top-visible \(5 dB\), hidden \(10 dB\)/,
    );
  });
});
