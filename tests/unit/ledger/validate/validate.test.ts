import { describe, expect, it } from 'vitest';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import type { Project } from '../../../../src/ledger/model/model.ts';
import { twoDutyProject } from '../fixtures.ts';

const messageAt = (problems: { path: string; message: string }[], path: string) =>
  problems.find((p) => p.path === path)?.message;

describe('validateProject', () => {
  it('validateProject(demoProject()) finds nothing', () => {
    expect(validateProject(demoProject())).toEqual([]);
  });

  it('validateProject lists every problem at once, each with its JSON path, value and what is accepted', () => {
    const p = twoDutyProject();
    p.currency = 'gbp';
    p.candidates[3]!.lwaDb = 250;
    p.candidates[1]!.bandsDb = [1, 2, 3];
    p.duties[0]!.onTimePct = 0;
    p.phases[0]!.end = '08:00';
    const problems = validateProject(p);
    expect(messageAt(problems, '$.currency')).toBe(
      'Currency: "gbp" is not accepted (use an ISO 4217 currency code of three capital letters, e.g. "GBP" or "EUR")',
    );
    expect(messageAt(problems, '$.candidates[3].lwaDb')).toBe(
      'Candidate "A quieter, cheaper", LWA: 250 is out of range (use a sound power level in dB from 40 to 150, e.g. 104.5)',
    );
    expect(messageAt(problems, '$.candidates[1].bandsDb')).toMatch(
      /^Candidate "A quiet", octave bands: \[1,2,3\] is not eight numbers \(give eight sound power levels/,
    );
    expect(messageAt(problems, '$.duties[0].onTimePct')).toBe(
      'Duty "A", on-time: 0 is out of range (use a percentage above 0 and up to 100, e.g. 60)',
    );
    expect(messageAt(problems, '$.phases[0].end')).toBe(
      'Phase "Works", working hours, end: "08:00" is the same as the start 08:00 (use a different end; an end earlier than the start runs past midnight (e.g. 23:00–07:00); a whole day is 00:00–24:00)',
    );
    expect(problems).toHaveLength(5);
  });

  it('validateProject reports the text typed into an unreadable cell', () => {
    const p = twoDutyProject();
    p.candidates[0]!.lwaDb = NaN;
    p.unreadCells = { 'candidates/a1/lwaDb': '12O' };
    expect(validateProject(p)).toEqual([
      {
        path: '$.candidates[0].lwaDb',
        message:
          'Candidate "A loud", LWA: "12O" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)',
      },
    ]);
  });

  it('validateProject checks that ids are unique and references exist', () => {
    const p = twoDutyProject();
    p.candidates[1]!.id = 'a1';
    p.candidates[4]!.dutyId = 'u9';
    p.duties[1]!.phaseId = 'ph9';
    const problems = validateProject(p);
    expect(messageAt(problems, '$.candidates[1].id')).toBe(
      'Candidate "A quiet", id: "a1" is used twice in candidates (use a short identifier, unique in its list, e.g. "c12")',
    );
    expect(messageAt(problems, '$.candidates[4].dutyId')).toBe(
      'Candidate "B", duty: "u9" is not a duty of this project (use one of "u1", "u2")',
    );
    expect(messageAt(problems, '$.duties[1].phaseId')).toBe(
      'Duty "B", phase: "ph9" is not a phase of this project (use one of "ph1")',
    );
    // duty B has lost its only candidate
    expect(messageAt(problems, '$.duties[1].id')).toBe(
      'Duty "B": "u2" has no candidates (add at least one candidate whose dutyId names this duty)',
    );
  });

  it('validateProject refuses a baseline that belongs to another duty', () => {
    const p = twoDutyProject();
    p.duties[0]!.baselineCandidateId = 'b1';
    expect(messageAt(validateProject(p), '$.duties[0].baselineCandidateId')).toBe(
      'Duty "A", baseline: "b1" is a candidate of another duty (use one of this duty’s candidates: "a1", "a2", "a3", "a4")',
    );
  });

  it('validateProject checks times of day', () => {
    const p = twoDutyProject();
    p.periods[0]!.start = '7am';
    expect(messageAt(validateProject(p), '$.periods[0].start')).toBe(
      'Period "Day", start: "7am" is not a time of day (use a time of day HH:MM from 00:00 to 24:00, e.g. 07:00)',
    );
  });

  it('validateProject refuses working hours outside the period', () => {
    const p = twoDutyProject();
    p.phases[0] = { ...p.phases[0]!, start: '19:00', end: '23:00' };
    expect(messageAt(validateProject(p), '$.phases[0].start')).toBe(
      'Phase "Works", working hours: "19:00–23:00" fall outside its own period 07:00–19:00 (use working hours that overlap the period, or choose as its own period one its hours fall in)',
    );
  });

  it('validateProject refuses a barrier with the simple method, and unknown duty keys in screening', () => {
    const p = twoDutyProject();
    p.receivers[0]!.screening = { u1: { kind: 'barrier', pathDifferenceM: 1 }, u7: { kind: 'hidden' } };
    const problems = validateProject(p);
    expect(messageAt(problems, '$.receivers[0].screening.u1.kind')).toMatch(
      /"barrier" needs the ISO 9613-2:1996 propagation method/,
    );
    expect(messageAt(problems, '$.receivers[0].screening.u7')).toBe(
      'Receiver "House", screening: "u7" is not a duty of this project (use a duty id as the key)',
    );
  });

  it('validateProject asks for a distance to every receiver in a distances table', () => {
    const p = twoDutyProject();
    p.duties[0]!.location = { kind: 'distances', distancesM: { r9: 30 } };
    const problems = validateProject(p);
    expect(messageAt(problems, '$.duties[0].location.distancesM.r9')).toMatch(/"r9" is not a receiver of this project/);
    expect(messageAt(problems, '$.duties[0].location.distancesM.r1')).toBe(
      'Duty "A", distance to receiver "r1": missing (use a distance in metres above 0, e.g. 45)',
    );
  });

  it('validateProject checks costs, flags and declarations', () => {
    const p = twoDutyProject();
    p.candidates[0]!.cost = { kind: 'purchase', price: 1000, lifeDays: 100, resaleValue: 2000 };
    p.candidates[1]!.pinned = true;
    p.candidates[1]!.excluded = true;
    p.candidates[2]!.uncertaintyDb = 15;
    const problems = validateProject(p);
    expect(messageAt(problems, '$.candidates[0].cost.resaleValue')).toBe(
      'Candidate "A loud", resale value: 2000 is above the price 1000 (use a resale value from 0 up to the price)',
    );
    expect(messageAt(problems, '$.candidates[1].excluded')).toBe(
      'Candidate "A quiet", excluded: true contradicts pinned (a candidate is either pinned or excluded, not both)',
    );
    expect(messageAt(problems, '$.candidates[2].uncertaintyDb')).toMatch(
      /15 is out of range \(use an uncertainty K in dB from 0 to 10/,
    );
  });

  it('validateProject never throws on a shapeless value', () => {
    const problems = validateProject({ format: 'x' } as unknown as Project);
    expect(problems.length).toBeGreaterThan(3);
    expect(validateProject(null as unknown as Project).length).toBeGreaterThan(0);
  });
});

describe('validateProject on ids that name JavaScript’s own properties', () => {
  it('a candidate with the id "__proto__" is reported even when every other id is fine (the quick path of a long list)', () => {
    const p = demoProject();
    p.candidates = [...p.candidates, { ...p.candidates[0]!, id: '__proto__', label: 'Proto breaker' }];
    const at = `$.candidates[${p.candidates.length - 1}].id`;
    expect(validateProject(p).find((x) => x.path === at)?.message).toMatch(/is a name the program keeps for itself/);
  });

  it('"constructor" and "toString" are ordinary ids', () => {
    const p = demoProject();
    p.candidates = [
      ...p.candidates,
      { ...p.candidates[0]!, id: 'constructor', label: 'Constructor breaker' },
      { ...p.candidates[0]!, id: 'toString', label: 'ToString breaker' },
    ];
    expect(validateProject(p).filter((x) => x.path.endsWith('.id'))).toEqual([]);
  });
});
