import { describe, expect, it } from 'vitest';
import { optimiseFleet } from '../../../../src/ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../../../src/ledger/optimise/load-highs.ts';
import { rankDuty } from '../../../../src/ledger/ranking/rank.ts';
import { phasePeriods, unassessedHourNotes } from '../../../../src/ledger/prediction/phase-periods.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import type { Project } from '../../../../src/ledger/model/model.ts';
import { candidate, duty, projectShell, receiver } from '../fixtures.ts';

/**
 * One machine, LWA 100 dB, 20 m from a façade receiver, point source with Q = 2:
 * L = 100 − 20·lg 20 − 10.99 + 10·lg 2 + 3 = 100 − 26.02 − 7.98 + 3 = 69.0 dB over its
 * working hours (worked by hand from the point-source relation, common practice).
 */
function project(
  periods: Project['periods'],
  phase: Partial<Project['phases'][number]>,
  limitsDb: Record<string, number> = {},
): Project {
  return projectShell({
    name: 'Periods',
    periods,
    phases: [{ id: 'ph1', name: 'Works', periodId: periods[0]!.id, start: '07:00', end: '19:00', ...phase }],
    receivers: [receiver({ limitsDb })],
    duties: [duty()],
    candidates: [candidate()],
  });
}
const FULL_HOURS_DB = 69.0; // worked by hand above
const DAY = { id: 'day', name: 'Day', start: '07:00', end: '19:00' };
const EVENING = { id: 'evening', name: 'Evening', start: '19:00', end: '23:00' };
const NIGHT = { id: 'night', name: 'Night', start: '23:00', end: '07:00' };

describe('phasePeriods: a phase assessed in every period its hours fall in', () => {
  it('works 07:00–21:00 count 12 h in the day and 2 h in the evening (issue example, worked by hand)', () => {
    const p = project([DAY, EVENING, NIGHT], { start: '07:00', end: '21:00' });
    const found = phasePeriods(p, p.phases[0]!);
    expect(found.periods.map((x) => [x.periodId, x.hoursWorked, x.periodHours, x.own])).toEqual([
      ['day', 12, 12, true],
      ['evening', 2, 4, false],
    ]);
    // 10·lg(2/4) − 10·lg(12/12) = −3.01 dB (worked by hand)
    expect(found.periods[1]!.shiftDb).toBeCloseTo(-3.01, 2);
    expect(found.unassessedHours).toBe(0);
  });

  it('night works 23:00–03:00 in a night period 23:00–07:00: 4 h of 8 h', () => {
    const p = project([DAY, EVENING, NIGHT], { periodId: 'night', start: '23:00', end: '03:00' });
    const found = phasePeriods(p, p.phases[0]!);
    expect(found.periods.map((x) => [x.periodId, x.hoursWorked, x.periodHours])).toEqual([['night', 4, 8]]);
  });

  it('hours inside the own period are not assessed again in another period with the same times of day', () => {
    const saturday = { id: 'sat', name: 'Saturday morning', start: '08:00', end: '13:00' };
    const p = project([DAY, saturday], { start: '08:00', end: '18:00' });
    expect(phasePeriods(p, p.phases[0]!).periods.map((x) => x.periodId)).toEqual(['day']);
  });

  it('hours in no period are counted and named in a note', () => {
    const p = project([DAY], { start: '06:00', end: '20:00' });
    expect(phasePeriods(p, p.phases[0]!).unassessedHours).toBe(2); // 06:00–07:00 and 19:00–20:00
    expect(unassessedHourNotes(p)).toEqual([
      {
        path: '$.phases[0]',
        message:
          'Phase "Works": 2 h of its working hours 06:00–20:00 fall in no assessment period and are not assessed (add a period that covers them, or shorten the working hours)',
      },
    ]);
  });
});

describe('evaluateProject: matrix cells per period', () => {
  it('a phase 07:00–21:00 has a day cell at 69.0 dB and an evening cell at 66.0 dB', () => {
    const p = project([DAY, EVENING, NIGHT], { start: '07:00', end: '21:00' }, { day: 70, evening: 65 });
    expect(validateProject(p)).toEqual([]);
    const ev = evaluateProject(p);
    expect(ev.matrix.map((c) => [c.periodId, c.ownPeriod, c.hoursWorked, c.periodHours])).toEqual([
      ['day', true, 12, 12],
      ['evening', false, 2, 4],
    ]);
    expect(ev.matrix[0]!.levelDb).toBeCloseTo(FULL_HOURS_DB, 1);
    // 69.0 + 10·lg(2 h / 4 h) = 69.0 − 3.0 = 66.0 dB, over the evening limit of 65 (worked by hand)
    expect(ev.matrix[1]!.levelDb).toBeCloseTo(66.0, 1);
    expect(ev.matrix[1]!.over).toBe(true);
    expect(ev.matrix[1]!.marginDb).toBeCloseTo(-1.0, 1);
    expect(ev.notes).toEqual([]);
  });

  it('night works 23:00–03:00 are assessed over the 8 h night: 69.0 − 3.0 = 66.0 dB', () => {
    const p = project([DAY, NIGHT], { periodId: 'night', start: '23:00', end: '03:00' }, { night: 45 });
    expect(validateProject(p)).toEqual([]);
    const ev = evaluateProject(p);
    expect(ev.matrix).toHaveLength(1);
    expect(ev.matrix[0]!.periodId).toBe('night');
    expect(ev.matrix[0]!.levelDb).toBeCloseTo(66.0, 1); // 10·lg(4/8) = −3.01 dB, worked by hand
    expect(ev.contribution('c1', 'r1').terms.find((t) => t.key === 'workingHours')?.db).toBeCloseTo(-3.01, 2);
  });

  it('a night period 23:00–07:00 is valid; a period whose end equals its start is not', () => {
    const p = project([DAY, NIGHT, { id: 'x', name: 'Empty', start: '07:00', end: '07:00' }], {});
    expect(validateProject(p).map((q) => q.path)).toEqual(['$.periods[2].end']);
  });

  it('hours outside every period give a note but no problem, so levels are still computed', () => {
    const p = project([DAY], { start: '06:00', end: '20:00' }, { day: 70 });
    const ev = evaluateProject(p);
    expect(ev.problems).toEqual([]);
    expect(ev.notes).toHaveLength(1);
    expect(ev.matrix[0]!.levelDb).toBeCloseTo(FULL_HOURS_DB, 1); // 12 h of the 12 h day
  });
});

describe('the optimiser and rankings see every period a phase is assessed in', () => {
  // Loud c1 (LWA 100, 100 a day): 69.0 dB in the day, 66.0 dB in the evening; quiet c2 (LWA 95,
  // 150 a day): 64.0 and 61.0 dB (worked by hand as above). Limits: day 70, evening 65.
  // Only the evening limit rules the loud machine out.
  const twoCandidates = () => {
    const p = project([DAY, EVENING], { start: '07:00', end: '21:00' }, { day: 70, evening: 65 });
    p.candidates.push(candidate({ id: 'c2', label: 'Quiet', lwaDb: 95, cost: { kind: 'hire', dayRate: 150 } }));
    return p;
  };

  it('optimiseFleet chooses the quiet machine because of the evening limit', async () => {
    const p = twoCandidates();
    const ev = evaluateProject(p);
    const r = await optimiseFleet(p, ev, {}, await loadHighsSolver());
    expect(r.feasible).toBe(true);
    expect(r.best.fleet).toEqual({ u1: 'c2' });
    expect(r.baseline.over).toEqual([
      { phaseId: 'ph1', periodId: 'evening', receiverId: 'r1', levelDb: expect.closeTo(66.0, 1), limitDb: 65 },
    ]);
  });

  it('rankDuty marks the loud machine over the limit (evening), not the quiet one', () => {
    const p = twoCandidates();
    const rows = rankDuty(p, evaluateProject(p), 'u1', 'r1');
    expect(rows.map((r) => [r.candidateId, r.overLimit])).toEqual([
      ['c2', false],
      ['c1', true],
    ]);
  });
});
