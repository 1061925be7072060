/**
 * The fast forms of the ISO 9613 computations used for tables of many paths must give
 * the very numbers (and the very errors) of the full forms they stand in for.
 * Reference for every check: the full form named in the test — octaveBandPathAttenuation
 * (ISO 9613-2:1996 eq. 4, per band), generalGroundAttenuationDb (eq. 9, Table 3),
 * atmosphericAbsorptionDbPerKm (ISO 9613-1:1993 eq. 5) at exactMidBandFrequencyHz, and
 * aWeightedPathAttenuation with octaveBandPathTotals called one after the other.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  aWeightedAndBandTotals,
  aWeightedPathAttenuation,
  generalGroundAttenuationDb,
  generalGroundTotalsDb,
  octaveBandPathAttenuation,
  octaveBandPathTotals,
  type PathInput,
} from '../../../../../src/core/standards/iso9613-2-1996/index.ts';
import {
  atmosphericAbsorptionDbPerKm,
  exactMidBandFrequencyHz,
  octaveBandAbsorptionDbPerKm,
} from '../../../../../src/core/standards/iso9613-1-1993.ts';
import { OCTAVE_BANDS_NOMINAL_HZ } from '../../../../../src/core/octave-bands.ts';

/** What a call gives: the numbers, or the message it throws. */
function outcome<T>(f: () => T): T | { throws: string } {
  try {
    return f();
  } catch (e) {
    return { throws: (e as Error).message };
  }
}

const anyNumber = fc.oneof(
  { arbitrary: fc.double({ min: -5, max: 2000, noNaN: true }), weight: 8 },
  { arbitrary: fc.constantFrom(NaN, Infinity, -1, 0, 1e200), weight: 1 },
);

const pathArb: fc.Arbitrary<PathInput> = fc.record(
  {
    distanceM: anyNumber,
    sourceHeightM: fc.oneof(fc.double({ min: 0, max: 30, noNaN: true }), fc.constantFrom(-1, NaN)),
    receiverHeightM: fc.oneof(fc.double({ min: 0, max: 30, noNaN: true }), fc.constantFrom(-1, NaN)),
    groundFactor: fc.oneof(fc.double({ min: 0, max: 1, noNaN: true }), fc.constantFrom(1.5, NaN)),
    groundFactors: fc.option(
      fc.record(
        { source: fc.double({ min: 0, max: 1, noNaN: true }), receiver: fc.constantFrom(0, 1, 2) },
        { requiredKeys: [] },
      ),
      { nil: undefined },
    ),
    temperatureC: fc.oneof(fc.double({ min: -20, max: 50, noNaN: true }), fc.constantFrom(60, NaN)),
    humidityPct: fc.oneof(fc.double({ min: 10, max: 100, noNaN: true }), fc.constantFrom(5)),
    pressureKPa: fc.option(fc.oneof(fc.double({ min: 50, max: 200, noNaN: true }), fc.constantFrom(0, 250)), {
      nil: undefined,
    }),
    barrier: fc.option(
      fc.record(
        {
          pathDifferenceM: fc.oneof(fc.double({ min: 0, max: 20, noNaN: true }), fc.constantFrom(-1, NaN)),
          double: fc.boolean(),
          innerDistanceM: fc.option(fc.double({ min: 0.1, max: 10, noNaN: true }), { nil: undefined }),
        },
        { requiredKeys: ['pathDifferenceM'] },
      ),
      { nil: undefined },
    ),
  },
  { requiredKeys: ['distanceM', 'sourceHeightM', 'receiverHeightM', 'groundFactor', 'temperatureC', 'humidityPct'] },
);

describe('octaveBandPathTotals', () => {
  it('gives the totals of octaveBandPathAttenuation to the last bit, or throws the same message', () => {
    fc.assert(
      fc.property(pathArb, (input) => {
        const full = outcome(() => octaveBandPathAttenuation(input).map((b) => b.total));
        const fast = outcome(() => Array.from(octaveBandPathTotals(input)));
        expect(fast).toEqual(full);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('aWeightedAndBandTotals', () => {
  /** Mostly paths the standard computes (fc.double alone is mostly extremes, which are refused), some refused. */
  const between = (lo: number, hi: number) =>
    fc.integer({ min: 0, max: 1_000_000 }).map((k) => lo + ((hi - lo) * k) / 1e6);
  const usual = <T>(good: fc.Arbitrary<number>, bad: T[]) =>
    fc.oneof({ arbitrary: good, weight: 20 }, { arbitrary: fc.constantFrom(...bad), weight: 1 });
  const pathOf = fc.record({
    distanceM: usual(between(5, 2500), [NaN, 0, -1, 1e200]),
    sourceHeightM: usual(between(0, 20), [-1, NaN]),
    receiverHeightM: usual(between(0, 30), [-1]),
    groundFactor: usual(between(0, 1), [1.5, NaN]),
    middle: fc.option(between(0, 1), { nil: undefined }),
    temperatureC: usual(between(-20, 50), [60]),
    humidityPct: usual(between(10, 100), [5]),
    pressureKPa: fc.option(usual(between(80, 110), [0, 250]), { nil: undefined }),
    barrier: fc.option(
      fc.record({
        z: usual(between(-0.5, 5), [NaN]),
        double: fc.boolean(),
        e: fc.option(between(0.1, 5), { nil: undefined }),
      }),
      { nil: undefined, freq: 3 },
    ),
    statedDzDb: fc.option(usual(between(0, 40), [45]), { nil: undefined, freq: 3 }),
    groundMethod: fc.option(fc.constantFrom('general', 'general', 'alternative', 'other'), { nil: undefined }),
    c0Db: fc.option(between(0, 5), { nil: undefined }),
  });
  const inputOf = (p: typeof pathOf extends fc.Arbitrary<infer T> ? T : never): PathInput => ({
    distanceM: p.distanceM,
    sourceHeightM: p.sourceHeightM,
    receiverHeightM: p.receiverHeightM,
    groundFactor: p.groundFactor,
    ...(p.middle === undefined ? {} : { groundFactors: { middle: p.middle } }),
    temperatureC: p.temperatureC,
    humidityPct: p.humidityPct,
    ...(p.pressureKPa === undefined ? {} : { pressureKPa: p.pressureKPa }),
    ...(p.barrier === undefined
      ? {}
      : {
          barrier: {
            pathDifferenceM: p.barrier.z,
            double: p.barrier.double,
            ...(p.barrier.e === undefined ? {} : { innerDistanceM: p.barrier.e }),
          },
        }),
    ...(p.statedDzDb === undefined ? {} : { statedDzDb: p.statedDzDb }),
    ...(p.groundMethod === undefined ? {} : { groundMethod: p.groundMethod as PathInput['groundMethod'] }),
    ...(p.c0Db === undefined ? {} : { cmet: { c0Db: p.c0Db } }),
  });

  it('gives the numbers of aWeightedPathAttenuation, then octaveBandPathTotals, to the last bit, or throws the first one’s message', () => {
    let computed = 0;
    fc.assert(
      fc.property(pathOf, (p) => {
        const input = inputOf(p);
        const separate = outcome(() => {
          const a = aWeightedPathAttenuation(input);
          const general = (input.groundMethod ?? 'general') === 'general';
          return { a, bands: general ? Array.from(octaveBandPathTotals(input)) : [] };
        });
        const together = outcome(() => {
          const out = new Float64Array(8).fill(-7);
          const a = aWeightedAndBandTotals(input, out);
          return { a, bands: a.groundMethod === 'general' ? Array.from(out) : [] };
        });
        expect(together).toEqual(separate);
        if (!('throws' in together)) computed++;
      }),
      { numRuns: 3000 },
    );
    // Hundreds of the random paths are computed, so the numbers, not only the errors, are compared.
    expect(computed).toBeGreaterThan(500);
  });
});

describe('generalGroundTotalsDb', () => {
  it('gives the totals A_s + A_r + A_m of generalGroundAttenuationDb to the last bit, or throws the same message', () => {
    fc.assert(
      fc.property(
        fc.record({
          projectedDistanceM: anyNumber,
          sourceHeightM: fc.oneof(fc.double({ min: 0, max: 30, noNaN: true }), fc.constantFrom(-1)),
          receiverHeightM: fc.double({ min: 0, max: 30, noNaN: true }),
          groundFactor: fc.oneof(fc.double({ min: 0, max: 1, noNaN: true }), fc.constantFrom(2)),
        }),
        (input) => {
          const full = outcome(() => generalGroundAttenuationDb(input).map((b) => b.total));
          const fast = outcome(() => Array.from(generalGroundTotalsDb(input)));
          expect(fast).toEqual(full);
          const into = new Float64Array(8);
          const written = outcome(() => Array.from(generalGroundTotalsDb(input, into)));
          expect(written).toEqual(full);
        },
      ),
      { numRuns: 2000 },
    );
  });
});

describe('octaveBandAbsorptionDbPerKm, computed once per atmosphere', () => {
  it('equals atmosphericAbsorptionDbPerKm at each exact mid-band frequency, on first and later calls', () => {
    for (const [t, rh, p] of [
      [10, 70, 101.325],
      [-20, 10, 50],
      [50, 100, 200],
      [10, 70, 101.325],
    ] as const) {
      const expected = OCTAVE_BANDS_NOMINAL_HZ.map((f) =>
        atmosphericAbsorptionDbPerKm(exactMidBandFrequencyHz(f), t, rh, p),
      );
      expect(octaveBandAbsorptionDbPerKm(t, rh, p)).toEqual(expected);
      expect(octaveBandAbsorptionDbPerKm(t, rh, p)).toEqual(expected);
    }
  });

  it('returns a new array each call: changing one does not change the next', () => {
    const first = octaveBandAbsorptionDbPerKm(15, 60);
    const kept = [...first];
    first[0] = -1;
    expect(octaveBandAbsorptionDbPerKm(15, 60)).toEqual(kept);
  });

  it('still refuses an atmosphere out of range after computing a good one', () => {
    octaveBandAbsorptionDbPerKm(20, 50);
    // ISO 9613-1:1993 Table 1 covers −20 … +50 °C (the range this module accepts)
    expect(() => octaveBandAbsorptionDbPerKm(55, 50)).toThrow(/temperature: 55 is out of range/);
  });
});
