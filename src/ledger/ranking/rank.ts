/**
 * Ranking of a duty's candidates at one receiver: how loud each is there, how much it
 * lowers the phase total compared with the baseline candidate, what it costs extra, and
 * which options are dominated or free wins.
 *
 * The reduction is energetic: with the other duties of the phase unchanged,
 *   ΔL = L_phase(baseline) − L_phase(candidate),
 *   L_phase(x) = 10·lg(10^(L_others/10) + 10^(L_x/10)),
 * so replacing one of several machines lowers the total less than the machines' own
 * difference (common practice).
 *
 * Cost: O(k + n log n) for n candidates of the duty and k duties in its phase: the other
 * duties' sum is taken once, each candidate is then O(1); sorting is O(n log n); the
 * dominance sweep is O(n) over the sorted list. The worst receiver for 'worst' adds
 * O(receivers × k).
 */
import type { Candidate, Duty, Phase, Project, ProjectSettings, Receiver } from '../model/model.ts';
import type { Evaluation, RankingRow } from '../model/results.ts';
import { baselineFleet, phaseTotalDb } from '../prediction/phase-total.ts';
import { dbSumOrNaN } from '../prediction/safe.ts';
import { own } from '../model/own.ts';
import { phasePeriods, type PhasePeriod } from '../prediction/phase-periods.ts';
import { ratedLevel } from '../rating/rated-level.ts';
import { mayBeOffBasis } from '../rating/rating.ts';
import { limitOf } from '../model/limits.ts';

/**
 * The receiver with the least margin (limit − level) for the baseline fleet in a phase,
 * over every period the phase is assessed in; without any limits, the receiver with the highest level. Undefined when no level is
 * computable.
 */
export function worstReceiverForBaseline(
  project: Project,
  evaluation: Evaluation,
  phaseId: string,
): string | undefined {
  const phase = project.phases.find((p) => p.id === phaseId);
  if (!phase) return undefined;
  const fleet = baselineFleet(project);
  return worstOf(project, phase, (r) => phaseTotalDb(project, evaluation, phaseId, r.id, fleet));
}

/** The receiver with the least margin over the phase's periods given each receiver's level in the own period (see above). O(receivers × periods). */
export function worstOf(
  project: Project,
  phase: Phase,
  levelAt: (receiver: Receiver, index: number) => number,
): string | undefined {
  const periods = phasePeriods(project, phase).periods;
  let best: { id: string; key: number } | undefined;
  project.receivers.forEach((r, i) => {
    const level = levelAt(r, i);
    // The least margin over the periods the phase is assessed in; the level alone without any limit.
    let key = level - 1e6;
    let limited = false;
    for (const t of periods) {
      const limit = limitOf(r, t.periodId);
      if (limit === undefined) continue;
      const over = level + t.shiftDb - limit;
      if (!limited || over > key) key = over;
      limited = true;
    }
    if (!Number.isNaN(key) && (best === undefined || key > best.key)) best = { id: r.id, key };
  });
  return best?.id;
}

/**
 * Ranks the candidates of a duty at a receiver (an id, the reference receiver id, or
 * 'worst'), quietest first, ties by cost; rows whose level is not computable come last.
 * Every candidate is on the project's level basis (../rating/rating.ts); one that cannot be
 * put on it carries `offBasis`.
 * The other duties of the phase keep the evaluation's fleet.
 * @example rankDuty(p, evaluateProject(p), 'd-slab', 'worst')[0] // { candidateId: 'slab-crusher', rank: 1, contributionDb: 53.1, reductionDb: 5.8, extraCost: 770, … } (at the school)
 */
export function rankDuty(
  project: Project,
  evaluation: Evaluation,
  dutyId: string,
  receiverId: string | 'worst',
): RankingRow[] {
  const duty = project.duties.find((d) => d.id === dutyId);
  if (!duty) return [];
  const receiver = receiverId === 'worst' ? worstReceiverForBaseline(project, evaluation, duty.phaseId) : receiverId;
  const candidates = project.candidates.filter((c) => c.dutyId === dutyId);
  if (receiver === undefined) return [];
  const phase = project.phases.find((p) => p.id === duty.phaseId);
  const ownLimits = phase ? limitsInOwnPeriod(project, phasePeriods(project, phase).periods, receiver) : [];

  // Other duties of the phase, as the evaluation's fleet has them: summed once.
  const others: number[] = [];
  for (const d of project.duties) {
    if (d.phaseId === duty.phaseId && d.id !== dutyId)
      others.push(evaluation.contributionDb(own(evaluation.fleet, d.id) ?? d.baselineCandidateId, receiver));
  }
  return rankWith(evaluation, duty, candidates, receiver, dbSumOrNaN(others), ownLimits, project.settings);
}

/** Each period the phase is assessed in with a limit at the receiver: the limit less the shift from the own period. */
export function limitsInOwnPeriod(project: Project, periods: readonly PhasePeriod[], receiverId: string): number[] {
  const receiver = project.receivers.find((r) => r.id === receiverId);
  if (!receiver) return [];
  return periods.flatMap((t) => {
    const limit = limitOf(receiver, t.periodId);
    return limit === undefined ? [] : [limit - t.shiftDb];
  });
}

/**
 * Each candidate's level at the ranking's receiver and cost, by the candidate's position in the list ranked: what
 * `evaluation.contributionDb(id, receiver)` and `evaluation.costs[id].total` give, read from arrays the caller
 * filled once for every duty (./rank-every-duty.ts) instead of by id per candidate.
 */
export interface RankedFigures {
  levelDb(position: number): number;
  cost(position: number): number;
  /** `evaluation.costs[id].total` of any candidate by id (NaN when none). */
  costById(id: string): number;
}

/**
 * The ranking of a duty's candidates at a receiver, given the energetic sum of the other duties of its phase there
 * (`othersDb`) and the limits in its own period (`ownLimits`); `settings` give the level basis a row is marked
 * off (`offBasis`); `figures`, when given, each candidate's level and cost (else read from the evaluation by id).
 * O(n log n) in the candidates.
 */
export function rankWith(
  evaluation: Evaluation,
  duty: Duty,
  candidates: readonly Candidate[],
  receiver: string,
  othersDb: number,
  ownLimits: readonly number[],
  settings: ProjectSettings,
  figures?: RankedFigures,
): RankingRow[] {
  // The phase total with one candidate: dbSumOrNaN([othersDb, levelDb]), the other duties' energy taken once. For
  // finite levels the same sum in the same order (0 + E_others + E_candidate), so the same bits; else dbSumOrNaN.
  const othersEnergy = 10 ** (othersDb / 10);
  const othersFinite = Number.isFinite(othersDb);
  const totalWith = (levelDb: number) => {
    if (!othersFinite || !Number.isFinite(levelDb)) return dbSumOrNaN([othersDb, levelDb]);
    const energy = othersEnergy + 10 ** (levelDb / 10);
    return energy === 0 ? -Infinity : 10 * Math.log10(energy);
  };
  const overAnyLimit = (total: number) => {
    for (let i = 0; i < ownLimits.length; i++) if (total > (ownLimits[i] as number)) return true;
    return false;
  };

  const baseLevel = evaluation.contributionDb(duty.baselineCandidateId, receiver);
  const baseTotal = totalWith(baseLevel);
  const baseCost = figures
    ? figures.costById(duty.baselineCandidateId)
    : (own(evaluation.costs, duty.baselineCandidateId)?.total ?? NaN);

  const rows: RankingRow[] = candidates.map((c, position) => {
    const contributionDb = figures ? figures.levelDb(position) : evaluation.contributionDb(c.id, receiver);
    const phaseTotal = totalWith(contributionDb);
    const reductionDb = baseTotal - phaseTotal;
    const cost = figures ? figures.cost(position) : (own(evaluation.costs, c.id)?.total ?? NaN);
    const extraCost = cost - baseCost;
    const row: RankingRow = {
      candidateId: c.id,
      rank: 0,
      contributionDb,
      phaseTotalDb: phaseTotal,
      reductionDb,
      extraCost,
      dominated: false,
      freeWin: c.id !== duty.baselineCandidateId && contributionDb < baseLevel && extraCost <= 0,
      overLimit: overAnyLimit(phaseTotal),
      isBaseline: c.id === duty.baselineCandidateId,
    };
    const offBasis = mayBeOffBasis(c, settings.levelBasis) ? ratedLevel(c, settings).offBasis : undefined;
    if (offBasis) row.offBasis = offBasis;
    if (extraCost > 0) row.dbPer1000 = reductionDb / (extraCost / 1000);
    if (reductionDb > 0) row.costPerDb = extraCost / reductionDb;
    return row;
  });

  const costOf = (r: RankingRow) => r.extraCost;
  rows.sort((a, b) => order(a.contributionDb, b.contributionDb) || order(costOf(a), costOf(b)));
  markDominated(rows);
  rows.forEach((r, i) => (r.rank = i + 1));
  return rows;
}

/** Ascending with NaN last. */
function order(a: number, b: number): number {
  const na = Number.isNaN(a);
  const nb = Number.isNaN(b);
  if (na || nb) return na === nb ? 0 : na ? 1 : -1;
  return a - b;
}

/**
 * Marks rows louder-or-as-loud and dearer-or-as-dear than another row, strictly worse in
 * one. Expects rows sorted by level, then cost. O(n).
 */
function markDominated(rows: RankingRow[]): void {
  let cheapestQuieter = Infinity; // least cost among strictly quieter rows
  let i = 0;
  while (i < rows.length) {
    const level = rows[i]!.contributionDb;
    if (Number.isNaN(level)) break;
    let j = i;
    while (j < rows.length && rows[j]!.contributionDb === level) j++;
    const groupCheapest = rows[i]!.extraCost; // sorted by cost within the group
    for (let k = i; k < j; k++) {
      const row = rows[k]!;
      if (Number.isNaN(row.extraCost)) continue;
      row.dominated = cheapestQuieter <= row.extraCost || groupCheapest < row.extraCost;
    }
    for (let k = i; k < j; k++) if (rows[k]!.extraCost < cheapestQuieter) cheapestQuieter = rows[k]!.extraCost;
    i = j;
  }
}
