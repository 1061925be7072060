import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { closeCalls, type UncertainLevel } from '../../../../src/core/standards/iso4871-1996.ts';
import { closePairIndices } from '../../../../src/ledger/ranking/close-calls.ts';
import { rankingUncertainty } from '../../../../src/ledger/ranking/ranking-uncertainty.ts';
import { rankEveryDuty } from '../../../../src/ledger/ranking/rank-every-duty.ts';
import { rankDuty, worstReceiverForBaseline } from '../../../../src/ledger/ranking/rank.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { evaluateAfterEdit } from '../../../../src/ledger/prediction/evaluate-edit.ts';
import { REFERENCE_RECEIVER_ID, type Candidate } from '../../../../src/ledger/model/model.ts';
import type { RankingRow } from '../../../../src/ledger/model/results.ts';
import { largeProject } from '../../../bench/large-project.ts';
import { dbSumOrNaN } from '../../../../src/ledger/prediction/safe.ts';
import { rankingUncertaintyReference } from './ranking-uncertainty.reference.ts';
import { candidate, twoDutyProject } from '../fixtures.ts';
import { own } from '../../../../src/ledger/model/own.ts';

/**
 * The fast paths of the rankings against the references they replaced, on random inputs: the sort-and-sweep close
 * calls against the pair-by-pair `closeCalls` (ISO 4871:1996 K, the ledger's rule |La − Lb| ≤ max(Ka, Kb)), the
 * places within ±K against the O(n²) count, and every duty ranked at once against `rankDuty` duty by duty.
 */

/** Levels on a 0.5 dB grid (many ties and exact boundaries) or anywhere, some not computed; K on a 0.5 dB grid, some NaN. */
const level = fc.oneof(
  fc.integer({ min: 180, max: 220 }).map((x) => x / 2),
  fc.double({ min: 80, max: 120, noNaN: true }),
  fc.constantFrom(NaN, -Infinity),
);
const k = fc.oneof(
  fc.integer({ min: 0, max: 8 }).map((x) => x / 2),
  fc.double({ min: 0, max: 6, noNaN: true }),
  fc.constant(NaN),
);

describe('close calls: sort and sweep equals every pair compared', () => {
  it('closePairIndices gives the pairs of closeCalls, in its order (random lists of up to 60 levels)', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(level, k), { maxLength: 60 }), (list) => {
        const levels: UncertainLevel[] = list.map(([levelDb, uncertaintyDb], i) => ({
          id: `c${i}`,
          levelDb,
          uncertaintyDb,
        }));
        const fast = closePairIndices(levels).map(([i, j]) => [levels[i]!.id, levels[j]!.id]);
        expect(fast).toEqual(closeCalls(levels));
      }),
      { numRuns: 400 },
    );
  });

  it('a worked case: 100 dB K 2, 101.5 dB K 1, 106 dB K 1.5, 104.5 dB K 0 gives a–b and c–d only', () => {
    // By hand: |100 − 101.5| = 1.5 ≤ 2; |104.5 − 106| = 1.5 ≤ 1.5; |101.5 − 104.5| = 3 > 1; the rest further apart.
    const levels = [
      { id: 'a', levelDb: 100, uncertaintyDb: 2 },
      { id: 'b', levelDb: 101.5, uncertaintyDb: 1 },
      { id: 'c', levelDb: 106, uncertaintyDb: 1.5 },
      { id: 'd', levelDb: 104.5, uncertaintyDb: 0 },
    ];
    expect(closePairIndices(levels)).toEqual([
      [0, 1],
      [2, 3],
    ]);
  });
});

function row(candidateId: string, rank: number, contributionDb: number): RankingRow {
  return {
    candidateId,
    rank,
    contributionDb,
    phaseTotalDb: contributionDb,
    reductionDb: 0,
    extraCost: 0,
    dominated: false,
    freeWin: false,
    overLimit: false,
    isBaseline: rank === 1,
  };
}

describe('rankingUncertainty equals the pair-by-pair reference', () => {
  it('on random rankings of up to 40 rows (sorted by level as rankDuty gives them, or in any order; ranks each once, shared, or rows out of rank order)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(level, fc.option(fc.integer({ min: 0, max: 8 }).map((x) => x / 2))), { maxLength: 40 }),
        fc.boolean(),
        fc.constantFrom('distinct', 'shared', 'reversed'),
        (list, sortByLevel, ranks) => {
          const entries = list.map(([l, kk], i) => ({ id: `c${i}`, l, kk }));
          if (sortByLevel) entries.sort((a, b) => (Number.isNaN(a.l) ? 1 : Number.isNaN(b.l) ? -1 : a.l - b.l));
          // Shared ranks: two rows a rank. Reversed: the rows listed last rank first.
          const rankOf = (i: number) => (ranks === 'shared' ? Math.floor(i / 2) + 1 : i + 1);
          const ranked = entries.map((e, i) => row(e.id, rankOf(i), e.l));
          const rows = ranks === 'reversed' ? ranked.reverse() : ranked;
          const candidates: Candidate[] = entries.map((e) =>
            e.kk === null
              ? candidate({ id: e.id, label: e.id.toUpperCase() })
              : candidate({ id: e.id, label: e.id.toUpperCase(), declaration: 'measured', uncertaintyDb: e.kk }),
          );
          const fast = rankingUncertainty(rows, new Map(candidates.map((c) => [c.id, c])));
          // Compared as read: the words and summary are getters, written on first read.
          const asRead = (u: ReturnType<typeof rankingUncertainty>) => ({
            places: u.places,
            closePairs: u.closePairs.map(({ quieterId, louderId, differenceDb, uncertaintyDb, words }) => ({
              quieterId,
              louderId,
              differenceDb,
              uncertaintyDb,
              words,
            })),
            firm: u.firm,
            summary: u.summary,
          });
          expect(asRead(fast)).toEqual(rankingUncertaintyReference(rows, candidates));
          expect(asRead(rankingUncertainty(rows, candidates))).toEqual(asRead(fast));
          // JSON gives the same fields as the plain reference.
          expect(JSON.parse(JSON.stringify(fast))).toEqual(JSON.parse(JSON.stringify(asRead(fast))));
        },
      ),
      { numRuns: 300 },
    );
  });
});

/** Rows equal to the reference's, with the phase totals (summed in another order) to 1e-9 dB. */
function expectSameRows(fast: RankingRow[], reference: RankingRow[]): void {
  const strip = (r: RankingRow) => ({ ...r, phaseTotalDb: 0, reductionDb: 0, dbPer1000: 0, costPerDb: 0 });
  expect(fast.map(strip)).toEqual(reference.map(strip));
  fast.forEach((r, i) => {
    const ref = reference[i] as RankingRow;
    for (const key of ['phaseTotalDb', 'reductionDb', 'dbPer1000', 'costPerDb'] as const) {
      const a = r[key];
      const b = ref[key];
      if (a === undefined || b === undefined || !Number.isFinite(b)) expect(a).toBe(b);
      else expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(b)));
    }
  });
}

describe('rankEveryDuty equals rankDuty duty by duty', () => {
  it('on random projects (up to 300 candidates, 0–6 receivers, 1–4 phases), at the worst receivers and at one given receiver', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 1e6 }),
        fc.integer({ min: 1, max: 300 }),
        fc.integer({ min: 0, max: 6 }),
        fc.integer({ min: 1, max: 4 }),
        (seed, candidates, receivers, phases) => {
          const project = largeProject({ candidates, receivers, phases, seed });
          const ev = evaluateProject(project);
          const all = rankEveryDuty(project, ev);
          project.duties.forEach((d, u) => {
            const receiverId = worstReceiverForBaseline(project, ev, d.phaseId) ?? REFERENCE_RECEIVER_ID;
            expect(all[u]!.receiverId).toBe(receiverId);
            expectSameRows(all[u]!.rows, rankDuty(project, ev, d.id, receiverId));
          });
          // An evaluation not made by evaluateProject (no arrays kept with it) is read by id: the same rankings.
          expect(rankEveryDuty(project, { ...ev })).toEqual(all);
          const given = receivers > 0 ? 'r0' : REFERENCE_RECEIVER_ID;
          rankEveryDuty(project, ev, given).forEach((r, u) =>
            expectSameRows(r.rows, rankDuty(project, ev, project.duties[u]!.id, given)),
          );
        },
      ),
      { numRuns: 40 },
    );
  });
});

describe('rankDuty’s phase totals are the energetic sum of the other duties and the candidate', () => {
  it('to the last bit, as dbSumOrNaN([others, candidate]) gives it (random projects, some levels not computed)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 1e6 }), fc.integer({ min: 1, max: 120 }), (seed, candidates) => {
        const project = largeProject({ candidates, receivers: 3, phases: 2, seed });
        // A candidate without a level: its rows are not computed, the others still are.
        project.candidates[seed % candidates] = { ...project.candidates[seed % candidates]!, lwaDb: NaN, bandsDb: [] };
        const ev = evaluateProject(project);
        for (const d of project.duties) {
          const others = project.duties
            .filter((o) => o.phaseId === d.phaseId && o.id !== d.id)
            .map((o) => ev.contributionDb(o.baselineCandidateId, 'r1'));
          for (const row of rankDuty(project, ev, d.id, 'r1'))
            expect(row.phaseTotalDb).toBe(dbSumOrNaN([dbSumOrNaN(others), row.contributionDb]));
        }
      }),
      { numRuns: 40 },
    );
  });
});

describe('rankEveryDuty after an edit equals rankDuty duty by duty', () => {
  it('on random projects whose candidates were edited (level and price), evaluated from the previous evaluation', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 1e6 }),
        fc.integer({ min: 1, max: 200 }),
        fc.integer({ min: 1, max: 5 }),
        fc.array(
          fc.tuple(fc.nat(), fc.double({ min: -6, max: 6, noNaN: true }), fc.double({ min: 0, max: 500, noNaN: true })),
          {
            minLength: 1,
            maxLength: 5,
          },
        ),
        (seed, candidates, receivers, edits) => {
          const project = largeProject({ candidates, receivers, phases: 2, seed });
          const before = evaluateAfterEdit(undefined, project, undefined, { skipValidation: true });
          const next = { ...project, candidates: project.candidates.slice() };
          for (const [at, shift, price] of edits) {
            const i = at % next.candidates.length;
            const c = next.candidates[i]!;
            next.candidates[i] = {
              ...c,
              lwaDb: (c.lwaDb as number) + shift,
              cost: { kind: 'hire', dayRate: price },
            };
          }
          const ev = evaluateAfterEdit(before, next, undefined, { skipValidation: true });
          rankEveryDuty(next, ev).forEach((r, u) =>
            expectSameRows(r.rows, rankDuty(next, ev, next.duties[u]!.id, r.receiverId)),
          );
        },
      ),
      { numRuns: 30 },
    );
  });
});

describe('costs read by position equal the costs by id', () => {
  // Hire for 5 days at £100 or £150 a day (fixtures: 5-day duties, no running cost or charges): by hand £500 and £750;
  // an id used twice shows its last candidate's cost (as the costs by id always have).
  const twice = (): ReturnType<typeof twoDutyProject> => {
    const p = twoDutyProject();
    p.candidates.push({
      ...(p.candidates[1] as Candidate),
      label: 'A quiet, second offer',
      cost: { kind: 'hire', dayRate: 120 },
    });
    return p;
  };
  for (const [name, make] of [
    ['plain ids', twoDutyProject],
    ['an id used twice', twice],
    [
      'an id "__proto__"',
      () => {
        const p = twoDutyProject();
        (p.candidates[4] as Candidate).id = '__proto__';
        (p.duties[1] as { baselineCandidateId: string }).baselineCandidateId = '__proto__';
        return p;
      },
    ],
  ] as const) {
    it(`${name}: the fleet's cost and every duty's ranking read them as evaluation.costs gives them`, () => {
      const p = make();
      for (const fleet of [undefined, { u1: 'a2' }]) {
        const ev = evaluateProject(p, fleet);
        const byId = p.duties.reduce((s, d) => s + (own(ev.costs, ev.fleet[d.id] as string)?.total ?? NaN), 0);
        expect(Object.is(ev.fleetCost, byId)).toBe(true);
        const all = rankEveryDuty(p, ev);
        p.duties.forEach((d, u) => {
          const one = rankDuty(p, ev, d.id, all[u]!.receiverId);
          expect(all[u]!.rows.map((r) => [r.candidateId, r.extraCost])).toEqual(
            one.map((r) => [r.candidateId, r.extraCost]),
          );
        });
      }
    });
  }

  it('evaluation.costs gives each id its cost (a1 £500, a2 £750: 5 days × £100, × £150)', () => {
    const ev = evaluateProject(twoDutyProject());
    expect(ev.costs.a1?.total).toBe(500);
    expect(ev.costs.a2?.total).toBe(750);
    expect(JSON.parse(JSON.stringify(ev.costs)).a1.total).toBe(500);
  });
});
