import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { singleMachineLevel, PREDICTION_CAUTION, type Iso9613Propagation, type SingleMachineInput } from '../../../src/core/single-machine-level.ts';
import { InputError } from '../../../src/core/input-error.ts';

/** The terms must add up to the level within this many dB. */
const SUM_TOLERANCE = 1e-9;

const iso: Iso9613Propagation = { sourceHeightM: 1.5, receiverHeightM: 4, groundFactor: 0.5, temperatureC: 10, humidityPct: 70 };
const keys = (input: SingleMachineInput) => singleMachineLevel(input).terms.map((t) => t.key);
const term = (input: SingleMachineInput, key: string) => singleMachineLevel(input).terms.find((t) => t.key === key)?.db;

describe('singleMachineLevel, simple method', () => {
  it('LWA 105 dB at 50 m on hard ground (Q = 2) gives 63.0 dB', () => {
    // common practice: Lp = Lw − 20·lg r − 7.98 for Q = 2 → 105 − 33.98 − 7.98 = 63.04
    expect(singleMachineLevel({ lwDb: 105, distanceM: 50 }).levelDb).toBeCloseTo(63.04, 2);
  });
  it('lists lw, spreading, onTime and count, in that order', () => {
    expect(keys({ lwDb: 105, distanceM: 50 })).toEqual(['lw', 'spreading', 'onTime', 'count']);
  });
  it('adds screening and façade terms when they apply', () => {
    expect(keys({ lwDb: 105, distanceM: 50, screening: { kind: 'hidden' }, facade: true })).toEqual(['lw', 'spreading', 'onTime', 'count', 'screening', 'facade']);
  });
  it('ten units add 10 dB, 50 % on-time −3.01 dB, façade +3 dB, hidden −10 dB', () => {
    const base = singleMachineLevel({ lwDb: 100, distanceM: 20 }).levelDb;
    const all = singleMachineLevel({ lwDb: 100, distanceM: 20, count: 10, onTimePct: 50, facade: true, screening: { kind: 'hidden' } }).levelDb;
    // common practice: +10·lg 10, +10·lg 0.5, +3 (façade), −10 (fully hidden)
    expect(all - base).toBeCloseTo(10 - 3.01 + 3 - 10, 2);
  });
  it('doubling the distance lowers the level by 6.02 dB', () => {
    // common practice: inverse-square law
    expect(singleMachineLevel({ lwDb: 100, distanceM: 10, q: 1 }).levelDb - singleMachineLevel({ lwDb: 100, distanceM: 20, q: 1 }).levelDb).toBeCloseTo(6.02, 2);
  });
  it('takes L_WA from octave bands when only bands are given', () => {
    // IEC 61672-1:2013 Table 3: bands of 100 − A_i dB each give 100 dB(A) per band; eight add 9.03 dB (common practice)
    const bands = [126.2, 116.1, 108.6, 103.2, 100, 98.8, 99, 101.1];
    expect(term({ bandsDb: bands, distanceM: 10 }, 'lw')).toBeCloseTo(109.03, 2);
  });
});

describe('singleMachineLevel, ISO 9613-2:1996', () => {
  it('broadband: lists lw, adiv, aatm, agr, dOmega, onTime, count', () => {
    expect(keys({ lwDb: 105, distanceM: 200, method: 'iso9613-2', propagation: iso })).toEqual(['lw', 'adiv', 'aatm', 'agr', 'dOmega', 'onTime', 'count']);
  });
  it('broadband with source and receiver on the ground: D_Ω = +3.01 dB and A_gr = −4.8 dB', () => {
    // ISO 9613-2:1996 eq. 11 with h_s = h_r = 0 gives 10·lg 2; eq. 10 with h_m = 0 gives 4.8 dB
    const input: SingleMachineInput = { lwDb: 105, distanceM: 100, method: 'iso9613-2', propagation: { ...iso, sourceHeightM: 0, receiverHeightM: 0 } };
    expect(term(input, 'dOmega')).toBeCloseTo(3.01, 2);
    expect(term(input, 'agr')).toBeCloseTo(-4.8, 10);
  });
  it('broadband adiv at 100 m is −51 dB', () => {
    expect(term({ lwDb: 105, distanceM: 100, method: 'iso9613-2', propagation: iso }, 'adiv')).toBeCloseTo(-51, 10); // ISO 9613-2:1996 eq. 7
  });
  it('octave bands: lists lw, adiv, aatm, agr and abar with a barrier', () => {
    const bands = [95, 98, 101, 102, 100, 97, 93, 88];
    expect(keys({ bandsDb: bands, distanceM: 200, method: 'iso9613-2', propagation: { ...iso, barrier: { pathDifferenceM: 1 } } })).toEqual([
      'lw', 'adiv', 'aatm', 'agr', 'abar', 'onTime', 'count',
    ]);
  });
  it('octave bands on hard ground within 30(h_s + h_r): the ground term is +3 dB', () => {
    // ISO 9613-2:1996 Table 3 (from memory): G = 0 and q = 0 give A_gr = −3 dB in every band
    const bands = [95, 98, 101, 102, 100, 97, 93, 88];
    expect(term({ bandsDb: bands, distanceM: 50, method: 'iso9613-2', propagation: { ...iso, groundFactor: 0 } }, 'agr')).toBeCloseTo(3, 10);
  });
  it('octave bands with the alternative ground method use the broadband estimate', () => {
    const r = singleMachineLevel({ bandsDb: [95, 98, 101, 102, 100, 97, 93, 88], distanceM: 200, method: 'iso9613-2', propagation: { ...iso, groundMethod: 'alternative' } });
    expect(r.basis).toBe('iso9613-2-broadband');
  });
  it('a barrier screening kind becomes the ISO 9613-2 barrier term', () => {
    expect(keys({ lwDb: 105, distanceM: 200, method: 'iso9613-2', propagation: iso, screening: { kind: 'barrier', pathDifferenceM: 1 } })).toContain('abar');
  });
  it('C_met from C0 is a negative term at long range', () => {
    expect(term({ lwDb: 105, distanceM: 500, method: 'iso9613-2', propagation: { ...iso, cmet: { c0Db: 2 } } }, 'cmet')).toBeLessThan(0); // ISO 9613-2:1996 eq. 22
  });
  it("accepts the project file's method name 'iso9613-2:1996'", () => {
    expect(singleMachineLevel({ lwDb: 105, distanceM: 200, method: 'iso9613-2:1996', propagation: iso }).basis).toBe('iso9613-2-broadband');
  });
});

describe('singleMachineLevel properties', () => {
  const methods: ((d: number, lw: number) => SingleMachineInput)[] = [
    (d, lw) => ({ lwDb: lw, distanceM: d }),
    (d, lw) => ({ lwDb: lw, distanceM: d, method: 'iso9613-2', propagation: iso }),
    (d, lw) => ({ bandsDb: [lw - 5, lw - 3, lw, lw, lw - 2, lw - 5, lw - 9, lw - 14], distanceM: d, method: 'iso9613-2', propagation: iso }),
  ];
  it.each([['simple'], ['iso9613-2 broadband'], ['iso9613-2 octave bands']].map(([n], i) => [n, i] as const))('%s: the level falls monotonically with distance', (_n, i) => {
    const make = methods[i] as (d: number, lw: number) => SingleMachineInput;
    fc.assert(
      fc.property(fc.double({ min: 10, max: 3000, noNaN: true }), fc.double({ min: 10, max: 3000, noNaN: true }), (d1, d2) => {
        fc.pre(d2 > d1 * 1.0001);
        expect(singleMachineLevel(make(d2, 100)).levelDb).toBeLessThan(singleMachineLevel(make(d1, 100)).levelDb);
      }),
    );
  });
  it.each([['simple'], ['iso9613-2 broadband'], ['iso9613-2 octave bands']].map(([n], i) => [n, i] as const))('%s: the level rises with Lw', (_n, i) => {
    const make = methods[i] as (d: number, lw: number) => SingleMachineInput;
    fc.assert(
      fc.property(fc.double({ min: 60, max: 130, noNaN: true }), fc.double({ min: 60, max: 130, noNaN: true }), (a, b) => {
        fc.pre(b - a > 1e-6);
        expect(singleMachineLevel(make(100, a)).levelDb).toBeLessThan(singleMachineLevel(make(100, b)).levelDb);
      }),
    );
  });
  it('the terms always add up to the level', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 5, max: 2000, noNaN: true }),
        fc.integer({ min: 0, max: 2 }),
        fc.integer({ min: 1, max: 20 }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        fc.boolean(),
        (d, m, count, onTime, facade) => {
          const r = singleMachineLevel({ ...(methods[m] as (d: number, lw: number) => SingleMachineInput)(d, 100), count, onTimePct: onTime, facade });
          expect(Math.abs(r.terms.reduce((s, t) => s + t.db, 0) - r.levelDb)).toBeLessThan(SUM_TOLERANCE);
        },
      ),
    );
  });
});

describe('singleMachineLevel bad input', () => {
  it.each<[SingleMachineInput, RegExp]>([
    [{ distanceM: 10 }, /sound power level: nothing given/],
    [{ lwDb: 100, distanceM: -1 }, /distance: -1 is out of range/],
    [{ lwDb: 100, distanceM: 10, q: 3 }, /directivity Q: 3 is not accepted/],
    [{ lwDb: 100, distanceM: 10, onTimePct: 0 }, /on-time: 0 is out of range/],
    [{ lwDb: 100, distanceM: 10, count: 0 }, /count: 0 is not accepted/],
    [{ lwDb: 100, distanceM: 10, method: 'fast' as 'simple' }, /method: "fast" is not accepted \(use one of simple, iso9613-2/],
    [{ lwDb: 100, distanceM: 10, screening: { kind: 'barrier', pathDifferenceM: 1 } }, /screening: "barrier" needs the ISO 9613-2:1996 method/],
    [{ lwDb: 100, distanceM: 10, method: 'iso9613-2' }, /propagation: nothing given/],
    [{ lwDb: 100, distanceM: 10, method: 'iso9613-2', propagation: { ...iso, temperatureC: 60 } }, /temperature: 60 is out of range/],
    [{ lwDb: 100, distanceM: 10, method: 'iso9613-2', propagation: { ...iso, groundFactor: 2 } }, /ground factor: 2 is out of range/],
  ])('singleMachineLevel(%j) throws %s', (input, message) => {
    expect(() => singleMachineLevel(input)).toThrow(InputError);
    expect(() => singleMachineLevel(input)).toThrow(message);
  });
  it('PREDICTION_CAUTION quotes ±3 dB', () => {
    expect(PREDICTION_CAUTION).toContain('±3 dB'); // ISO 9613-2:1996 clause 9 accuracy
  });
});
