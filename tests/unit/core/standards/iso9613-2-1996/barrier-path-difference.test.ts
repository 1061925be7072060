import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { topEdgePath } from '../../../../../src/core/standards/iso9613-2-1996/barrier-path-difference.ts';
import { InputError } from '../../../../../src/core/input-error.ts';

describe('topEdgePath: ISO 9613-2:1996 eq. 16 from plan geometry', () => {
  it('straight barrier square to the path, source and receiver at equal heights', () => {
    // S (0,0) at 1 m, R (20,0) at 1 m, barrier x = 10 from y −50 to 50, top 3 m.
    // d_ss = d_sr = √(10² + 2²) = √104 = 10.198 m, a = 0, d = 20 m;
    // z = 2·√104 − 20 = 0.39608 m — worked by hand from eq. 16
    const p = topEdgePath(
      { x: 0, y: 0, heightM: 1 },
      { x: 20, y: 0, heightM: 1 },
      { x: 10, y: -50 },
      { x: 10, y: 50 },
      3,
    )!;
    expect(p.pathDifferenceM).toBeCloseTo(0.39608, 5);
    expect(p.sourceToEdgeM).toBeCloseTo(10.19804, 5);
    expect(p.edgeToReceiverM).toBeCloseTo(10.19804, 5);
    expect(p.lateralM).toBeCloseTo(0, 12);
    expect(p.distanceM).toBe(20);
    expect(p.clearanceM).toBe(2); // top 3 m over a line of sight at 1 m
    expect(p.crossing).toEqual({ x: 10, y: 0 });
  });

  it('oblique path with source and receiver at different heights', () => {
    // S (0,0) at 2 m, R (30,10) at 5 m, barrier x = 10 from y −20 to 40, top 6 m.
    // d_ss = √(10² + 4²) = √116 = 10.7703 (foot y = 0); d_sr = √(20² + 1²) = √401 = 20.0250 (foot y = 10);
    // a = 10; d = √(30² + 10² + 3²) = √1009 = 31.7648;
    // z = √(30.7953² + 10²) − 31.7648 = 32.3783 − 31.7648 = 0.61349 m — worked by hand from eq. 16
    const p = topEdgePath(
      { x: 0, y: 0, heightM: 2 },
      { x: 30, y: 10, heightM: 5 },
      { x: 10, y: -20 },
      { x: 10, y: 40 },
      6,
    )!;
    expect(p.pathDifferenceM).toBeCloseTo(0.61349, 4);
    expect(p.lateralM).toBeCloseTo(10, 10);
    // line of sight crosses x = 10 a third of the way along: 2 + 3/3 = 3 m, under a 6 m top — worked by hand
    expect(p.clearanceM).toBeCloseTo(3, 10);
  });

  it('a barrier the plan line does not cross gives nothing; one the line of sight clears has negative clearance', () => {
    expect(
      topEdgePath({ x: 0, y: 0, heightM: 2 }, { x: 30, y: 10, heightM: 5 }, { x: 10, y: 20 }, { x: 10, y: 40 }, 6),
    ).toBeUndefined();
    // top 2.5 m under a line of sight at 3 m: clearance −0.5 m — worked by hand
    expect(
      topEdgePath({ x: 0, y: 0, heightM: 2 }, { x: 30, y: 10, heightM: 5 }, { x: 10, y: -20 }, { x: 10, y: 40 }, 2.5)!
        .clearanceM,
    ).toBeCloseTo(-0.5, 10);
  });

  it('at grazing incidence (top on the line of sight) z is 0', () => {
    const p = topEdgePath(
      { x: 0, y: 0, heightM: 1 },
      { x: 20, y: 0, heightM: 3 },
      { x: 10, y: -5 },
      { x: 10, y: 5 },
      2,
    )!;
    expect(p.clearanceM).toBeCloseTo(0, 12);
    expect(p.pathDifferenceM).toBeCloseTo(0, 7);
  });

  it('refuses a coordinate that is not a number, naming it', () => {
    expect(() =>
      topEdgePath({ x: NaN, y: 0, heightM: 1 }, { x: 20, y: 0, heightM: 1 }, { x: 10, y: -5 }, { x: 10, y: 5 }, 2),
    ).toThrow(InputError);
    expect(() =>
      topEdgePath({ x: 0, y: 0, heightM: 1 }, { x: 20, y: 0, heightM: 1 }, { x: 10, y: -5 }, { x: 10, y: 5 }, -1),
    ).toThrow(/barrier height/);
  });

  it('z is the shortest path over the edge less d (property: no sampled point of the edge line gives a shorter path)', () => {
    const coord = fc.double({ min: -50, max: 50, noNaN: true });
    const height = fc.double({ min: 0, max: 10, noNaN: true });
    fc.assert(
      fc.property(
        coord,
        coord,
        height,
        coord,
        coord,
        height,
        fc.double({ min: 0.1, max: 12, noNaN: true }),
        (sx, sy, sh, rx, ry, rh, top) => {
          const a = { x: 0, y: -200 };
          const b = { x: 0.3, y: 200 };
          const s = { x: -Math.abs(sx) - 1, y: sy, heightM: sh };
          const r = { x: Math.abs(rx) + 1, y: ry, heightM: rh };
          const p = topEdgePath(s, r, a, b, top);
          if (!p) return;
          let shortest = Infinity;
          for (let k = 0; k <= 4000; k++) {
            const t = k / 4000;
            const e = { x: a.x + t * (b.x - a.x), y: a.y + t * (b.y - a.y), h: top };
            const len =
              Math.hypot(s.x - e.x, s.y - e.y, s.heightM - e.h) + Math.hypot(r.x - e.x, r.y - e.y, r.heightM - e.h);
            shortest = Math.min(shortest, len);
          }
          // sampled every 0.1 m along the edge: the sampled minimum is at or just above the exact one
          expect(shortest - p.distanceM).toBeGreaterThanOrEqual(p.pathDifferenceM - 1e-9);
          expect(shortest - p.distanceM - p.pathDifferenceM).toBeLessThan(0.01);
        },
      ),
      { numRuns: 60 },
    );
  });
});
