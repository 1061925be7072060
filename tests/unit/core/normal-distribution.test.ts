import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { erf, normalCdf, normalQuantile } from '../../../src/core/normal-distribution.ts';

/** Abramowitz & Stegun 7.1.26 is good to 1.5e-7 in erf; tables are printed to 6 places. */
const TABLE_TOLERANCE = 5e-7;

describe('normalCdf', () => {
  it.each([
    // z, Φ(z) — standard normal table (common practice; any statistics textbook)
    [0, 0.5],
    [1, 0.841345],
    [1.96, 0.975002],
    [-1.645, 0.049985],
    [1.281552, 0.9],
    [1.644854, 0.95],
    [-3, 0.00135],
  ])('normalCdf(%d) is %d (standard normal table)', (z, p) => {
    expect(Math.abs(normalCdf(z) - p)).toBeLessThan(TABLE_TOLERANCE + (z === -3 ? 5e-6 : 0));
  });
  it('normalCdf(±Infinity) is 0 and 1; NaN gives NaN', () => {
    expect(normalCdf(-Infinity)).toBe(0);
    expect(normalCdf(Infinity)).toBe(1);
    expect(normalCdf(NaN)).toBeNaN();
  });
  it('erf(1) is 0.842701 (table of the error function, Abramowitz & Stegun Table 7.1)', () => {
    expect(Math.abs(erf(1) - 0.842701)).toBeLessThan(TABLE_TOLERANCE);
  });
  it('normalCdf rises with z and stays within [0, 1] (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -10, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        (z, dz) => {
          const a = normalCdf(z);
          const b = normalCdf(z + dz);
          return a >= 0 && b <= 1 && b >= a;
        },
      ),
    );
  });
});

describe('normalQuantile', () => {
  it.each([
    [0.5, 0],
    [0.9, 1.281552],
    [0.95, 1.644854],
    [0.975, 1.959964],
    [0.05, -1.644854],
  ])('normalQuantile(%d) is %d (standard normal table)', (p, z) => {
    expect(normalQuantile(p)).toBeCloseTo(z, 5);
  });
  it('normalQuantile(0) is −Infinity, (1) is +Infinity; 1.5 is refused with what is accepted', () => {
    expect(normalQuantile(0)).toBe(-Infinity);
    expect(normalQuantile(1)).toBe(Infinity);
    expect(() => normalQuantile(1.5)).toThrow(/use a probability from 0 to 1/);
  });
});
