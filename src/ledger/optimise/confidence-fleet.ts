/**
 * The cheapest fleet that meets every limit with a chosen confidence (e.g. 90 % that every
 * limit is met at once), and what that confidence costs over the deterministic optimum.
 *
 * Method (margins required per cell, then verified by simulation):
 * 1. Each cell i is asked to meet its limit with probability p (first p = the confidence).
 *    For a fleet, the analytic model (../uncertainty/analytic.ts) gives the level L_i,p
 *    the cell stays under with probability p; the margin it requires is
 *    Δ_i = L_i,p − L_i (L_i the ledger's level; Δ may be negative, because the guaranteed
 *    levels already hold K). The exact solver (HiGHS) then finds the cheapest fleet with
 *    every cell at or under limit − Δ_i: Σ ρ·x ≤ 10^(−Δ_i/10) (./lp-format.ts, cellCaps).
 *    Δ_i depends on the fleet, so the step repeats with Δ_i raised to the largest value seen
 *    until the fleet found meets every cell's p by the analytic model (at most 8 solves).
 * 2. The fleet is simulated (the project's draws and seed). If every limit is met at once
 *    in at least the chosen share of draws, it is the answer; otherwise p is raised
 *    (p ← 1 − (1 − p)/1.5) and step 1 repeats. When p reaches 1 − (1 − confidence)/N for N
 *    cells, the union bound (common practice) guarantees the confidence as far as the
 *    analytic cell figures are right, so the search ends there or a few halvings later.
 * 3. The answer is checked by an independent simulation with four times the draws and
 *    another seed; both figures and their sampling errors are reported.
 * The method may be conservative (a cheaper fleet may reach the confidence): the tests
 * compare it with an exhaustive search on small projects.
 *
 * Cost: up to 8 exact solves and one simulation per round, at most 16 rounds.
 */
import type { Fleet, Project } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import { buildFleetProblem, fleetOfChoice, costOfChoice, type FleetProblem } from './problem.ts';
import { solveLp, type LpSolver, type SolveSettings } from './solver.ts';
import { lpText } from './lp-format.ts';
import { buildSpreadModel, type SpreadModel } from '../uncertainty/spread-model.ts';
import { analyticCell } from '../uncertainty/analytic.ts';
import { simulateCompliance } from '../uncertainty/monte-carlo.ts';
import { uncertaintySettingsOf } from '../uncertainty/settings.ts';
import { ratioFromDb } from '../../core/decibel.ts';
import { inRange, positive } from '../../core/check.ts';
import { formatMoney } from '../costs/money.ts';
import { simulatedWords } from '../uncertainty/words.ts';

export interface ConfidenceFleetOptions {
  /** Probability that every limit is met at once, e.g. 0.9. */
  confidence: number;
  budget?: number;
  /** Wall-clock limit of each solve, s (default 30). */
  timeLimitS?: number;
  /** Draws of the search's simulation (default: the project's). */
  draws?: number;
  /** Seed of the search's simulation (default: the project's); the check uses seed + 1. */
  seed?: number;
}

/** A simulated probability of full compliance, with its sampling error. */
export interface SimulatedProbability {
  probability: number;
  standardError: number;
  draws: number;
  seed: number;
}

export interface ConfidenceRound {
  /** Probability asked of each cell. */
  cellTarget: number;
  /** The fleet found, its cost and its simulated probability of full compliance; absent when no fleet meets the tightened limits. */
  cost?: number;
  probability?: number;
}

export interface ConfidenceFleetResult {
  confidence: number;
  /** A fleet reaching the confidence was found and verified. */
  found: boolean;
  fleet?: Fleet;
  cost?: number;
  /** The search's simulation of the answer. */
  verified?: SimulatedProbability;
  /** An independent simulation of the answer (4 × the draws, another seed). */
  check?: SimulatedProbability;
  /** The cheapest fleet meeting every limit as the ledger rates it, and its probability of full compliance. */
  deterministic?: { fleet: Fleet; cost: number } & SimulatedProbability;
  /** cost − the deterministic optimum's cost. */
  extraCost?: number;
  rounds: ConfidenceRound[];
  /** How the confidence was reached and verified, in words. */
  method: string;
  message: string;
}

const MAX_ROUNDS = 16;
const MAX_SOLVES_PER_ROUND = 8;

/** Index of each problem cell in a spread model's cells (−1: a clause's cell, kept at its limit). */
function cellMap(problem: FleetProblem, model: SpreadModel): Int32Array {
  const key = (c: { phaseId: string; periodId: string; receiverId: string }) =>
    `${c.phaseId}\u0000${c.periodId}\u0000${c.receiverId}`;
  const at = new Map(model.cells.map((c, i) => [key(c), i] as const));
  return Int32Array.from(problem.cells, (c) => (c.clause !== undefined ? -1 : (at.get(key(c)) ?? -1)));
}

/** Margin each model cell requires for probability p: L_p − L, dB (NaN when not computable). */
function requiredMargins(model: SpreadModel, p: number): number[] {
  return model.cells.map((cell) => analyticCell(model, cell, p).boundDb - cell.levelDb);
}

/**
 * The cheapest fleet at a confidence, verified by simulation.
 * @example confidenceFleet(project, evaluateProject(project), { confidence: 0.9 }, solver).cost
 */
export function confidenceFleet(
  project: Project,
  evaluation: Evaluation,
  options: ConfidenceFleetOptions,
  solver: LpSolver,
): ConfidenceFleetResult {
  const confidence = inRange(
    'confidence',
    options.confidence,
    0.01,
    0.9999,
    'a probability from 0.01 to 0.9999, e.g. 0.9',
  );
  const settings: SolveSettings = {
    timeLimitS: positive('time limit', options.timeLimitS ?? 30, 'a number of seconds greater than 0'),
  };
  const modelSettings = uncertaintySettingsOf(project);
  const draws = options.draws ?? modelSettings.draws;
  const seed = options.seed ?? modelSettings.seed;
  const problem = buildFleetProblem(project, evaluation, options.budget);
  const money = (x: number) => formatMoney(x, project.currency);
  const simulate = (fleet: Fleet, n = draws, s = seed): SimulatedProbability => {
    const r = simulateCompliance(buildSpreadModel(project, evaluation, fleet), {
      draws: n,
      seed: s,
      probabilitiesOnly: true,
    });
    return { probability: r.joint.probability, standardError: r.joint.standardError, draws: r.draws, seed: s };
  };
  const solve = (caps?: readonly number[]) =>
    solveLp(
      solver,
      problem,
      lpText(problem, { objective: 'cost', ...(caps ? { cellCaps: caps } : { ratioCap: 1 }) }),
      settings,
    );

  const rounds: ConfidenceRound[] = [];
  const det = solve();
  let deterministic: ConfidenceFleetResult['deterministic'];
  let startFleet: Fleet = evaluation.fleet;
  if (det.choice) {
    const fleet = fleetOfChoice(problem, det.choice);
    deterministic = { fleet, cost: costOfChoice(problem, det.choice), ...simulate(fleet) };
    startFleet = fleet;
  }
  const map = cellMap(problem, buildSpreadModel(project, evaluation, startFleet));
  const n = Math.max(1, map.filter((i) => i >= 0).length);
  const unionLevel = 1 - (1 - confidence) / n;
  const method =
    `Each limit was tightened by the margin the analytic model requires for the fleet to meet it with probability p, the exact solver found the cheapest fleet within the tightened limits, and a simulation of ${draws.toLocaleString('en-GB')} draws (seed ${seed}) verified that every limit is met at once with probability at least ${pct(confidence)}; p started at ${pct(confidence)} and was raised while the simulation fell short. ` +
    `An independent simulation of ${(4 * draws).toLocaleString('en-GB')} draws (seed ${seed + 1}) checks the answer. The method may be conservative: a cheaper fleet may also reach the confidence.`;

  let p = confidence;
  let answer: { fleet: Fleet; cost: number; verified: SimulatedProbability } | undefined;
  for (let round = 0; round < MAX_ROUNDS && !answer; round++) {
    let deltas = requiredMargins(buildSpreadModel(project, evaluation, startFleet), p);
    let fleet: Fleet | undefined;
    let cost = NaN;
    for (let k = 0; k < MAX_SOLVES_PER_ROUND; k++) {
      const caps = Array.from(map, (i) => (i < 0 ? 1 : ratioFromDb(-(deltas[i] as number))));
      if (caps.some((c) => !Number.isFinite(c))) break;
      const r = solve(caps);
      if (!r.choice) {
        fleet = undefined;
        break;
      }
      fleet = fleetOfChoice(problem, r.choice);
      cost = costOfChoice(problem, r.choice);
      const needed = requiredMargins(buildSpreadModel(project, evaluation, fleet), p);
      if (needed.every((d, i) => !(d > (deltas[i] as number) + 1e-9))) break;
      deltas = deltas.map((d, i) => Math.max(d, needed[i] as number));
      if (k === MAX_SOLVES_PER_ROUND - 1) fleet = undefined;
    }
    if (!fleet) {
      rounds.push({ cellTarget: p });
      break;
    }
    const verified = simulate(fleet);
    rounds.push({ cellTarget: p, cost, probability: verified.probability });
    if (verified.probability >= confidence) answer = { fleet, cost, verified };
    else {
      startFleet = fleet;
      p = 1 - (1 - p) / 1.5;
      if (p > 1 - (1 - unionLevel) / 8) break;
    }
  }

  if (!answer) {
    const best = rounds.reduce<ConfidenceRound | undefined>(
      (b, r) =>
        r.probability !== undefined && (b?.probability === undefined || r.probability > b.probability) ? r : b,
      undefined,
    );
    return {
      confidence,
      found: false,
      ...(deterministic ? { deterministic } : {}),
      rounds,
      method,
      message: `No fleet was found that meets every limit with probability ${pct(confidence)}${options.budget !== undefined ? ` within the budget of ${money(options.budget)}` : ''}${best?.probability !== undefined ? `; the best reached ${pct(best.probability)}` : ''}. Quieter candidates, screening or shorter on-times would be needed, or a lower confidence.`,
    };
  }
  const check = simulate(answer.fleet, 4 * draws, seed + 1);
  const extra = deterministic ? answer.cost - deterministic.cost : undefined;
  const costWords =
    extra === undefined
      ? 'No fleet meets every limit as the ledger rates it, so there is no deterministic optimum to compare with.'
      : extra > 0
        ? `It costs ${money(extra)} more than the cheapest fleet meeting every limit as rated (${money(deterministic!.cost)}, which meets them all with probability ${simulatedWords(deterministic!.probability, deterministic!.standardError, deterministic!.draws)}).`
        : extra < 0
          ? `It costs ${money(-extra)} less than the cheapest fleet meeting every limit as rated (${money(deterministic!.cost)}): the guaranteed levels already hold K, so at this confidence some rated levels may exceed a limit.`
          : `It is the cheapest fleet meeting every limit as rated (probability ${simulatedWords(deterministic!.probability, deterministic!.standardError, deterministic!.draws)}).`;
  return {
    confidence,
    found: true,
    fleet: answer.fleet,
    cost: answer.cost,
    verified: answer.verified,
    check,
    ...(deterministic ? { deterministic } : {}),
    ...(extra !== undefined ? { extraCost: extra } : {}),
    rounds,
    method,
    message: `The cheapest fleet found that meets every limit with probability ${pct(confidence)} costs ${money(answer.cost)}: simulated ${simulatedWords(answer.verified.probability, answer.verified.standardError, answer.verified.draws)} (check ${simulatedWords(check.probability, check.standardError, check.draws)}). ${costWords}`,
  };
}

function pct(p: number): string {
  return `${(100 * p).toFixed(1)} %`;
}

/** Confidence levels the cost of confidence is shown for. */
export const CONFIDENCE_LEVELS = [0.5, 0.8, 0.9, 0.95, 0.99] as const;

/** The cheapest fleet found at one confidence, for the cost-of-confidence table. */
export interface ConfidenceCost {
  confidence: number;
  found: boolean;
  cost?: number;
  /** Simulated probability that every limit is met at once, with its sampling error. */
  probability?: number;
  standardError?: number;
}

/**
 * What more confidence costs: the cheapest fleet found (and verified) at each level, by
 * {@link confidenceFleet}. A level no fleet reaches is marked not found. O(levels) searches.
 * @example confidenceCosts(project, evaluation, [0.5, 0.9], solver) // [{ confidence: 0.5, cost: 74770.67, … }, { confidence: 0.9, cost: 75160.67, … }]
 */
export function confidenceCosts(
  project: Project,
  evaluation: Evaluation,
  levels: readonly number[],
  solver: LpSolver,
  options: Omit<ConfidenceFleetOptions, 'confidence'> = {},
): ConfidenceCost[] {
  return levels.map((confidence) => {
    const r = confidenceFleet(project, evaluation, { ...options, confidence }, solver);
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
}
