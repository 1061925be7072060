/** The parts the clause answer is built from: hours outside a window, boundary points, the cap's pressure level, validation. */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hoursOutside, workingSpanHours } from '../../../../src/ledger/clauses/working-hours.ts';
import { boundaryPoints } from '../../../../src/ledger/clauses/boundary.ts';
import { pressureAtDistanceDb } from '../../../../src/ledger/clauses/machine-caps.ts';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import { clause, clauseProject } from './clause-project.ts';

describe('hoursOutside', () => {
  it.each([
    ['07:00', '19:00', '08:00', '18:00', 2], // worked by hand: 1 h before, 1 h after
    ['08:00', '18:00', '08:00', '18:00', 0], // the window exactly
    ['07:00', '21:00', '08:00', '18:00', 4], // across the day and evening periods: 1 + 3 h
    ['23:00', '03:00', '22:00', '06:00', 0], // both across midnight
    ['23:00', '03:00', '08:00', '18:00', 4], // night works, daytime window
    ['06:00', '09:00', '22:00', '07:00', 2], // window across midnight: 07:00–09:00 outside
    ['00:00', '24:00', '08:00', '18:00', 14], // the whole day: 24 − 10
  ])('hoursOutside(%s, %s, %s, %s) is %d h (worked by hand)', (a, b, c, d, expected) => {
    expect(hoursOutside(a, b, c, d)).toBe(expected);
  });

  it('hoursOutside of an unreadable time is NaN', () => {
    expect(hoursOutside('7am', '19:00', '08:00', '18:00')).toBeNaN();
  });

  it('workingSpanHours counts a span past midnight: 22:00–06:00 is 8 h', () => {
    expect(workingSpanHours('22:00', '06:00')).toBe(8); // worked by hand
    expect(workingSpanHours('07:00', '19:00')).toBe(12);
  });

  it('property: hours outside lie between 0 and the span, and a window of the whole day leaves none outside', () => {
    const time = fc
      .tuple(fc.integer({ min: 0, max: 23 }), fc.constantFrom(0, 15, 30, 45))
      .map(([h, m]) => `${String(h).padStart(2, '0')}:${String(m).padStart(2, '0')}`);
    fc.assert(
      fc.property(time, time, time, time, (a, b, c, d) => {
        const out = hoursOutside(a, b, c, d);
        expect(out).toBeGreaterThanOrEqual(0);
        expect(out).toBeLessThanOrEqual(workingSpanHours(a, b) + 1e-12);
        expect(hoursOutside(a, b, '00:00', '24:00')).toBe(0);
      }),
      { numRuns: 200 },
    );
  });
});

describe('boundaryPoints', () => {
  it('a 10 m line at 5 m spacing gives its ends and its middle', () => {
    expect(
      boundaryPoints(
        [
          { x: 0, y: 0 },
          { x: 10, y: 0 },
        ],
        5,
      ),
    ).toEqual([
      { x: 0, y: 0, chainageM: 0 },
      { x: 5, y: 0, chainageM: 5 },
      { x: 10, y: 0, chainageM: 10 },
    ]);
  });

  it('a 12 m leg is cut in three parts of 4 m (no gap wider than the spacing) and keeps every vertex', () => {
    const pts = boundaryPoints(
      [
        { x: 0, y: 0 },
        { x: 12, y: 0 },
        { x: 12, y: 5 },
      ],
      5,
    );
    expect(pts.map((p) => [p.x, p.y])).toEqual([
      [0, 0],
      [4, 0],
      [8, 0],
      [12, 0],
      [12, 5],
    ]); // worked by hand: ceil(12/5) = 3, ceil(5/5) = 1
    expect(pts.at(-1)!.chainageM).toBe(17);
  });

  it('one point gives itself; no point gives none', () => {
    expect(boundaryPoints([{ x: 3, y: 4 }], 5)).toEqual([{ x: 3, y: 4, chainageM: 0 }]);
    expect(boundaryPoints([], 5)).toEqual([]);
  });

  it('property: neighbouring points are never further apart than the spacing', () => {
    const pt = fc.record({ x: fc.integer({ min: -100, max: 100 }), y: fc.integer({ min: -100, max: 100 }) });
    fc.assert(
      fc.property(
        fc.array(pt, { minLength: 1, maxLength: 6 }),
        fc.double({ min: 1, max: 50, noNaN: true }),
        (line, spacing) => {
          const pts = boundaryPoints(line, spacing);
          for (let i = 1; i < pts.length; i++)
            expect(Math.hypot(pts[i]!.x - pts[i - 1]!.x, pts[i]!.y - pts[i - 1]!.y)).toBeLessThanOrEqual(
              spacing + 1e-9,
            );
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('pressureAtDistanceDb', () => {
  it('at 10 m under hemispherical spreading is LWA − 27.98 dB', () => {
    // Point-source relation: 10·lg(2/(4π·10²)) = 10·lg(1.5915e-3) = −27.98 dB (worked by hand; the tender rule of thumb "LWA − 28").
    expect(pressureAtDistanceDb(100, 10)).toBeCloseTo(72.018, 3);
    expect(pressureAtDistanceDb(108, 10) - 108).toBeCloseTo(-27.982, 3);
  });

  it('at 7 m: 100 − 20·lg 7 − 7.98 = 75.12 dB', () => {
    expect(pressureAtDistanceDb(100, 7)).toBeCloseTo(75.116, 3); // worked by hand: 20·lg 7 = 16.902
  });
});

describe('validateProject on clauses', () => {
  it('lists each missing or wrong parameter with its path and what is accepted', () => {
    const project = clauseProject([
      clause('k1', '4.1', { kind: 'limit', periodId: 'nope', limitDb: 200 }),
      clause('k2', '5.1', { kind: 'lp-cap', maxDb: 80, distanceM: -1, dutyIds: ['ghost'] }),
      clause('k3', '6.1', { kind: 'hours', start: '8am', end: '18:00' }),
      clause('k4', '8.1', { kind: 'share', minPct: 120, energies: ['steam' as 'electric'] }),
      clause('k5', '4.4', { kind: 'limit', area: 'boundary', boundary: [], periodId: 'day', limitDb: 70 }),
    ]);
    const problems = validateProject(project).map((p) => `${p.path} ${p.message}`);
    expect(problems).toEqual([
      '$.clauses[0].periodId Clause "4.1", period: "nope" is not a period of this project (use one of "day")',
      '$.clauses[0].limitDb Clause "4.1", limit: 200 is out of range (use a limit LAeq,T in dB from 20 to 120, e.g. 75)',
      '$.clauses[1].distanceM Clause "5.1", distance: -1 is out of range (use a distance in metres above 0, e.g. 45)',
      '$.clauses[1].dutyIds[0] Clause "5.1", duties: "ghost" is not a duty of this project (use one of "brk", "pmp")',
      '$.clauses[2].start Clause "6.1", allowed from: "8am" is not a time of day (use a time of day HH:MM from 00:00 to 24:00, e.g. 07:00)',
      '$.clauses[3].minPct Clause "8.1", least share: 120 is out of range (use a percentage from 0 to 100, e.g. 25)',
      '$.clauses[3].energies[0] Clause "8.1", energies: "steam" is not accepted (use one of "diesel", "petrol", "electric", "battery", "hybrid", "other")',
      '$.clauses[4].boundary Clause "4.4", boundary: [] has no point (points "x y" in metres separated by ";", e.g. "0 0; 40 0; 40 25")',
    ]);
  });

  it('a clause typed as one kind keeps the other kinds’ figures without a problem', () => {
    const project = clauseProject([
      clause('k1', '5.1', { kind: 'lwa-cap', maxDb: 105, start: 'whenever', minPct: 900 }),
    ]);
    expect(validateProject(project)).toEqual([]);
  });
});
