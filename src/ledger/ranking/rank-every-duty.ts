/**
 * The ranking of every duty of a project at once, each at a given receiver or at its phase's worst receiver for the
 * baseline fleet — the same rows as `rankDuty` duty by duty (./rank.ts), without its per-duty scans of the whole
 * project.
 *
 * `rankDuty` finds the duty, filters its candidates out of the whole list and sums the other duties of its phase:
 * O(candidates + duties) per duty, so ranking every duty of a large project grows with the square of its size. Here
 * the candidates are grouped by duty once, the baseline phase totals that pick each phase's worst receiver are summed
 * in one pass over the duties (the same sums in the same order as `worstReceiverForBaseline`), and the other duties'
 * sum for each duty comes from the energies before and after it in its phase (prefix and suffix sums), so
 *   O(duties × receivers + candidates log candidates)
 * in all. The other duties' sum is formed in another order than `rankDuty`'s, so the phase totals may differ from its
 * in the last bits of a double; everything else is the same.
 */
import type { Candidate, Duty, Phase, Project } from '../model/model.ts';
import { REFERENCE_RECEIVER_ID } from '../model/model.ts';
import type { Evaluation, RankingRow } from '../model/results.ts';
import { own } from '../model/own.ts';
import { phasePeriods } from '../prediction/phase-periods.ts';
import { limitsInOwnPeriod, rankWith, worstOf, type RankedFigures } from './rank.ts';
import { stateOf } from '../prediction/evaluation-assembly.ts';

/** One duty's ranking and where it is ranked. */
export interface DutyRanking {
  dutyId: string;
  receiverId: string;
  rows: RankingRow[];
}

const energyOf = (levelDb: number) => 10 ** (levelDb / 10);
const levelOf = (energy: number) => (energy === 0 ? -Infinity : Number.isNaN(energy) ? NaN : 10 * Math.log10(energy));

/**
 * Every duty's ranking, in project order. `receiverId`: rank every duty there; absent: at its phase's worst receiver
 * for the baseline fleet, or at the reference receiver when there is none (no receivers, no computable level).
 * O(duties × receivers + candidates log candidates).
 */
export function rankEveryDuty(project: Project, evaluation: Evaluation, receiverId?: string): DutyRanking[] {
  const byDuty = new Map<string, Candidate[]>();
  // Each list's candidates' positions in project.candidates, in the same order.
  const positions = new Map<readonly Candidate[], number[]>();
  project.candidates.forEach((c, i) => {
    const list = byDuty.get(c.dutyId);
    if (list) {
      list.push(c);
      (positions.get(list) as number[]).push(i);
    } else {
      const created = [c];
      byDuty.set(c.dutyId, created);
      positions.set(created, [i]);
    }
  });
  const figuresOf = figuresReader(evaluation, project, byDuty, positions);
  const phaseById = new Map<string, Phase>();
  for (const p of project.phases) if (!phaseById.has(p.id)) phaseById.set(p.id, p);

  // The duties of each phase, in project order.
  const dutiesOf = new Map<string, Duty[]>();
  for (const d of project.duties) {
    const list = dutiesOf.get(d.phaseId);
    if (list) list.push(d);
    else dutiesOf.set(d.phaseId, [d]);
  }

  // Where each phase's duties are ranked.
  const receiverOf = new Map<string, string>();
  const baselineOf = new Map(project.duties.map((d) => [d.id, d.baselineCandidateId] as const));
  const levelAt = levelReader(evaluation);
  for (const [phaseId, duties] of dutiesOf) {
    const phase = phaseById.get(phaseId);
    let chosen = receiverId;
    if (chosen === undefined && phase) {
      // Each baseline's row looked up once per phase, not once per receiver (phases × receivers × duties reads).
      const rows = levelAt.rows(duties.map((d) => baselineOf.get(d.id) as string));
      chosen = worstOf(project, phase, (r) => {
        const column = levelAt.column(r.id);
        let energy = 0;
        for (let i = 0; i < rows.length; i++) energy += energyOf(levelAt.level(rows[i] as number, column));
        return levelOf(energy);
      });
    }
    receiverOf.set(phaseId, chosen ?? REFERENCE_RECEIVER_ID);
  }

  // The other duties' energetic sum for each duty at its phase's receiver: prefix + suffix.
  const othersDbOf = new Map<Duty, number>();
  for (const [phaseId, duties] of dutiesOf) {
    const receiver = receiverOf.get(phaseId) as string;
    const e = duties.map((d) =>
      energyOf(evaluation.contributionDb(own(evaluation.fleet, d.id) ?? d.baselineCandidateId, receiver)),
    );
    const suffix = new Float64Array(e.length + 1);
    for (let i = e.length - 1; i >= 0; i--) suffix[i] = (suffix[i + 1] as number) + (e[i] as number);
    let prefix = 0;
    duties.forEach((d, i) => {
      othersDbOf.set(d, levelOf(prefix + (suffix[i + 1] as number)));
      prefix += e[i] as number;
    });
  }

  const limitsMemo = new Map<string, number[]>();
  return project.duties.map((duty) => {
    const receiver = receiverOf.get(duty.phaseId) as string;
    const phase = phaseById.get(duty.phaseId);
    let limits = limitsMemo.get(duty.phaseId);
    if (!limits) {
      limits = phase ? limitsInOwnPeriod(project, phasePeriods(project, phase).periods, receiver) : [];
      limitsMemo.set(duty.phaseId, limits);
    }
    const candidates = byDuty.get(duty.id) ?? [];
    const rows = rankWith(
      evaluation,
      duty,
      candidates,
      receiver,
      othersDbOf.get(duty) as number,
      limits,
      project.settings,
      figuresOf?.(candidates, receiver),
    );
    return { dutyId: duty.id, receiverId: receiver, rows };
  });
}

/**
 * Contributions by row and column: `rows` and `column` look candidates and a receiver up once, `level` reads
 * `evaluation.contributionDb` of them — from the evaluation's array when it was made by evaluateProject, else by id.
 */
interface LevelReader {
  rows(candidateIds: readonly string[]): Int32Array;
  column(receiverId: string): number;
  level(row: number, column: number): number;
}

function levelReader(evaluation: Evaluation): LevelReader {
  const k = stateOf(evaluation)?.k;
  if (!k) {
    // Rows and columns are positions in the ids asked for so far; the level is then read by id.
    const candidates: string[] = [];
    const receivers: string[] = [];
    return {
      rows: (candidateIds) => Int32Array.from(candidateIds, (id) => candidates.push(id) - 1),
      column: (receiverId) => receivers.push(receiverId) - 1,
      level: (row, column) => evaluation.contributionDb(candidates[row] as string, receivers[column] as string),
    };
  }
  const nr = k.table.receiverIds.length;
  const levels = k.levels;
  return {
    rows: (candidateIds) => Int32Array.from(candidateIds, (id) => k.candidateIndex.get(id) ?? -1),
    column: (receiverId) => k.receiverIndex.get(receiverId) ?? -1,
    // As contributionDb: NaN for a candidate or receiver it does not know.
    level: (row, column) => (row < 0 || column < 0 ? NaN : (levels[row * nr + column] as number)),
  };
}

/**
 * Each candidate's level and cost for `rankWith` by its position in its duty's list, from the arrays of an evaluation
 * made by evaluateProject (each candidate's row looked up once by id, here, instead of three look-ups by id per row);
 * undefined for another evaluation, which `rankWith` then reads by id.
 */
function figuresReader(
  evaluation: Evaluation,
  project: Project,
  byDuty: ReadonlyMap<string, Candidate[]>,
  positions: ReadonlyMap<readonly Candidate[], number[]>,
): ((candidates: readonly Candidate[], receiver: string) => RankedFigures) | undefined {
  const state = stateOf(evaluation);
  const k = state?.k;
  if (!state || !k) return undefined;
  const nr = k.table.receiverIds.length;
  // When the project's candidates are the evaluated ones, each at its place, and no id is used twice, a candidate's row
  // is its position: no look-up by id.
  const evaluated = state.project.candidates;
  const cands = project.candidates;
  let byPosition = cands.length === evaluated.length && k.candidateIndex.size === cands.length;
  for (let i = 0; byPosition && i < cands.length; i++) byPosition = cands[i] === evaluated[i];
  const rowsOf = new Map<readonly Candidate[], Int32Array>();
  for (const list of byDuty.values()) {
    const rows = byPosition
      ? Int32Array.from(positions.get(list) as number[])
      : Int32Array.from(list, (c) => k.candidateIndex.get(c.id) ?? -1);
    rowsOf.set(list, rows);
  }
  // By position where the ids allow it (KernelState.plainIds), so that the costs by id are not made for the rankings.
  const costById = (id: string): number => {
    if (!k.plainIds || typeof id !== 'string') return own(evaluation.costs, id)?.total ?? NaN;
    const row = k.candidateIndex.get(id);
    return row === undefined ? NaN : ((k.costList[row] as { total: number } | undefined)?.total ?? NaN);
  };
  return (candidates, receiver) => {
    const rows = rowsOf.get(candidates) ?? new Int32Array(0);
    const column = k.receiverIndex.get(receiver) ?? -1;
    return {
      levelDb: (p) => {
        const row = rows[p] as number;
        return row < 0 || column < 0 ? NaN : (k.levels[row * nr + column] as number);
      },
      cost: (p) => {
        const row = rows[p] as number;
        return row < 0 ? NaN : ((k.costList[row] as { total: number } | undefined)?.total ?? NaN);
      },
      costById,
    };
  };
}
