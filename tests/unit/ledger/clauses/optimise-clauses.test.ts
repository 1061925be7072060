/**
 * The optimiser with tender clauses as constraints: a hand-worked case on the site of
 * ./clause-project.ts, and the solver against exhaustive search on small random sites,
 * where each fleet is judged by the clause answer (answerClauses) and the receivers'
 * limits — code written apart from the 0–1 model.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { optimiseFleet } from '../../../../src/ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../../../src/ledger/optimise/load-highs.ts';
import type { LpSolver } from '../../../../src/ledger/optimise/solver.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { answerClauses } from '../../../../src/ledger/clauses/answer.ts';
import type { Candidate, Clause, Fleet, Project } from '../../../../src/ledger/model/model.ts';
import { clause, clauseProject } from './clause-project.ts';

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

const tenderClauses = (): Clause[] => [
  clause('k1', '4.2', { kind: 'limit', periodId: 'day', limitDb: 70, metric: 'rating' }),
  clause('k2', '5.1', { kind: 'lwa-cap', maxDb: 105 }),
  clause('k3', '6.1', { kind: 'hours', character: 'impulsive', start: '08:00', end: '18:00' }),
  clause('k4', '8.1', { kind: 'share', basis: 'count', minPct: 50 }),
  clause('k5', '9.1', { kind: 'statement', statement: 'Weekly monitoring.' }),
];

describe('optimiseFleet with clauses (worked by hand)', () => {
  it('the cheapest fleet meeting every clause is br3 + pu1 for £2,300', () => {
    // Worked by hand: the cap leaves br2 and br3 for breaking (br1 is 110 dB); the hours clause
    // leaves br3 (br2 is impulsive 07:00–19:00); br3 is electric, so 1 of 2 units = 50 %
    // with the cheaper diesel pump; rating level 59.04 ⊕ (57.98 + 3) = 63.13 dB ≤ 70.
    // Cost (200 + 30) £/day × 10 days = £2,300.
    const project = clauseProject(tenderClauses());
    const r = optimiseFleet(project, evaluateProject(project), { tradeOff: false }, solver);
    expect(r.feasible).toBe(true);
    expect(r.best.fleet).toEqual({ brk: 'br3', pmp: 'pu1' });
    expect(r.best.cost).toBeCloseTo(2300, 6);
    expect(r.clauses?.honoured).toEqual(['Clause 5.1', 'Clause 6.1', 'Clause 4.2', 'Clause 8.1']);
    expect(r.clauses?.unmet).toEqual([]);
    expect(r.message).toContain(
      'Tender clauses honoured as constraints: Clause 5.1, Clause 6.1, Clause 4.2, Clause 8.1.',
    );
    const answer = answerClauses(project, evaluateProject(project, r.best.fleet));
    expect(answer.answers.map((a) => a.status)).toEqual(['pass', 'pass', 'pass', 'pass', 'stated']);
  });

  it('without the clauses the cheapest fleet meeting the receiver’s own 70 dB limit is br2 + pu1, £1,700', () => {
    // Worked by hand: the matrix carries the project's 3 dB character penalty, so the baseline
    // br1 71.04 ⊕ pu1 60.98 = 71.45 dB is over; br2 65.04 ⊕ 60.98 = 66.48 dB for (140 + 30) × 10.
    const project = clauseProject(tenderClauses());
    const r = optimiseFleet(project, evaluateProject(project), { tradeOff: false, clauses: false }, solver);
    expect(r.best.fleet).toEqual({ brk: 'br2', pmp: 'pu1' });
    expect(r.best.cost).toBeCloseTo(1700, 6);
    expect(r.clauses).toBeUndefined();
  });

  it('names a clause no machine can meet and leaves it out', () => {
    const project = clauseProject([
      clause('k2', '5.1', { kind: 'lwa-cap', maxDb: 95, dutyIds: ['brk'] }),
      clause('k4', '8.1', { kind: 'share', minPct: 100 }),
    ]);
    project.candidates = project.candidates.filter((c) => c.id !== 'pu2');
    const r = optimiseFleet(project, evaluateProject(project), { tradeOff: false }, solver);
    expect(r.clauses?.unmet).toEqual([
      { clauseId: 'k2', name: 'Clause 5.1', reason: 'no machine the optimiser may choose for Breaking meets it' },
      {
        clauseId: 'k4',
        name: 'Clause 8.1',
        reason:
          'at most 50.0 % electric or battery can be reached with the machines the optimiser may choose; 100 % asked',
      },
    ]);
    expect(r.message).toContain(
      'Clause 5.1 cannot be met and is left out: no machine the optimiser may choose for Breaking meets it.',
    );
  });

  it('a boundary limit is a constraint at each of its points', () => {
    // Worked by hand: at (20, 0) br1 72.48 ⊕ pu1 57.01 = 72.60 dB > 72; br2 there 66.48 ⊕ 57.01 = 66.95 dB.
    const project = clauseProject([
      clause('k6', '4.4', {
        kind: 'limit',
        area: 'boundary',
        boundary: [
          { x: 20, y: -20 },
          { x: 20, y: 60 },
        ],
        periodId: 'day',
        limitDb: 72,
      }),
    ]);
    const r = optimiseFleet(project, evaluateProject(project), { tradeOff: false }, solver);
    expect(r.best.fleet).toEqual({ brk: 'br2', pmp: 'pu1' });
    expect(r.best.cost).toBeCloseTo(1700, 6); // (140 + 30) × 10
  });

  it('when the clause limit cannot be met, the cell still over names its clause', () => {
    const project = clauseProject([
      clause('k6', '4.4', {
        kind: 'limit',
        area: 'boundary',
        boundary: [{ x: 20, y: 0 }],
        periodId: 'day',
        limitDb: 50,
      }),
    ]);
    const r = optimiseFleet(project, evaluateProject(project), { tradeOff: false }, solver);
    expect(r.feasible).toBe(false);
    expect(r.best.over[0]?.clause).toBe('Clause 4.4');
    expect(r.message).toContain('boundary point 1 (20.0, 0.0) (Clause 4.4, 50 dB LAeq,T) in Works');
  });
});

/** A small random site: 2–3 duties × 2–3 machines, one receiver, clauses of every kind that constrains. */
function randomSite(seed: number[]): Project {
  let i = 0;
  const next = () => (seed[i++ % seed.length] as number) / 1000;
  const project = clauseProject([]);
  const dutyCount = 2 + Math.floor(next() * 2);
  project.duties = [];
  project.candidates = [];
  project.phases.push({ id: 'ph2', name: 'Late works', periodId: 'day', start: '09:00', end: '19:00' });
  for (let d = 0; d < dutyCount; d++) {
    const id = `u${d}`;
    project.duties.push({
      id,
      name: `Duty ${d}`,
      phaseId: next() < 0.5 ? 'ph1' : 'ph2',
      count: 1 + Math.floor(next() * 3),
      onTimePct: 100,
      durationDays: 5 + Math.floor(next() * 10),
      location: { kind: 'point', x: 20 + next() * 60, y: -30 + next() * 60 },
      sourceHeightM: 1.5,
      baselineCandidateId: `${id}m0`,
    });
    const n = 2 + Math.floor(next() * 2);
    for (let k = 0; k < n; k++) {
      const c: Candidate = {
        id: `${id}m${k}`,
        dutyId: id,
        label: `Machine ${d}.${k}`,
        category: 'test',
        lwaDb: 95 + Math.round(next() * 150) / 10,
        declaration: 'guaranteed',
        lwaOrigin: 'declared',
        character: next() < 0.3 ? 'impulsive' : 'none',
        energy: next() < 0.35 ? 'electric' : 'diesel',
        source: 'random',
        cost: { kind: 'hire', dayRate: 20 + Math.round(next() * 300) },
        runningPerDay: 0,
        fixedCharges: 0,
      };
      project.candidates.push(c);
    }
  }
  project.clauses = [
    clause('c1', '1', { kind: 'lwa-cap', maxDb: 103 + Math.round(next() * 60) / 10 }),
    clause('c2', '2', { kind: 'hours', character: 'impulsive', start: '08:00', end: '18:00' }),
    clause('c3', '3', {
      kind: next() < 0.5 ? 'lp-cap' : 'statement',
      maxDb: 76 + Math.round(next() * 40) / 10,
      distanceM: 10,
    }),
    clause('c4', '4', { kind: 'share', basis: next() < 0.5 ? 'count' : 'hours', minPct: Math.round(next() * 60) }),
    clause('c5', '5', {
      kind: 'limit',
      area: 'boundary',
      boundary: [
        { x: 10, y: -40 },
        { x: 10, y: 40 },
      ],
      spacingM: 10,
      periodId: 'day',
      limitDb: 66 + Math.round(next() * 80) / 10,
    }),
  ];
  project.receivers[0]!.limitsDb = { day: 60 + Math.round(next() * 100) / 10 };
  return project;
}

/** Every fleet of a project. */
function allFleets(project: Project): Fleet[] {
  let fleets: Fleet[] = [{}];
  for (const d of project.duties) {
    const ids = project.candidates.filter((c) => c.dutyId === d.id).map((c) => c.id);
    fleets = fleets.flatMap((f) => ids.map((id) => ({ ...f, [d.id]: id })));
  }
  return fleets;
}

describe('optimiseFleet with clauses equals exhaustive search (property, small random sites)', () => {
  it('least cost over fleets whose every clause passes and every receiver limit is met', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 999 }), { minLength: 40, maxLength: 40 }), (seed) => {
        const project = randomSite(seed);
        const evaluation = evaluateProject(project);
        // Exhaustive: judge each fleet by the clause answer and the matrix, apart from the model.
        let bestCost = Infinity;
        for (const fleet of allFleets(project)) {
          const e = evaluateProject(project, fleet);
          const clausesOk = answerClauses(project, e).answers.every(
            (a) => a.status === 'pass' || a.kind === 'statement',
          ); // statements are not constraints
          const limitsOk = e.matrix.every((m) => m.marginDb === undefined || m.marginDb >= -1e-6);
          if (clausesOk && limitsOk) bestCost = Math.min(bestCost, e.fleetCost);
        }
        const r = optimiseFleet(project, evaluation, { tradeOff: false }, solver);
        if (r.clauses?.unmet.length) {
          // A clause no fleet meets is left out by the optimiser; exhaustive search finds no fleet meeting all.
          expect(bestCost).toBe(Infinity);
          return;
        }
        if (bestCost === Infinity) {
          expect(r.feasible).toBe(false);
        } else {
          expect(r.feasible).toBe(true);
          expect(r.best.cost).toBeCloseTo(bestCost, 6);
        }
      }),
      { numRuns: 30, seed: 1414 },
    );
  });
});
