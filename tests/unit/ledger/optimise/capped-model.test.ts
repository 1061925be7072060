/**
 * The sweeps' persistent models (src/ledger/optimise/capped-model.ts: one model per part, only the cap changed
 * between solves) against the reference, the one-shot path that writes and reads each model afresh. Source of
 * truth: the one-shot sweep on the same random site (./site-project.ts); both must give the same points (same
 * fleets and costs, margins within 1e-9 relative) and the same proven flag. A solver without persistent models,
 * or whose persistent model fails, must fall back to the one-shot path and still give the same points.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { loadHighsSolver } from '../../../../src/ledger/optimise/load-highs.ts';
import type { LpSolver } from '../../../../src/ledger/optimise/solver.ts';
import { buildFleetProblem, type FleetProblem } from '../../../../src/ledger/optimise/problem.ts';
import { exactFrontier, type FrontierOptions, type FrontierResult } from '../../../../src/ledger/optimise/frontier.ts';
import { siteProject } from './site-project.ts';

let highs: LpSolver;
beforeAll(async () => {
  highs = await loadHighsSolver();
});
const settings = { timeLimitS: 30 };

/** The solver with its persistent models counted (created, disposed). */
function counted(solver: LpSolver) {
  const counts = { created: 0, disposed: 0 };
  const create = solver.createModel?.bind(solver);
  const wrapped: LpSolver = {
    solve: (text, options) => solver.solve(text, options),
    ...(solver.constants ? { constants: solver.constants } : {}),
    ...(create
      ? {
          createModel: (source) => {
            const model = create(source);
            counts.created++;
            const dispose = model.dispose.bind(model);
            model.dispose = () => {
              counts.disposed++;
              dispose();
            };
            return model;
          },
        }
      : {}),
  };
  return { solver: wrapped, counts };
}

function expectSamePoints(actual: FrontierResult, reference: FrontierResult) {
  expect(actual.proven).toBe(reference.proven);
  expect(actual.points.length).toBe(reference.points.length);
  actual.points.forEach((p, i) => {
    const q = reference.points[i] as FrontierResult['points'][number];
    expect(p.cost).toBe(q.cost);
    expect(p.fleet).toEqual(q.fleet);
    expect(Math.abs(p.worstMarginDb - q.worstMarginDb)).toBeLessThanOrEqual(
      1e-9 * Math.max(1, Math.abs(q.worstMarginDb)),
    );
  });
}

function site(seed: number, duties: number, candidates = 5, phases = 2): FleetProblem {
  const { project, evaluation } = siteProject({ duties, candidates, receivers: 4, phases }, seed);
  return buildFleetProblem(project, evaluation);
}

describe('persistent models in the sweeps', () => {
  it('give the one-shot points on random sites, stepped and exact, and dispose every model', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 1_000_000 }),
        fc.integer({ min: 3, max: 10 }),
        fc.integer({ min: 2, max: 8 }),
        fc.integer({ min: 1, max: 3 }),
        fc.constantFrom<FrontierOptions>({ stepDb: 0.5 }, { stepDb: 0.2 }, {}),
        (seed, duties, candidates, phases, options) => {
          const problem = site(seed, duties, candidates, phases);
          const reference = exactFrontier(problem, highs, settings, { ...options, persistent: false });
          const { solver, counts } = counted(highs);
          const persistent = exactFrontier(problem, solver, settings, { ...options, persistent: true });
          expectSamePoints(persistent, reference);
          expect(persistent.solves).toBe(reference.solves);
          expect(counts.created).toBeGreaterThan(0);
          expect(counts.disposed).toBe(counts.created);
        },
      ),
      { numRuns: 24 },
    );
  });

  it('are what the exact frontier and the stepped curve use unless told otherwise', () => {
    const problem = site(20261205, 6);
    for (const options of [{}, { stepDb: 0.5 }]) {
      const { solver, counts } = counted(highs);
      exactFrontier(problem, solver, settings, options);
      expect(counts.created).toBeGreaterThan(0);
      expect(counts.disposed).toBe(counts.created);
    }
  });

  it('fall back to the one-shot path when the solver has none, or when one fails', () => {
    const problem = site(20261205, 6);
    const reference = exactFrontier(problem, highs, settings, { persistent: false });
    expect(reference.points.length).toBeGreaterThan(1);
    const withoutModels: LpSolver = { solve: (text, options) => highs.solve(text, options) };
    expectSamePoints(exactFrontier(problem, withoutModels, settings, { persistent: true }), reference);
    const failing: LpSolver = {
      solve: (text, options) => highs.solve(text, options),
      createModel: () => {
        throw new Error('no memory left for a model');
      },
      ...(highs.constants ? { constants: highs.constants } : {}),
    };
    expectSamePoints(exactFrontier(problem, failing, settings, { persistent: true }), reference);
  });
});
