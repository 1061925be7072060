/** Small hand-checkable projects for the ledger's tests. */
import type { Candidate, Duty, Project, Receiver } from '../../../src/ledger/model/model.ts';
import { PROJECT_FORMAT, PROJECT_VERSION } from '../../../src/ledger/model/model.ts';

/**
 * The frame every test project shares: format and version, GBP, the simple method with Q = 2, a 10 m reference
 * receiver, no character penalty, guaranteed levels, one 07:00–19:00 day period, and no phases, receivers, duties
 * or candidates — each test adds its own through `over`.
 */
export function projectShell(over: Partial<Project> = {}): Project {
  return {
    format: PROJECT_FORMAT,
    version: PROJECT_VERSION,
    name: 'Test site',
    currency: 'GBP',
    propagation: { method: 'simple', q: 2 },
    settings: { referenceDistanceM: 10, characterPenaltyDb: 0, levelBasis: 'guaranteed', decimalSeparator: '.' },
    periods: [{ id: 'day', name: 'Day', start: '07:00', end: '19:00' }],
    phases: [],
    receivers: [],
    duties: [],
    candidates: [],
    ...over,
  };
}

export function receiver(over: Partial<Receiver> = {}): Receiver {
  return {
    id: 'r1',
    name: 'House',
    kind: 'home',
    x: 0,
    y: 0,
    heightM: 1.5,
    facade: true,
    limitsDb: { day: 70 },
    screening: {},
    ...over,
  };
}

export function duty(over: Partial<Duty> = {}): Duty {
  return {
    id: 'u1',
    name: 'Duty',
    phaseId: 'ph1',
    count: 1,
    onTimePct: 100,
    durationDays: 5,
    location: { kind: 'point', x: 20, y: 0 },
    sourceHeightM: 1.5,
    baselineCandidateId: 'c1',
    ...over,
  };
}

export function candidate(over: Partial<Candidate> = {}): Candidate {
  return {
    id: 'c1',
    dutyId: 'u1',
    label: 'Machine',
    category: 'excavator',
    lwaDb: 100,
    declaration: 'guaranteed',
    lwaOrigin: 'declared',
    character: 'none',
    energy: 'diesel',
    source: 'test',
    cost: { kind: 'hire', dayRate: 100 },
    runningPerDay: 0,
    fixedCharges: 0,
    ...over,
  };
}

/**
 * Two duties and one receiver, simple method with Q = 2, period 07:00–19:00 and working
 * hours 08:00–18:00. Duty A (u1): 20 m, 50 % on-time, LWA 105. Duty B (u2): 40 m, two units, LWA 100.
 */
export function twoDutyProject(): Project {
  return projectShell({
    name: 'Two duties',
    settings: { referenceDistanceM: 10, characterPenaltyDb: 3, levelBasis: 'guaranteed', decimalSeparator: '.' },
    phases: [{ id: 'ph1', name: 'Works', periodId: 'day', start: '08:00', end: '18:00' }],
    receivers: [receiver()],
    duties: [
      duty({ id: 'u1', name: 'A', onTimePct: 50, location: { kind: 'point', x: 20, y: 0 }, baselineCandidateId: 'a1' }),
      duty({ id: 'u2', name: 'B', count: 2, location: { kind: 'point', x: 0, y: 40 }, baselineCandidateId: 'b1' }),
    ],
    candidates: [
      candidate({ id: 'a1', dutyId: 'u1', label: 'A loud', lwaDb: 105, cost: { kind: 'hire', dayRate: 100 } }),
      candidate({ id: 'a2', dutyId: 'u1', label: 'A quiet', lwaDb: 95, cost: { kind: 'hire', dayRate: 150 } }),
      candidate({ id: 'a3', dutyId: 'u1', label: 'A quiet and dear', lwaDb: 95, cost: { kind: 'hire', dayRate: 300 } }),
      candidate({
        id: 'a4',
        dutyId: 'u1',
        label: 'A quieter, cheaper',
        lwaDb: 101,
        cost: { kind: 'hire', dayRate: 90 },
      }),
      candidate({ id: 'b1', dutyId: 'u2', label: 'B', lwaDb: 100, cost: { kind: 'hire', dayRate: 80 } }),
    ],
  });
}
