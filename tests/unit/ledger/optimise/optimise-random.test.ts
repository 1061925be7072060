/**
 * Property test: on 500 random small projects (2–4 duties × 2–4 candidates × 1–3 receivers ×
 * 1–2 phases, random pins, exclusions and budgets) the optimiser agrees with exhaustive
 * enumeration, and every fleet it returns meets every limit when re-evaluated here,
 * independently of the solver.
 * Source of truth: enumeration of every fleet (src/ledger/optimise/enumerate.ts) and the
 * energetic sum of contributions, L = 10·lg Σ 10^(Li/10) (common practice; ISO 1996-1).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { optimiseFleet } from '../../../../src/ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../../../src/ledger/optimise/load-highs.ts';
import type { LpSolver } from '../../../../src/ledger/optimise/solver.ts';
import { bestByEnumeration, enumerateFleets } from '../../../../src/ledger/optimise/enumerate.ts';
import { cellsOf, randomTableSpec, tableProject } from './table-project.ts';

/** Costs are equal when within this relative tolerance (floating-point sums of the same costs). */
const COST_TOLERANCE = 1e-9;
/** A level meets its limit when at most this far above it, dB (solver feasibility 1e-9 of energy). */
const LEVEL_TOLERANCE_DB = 1e-6;
const PROJECTS = 500;

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

const sameCost = (a: number, b: number) => Math.abs(a - b) <= COST_TOLERANCE * Math.max(1, Math.abs(a), Math.abs(b));

describe(`optimiseFleet on ${PROJECTS} random small projects`, () => {
  it('optimiseFleet(...).best matches exhaustive enumeration and meets every limit when re-evaluated', () => {
    const tally = { feasible: 0, infeasible: 0, overBudget: 0, handBeaten: 0 };
    for (let seed = 1; seed <= PROJECTS; seed++) {
      const { spec, budget } = randomTableSpec(seed);
      const { project, evaluation } = tableProject(spec);
      const options = budget === undefined ? {} : { budget };
      const result = optimiseFleet(project, evaluation, options, solver);
      const fleets = enumerateFleets(project, evaluation);
      const truth = bestByEnumeration(fleets, budget);
      const where = `seed ${seed}`;

      // Every duty gets one allowed candidate: pinned if any, never excluded.
      for (const duty of spec.duties) {
        const chosen = duty.candidates.find((c) => c.id === result.best.fleet[duty.id]);
        expect(chosen, where).toBeDefined();
        expect(chosen?.excluded, where).not.toBe(true);
        const pin = duty.candidates.find((c) => c.pinned);
        if (pin) expect(chosen?.id, where).toBe(pin.id);
      }
      expect(result.proven, where).toBe(true);

      if (truth === undefined) {
        tally.overBudget++;
        expect(result.feasible, where).toBe(false);
        expect(result.message, where).toMatch(/No fleet costs/);
        continue;
      }
      expect(result.feasible, where).toBe(truth.feasible);
      expect(
        sameCost(result.best.cost, truth.cost),
        `${where}: cost ${result.best.cost} vs enumeration ${truth.cost}`,
      ).toBe(true);
      if (budget !== undefined) expect(result.best.cost, where).toBeLessThanOrEqual(budget + 1e-9);

      const cells = cellsOf(project, evaluation, result.best.fleet);
      const worstMargin = Math.min(...cells.map((c) => c.limitDb - c.levelDb));
      if (truth.feasible) {
        tally.feasible++;
        for (const c of cells)
          expect(c.levelDb, `${where} ${c.phaseId}/${c.receiverId}`).toBeLessThanOrEqual(
            c.limitDb + LEVEL_TOLERANCE_DB,
          );
        expect(result.best.over, where).toEqual([]);
      } else {
        tally.infeasible++;
        // Smallest largest exceedance first: the same worst margin as the enumeration's best.
        expect(worstMargin, where).toBeCloseTo(truth.worstMarginDb, 5);
        const over = cells
          .filter((c) => c.levelDb > c.limitDb + LEVEL_TOLERANCE_DB)
          .map((c) => `${c.phaseId}/${c.receiverId}`);
        expect(result.best.over.map((o) => `${o.phaseId}/${o.receiverId}`).sort(), where).toEqual(over.sort());
        expect(result.message, where).toMatch(/No fleet meets every limit/);
      }

      // The hand method is never cheaper than the exact answer when both comply.
      if (result.feasible && result.hand.compliant) {
        expect(result.savingOverHand, where).toBeGreaterThanOrEqual(-1e-6);
        if ((result.savingOverHand ?? 0) > 1e-6) tally.handBeaten++;
        for (const c of cellsOf(project, evaluation, result.hand.fleet))
          expect(c.levelDb, where).toBeLessThanOrEqual(c.limitDb + LEVEL_TOLERANCE_DB);
      }

      // Trade-off curve: margins and costs strictly increase; each point is a least-cost fleet
      // for its margin (no enumerated fleet is at least as quiet and cheaper); it ends at the quietest.
      const curve = result.tradeOff;
      expect(curve.length, where).toBeGreaterThan(0);
      for (let i = 1; i < curve.length; i++) {
        expect(curve[i]!.worstMarginDb, where).toBeGreaterThan(curve[i - 1]!.worstMarginDb);
        expect(curve[i]!.cost, where).toBeGreaterThan(curve[i - 1]!.cost);
      }
      for (const p of curve) {
        const margin = Math.min(...cellsOf(project, evaluation, p.fleet).map((c) => c.limitDb - c.levelDb));
        expect(margin, where).toBeCloseTo(p.worstMarginDb, 9);
        const cheaper = fleets.find(
          (f) => f.worstMarginDb >= p.worstMarginDb - 1e-9 && f.cost < p.cost - 1e-6 * Math.max(1, p.cost),
        );
        expect(
          cheaper,
          `${where}: point at ${p.worstMarginDb} dB for ${p.cost} beaten by ${JSON.stringify(cheaper)}`,
        ).toBeUndefined();
      }
      const quietest = Math.max(...fleets.map((f) => f.worstMarginDb));
      expect(curve[curve.length - 1]!.worstMarginDb, where).toBeCloseTo(quietest, 5);
    }
    // The generator must exercise every branch.
    expect(tally.feasible).toBeGreaterThan(50);
    expect(tally.infeasible).toBeGreaterThan(50);
    expect(tally.overBudget).toBeGreaterThan(0);
    console.info(`random projects: ${JSON.stringify(tally)}`);
  });
});
