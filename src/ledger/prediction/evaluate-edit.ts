/**
 * An evaluation after an edit, from the evaluation before it: what the edit did not touch
 * is reused, what it touched is computed with the same code as {@link evaluateProject},
 * so the result is the one a full evaluation gives (checked on random edit sequences in
 * tests/unit/ledger/prediction/evaluate-edit.test.ts).
 *
 * Handled here (the edits a user makes in the grid, one cell at a time or a paste):
 * - candidates replaced by new objects with the same id (LWA, bands, character, costs,
 *   duty, label…): each one's rated LWA, cost and level row are computed again;
 * - duties replaced by new objects with the same id, phase and place (units, on-time,
 *   duration, baseline, name…): the duty's terms and every candidate of the duty;
 * - another fleet: only the duties whose pick changed.
 * Then only the phases whose chosen rows changed get new matrix cells; each phase total is
 * the energetic sum of its duties' contributions, as in a full evaluation (never the old
 * total with the old energy taken out and the new one put in, which would drift).
 *
 * Falls back to a full evaluation when the edit changes anything else: geometry (a duty
 * moved, a receiver, a barrier), periods, phases, receivers, the method or settings, the
 * currency, which candidates exist (added, removed, reordered, an id changed), a duty's
 * id or phase; when validation is asked for (it reads the whole project); when the
 * permissible lookup differs; and when more than {@link MOST_EDITED} candidates changed.
 * Edits must be made the app's way — new objects for what changed: a change made in place
 * to an object the earlier evaluation read is not seen (evaluateProject sees it).
 *
 * Cost: O(candidates) pointer comparisons to find what changed (and a scan of the duty
 * rows when a duty changed), plus O(receivers × 8) per changed candidate and
 * O(receivers × periods × duties of the phase) per changed phase, against
 * O(candidates) memo look-ups, copies and comparisons for evaluateProject.
 */
import type { Candidate, Duty, Fleet, Project } from '../model/model.ts';
import type { DataProblem, DutyCost, Evaluation } from '../model/results.ts';
import {
  candidateInputs,
  dutyAndPathFindings,
  evaluateProject,
  mergeFindings,
  ratedReader,
  type CandidateArrays,
  type CandidateContext,
  type EvaluateOptions,
  type KernelState,
} from './evaluate.ts';
import { memoOf } from './candidate-memo.ts';
import { assemble, stateOf, type EvaluationState } from './evaluation-assembly.ts';
import { computeLevels } from './levels.ts';
import { dutyTermsOf } from './duty-terms.ts';
import { pathTableFor } from './path-table.ts';
import { pathAccuracyNotes } from './path-accuracy.ts';
import { basisNotes } from '../rating/basis-notes.ts';
import { ratedLevel } from '../rating/rated-level.ts';

/** Past this many changed candidates a full evaluation is as quick (a paste over a whole column). */
export const MOST_EDITED = 256;

/** Project fields no evaluation reads: they may change without a full evaluation. */
const NOT_READ = new Set([
  'format',
  'version',
  'name',
  'notes',
  'clauses',
  'fleets',
  'assessedFleet',
  'uncertainty',
  'sitePlan',
  'unreadCells',
]);

/** What changed between the evaluated project and this one, or undefined when a full evaluation is needed. */
function changesSince(
  state: EvaluationState,
  project: Project,
): { candidates: number[]; duties: number[] } | undefined {
  const before = state.project;
  const keys = new Set([...Object.keys(before), ...Object.keys(project)]);
  for (const key of keys) {
    if (key === 'candidates' || key === 'duties' || NOT_READ.has(key)) continue;
    if (
      !Object.is(
        (before as unknown as Record<string, unknown>)[key],
        (project as unknown as Record<string, unknown>)[key],
      )
    )
      return undefined; // geometry, periods, phases, receivers, method, settings, currency: full evaluation
  }
  const candidates: number[] = [];
  const was = before.candidates;
  const now = project.candidates;
  if (!Array.isArray(now) || now.length !== was.length) return undefined; // added or removed
  if (now !== was) {
    for (let i = 0; i < now.length; i++) {
      const c = now[i];
      if (c === was[i]) continue;
      if (typeof c !== 'object' || c === null || c.id !== (was[i] as Candidate).id) return undefined; // ids changed
      candidates.push(i);
      if (candidates.length > MOST_EDITED) return undefined;
    }
  }
  const duties: number[] = [];
  if (project.duties !== before.duties) {
    const dw = before.duties;
    const dn = project.duties;
    if (!Array.isArray(dn) || dn.length !== dw.length) return undefined;
    for (let u = 0; u < dn.length; u++) {
      const d = dn[u];
      const old = dw[u] as Duty;
      if (d === old) continue;
      if (typeof d !== 'object' || d === null || d.id !== old.id || d.phaseId !== old.phaseId) return undefined;
      duties.push(u);
    }
    // A duty moved (place, source height): the path table differs, full evaluation.
    if (duties.length > 0 && pathTableFor(project) !== state.k.table) return undefined;
  }
  return { candidates, duties };
}

/** Whether the level-basis note could read differently for the candidate after the edit. O(1). */
function basisWordsDiffer(before: Candidate, after: Candidate, settings: Project['settings']): boolean {
  const off = (c: Candidate) => {
    try {
      return ratedLevel(c, settings).offBasis;
    } catch {
      return undefined;
    }
  };
  const a = off(before);
  const b = off(after);
  return a !== b || (a !== undefined && (before.label || before.id) !== (after.label || after.id));
}

/**
 * The evaluation of `project` for `fleet`, from `previous` (an evaluation of an earlier
 * state of the project) where the edit allows, else a full {@link evaluateProject}. The
 * result is what evaluateProject(project, fleet, options) gives.
 * @example evaluateAfterEdit(before, { ...p, candidates: p.candidates.map((c, i) => (i === 0 ? { ...c, lwaDb: 99 } : c)) })
 */
export function evaluateAfterEdit(
  previous: Evaluation | undefined,
  project: Project,
  fleet?: Fleet,
  options: EvaluateOptions = {},
): Evaluation {
  const state = previous ? stateOf(previous) : undefined;
  // Validation reads the whole project: with it asked for, nothing is gained.
  const usable =
    state !== undefined &&
    options.skipValidation === true &&
    state.options.skipValidation === true &&
    options.permissible === state.options.permissible;
  const changes = usable ? changesSince(state, project) : undefined;
  if (!state || !changes) return evaluateProject(project, fleet, options);

  const k = state.k;
  const before = state.project;
  const dutyDb = changes.duties.length ? k.dutyDb.slice() : k.dutyDb;
  for (const u of changes.duties) dutyDb[u] = dutyTermsOf(project, project.duties[u] as Duty);
  const context: CandidateContext = { ...k.context, dutyDb, duties: project.duties };

  // The candidates to compute again: those replaced, and every candidate of a changed duty.
  const redo = new Set(changes.candidates);
  if (changes.duties.length) {
    const changedDuty = new Set(changes.duties);
    for (let i = 0; i < k.dutyOf.length; i++) if (changedDuty.has(k.dutyOf[i] as number)) redo.add(i);
  }

  const copy = redo.size > 0;
  const arrays: CandidateArrays = {
    dutyOf: copy ? k.dutyOf.slice() : k.dutyOf,
    baseDb: copy ? k.baseDb.slice() : k.baseDb,
    spectrum: copy ? k.spectrum.slice() : k.spectrum,
    withBands: copy ? k.withBands.slice() : k.withBands,
    rated: copy ? k.rated.slice() : k.rated,
    costList: copy ? k.costList.slice() : k.costList,
    lwaProblems: copy ? new Map(k.lwaProblems) : k.lwaProblems,
  };
  const nr = k.table.receiverIds.length;
  // The levels of every candidate in one buffer (./levels.ts): copied, then the changed rows written.
  const levels = copy ? k.levels.slice() : k.levels;
  const changedRows = new Set<number>();
  let costs = k.costs;
  let basisChanged = false;
  for (const i of redo) {
    const c = project.candidates[i] as Candidate;
    const old = before.candidates[i] as Candidate;
    const cost = candidateInputs(context, arrays, i, c, memoOf(c, old));
    if (cost !== k.costList[i]) {
      if (costs === k.costs) costs = { ...k.costs };
      // As in the full evaluation, an id used twice shows the cost of its last candidate.
      const last = k.candidateIndex.get(c.id) as number;
      costs[c.id] = arrays.costList[last] as DutyCost;
    }
    if (c !== old && !basisChanged) basisChanged = basisWordsDiffer(old, c, project.settings);
    if (sameRowInputs(arrays, k, i)) continue;
    const bands = arrays.withBands[i] as number;
    levels.set(
      computeLevels(
        k.table,
        Int32Array.of(arrays.dutyOf[i] as number),
        Float64Array.of(arrays.baseDb[i] as number),
        bands === 1 ? arrays.spectrum.subarray(i * 8, i * 8 + 8) : new Float64Array(8),
        Uint8Array.of(bands),
      ),
      i * nr,
    );
    changedRows.add(i);
  }

  const otherFindings = changes.duties.length ? dutyAndPathFindings(project, k.table, dutyDb) : k.otherFindings;
  const ratedOf = copy
    ? ratedReader(project.candidates, arrays.rated, project.settings, options.permissible)
    : k.ratedOf;
  const next: KernelState = { ...k, context, dutyDb, ...arrays, levels, ratedOf, costs, otherFindings };

  const found: DataProblem[] = [...arrays.lwaProblems.keys()]
    .sort((a, b) => a - b)
    .map((i) => arrays.lwaProblems.get(i) as DataProblem);
  for (const p of otherFindings) found.push(p);
  const problems: DataProblem[] = [];
  mergeFindings(problems, found);

  const notes = {
    hours: state.notes.hours,
    basis: basisChanged ? basisNotes(project) : state.notes.basis,
    accuracy: changes.duties.length ? pathAccuracyNotes(project) : state.notes.accuracy,
  };
  return assemble(project, fleet, next, problems, notes, options, { state, changedRows });
}

/** Whether candidate i's level row has the same inputs after the edit as before: duty row, base level, spectrum shares. O(8). */
function sameRowInputs(a: CandidateArrays, k: KernelState, i: number): boolean {
  if (a.dutyOf[i] !== k.dutyOf[i] || !Object.is(a.baseDb[i], k.baseDb[i]) || a.withBands[i] !== k.withBands[i])
    return false;
  for (let b = i * 8; b < i * 8 + 8; b++) if (!Object.is(a.spectrum[b], k.spectrum[b])) return false;
  return true;
}
