/**
 * The level basis (ISO 4871:1996) and the character penalty reach the ranking and the
 * optimiser through the evaluation.
 *
 * Project: the two-duty fixture (simple method, Q = 2, period 07:00–19:00, works 08:00–18:00,
 * façade, limit 70 dB). Every contribution below is worked by hand:
 *   duty A at 20 m, 50 % on-time: L = LWA − 20·lg 20 + 10·lg(2/(4π)) + 10·lg 0.5 + 10·lg(10/12) + 3
 *                                    = LWA − 26.02 − 7.98 − 3.01 − 0.79 + 3 = LWA − 34.81 dB;
 *   duty B at 40 m, two units:       L = 100 − 32.04 − 7.98 + 3.01 − 0.79 + 3 = 65.19 dB
 * (point source Lp = Lw + 10·lg(Q/(4πr²)), n units + 10·lg n, on-time + 10·lg η, façade + 3 dB: common practice).
 * Duty A candidates: a1 guaranteed 105 (baseline, 100/day), x measured L 100 with K 4 (110/day),
 * y guaranteed 101 without K (150/day); five days each.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { rankDuty } from '../../../../src/ledger/ranking/rank.ts';
import { optimiseFleet } from '../../../../src/ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../../../src/ledger/optimise/load-highs.ts';
import type { LpSolver } from '../../../../src/ledger/optimise/solver.ts';
import type { Project } from '../../../../src/ledger/model/model.ts';
import { candidate, twoDutyProject } from '../fixtures.ts';

/** Tolerance for levels worked by hand to two decimals, dB. */
const TOLERANCE_DB = 0.02;

function basisProject(levelBasis: 'guaranteed' | 'measured'): Project {
  const p = twoDutyProject();
  p.settings = { ...p.settings, levelBasis };
  p.candidates = [
    candidate({ id: 'a1', dutyId: 'u1', label: 'A baseline', lwaDb: 105, cost: { kind: 'hire', dayRate: 100 } }),
    candidate({
      id: 'x',
      dutyId: 'u1',
      label: 'A measured pair',
      lwaDb: 100,
      declaration: 'measured',
      uncertaintyDb: 4,
      cost: { kind: 'hire', dayRate: 110 },
    }),
    candidate({ id: 'y', dutyId: 'u1', label: 'A guaranteed', lwaDb: 101, cost: { kind: 'hire', dayRate: 150 } }),
    candidate({ id: 'b1', dutyId: 'u2', label: 'B', lwaDb: 100, cost: { kind: 'hire', dayRate: 80 } }),
  ];
  return p;
}

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

describe('level basis: guaranteed L + K by default, L when the project says measured', () => {
  it('evaluateProject rates the pair (100, K 4) at 104 by default and at 100 on the measured basis', () => {
    // ISO 4871:1996: declared value Ld = L + K = 104. Contribution 104 − 34.81 = 69.19; measured 100 − 34.81 = 65.19.
    expect(Math.abs(evaluateProject(basisProject('guaranteed')).contributionDb('x', 'r1') - 69.195)).toBeLessThan(
      TOLERANCE_DB,
    );
    expect(Math.abs(evaluateProject(basisProject('measured')).contributionDb('x', 'r1') - 65.195)).toBeLessThan(
      TOLERANCE_DB,
    );
    // A guaranteed value without K is the same on both bases: 101 − 34.81 = 66.19.
    expect(Math.abs(evaluateProject(basisProject('measured')).contributionDb('y', 'r1') - 66.195)).toBeLessThan(
      TOLERANCE_DB,
    );
  });

  it('rankDuty puts the guaranteed 101 first by default (101 < 104) and the pair first on the measured basis (100 < 101)', () => {
    const order = (basis: 'guaranteed' | 'measured') => {
      const p = basisProject(basis);
      return rankDuty(p, evaluateProject(p), 'u1', 'r1').map((r) => r.candidateId);
    };
    expect(order('guaranteed')).toEqual(['y', 'x', 'a1']);
    expect(order('measured')).toEqual(['x', 'y', 'a1']);
  });

  it('optimiseFleet takes the dearer y by default and the cheaper pair on the measured basis', () => {
    // Phase total with B (65.19 dB), worked by hand (L = 10·lg Σ 10^(Li/10)):
    //   guaranteed: x 69.19 ⊕ 65.19 = 70.65 > 70 (over); y 66.19 ⊕ 65.19 = 68.73 ≤ 70 → y, 150 × 5 = 750 for duty A.
    //   measured:   x 65.19 ⊕ 65.19 = 68.20 ≤ 70 → x, 110 × 5 = 550, cheaper than y.
    const pick = (basis: 'guaranteed' | 'measured') => {
      const p = basisProject(basis);
      return optimiseFleet(p, evaluateProject(p), { tradeOff: false }, solver).best.fleet['u1'];
    };
    expect(pick('guaranteed')).toBe('y');
    expect(pick('measured')).toBe('x');
  });
});

describe('character penalty: a term of its own, in ranking and optimising', () => {
  it('a tonal candidate’s contribution has a "penalty" term of 3 dB, and its terms add up to its level', () => {
    const p = basisProject('guaranteed');
    p.candidates[2]!.character = 'tonal';
    const c = evaluateProject(p).contribution('y', 'r1');
    expect(c.terms.filter((t) => t.key === 'penalty')).toEqual([
      { key: 'penalty', label: 'Character penalty (tonal)', db: 3 },
    ]);
    // 101 − 34.81 + 3 = 69.19 dB (+3 dB character penalty, common practice).
    expect(Math.abs(c.levelDb - 69.195)).toBeLessThan(TOLERANCE_DB);
    expect(c.terms.reduce((s, t) => s + t.db, 0)).toBeCloseTo(c.levelDb, 9);
  });

  it('a project penalty of 6 dB gives a 6 dB term; 0 dB gives no penalty term', () => {
    const p = basisProject('guaranteed');
    p.candidates[2]!.character = 'impulsive';
    p.settings.characterPenaltyDb = 6;
    expect(
      evaluateProject(p)
        .contribution('y', 'r1')
        .terms.find((t) => t.key === 'penalty')?.db,
    ).toBe(6);
    p.settings.characterPenaltyDb = 0;
    const none = evaluateProject(p).contribution('y', 'r1');
    expect(none.terms.some((t) => t.key === 'penalty')).toBe(false);
    expect(Math.abs(none.levelDb - 66.195)).toBeLessThan(TOLERANCE_DB);
  });

  it('a tonal y (101 + 3 = 104 effective) ranks level with the pair and the optimiser no longer takes it', () => {
    // guaranteed basis: y 66.19 + 3 = 69.19 ⊕ 65.19 = 70.65 > 70; no candidate of A meets the limit with B alone…
    // …so the fleet with the least exceedance is chosen and the result says it is not feasible.
    const p = basisProject('guaranteed');
    p.candidates[2]!.character = 'tonal';
    const ev = evaluateProject(p);
    const rows = rankDuty(p, ev, 'u1', 'r1');
    expect(
      Math.abs(
        rows.find((r) => r.candidateId === 'y')!.contributionDb -
          rows.find((r) => r.candidateId === 'x')!.contributionDb,
      ),
    ).toBeLessThan(1e-9);
    expect(optimiseFleet(p, ev, { tradeOff: false }, solver).feasible).toBe(false);
  });
});

describe('rankings on one basis (ISO 4871:1996): what cannot be put on it is marked, never mixed silently', () => {
  /** The basis project with every guaranteed value given its K, and one measured L without K (z, 99 dB). */
  function withKs(levelBasis: 'guaranteed' | 'measured'): Project {
    const p = basisProject(levelBasis);
    p.candidates = p.candidates.map((c) => (c.declaration === 'guaranteed' ? { ...c, uncertaintyDb: 2 } : c));
    p.candidates.push(
      candidate({ id: 'z', dutyId: 'u1', label: 'A measured, no K', lwaDb: 99, declaration: 'measured' }),
    );
    return p;
  }

  it('guaranteed basis: the pair on L + K = 104, y on 101, the baseline on 105; z (L 99, no K) on 99 and marked', () => {
    const p = withKs('guaranteed');
    const ev = evaluateProject(p);
    const rows = rankDuty(p, ev, 'u1', 'r1');
    // Contributions LWA − 34.81 (worked by hand above): z 64.19, y 66.19, x 69.19, a1 70.19.
    expect(rows.map((r) => r.candidateId)).toEqual(['z', 'y', 'x', 'a1']);
    expect(Math.abs(rows[0]!.contributionDb - 64.195)).toBeLessThan(TOLERANCE_DB);
    expect(rows.filter((r) => r.offBasis).map((r) => r.candidateId)).toEqual(['z']);
    expect(rows[0]!.offBasis).toMatch(/measured L without K: compared on L as declared, not on .* L_d = L \+ K/);
    expect(ev.notes.map((n) => n.message).join('\n')).toMatch(
      /OFF BASIS: the project compares machines on the guaranteed value L_d = L \+ K \(ISO 4871:1996\), but 1 of 5 machines .* A measured, no K \(measured L without K\)/,
    );
  });

  it('measured basis: guaranteed values with K on L_d − K (a1 103, y 99), the pair on 100, z on 99; none marked', () => {
    const p = withKs('measured');
    const ev = evaluateProject(p);
    const rows = rankDuty(p, ev, 'u1', 'r1');
    // ISO 4871:1996 L = L_d − K: y 101 − 2 = 99 ties z 99 (y dearer, so after it), x 100, a1 105 − 2 = 103.
    expect(rows.map((r) => r.candidateId)).toEqual(['z', 'y', 'x', 'a1']);
    expect(Math.abs(rows[1]!.contributionDb - (99 - 34.805))).toBeLessThan(TOLERANCE_DB);
    expect(rows.some((r) => r.offBasis)).toBe(false);
    expect(ev.notes.some((n) => n.message.startsWith('OFF BASIS'))).toBe(false);
  });

  it('measured basis without K on the guaranteed values: a1 and y compared on L_d as declared, both marked', () => {
    const p = basisProject('measured');
    const rows = rankDuty(p, evaluateProject(p), 'u1', 'r1');
    expect(
      rows
        .filter((r) => r.offBasis)
        .map((r) => r.candidateId)
        .sort(),
    ).toEqual(['a1', 'y']);
    expect(rows.find((r) => r.candidateId === 'y')!.offBasis).toMatch(/guaranteed L_d without K/);
  });
});
