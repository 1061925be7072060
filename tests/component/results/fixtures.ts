/**
 * Small hand-made projects and results for the results components' tests.
 * Places, machines and figures are invented; the components only format them.
 */
import type { Candidate, Project } from '../../../src/ledger/model/model.ts';
import { PROJECT_FORMAT, PROJECT_VERSION } from '../../../src/ledger/model/model.ts';
import type { FleetOutcome, MatrixCell, OptimiseResult, RankingRow } from '../../../src/ledger/model/results.ts';

function machine(id: string, dutyId: string, label: string, lwaDb: number, extra: Partial<Candidate> = {}): Candidate {
  return {
    id,
    dutyId,
    label,
    category: 'invented',
    lwaDb,
    declaration: 'guaranteed',
    lwaOrigin: 'declared',
    character: 'none',
    energy: 'diesel',
    source: 'invented data sheet',
    cost: { kind: 'hire', dayRate: 100 },
    runningPerDay: 0,
    fixedCharges: 0,
    ...extra,
  };
}

export function smallProject(): Project {
  return {
    format: PROJECT_FORMAT,
    version: PROJECT_VERSION,
    name: 'Millbrook Lane depot',
    currency: 'GBP',
    propagation: { method: 'simple', q: 2 },
    settings: { referenceDistanceM: 10, characterPenaltyDb: 0, levelBasis: 'guaranteed', decimalSeparator: '.' },
    periods: [{ id: 'day', name: 'Weekday daytime', start: '07:00', end: '19:00' }],
    phases: [
      { id: 'demo', name: 'Demolition', periodId: 'day', start: '08:00', end: '18:00' },
      { id: 'ground', name: 'Groundworks', periodId: 'day', start: '08:00', end: '18:00' },
    ],
    receivers: [
      {
        id: 'terrace',
        name: 'Orchard Terrace',
        kind: 'home',
        x: 0,
        y: 0,
        heightM: 4,
        facade: true,
        limitsDb: { day: 75 },
        screening: {},
      },
      {
        id: 'school',
        name: 'Hazel Primary',
        kind: 'school',
        x: 0,
        y: 0,
        heightM: 4,
        facade: true,
        limitsDb: { day: 65 },
        screening: {},
      },
      {
        id: 'shed',
        name: 'Allotment shed',
        kind: 'other',
        x: 0,
        y: 0,
        heightM: 1.5,
        facade: false,
        limitsDb: {},
        screening: {},
      },
    ],
    duties: [
      {
        id: 'break',
        name: 'Breaking',
        phaseId: 'demo',
        count: 1,
        onTimePct: 60,
        durationDays: 10,
        location: { kind: 'point', x: 10, y: 10 },
        baselineCandidateId: 'b1',
      },
      {
        id: 'dig',
        name: 'Digging',
        phaseId: 'ground',
        count: 1,
        onTimePct: 80,
        durationDays: 20,
        location: { kind: 'point', x: 20, y: 20 },
        baselineCandidateId: 'd1',
      },
    ],
    candidates: [
      machine('b1', 'break', 'Breaker on 20 t carrier', 112),
      machine('b2', 'break', 'Hushed breaker', 106, { pinned: true }),
      machine('d1', 'dig', 'Excavator 14 t', 103),
      machine('d2', 'dig', 'Electric excavator 14 t', 97, { energy: 'electric' }),
      machine('d3', 'dig', 'Old excavator 14 t', 108, { excluded: true }),
    ],
  };
}

/** Matrix: Demolition over at the terrace, NaN at the school, no limit at the shed; Groundworks all under. */
export function smallMatrix(): { matrix: MatrixCell[]; worstReceiverByPhase: Record<string, string> } {
  return {
    matrix: [
      {
        phaseId: 'demo',
        receiverId: 'terrace',
        periodId: 'day',
        ownPeriod: true,
        hoursWorked: 10,
        periodHours: 12,
        levelDb: 78.44,
        limitDb: 75,
        marginDb: -3.44,
        over: true,
      },
      {
        phaseId: 'demo',
        receiverId: 'school',
        periodId: 'day',
        ownPeriod: true,
        hoursWorked: 10,
        periodHours: 12,
        levelDb: NaN,
        limitDb: 65,
        marginDb: NaN,
        over: false,
      },
      {
        phaseId: 'demo',
        receiverId: 'shed',
        periodId: 'day',
        ownPeriod: true,
        hoursWorked: 10,
        periodHours: 12,
        levelDb: 70.2,
        over: false,
      },
      {
        phaseId: 'ground',
        receiverId: 'terrace',
        periodId: 'day',
        ownPeriod: true,
        hoursWorked: 10,
        periodHours: 12,
        levelDb: 68.04,
        limitDb: 75,
        marginDb: 6.96,
        over: false,
      },
      {
        phaseId: 'ground',
        receiverId: 'school',
        periodId: 'day',
        ownPeriod: true,
        hoursWorked: 10,
        periodHours: 12,
        levelDb: 61.5,
        limitDb: 65,
        marginDb: 3.5,
        over: false,
      },
      {
        phaseId: 'ground',
        receiverId: 'shed',
        periodId: 'day',
        ownPeriod: true,
        hoursWorked: 10,
        periodHours: 12,
        levelDb: 66.1,
        over: false,
      },
    ],
    worstReceiverByPhase: { demo: 'terrace', ground: 'school' },
  };
}

export function digRanking(): RankingRow[] {
  return [
    {
      candidateId: 'd2',
      rank: 1,
      contributionDb: 55.2,
      phaseTotalDb: 56.1,
      reductionDb: 5.4,
      extraCost: 0,
      costPerDb: 0,
      dominated: false,
      freeWin: true,
      overLimit: false,
      isBaseline: false,
    },
    {
      candidateId: 'd1',
      rank: 2,
      contributionDb: 61.1,
      phaseTotalDb: 61.5,
      reductionDb: 0,
      extraCost: 0,
      dominated: false,
      freeWin: false,
      overLimit: false,
      isBaseline: true,
    },
    {
      candidateId: 'd3',
      rank: 3,
      contributionDb: 66.0,
      phaseTotalDb: 66.3,
      reductionDb: -4.8,
      extraCost: 1250,
      dbPer1000: -3.84,
      dominated: true,
      freeWin: false,
      overLimit: true,
      isBaseline: false,
    },
  ];
}

function outcome(
  fleet: Record<string, string>,
  cost: number,
  worstMarginDb: number,
  worstLevelDb: number,
  over: FleetOutcome['over'] = [],
) {
  return { fleet, cost, worstMarginDb, over, worstLevelDb };
}

export function optimiseResult(): OptimiseResult {
  const baseline = outcome({ break: 'b1', dig: 'd1' }, 9000, -3.44, 78.44, [
    { phaseId: 'demo', periodId: 'day', receiverId: 'terrace', levelDb: 78.44, limitDb: 75 },
  ]);
  const best = outcome({ break: 'b2', dig: 'd1' }, 10500, 1.2, 73.8);
  const hand = {
    ...outcome({ break: 'b2', dig: 'd2' }, 12500, 2.4, 72.6),
    compliant: true,
    steps: [
      { dutyId: 'break', candidateId: 'b2', dbPer1000: 3.1 },
      { dutyId: 'dig', candidateId: 'd2', dbPer1000: 0.6 },
    ],
  };
  return {
    feasible: true,
    best,
    proven: true,
    baseline,
    hand,
    savingOverHand: 2000,
    tradeOff: [
      { worstMarginDb: -3.44, worstLevelDb: 78.44, cost: 9000, fleet: baseline.fleet },
      { worstMarginDb: 1.2, worstLevelDb: 73.8, cost: 10500, fleet: best.fleet },
      { worstMarginDb: 2.4, worstLevelDb: 72.6, cost: 12500, fleet: hand.fleet },
      { worstMarginDb: 4.0, worstLevelDb: 71.0, cost: 16000, fleet: { break: 'b2', dig: 'd3' } },
    ],
    message: '',
  };
}

export function infeasibleResult(): OptimiseResult {
  const r = optimiseResult();
  const best = outcome({ break: 'b2', dig: 'd2' }, 12500, -0.8, 65.8, [
    { phaseId: 'ground', periodId: 'day', receiverId: 'school', levelDb: 65.8, limitDb: 65 },
  ]);
  return {
    ...r,
    feasible: false,
    best,
    savingOverHand: undefined,
    hand: { ...r.hand, compliant: false },
    message: 'No fleet keeps Hazel Primary under 65 dB in Groundworks.',
  };
}
