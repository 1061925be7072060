/**
 * The compliance statement for the assessed fleet. The one-duty case is worked by hand
 * from the point-source relation Lp = LWA + 10·lg(Q/(4πr²)) (common practice):
 * LWA 100 dB, Q = 2, r = 10 m: 10·lg(2/(4π·100)) = −27.98 dB, so 72.0 dB; the phase works
 * the whole 12 h period, no façade, so LAeq,12h = 72.0 dB, 3.0 dB under a 75 dB limit.
 */
import { describe, expect, it } from 'vitest';
import { complianceStatement, hoursText } from '../../../../src/ledger/checks/compliance-statement.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import type { Project } from '../../../../src/ledger/model/model.ts';
import { candidate, duty, receiver, twoDutyProject } from '../fixtures.ts';

function oneDuty(limit: number): Project {
  const p = twoDutyProject();
  p.phases = [{ id: 'ph1', name: 'Works', periodId: 'day', start: '07:00', end: '19:00' }];
  p.receivers = [
    receiver({ name: 'Wren Cottage', facade: false, limitsDb: { day: limit }, screening: { u1: { kind: 'hidden' } } }),
  ];
  p.duties = [
    duty({ id: 'u1', name: 'Dig', location: { kind: 'distances', distancesM: { r1: 10 } }, baselineCandidateId: 'c1' }),
  ];
  p.candidates = [candidate({ id: 'c1', dutyId: 'u1', label: 'Fenwick 8 t', lwaDb: 110 })];
  return p;
}

describe('complianceStatement', () => {
  it('a level under its limit complies, with the margin and the measures it relies on', () => {
    // 110 dB machine fully hidden (−10 dB, common practice): 110 − 27.98 − 10 = 72.0 dB
    const p = oneDuty(75);
    const s = complianceStatement(p, evaluateProject(p), 'Quiet option A');
    expect(s.complies).toBe(true);
    expect(s.lines).toHaveLength(1);
    expect(s.lines[0]!.sentence).toBe(
      'Predicted LAeq,12h at Wren Cottage during Works is 72.0 dB against a limit of 75 dB: complies with 3.0 dB to spare.',
    );
    expect(s.lines[0]!.measures).toContain(
      'screening from Wren Cottage: Dig screened, the machine wholly out of sight (−10 dB)',
    );
    expect(s.lines[0]!.measures).toContain('work only 07:00–19:00');
    expect(s.summary).toMatch(
      /^With fleet “Quiet option A”, every one of the 1 assessed phase and receiver pairs is predicted at or under its limit\./,
    );
  });

  it('a level over its limit says by how much, and the whole does not comply', () => {
    const p = oneDuty(70);
    const s = complianceStatement(p, evaluateProject(p));
    expect(s.complies).toBe(false);
    expect(s.lines[0]!.sentence).toBe(
      'Predicted LAeq,12h at Wren Cottage during Works is 72.0 dB against a limit of 70 dB: ▲ over by 2.0 dB.',
    );
    expect(s.summary).toMatch(/^With the baseline fleet, 1 of the 1 assessed/);
  });

  it('hours print without floating-point tails', () => {
    expect(hoursText(10.0000000000291)).toBe('10');
    expect(hoursText(7.5)).toBe('7.5');
  });
});
