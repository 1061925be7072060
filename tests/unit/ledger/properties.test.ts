import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { evaluateProject } from '../../../src/ledger/prediction/evaluate.ts';
import { rankDuty } from '../../../src/ledger/ranking/rank.ts';
import type { Project } from '../../../src/ledger/model/model.ts';
import { candidate, duty, receiver, twoDutyProject } from './fixtures.ts';

/** A random small project: one phase, 1–3 receivers, 1–4 duties with 1–4 candidates each. */
const projectArb = fc
  .record({
    receivers: fc.array(
      fc.record({
        x: fc.integer({ min: -200, max: 200 }),
        y: fc.integer({ min: -200, max: 200 }),
        facade: fc.boolean(),
      }),
      { minLength: 1, maxLength: 3 },
    ),
    duties: fc.array(
      fc.record({
        x: fc.integer({ min: -100, max: 100 }),
        y: fc.integer({ min: -100, max: 100 }),
        count: fc.integer({ min: 1, max: 4 }),
        onTime: fc.integer({ min: 5, max: 100 }),
        lwas: fc.array(fc.double({ min: 80, max: 120, noNaN: true }), { minLength: 1, maxLength: 4 }),
      }),
      { minLength: 1, maxLength: 4 },
    ),
    q: fc.constantFrom(1 as const, 2 as const, 4 as const, 8 as const),
  })
  .map(({ receivers, duties, q }): Project => {
    const p = twoDutyProject();
    p.propagation = { method: 'simple', q };
    // keep receivers at least 1 m from every source: heights differ by 3 m
    p.receivers = receivers.map((r, i) =>
      receiver({ id: `r${i}`, name: `R${i}`, x: r.x, y: r.y, heightM: 4.5, facade: r.facade }),
    );
    p.duties = duties.map((d, i) =>
      duty({
        id: `u${i}`,
        name: `U${i}`,
        count: d.count,
        onTimePct: d.onTime,
        location: { kind: 'point', x: d.x, y: d.y },
        baselineCandidateId: `u${i}c0`,
      }),
    );
    p.candidates = duties.flatMap((d, i) =>
      d.lwas.map((lwa, k) =>
        candidate({
          id: `u${i}c${k}`,
          dutyId: `u${i}`,
          label: `C${k}`,
          lwaDb: lwa,
          cost: { kind: 'hire', dayRate: 50 + 10 * k },
        }),
      ),
    );
    return p;
  });

describe('ledger properties', () => {
  it('a quieter candidate never raises a phase total (any receiver)', () => {
    fc.assert(
      fc.property(projectArb, fc.double({ min: 0.1, max: 20, noNaN: true }), (p, quieter) => {
        const before = evaluateProject(p);
        const c = p.candidates[0]!;
        const q = structuredClone(p);
        q.candidates.push({ ...c, id: 'quiet', lwaDb: (c.lwaDb as number) - quieter });
        const after = evaluateProject(q, { ...before.fleet, [c.dutyId]: 'quiet' });
        before.matrix.forEach((cell, i) => expect(after.matrix[i]!.levelDb).toBeLessThanOrEqual(cell.levelDb + 1e-9));
      }),
      { numRuns: 300 },
    );
  });

  it('adding a duty never lowers a phase total', () => {
    fc.assert(
      fc.property(
        projectArb,
        fc.double({ min: 60, max: 130, noNaN: true }),
        fc.integer({ min: -100, max: 100 }),
        (p, lwa, x) => {
          const before = evaluateProject(p);
          const q = structuredClone(p);
          q.duties.push(
            duty({ id: 'extra', name: 'Extra', location: { kind: 'point', x, y: 0 }, baselineCandidateId: 'extra-c' }),
          );
          q.candidates.push(candidate({ id: 'extra-c', dutyId: 'extra', lwaDb: lwa }));
          const after = evaluateProject(q);
          before.matrix.forEach((cell, i) =>
            expect(after.matrix[i]!.levelDb).toBeGreaterThanOrEqual(cell.levelDb - 1e-9),
          );
        },
      ),
      { numRuns: 300 },
    );
  });

  it('a ranking’s reduction never exceeds the candidate’s own difference from the baseline (energetic sum)', () => {
    fc.assert(
      fc.property(projectArb, (p) => {
        const ev = evaluateProject(p);
        for (const d of p.duties) {
          const base = ev.contributionDb(d.baselineCandidateId, 'r0');
          for (const row of rankDuty(p, ev, d.id, 'r0')) {
            const own = base - row.contributionDb;
            if (own >= 0) expect(row.reductionDb).toBeLessThanOrEqual(own + 1e-9);
            else expect(row.reductionDb).toBeGreaterThanOrEqual(own - 1e-9);
          }
        }
      }),
      { numRuns: 200 },
    );
  });

  it('no candidate is dominated by itself, and a dominated row always has a quieter-or-equal, cheaper-or-equal rival', () => {
    fc.assert(
      fc.property(projectArb, (p) => {
        const ev = evaluateProject(p);
        for (const d of p.duties) {
          const rows = rankDuty(p, ev, d.id, 'r0');
          for (const r of rows) {
            const rival = rows.some(
              (o) =>
                o !== r &&
                o.contributionDb <= r.contributionDb &&
                o.extraCost <= r.extraCost &&
                (o.contributionDb < r.contributionDb || o.extraCost < r.extraCost),
            );
            expect(r.dominated).toBe(rival);
          }
        }
      }),
      { numRuns: 200 },
    );
  });
});
