import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { dbMean, dbOfIdentical, dbSub, dbSum, timeAverageDb } from '../../../src/core/decibel.ts';
import { InputError } from '../../../src/core/input-error.ts';

/** Energetic round trips must come back within this many dB. */
const DB_TOLERANCE = 1e-9;
const level = fc.double({ min: -20, max: 150, noNaN: true });

describe('dbSum', () => {
  it('dbSum([90, 90]) is 93.01 dB', () => {
    expect(dbSum([90, 90])).toBeCloseTo(93.01, 2); // common practice: two equal sources +3.01 dB
  });
  it('ten equal levels add 10 dB', () => {
    expect(dbSum(Array(10).fill(80))).toBeCloseTo(90, 10); // common practice: ten equal sources +10 dB
  });
  it('dbSum([]) is -Infinity', () => {
    expect(dbSum([])).toBe(-Infinity);
  });
  it('dbSum([NaN]) throws an InputError', () => {
    expect(() => dbSum([NaN])).toThrow(InputError);
  });
  it('is order-free', () => {
    fc.assert(
      fc.property(fc.array(level, { minLength: 1, maxLength: 12 }), (levels) => {
        const reversed = [...levels].reverse();
        const sorted = [...levels].sort((a, b) => a - b);
        expect(Math.abs(dbSum(levels) - dbSum(reversed))).toBeLessThan(DB_TOLERANCE);
        expect(Math.abs(dbSum(levels) - dbSum(sorted))).toBeLessThan(DB_TOLERANCE);
      }),
    );
  });
  it('is never below its largest term', () => {
    fc.assert(
      fc.property(fc.array(level, { minLength: 1, maxLength: 12 }), (levels) => {
        expect(dbSum(levels)).toBeGreaterThanOrEqual(Math.max(...levels) - DB_TOLERANCE);
      }),
    );
  });
});

describe('dbSub, dbMean, dbOfIdentical, timeAverageDb', () => {
  it('dbSub(dbSum([a, b]), b) ≈ a', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 130, noNaN: true }),
        fc.double({ min: 20, max: 130, noNaN: true }),
        (a, b) => {
          fc.pre(Math.abs(a - b) < 40); // beyond 40 dB apart the smaller level is lost in double precision
          expect(Math.abs(dbSub(dbSum([a, b]), b) - a)).toBeLessThan(1e-6);
        },
      ),
    );
  });
  it('dbSub(90, 90) throws because nothing would remain', () => {
    expect(() => dbSub(90, 90)).toThrow(/nothing would remain/);
  });
  it('dbMean([80, 90]) is 87.40 dB', () => {
    expect(dbMean([80, 90])).toBeCloseTo(87.4, 2); // common practice: 10·lg((10^8 + 10^9)/2)
  });
  it('dbOfIdentical(90, 2) is 93.01 dB', () => {
    expect(dbOfIdentical(90, 2)).toBeCloseTo(93.01, 2); // common practice
  });
  it('half the period at 80 dB and half silent is 76.99 dB', () => {
    // ISO 1996-1: LAeq,T = 10·lg[(1/T) Σ ti·10^(Li/10)]
    expect(timeAverageDb([{ levelDb: 80, duration: 4 }], 8)).toBeCloseTo(76.99, 2);
  });
});
