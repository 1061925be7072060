/**
 * The second half of an evaluation, from the kernel's numbers (./evaluate.ts): the fleet
 * chosen for each duty, the contribution look-ups, the phase × receiver × period matrix,
 * the worst receiver of each phase and the fleet's cost.
 *
 * A phase's cells depend only on the rows of the candidates chosen for the phase's duties,
 * so {@link assemble} given what an earlier evaluation assembled (`reuse`) copies the
 * cells of every phase none of whose chosen rows changed and computes the others with the
 * same code as a full evaluation: the phase total at a receiver is always the energetic
 * sum of its duties' contributions, never an old total with one term taken out and one
 * put in, so no rounding drift builds up over a chain of edits.
 */
import type { Candidate, Fleet, Phase, Project, Receiver } from '../model/model.ts';
import { REFERENCE_RECEIVER_ID } from '../model/model.ts';
import type { Contribution, DataProblem, DutyCost, Evaluation, MatrixCell, Term } from '../model/results.ts';
import { characterPenaltyDb } from '../rating/rating.ts';
import { penaltyTerm } from '../../core/working-day-terms.ts';
import { pathEntryAt } from './path-table.ts';
import { dbSumOrNaN } from './safe.ts';
import { own } from '../model/own.ts';
import { phasePeriods, type PhasePeriod } from './phase-periods.ts';
import { limitOf } from '../model/limits.ts';
import type { EvaluateOptions, KernelState } from './evaluate.ts';

/** What an evaluation keeps besides its public fields, for applying an edit to it (./evaluate-edit.ts). */
export interface EvaluationState {
  project: Project;
  options: EvaluateOptions;
  k: KernelState;
  /** The candidate chosen for each duty (by duty index; undefined when the duty's pick names no candidate). */
  chosenRows: (number | undefined)[];
  chosen: Fleet;
  /** Index in the matrix of each phase's first cell, and one past the last phase's. */
  phaseStart: number[];
  /** The worst receiver of each phase, by phase index. */
  worstOfPhase: (string | undefined)[];
  matrix: MatrixCell[];
  notes: NoteParts;
}

/** An evaluation's notes by where they come from, in the order they are listed. */
export interface NoteParts {
  /** Working hours in no period (phases and periods alone). */
  hours: DataProblem[];
  /** Candidates off the level basis (candidates and settings). */
  basis: DataProblem[];
  /** Paths outside ISO 9613-2:1996 Table 5 (propagation, duties and receivers). */
  accuracy: DataProblem[];
}

const states = new WeakMap<Evaluation, EvaluationState>();

/** What an evaluation kept for applying an edit, if it was made by this module. */
export function stateOf(evaluation: Evaluation): EvaluationState | undefined {
  return states.get(evaluation);
}

/** Receivers' columns and limits, looked up once per evaluation rather than per cell. */
interface ReceiverLookup {
  ids: string[];
  columns: number[];
  byId: Map<string, Receiver>;
}

/** Cells of one phase from the rows of its chosen candidates; its worst receiver. O(receivers × periods × duties of the phase). */
function phaseCells(
  project: Project,
  k: KernelState,
  phase: Phase,
  chosenRows: number[],
  receivers: ReceiverLookup,
  matrix: MatrixCell[],
): string | undefined {
  const levels = k.levels;
  const nr = k.table.receiverIds.length;
  const here: number[] = new Array(chosenRows.length);
  const withoutPenalty: number[] = new Array(chosenRows.length);
  const penalties = chosenRows.map((row) =>
    row < 0 ? 0 : characterPenaltyDb(project.candidates[row] as Candidate, project.settings),
  );
  const penaltyApplies = penalties.some((x) => x !== 0);
  const assessed = periodsOfPhase(project, phase);
  let worst: { id: string; key: number } | undefined;
  for (let j = 0; j < receivers.ids.length; j++) {
    const receiverId = receivers.ids[j] as string;
    const col = receivers.columns[j] as number;
    for (let q = 0; q < chosenRows.length; q++) {
      const row = chosenRows[q] as number;
      here[q] = row < 0 || col < 0 ? NaN : (levels[row * nr + col] as number);
      withoutPenalty[q] = (here[q] as number) - (penalties[q] as number);
    }
    const ownLevelDb = dbSumOrNaN(here);
    const ownAeqDb = penaltyApplies ? dbSumOrNaN(withoutPenalty) : ownLevelDb;
    for (const period of assessed) {
      const levelDb = ownLevelDb === -Infinity ? ownLevelDb : ownLevelDb + period.shiftDb;
      const limitDb = limitOf(receivers.byId.get(receiverId), period.periodId);
      const hasLimit = limitDb !== undefined;
      const cell: MatrixCell = {
        phaseId: phase.id,
        receiverId,
        periodId: period.periodId,
        ownPeriod: period.own,
        hoursWorked: period.hoursWorked,
        periodHours: period.periodHours,
        levelDb,
        over: hasLimit && levelDb > (limitDb as number),
      };
      if (hasLimit) {
        cell.limitDb = limitDb;
        cell.marginDb = (limitDb as number) - levelDb;
      }
      if (penaltyApplies) {
        cell.levelAeqDb = ownAeqDb === -Infinity ? ownAeqDb : ownAeqDb + period.shiftDb;
        cell.penaltyDb = levelDb - cell.levelAeqDb;
      }
      matrix.push(cell);
      // Least margin first; receivers without a limit only by level, after those with one.
      const key = hasLimit ? -(cell.marginDb as number) : levelDb - 1e6;
      if (!Number.isNaN(key) && (worst === undefined || key > worst.key)) worst = { id: receiverId, key };
    }
  }
  return worst?.id;
}

/**
 * The evaluation from the kernel's numbers, with `problems` (validation and kernel
 * findings) and `notes`; adds the fleet's problems. With `reuse` (what an evaluation of
 * the same phases, periods and receivers assembled, and the candidate rows that changed
 * since) the cells of unaffected phases are copied. O(duties + phases × receivers ×
 * periods) to copy, plus O(receivers × periods × duties) per phase computed.
 */
export function assemble(
  project: Project,
  fleet: Fleet | undefined,
  k: KernelState,
  problems: DataProblem[],
  notes: NoteParts,
  options: EvaluateOptions,
  reuse?: { state: EvaluationState; changedRows: ReadonlySet<number> },
): Evaluation {
  const nr = k.table.receiverIds.length;

  const chosen: Fleet = {};
  const chosenRows: (number | undefined)[] = new Array(project.duties.length);
  project.duties.forEach((d, u) => {
    const pick = own(fleet, d.id);
    if (pick !== undefined) {
      const ci = k.candidateIndex.get(pick);
      if (ci === undefined || project.candidates[ci]?.dutyId !== d.id) {
        problems.push({
          path: `fleet[${JSON.stringify(d.id)}]`,
          message: `Fleet, duty ${JSON.stringify(d.name)}: ${JSON.stringify(pick)} is not a candidate of this duty (use one of ${candidatesOf(project, d.id).join(', ')})`,
        });
      }
      chosen[d.id] = pick;
    } else {
      chosen[d.id] = d.baselineCandidateId;
    }
    chosenRows[u] = k.candidateIndex.get(own(chosen, d.id) as string);
  });

  const levels = k.levels;

  const contributionDb = (candidateId: string, receiverId: string): number => {
    const c = k.candidateIndex.get(candidateId);
    const r = k.receiverIndex.get(receiverId);
    if (c === undefined || r === undefined) return NaN;
    return levels[c * nr + r] as number;
  };

  const contribution = (candidateId: string, receiverId: string): Contribution => {
    const c = k.candidateIndex.get(candidateId);
    const r = k.receiverIndex.get(receiverId);
    if (c === undefined || r === undefined) return { candidateId, receiverId, levelDb: NaN, terms: [] };
    const cand = project.candidates[c] as Candidate;
    const u = k.dutyOf[c] as number;
    const terms: Term[] = [
      { key: 'lw', label: `Sound power LWA: ${k.ratedOf(c)?.explanation ?? ''}`, db: k.ratedOf(c)?.lwaDb ?? NaN },
    ];
    const entry = u >= 0 ? pathEntryAt(k.table, u * nr + r) : undefined;
    if (entry) {
      if (k.withBands[c] === 1 && k.table.hasBands[u * nr + r]) {
        terms.push({
          key: 'octavePath',
          label: 'Octave-band path, ISO 9613-2:1996 general method, A-weighted over this machine’s spectrum',
          db: (levels[c * nr + r] as number) - (k.baseDb[c] as number) - (k.table.receiverDb[u * nr + r] as number),
        });
      } else {
        terms.push(...entry.pathTerms);
      }
    }
    if (u >= 0) terms.push(...(k.dutyDb[u]?.terms ?? []));
    if (entry) terms.push(...entry.receiverTerms);
    terms.push(...penaltyTerm(characterPenaltyDb(cand, project.settings), cand.character));
    return { candidateId, receiverId, levelDb: levels[c * nr + r] as number, terms };
  };

  const matrix: MatrixCell[] = [];
  const phaseStart: number[] = [];
  const worstOfPhase: (string | undefined)[] = [];
  const worstReceiverByPhase: Record<string, string> = {};
  const ids = project.receivers.length > 0 ? project.receivers.map((r) => r.id) : [REFERENCE_RECEIVER_ID];
  const byId = new Map<string, Receiver>();
  for (const r of project.receivers) if (!byId.has(r.id)) byId.set(r.id, r);
  const receivers: ReceiverLookup = { ids, columns: ids.map((id) => k.receiverIndex.get(id) ?? -1), byId };
  project.phases.forEach((phase, ph) => {
    phaseStart.push(matrix.length);
    let affected = true;
    if (reuse) {
      affected = false;
      const before = reuse.state;
      for (let u = 0; u < project.duties.length && !affected; u++) {
        if ((project.duties[u] as Project['duties'][number]).phaseId !== phase.id) continue;
        const row = chosenRows[u];
        affected = row !== before.chosenRows[u] || (row !== undefined && reuse.changedRows.has(row));
      }
    }
    let worst: string | undefined;
    if (affected) {
      const phaseRows = project.duties.flatMap((d, u) => (d.phaseId === phase.id ? [chosenRows[u] ?? -1] : []));
      worst = phaseCells(project, k, phase, phaseRows, receivers, matrix);
    } else {
      const before = reuse!.state;
      const from = before.phaseStart[ph] as number;
      const to = before.phaseStart[ph + 1] as number;
      for (let i = from; i < to; i++) matrix.push(before.matrix[i] as MatrixCell);
      worst = before.worstOfPhase[ph];
    }
    worstOfPhase.push(worst);
    if (worst !== undefined) worstReceiverByPhase[phase.id] = worst;
  });
  phaseStart.push(matrix.length);

  // Each chosen candidate's cost by id: read by position where the ids allow it (KernelState.plainIds), so that the
  // costs by id are not made for the sum alone.
  const costOf = (id: string): DutyCost | undefined => {
    if (!k.plainIds || typeof id !== 'string') return own(k.costs, id);
    const i = k.candidateIndex.get(id);
    return i === undefined ? undefined : k.costList[i];
  };
  let fleetCost = 0;
  for (const d of project.duties) fleetCost += costOf(own(chosen, d.id) as string)?.total ?? NaN;

  const evaluation: Evaluation = {
    fleet: chosen,
    get costs() {
      return k.costs;
    },
    contributionDb,
    contribution,
    matrix,
    worstReceiverByPhase,
    fleetCost,
    problems,
    notes: [...notes.hours, ...notes.basis, ...notes.accuracy],
  };
  states.set(evaluation, { project, options, k, chosenRows, chosen, phaseStart, worstOfPhase, matrix, notes });
  return evaluation;
}

/**
 * The periods a phase is assessed in (./phase-periods.ts); when its own period is not
 * among them (its hours miss it: a validation problem) the own period still gets a cell,
 * not computed.
 */
function periodsOfPhase(project: Project, phase: Phase): PhasePeriod[] {
  const found = phasePeriods(project, phase).periods;
  if (found.some((p) => p.own)) return found;
  return [
    { periodId: phase.periodId, hoursWorked: 0, periodHours: NaN, own: true, shiftDb: NaN },
    ...found.map((p) => ({ ...p, shiftDb: NaN })),
  ];
}

function candidatesOf(project: Project, dutyId: string): string[] {
  return project.candidates.filter((c) => c.dutyId === dutyId).map((c) => c.id);
}
