/**
 * The optimiser on projects evaluated by the real evaluation (src/ledger/prediction/evaluate.ts):
 * random invented sites, cross-checked against exhaustive enumeration, and every returned
 * fleet re-evaluated with evaluateProject(project, fleet) — the evaluation's own phase
 * totals, not the optimiser's model — to confirm it meets every limit.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { optimiseFleet } from '../../../../src/ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../../../src/ledger/optimise/load-highs.ts';
import type { LpSolver } from '../../../../src/ledger/optimise/solver.ts';
import { bestByEnumeration, enumerateFleets } from '../../../../src/ledger/optimise/enumerate.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { siteProject } from './site-project.ts';
import { rng } from './table-project.ts';

/** A level meets its limit when at most this far above it, dB (solver feasibility 1e-9 of energy). */
const LEVEL_TOLERANCE_DB = 1e-6;
const SITES = 150;

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

describe(`optimiseFleet on ${SITES} random sites evaluated by evaluateProject`, () => {
  it('the cost equals enumeration and evaluateProject(project, best.fleet) shows every limit met', () => {
    let compliant = 0;
    for (let seed = 1; seed <= SITES; seed++) {
      const r = rng(seed * 7919);
      const int = (lo: number, hi: number) => lo + Math.floor(r() * (hi - lo + 1));
      const { project, evaluation } = siteProject(
        { duties: int(2, 4), candidates: int(2, 4), receivers: int(1, 3), phases: int(1, 2) },
        seed,
      );
      expect(evaluation.problems, `seed ${seed}`).toEqual([]);
      const result = optimiseFleet(project, evaluation, { tradeOff: false }, solver);
      const truth = bestByEnumeration(enumerateFleets(project, evaluation));
      expect(truth, `seed ${seed}`).toBeDefined();
      expect(result.feasible, `seed ${seed}`).toBe(truth?.feasible);
      expect(result.best.cost, `seed ${seed}`).toBeCloseTo(truth?.cost as number, 6);

      const again = evaluateProject(project, result.best.fleet);
      expect(again.fleetCost, `seed ${seed}`).toBeCloseTo(result.best.cost, 6);
      const limited = again.matrix.filter(
        (c) => c.limitDb !== undefined && project.duties.some((d) => d.phaseId === c.phaseId),
      );
      const worst = Math.min(...limited.map((c) => c.marginDb as number));
      expect(worst, `seed ${seed}`).toBeCloseTo(result.best.worstMarginDb, 9);
      if (result.feasible) {
        compliant++;
        for (const c of limited)
          expect(c.levelDb, `seed ${seed} ${c.phaseId}/${c.receiverId}`).toBeLessThanOrEqual(
            (c.limitDb as number) + LEVEL_TOLERANCE_DB,
          );
      } else {
        expect(worst, `seed ${seed}`).toBeCloseTo(truth?.worstMarginDb as number, 6);
      }
    }
    expect(compliant).toBeGreaterThan(SITES / 3);
  });
});
