import { describe, expect, it } from 'vitest';
import type { Project } from '../../../../src/ledger/model/model.ts';
import { candidate, duty, projectShell, receiver } from '../fixtures.ts';
import { CHART_DISTANCES_M, distanceChart } from '../../../../src/ledger/prediction/distance-chart.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';

/** Tolerance for levels worked by hand to two decimals, dB. */
const TOL_DB = 0.01;

/**
 * Two duties of one phase working the whole 07:00–19:00 day, each stated 40 m from a house
 * without a façade (simple method, Q = 2): "Dig" offers eight machines of 105, 104 … 98 dB,
 * "Haul" one of 99 dB. Invented.
 */
function project(): Project {
  return projectShell({
    phases: [{ id: 'ph1', name: 'Earthworks', periodId: 'day', start: '07:00', end: '19:00' }],
    receivers: [receiver({ facade: false, limitsDb: { day: 65 } })],
    duties: [
      duty({
        id: 'dig',
        name: 'Dig',
        location: { kind: 'distances', distancesM: { r1: 40 } },
        baselineCandidateId: 'c0',
      }),
      duty({
        id: 'haul',
        name: 'Haul',
        location: { kind: 'distances', distancesM: { r1: 40 } },
        baselineCandidateId: 'h',
      }),
    ],
    candidates: [
      ...[0, 1, 2, 3, 4, 5, 6, 7].map((k) =>
        candidate({ id: `c${k}`, dutyId: 'dig', label: `Digger ${k}`, lwaDb: 105 - k }),
      ),
      candidate({ id: 'h', dutyId: 'haul', label: 'Dumper', lwaDb: 99 }),
    ],
  });
}

describe('distanceChart', () => {
  it('distanceChart reads LWA 105 at the present 40 m as 64.98 dB', () => {
    // point source, common practice (domain primer §2): Lp = LWA − 20·lg r − 10.99 + 10·lg Q
    // worked by hand: 105 − 20·lg 40 − 10.99 + 10·lg 2 = 105 − 32.04 − 10.99 + 3.01 = 64.98
    const p = project();
    const chart = distanceChart(p, 'dig', 'r1', { evaluation: evaluateProject(p) });
    expect(chart.currentDistanceM).toBe(40);
    expect(chart.curves[0]!.candidateId).toBe('c0');
    expect(Math.abs(chart.curves[0]!.atCurrentDb! - 64.98)).toBeLessThan(TOL_DB);
    // and 6.02 dB less at twice the distance (common practice): at 80 m, 58.96 dB by the curve itself
    const at80 = distanceChart(p, 'dig', 'r1', { distancesM: [80] });
    expect(Math.abs(at80.curves[0]!.points[0]!.levelDb - 58.96)).toBeLessThan(TOL_DB);
  });

  it('distanceChart gives the phase total the limit is compared with: both duties, 65.95 dB, over 65', () => {
    // worked by hand: Dig's baseline 64.98 dB and Haul's 99 − 40.02 = 58.98 dB add energetically,
    // 10·lg(10^6.498 + 10^5.898) = 65.95 dB (common practice: levels add as energies)
    const p = project();
    const chart = distanceChart(p, 'dig', 'r1', { evaluation: evaluateProject(p) });
    expect(chart.limitDb).toBe(65);
    expect(chart.phaseTotal?.phaseName).toBe('Earthworks');
    expect(chart.phaseTotal?.periodName).toBe('Day');
    expect(chart.phaseTotal?.duties).toBe(2);
    expect(Math.abs(chart.phaseTotal!.levelDb - 65.95)).toBeLessThan(TOL_DB);
    expect(chart.phaseTotal?.over).toBe(true);
  });

  it('distanceChart draws the baseline and the quietest of the ranking, six lines at most, and says so', () => {
    const p = project();
    const quietestFirst = ['c7', 'c6', 'c5', 'c4', 'c3', 'c2', 'c1', 'c0'];
    const chart = distanceChart(p, 'dig', 'r1', { rankedIds: quietestFirst });
    expect(chart.curves.map((c) => c.candidateId).sort()).toEqual(['c0', 'c3', 'c4', 'c5', 'c6', 'c7']);
    expect(chart.note).toBe('Showing the baseline and the 5 quietest of the 8 machines of this duty, by the ranking.');
  });

  it('distanceChart without an evaluation or a receiver has no phase total, and without a receiver no read-out', () => {
    const p = project();
    expect(distanceChart(p, 'dig', 'r1').phaseTotal).toBeUndefined();
    const free = distanceChart(p, 'dig', undefined);
    expect(free.currentDistanceM).toBeUndefined();
    expect(free.curves.every((c) => c.atCurrentDb === undefined)).toBe(true);
    expect(free.curves[0]!.points).toHaveLength(CHART_DISTANCES_M.length);
  });
});
