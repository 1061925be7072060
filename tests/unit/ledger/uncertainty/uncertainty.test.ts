import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { Project } from '../../../../src/ledger/model/model.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { complianceConfidence } from '../../../../src/ledger/uncertainty/confidence.ts';
import { buildSpreadModel } from '../../../../src/ledger/uncertainty/spread-model.ts';
import { machineSpread } from '../../../../src/ledger/uncertainty/machine-spread.ts';
import { table5AccuracyDb } from '../../../../src/core/standards/iso9613-2-1996/accuracy.ts';
import { simulateCompliance } from '../../../../src/ledger/uncertainty/monte-carlo.ts';
import { analyticCell } from '../../../../src/ledger/uncertainty/analytic.ts';
import { DEFAULT_UNCERTAINTY } from '../../../../src/ledger/uncertainty/settings.ts';
import { ratedSoundPower } from '../../../../src/ledger/rating/rating.ts';
import { normalCdf } from '../../../../src/core/normal-distribution.ts';
import { candidate, duty, receiver, twoDutyProject } from '../fixtures.ts';

/**
 * One machine, guaranteed LWA 100 dB with K 3.29 dB (σ = 3.29/1.645 = 2 dB, ISO 4871 from
 * memory), 20 m from a façade receiver, simple method Q = 2, on-time 100 %, working
 * 08:00–18:00 in a 07:00–19:00 period; path accuracy set to 0 so the machine alone spreads.
 * Level worked by hand: 100 + 10·lg(2/(4π·20²)) + 3 − 10·lg(12/10)
 *   = 100 − 34.0024 + 3 − 0.7918 = 68.2058 dB; mean = 68.2058 − 3.29 = 64.9158 dB.
 */
function oneMachine(limitDb = 68, over: Partial<Project> = {}): Project {
  const p = twoDutyProject();
  return {
    ...p,
    receivers: [receiver({ limitsDb: { day: limitDb } })],
    duties: [duty({ id: 'u1', name: 'A', baselineCandidateId: 'a1' })],
    candidates: [candidate({ id: 'a1', dutyId: 'u1', label: 'A', lwaDb: 100, uncertaintyDb: 3.29 })],
    uncertainty: { ...DEFAULT_UNCERTAINTY, simpleMethodAccuracyDb: 0 },
    ...over,
  };
}

// The same to more places: 68.20578894 dB (worked by hand with a calculator).
const HAND_LEVEL = 68.20578894;

describe('single source with a normal spread: P = Φ((limit − mean)/σ) (the normal distribution, common practice)', () => {
  it('limit 68 dB: P = Φ((68 − 64.9158)/2) = Φ(1.5421) = 0.93848 (worked by hand)', () => {
    const project = oneMachine(68);
    const r = complianceConfidence(project, evaluateProject(project), { draws: 1000, seed: 1 });
    expect(r.cells).toHaveLength(1);
    const cell = r.cells[0]!;
    expect(cell.levelDb).toBeCloseTo(HAND_LEVEL, 3);
    expect(cell.analytic.probability).toBeCloseTo(0.93848, 4);
    expect(cell.analytic.medianDb).toBeCloseTo(HAND_LEVEL - 3.29, 3);
    expect(cell.analytic.sigmaDb).toBeCloseTo(2, 9);
  });
  it('the centre is the mean L_d − K, never L_d: with the limit at L_d − K the probability is one half', () => {
    const project = oneMachine(HAND_LEVEL - 3.29);
    const cell = complianceConfidence(project, evaluateProject(project), { analyticOnly: true }).cells[0]!;
    expect(cell.analytic.probability).toBeCloseTo(0.5, 3);
  });
  it('the 90 %-sure level is mean + 1.2816·σ = 64.9158 + 2.5631 = 67.4789 dB (normal quantile, worked by hand)', () => {
    const project = oneMachine(68);
    const cell = complianceConfidence(project, evaluateProject(project), { analyticOnly: true }).cells[0]!;
    expect(cell.analytic.boundDb).toBeCloseTo(67.4789, 3);
  });
  it('the Monte Carlo estimate with 100,000 draws lies within 4 standard errors of 0.93848, and its bound within its stated range of 67.4789', () => {
    const project = oneMachine(68);
    const r = complianceConfidence(project, evaluateProject(project), { draws: 100_000, seed: 7 });
    const s = r.cells[0]!.simulated;
    expect(s.standardError).toBeCloseTo(Math.sqrt((0.93848 * 0.06152) / 100_000), 4);
    expect(Math.abs(s.probability - 0.93848)).toBeLessThan(4 * s.standardError);
    expect(s.boundRangeDb[0]).toBeLessThanOrEqual(67.4789 + 0.02);
    expect(s.boundRangeDb[1]).toBeGreaterThanOrEqual(67.4789 - 0.02);
    expect(r.joint.probability).toBe(s.probability);
  });
});

describe('machineSpread: centred on the mean level, never spread on top of L_d', () => {
  const settings = twoDutyProject().settings;
  const model = DEFAULT_UNCERTAINTY;
  const shift = (over: Parameters<typeof candidate>[0], basis: 'guaranteed' | 'measured') => {
    const c = candidate(over);
    const s = { ...settings, levelBasis: basis };
    return machineSpread(c, ratedSoundPower(c, s), s, model);
  };
  it('guaranteed 103 with K 2, rated on the guaranteed value: mean 101, shift −2', () => {
    expect(shift({ lwaDb: 103, uncertaintyDb: 2 }, 'guaranteed').centreShiftDb).toBe(-2);
  });
  it('measured 101 with K 2, rated L + K = 103: mean 101, shift −2', () => {
    expect(shift({ lwaDb: 101, declaration: 'measured', uncertaintyDb: 2 }, 'guaranteed').centreShiftDb).toBe(-2);
  });
  it('guaranteed 103 with K 2, rated on the measured basis (103 − 2 = 101): already the mean, shift 0', () => {
    expect(shift({ lwaDb: 103, uncertaintyDb: 2 }, 'measured').centreShiftDb).toBe(0);
  });
  it('guaranteed 103 without K: the default K 3 is assumed and marked; shift −3; σ = 3/1.645', () => {
    const m = shift({ lwaDb: 103 }, 'guaranteed');
    expect(m.kAssumed).toBe(true);
    expect(m.centreShiftDb).toBe(-3);
    expect(m.sigmaDb).toBeCloseTo(1.8237, 4);
    expect(m.words).toContain('K assumed');
  });
  it('measured 101 without K: mean 101 (shift 0), spread by the default K', () => {
    const m = shift({ lwaDb: 101, declaration: 'measured' }, 'guaranteed');
    expect(m.centreShiftDb).toBe(0);
    expect(m.kAssumed).toBe(true);
  });
});

describe('table5AccuracyDb (ISO 9613-2:1996 Table 5)', () => {
  it.each([
    [50, 2, 3], // 0 < h < 5 m, d < 100 m: ±3 dB (Table 5)
    [500, 2, 3], // 0 < h < 5 m, 100 m < d < 1 km: ±3 dB (Table 5)
    [50, 10, 1], // 5 m < h < 30 m, d < 100 m: ±1 dB (Table 5)
    [500, 10, 3], // 5 m < h < 30 m, 100 m < d < 1 km: ±3 dB (Table 5)
  ])('d %d m, mean height %d m → ±%d dB', (d, h, a) =>
    expect(table5AccuracyDb({ distanceM: d, meanHeightM: h })).toBe(a),
  );
  it('nothing stated at 1 km or more, above 30 m, screened or reflected (Table 5 covers none of them)', () => {
    expect(table5AccuracyDb({ distanceM: 1500, meanHeightM: 2 })).toBeUndefined();
    expect(table5AccuracyDb({ distanceM: 50, meanHeightM: 40 })).toBeUndefined();
    expect(table5AccuracyDb({ distanceM: 50, meanHeightM: 10, screened: true })).toBeUndefined();
    expect(table5AccuracyDb({ distanceM: 50, meanHeightM: 10, reflected: true })).toBeUndefined();
  });
});

describe('shared spreads', () => {
  /** One machine heard at two receivers (20 m and 40 m): its error is shared, paths exact. */
  function twoReceivers(): Project {
    const p = oneMachine(68);
    return {
      ...p,
      receivers: [
        receiver({ id: 'r1', limitsDb: { day: 68 } }),
        receiver({ id: 'r2', name: 'Far', x: -20, limitsDb: { day: 63 } }),
      ],
    };
  }
  it('a fully shared error shifts every cell together: the joint probability is exactly the least cell probability in the simulation', () => {
    const project = twoReceivers();
    const r = complianceConfidence(project, evaluateProject(project), { draws: 20_000, seed: 3 });
    const [a, b] = r.cells.map((c) => c.simulated.probability);
    expect(r.joint.probability).toBe(Math.min(a!, b!));
  });
  it('with independent path errors instead, the joint probability is below the least cell probability', () => {
    const project = { ...twoReceivers(), uncertainty: { ...DEFAULT_UNCERTAINTY, simpleMethodAccuracyDb: 6 } };
    const r = complianceConfidence(project, evaluateProject(project), { draws: 20_000, seed: 3 });
    const least = Math.min(...r.cells.map((c) => c.simulated.probability));
    expect(r.joint.probability).toBeLessThan(least);
    expect(r.joint.probability).toBeGreaterThanOrEqual(r.joint.lowerBound - 4 * r.joint.standardError);
  });
  it('two duties at the same point share one path error at a receiver', () => {
    const p = twoDutyProject();
    const project: Project = {
      ...p,
      duties: p.duties.map((d) => ({ ...d, location: { kind: 'point', x: 20, y: 0 } })),
    };
    expect(buildSpreadModel(project, evaluateProject(project)).paths).toHaveLength(1);
    expect(buildSpreadModel(p, evaluateProject(p)).paths).toHaveLength(2);
  });
});

describe('n identical independent sources: analytic moments against a high-draw simulation', () => {
  it('4 machines at separate points 20 m away, σ 2 dB each: the analytic probability is within 0.01 of 200,000 draws', () => {
    const base = oneMachine(74);
    const spots = [
      [20, 0],
      [-20, 0],
      [0, 20],
      [0, -20],
    ] as const;
    const project: Project = {
      ...base,
      duties: spots.map(([x, y], i) =>
        duty({ id: `u${i}`, name: `D${i}`, location: { kind: 'point', x, y }, baselineCandidateId: `c${i}` }),
      ),
      candidates: spots.map((_, i) => candidate({ id: `c${i}`, dutyId: `u${i}`, lwaDb: 100, uncertaintyDb: 3.29 })),
    };
    const r = complianceConfidence(project, evaluateProject(project), { draws: 200_000, seed: 11 });
    const cell = r.cells[0]!;
    // Level of four equal machines: 68.2058 + 10·lg 4 = 74.2264 dB (common practice).
    expect(cell.levelDb).toBeCloseTo(74.2264, 3);
    expect(Math.abs(cell.analytic.probability - cell.simulated.probability)).toBeLessThan(0.01);
  });
});

describe('on-time ranges', () => {
  it('a range 50–100 % about a nominal 100 % lowers the mean energy and raises the probability', () => {
    const fixed = oneMachine(66);
    const ranged: Project = {
      ...fixed,
      duties: fixed.duties.map((d) => ({ ...d, onTimeRangePct: { lowPct: 50, highPct: 100 } })),
    };
    const a = complianceConfidence(fixed, evaluateProject(fixed), { draws: 20_000, seed: 1 }).cells[0]!;
    const b = complianceConfidence(ranged, evaluateProject(ranged), { draws: 20_000, seed: 1 }).cells[0]!;
    expect(b.analytic.probability).toBeGreaterThan(a.analytic.probability);
    expect(b.simulated.probability).toBeGreaterThan(a.simulated.probability);
    expect(Math.abs(b.simulated.probability - b.analytic.probability)).toBeLessThan(0.02);
  });
});

describe('invariants (properties)', () => {
  const project = twoDutyProject();
  const evaluation = evaluateProject(project);
  const model = buildSpreadModel(project, evaluation);
  it('probabilities lie in [0, 1] and rise with the limit (same seed), analytic and simulated', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 40, max: 90, noNaN: true }),
        fc.double({ min: 0, max: 10, noNaN: true }),
        (limit, more) => {
          const at = (l: number) => ({ ...model, cells: model.cells.map((c) => ({ ...c, limitDb: l })) });
          const lo = at(limit);
          const hi = at(limit + more);
          const a = analyticCell(lo, lo.cells[0]!).probability;
          const b = analyticCell(hi, hi.cells[0]!).probability;
          const sa = simulateCompliance(lo, { draws: 300, seed: 5, probabilitiesOnly: true }).cells[0]!.probability;
          const sb = simulateCompliance(hi, { draws: 300, seed: 5, probabilitiesOnly: true }).cells[0]!.probability;
          return a >= 0 && b <= 1 && b >= a - 1e-12 && sa >= 0 && sb <= 1 && sb >= sa;
        },
      ),
      { numRuns: 40 },
    );
  });
  it('a seed reproduces the simulation exactly; another seed gives other draws', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 ** 31 }), (seed) => {
        const a = simulateCompliance(model, { draws: 500, seed });
        const b = simulateCompliance(model, { draws: 500, seed });
        return JSON.stringify(a) === JSON.stringify(b);
      }),
      { numRuns: 10 },
    );
    const a = simulateCompliance(model, { draws: 2000, seed: 1 }).cells[0]!.boundDb;
    const b = simulateCompliance(model, { draws: 2000, seed: 2 }).cells[0]!.boundDb;
    expect(a).not.toBe(b);
  });
  it('Φ matches the analytic figure of a single source at any margin and σ', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -8, max: 8, noNaN: true }),
        fc.double({ min: 0.5, max: 5, noNaN: true }),
        (margin, k) => {
          const p = oneMachine(HAND_LEVEL - k + margin, {
            candidates: [candidate({ id: 'a1', dutyId: 'u1', label: 'A', lwaDb: 100, uncertaintyDb: k })],
          });
          const cell = complianceConfidence(p, evaluateProject(p), { analyticOnly: true }).cells[0]!;
          return Math.abs(cell.analytic.probability - normalCdf(margin / (k / 1.645))) < 1e-5;
        },
      ),
      { numRuns: 30 },
    );
  });
});

describe('assumptions in words', () => {
  it('name the K relation, the path accuracy reading, the on-time and what is shared', () => {
    const project = twoDutyProject();
    const r = complianceConfidence(project, evaluateProject(project), { analyticOnly: true });
    const text = r.assumptions.join('\n');
    expect(text).toMatch(/σ = K \/ 1.645/);
    expect(text).toMatch(/K assumed 3.0 dB \(none declared\)/);
    expect(text).toMatch(/simple point-source method, accuracy ±3.0 dB/);
    expect(text).toMatch(/Shared spreads/);
  });
});

describe('candidateChances', () => {
  it('in the two-duty project, the quiet machines of duty A raise the chance over the loud baseline, by the same draws', async () => {
    const { candidateChances } = await import('../../../../src/ledger/uncertainty/candidate-chance.ts');
    const project = twoDutyProject();
    project.receivers[0]!.limitsDb = { day: 71 };
    const evaluation = evaluateProject(project);
    const rows = candidateChances(project, evaluation, evaluation.fleet, 'u1', { draws: 4000, seed: 2 });
    expect(rows.map((r) => r.candidateId).sort()).toEqual(['a1', 'a2', 'a3', 'a4']);
    const loud = rows.find((r) => r.candidateId === 'a1')!;
    const quiet = rows.find((r) => r.candidateId === 'a2')!;
    expect(loud.current).toBe(true);
    expect(loud.gain).toBe(0);
    expect(quiet.probability).toBeGreaterThan(loud.probability);
    // a2 and a3 are the same machine at different prices (LWA 95): the same draws give the same probability.
    expect(rows.find((r) => r.candidateId === 'a3')!.probability).toBe(quiet.probability);
    // a2 costs 50 a day more for 5 days = 250 (fixture): points per 1,000 = 100·gain / 0.25.
    expect(quiet.pointsPer1000).toBeCloseTo((100 * quiet.gain) / 0.25, 9);
  });
});

describe('position over a work area', () => {
  /**
   * A duty along a line from (10, 0) to (30, 0), the receiver at (0, 0) at the same height,
   * the level taken at the nearest point (10 m); no other spread (K 0, path accuracy 0).
   * Main position uniform on x ∈ [10, 30]: energy factor (10/x)², mean
   * (1/20)·∫ 100/x² dx from 10 to 30 = 1/3 (worked by hand). With the limit 6.02 dB under
   * the ledger's level (factor 1/4, x ≥ 20 m) the probability is (30 − 20)/20 = 0.5 (worked by hand).
   */
  function lineProject(limitDb: number): Project {
    const p = oneMachine(0);
    return {
      ...p,
      receivers: [receiver({ limitsDb: { day: limitDb }, heightM: 1.5 })],
      duties: [
        duty({
          id: 'u1',
          name: 'Trench',
          baselineCandidateId: 'a1',
          sourceHeightM: 1.5,
          location: {
            kind: 'line',
            points: [
              { x: 10, y: 0 },
              { x: 30, y: 0 },
            ],
            distanceBy: 'nearest',
          },
        }),
      ],
      candidates: [candidate({ id: 'a1', dutyId: 'u1', label: 'A', lwaDb: 100, uncertaintyDb: 0 })],
    };
  }
  it('the mean energy factor is 1/3 and the probability at a limit 6.02 dB under the level is 0.5', () => {
    const probe = lineProject(70);
    const level = evaluateProject(probe).matrix[0]!.levelDb;
    const project = lineProject(level - 20 * Math.log10(2));
    const r = complianceConfidence(project, evaluateProject(project), { draws: 40_000, seed: 4 });
    expect(r.model.duties[0]!.position!.mean[0]).toBeCloseTo(1 / 3, 3);
    const s = r.cells[0]!.simulated;
    expect(Math.abs(s.probability - 0.5)).toBeLessThan(4 * s.standardError);
    expect(r.assumptions.join(' ')).toMatch(/Trench: main working position uniform over the line \(64 points\)/);
  });
  it('the position is shared: two receivers on either side of the line cannot both be near it in one draw', () => {
    const p = lineProject(70);
    const project: Project = {
      ...p,
      receivers: [
        receiver({ id: 'r1', x: 0, limitsDb: { day: 70 } }),
        receiver({ id: 'r2', name: 'East', x: 40, limitsDb: { day: 70 } }),
      ],
    };
    const model = buildSpreadModel(project, evaluateProject(project));
    const pos = model.duties[0]!.position!;
    // At the west end the east receiver is far: factors move in opposite directions along the line.
    expect(pos.factors[0]! > pos.factors[(pos.count - 1) * 2]!).toBe(true);
    expect(pos.factors[1]! < pos.factors[(pos.count - 1) * 2 + 1]!).toBe(true);
  });
});
