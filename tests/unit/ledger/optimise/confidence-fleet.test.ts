/**
 * The cheapest fleet at a chosen confidence (src/ledger/optimise/confidence-fleet.ts),
 * verified from outside: its fleet, simulated independently with more draws, meets the
 * confidence; and on small projects its cost is compared with an exhaustive search over
 * every fleet using the same simulation (the method may be conservative: the gap is
 * reported in the test's name and must not be negative).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Fleet, Project } from '../../../../src/ledger/model/model.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { confidenceFleet } from '../../../../src/ledger/optimise/confidence-fleet.ts';
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

function exhaustiveAtConfidence(
  project: Project,
  confidence: number,
  draws: number,
  seed: number,
): { fleet: Fleet; cost: number } | undefined {
  const evaluation = evaluateProject(project);
  let best: { fleet: Fleet; cost: number } | undefined;
  for (const f of enumerateFleets(project, evaluation)) {
    if (best && f.cost >= best.cost) continue;
    const p = simulateCompliance(buildSpreadModel(project, evaluation, f.fleet), {
      draws,
      seed,
      probabilitiesOnly: true,
    }).joint.probability;
    if (p >= confidence) best = { fleet: f.fleet, cost: f.cost };
  }
  return best;
}

/** Gaps over the exhaustive search, printed after the run (the method may be conservative). */
const gaps: string[] = [];
afterAll(() => {
  console.info(`confidenceFleet against exhaustive search (small site): ${gaps.join('; ')}`);
});

describe('confidenceFleet', () => {
  it.each([0.5, 0.9, 0.95])(
    'at %d: the fleet found is verified, its independent check meets the confidence within 3 standard errors, and its cost is at or above the exhaustive search’s with the same simulation, within a fifth of it',
    (confidence) => {
      const project = smallSite();
      const evaluation = evaluateProject(project);
      const r = confidenceFleet(project, evaluation, { confidence, draws: 4000, seed: 1 }, solver);
      expect(r.found).toBe(true);
      expect(r.verified!.probability).toBeGreaterThanOrEqual(confidence);
      // Independent simulation: 16,000 draws, seed 2.
      expect(r.check!.draws).toBe(16_000);
      expect(r.check!.probability).toBeGreaterThanOrEqual(confidence - 3 * r.check!.standardError);
      const exhaustive = exhaustiveAtConfidence(project, confidence, 4000, 1);
      expect(exhaustive).toBeDefined();
      const gap = (r.cost as number) - exhaustive!.cost;
      expect(gap).toBeGreaterThanOrEqual(-1e-9);
      // The gap over the exhaustive optimum stays within a fifth of the cost on this site.
      expect(gap).toBeLessThanOrEqual(0.2 * exhaustive!.cost);
      gaps.push(`${confidence}: method ${r.cost}, exhaustive ${exhaustive!.cost}, gap ${gap}`);
    },
  );

  it('more confidence never costs less: cost at 0.5 ≤ 0.9 ≤ 0.95, and the extra over the deterministic optimum is reported', () => {
    const project = smallSite();
    const evaluation = evaluateProject(project);
    const costs = [0.5, 0.9, 0.95].map((c) =>
      confidenceFleet(project, evaluation, { confidence: c, draws: 4000, seed: 1 }, solver),
    );
    expect(costs[0]!.cost!).toBeLessThanOrEqual(costs[1]!.cost!);
    expect(costs[1]!.cost!).toBeLessThanOrEqual(costs[2]!.cost!);
    const r = costs[1]!;
    expect(r.deterministic).toBeDefined();
    expect(r.extraCost).toBeCloseTo(r.cost! - r.deterministic!.cost, 6);
    expect(r.message).toMatch(/meets every limit with probability 90.0 %/);
    expect(r.method).toMatch(/verified/);
  });

  it('a confidence no fleet can reach is said so, with the best reached', () => {
    const project = smallSite();
    project.receivers[1]!.limitsDb = { day: 58 };
    const r = confidenceFleet(project, evaluateProject(project), { confidence: 0.99, draws: 2000, seed: 1 }, solver);
    expect(r.found).toBe(false);
    expect(r.message).toMatch(/^No fleet was found that meets every limit with probability 99.0 %/);
  });

  it('a confidence outside 0.01–0.9999 is refused with what is accepted', () => {
    const project = smallSite();
    expect(() => confidenceFleet(project, evaluateProject(project), { confidence: 1 }, solver)).toThrow(
      /a probability from 0.01 to 0.9999/,
    );
  });
});

describe('confidenceCosts', () => {
  it('the small site: cost never falls as confidence rises, and each level found is verified at or above itself', async () => {
    const { confidenceCosts } = await import('../../../../src/ledger/optimise/confidence-fleet.ts');
    const project = smallSite();
    const rows = confidenceCosts(project, evaluateProject(project), [0.5, 0.8, 0.9, 0.95, 0.99], solver, {
      draws: 4000,
      seed: 1,
    });
    const found = rows.filter((r) => r.found);
    expect(found.length).toBeGreaterThanOrEqual(4);
    for (let i = 1; i < found.length; i++) expect(found[i]!.cost!).toBeGreaterThanOrEqual(found[i - 1]!.cost!);
    for (const r of found) expect(r.probability!).toBeGreaterThanOrEqual(r.confidence);
  });
});
