import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { criterionAreaM2, criterionDistanceM } from '../../../../src/core/criterion-distance.ts';
import { machineFootprint } from '../../../../src/ledger/register/footprint.ts';
import { InputError } from '../../../../src/core/input-error.ts';

/** Relative tolerance of the property checks (floating point only). */
const RELATIVE = 1e-9;

describe('criterionDistanceM and criterionAreaM2', () => {
  it('LWA 105 dB, criterion 65 dB, Q = 2: r = 39.89 m and πr² = 5,000 m²', () => {
    // worked by hand from Lp = Lw + 10·lg(Q/(4πr²)): 65 = 105 + 10·lg(2/(4πr²))
    // → 4πr² = 2·10^4 → r² = 20000/12.566 = 1591.5 → r = 39.894 m; πr² = 2·10^4/4 = 5000 m².
    expect(criterionDistanceM(105, 65, 2)).toBeCloseTo(39.894, 3);
    expect(criterionAreaM2(105, 65, 2)).toBeCloseTo(5000, 6);
  });

  it('the level at the distance found is the criterion (point-source relation, common practice)', () => {
    // worked by hand: 105 − 20·lg(39.894) − 10.99 + 10·lg 2 = 105 − 32.018 − 10.992 + 3.010 = 65.0
    const r = criterionDistanceM(105, 65, 2);
    expect(105 - 20 * Math.log10(r) - 10.992 + 3.0103).toBeCloseTo(65, 2);
  });

  it('Q = 1 (free field) gives half the area of Q = 2', () => {
    // worked by hand: A = Q·10^(ΔL/10)/4 → 2500 m² for Q = 1
    expect(criterionAreaM2(105, 65, 1)).toBeCloseTo(2500, 6);
  });

  it('a source at the criterion level has r = √(Q/(4π)): 0.399 m for Q = 2', () => {
    // common practice: Lp = Lw at r = √(Q/(4π)); worked by hand: √(2/(4π)) = √0.15915 = 0.3989 m
    expect(criterionDistanceM(80, 80, 2)).toBeCloseTo(0.3989, 4);
  });

  it('refuses a level that is not a number, naming the input', () => {
    expect(() => criterionAreaM2(NaN, 65, 2)).toThrow(InputError);
    expect(() => criterionAreaM2(100, Number.POSITIVE_INFINITY, 2)).toThrow(
      /criterion: Infinity is not a finite number/,
    );
    expect(() => criterionAreaM2(100, 65, 3)).toThrow(/directivity Q: 3 is not accepted/);
  });

  it('property: 3 dB less sound power halves the footprint (10·lg 2 = 3.0103 dB exactly halves it)', () => {
    // domain primer §9a [derived]: 3 dB less sound power halves the area πr²
    fc.assert(
      fc.property(
        fc.double({ min: 60, max: 140, noNaN: true }),
        fc.double({ min: 30, max: 90, noNaN: true }),
        fc.constantFrom(1, 2, 4, 8),
        (lw, criterion, q) => {
          const ratio = criterionAreaM2(lw - 10 * Math.log10(2), criterion, q) / criterionAreaM2(lw, criterion, q);
          expect(Math.abs(ratio - 0.5)).toBeLessThan(RELATIVE);
          const roughly = criterionAreaM2(lw - 3, criterion, q) / criterionAreaM2(lw, criterion, q);
          expect(roughly).toBeCloseTo(0.501, 3); // 10^(−0.3) = 0.50119, worked by hand
        },
      ),
    );
  });

  it('property: the distance grows with the sound power and shrinks with the criterion', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 60, max: 140, noNaN: true }),
        fc.double({ min: 0.1, max: 20, noNaN: true }),
        (lw, step) => {
          expect(criterionDistanceM(lw + step, 65, 2)).toBeGreaterThan(criterionDistanceM(lw, 65, 2));
          expect(criterionDistanceM(lw, 65 + step, 2)).toBeLessThan(criterionDistanceM(lw, 65, 2));
        },
      ),
    );
  });
});

describe('machineFootprint', () => {
  it('100 % on-time is the bare point source: LWA 105, 65 dB → 39.89 m, 5,000 m²', () => {
    // worked by hand above
    const f = machineFootprint(105, { criterionDb: 65, onTimePct: 100 });
    expect(f.radiusM).toBeCloseTo(39.894, 3);
    expect(f.areaM2).toBeCloseTo(5000, 6);
  });

  it('50 % on-time halves the footprint: 2,500 m², r = 28.21 m', () => {
    // worked by hand: 10·lg 0.5 = −3.01 dB → A = 2·10^(3.699)/4 = 2500 m², r = √(2500/π) = 28.209 m
    const f = machineFootprint(105, { criterionDb: 65, onTimePct: 50 });
    expect(f.areaM2).toBeCloseTo(2500, 6);
    expect(f.radiusM).toBeCloseTo(28.209, 3);
  });

  it('an unknown LWA gives NaN, not zero; a bad on-time is refused', () => {
    expect(machineFootprint(NaN, { criterionDb: 65, onTimePct: 100 }).areaM2).toBeNaN();
    expect(() => machineFootprint(100, { criterionDb: 65, onTimePct: 0 })).toThrow(/on-time: 0 is out of range/);
  });
});
