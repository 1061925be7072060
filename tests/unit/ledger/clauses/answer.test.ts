/**
 * The clause-by-clause answer on the hand-worked site of ./clause-project.ts (baseline
 * fleet br1 + pu1 unless stated). Every level is worked by hand from the point-source
 * relation Lp = LWA − 20·lg d − 7.98 dB and energetic addition L = 10·lg Σ 10^(Li/10).
 */
import { describe, expect, it } from 'vitest';
import { answerClauses } from '../../../../src/ledger/clauses/answer.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { clause, clauseProject } from './clause-project.ts';
import type { Clause, Fleet } from '../../../../src/ledger/model/model.ts';

function answer(clauses: Clause[], fleet?: Fleet) {
  const project = clauseProject(clauses);
  return answerClauses(project, evaluateProject(project, fleet));
}

describe('answerClauses: limit at a receiver', () => {
  it('LAeq,T 70 dB passes: 68.45 dB, margin 1.55 dB', () => {
    const a = answer([clause('k1', '4.1', { kind: 'limit', periodId: 'day', limitDb: 70 })]).answers[0]!;
    expect(a.status).toBe('pass');
    expect(a.evidence[0]!.value).toBeCloseTo(68.447, 2); // worked by hand: 10·lg(10^6.8039 + 10^5.7977)
    expect(a.evidence[0]!.subject).toBe('Works at Mill Cottage');
    expect(a.summary).toContain('margin 1.6 dB');
  });

  it('rating level 70 dB fails (71.45 dB with +3 dB for each machine’s character) and names the cheapest fix', () => {
    const a = answer([clause('k1', '4.2', { kind: 'limit', periodId: 'day', limitDb: 70, metric: 'rating' })])
      .answers[0]!;
    expect(a.status).toBe('fail');
    expect(a.evidence[0]!.value).toBeCloseTo(71.447, 2); // worked by hand: 68.45 + 3 (both machines penalised)
    // br2: 65.04 (rated) with pu1 60.98 → 66.48 dB, +£400; br3: 63.13 dB, +£1,000; pu2 alone leaves 71.09 (worked by hand).
    expect(a.fix?.substitutions.map((s) => s.toCandidateId)).toEqual(['br2']);
    expect(a.fix?.extraCost).toBeCloseTo(400, 6); // (140 − 100) £/day × 10 days, worked by hand
    expect(a.fix?.text).toBe('Use Breaker quiet instead of Breaker loud for Breaking (+£400)');
  });

  it('a fleet that meets the rating limit passes', () => {
    const a = answer([clause('k1', '4.2', { kind: 'limit', periodId: 'day', limitDb: 70, metric: 'rating' })], {
      brk: 'br3',
    }).answers[0]!;
    expect(a.status).toBe('pass');
    expect(a.evidence[0]!.value).toBeCloseTo(63.125, 2); // worked by hand: br3 59.04 (no penalty) ⊕ pu1 60.98
  });

  it('a limit for a period no phase falls in passes with nothing assessed', () => {
    const project = clauseProject([clause('k1', '4.3', { kind: 'limit', periodId: 'night', limitDb: 45 })]);
    project.periods.push({ id: 'night', name: 'Night', start: '23:00', end: '24:00' });
    const a = answerClauses(project, evaluateProject(project)).answers[0]!;
    expect(a.status).toBe('pass');
    expect(a.summary).toContain('No phase of the works falls in Night');
  });
});

describe('answerClauses: limit along a boundary', () => {
  const boundary = clause('k2', '4.4', {
    kind: 'limit',
    area: 'boundary',
    boundary: [
      { x: 20, y: -20 },
      { x: 20, y: 60 },
    ],
    spacingM: 5,
    heightM: 1.5,
    periodId: 'day',
    limitDb: 75,
  });

  it('reports the worst point (20, 0): 72.60 dB, margin 2.40 dB', () => {
    const a = answer([boundary]).answers[0]!;
    expect(a.status).toBe('pass');
    // Worked by hand: breaker at 30 m 72.48 dB ⊕ pump at √(20² + 40²) = 44.72 m 57.01 dB = 72.60 dB.
    expect(a.evidence[0]!.value).toBeCloseTo(72.597, 2);
    expect(a.evidence[0]!.subject).toBe('Works at boundary point 5 (20.0, 0.0)');
  });

  it('fails at 72 dB and says no duty given by distances can be placed', () => {
    const a = answer([{ ...boundary, limitDb: 72 }]).answers[0]!;
    expect(a.status).toBe('fail');
    const project = clauseProject([boundary]);
    project.duties[1]!.location = { kind: 'distances', distancesM: { r1: 40 } };
    const b = answerClauses(project, evaluateProject(project)).answers[0]!;
    expect(b.status).toBe('incomplete');
    expect(b.summary).toContain('"Pumping" is given by distances only');
  });
});

describe('answerClauses: caps on machines', () => {
  it('an LWA cap exactly met passes (br2 104 dB, cap 104)', () => {
    const a = answer([clause('k3', '5.1', { kind: 'lwa-cap', maxDb: 104, dutyIds: ['brk'] })], { brk: 'br2' })
      .answers[0]!;
    expect(a.status).toBe('pass'); // 104 ≤ 104: a cap is a maximum (common practice)
  });

  it('an LWA cap of 105 dB fails for br1 (110 dB); the cheapest machine under it is br2 (+£400)', () => {
    const a = answer([clause('k3', '5.1', { kind: 'lwa-cap', maxDb: 105 })]).answers[0]!;
    expect(a.status).toBe('fail');
    expect(a.evidence.map((e) => [e.candidateId, e.ok])).toEqual([
      ['br1', false],
      ['pu1', true],
    ]);
    expect(a.fix?.substitutions.map((s) => s.toCandidateId)).toEqual(['br2']);
    expect(a.fix?.extraCost).toBeCloseTo(400, 6); // worked by hand
  });

  it('a cap on Lp at 10 m: br1 82.02 dB fails a cap of 80; br2 76.02 dB passes', () => {
    const c = clause('k4', '5.2', { kind: 'lp-cap', maxDb: 80, distanceM: 10, dutyIds: ['brk'] });
    const a = answer([c]).answers[0]!;
    expect(a.status).toBe('fail');
    expect(a.evidence[0]!.value).toBeCloseTo(82.018, 3); // 110 + 10·lg(2/(4π·10²)) = 110 − 27.98, point-source relation
    expect(a.evidence[0]!.figure).toContain('Lp at 10 m 82.0 dB = LWA 110.0 − 28.0');
    expect(answer([c], { brk: 'br2' }).answers[0]!.status).toBe('pass');
  });

  it('the cap reads the LWA the project rates on: measured 102 + K 2 = 104 fails a cap of 103', () => {
    const project = clauseProject([clause('k3', '5.1', { kind: 'lwa-cap', maxDb: 103, dutyIds: ['brk'] })]);
    Object.assign(project.candidates[0]!, { lwaDb: 102, declaration: 'measured', uncertaintyDb: 2 });
    const a = answerClauses(project, evaluateProject(project)).answers[0]!;
    expect(a.status).toBe('fail');
    expect(a.evidence[0]!.value).toBe(104); // ISO 4871: guaranteed = L + K
  });
});

describe('answerClauses: working hours', () => {
  const hours = clause('k5', '6.1', { kind: 'hours', character: 'impulsive', start: '08:00', end: '18:00' });

  it('impulsive work 07:00–19:00 is 2 h outside 08:00–18:00; the cheapest machine without that character is br3', () => {
    const a = answer([hours]).answers[0]!;
    expect(a.status).toBe('fail');
    expect(a.evidence).toHaveLength(1); // only the breaker is impulsive; the pump is tonal
    expect(a.evidence[0]!.value).toBe(2); // worked by hand: 07:00–08:00 and 18:00–19:00
    expect(a.fix?.substitutions.map((s) => s.toCandidateId)).toEqual(['br3']);
    expect(a.fix?.extraCost).toBeCloseTo(1000, 6); // (200 − 100) £/day × 10 days
  });

  it('a phase running into the evening period breaks the restriction by the evening hours', () => {
    const project = clauseProject([hours]);
    project.periods.push({ id: 'eve', name: 'Evening', start: '19:00', end: '23:00' });
    project.phases.push({ id: 'ph2', name: 'Evening pour', periodId: 'eve', start: '17:00', end: '21:00' });
    project.duties[1]!.phaseId = 'ph2';
    project.candidates[3]!.character = 'impulsive';
    const a = answerClauses(project, evaluateProject(project)).answers[0]!;
    const pump = a.evidence.find((e) => e.dutyId === 'pmp')!;
    expect(pump.value).toBe(3); // worked by hand: 18:00–21:00 outside 08:00–18:00
    expect(pump.figure).toContain('17:00–21:00 (Evening pour)');
  });

  it('a restriction of any work says no machine changes it', () => {
    const a = answer([{ ...hours, character: 'any', dutyIds: ['pmp'] }]).answers[0]!;
    expect(a.status).toBe('fail');
    expect(a.fix).toBeUndefined();
    expect(a.noFix).toBe('Move the working hours of Works within 08:00–18:00; no machine changes this.');
  });
});

describe('answerClauses: share of electric plant', () => {
  it('by count: 0 of 2 units fails 50 %; swapping the pump (+£150) is cheaper than the breaker (+£1,000)', () => {
    const a = answer([clause('k6', '8.1', { kind: 'share', basis: 'count', minPct: 50 })]).answers[0]!;
    expect(a.status).toBe('fail');
    expect(a.summary).toBe('Share reached 0.0 % electric or battery (0 of 2 units); at least 50 % asked.');
    expect(a.fix?.substitutions.map((s) => s.toCandidateId)).toEqual(['pu2']);
    expect(a.fix?.extraCost).toBeCloseTo(150, 6); // (45 − 30) £/day × 10 days
  });

  it('by hours: weights are units × days × working hours a day', () => {
    const project = clauseProject([clause('k6', '8.1', { kind: 'share', basis: 'hours', minPct: 40 })]);
    project.duties[0]!.count = 2; // breaking: 2 × 10 days × 12 h = 240 machine-hours
    project.duties[1]!.durationDays = 5; // pumping: 1 × 5 × 12 = 60
    const a = answerClauses(project, evaluateProject(project, { brk: 'br1', pmp: 'pu2' })).answers[0]!;
    expect(a.status).toBe('fail');
    expect(a.summary).toContain('20.0 % electric or battery (60 of 300 machine-hours)'); // 60 / 300, worked by hand
    const b = answerClauses(project, evaluateProject(project, { brk: 'br3', pmp: 'pu1' })).answers[0]!;
    expect(b.status).toBe('pass'); // 240 / 300 = 80 %
  });

  it('a share exactly met passes: 1 of 2 units is 50 %', () => {
    expect(answer([clause('k6', '8.1', { kind: 'share', minPct: 50 })], { pmp: 'pu2' }).answers[0]!.status).toBe(
      'pass',
    );
  });
});

describe('answerClauses: statements and counts', () => {
  it('a statement clause is "stated" with its text, or incomplete without one', () => {
    const r = answer([
      clause('k7', '9.1', {
        kind: 'statement',
        statement: 'Monitoring at the cottage weekly; results to the engineer.',
      }),
      clause('k8', '9.2', { kind: 'statement' }),
    ]);
    expect(r.answers.map((a) => a.status)).toEqual(['stated', 'incomplete']);
    expect(r.answers[0]!.statement).toContain('Monitoring');
    expect(r.counts).toEqual({ pass: 0, fail: 0, stated: 1, incomplete: 1 });
    expect(r.allMet).toBe(false);
  });

  it('a clause with a data problem is incomplete and quotes the problem', () => {
    const a = answer([clause('k9', '5.9', { kind: 'lwa-cap' })]).answers[0]!;
    expect(a.status).toBe('incomplete');
    expect(a.summary).toContain('Clause "5.9", cap: missing');
  });
});
