/**
 * The optimiser's progress reports: in order, never going back, ending at the whole run, and
 * the same fleet whether or not anyone listens. Case worked by hand in optimise.test.ts.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { optimiseFleet, type OptimiseProgress } from '../../../../src/ledger/optimise/optimise.ts';
import type { OptimiseResult } from '../../../../src/ledger/model/results.ts';
import { loadHighsSolver } from '../../../../src/ledger/optimise/load-highs.ts';
import type { LpSolver } from '../../../../src/ledger/optimise/solver.ts';
import { tableProject } from './table-project.ts';

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

const at = (ratio: number) => 70 + 10 * Math.log10(ratio);
const c = (id: string, ratio: number, cost: number) => ({ id, cost, levels: { R: at(ratio) } });
// the greedy-beaten case of optimise.test.ts (worked by hand there): A2 + B0 for 2500
const spec = {
  phases: { P: 'day' },
  receivers: { R: { day: 70 } },
  duties: [
    {
      id: 'A',
      phaseId: 'P',
      baseline: 'A0',
      candidates: [c('A0', 0.9, 1000), c('A1', 0.8, 1010), c('A2', 0.05, 1500)],
    },
    { id: 'B', phaseId: 'P', baseline: 'B0', candidates: [c('B0', 0.9, 1000), c('B1', 0.05, 1550)] },
  ],
};

describe('optimiser progress', () => {
  it('reports each step in words with a share that only grows, from 0 to 1', () => {
    const { project, evaluation } = tableProject(spec);
    const heard: OptimiseProgress[] = [];
    const r = optimiseFleet(project, evaluation, { onProgress: (p) => heard.push(p) }, solver);
    expect(r.best.fleet).toEqual({ A: 'A2', B: 'B0' }); // worked by hand in optimise.test.ts
    expect(heard[0]).toEqual({ step: 'Finding the cheapest fleet that meets every limit', fraction: 0 });
    expect(heard[heard.length - 1]).toEqual({ step: 'Done', fraction: 1 });
    for (let i = 1; i < heard.length; i++) expect(heard[i]!.fraction).toBeGreaterThanOrEqual(heard[i - 1]!.fraction);
    const steps = new Set(heard.map((p) => p.step));
    expect(steps).toContain('Working the best-buy-first fleet for comparison');
    expect(steps).toContain('Tracing what each further dB of margin costs');
  });

  it('listening changes nothing in the result', () => {
    const { project, evaluation } = tableProject(spec);
    const quiet = optimiseFleet(project, evaluation, {}, solver);
    const heard = optimiseFleet(project, evaluation, { onProgress: () => undefined }, solver);
    expect(heard).toEqual(quiet);
  });
});

describe('optimiseFleet with the exact frontier', () => {
  it('traces every fleet no other beats on both cost and margin, each heard as it is known', () => {
    // Worked by hand: ratios add per fleet; A0B0 2000 (Σρ 1.8), A1B0 2010 (1.7), A2B0 2500 (0.95),
    // A0B1 2550 (0.95, beaten by A2B0), A1B1 2560 (0.85), A2B1 3050 (0.10).
    const { project, evaluation } = tableProject(spec);
    const heard: number[] = [];
    const r = optimiseFleet(
      project,
      evaluation,
      { exactFrontier: true, onFrontierPoint: (p) => heard.push(p.cost) },
      solver,
    );
    expect(r.tradeOff.map((p) => p.cost)).toEqual([2000, 2010, 2500, 2560, 3050]);
    expect(r.tradeOff.map((p) => p.worstMarginDb)).toEqual(
      [1.8, 1.7, 0.95, 0.85, 0.1].map((x) => expect.closeTo(-10 * Math.log10(x), 9)),
    );
    expect(heard).toEqual([2000, 2010, 2500, 2560, 3050]);
  });
});

describe('optimiseFleet streams', () => {
  it('onFleetFound hears the fleets before the first frontier point, and they are the final result’s', () => {
    const { project, evaluation } = tableProject(spec);
    const order: string[] = [];
    let early: OptimiseResult | undefined;
    const r = optimiseFleet(
      project,
      evaluation,
      {
        exactFrontier: true,
        onFleetFound: (found) => {
          early = found;
          order.push('fleet');
        },
        onFrontierPoint: () => order.push('point'),
      },
      solver,
    );
    expect(order).toEqual(['fleet', 'point', 'point', 'point', 'point', 'point']);
    expect(early?.tradeOff).toEqual([]);
    expect(early?.frontier).toBeUndefined();
    expect(early?.best.fleet).toEqual({ A: 'A2', B: 'B0' }); // worked by hand in optimise.test.ts
    const { tradeOff, frontier, ...rest } = r;
    expect(early).toEqual({ ...rest, tradeOff: [] });
    expect(tradeOff).toHaveLength(5);
    expect(frontier).toEqual({ complete: true });
  });

  it('a frontier stopped between solves says it is not complete and keeps the points found', () => {
    const { project, evaluation } = tableProject(spec);
    let asked = 0;
    const r = optimiseFleet(project, evaluation, { exactFrontier: true, stopTradeOff: () => ++asked > 3 }, solver);
    expect(r.frontier).toEqual({ complete: false });
    // the first points of the hand-worked frontier above, in order of cost
    expect(r.tradeOff.map((p) => p.cost)).toEqual([2000, 2010, 2500, 2560, 3050].slice(0, r.tradeOff.length));
    expect(r.tradeOff.length).toBeLessThan(5);
  });
});
