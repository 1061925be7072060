import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  pointSourceLevelDb,
  pointSourceSpreadingDb,
  soundPowerFromPressureDb,
} from '../../../src/core/point-source.ts';
import { InputError } from '../../../src/core/input-error.ts';

const ROUND_TRIP_TOLERANCE = 1e-9;

describe('pointSourceLevelDb', () => {
  it('gives Lp = Lw at r = 0.282 m for Q = 1', () => {
    // common practice: r = 1/√(4π) ≈ 0.282 m
    expect(pointSourceLevelDb(100, 0.282, 1)).toBeCloseTo(100, 1);
  });
  it('falls 6.02 dB when the distance doubles', () => {
    // common practice: inverse-square law
    expect(pointSourceLevelDb(100, 10, 2) - pointSourceLevelDb(100, 20, 2)).toBeCloseTo(6.02, 2);
  });
  it.each([
    // common practice: Lp = Lw − 20·lg r + C with C = −11 (Q = 1), −8 (Q = 2, exactly −7.98), −5, −2 dB
    [1, -10.99],
    [2, -7.98],
    [4, -4.97],
    [8, -1.96],
  ])('at 1 m with Q = %s the spreading term is %s dB', (q, expected) => {
    expect(pointSourceSpreadingDb(1, q)).toBeCloseTo(expected, 1);
  });
  it('is negative beyond 0.282 m for Q = 1 and positive inside it', () => {
    // common practice: r = 0.282 m is where the spreading term crosses 0
    expect(pointSourceSpreadingDb(0.3, 1)).toBeLessThan(0);
    expect(pointSourceSpreadingDb(0.25, 1)).toBeGreaterThan(0);
  });
  it.each([
    [0, 2, /distance: 0 is out of range/],
    [-5, 2, /distance: -5 is out of range/],
    [NaN, 2, /distance: NaN is not a finite number/],
    [10, 3, /directivity Q: 3 is not accepted \(use 1 free field, 2 on hard ground/],
  ])('pointSourceLevelDb(100, %s, %s) throws %s', (r, q, message) => {
    expect(() => pointSourceLevelDb(100, r, q)).toThrow(InputError);
    expect(() => pointSourceLevelDb(100, r, q)).toThrow(message);
  });
  it('falls monotonically with distance', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 5000, noNaN: true }),
        fc.double({ min: 0.1, max: 5000, noNaN: true }),
        fc.constantFrom(1, 2, 4, 8),
        (r1, r2, q) => {
          fc.pre(r2 > r1 * 1.0001);
          expect(pointSourceLevelDb(100, r2, q)).toBeLessThan(pointSourceLevelDb(100, r1, q));
        },
      ),
    );
  });
  it('rises with Lw', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 40, max: 140, noNaN: true }),
        fc.double({ min: 40, max: 140, noNaN: true }),
        (a, b) => {
          fc.pre(b - a > 1e-6);
          expect(pointSourceLevelDb(a, 30, 2)).toBeLessThan(pointSourceLevelDb(b, 30, 2));
        },
      ),
    );
  });
});

describe('soundPowerFromPressureDb', () => {
  it('gives Lw = Lp + 20·lg r + 7.98 for Q = 2', () => {
    // common practice: Lw = Lp + 20·lg r + 10.99 − 10·lg Q
    expect(soundPowerFromPressureDb(80, 10, 2)).toBeCloseTo(80 + 20 + 7.98, 1);
  });
  it('round-trips with pointSourceLevelDb', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 30, max: 150, noNaN: true }),
        fc.double({ min: 0.1, max: 2000, noNaN: true }),
        fc.constantFrom(1, 2, 4, 8),
        (lw, r, q) => {
          expect(Math.abs(soundPowerFromPressureDb(pointSourceLevelDb(lw, r, q), r, q) - lw)).toBeLessThan(
            ROUND_TRIP_TOLERANCE,
          );
        },
      ),
    );
  });
  it('refuses a word-like NaN pressure level', () => {
    expect(() => soundPowerFromPressureDb(NaN, 10, 2)).toThrow(/sound pressure level: NaN/);
  });
});
