/**
 * The shapes of the ledger's computed results: what `evaluateProject`, `rankDuty` and the
 * optimiser return, and what the app, the command line and the workbook read.
 * Types only; the computations live in their own files.
 *
 * Sign convention: margin = limit − level. A positive margin is headroom, a negative one
 * an exceedance.
 */
import type { Fleet } from './model.ts';
import type { Term } from '../../core/term.ts';

export type { Term };

/** The cost of one candidate for its duty, all units, with a line that explains it. */
export interface DutyCost {
  candidateId: string;
  /** Total for the duty, project currency. NaN when an input is missing or invalid. */
  total: number;
  /** e.g. "2 units × (1 week £420 + 2 days £75 each + running 9 d × £38 + delivery £90) = £1,866" */
  explanation: string;
}

/** One candidate's contribution at one receiver, over its phase's assessment period. */
export interface Contribution {
  candidateId: string;
  receiverId: string;
  /** Rating level contribution, dB LAeq,T; NaN when an input it needs is invalid or missing. */
  levelDb: number;
  terms: Term[];
}

/**
 * One cell of the matrix: a phase at a receiver in one assessment period. A phase has a
 * cell in every period its working hours overlap (./phase-periods.ts), its own period first.
 *
 * The level is L_Aeq,T, or — when a machine of the phase draws the character penalty — the
 * rating level L_Ar,T of ISO 1996-1 (L_Aeq,T plus the penalty); then `levelAeqDb` holds
 * L_Aeq,T and `penaltyDb` the difference. The limit is compared with `levelDb`.
 */
export interface MatrixCell {
  phaseId: string;
  receiverId: string;
  periodId: string;
  /** The phase's own period (`phase.periodId`), in which its contributions and rankings are given. */
  ownPeriod: boolean;
  /** Working hours of the phase inside this period, h. */
  hoursWorked: number;
  /** Length of the period T, h. */
  periodHours: number;
  /** Phase total for the fleet, dB: L_Aeq,T, or L_Ar,T when `levelAeqDb` is given; NaN when not computable, −Infinity when no duty runs. */
  levelDb: number;
  /** L_Aeq,T without the character penalty, dB; present only when a penalty applies (then `levelDb` is L_Ar,T). */
  levelAeqDb?: number;
  /** L_Ar,T − L_Aeq,T, dB: what the character penalty adds to the phase total; present with `levelAeqDb`. */
  penaltyDb?: number;
  /** Limit for this period, dB; undefined when the receiver has none for that period. */
  limitDb?: number;
  /** limit − level, dB; undefined without a limit; NaN when the level is not computable. */
  marginDb?: number;
  /** True when the level is strictly above the limit. */
  over: boolean;
}

/** The name of the quantity a matrix cell holds: "L_Ar,T" with a character penalty, else "L_Aeq,T". */
export function cellQuantity(cell: Pick<MatrixCell, 'levelAeqDb'>): 'L_Ar,T' | 'L_Aeq,T' {
  return cell.levelAeqDb === undefined ? 'L_Aeq,T' : 'L_Ar,T';
}

/** A problem found in the project's data, pointing at where it is. */
export interface DataProblem {
  /** JSON path in the project file, e.g. "$.candidates[3].lwaDb". */
  path: string;
  /** The message in the core's pattern: what is wrong, the value, what is accepted. */
  message: string;
}

export interface Evaluation {
  fleet: Fleet;
  /** Cost for every candidate, by candidate id. */
  costs: Record<string, DutyCost>;
  /** Contribution of a candidate at a receiver (dB LAeq,T, NaN when not computable). Receiver id may be the reference receiver id. */
  contributionDb(candidateId: string, receiverId: string): number;
  /** Contribution with every term, for display and audit. */
  contribution(candidateId: string, receiverId: string): Contribution;
  /** Every phase × receiver × period cell: phases in project order, receivers in project order within each, the phase's periods (own first) within each receiver. */
  matrix: MatrixCell[];
  /** The receiver with the least margin (or highest level without limits) per phase id. */
  worstReceiverByPhase: Record<string, string>;
  /** Total cost of the fleet. */
  fleetCost: number;
  problems: DataProblem[];
  /** Findings that do not stop the computation but must be seen, e.g. working hours that fall in no period. */
  notes: DataProblem[];
}

/** One row of the ranking of a duty's candidates at a receiver. */
export interface RankingRow {
  candidateId: string;
  rank: number;
  /** The candidate's own contribution at the receiver, dB. */
  contributionDb: number;
  /** Phase total at the receiver with this candidate in place of the baseline, dB. */
  phaseTotalDb: number;
  /** Baseline phase total − this phase total, dB (energetic; positive = quieter). */
  reductionDb: number;
  /** This cost − baseline cost. */
  extraCost: number;
  /** reduction / (extra cost / 1000); undefined when extra cost ≤ 0. */
  dbPer1000?: number;
  /** extra cost / reduction; undefined when reduction ≤ 0. */
  costPerDb?: number;
  /** Louder (or as loud) and dearer (or as dear) than another candidate, strictly worse in one. */
  dominated: boolean;
  /** Quieter than the baseline and no dearer. */
  freeWin: boolean;
  /** The phase total with this candidate exceeds the receiver's limit in one of the periods the phase is assessed in. */
  overLimit: boolean;
  isBaseline: boolean;
  /**
   * Set when the candidate cannot be put on the project's level basis (ISO 4871:1996: no K
   * given) and is ranked on its declared value: what it is compared on, in words.
   */
  offBasis?: string;
}

export interface OptimiseOptions {
  /** Upper bound on the fleet's total cost. */
  budget?: number;
}

export interface FleetOutcome {
  fleet: Fleet;
  cost: number;
  /** Least margin over every phase and receiver with a limit, dB. */
  worstMarginDb: number;
  /** Cells still over their limit (empty when compliant); `clause` names a tender clause's limit (its receiver id may be a boundary point's). */
  over: { phaseId: string; periodId: string; receiverId: string; levelDb: number; limitDb: number; clause?: string }[];
}

export interface OptimiseResult {
  /** True when a fleet meets every limit (within the budget, when given). */
  feasible: boolean;
  /** The cheapest compliant fleet, or when none exists the fleet with the smallest largest exceedance, then the least cost. */
  best: FleetOutcome;
  /** Proven optimal by the solver. */
  proven: boolean;
  baseline: FleetOutcome;
  /** The greedy hand method: best dB per cost first until compliant. */
  hand: FleetOutcome & { compliant: boolean; steps: { dutyId: string; candidateId: string; dbPer1000: number }[] };
  /** hand.cost − best.cost when both comply. */
  savingOverHand?: number;
  /**
   * Least cost for each achievable worst-case margin: in 0.5 dB steps from the baseline to the quietest fleet, or
   * (with `frontier`) every fleet no other beats on both cost and worst margin, cheapest first.
   */
  tradeOff: { worstMarginDb: number; worstLevelDb: number; cost: number; fleet: Fleet }[];
  /** Present when `tradeOff` is the exact frontier: complete, or stopped before the quietest fleet. */
  frontier?: { complete: boolean };
  /** Human-readable message when infeasible, naming receivers and phases still over. */
  message: string;
  /** Candidates the optimiser could not choose (cost or a needed level not computable), with the reason. */
  notConsidered?: { candidateId: string; dutyId: string; reason: string }[];
  /** The tender clauses: those honoured as constraints, and those that cannot be met (left out, with the reason). */
  clauses?: { honoured: string[]; unmet: { clauseId: string; name: string; reason: string }[] };
}
