/**
 * Cost against the probability that every limit is met at once: the points of the
 * trade-off chart's probability view. One point per confidence asked (the cheapest fleet
 * found and verified at it, by ./confidence-fleet.ts), plus two marked fleets with their
 * simulated probability: the deterministic optimum (the cheapest fleet meeting every limit
 * as the ledger rates it) and the assessed fleet. Every probability is the ledger's
 * simulation with its sampling error; the chart only draws them.
 *
 * Cost: O(levels) confidence searches and one simulation of the assessed fleet.
 */
import type { Fleet, Project } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import type { LpSolver } from './solver.ts';
import { confidenceFleet, type ConfidenceCost, type ConfidenceFleetOptions } from './confidence-fleet.ts';
import { evaluateProject } from '../prediction/evaluate.ts';
import { buildSpreadModel } from '../uncertainty/spread-model.ts';
import { simulateCompliance } from '../uncertainty/monte-carlo.ts';
import { uncertaintySettingsOf } from '../uncertainty/settings.ts';

/** A marked fleet: its cost and simulated probability of full compliance. */
export interface ConfidenceCurveMark {
  cost: number;
  probability: number;
  standardError: number;
  draws: number;
}

export interface ConfidenceCurve {
  /** One per confidence asked, in the order asked. */
  points: ConfidenceCost[];
  /** Draws of each point's simulation. */
  draws: number;
  /** The cheapest fleet meeting every limit as rated; absent when none does. */
  deterministic?: ConfidenceCurveMark;
  /** The assessed fleet. */
  assessed: ConfidenceCurveMark & { name: string };
}

/**
 * Points of cost against the probability of full compliance, with the deterministic
 * optimum and the assessed fleet.
 * @example confidenceCurve(project, evaluateProject(project), [0.5, 0.9], solver, { name: 'baseline', fleet: {} }).points[1].cost
 */
export function confidenceCurve(
  project: Project,
  evaluation: Evaluation,
  levels: readonly number[],
  solver: LpSolver,
  assessed: { name: string; fleet: Fleet },
  options: Omit<ConfidenceFleetOptions, 'confidence'> = {},
): ConfidenceCurve {
  const settings = uncertaintySettingsOf(project);
  const draws = options.draws ?? settings.draws;
  const seed = options.seed ?? settings.seed;
  let deterministic: ConfidenceCurveMark | undefined;
  const points = levels.map((confidence): ConfidenceCost => {
    const r = confidenceFleet(project, evaluation, { ...options, confidence }, solver);
    if (r.deterministic && !deterministic) {
      const d = r.deterministic;
      deterministic = { cost: d.cost, probability: d.probability, standardError: d.standardError, draws: d.draws };
    }
    return r.found && r.verified
      ? {
          confidence,
          found: true,
          cost: r.cost as number,
          probability: r.verified.probability,
          standardError: r.verified.standardError,
        }
      : { confidence, found: false };
  });
  const assessedEvaluation = evaluateProject(project, assessed.fleet);
  const sim = simulateCompliance(buildSpreadModel(project, assessedEvaluation, assessed.fleet), {
    draws,
    seed,
    probabilitiesOnly: true,
  });
  return {
    points,
    draws,
    ...(deterministic ? { deterministic } : {}),
    assessed: {
      name: assessed.name,
      cost: assessedEvaluation.fleetCost,
      probability: sim.joint.probability,
      standardError: sim.joint.standardError,
      draws: sim.draws,
    },
  };
}
