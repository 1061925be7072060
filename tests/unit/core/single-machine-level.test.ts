import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  singleMachineLevel,
  PREDICTION_CAUTION,
  type Iso9613Propagation,
  type SingleMachineInput,
} from '../../../src/core/single-machine-level.ts';
import { InputError } from '../../../src/core/input-error.ts';

/** The terms must add up to the level within this many dB. */
const SUM_TOLERANCE = 1e-9;

const iso: Iso9613Propagation = {
  sourceHeightM: 1.5,
  receiverHeightM: 4,
  groundFactor: 0.5,
  temperatureC: 10,
  humidityPct: 70,
};
const keys = (input: SingleMachineInput) => singleMachineLevel(input).terms.map((t) => t.key);
const term = (input: SingleMachineInput, key: string) => singleMachineLevel(input).terms.find((t) => t.key === key)?.db;

describe('singleMachineLevel, simple method', () => {
  it('LWA 105 dB at 50 m on hard ground (Q = 2) gives 63.0 dB', () => {
    // common practice: Lp = Lw − 20·lg r − 7.98 for Q = 2 → 105 − 33.98 − 7.98 = 63.04
    expect(singleMachineLevel({ lwDb: 105, distanceM: 50 }).levelDb).toBeCloseTo(63.04, 2);
  });
  it('lists lw, spreading, count and onTime, in that order (the order of a ledger contribution)', () => {
    expect(keys({ lwDb: 105, distanceM: 50 })).toEqual(['lw', 'spreading', 'count', 'onTime']);
  });
  it('adds screening and façade terms when they apply', () => {
    expect(keys({ lwDb: 105, distanceM: 50, screening: { kind: 'hidden' }, facade: true })).toEqual([
      'lw',
      'spreading',
      'count',
      'onTime',
      'facade',
      'screening',
    ]);
  });
  it('ten units add 10 dB, 50 % on-time −3.01 dB, façade +3 dB, hidden −10 dB', () => {
    const base = singleMachineLevel({ lwDb: 100, distanceM: 20 }).levelDb;
    const all = singleMachineLevel({
      lwDb: 100,
      distanceM: 20,
      count: 10,
      onTimePct: 50,
      facade: true,
      screening: { kind: 'hidden' },
    }).levelDb;
    // common practice: +10·lg 10, +10·lg 0.5, +3 (façade), −10 (fully hidden)
    expect(all - base).toBeCloseTo(10 - 3.01 + 3 - 10, 2);
  });
  it('doubling the distance lowers the level by 6.02 dB', () => {
    // common practice: inverse-square law
    expect(
      singleMachineLevel({ lwDb: 100, distanceM: 10, q: 1 }).levelDb -
        singleMachineLevel({ lwDb: 100, distanceM: 20, q: 1 }).levelDb,
    ).toBeCloseTo(6.02, 2);
  });
  it('takes L_WA from octave bands when only bands are given', () => {
    // IEC 61672-1:2013 Table 3: bands of 100 − A_i dB each give 100 dB(A) per band; eight add 9.03 dB (common practice)
    const bands = [126.2, 116.1, 108.6, 103.2, 100, 98.8, 99, 101.1];
    expect(term({ bandsDb: bands, distanceM: 10 }, 'lw')).toBeCloseTo(109.03, 2);
  });
});

describe('singleMachineLevel, ISO 9613-2:1996', () => {
  const std = (input: SingleMachineInput, key: string) =>
    singleMachineLevel(input).terms.find((t) => t.key === key)?.standard;
  it('LWA only, general method: lists lw, dc, adiv, aatm, agr, count, onTime (no D_Ω term of its own)', () => {
    expect(keys({ lwDb: 105, distanceM: 200, method: 'iso9613-2', propagation: iso })).toEqual([
      'lw',
      'dc',
      'adiv',
      'aatm',
      'agr',
      'count',
      'onTime',
    ]);
  });
  it('LWA only, alternative method, source and receiver on the ground: D_c = D_Ω = 3.01 dB added, A_gr = 4.8 dB subtracted', () => {
    // ISO 9613-2:1996 eq. 11 with h_s = h_r = 0 gives 10·lg 2 = 3.01; eq. 10 with h_m = 0 gives 4.8 dB
    const input: SingleMachineInput = {
      lwDb: 105,
      distanceM: 100,
      method: 'iso9613-2',
      propagation: { ...iso, sourceHeightM: 0, receiverHeightM: 0, groundMethod: 'alternative' },
    };
    expect(std(input, 'dc')).toMatchObject({ symbol: 'D_c', applied: 'added' });
    expect(std(input, 'dc')?.value).toBeCloseTo(3.01, 2);
    expect(term(input, 'dc')).toBeCloseTo(3.01, 2);
    expect(std(input, 'agr')).toMatchObject({ symbol: 'A_gr', value: 4.8, applied: 'subtracted' });
    expect(term(input, 'agr')).toBeCloseTo(-4.8, 10);
    expect(singleMachineLevel(input).iso?.aWeighted?.dOmega).toBeCloseTo(3.01, 2); // D_Ω reported as D_c's part
  });
  it('A_div at 100 m is 51 dB, subtracted', () => {
    const input: SingleMachineInput = { lwDb: 105, distanceM: 100, method: 'iso9613-2', propagation: iso };
    expect(std(input, 'adiv')?.value).toBeCloseTo(51, 10); // ISO 9613-2:1996 eq. 7: 20·lg 100 + 11
    expect(term(input, 'adiv')).toBeCloseTo(-51, 10);
  });
  it('LWA only over hard ground, general method: A_gr = −3.52 dB at 200 m (a gain), the level 51.12 dB', () => {
    // Worked by hand from ISO 9613-2:1996 Table 3 at 500 Hz: G = 0 gives A_s = A_r = −1.5; q = 1 − 30·5.5/199.98 = 0.175,
    // A_m = −3q = −0.525; A_gr = −3.525. A_div = 20·lg 200 + 11 = 57.021 (eq. 7); α(500 Hz, 10 °C, 70 %) = 1.93 dB/km
    // (ISO 9613-2:1996 Table 2 lists 1.9), A_atm = 0.386. L = 105 − 57.021 − 0.386 + 3.525 = 51.12.
    const r = singleMachineLevel({
      lwDb: 105,
      distanceM: 200,
      method: 'iso9613-2',
      propagation: { ...iso, groundFactor: 0 },
    });
    expect(r.iso?.aWeighted?.agr).toBeCloseTo(-3.525, 2);
    expect(r.iso?.aWeighted?.dc).toBe(0);
    expect(r.levelDb).toBeCloseTo(51.12, 1);
  });
  it('the ground factor matters for a machine known only by LWA: porous ground attenuates 8.4 dB more than hard at 200 m', () => {
    // Worked by hand from Table 3 at 500 Hz: G = 1 gives A_gr = 4.891 (A_s = −1.5 + c′(1.5) = 4.882, A_r = 0.009, A_m = 0); G = 0 gives −3.525
    const at = (g: number) =>
      singleMachineLevel({ lwDb: 105, distanceM: 200, method: 'iso9613-2', propagation: { ...iso, groundFactor: g } })
        .levelDb;
    expect(at(0) - at(1)).toBeCloseTo(4.891 + 3.525, 2);
  });
  it('octave bands: lists lw and the octave-band propagation (no order-dependent A-weighted A terms), with the band table', () => {
    const bands = [95, 98, 101, 102, 100, 97, 93, 88];
    const r = singleMachineLevel({
      bandsDb: bands,
      distanceM: 200,
      method: 'iso9613-2',
      propagation: { ...iso, barrier: { pathDifferenceM: 1 } },
    });
    expect(r.terms.map((t) => t.key)).toEqual(['lw', 'octavePath', 'count', 'onTime']);
    expect(r.iso?.bands?.map((b) => b.nominalHz)).toEqual([63, 125, 250, 500, 1000, 2000, 4000, 8000]);
    for (const b of r.iso?.bands ?? []) {
      expect(b.a).toBeCloseTo(b.adiv + b.aatm + b.agr + b.abar, 10); // ISO 9613-2:1996 eq. 4
      expect(b.lp).toBeCloseTo(b.lw + b.dc - b.a, 10); // eq. 3
      expect(b.abar).toBeCloseTo(Math.max(0, (b.dz as number) - b.agr), 10); // eq. 12
    }
  });
  it('octave bands on hard ground within 30(h_s + h_r): A_gr = −3 dB in every band', () => {
    // ISO 9613-2:1996 Table 3: G = 0 and q = 0 give A_s = A_r = −1.5 dB, A_m = 0
    const bands = [95, 98, 101, 102, 100, 97, 93, 88];
    const r = singleMachineLevel({
      bandsDb: bands,
      distanceM: 50,
      method: 'iso9613-2',
      propagation: { ...iso, groundFactor: 0 },
    });
    for (const b of r.iso?.bands ?? []) expect(b.agr).toBeCloseTo(-3, 10);
  });
  it('octave bands with the alternative ground method use the A-weighted estimate', () => {
    const r = singleMachineLevel({
      bandsDb: [95, 98, 101, 102, 100, 97, 93, 88],
      distanceM: 200,
      method: 'iso9613-2',
      propagation: { ...iso, groundMethod: 'alternative' },
    });
    expect(r.basis).toBe('iso9613-2-broadband');
  });
  it('the alternative method over hard ground carries a warning', () => {
    const r = singleMachineLevel({
      lwDb: 105,
      distanceM: 200,
      method: 'iso9613-2',
      propagation: { ...iso, groundFactor: 0, groundMethod: 'alternative' },
    });
    expect(r.iso?.warnings.join(' ')).toMatch(
      /Alternative ground method .* G = 0: the standard meant it for ground that is mostly porous/,
    );
  });
  it('a barrier screening kind becomes the ISO 9613-2 barrier term', () => {
    expect(
      keys({
        lwDb: 105,
        distanceM: 200,
        method: 'iso9613-2',
        propagation: iso,
        screening: { kind: 'barrier', pathDifferenceM: 1 },
      }),
    ).toContain('abar');
  });
  it('rule-of-thumb screening under ISO 9613-2 is D_z replacing the ground effect: A_gr + A_bar = 10 dB when hidden', () => {
    // ISO 9613-2:1996 eq. 12: A_bar = D_z − A_gr, so ground and barrier together give max(D_z, A_gr); hidden = 10 dB (common practice)
    for (const g of [0, 0.5, 1]) {
      const r = singleMachineLevel({
        lwDb: 105,
        distanceM: 200,
        method: 'iso9613-2',
        propagation: { ...iso, groundFactor: g },
        screening: { kind: 'hidden' },
      });
      const a = r.iso?.aWeighted;
      expect((a?.agr ?? NaN) + (a?.abar ?? NaN)).toBeCloseTo(10, 10);
      expect(r.terms.map((t) => t.key)).not.toContain('screening');
    }
  });
  it('a stated screening smaller than A_gr gives A_bar = 0 (eq. 12, not below 0)', () => {
    // G = 1 at 200 m: A_gr = 4.891 at 500 Hz (worked by hand, Table 3) exceeds D_z = 3
    const r = singleMachineLevel({
      lwDb: 105,
      distanceM: 200,
      method: 'iso9613-2',
      propagation: { ...iso, groundFactor: 1 },
      screening: { kind: 'explicit', db: 3 },
    });
    expect(r.iso?.aWeighted?.abar).toBe(0);
  });
  it('a barrier and a rule-of-thumb screening on one path are refused', () => {
    expect(() =>
      singleMachineLevel({
        lwDb: 105,
        distanceM: 200,
        method: 'iso9613-2',
        propagation: { ...iso, barrier: { pathDifferenceM: 1 } },
        screening: { kind: 'hidden' },
      }),
    ).toThrow(/screening: "hidden" is given together with a barrier path difference \(screen a path once/);
  });
  it('C_met from C0 = 2 dB: 0 within 10(h_s + h_r) = 55 m, 1.45 dB at 200 m, subtracted', () => {
    // Worked by hand from ISO 9613-2:1996 eqs 21, 22: d_p = 49.9 ≤ 55 → 0; d_p = 199.98 → 2·(1 − 55/199.98) = 1.450
    const at = (d: number) =>
      std({ lwDb: 105, distanceM: d, method: 'iso9613-2', propagation: { ...iso, cmet: { c0Db: 2 } } }, 'cmet');
    expect(at(50)?.value).toBe(0);
    expect(at(200)?.value).toBeCloseTo(1.45, 2);
    expect(at(200)?.applied).toBe('subtracted');
  });
  it("accepts the project file's method name 'iso9613-2:1996'", () => {
    expect(singleMachineLevel({ lwDb: 105, distanceM: 200, method: 'iso9613-2:1996', propagation: iso }).basis).toBe(
      'iso9613-2-broadband',
    );
  });
  it('states ±3 dB for a low 200 m path, and no accuracy for a path of 1 km or more, a screened or a reflected path', () => {
    // ISO 9613-2:1996 Table 5: ±3 dB for mean heights 0–5 m up to 1 km; nothing stated beyond, nor for screening or reflections
    const base: SingleMachineInput = { lwDb: 105, distanceM: 200, method: 'iso9613-2', propagation: iso };
    expect(singleMachineLevel(base).accuracy?.statedDb).toBe(3);
    expect(singleMachineLevel({ ...base, distanceM: 1200 }).accuracy).toMatchObject({
      notes: [expect.stringMatching(/^Distance 1200 m is 1 km or more/)],
    });
    expect(singleMachineLevel({ ...base, distanceM: 1200 }).accuracy?.statedDb).toBeUndefined();
    expect(singleMachineLevel({ ...base, screening: { kind: 'top-visible' } }).accuracy?.statedDb).toBeUndefined();
    expect(singleMachineLevel({ ...base, facade: true }).accuracy?.notes.join(' ')).toMatch(/excludes reflections/);
  });
});

describe('singleMachineLevel properties', () => {
  const methods: ((d: number, lw: number) => SingleMachineInput)[] = [
    (d, lw) => ({ lwDb: lw, distanceM: d }),
    (d, lw) => ({ lwDb: lw, distanceM: d, method: 'iso9613-2', propagation: iso }),
    (d, lw) => ({
      bandsDb: [lw - 5, lw - 3, lw, lw, lw - 2, lw - 5, lw - 9, lw - 14],
      distanceM: d,
      method: 'iso9613-2',
      propagation: iso,
    }),
  ];
  it.each([['simple'], ['iso9613-2 broadband'], ['iso9613-2 octave bands']].map(([n], i) => [n, i] as const))(
    '%s: the level falls monotonically with distance',
    (_n, i) => {
      const make = methods[i] as (d: number, lw: number) => SingleMachineInput;
      fc.assert(
        fc.property(
          fc.double({ min: 10, max: 3000, noNaN: true }),
          fc.double({ min: 10, max: 3000, noNaN: true }),
          (d1, d2) => {
            fc.pre(d2 > d1 * 1.0001);
            expect(singleMachineLevel(make(d2, 100)).levelDb).toBeLessThan(singleMachineLevel(make(d1, 100)).levelDb);
          },
        ),
      );
    },
  );
  it.each([['simple'], ['iso9613-2 broadband'], ['iso9613-2 octave bands']].map(([n], i) => [n, i] as const))(
    '%s: the level rises with Lw',
    (_n, i) => {
      const make = methods[i] as (d: number, lw: number) => SingleMachineInput;
      fc.assert(
        fc.property(
          fc.double({ min: 60, max: 130, noNaN: true }),
          fc.double({ min: 60, max: 130, noNaN: true }),
          (a, b) => {
            fc.pre(b - a > 1e-6);
            expect(singleMachineLevel(make(100, a)).levelDb).toBeLessThan(singleMachineLevel(make(100, b)).levelDb);
          },
        ),
      );
    },
  );
  it('the terms always add up to the level', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 5, max: 2000, noNaN: true }),
        fc.integer({ min: 0, max: 2 }),
        fc.integer({ min: 1, max: 20 }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        fc.boolean(),
        (d, m, count, onTime, facade) => {
          const r = singleMachineLevel({
            ...(methods[m] as (d: number, lw: number) => SingleMachineInput)(d, 100),
            count,
            onTimePct: onTime,
            facade,
          });
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
    [
      { lwDb: 100, distanceM: 10, method: 'fast' as 'simple' },
      /method: "fast" is not accepted \(use one of simple, iso9613-2/,
    ],
    [
      { lwDb: 100, distanceM: 10, screening: { kind: 'barrier', pathDifferenceM: 1 } },
      /screening: "barrier" needs the ISO 9613-2:1996 method/,
    ],
    [{ lwDb: 100, distanceM: 10, method: 'iso9613-2' }, /propagation: nothing given/],
    [
      { lwDb: 100, distanceM: 10, method: 'iso9613-2', propagation: { ...iso, temperatureC: 60 } },
      /temperature: 60 is out of range/,
    ],
    [
      { lwDb: 100, distanceM: 10, method: 'iso9613-2', propagation: { ...iso, groundFactor: 2 } },
      /ground factor: 2 is out of range/,
    ],
  ])('singleMachineLevel(%j) throws %s', (input, message) => {
    expect(() => singleMachineLevel(input)).toThrow(InputError);
    expect(() => singleMachineLevel(input)).toThrow(message);
  });
  it('PREDICTION_CAUTION quotes ±3 dB with the paths for which ISO 9613-2 states none', () => {
    // ISO 9613-2:1996 clause 9, Table 5
    expect(PREDICTION_CAUTION).toContain(
      'ISO 9613-2 quotes ±3 dB up to 1 km, and states no accuracy beyond 1 km, above 30 m mean height or for screened or reflected paths',
    );
  });
});
