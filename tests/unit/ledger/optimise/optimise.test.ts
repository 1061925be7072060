/**
 * Hand-worked cases for the fleet optimiser. Levels are given as contributions at the
 * receiver, chosen so that their energy ratios to the 70 dB limit are round numbers:
 * L = 70 + 10·lg ρ, and a phase total meets the limit when Σ ρ ≤ 1
 * (energetic addition, L = 10·lg Σ 10^(Li/10): common practice; ISO 1996-1).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { optimiseFleet } from '../../../../src/ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../../../src/ledger/optimise/load-highs.ts';
import type { LpSolver } from '../../../../src/ledger/optimise/solver.ts';
import { InputError } from '../../../../src/core/input-error.ts';
import { tableProject, type TableSpec } from './table-project.ts';

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

/** Level at the receiver whose energy ratio to a 70 dB limit is ρ. */
const at = (ratio: number) => 70 + 10 * Math.log10(ratio);

/**
 * Greedy is beaten (worked by hand). One phase, one receiver R, limit 70 dB.
 *   Duty A: A0 ρ 0.90 cost 1000 (baseline) | A1 ρ 0.80 cost 1010 | A2 ρ 0.05 cost 1500
 *   Duty B: B0 ρ 0.90 cost 1000 (baseline) | B1 ρ 0.05 cost 1550
 * Baseline Σρ = 1.8 → 72.55 dB, over by 2.55 dB.
 * Hand method, dB of reduction at R per 1,000 of extra cost:
 *   step 1: A1 10·lg(1.8/1.7) = 0.248 dB / 0.010 = 24.82; A2 10·lg(1.8/0.95) = 2.775 / 0.500 = 5.55;
 *           B1 2.775 / 0.550 = 5.05 → takes A1, Σρ = 1.7.
 *   step 2: A1→A2 10·lg(1.7/0.95) = 2.527 / 0.490 = 5.16; B1 10·lg(1.7/0.85) = 3.010 / 0.550 = 5.47
 *           → takes B1, Σρ = 0.85 → 69.29 dB, compliant. Hand fleet A1 + B1 costs 2560.
 * Every compliant fleet: A2+B0 Σρ 0.95 cost 2500; A0+B1 0.95 2550; A1+B1 0.85 2560; A2+B1 0.10 3050.
 * Exact: A2 + B0 for 2500, saving 60 over the hand method.
 */
function greedyCase(
  extra: Partial<Record<string, { pinned?: boolean; excluded?: boolean }>> = {},
  nanCandidate = false,
): TableSpec {
  const c = (id: string, ratio: number, cost: number) => ({ id, cost, levels: { R: at(ratio) }, ...(extra[id] ?? {}) });
  const a = [c('A0', 0.9, 1000), c('A1', 0.8, 1010), c('A2', 0.05, 1500)];
  if (nanCandidate) a.push({ id: 'A3', cost: 900, levels: { R: NaN } });
  return {
    phases: { P: 'day' },
    receivers: { R: { day: 70 } },
    duties: [
      { id: 'A', phaseId: 'P', baseline: 'A0', candidates: a },
      { id: 'B', phaseId: 'P', baseline: 'B0', candidates: [c('B0', 0.9, 1000), c('B1', 0.05, 1550)] },
    ],
  };
}

describe('optimiseFleet on the greedy-beaten case (worked by hand)', () => {
  it('optimiseFleet returns A2 + B0 for 2500, proven optimal', () => {
    const { project, evaluation } = tableProject(greedyCase());
    const r = optimiseFleet(project, evaluation, {}, solver);
    expect(r.feasible).toBe(true);
    expect(r.proven).toBe(true);
    expect(r.best.fleet).toEqual({ A: 'A2', B: 'B0' });
    expect(r.best.cost).toBeCloseTo(2500, 9); // worked by hand, above
    expect(r.best.worstMarginDb).toBeCloseTo(-10 * Math.log10(0.95), 9); // 0.223 dB, worked by hand
    expect(r.best.over).toEqual([]);
  });

  it('optimiseFleet reports the baseline 2.55 dB over', () => {
    const { project, evaluation } = tableProject(greedyCase());
    const r = optimiseFleet(project, evaluation, {}, solver);
    expect(r.baseline.cost).toBe(2000);
    expect(r.baseline.worstMarginDb).toBeCloseTo(-2.5527, 3); // 10·lg 1.8, worked by hand
    expect(r.baseline.over).toHaveLength(1);
  });

  it('the hand method takes A1 then B1, costs 2560, and the exact fleet saves 60', () => {
    const { project, evaluation } = tableProject(greedyCase());
    const r = optimiseFleet(project, evaluation, {}, solver);
    expect(r.hand.compliant).toBe(true);
    expect(r.hand.fleet).toEqual({ A: 'A1', B: 'B1' });
    expect(r.hand.cost).toBeCloseTo(2560, 9);
    expect(r.hand.steps.map((s) => s.candidateId)).toEqual(['A1', 'B1']);
    expect(r.hand.steps[0]?.dbPer1000).toBeCloseTo(24.82, 2); // worked by hand, above
    expect(r.hand.steps[1]?.dbPer1000).toBeCloseTo(5.473, 3); // worked by hand, above
    expect(r.savingOverHand).toBeCloseTo(60, 9);
  });

  it('the trade-off curve runs from the baseline margin to the quietest fleet A2 + B1', () => {
    const { project, evaluation } = tableProject(greedyCase());
    const r = optimiseFleet(project, evaluation, { tradeOffStepDb: 0.5 }, solver);
    // Least cost for margin ≥ −2.55 dB is the baseline itself (2000); then A1+B0 (Σρ 1.7) is
    // only 0.25 dB better, below the 0.5 dB step, so the next target −2.05 dB (Σρ ≤ 1.604)
    // gives A2+B0 (Σρ 0.95, 0.22 dB, 2500); then ≥ 0.72 dB: A1+B1 (Σρ 0.85, 0.71 dB) misses it, so
    // A2+B1 (Σρ 0.10, 10 dB, 3050), the quietest. Worked by hand.
    expect(r.tradeOff.map((p) => p.cost)).toEqual([2000, 2500, 3050]);
    expect(r.tradeOff.map((p) => p.worstMarginDb)).toEqual([
      expect.closeTo(-10 * Math.log10(1.8), 9),
      expect.closeTo(-10 * Math.log10(0.95), 9),
      expect.closeTo(10, 9),
    ]);
    expect(r.tradeOff[2]?.worstLevelDb).toBeCloseTo(60, 9);
    expect(r.tradeOff[2]?.fleet).toEqual({ A: 'A2', B: 'B1' });
  });

  it('a pinned candidate is always chosen: pinning B1 gives A0 + B1 for 2550', () => {
    const { project, evaluation } = tableProject(greedyCase({ B1: { pinned: true } }));
    const r = optimiseFleet(project, evaluation, {}, solver);
    expect(r.best.fleet).toEqual({ A: 'A0', B: 'B1' }); // worked by hand: cheapest compliant with B1
    expect(r.best.cost).toBeCloseTo(2550, 9);
    expect(r.tradeOff.every((p) => p.fleet.B === 'B1')).toBe(true);
  });

  it('an excluded candidate is never chosen: excluding A2 gives A0 + B1 for 2550', () => {
    const { project, evaluation } = tableProject(greedyCase({ A2: { excluded: true } }));
    const r = optimiseFleet(project, evaluation, {}, solver);
    expect(r.best.fleet).toEqual({ A: 'A0', B: 'B1' }); // worked by hand
    expect(r.tradeOff.every((p) => p.fleet.A !== 'A2')).toBe(true);
    expect(r.hand.fleet.A).not.toBe('A2');
  });

  it('a candidate whose level is not computable is left out and named', () => {
    const { project, evaluation } = tableProject(greedyCase({}, true));
    const r = optimiseFleet(project, evaluation, {}, solver);
    expect(r.best.fleet).toEqual({ A: 'A2', B: 'B0' });
    expect(r.notConsidered).toEqual([
      { candidateId: 'A3', dutyId: 'A', reason: 'its level at Receiver R is not computable' },
    ]);
    expect(r.message).toContain('Not considered: Machine A3 (its level at Receiver R is not computable)');
  });
});

describe('optimiseFleet with a budget (worked by hand on the same case)', () => {
  it('a budget of 2550 keeps the 2500 fleet', () => {
    const { project, evaluation } = tableProject(greedyCase());
    const r = optimiseFleet(project, evaluation, { budget: 2550 }, solver);
    expect(r.feasible).toBe(true);
    expect(r.best.cost).toBeCloseTo(2500, 9);
  });

  it('the hand method keeps to the budget: with 2555 it takes A1, then A2 instead of B1 (which would cost 2560)', () => {
    // Step 2 from A1 (2010): B1 → 2560 > 2555 is not allowed; A1→A2 → 2500, Σρ 0.95, compliant. Worked by hand.
    const { project, evaluation } = tableProject(greedyCase());
    const r = optimiseFleet(project, evaluation, { budget: 2555 }, solver);
    expect(r.hand.steps.map((s) => s.candidateId)).toEqual(['A1', 'A2']);
    expect(r.hand.cost).toBeCloseTo(2500, 9);
    expect(r.savingOverHand).toBeCloseTo(0, 9);
    expect(r.message).toBe('Every limit is met within the budget of £2,555; the cheapest such fleet costs £2,500.');
  });

  it('a budget of 2400 leaves no compliant fleet: A1 + B0 (Σρ 1.7, 2010) is the least over within it', () => {
    // Within 2400: A0+B0 Σρ 1.8 (2000), A1+B0 Σρ 1.7 (2010); A1+B0 has the smaller exceedance.
    const { project, evaluation } = tableProject(greedyCase());
    const r = optimiseFleet(project, evaluation, { budget: 2400 }, solver);
    expect(r.feasible).toBe(false);
    expect(r.best.fleet).toEqual({ A: 'A1', B: 'B0' });
    expect(r.best.worstMarginDb).toBeCloseTo(-10 * Math.log10(1.7), 9); // −2.30 dB
    expect(r.best.over).toEqual([
      { phaseId: 'P', periodId: 'day', receiverId: 'R', levelDb: expect.closeTo(at(1.7), 9), limitDb: 70 },
    ]);
    expect(r.message).toContain('No fleet meets every limit within the budget of £2,400');
    expect(r.message).toContain('Receiver R in Phase P 72.3 dB (limit 70, over by 2.3 dB)');
    expect(r.savingOverHand).toBeUndefined();
  });

  it('a budget below the cheapest fleet says so and returns the cheapest fleet', () => {
    const { project, evaluation } = tableProject(greedyCase());
    const r = optimiseFleet(project, evaluation, { budget: 1999 }, solver);
    expect(r.feasible).toBe(false);
    expect(r.best.cost).toBe(2000);
    expect(r.message).toContain('No fleet costs £1,999 or less: the cheapest possible fleet costs £2,000');
  });

  it('a negative budget is refused with what is accepted', () => {
    const { project, evaluation } = tableProject(greedyCase());
    expect(() => optimiseFleet(project, evaluation, { budget: -5 }, solver)).toThrow(
      'budget: -5 is out of range (use an amount in GBP of 0 or more)',
    );
  });
});

describe('optimiseFleet when no fleet meets every limit (worked by hand)', () => {
  /**
   * One duty D, receivers R1 and R2, limit 70 dB at both. Largest exceedance per candidate:
   *   X 75/60 dB → 5 dB (cost 100); Y 72/72 → 2 dB (200); W 72/71 → 2 dB (150); Z 73/71 → 3 dB (300).
   * Least largest exceedance is 2 dB (Y or W); the cheaper of those is W (150), still over at
   * R1 by 2 dB and R2 by 1 dB.
   */
  const spec: TableSpec = {
    phases: { P: 'day' },
    receivers: { R1: { day: 70 }, R2: { day: 70 } },
    duties: [
      {
        id: 'D',
        phaseId: 'P',
        baseline: 'X',
        candidates: [
          { id: 'X', cost: 100, levels: { R1: 75, R2: 60 } },
          { id: 'Y', cost: 200, levels: { R1: 72, R2: 72 } },
          { id: 'W', cost: 150, levels: { R1: 72, R2: 71 } },
          { id: 'Z', cost: 300, levels: { R1: 73, R2: 71 } },
        ],
      },
    ],
  };

  it('optimiseFleet returns W: smallest largest exceedance, then least cost', () => {
    const { project, evaluation } = tableProject(spec);
    const r = optimiseFleet(project, evaluation, {}, solver);
    expect(r.feasible).toBe(false);
    expect(r.proven).toBe(true);
    expect(r.best.fleet).toEqual({ D: 'W' });
    expect(r.best.cost).toBe(150);
    expect(r.best.worstMarginDb).toBeCloseTo(-2, 9);
    expect(r.best.over.map((o) => [o.receiverId, o.levelDb])).toEqual([
      ['R1', expect.closeTo(72, 9)],
      ['R2', expect.closeTo(71, 9)],
    ]);
  });

  it('the message names every cell still over', () => {
    const { project, evaluation } = tableProject(spec);
    const r = optimiseFleet(project, evaluation, {}, solver);
    expect(r.message).toContain('No fleet meets every limit.');
    expect(r.message).toContain('Receiver R1 in Phase P 72.0 dB (limit 70, over by 2.0 dB)');
    expect(r.message).toContain('Receiver R2 in Phase P 71.0 dB (limit 70, over by 1.0 dB)');
  });

  it('the hand method stops when nothing lowers the worst cell, not compliant', () => {
    // From X (R1 worst at 75): W lowers R1 to 72 for +50 → 60 dB/1000; Y to 72 for +100; Z to 73 for +200.
    // Takes W; R1 still worst at 72; Y (72) does not lower it, Z raises it → stops. Worked by hand.
    const { project, evaluation } = tableProject(spec);
    const r = optimiseFleet(project, evaluation, {}, solver);
    expect(r.hand.compliant).toBe(false);
    expect(r.hand.steps).toEqual([{ dutyId: 'D', candidateId: 'W', dbPer1000: expect.closeTo(60, 9) }]);
  });
});

describe('optimiseFleet without any limit', () => {
  it('with no receiver limited, the cheapest fleet is chosen and the margin is unbounded', () => {
    const spec = greedyCase();
    spec.receivers = { R: {} };
    const { project, evaluation } = tableProject(spec);
    const r = optimiseFleet(project, evaluation, {}, solver);
    expect(r.feasible).toBe(true);
    expect(r.best.fleet).toEqual({ A: 'A0', B: 'B0' }); // cheapest: 1000 + 1000
    expect(r.best.worstMarginDb).toBe(Infinity);
    expect(r.hand.steps).toEqual([]);
    expect(r.tradeOff).toEqual([
      { worstMarginDb: Infinity, worstLevelDb: -Infinity, cost: 2000, fleet: { A: 'A0', B: 'B0' } },
    ]);
  });
});

describe('optimiseFleet input problems', () => {
  it('two pinned candidates in one duty are refused', () => {
    const { project, evaluation } = tableProject(greedyCase({ A1: { pinned: true }, A2: { pinned: true } }));
    expect(() => optimiseFleet(project, evaluation, {}, solver)).toThrow(InputError);
    expect(() => optimiseFleet(project, evaluation, {}, solver)).toThrow(
      'duty "Duty A": ["Machine A1","Machine A2"] has more than one pinned candidate (pin at most one candidate per duty)',
    );
  });

  it('a candidate both pinned and excluded is refused', () => {
    const { project, evaluation } = tableProject(greedyCase({ A1: { pinned: true, excluded: true } }));
    expect(() => optimiseFleet(project, evaluation, {}, solver)).toThrow('is both pinned and excluded');
  });

  it('a duty whose candidates are all excluded is refused', () => {
    const { project, evaluation } = tableProject(greedyCase({ B0: { excluded: true }, B1: { excluded: true } }));
    expect(() => optimiseFleet(project, evaluation, {}, solver)).toThrow(
      'duty "Duty B": ["Machine B0","Machine B1"] has no candidate the optimiser can choose',
    );
  });
});

describe('optimiseFleet results cross a worker boundary', () => {
  it('structuredClone(result) equals the result (plain data, no functions)', () => {
    const { project, evaluation } = tableProject(greedyCase());
    const r = optimiseFleet(project, evaluation, {}, solver);
    expect(structuredClone(r)).toEqual(r);
  });
});
