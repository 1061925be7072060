import { describe, expect, it } from 'vitest';
import { levelGrid, levelsAtPoints, mapQuantity } from '../../../../src/ledger/map/level-grid.ts';
import { isolineAt, isolineLevels, levelBands } from '../../../../src/ledger/map/contours.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { baselineChoice } from '../../../../src/ledger/model/fleets.ts';
import type { Project } from '../../../../src/ledger/model/model.ts';
import { candidate, duty, receiver, twoDutyProject } from '../fixtures.ts';

/** One machine, LWA 100 dB at (0, 0), 1.5 m high, working the whole period, simple method Q = 2. */
function onePointSource(): Project {
  const p = twoDutyProject();
  p.phases[0]!.start = '07:00';
  p.phases[0]!.end = '19:00';
  p.duties = [
    duty({
      id: 'u1',
      onTimePct: 100,
      count: 1,
      location: { kind: 'point', x: 0, y: 0 },
      sourceHeightM: 1.5,
      baselineCandidateId: 'c1',
    }),
  ];
  p.candidates = [candidate({ id: 'c1', dutyId: 'u1', lwaDb: 100 })];
  p.receivers = [receiver({ id: 'r1', x: 30, y: 40, heightM: 1.5, facade: false })];
  return p;
}

describe('levelsAtPoints: the map is the engine', () => {
  it('at a receiver’s position (no façade) the map gives the matrix level, in the demo-like two-duty project', () => {
    const p = twoDutyProject();
    p.receivers = [receiver({ id: 'r1', x: 5, y: 12, heightM: 1.5, facade: false })];
    p.barriers = [
      {
        id: 'b',
        name: 'Hoarding',
        heightM: 3,
        points: [
          { x: 10, y: -20 },
          { x: 10, y: 20 },
        ],
      },
    ];
    const matrix = evaluateProject(p).matrix[0]!.levelDb;
    const fleet = baselineChoice(p);
    expect(levelsAtPoints(p, 'ph1', fleet, [{ x: 5, y: 12 }], 1.5)[0]).toBe(matrix);
  });

  it('a barrier on the plan lowers the level behind it by its barrier term (simple method, 11.570 dB worked by hand)', () => {
    const p = onePointSource();
    p.duties[0]!.sourceHeightM = 1;
    const fleet = baselineChoice(p);
    const bare = levelsAtPoints(p, 'ph1', fleet, [{ x: 20, y: 0 }], 1)[0]!;
    p.barriers = [
      {
        id: 'b1',
        name: 'East hoarding',
        heightM: 3,
        points: [
          { x: 10, y: -50 },
          { x: 10, y: 50 },
        ],
      },
    ];
    const screened = levelsAtPoints(p, 'ph1', fleet, [{ x: 20, y: 0 }], 1)[0]!;
    expect(bare - screened).toBeCloseTo(11.57, 2); // D_z at 500 Hz, eqs 14 and 18 — worked by hand (tests/unit/plan/plan-screening.test.ts)
  });

  it('a phase without duties gives no level; an unknown phase NaN', () => {
    const p = onePointSource();
    expect(levelsAtPoints(p, 'nope', {}, [{ x: 1, y: 1 }], 1.5)[0]).toBeNaN();
  });
});

describe('levelGrid and its contours', () => {
  it('the contour at L around one point source (simple method) is a circle of radius √(Q·10^((Lw−L)/10)/(4π)), within a grid cell', () => {
    // Lw = 100, Q = 2, L = 60: r = √(2·10⁴/(4π)) = 39.894 m — domain primer §9a, worked by hand
    const p = onePointSource();
    const spacing = 2;
    const grid = levelGrid(p, {
      phaseId: 'ph1',
      fleet: baselineChoice(p),
      heightM: 1.5,
      spacingM: spacing,
      x0: -61,
      y0: -61,
      nx: 62,
      ny: 62,
    });
    const ring = isolineAt(grid, 60);
    const points = ring.polygons.flat(2);
    expect(points.length).toBeGreaterThan(40);
    // the outer ring: every vertex within one cell of the radius
    const outer = ring.polygons.map((poly) => poly[0]!).sort((a, b) => b.length - a.length)[0]!;
    for (const [x, y] of outer) expect(Math.abs(Math.hypot(x, y) - 39.894)).toBeLessThan(spacing);
    // and much closer than that, since levels are interpolated between grid points
    const worst = Math.max(...outer.map(([x, y]) => Math.abs(Math.hypot(x, y) - 39.894)));
    expect(worst).toBeLessThan(0.2);
  });

  it('grid levels equal the engine’s levels at the same points', () => {
    const p = twoDutyProject();
    const fleet = baselineChoice(p);
    const grid = levelGrid(p, { phaseId: 'ph1', fleet, heightM: 4, spacingM: 10, x0: -50, y0: -50, nx: 11, ny: 11 });
    const i = 3;
    const j = 7;
    const x = -50 + i * 10;
    const y = -50 + j * 10;
    const one = twoDutyProject();
    one.receivers = [receiver({ id: 'r1', x, y, heightM: 4, facade: false })];
    expect(grid.levelsDb[j * 11 + i]).toBe(evaluateProject(one).matrix[0]!.levelDb);
  });

  it('stops between blocks when asked, the rest left not computed', () => {
    const p = onePointSource();
    let calls = 0;
    const grid = levelGrid(
      p,
      { phaseId: 'ph1', fleet: baselineChoice(p), heightM: 1.5, spacingM: 1, x0: -50.5, y0: -50.5, nx: 100, ny: 100 },
      () => {
        calls++;
        return false;
      },
    );
    expect(calls).toBe(1);
    expect(Number.isFinite(grid.levelsDb[0]!)).toBe(true);
    expect(grid.levelsDb[9999]).toBeNaN();
  });

  it('isolineLevels steps on whole multiples of the step across the computed range', () => {
    expect(isolineLevels({ levelsDb: Float64Array.from([47.2, 71.9, NaN]) }, 5)).toEqual([50, 55, 60, 65, 70]);
    expect(isolineLevels({ levelsDb: Float64Array.from([NaN]) }, 5)).toEqual([]);
  });

  it('bands nest: the area at 70 dB or more lies inside the area at 60 dB or more', () => {
    const p = onePointSource();
    const grid = levelGrid(p, {
      phaseId: 'ph1',
      fleet: baselineChoice(p),
      heightM: 1.5,
      spacingM: 2,
      x0: -61,
      y0: -61,
      nx: 62,
      ny: 62,
    });
    const [b60, b70] = levelBands(grid, [60, 70]);
    const reach = (b: typeof b60) => Math.max(...b!.polygons.flat(2).map(([x, y]) => Math.hypot(x, y)));
    expect(reach(b70)).toBeLessThan(reach(b60));
  });

  it('the map is a rating level when a machine of the phase draws the character penalty', () => {
    const p = onePointSource();
    expect(mapQuantity(p, 'ph1', baselineChoice(p))).toBe('L_Aeq,T');
    p.candidates[0]!.character = 'tonal';
    expect(mapQuantity(p, 'ph1', baselineChoice(p))).toBe('L_Ar,T');
  });
});

describe('limitLine', () => {
  it('a façade receiver’s line is its limit less 3 dB (common practice façade correction), and says so', async () => {
    const { limitLine } = await import('../../../../src/ledger/map/limit-line.ts');
    const p = twoDutyProject();
    p.receivers = [receiver({ id: 'r1', name: 'House', facade: true, limitsDb: { day: 70 } })];
    expect(limitLine(p, 'r1', 'ph1')).toEqual({
      levelDb: 67,
      words: 'Limit of House: 70 dB at the façade, drawn at 67 dB free field (less the 3 dB façade correction)',
    });
    p.receivers[0]!.facade = false;
    expect(limitLine(p, 'r1', 'ph1')?.levelDb).toBe(70);
    p.receivers[0]!.limitsDb = {};
    expect(limitLine(p, 'r1', 'ph1')).toBeUndefined();
  });
});

describe('pointReport', () => {
  it('names the loudest contributor first and the barrier that screens it', async () => {
    const { pointReport } = await import('../../../../src/ledger/map/point-report.ts');
    const p = twoDutyProject();
    p.barriers = [
      {
        id: 'b',
        name: 'Hoarding',
        heightM: 4,
        points: [
          { x: 10, y: -20 },
          { x: 10, y: 20 },
        ],
      },
    ];
    const r = pointReport(p, 'ph1', baselineChoice(p), { x: 0, y: 0 }, 1.5);
    expect(r.contributors.map((c) => c.dutyId)).toEqual(['u2', 'u1']); // u1 (LWA 105, 50 %) is screened; u2 (2 × LWA 100 at 40 m) is not
    expect(r.contributors[1]!.screenedBy).toBe('Hoarding');
    const one = twoDutyProject();
    one.barriers = p.barriers;
    one.receivers = [receiver({ id: 'r1', x: 0, y: 0, heightM: 1.5, facade: false })];
    expect(r.levelDb).toBe(evaluateProject(one).matrix[0]!.levelDb);
  });
});

describe('a map of one phase among several', () => {
  it('gives that phase’s level, not another phase’s in the same period', () => {
    const p = twoDutyProject();
    p.phases.push({ id: 'ph2', name: 'Later works', periodId: 'day', start: '08:00', end: '18:00' });
    p.duties[1]!.phaseId = 'ph2';
    p.receivers = [receiver({ id: 'r1', x: 5, y: 5, heightM: 1.5, facade: false })];
    const fleet = baselineChoice(p);
    const ev = evaluateProject(p);
    for (const phaseId of ['ph1', 'ph2']) {
      const cell = ev.matrix.find((c) => c.phaseId === phaseId)!;
      expect(levelsAtPoints(p, phaseId, fleet, [{ x: 5, y: 5 }], 1.5)[0]).toBe(cell.levelDb);
    }
  });

  it('a duty known only by stated distances is left off the map and named', async () => {
    const { dutiesLeftOff } = await import('../../../../src/ledger/map/map-project.ts');
    const p = twoDutyProject();
    p.duties[1]!.location = { kind: 'distances', distancesM: { r1: 40 } };
    expect(dutiesLeftOff(p, 'ph1')).toEqual(['B']);
    expect(Number.isFinite(levelsAtPoints(p, 'ph1', baselineChoice(p), [{ x: 5, y: 5 }], 1.5)[0]!)).toBe(true);
  });
});
