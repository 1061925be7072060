/**
 * missingForResults: what a new project still needs before results can be computed. The
 * expected lists are worked by hand from the project each test builds.
 */
import { describe, expect, it } from 'vitest';
import { missingForResults } from '../../../../src/ledger/validate/readiness.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import type { Project } from '../../../../src/ledger/model/model.ts';
import { projectShell } from '../fixtures.ts';

function empty(): Project {
  return projectShell({
    name: 'Empty',
    settings: { referenceDistanceM: 50, characterPenaltyDb: 0, levelBasis: 'guaranteed', decimalSeparator: '.' },
    periods: [],
  });
}

describe('missingForResults', () => {
  it('an empty project lists period, phase, receiver and duty, each with the place to fill it in', () => {
    expect(missingForResults(empty()).map((m) => m.place)).toEqual(['periods', 'phases', 'receivers', 'duties']);
  });

  it('names the receivers without a limit and the duties without a place, machine or baseline', () => {
    const p = empty();
    p.periods = [{ id: 't1', name: 'Day', start: '07:00', end: '19:00' }];
    p.phases = [{ id: 'ph1', name: 'Groundworks', periodId: 't1', start: '08:00', end: '18:00' }];
    p.receivers = [
      {
        id: 'r1',
        name: 'Wren Cottage',
        kind: 'home',
        x: 0,
        y: 0,
        heightM: 4,
        facade: true,
        limitsDb: {},
        screening: {},
      },
    ];
    p.duties = [
      {
        id: 'd1',
        name: 'Dig',
        phaseId: 'ph1',
        count: 1,
        onTimePct: 100,
        durationDays: 5,
        location: { kind: 'point', x: NaN, y: NaN },
        baselineCandidateId: '',
      },
    ];
    const messages = missingForResults(p).map((m) => m.message);
    expect(messages).toEqual([
      'No limit for a period a phase is assessed over at “Wren Cottage”: type a limit in dB.',
      'No place for “Dig”: give X and Y on the site grid, or a distance to each receiver.',
      'No machine offered for “Dig”: add the machines that could do it.',
    ]);
  });

  it('the demo project misses nothing', () => {
    expect(missingForResults(demoProject())).toEqual([]);
  });
});
