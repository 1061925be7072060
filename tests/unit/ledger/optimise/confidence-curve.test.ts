/**
 * Cost against the probability of full compliance (src/ledger/optimise/confidence-curve.ts),
 * the trade-off chart's probability view, checked from outside: the deterministic optimum
 * it marks is the cheapest fleet meeting every limit by an exhaustive search over fleets;
 * the assessed fleet's cost is worked by hand and its probability agrees with an
 * independent simulation (another seed, more draws) within its sampling error.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { confidenceCurve } from '../../../../src/ledger/optimise/confidence-curve.ts';
import { loadHighsSolver } from '../../../../src/ledger/optimise/load-highs.ts';
import type { LpSolver } from '../../../../src/ledger/optimise/solver.ts';
import { enumerateFleets } from '../../../../src/ledger/optimise/enumerate.ts';
import { buildSpreadModel } from '../../../../src/ledger/uncertainty/spread-model.ts';
import { simulateCompliance } from '../../../../src/ledger/uncertainty/monte-carlo.ts';
import { smallConfidenceSite } from './small-confidence-site.ts';

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

const smallSite = smallConfidenceSite;

describe('confidenceCurve', () => {
  it('the small site: one point per confidence, each verified at or above itself, cost never falling; the deterministic optimum and the assessed baseline marked', () => {
    const project = smallSite();
    const evaluation = evaluateProject(project);
    const baseline = { u0: 'c0a', u1: 'c1a', u2: 'c2a' };
    const curve = confidenceCurve(
      project,
      evaluation,
      [0.5, 0.9, 0.95],
      solver,
      { name: 'baseline', fleet: baseline },
      { draws: 4000, seed: 1 },
    );
    expect(curve.points.map((p) => p.confidence)).toEqual([0.5, 0.9, 0.95]);
    expect(curve.draws).toBe(4000);
    const found = curve.points.filter((p) => p.found);
    expect(found.length).toBe(3);
    for (const p of found) expect(p.probability!).toBeGreaterThanOrEqual(p.confidence);
    for (let i = 1; i < found.length; i++) expect(found[i]!.cost!).toBeGreaterThanOrEqual(found[i - 1]!.cost!);

    // Deterministic optimum: the cheapest fleet with no cell over its limit, by exhaustive search over the 27 fleets.
    const meeting = enumerateFleets(project, evaluation).filter((f) => f.worstMarginDb >= 0);
    const cheapest = Math.min(...meeting.map((f) => f.cost));
    expect(curve.deterministic?.cost).toBeCloseTo(cheapest, 6);

    // Assessed baseline: three loud machines at 100 a day for 5 days each (worked by hand from the fixture's hire terms).
    expect(curve.assessed.name).toBe('baseline');
    expect(curve.assessed.cost).toBeCloseTo(3 * 100 * 5, 6);
    // Independent simulation: 16,000 draws, seed 7; the two agree within 4 combined standard errors (common practice).
    const other = simulateCompliance(buildSpreadModel(project, evaluation, baseline), {
      draws: 16_000,
      seed: 7,
      probabilitiesOnly: true,
    }).joint;
    const se = Math.hypot(curve.assessed.standardError, other.standardError);
    expect(Math.abs(curve.assessed.probability - other.probability)).toBeLessThanOrEqual(4 * se + 1e-9);
  });
});
