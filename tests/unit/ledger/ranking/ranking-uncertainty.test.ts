import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { rankingUncertainty } from '../../../../src/ledger/ranking/ranking-uncertainty.ts';
import type { Candidate } from '../../../../src/ledger/model/model.ts';
import type { RankingRow } from '../../../../src/ledger/model/results.ts';
import { candidate } from '../fixtures.ts';

/**
 * The rule under test (ISO 4871:1996 uncertainty K, the ledger's reading of it): two levels
 * are too close to call when |La − Lb| ≤ max(Ka, Kb); a candidate without a K counts 0.
 * Every expected value below is worked by hand from that rule.
 */

/** A ranking row with only what the rule reads: id, place and level. */
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
const measured = (id: string, k: number, label = id.toUpperCase()): Candidate =>
  candidate({ id, label, declaration: 'measured', uncertaintyDb: k });
const guaranteed = (id: string, label = id.toUpperCase()): Candidate => candidate({ id, label });

describe('rankingUncertainty', () => {
  it('a (100 dB, K 2) and b (101.5 dB, K 1) are too close to call; c (106 dB, K 1.5) keeps place 3', () => {
    // |100 − 101.5| = 1.5 ≤ max(2, 1) = 2 → close; |101.5 − 106| = 4.5 > 1.5; |100 − 106| = 6 > 2.
    const r = rankingUncertainty(
      [row('a', 1, 100), row('b', 2, 101.5), row('c', 3, 106)],
      [measured('a', 2), measured('b', 1), measured('c', 1.5)],
    );
    // As read (the words are written on first read) and as JSON gives them.
    expect(JSON.parse(JSON.stringify(r.closePairs))).toEqual([
      {
        quieterId: 'a',
        louderId: 'b',
        differenceDb: 1.5,
        uncertaintyDb: 2,
        words: 'A (100.0 dB) and B (101.5 dB) differ by 1.5 dB, within K 2.0 dB: too close to call',
      },
    ]);
    expect(r.closePairs[0]?.words).toBe(
      'A (100.0 dB) and B (101.5 dB) differ by 1.5 dB, within K 2.0 dB: too close to call',
    );
    expect(r.places.map((p) => [p.candidateId, p.bestPlace, p.worstPlace])).toEqual([
      ['a', 1, 2],
      ['b', 1, 2],
      ['c', 3, 3],
    ]);
    expect(r.firm).toBe(false);
    expect(r.summary).toBe(
      'Places 1–2 could change within the declared uncertainty K. Too close to call (our own rule, not ISO 4871’s: levels no further apart than the larger K): A and B.',
    );
  });

  it('a chain a–b–c with K 2 and steps of 1.5 dB: b could take any place, a and c only their neighbour’s', () => {
    // a 100, b 101.5, c 103, each K 2: a–b 1.5 ≤ 2 and b–c 1.5 ≤ 2 close; a–c 3 > 2 not.
    // a: surely louder c → worst place 3 − 1 = 2; c: surely quieter a → best place 1 + 1 = 2; b: 1 to 3.
    const r = rankingUncertainty(
      [row('a', 1, 100), row('b', 2, 101.5), row('c', 3, 103)],
      [measured('a', 2), measured('b', 2), measured('c', 2)],
    );
    expect(r.places.map((p) => [p.bestPlace, p.worstPlace])).toEqual([
      [1, 2],
      [1, 3],
      [2, 3],
    ]);
    expect(r.closePairs.map((p) => [p.quieterId, p.louderId])).toEqual([
      ['a', 'b'],
      ['b', 'c'],
    ]);
    expect(r.summary).toBe(
      'Places 1–3 could change within the declared uncertainty K. Too close to call (our own rule, not ISO 4871’s: levels no further apart than the larger K): A and B; B and C.',
    );
  });

  it('a difference equal to K is too close to call; a little more is not', () => {
    // 2.0 ≤ 2 → close; 2.01 > 2 → firm.
    expect(rankingUncertainty([row('a', 1, 100), row('b', 2, 102)], [measured('a', 2), guaranteed('b')]).firm).toBe(
      false,
    );
    expect(rankingUncertainty([row('a', 1, 100), row('b', 2, 102.01)], [measured('a', 2), guaranteed('b')]).firm).toBe(
      true,
    );
  });

  it('the larger K of the pair decides: a guaranteed value without K beside a measured one with K 3', () => {
    // |104 − 106| = 2 ≤ max(0, 3) = 3 → close.
    const r = rankingUncertainty([row('g', 1, 104), row('m', 2, 106)], [guaranteed('g'), measured('m', 3)]);
    expect(r.closePairs[0]).toMatchObject({ quieterId: 'g', louderId: 'm', differenceDb: 2, uncertaintyDb: 3 });
    expect(r.places.find((p) => p.candidateId === 'g')).toMatchObject({ uncertaintyDb: 0, kDeclared: false });
    expect(r.places.find((p) => p.candidateId === 'm')).toMatchObject({ uncertaintyDb: 3, kDeclared: true });
    expect(r.summary).toContain('1 of 2 candidates declare no K and count K = 0.');
  });

  it('a guaranteed value that states its K takes part with that K', () => {
    const r = rankingUncertainty(
      [row('a', 1, 100), row('b', 2, 101)],
      [candidate({ id: 'a', uncertaintyDb: 1.5 }), guaranteed('b')],
    );
    expect(r.firm).toBe(false);
  });

  it('no candidate declares a K: nothing is too close to call, and the words say the order cannot be tested', () => {
    const r = rankingUncertainty([row('a', 1, 100), row('b', 2, 100.5)], [guaranteed('a'), guaranteed('b')]);
    expect(r.firm).toBe(true);
    expect(r.closePairs).toEqual([]);
    expect(r.summary).toBe('No candidate declares an uncertainty K: the order cannot be tested against it.');
  });

  it('a firm order with K declared says it holds', () => {
    const r = rankingUncertainty([row('a', 1, 100), row('b', 2, 105)], [measured('a', 2), measured('b', 2)]);
    expect(r.summary).toBe('The order holds within the declared uncertainty K.');
    expect(r.places.map((p) => [p.bestPlace, p.worstPlace])).toEqual([
      [1, 1],
      [2, 2],
    ]);
  });

  it('a row whose level is not computed keeps its place and takes no part', () => {
    const r = rankingUncertainty(
      [row('a', 1, 100), row('b', 2, 101), row('x', 3, NaN)],
      [measured('a', 2), measured('b', 2), measured('x', 9)],
    );
    expect(r.closePairs).toHaveLength(1);
    expect(r.places.find((p) => p.candidateId === 'x')).toMatchObject({ bestPlace: 3, worstPlace: 3 });
    expect(r.places.find((p) => p.candidateId === 'b')).toMatchObject({ bestPlace: 1, worstPlace: 2 });
  });

  it('an empty ranking and a single row have nothing to compare', () => {
    expect(rankingUncertainty([], []).summary).toBe('Fewer than two computed levels: nothing to compare.');
    expect(rankingUncertainty([row('a', 1, 100)], [measured('a', 3)]).places).toEqual([
      { candidateId: 'a', rank: 1, bestPlace: 1, worstPlace: 1, uncertaintyDb: 3, kDeclared: true },
    ]);
  });

  it('rows given out of order are reported in ranking order', () => {
    const r = rankingUncertainty([row('b', 2, 101), row('a', 1, 100)], [measured('a', 2), measured('b', 2)]);
    expect(r.places.map((p) => p.candidateId)).toEqual(['a', 'b']);
    expect(r.closePairs[0]).toMatchObject({ quieterId: 'a', louderId: 'b' });
  });
});

describe('rankingUncertainty properties', () => {
  const levels = fc.array(
    fc.record({ level: fc.double({ min: 40, max: 120, noNaN: true }), k: fc.double({ min: 0, max: 4, noNaN: true }) }),
    { minLength: 0, maxLength: 8 },
  );

  it('every row’s place lies within its range, and the range lies within 1 … n', () => {
    fc.assert(
      fc.property(levels, (items) => {
        const sorted = [...items].sort((a, b) => a.level - b.level);
        const rows = sorted.map((x, i) => row(`c${i}`, i + 1, x.level));
        const cands = sorted.map((x, i) => measured(`c${i}`, x.k));
        const r = rankingUncertainty(rows, cands);
        return r.places.every(
          (p) => p.bestPlace >= 1 && p.bestPlace <= p.rank && p.rank <= p.worstPlace && p.worstPlace <= rows.length,
        );
      }),
    );
  });

  it('with every K 0 and distinct levels the order is firm', () => {
    fc.assert(
      fc.property(fc.uniqueArray(fc.integer({ min: 40, max: 120 }), { maxLength: 8 }), (ints) => {
        const sorted = [...ints].sort((a, b) => a - b);
        const r = rankingUncertainty(
          sorted.map((l, i) => row(`c${i}`, i + 1, l)),
          sorted.map((_, i) => guaranteed(`c${i}`)),
        );
        return r.firm && r.places.every((p) => p.bestPlace === p.rank && p.worstPlace === p.rank);
      }),
    );
  });
});
