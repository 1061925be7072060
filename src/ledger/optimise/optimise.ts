/**
 * The cheapest fleet that meets every limit, the hand method for comparison, and the
 * trade-off curve between cost and worst-case margin.
 *
 * The caller passes a loaded solver (HiGHS one-shot API), so the command line, the tests
 * and a browser worker each load HiGHS their own way; nothing here touches the DOM.
 *
 * Steps:
 * 1. Build the 0–1 model (./problem.ts): one candidate per duty, Σ ρ·x ≤ 1 per phase ×
 *    receiver cell, pins, exclusions, budget.
 * 2. Least cost subject to every limit. If no fleet meets them (within the budget): the
 *    least largest exceedance, then the least cost at it (./exact.ts), naming the cells
 *    still over. If not even the budget can be met: the cheapest fleet, saying so.
 * 3. The hand method from the baseline (./hand-method.ts), and the saving over it.
 * 4. The trade-off curve (./trade-off.ts), or the exact frontier (./frontier.ts).
 * Each exact solve is exponential in the worst case, fast in practice (see the benchmark).
 */
import type { Project } from '../model/model.ts';
import type { Evaluation, OptimiseOptions, OptimiseResult, FleetOutcome } from '../model/results.ts';
import { buildFleetProblem, type FleetProblem } from './problem.ts';
import type { LpSolver, SolveSettings } from './solver.ts';
import { cheapestUnderCap, quietestThenCheapest } from './exact.ts';
import { outcomeOfChoice, outcomeOfFleet } from './outcome.ts';
import { handMethod } from './hand-method.ts';
import { tradeOffCurve, DEFAULT_TRADE_OFF_STEP_DB, type TradeOffPoint } from './trade-off.ts';
import { exactFrontier } from './frontier.ts';
import { positive } from '../../core/check.ts';
import { formatMoney } from '../costs/money.ts';
import { addClauseConstraints, invalidClauseIds, type ClauseConstraints } from './clause-constraints.ts';
import { limitSettings } from '../clauses/limit-levels.ts';
import { sharesMet } from './problem.ts';

/**
 * The fleet model with the project's clauses; when the clauses' hard rows (caps, hours,
 * shares) cannot be met together, the share rows are left out and named.
 */
function clauseModel(
  base: FleetProblem,
  project: Project,
  evaluation: Evaluation,
  solver: LpSolver,
  settings: SolveSettings,
): ClauseConstraints {
  const made = addClauseConstraints(
    base,
    project,
    limitSettings(project, evaluation),
    invalidClauseIds(project, evaluation),
  );
  if (!made.problem.shares) return made;
  const noLimits: FleetProblem = { ...made.problem, cells: [] };
  delete noLimits.budget;
  if (!cheapestUnderCap(noLimits, solver, settings, undefined, false).infeasible) return made;
  const dropped = made.problem.shares;
  const problem: FleetProblem = { ...made.problem };
  delete problem.shares;
  return {
    problem,
    honoured: made.honoured.filter((n) => !dropped.some((s) => s.clause === n)),
    unmet: [
      ...made.unmet,
      ...dropped.map((s) => ({
        clauseId: s.clauseId,
        name: s.clause,
        reason: 'the shares asked cannot be reached together with the caps and hour restrictions',
      })),
    ],
  };
}

/** Words on the clauses: which are honoured, which cannot be met and why. */
function clauseMessages(c: ClauseConstraints): string[] {
  const out: string[] = [];
  if (c.honoured.length > 0) out.push(`Tender clauses honoured as constraints: ${c.honoured.join(', ')}.`);
  for (const u of c.unmet) out.push(`${u.name} cannot be met and is left out: ${u.reason}.`);
  return out;
}

export interface FleetOptimiseOptions extends OptimiseOptions {
  /** Spacing of the trade-off sweep, dB (default 0.5). */
  tradeOffStepDb?: number;
  /** Compute the trade-off curve (default true). */
  tradeOff?: boolean;
  /** Wall-clock limit of each solve, s (default 30). */
  timeLimitS?: number;
  /** Honour the project's tender clauses as constraints (default true). */
  clauses?: boolean;
  /**
   * Trace the exact frontier (every fleet no other beats on both cost and worst margin, from the cheapest fleet
   * to the quietest; ./frontier.ts) in place of the stepped curve. Default false.
   */
  exactFrontier?: boolean;
  /** With `exactFrontier`: hears each frontier point as soon as it is known, in order of cost. */
  onFrontierPoint?: (point: TradeOffPoint, index: number) => void;
  /** Asked between the trade-off solves; true stops the sweep with the points found so far. */
  stopTradeOff?: () => boolean;
  /** Hears what the run is doing and the share of it done (0 to 1), between solves. */
  onProgress?: (progress: OptimiseProgress) => void;
  /**
   * Hears the result as soon as the fleets are known, before the trade-off sweep: the same result without its
   * trade-off points (and without `frontier`), so a caller can show the fleet while the curve is traced.
   */
  onFleetFound?: (result: OptimiseResult) => void;
}

/** What an optimiser run is doing, in words, and the share of the run done (0 to 1). */
export interface OptimiseProgress {
  step: string;
  fraction: number;
}

/** Shares of a run given to each step: the cheapest fleet, then the hand method, then the trade-off sweep. */
const SHARE_CHEAPEST = 0.35;
const SHARE_HAND = 0.4;

/** Strips the internal fields so the outcome is exactly a FleetOutcome (plain data for a worker). */
function plain(o: FleetOutcome): FleetOutcome {
  return { fleet: o.fleet, cost: o.cost, worstMarginDb: o.worstMarginDb, over: o.over };
}

/** Names the cells still over, e.g. "Riverside Cottages in Earthworks 71.3 dB (limit 70)". */
export function describeOver(problem: FleetProblem, over: FleetOutcome['over']): string {
  return over
    .map((o) => {
      const cell = problem.cells.find(
        (c) => c.phaseId === o.phaseId && c.periodId === o.periodId && c.receiverId === o.receiverId,
      );
      const where = cell
        ? `${cell.receiverName} in ${cell.phaseName}${cell.ownPeriod ? '' : ` (${cell.periodName})`}`
        : `${o.receiverId} in ${o.phaseId} (${o.periodId})`;
      return `${where} ${o.levelDb.toFixed(1)} dB (limit ${o.limitDb}, over by ${(o.levelDb - o.limitDb).toFixed(1)} dB)`;
    })
    .join('; ');
}

/**
 * Finds the cheapest compliant fleet (proven by HiGHS), the hand method's fleet and the
 * trade-off curve for a project and its evaluation.
 * Cost: one exact solve when a fleet meets every limit (three when none does), the hand
 * method O(steps · C · T), and one exact solve per trade-off point.
 * Throws an InputError when a duty has no usable candidate or a pin contradicts the data.
 * @example optimiseFleet(demoProject(), evaluateProject(demoProject()), {}, await loadHighsSolver()).best.cost // 74960.67 for the demo as shipped
 */
export function optimiseFleet(
  project: Project,
  evaluation: Evaluation,
  options: FleetOptimiseOptions,
  solver: LpSolver,
): OptimiseResult {
  const settings: SolveSettings = {
    timeLimitS: positive('time limit', options.timeLimitS ?? 30, 'a number of seconds greater than 0'),
  };
  const step = positive(
    'trade-off step',
    options.tradeOffStepDb ?? DEFAULT_TRADE_OFF_STEP_DB,
    'a step in dB greater than 0',
  );
  const limitsOnly = buildFleetProblem(project, evaluation, options.budget);
  const withClauses =
    options.clauses === false || (project.clauses ?? []).length === 0
      ? undefined
      : clauseModel(limitsOnly, project, evaluation, solver, settings);
  const problem = withClauses?.problem ?? limitsOnly;
  const money = (x: number) => formatMoney(x, project.currency);
  const baselineFleet: Record<string, string> = {};
  for (const d of project.duties) baselineFleet[d.id] = d.baselineCandidateId;
  const baseline = outcomeOfFleet(problem, evaluation, baselineFleet);
  const tell = options.onProgress ?? (() => undefined);
  tell({ step: 'Finding the cheapest fleet that meets every limit', fraction: 0 });

  const messages: string[] = [];
  let feasible = true;
  let proven: boolean;
  let best: FleetOutcome;
  if (withClauses) messages.push(...clauseMessages(withClauses));
  const cheapest = cheapestUnderCap(problem, solver, settings, 1);
  if (cheapest.choice) {
    best = outcomeOfChoice(problem, cheapest.choice);
    proven = cheapest.proven;
    if (best.over.length > 0)
      throw new Error(`the solver returned a fleet over a limit (${describeOver(problem, best.over)})`);
    messages.push(
      `Every limit${withClauses && withClauses.honoured.length > 0 ? ' and every clause honoured' : ''} is met${problem.budget !== undefined ? ` within the budget of ${money(problem.budget)}` : ''}; the cheapest such fleet costs ${money(best.cost)}.`,
    );
  } else if (cheapest.infeasible) {
    feasible = false;
    const quiet = quietestThenCheapest(problem, solver, settings, true);
    if (quiet.choice) {
      best = outcomeOfChoice(problem, quiet.choice);
      proven = quiet.proven;
      messages.push(
        `No fleet meets every limit${problem.budget !== undefined ? ` within the budget of ${money(problem.budget)}` : ''}. ` +
          `The fleet with the smallest largest exceedance, then the least cost, still leaves: ${describeOver(problem, best.over)}.`,
      );
    } else {
      const anyFleet = cheapestUnderCap(problem, solver, settings, undefined, false);
      if (!anyFleet.choice) throw new Error(`the solver found no fleet at all (status ${anyFleet.status})`);
      best = outcomeOfChoice(problem, anyFleet.choice);
      proven = anyFleet.proven;
      messages.push(
        `No fleet costs ${money(problem.budget as number)} or less: the cheapest possible fleet costs ${money(best.cost)}.`,
      );
    }
  } else {
    throw new Error(
      `the solver stopped without a fleet (status ${cheapest.status}) after its time limit of ${settings.timeLimitS} s; raise the time limit (on the command line: --time-limit <s>)`,
    );
  }
  if (!proven) messages.push('The solver stopped at its time limit: the fleet is the best found, not proven optimal.');
  if (problem.notConsidered.length > 0) {
    const byId = new Map(project.candidates.map((c) => [c.id, c.label]));
    messages.push(
      `Not considered: ${problem.notConsidered.map((n) => `${byId.get(n.candidateId) ?? n.candidateId} (${n.reason})`).join('; ')}.`,
    );
  }

  tell({ step: 'Working the best-buy-first fleet for comparison', fraction: SHARE_CHEAPEST });
  const hand = handMethod(problem);
  hand.compliant &&= sharesMet(problem, hand.choice);
  const handOutcome = outcomeOfChoice(problem, hand.choice);
  const result: OptimiseResult = {
    feasible,
    best: plain(best),
    proven,
    baseline: plain(baseline),
    hand: { ...plain(handOutcome), compliant: hand.compliant, steps: hand.steps },
    tradeOff: [],
    message: messages.join(' '),
    notConsidered: problem.notConsidered,
  };
  if (withClauses) result.clauses = { honoured: withClauses.honoured, unmet: withClauses.unmet };
  if (feasible && hand.compliant) result.savingOverHand = handOutcome.cost - best.cost;
  options.onFleetFound?.({ ...result });

  const sweep = options.exactFrontier
    ? 'Tracing every fleet no other beats on both cost and margin'
    : 'Tracing what each further dB of margin costs';
  if (options.tradeOff !== false) tell({ step: sweep, fraction: SHARE_HAND });
  const onShare = (share: number) => tell({ step: sweep, fraction: SHARE_HAND + (1 - SHARE_HAND) * share });
  if (options.tradeOff === false) {
    // no sweep asked
  } else if (options.exactFrontier) {
    const frontier = exactFrontier(problem, solver, settings, {
      onShare,
      ...(options.onFrontierPoint ? { onPoint: options.onFrontierPoint } : {}),
      ...(options.stopTradeOff ? { stop: options.stopTradeOff } : {}),
    });
    result.tradeOff = frontier.points;
    result.frontier = { complete: !frontier.stopped };
  } else {
    result.tradeOff = tradeOffCurve(problem, solver, settings, baseline.worstMarginDb, step, onShare).points;
  }
  tell({ step: 'Done', fraction: 1 });
  return result;
}
