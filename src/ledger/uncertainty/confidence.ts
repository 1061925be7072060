/**
 * How sure compliance is, for one fleet: per assessed cell the probability that the level
 * stays at or under the limit and the level it stays under with 90 % probability (by
 * simulation, cross-checked by the moments of ./analytic.ts), and the probability that
 * every limit of the project is met at once (simulation; the analytic figures bound it).
 * The model and its assumptions are returned in words, to be shown beside every figure.
 */
import type { Fleet, Project } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import { buildSpreadModel, type SpreadModel } from './spread-model.ts';
import { analyticCell, jointBounds, type AnalyticCell } from './analytic.ts';
import { simulateCompliance, type SimulatedCell, type Simulation } from './monte-carlo.ts';
import { assumptionWords } from './assumptions.ts';

/** The probability the bound level is given for: "the level the fleet stays under with 90 % probability". */
export const BOUND_PROBABILITY = 0.9;

export interface ConfidenceCell {
  phaseId: string;
  periodId: string;
  receiverId: string;
  ownPeriod: boolean;
  limitDb: number;
  /** The ledger's level (rated levels), dB. */
  levelDb: number;
  /** limit − level, dB. */
  marginDb: number;
  simulated: SimulatedCell;
  analytic: AnalyticCell;
}

export interface ComplianceConfidence {
  fleet: Fleet;
  model: SpreadModel;
  cells: ConfidenceCell[];
  /** Every limit met at once: simulated, with its sampling error, and the analytic bounds. */
  joint: { probability: number; standardError: number; lowerBound: number; upperBound: number };
  draws: number;
  seed: number;
  boundProbability: number;
  /** The model in words, one line per assumption. */
  assumptions: string[];
}

export interface ConfidenceOptions {
  fleet?: Fleet;
  /** Draws (default: the project's setting). */
  draws?: number;
  /** Seed (default: the project's setting). */
  seed?: number;
  /** Skip the simulation (analytic figures only; simulated fields NaN). */
  analyticOnly?: boolean;
}

/**
 * The probability of compliance of a fleet (the evaluation's by default).
 * Cost: O(draws × terms) for the simulation, O(cells × terms²) for the analytic figures.
 * @example complianceConfidence(project, evaluateProject(project)).joint.probability // e.g. 0.62
 */
export function complianceConfidence(
  project: Project,
  evaluation: Evaluation,
  options: ConfidenceOptions = {},
): ComplianceConfidence {
  const model = buildSpreadModel(project, evaluation, options.fleet ?? evaluation.fleet);
  const draws = options.draws ?? model.settings.draws;
  const seed = options.seed ?? model.settings.seed;
  const q = BOUND_PROBABILITY;
  const sim: Simulation | undefined = options.analyticOnly
    ? undefined
    : simulateCompliance(model, { draws, seed, boundProbability: q });
  const cells: ConfidenceCell[] = model.cells.map((cell, i) => ({
    phaseId: cell.phaseId,
    periodId: cell.periodId,
    receiverId: cell.receiverId,
    ownPeriod: cell.ownPeriod,
    limitDb: cell.limitDb,
    levelDb: cell.levelDb,
    marginDb: cell.limitDb - cell.levelDb,
    simulated: sim?.cells[i] ?? { probability: NaN, standardError: NaN, boundDb: NaN, boundRangeDb: [NaN, NaN] },
    analytic: analyticCell(model, cell, q),
  }));
  const bounds = jointBounds(cells.map((c) => c.analytic.probability));
  return {
    fleet: Object.fromEntries(model.duties.map((d) => [d.dutyId, d.candidateId])),
    model,
    cells,
    joint: {
      probability: sim?.joint.probability ?? NaN,
      standardError: sim?.joint.standardError ?? NaN,
      lowerBound: bounds.lower,
      upperBound: bounds.upper,
    },
    draws: sim ? draws : 0,
    seed,
    boundProbability: q,
    assumptions: assumptionWords(project, model),
  };
}
