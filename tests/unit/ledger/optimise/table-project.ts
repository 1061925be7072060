/**
 * Test fixture: a project whose evaluation is a table of levels and costs given directly,
 * so optimiser tests control every number without going through the propagation code.
 * The evaluation's phase totals are energetic sums of the table's contributions.
 */
import type { Candidate, Fleet, Project } from '../../../../src/ledger/model/model.ts';
import { PROJECT_FORMAT, PROJECT_VERSION } from '../../../../src/ledger/model/model.ts';
import type { Evaluation, MatrixCell } from '../../../../src/ledger/model/results.ts';
import { dbSum } from '../../../../src/core/decibel.ts';

export interface TableCandidate {
  id: string;
  cost: number;
  /** Contribution at each receiver id, dB LAeq,T over the phase's period. */
  levels: Record<string, number>;
  pinned?: boolean;
  excluded?: boolean;
}

export interface TableDuty {
  id: string;
  phaseId: string;
  baseline: string;
  candidates: TableCandidate[];
}

export interface TableSpec {
  /** Phase id → period id. */
  phases: Record<string, string>;
  /** Receiver id → limit per period id. */
  receivers: Record<string, Record<string, number>>;
  duties: TableDuty[];
}

function candidate(dutyId: string, c: TableCandidate): Candidate {
  const out: Candidate = {
    id: c.id,
    dutyId,
    label: `Machine ${c.id}`,
    category: 'test',
    declaration: 'guaranteed',
    lwaOrigin: 'declared',
    character: 'none',
    energy: 'diesel',
    source: 'test table',
    cost: { kind: 'hire', dayRate: c.cost },
    runningPerDay: 0,
    fixedCharges: 0,
  };
  if (c.pinned) out.pinned = true;
  if (c.excluded) out.excluded = true;
  return out;
}

/** Builds the project and its table-driven evaluation. */
export function tableProject(spec: TableSpec): { project: Project; evaluation: Evaluation } {
  const periods = [...new Set(Object.values(spec.phases))];
  const project: Project = {
    format: PROJECT_FORMAT,
    version: PROJECT_VERSION,
    name: 'Table test',
    currency: 'GBP',
    propagation: { method: 'simple', q: 2 },
    settings: { referenceDistanceM: 10, characterPenaltyDb: 0, levelBasis: 'guaranteed', decimalSeparator: '.' },
    periods: periods.map((id) => ({ id, name: `Period ${id}`, start: '07:00', end: '19:00' })),
    phases: Object.entries(spec.phases).map(([id, periodId]) => ({
      id,
      name: `Phase ${id}`,
      periodId,
      start: '08:00',
      end: '18:00',
    })),
    receivers: Object.entries(spec.receivers).map(([id, limitsDb]) => ({
      id,
      name: `Receiver ${id}`,
      kind: 'home',
      x: 0,
      y: 0,
      heightM: 1.5,
      facade: false,
      limitsDb,
      screening: {},
    })),
    duties: spec.duties.map((d) => ({
      id: d.id,
      name: `Duty ${d.id}`,
      phaseId: d.phaseId,
      count: 1,
      onTimePct: 100,
      durationDays: 1,
      location: { kind: 'point', x: 10, y: 10 },
      baselineCandidateId: d.baseline,
    })),
    candidates: spec.duties.flatMap((d) => d.candidates.map((c) => candidate(d.id, c))),
  };
  const byId = new Map(spec.duties.flatMap((d) => d.candidates.map((c) => [c.id, c] as const)));
  const contributionDb = (candidateId: string, receiverId: string) => byId.get(candidateId)?.levels[receiverId] ?? NaN;
  const costs: Evaluation['costs'] = {};
  for (const c of byId.values()) costs[c.id] = { candidateId: c.id, total: c.cost, explanation: `table ${c.cost}` };
  const fleet: Fleet = {};
  for (const d of spec.duties) fleet[d.id] = d.baseline;
  const matrix: MatrixCell[] = [];
  for (const phase of project.phases) {
    for (const r of project.receivers) {
      const levelDb = dbSum(
        project.duties.filter((d) => d.phaseId === phase.id).map((d) => contributionDb(d.baselineCandidateId, r.id)),
      );
      const limitDb = r.limitsDb[phase.periodId];
      const cell: MatrixCell = {
        phaseId: phase.id,
        receiverId: r.id,
        periodId: phase.periodId,
        ownPeriod: true,
        hoursWorked: 10,
        periodHours: 12,
        levelDb,
        over: limitDb !== undefined && levelDb > limitDb,
      };
      if (limitDb !== undefined) {
        cell.limitDb = limitDb;
        cell.marginDb = limitDb - levelDb;
      }
      matrix.push(cell);
    }
  }
  const evaluation: Evaluation = {
    fleet,
    costs,
    contributionDb,
    contribution: (candidateId, receiverId) => ({
      candidateId,
      receiverId,
      levelDb: contributionDb(candidateId, receiverId),
      terms: [],
    }),
    matrix,
    worstReceiverByPhase: {},
    notes: [],
    fleetCost: spec.duties.reduce((s, d) => s + (byId.get(d.baseline)?.cost ?? NaN), 0),
    problems: [],
  };
  return { project, evaluation };
}

/**
 * Independent re-evaluation of a fleet from the table: each phase total as the energetic
 * sum of its duties' contributions, and its margin to the limit.
 */
export function cellsOf(
  project: Project,
  evaluation: Evaluation,
  fleet: Fleet,
): { phaseId: string; receiverId: string; levelDb: number; limitDb: number }[] {
  const out: { phaseId: string; receiverId: string; levelDb: number; limitDb: number }[] = [];
  for (const phase of project.phases) {
    const duties = project.duties.filter((d) => d.phaseId === phase.id);
    if (duties.length === 0) continue;
    for (const r of project.receivers) {
      const limitDb = r.limitsDb[phase.periodId];
      if (limitDb === undefined) continue;
      out.push({
        phaseId: phase.id,
        receiverId: r.id,
        limitDb,
        levelDb: dbSum(duties.map((d) => evaluation.contributionDb(fleet[d.id] as string, r.id))),
      });
    }
  }
  return out;
}

/** Small deterministic generator (mulberry32), so a failing case names its seed. */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A random small table project: 2–4 duties × 2–4 candidates × 1–3 receivers × 1–2 phases. */
export function randomTableSpec(seed: number): { spec: TableSpec; budget?: number } {
  const r = rng(seed);
  const int = (lo: number, hi: number) => lo + Math.floor(r() * (hi - lo + 1));
  const phaseCount = int(1, 2);
  const phases: Record<string, string> = {};
  for (let p = 0; p < phaseCount; p++) phases[`p${p}`] = r() < 0.5 ? 'day' : 'evening';
  const receiverIds = Array.from({ length: int(1, 3) }, (_, i) => `r${i}`);
  const receivers: Record<string, Record<string, number>> = {};
  for (const id of receiverIds) {
    const limits: Record<string, number> = {};
    if (r() < 0.9) limits.day = 60 + r() * 15;
    if (r() < 0.7) limits.evening = 55 + r() * 15;
    receivers[id] = limits;
  }
  const duties: TableDuty[] = Array.from({ length: int(2, 4) }, (_, d) => {
    const base: Record<string, number> = {};
    for (const id of receiverIds) base[id] = 50 + r() * 22;
    const baseCost = 100 + r() * 4900;
    const candidates: TableCandidate[] = Array.from({ length: int(2, 4) }, (_, k) => {
      const quieter = r() * 15;
      const levels: Record<string, number> = {};
      for (const id of receiverIds) levels[id] = (base[id] as number) - quieter + (r() - 0.5) * 4;
      const c: TableCandidate = {
        id: `d${d}c${k}`,
        cost: Math.round(baseCost * (1 + quieter * (0.05 + r() * 0.3)) * 100) / 100,
        levels,
      };
      const u = r();
      if (u < 0.06) c.pinned = true;
      else if (u < 0.14) c.excluded = true;
      return c;
    });
    // At most one pin per duty.
    let pinSeen = false;
    for (const c of candidates) {
      if (c.pinned && pinSeen) delete c.pinned;
      if (c.pinned) pinSeen = true;
    }
    return { id: `d${d}`, phaseId: `p${int(0, phaseCount - 1)}`, baseline: candidates[0]?.id as string, candidates };
  });
  // Keep at least one candidate per duty available.
  for (const d of duties)
    if (d.candidates.every((c) => c.excluded)) delete (d.candidates[0] as TableCandidate).excluded;
  const spec: TableSpec = { phases, receivers, duties };
  if (r() < 0.3) {
    const cheapest = duties.reduce((s, d) => s + Math.min(...d.candidates.map((c) => c.cost)), 0);
    return { spec, budget: Math.round(cheapest * (0.95 + r() * 0.8)) };
  }
  return { spec };
}
