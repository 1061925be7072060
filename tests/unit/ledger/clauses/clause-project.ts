/**
 * Test fixture: a small site worked by hand for the clause tests.
 *
 * Simple method, Q = 2 (Lp = LWA − 20·lg d − 7.98 dB: the point-source relation), one
 * receiver "Mill Cottage" at (0, 0), 1.5 m, no façade, day limit 70 dB. Period and phase
 * both 07:00–19:00 (no working-hours correction), on-time 100 %, one unit, 10 days, every
 * source and receiver at 1.5 m (horizontal distances). Character penalty 3 dB.
 *   Breaking at (50, 0):  br1 LWA 110 impulsive diesel £100/day; br2 LWA 104 impulsive diesel £140/day;
 *                         br3 LWA 101 electric, no character, £200/day.
 *   Pumping at (0, 40):   pu1 LWA 98 tonal diesel £30/day; pu2 LWA 92 electric £45/day.
 * Levels at the cottage (worked by hand from the point-source relation):
 *   br1 68.04, br2 62.04, br3 59.04, pu1 57.98, pu2 51.98 dB LAeq,T.
 */
import type { Candidate, Clause, Project } from '../../../../src/ledger/model/model.ts';
import { projectShell } from '../fixtures.ts';

function machine(
  id: string,
  dutyId: string,
  label: string,
  lwaDb: number,
  character: Candidate['character'],
  energy: Candidate['energy'],
  dayRate: number,
): Candidate {
  return {
    id,
    dutyId,
    label,
    category: 'test',
    lwaDb,
    declaration: 'guaranteed',
    lwaOrigin: 'declared',
    character,
    energy,
    source: 'test',
    cost: { kind: 'hire', dayRate },
    runningPerDay: 0,
    fixedCharges: 0,
  };
}

export function clauseProject(clauses: Clause[] = []): Project {
  return projectShell({
    name: 'Clause test site',
    settings: { referenceDistanceM: 10, characterPenaltyDb: 3, levelBasis: 'guaranteed', decimalSeparator: '.' },
    phases: [{ id: 'ph1', name: 'Works', periodId: 'day', start: '07:00', end: '19:00' }],
    receivers: [
      {
        id: 'r1',
        name: 'Mill Cottage',
        kind: 'home',
        x: 0,
        y: 0,
        heightM: 1.5,
        facade: false,
        limitsDb: { day: 70 },
        screening: {},
      },
    ],
    duties: [
      {
        id: 'brk',
        name: 'Breaking',
        phaseId: 'ph1',
        count: 1,
        onTimePct: 100,
        durationDays: 10,
        location: { kind: 'point', x: 50, y: 0 },
        sourceHeightM: 1.5,
        baselineCandidateId: 'br1',
      },
      {
        id: 'pmp',
        name: 'Pumping',
        phaseId: 'ph1',
        count: 1,
        onTimePct: 100,
        durationDays: 10,
        location: { kind: 'point', x: 0, y: 40 },
        sourceHeightM: 1.5,
        baselineCandidateId: 'pu1',
      },
    ],
    candidates: [
      machine('br1', 'brk', 'Breaker loud', 110, 'impulsive', 'diesel', 100),
      machine('br2', 'brk', 'Breaker quiet', 104, 'impulsive', 'diesel', 140),
      machine('br3', 'brk', 'Electric breaker', 101, 'none', 'electric', 200),
      machine('pu1', 'pmp', 'Diesel pump', 98, 'tonal', 'diesel', 30),
      machine('pu2', 'pmp', 'Electric pump', 92, 'none', 'electric', 45),
    ],
    clauses,
  });
}

/** A clause with the given kind and parameters. */
export function clause(
  id: string,
  ref: string,
  over: Omit<Partial<Clause>, 'id' | 'ref'> & Pick<Clause, 'kind'>,
): Clause {
  return { id, ref, text: `Tender clause ${ref}`, ...over };
}
