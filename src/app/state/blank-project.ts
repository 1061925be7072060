/**
 * A new, empty project: one assessment period, one phase, one duty, no machines yet, so
 * the user can start typing or pasting candidates straight away.
 */
import { PROJECT_FORMAT, PROJECT_VERSION, type Project } from '../../ledger/model/model.ts';

export function blankProject(name = 'New project'): Project {
  return {
    format: PROJECT_FORMAT,
    version: PROJECT_VERSION,
    name,
    currency: 'GBP',
    propagation: { method: 'simple', q: 2 },
    settings: { referenceDistanceM: 50, characterPenaltyDb: 0, levelBasis: 'guaranteed', decimalSeparator: '.' },
    periods: [{ id: 't1', name: 'Weekday daytime', start: '07:00', end: '19:00' }],
    phases: [{ id: 'ph1', name: 'Phase 1', periodId: 't1', start: '08:00', end: '18:00' }],
    receivers: [],
    duties: [
      {
        id: 'd1',
        name: 'Duty 1',
        phaseId: 'ph1',
        count: 1,
        onTimePct: 100,
        durationDays: 10,
        location: { kind: 'distances', distancesM: {} },
        baselineCandidateId: '',
      },
    ],
    candidates: [],
  };
}
