/**
 * The shapes of the ledger's computed results: what `evaluateProject`, `rankDuty` and the
 * optimiser return, and what the app, the command line and the workbook read.
 * Types only; the computations live in their own files.
 *
 * Sign convention: margin = limit − level. A positive margin is headroom, a negative one
 * an exceedance.
 */
import type { Fleet } from './model.ts';
import type { Term } from '../core/term.ts';

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

/** One cell of the phase × receiver matrix. */
export interface MatrixCell {
  phaseId: string;
  receiverId: string;
  periodId: string;
  /** Phase total LAeq,T for the fleet, dB; NaN when not computable, −Infinity when no duty runs. */
  levelDb: number;
  /** Limit for the phase's period, dB; undefined when the receiver has none for that period. */
  limitDb?: number;
  /** limit − level, dB; undefined without a limit; NaN when the level is not computable. */
  marginDb?: number;
  /** True when the level is strictly above the limit. */
  over: boolean;
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
  /** Every phase × receiver cell, phases in project order, receivers in project order within each. */
  matrix: MatrixCell[];
  /** The receiver with the least margin (or highest level without limits) per phase id. */
  worstReceiverByPhase: Record<string, string>;
  /** Total cost of the fleet. */
  fleetCost: number;
  problems: DataProblem[];
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
  /** The phase total with this candidate exceeds the receiver's limit. */
  overLimit: boolean;
  isBaseline: boolean;
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
  /** Cells still over their limit (empty when compliant). */
  over: { phaseId: string; receiverId: string; levelDb: number; limitDb: number }[];
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
  /** Least cost for each achievable worst-case margin, from the baseline to the quietest fleet. */
  tradeOff: { worstMarginDb: number; worstLevelDb: number; cost: number; fleet: Fleet }[];
  /** Human-readable message when infeasible, naming receivers and phases still over. */
  message: string;
  /** Candidates the optimiser could not choose (cost or a needed level not computable), with the reason. */
  notConsidered?: { candidateId: string; dutyId: string; reason: string }[];
}
