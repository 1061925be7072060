import { describe, expect, it } from 'vitest';
import type { Candidate, Project, Receiver } from '../../../../src/ledger/model/model.ts';
import { projectShell } from '../fixtures.ts';
import { levelVersusDistance, logSpacedDistances } from '../../../../src/ledger/prediction/distance-curve.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { InputError } from '../../../../src/core/input-error.ts';

/** Tolerance for levels read back from the ledger, dB. */
const TOL_DB = 0.01;

function candidate(id: string, lwaDb: number, extra: Partial<Candidate> = {}): Candidate {
  return {
    id,
    dutyId: 'dig',
    label: `Machine ${id}`,
    category: 'excavator',
    lwaDb,
    declaration: 'guaranteed',
    lwaOrigin: 'declared',
    character: 'none',
    energy: 'diesel',
    source: 'invented for a test',
    cost: { kind: 'hire', dayRate: 100 },
    runningPerDay: 0,
    fixedCharges: 0,
    ...extra,
  };
}

function receiver(extra: Partial<Receiver> = {}): Receiver {
  return {
    id: 'home',
    name: 'Invented cottage',
    kind: 'home',
    x: 0,
    y: 0,
    heightM: 1.5,
    facade: false,
    limitsDb: { day: 65 },
    screening: {},
    ...extra,
  };
}

/** One duty working all of a 07:00–19:00 period (no working-hours correction), 40 m from one receiver. */
function project(over: Partial<Project> = {}, rec: Receiver = receiver()): Project {
  return projectShell({
    name: 'Distance test',
    phases: [{ id: 'ground', name: 'Groundworks', periodId: 'day', start: '07:00', end: '19:00' }],
    receivers: [rec],
    duties: [
      {
        id: 'dig',
        name: 'Digging',
        phaseId: 'ground',
        count: 1,
        onTimePct: 100,
        durationDays: 5,
        location: { kind: 'distances', distancesM: { home: 40 } },
        baselineCandidateId: 'a',
      },
    ],
    candidates: [candidate('a', 105), candidate('b', 99)],
    ...over,
  });
}

const level = (curves: ReturnType<typeof levelVersusDistance>, id: string, i: number) =>
  curves.curves.find((c) => c.candidateId === id)?.points[i]?.levelDb ?? NaN;

describe('levelVersusDistance', () => {
  it('levelVersusDistance(simple, Q = 2, LWA 105, 10 m) is 77.0 dB', () => {
    // common practice: Lp = Lw − 20·lg r − 7.98 for a hemisphere (domain primer §2): 105 − 20 − 7.98 = 77.02
    const curves = levelVersusDistance(project(), 'dig', [10], 'home');
    expect(level(curves, 'a', 0)).toBeCloseTo(77.02, 1);
  });

  it('levelVersusDistance falls 6.02 dB for each doubling of distance', () => {
    // common practice: doubling the distance from a point source lowers the level by 6.02 dB
    const curves = levelVersusDistance(project(), 'dig', [10, 20, 40, 80], 'home');
    for (let i = 1; i < 4; i++) expect(level(curves, 'a', i - 1) - level(curves, 'a', i)).toBeCloseTo(6.02, 2);
  });

  it('levelVersusDistance keeps the 6 dB gap between candidates of 105 and 99 dB at every distance', () => {
    // common practice: with the same path, levels differ by the difference in sound power (105 − 99 = 6 dB)
    const curves = levelVersusDistance(project(), 'dig', [5, 50, 500], 'home');
    for (let i = 0; i < 3; i++) expect(level(curves, 'a', i) - level(curves, 'b', i)).toBeCloseTo(6, 6);
  });

  it('levelVersusDistance adds 3 dB for a façade receiver and takes 10 dB off for a fully hidden machine', () => {
    // common practice: façade +3 dB; screening rule of thumb, machine fully hidden −10 dB (domain primer §3)
    const plain = levelVersusDistance(project(), 'dig', [30], 'home');
    const facade = levelVersusDistance(project({}, receiver({ facade: true })), 'dig', [30], 'home');
    const hidden = levelVersusDistance(
      project({}, receiver({ screening: { dig: { kind: 'hidden' } } })),
      'dig',
      [30],
      'home',
    );
    expect(level(facade, 'a', 0) - level(plain, 'a', 0)).toBeCloseTo(3, 6);
    expect(level(plain, 'a', 0) - level(hidden, 'a', 0)).toBeCloseTo(10, 6);
  });

  it('levelVersusDistance with 50 % on-time is 3.01 dB below full on-time', () => {
    // common practice: on-time correction 10·lg(0.5) = −3.01 dB (domain primer §3)
    const full = levelVersusDistance(project(), 'dig', [25], 'home');
    const base = project();
    const half = levelVersusDistance(
      { ...base, duties: base.duties.map((d) => ({ ...d, onTimePct: 50 })) },
      'dig',
      [25],
      'home',
    );
    expect(level(full, 'a', 0) - level(half, 'a', 0)).toBeCloseTo(3.01, 2);
  });

  it('levelVersusDistance at the receiver’s own distance equals the evaluation’s contribution there', () => {
    // consistency with the ledger's results: the curve must pass through the matrix's figure (ISO 9613-2:1996 path)
    const p = project(
      {
        propagation: {
          method: 'iso9613-2:1996',
          temperatureC: 10,
          humidityPct: 70,
          pressureKPa: 101.325,
          groundFactor: 0.5,
          groundMethod: 'alternative',
          sourceHeightM: 2,
          c0Db: 0,
        },
      },
      receiver({ heightM: 4, facade: true }),
    );
    const curves = levelVersusDistance(p, 'dig', [40], 'home');
    const evaluation = evaluateProject(p);
    expect(Math.abs(level(curves, 'b', 0) - evaluation.contributionDb('b', 'home'))).toBeLessThan(TOL_DB);
    expect(curves.currentDistanceM).toBe(40);
  });

  it('levelVersusDistance reports the receiver’s limit for the phase period and marks the baseline', () => {
    const curves = levelVersusDistance(project(), 'dig', [10], 'home');
    expect(curves.limitDb).toBe(65);
    expect(curves.curves.map((c) => [c.candidateId, c.isBaseline])).toEqual([
      ['a', true],
      ['b', false],
    ]);
  });

  it('levelVersusDistance with candidateIds draws only those machines, at the same levels', () => {
    // common practice: a machine's own contribution does not depend on the other machines offered
    const all = levelVersusDistance(project(), 'dig', [10, 100], 'home');
    const one = levelVersusDistance(project(), 'dig', [10, 100], 'home', { candidateIds: ['b'] });
    expect(one.curves.map((c) => c.candidateId)).toEqual(['b']);
    expect(Math.abs(level(one, 'b', 1) - level(all, 'b', 1))).toBeLessThan(TOL_DB);
  });

  it('levelVersusDistance ignores the other phases, duties and their machines', () => {
    // the curve depends on this duty's phase alone: a second phase with an unreadable machine changes nothing
    const base = project();
    const bigger: Project = {
      ...base,
      periods: [...base.periods, { id: 'night', name: 'Night', start: '23:00', end: '23:30' }],
      phases: [...base.phases, { id: 'late', name: 'Late works', periodId: 'night', start: '23:00', end: '23:30' }],
      duties: [
        ...base.duties,
        { ...base.duties[0]!, id: 'lift', name: 'Lifting', phaseId: 'late', baselineCandidateId: 'c' },
      ],
      candidates: [...base.candidates, candidate('c', NaN, { dutyId: 'lift' })],
    };
    const plain = levelVersusDistance(base, 'dig', [30], 'home');
    const withOthers = levelVersusDistance(bigger, 'dig', [30], 'home');
    expect(withOthers.curves.map((c) => c.candidateId)).toEqual(['a', 'b']);
    expect(Math.abs(level(withOthers, 'a', 0) - level(plain, 'a', 0))).toBeLessThan(TOL_DB);
  });

  it('levelVersusDistance without a receiver gives no limit and no present distance', () => {
    const curves = levelVersusDistance(project(), 'dig', [10]);
    expect(curves.limitDb).toBeUndefined();
    expect(curves.currentDistanceM).toBeUndefined();
    // common practice, as above: 105 − 20 − 7.98
    expect(level(curves, 'a', 0)).toBeCloseTo(77.02, 1);
  });

  it('levelVersusDistance gives NaN for a candidate whose LWA could not be read', () => {
    const p = project({
      candidates: [candidate('a', NaN), candidate('b', 99)],
      unreadCells: { 'candidates/a/lwaDb': '1O5' },
    });
    const curves = levelVersusDistance(p, 'dig', [10], 'home');
    expect(level(curves, 'a', 0)).toBeNaN();
    expect(Number.isFinite(level(curves, 'b', 0))).toBe(true);
  });

  it('levelVersusDistance(unknown duty) throws an InputError naming the duty', () => {
    expect(() => levelVersusDistance(project(), 'nope', [10])).toThrow(InputError);
    expect(() => levelVersusDistance(project(), 'nope', [10])).toThrow(/duty: "nope" does not exist/);
  });

  it('levelVersusDistance(distance 0) throws an InputError saying what is accepted', () => {
    expect(() => levelVersusDistance(project(), 'dig', [10, 0])).toThrow(
      /distance 2: 0 is out of range \(use a distance in metres greater than 0/,
    );
  });
});

describe('logSpacedDistances', () => {
  it('logSpacedDistances(10, 1000, 2) gives five points, a factor √10 apart, ending exactly at 1000', () => {
    const d = logSpacedDistances(10, 1000, 2);
    expect(d).toHaveLength(5);
    expect(d[0]).toBe(10);
    expect(d[4]).toBe(1000);
    expect((d[1] as number) / (d[0] as number)).toBeCloseTo(Math.sqrt(10), 9);
  });

  it('logSpacedDistances(100, 10) throws', () => {
    expect(() => logSpacedDistances(100, 10)).toThrow(InputError);
  });
});
