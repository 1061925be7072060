import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { lpFromPascals, lwFromWatts, pascalsFromLp, wattsFromLw } from '../../../src/core/power.ts';
import { InputError } from '../../../src/core/input-error.ts';

/** Round trips must come back within this many dB (or this relative error). */
const ROUND_TRIP_TOLERANCE = 1e-9;

describe('sound power level and watts', () => {
  it('lwFromWatts(1) is 120 dB', () => {
    expect(lwFromWatts(1)).toBeCloseTo(120, 10); // common practice: 1 W → 120 dB re 1 pW
  });
  it('lwFromWatts(1e-12) is 0 dB', () => {
    expect(lwFromWatts(1e-12)).toBeCloseTo(0, 10); // common practice: 1 pW → 0 dB (W0 = 1 pW, IEC 60050-801)
  });
  it('wattsFromLw(100) is 0.01 W', () => {
    expect(wattsFromLw(100)).toBeCloseTo(0.01, 14); // common practice: every 10 dB is a factor 10 in power
  });
  it.each([0, -1, NaN, Infinity])('lwFromWatts(%s) throws an InputError naming the sound power', (w) => {
    expect(() => lwFromWatts(w)).toThrow(InputError);
    expect(() => lwFromWatts(w)).toThrow(/sound power/);
  });
  it('wattsFromLw(NaN) throws an InputError', () => {
    expect(() => wattsFromLw(NaN)).toThrow(/sound power level: NaN is not a finite number/);
  });
  it('lwFromWatts and wattsFromLw round-trip', () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 200, noNaN: true }), (lw) => {
        expect(Math.abs(lwFromWatts(wattsFromLw(lw)) - lw)).toBeLessThan(ROUND_TRIP_TOLERANCE);
      }),
    );
  });
});

describe('sound pressure level and pascals', () => {
  it('lpFromPascals(1) is 93.98 dB', () => {
    expect(lpFromPascals(1)).toBeCloseTo(93.98, 2); // common practice: 1 Pa ≈ 94 dB (calibrator level), 20·lg(1/20e-6) = 93.979
  });
  it('lpFromPascals(20e-6) is 0 dB', () => {
    expect(lpFromPascals(20e-6)).toBeCloseTo(0, 10); // IEC 60050-801: p0 = 20 µPa
  });
  it('doubling the pressure adds 6.02 dB', () => {
    expect(lpFromPascals(2) - lpFromPascals(1)).toBeCloseTo(6.02, 2); // common practice: field quantities take 20·lg
  });
  it.each([0, -0.5, NaN])('lpFromPascals(%s) throws an InputError', (p) => {
    expect(() => lpFromPascals(p)).toThrow(InputError);
  });
  it('lpFromPascals and pascalsFromLp round-trip', () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 194, noNaN: true }), (lp) => {
        expect(Math.abs(lpFromPascals(pascalsFromLp(lp)) - lp)).toBeLessThan(ROUND_TRIP_TOLERANCE);
      }),
    );
  });
});
