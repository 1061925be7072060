import { describe, expect, it } from 'vitest';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { rankDuty, worstReceiverForBaseline } from '../../../../src/ledger/ranking/rank.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import { receiver, twoDutyProject } from '../fixtures.ts';

describe('rankDuty', () => {
  // Duty A's candidates at r1 (see fixtures.ts and evaluate.test.ts for the working of each level):
  // a1 baseline 70.20 dB, a2 and a3 60.20 dB, a4 66.20 dB; duty B contributes 65.20 dB.
  const project = twoDutyProject();
  const ev = evaluateProject(project);
  const rows = rankDuty(project, ev, 'u1', 'r1');
  const row = (id: string) => rows.find((r) => r.candidateId === id)!;

  it('rankDuty orders quietest first, ties by cost', () => {
    expect(rows.map((r) => r.candidateId)).toEqual(['a2', 'a3', 'a4', 'a1']);
    expect(rows.map((r) => r.rank)).toEqual([1, 2, 3, 4]);
  });

  it('rankDuty reduction is energetic: a machine 10 dB quieter lowers the phase total by 5.00 dB only', () => {
    // Common practice: with the other machine at 65.20 dB, total(70.20) − total(60.20)
    // = 10·lg(1 + √10) − 10·lg(1 + 1/√10) = 10·lg √10 = 5.00 dB, half the machine's own 10 dB.
    expect(row('a2').reductionDb).toBeCloseTo(5.0, 6);
    expect(row('a1').contributionDb - row('a2').contributionDb).toBeCloseTo(10, 9);
    expect(row('a2').phaseTotalDb).toBeCloseTo(66.39, 2);
  });

  it('rankDuty gives extra cost, dB per 1,000 and cost per dB', () => {
    // a2: 5 days × 150 − 5 days × 100 = +250; 5.00 dB / 0.25 thousand = 20 dB per 1,000; 250 / 5 = 50 per dB.
    expect(row('a2').extraCost).toBe(250);
    expect(row('a2').dbPer1000).toBeCloseTo(20, 6);
    expect(row('a2').costPerDb).toBeCloseTo(50, 6);
    expect(row('a1').dbPer1000).toBeUndefined();
    expect(row('a1').costPerDb).toBeUndefined();
  });

  it('rankDuty flags dominated options: as loud and dearer (a3), louder and dearer (baseline a1 against a4)', () => {
    expect(row('a3').dominated).toBe(true);
    expect(row('a1').dominated).toBe(true);
    expect(row('a2').dominated).toBe(false);
    expect(row('a4').dominated).toBe(false);
  });

  it('rankDuty flags a free win: quieter than the baseline and no dearer (a4: 66.20 dB for 450 against 500)', () => {
    expect(row('a4').freeWin).toBe(true);
    expect(row('a4').extraCost).toBe(-50);
    expect(row('a2').freeWin).toBe(false);
    expect(row('a1').freeWin).toBe(false);
    expect(row('a1').isBaseline).toBe(true);
  });

  it('rankDuty marks rows whose phase total stays over the limit (70 dB)', () => {
    expect(row('a1').overLimit).toBe(true);
    expect(row('a4').overLimit).toBe(false);
  });

  it("rankDuty 'worst' ranks at the receiver with the least margin for the baseline fleet", () => {
    const p = twoDutyProject();
    p.receivers.push(receiver({ id: 'r2', name: 'School', kind: 'school', x: 0, y: 400, limitsDb: { day: 45 } }));
    const e = evaluateProject(p);
    expect(worstReceiverForBaseline(p, e, 'ph1')).toBe('r2');
    const worst = rankDuty(p, e, 'u1', 'worst');
    expect(worst[0]!.contributionDb).toBeCloseTo(e.contributionDb('a2', 'r2'), 9);
  });

  it('rankDuty of an unknown duty is empty', () => {
    expect(rankDuty(project, ev, 'nope', 'r1')).toEqual([]);
  });

  it('rankDuty puts candidates whose level is not computable last', () => {
    const p = twoDutyProject();
    p.candidates[2]!.lwaDb = NaN;
    const e = evaluateProject(p);
    const r = rankDuty(p, e, 'u1', 'r1');
    expect(r.at(-1)!.candidateId).toBe('a3');
    expect(r.at(-1)!.dominated).toBe(false);
  });

  it('rankDuty on the demo ranks every duty at its worst receiver', () => {
    const demo = demoProject();
    const e = evaluateProject(demo);
    for (const d of demo.duties) {
      const r = rankDuty(demo, e, d.id, 'worst');
      expect(r.length).toBe(demo.candidates.filter((c) => c.dutyId === d.id).length);
      expect(r.filter((x) => x.isBaseline)).toHaveLength(1);
    }
  });
});
