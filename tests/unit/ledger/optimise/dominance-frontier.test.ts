/**
 * The solver's fast path against brute force: leaving out dominated options (src/ledger/optimise/dominance.ts),
 * solving independent parts apart (components.ts) and the exact frontier sweep (frontier.ts).
 * Source of truth: every choice of a small model enumerated here, its cost and largest cell ratio summed from
 * the model's terms (Σ ρ·x per cell, ./problem.ts), and the frontier read off by sorting (worked by hand from
 * the definition: a point no other point beats on both cost and ratio).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { loadHighsSolver } from '../../../../src/ledger/optimise/load-highs.ts';
import type { LpSolver } from '../../../../src/ledger/optimise/solver.ts';
import type { Choice, FleetProblem } from '../../../../src/ledger/optimise/problem.ts';
import { cellRatios, costOfChoice, sharesMet } from '../../../../src/ledger/optimise/problem.ts';
import { withoutDominated } from '../../../../src/ledger/optimise/dominance.ts';
import { independentParts } from '../../../../src/ledger/optimise/components.ts';
import { cheapestUnderCap, quietestThenCheapest } from '../../../../src/ledger/optimise/exact.ts';
import { exactFrontier } from '../../../../src/ledger/optimise/frontier.ts';

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});
const settings = { timeLimitS: 30 };

/** A model from per-duty options: cost and ratio per cell (cells listed per phase). */
function model(
  duties: { phase: number; options: { cost: number; ratios: number[] }[] }[],
  cellsPerPhase: number,
  phases: number,
): FleetProblem {
  const problem: FleetProblem = {
    duties: duties.map((d, i) => ({
      id: `d${i}`,
      name: `Duty ${i + 1}`,
      phaseId: `p${d.phase}`,
      baselineCandidateId: `d${i}o0`,
      options: d.options.map((o, k) => ({ candidateId: `d${i}o${k}`, label: `option ${k + 1}`, cost: o.cost })),
    })),
    cells: [],
    notConsidered: [],
  };
  for (let p = 0; p < phases; p++)
    for (let j = 0; j < cellsPerPhase; j++)
      problem.cells.push({
        phaseId: `p${p}`,
        phaseName: `Phase ${p + 1}`,
        periodId: 'day',
        periodName: 'Day',
        ownPeriod: true,
        receiverId: `r${j}`,
        receiverName: `R${j}`,
        limitDb: 60,
        shiftDb: 0,
        terms: duties.flatMap((d, i) =>
          d.phase === p
            ? d.options.flatMap((o, k) =>
                (o.ratios[j] ?? 0) > 0 ? [{ duty: i, option: k, ratio: o.ratios[j] as number }] : [],
              )
            : [],
        ),
      });
  return problem;
}

/** The model with every ratio multiplied by `factor` (the same site, further from its limits). */
function scaled(problem: FleetProblem, factor: number): FleetProblem {
  return {
    ...problem,
    cells: problem.cells.map((c) => ({ ...c, terms: c.terms.map((t) => ({ ...t, ratio: t.ratio * factor })) })),
  };
}

/** Every choice of the model. */
function allChoices(problem: FleetProblem): Choice[] {
  let out: Choice[] = [[]];
  for (const d of problem.duties) out = out.flatMap((c) => d.options.map((_, k) => [...c, k]));
  return out;
}
const worst = (problem: FleetProblem, c: Choice) => Math.max(0, ...cellRatios(problem, c));

const arbModel = fc
  .record({ phases: fc.integer({ min: 1, max: 3 }), cells: fc.integer({ min: 1, max: 3 }) })
  .chain(({ phases, cells }) =>
    fc.record({
      phases: fc.constant(phases),
      cells: fc.constant(cells),
      duties: fc.array(
        fc.record({
          phase: fc.integer({ min: 0, max: phases - 1 }),
          // Costs and ratios from small grids, so ties and dominated options are common.
          options: fc.array(
            fc.record({
              cost: fc.integer({ min: 1, max: 8 }).map((x) => x * 100),
              ratios: fc.array(
                fc.integer({ min: 0, max: 12 }).map((x) => x * 0.05),
                { minLength: cells, maxLength: cells },
              ),
            }),
            { minLength: 1, maxLength: 4 },
          ),
        }),
        { minLength: 1, maxLength: 5 },
      ),
    }),
  )
  .map((m) => model(m.duties, m.cells, m.phases));

describe('leaving out dominated options (worked by hand)', () => {
  it('drops an option costing more and louder or equal everywhere, keeps the first of two identical ones', () => {
    const p = model(
      [
        {
          phase: 0,
          options: [
            { cost: 100, ratios: [0.5, 0.2] },
            { cost: 120, ratios: [0.6, 0.2] }, // dominated by option 1: dearer, louder at R0, equal at R1
            { cost: 80, ratios: [0.7, 0.1] }, // cheaper: kept
            { cost: 100, ratios: [0.5, 0.2] }, // identical to option 1: the first is kept
            { cost: 150, ratios: [0.4, 0.3] }, // quieter at R0: kept
          ],
        },
      ],
      2,
      1,
    );
    const r = withoutDominated(p);
    expect(r.kept).toEqual([[0, 2, 4]]);
    expect(r.removed).toBe(2);
    expect(r.problem.cells[0]?.terms.map((t) => t.ratio)).toEqual([0.5, 0.7, 0.4]);
  });
  it('a share row keeps an option that counts more towards the share', () => {
    const p = model(
      [
        {
          phase: 0,
          options: [
            { cost: 100, ratios: [0.5] },
            { cost: 120, ratios: [0.6] },
          ],
        },
      ],
      1,
      1,
    );
    p.shares = [{ clauseId: 'k', clause: 'Clause 1', terms: [{ duty: 0, option: 1, weight: 1 }], least: 1 }];
    expect(withoutDominated(p).kept).toEqual([[0, 1]]);
  });
  it('two phases make two parts; a share row over both makes one', () => {
    const p = model(
      [
        { phase: 0, options: [{ cost: 1, ratios: [0.5] }] },
        { phase: 1, options: [{ cost: 1, ratios: [0.5] }] },
        { phase: 0, options: [{ cost: 1, ratios: [0.5] }] },
      ],
      1,
      2,
    );
    expect(independentParts(p).map((x) => x.duties)).toEqual([[0, 2], [1]]);
    p.shares = [
      {
        clauseId: 'k',
        clause: 'Clause 1',
        terms: [
          { duty: 0, option: 0, weight: 1 },
          { duty: 1, option: 0, weight: 1 },
        ],
        least: 1,
      },
    ];
    expect(independentParts(p)).toHaveLength(1);
  });
});

describe('fast path against brute force on random small models', () => {
  it('least cost under the limits and the least largest ratio match enumeration; the fleet complies', () => {
    fc.assert(
      fc.property(arbModel, fc.constantFrom(0.63, 1.02, 1.47), (problem, cap) => {
        // caps off the 0.05 grid of the sums, so rounding in a sum never decides a fit
        const choices = allChoices(problem);
        const fits = choices.filter((c) => worst(problem, c) <= cap);
        const r = cheapestUnderCap(problem, solver, settings, cap);
        if (fits.length === 0) {
          expect(r.infeasible).toBe(true);
        } else {
          const least = Math.min(...fits.map((c) => costOfChoice(problem, c)));
          expect(r.proven).toBe(true);
          expect(costOfChoice(problem, r.choice as Choice)).toBeCloseTo(least, 6);
          expect(worst(problem, r.choice as Choice)).toBeLessThanOrEqual(cap * (1 + 1e-9));
          expect(sharesMet(problem, r.choice as Choice)).toBe(true);
        }
        const q = quietestThenCheapest(problem, solver, settings);
        const leastWorst = Math.min(...choices.map((c) => worst(problem, c)));
        expect(q.leastWorstRatio).toBeCloseTo(leastWorst, 9);
      }),
      { numRuns: 150, seed: 15 },
    );
  });

  it('the exact frontier is every (cost, largest ratio) no other fleet beats on both, in order of cost', () => {
    fc.assert(
      // ratios down to a millionth: every fleet 0 to 60 dB under its limits
      fc.property(arbModel, fc.integer({ min: 0, max: 6 }), (unscaled, decades) => {
        const problem = scaled(unscaled, 10 ** -decades);
        const all = allChoices(problem)
          .map((c) => ({ cost: costOfChoice(problem, c), ratio: worst(problem, c) }))
          .sort((a, b) => a.cost - b.cost || a.ratio - b.ratio);
        const truth: { cost: number; ratio: number }[] = [];
        for (const f of all) {
          const last = truth[truth.length - 1];
          if (!last || f.ratio < last.ratio * (1 - 1e-9)) truth.push(f);
        }
        // both ways of solving: each part's model kept in the solver (only its cap changed), and read afresh
        for (const persistent of [true, false]) {
          const heard: number[] = [];
          let solves = 0;
          const r = exactFrontier(problem, solver, settings, {
            persistent,
            onPoint: (p) => heard.push(p.cost),
            stop: () => ++solves > 200,
          });
          expect(r.stopped).toBe(false);
          expect(r.proven).toBe(true);
          expect(r.points.map((p) => p.cost)).toEqual(truth.map((t) => t.cost));
          r.points.forEach((p, i) => {
            const ratio = 10 ** (-p.worstMarginDb / 10);
            expect(ratio).toBeCloseTo((truth[i] as { ratio: number }).ratio, 9);
          });
          expect(heard).toEqual(truth.map((t) => t.cost));
        }
      }),
      { numRuns: 150, seed: 16 },
    );
  });

  it('a site 16 to 22 dB under its limit gets its whole frontier, kept models or not (worked by hand)', () => {
    // Two duties of three options, one cell; each option halves the energy of the one before.
    const problem = model(
      [
        {
          phase: 0,
          options: [
            { cost: 100, ratios: [0.01] },
            { cost: 200, ratios: [0.005] },
            { cost: 300, ratios: [0.0025] },
          ],
        },
        {
          phase: 0,
          options: [
            { cost: 101, ratios: [0.013] },
            { cost: 201, ratios: [0.0065] },
            { cost: 301, ratios: [0.00325] },
          ],
        },
      ],
      1,
      1,
    );
    // By hand, the least ratio at each cost: 201: 0.01 + 0.013 = 0.023; 301: 0.01 + 0.0065 = 0.0165 (not
    // 0.005 + 0.013 = 0.018); 401: 0.005 + 0.0065 = 0.0115; 501: 0.005 + 0.00325 = 0.00825; 601: 0.0025 + 0.00325 =
    // 0.00575. Margins −10·lg ρ: 16.383, 17.825, 19.393, 20.835, 22.403 dB.
    for (const persistent of [true, false]) {
      let solves = 0;
      const r = exactFrontier(problem, solver, settings, { persistent, stop: () => ++solves > 50 });
      expect(r.stopped).toBe(false);
      expect(r.points.map((p) => p.cost)).toEqual([201, 301, 401, 501, 601]);
      expect(r.points.map((p) => p.worstMarginDb.toFixed(3))).toEqual([
        '16.383',
        '17.825',
        '19.393',
        '20.835',
        '22.403',
      ]);
    }
  });

  it('a stop asked between solves ends the sweep with the points known so far', () => {
    const problem = model(
      [
        {
          phase: 0,
          options: [
            { cost: 100, ratios: [1] },
            { cost: 200, ratios: [0.5] },
            { cost: 300, ratios: [0.25] },
          ],
        },
      ],
      1,
      1,
    );
    // Worked by hand: three options, each dearer and quieter: all three are frontier points.
    expect(exactFrontier(problem, solver, settings).points.map((p) => p.cost)).toEqual([100, 200, 300]);
    let asked = 0;
    const r = exactFrontier(problem, solver, settings, { stop: () => ++asked > 2 });
    expect(r.stopped).toBe(true);
    expect(r.proven).toBe(false);
    expect(r.points.map((p) => p.cost)).toEqual([100]);
  });
});
