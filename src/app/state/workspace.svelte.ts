/**
 * The Workspace: the project being edited and everything computed from it.
 *
 * The project lives in a private `$state.raw` and is replaced whole on every edit (the
 * model is immutable), so undo and redo are a stack of snapshots and every derived figure
 * recomputes from one value. The numbers come from src/ledger (evaluation, ranking); the
 * Workspace itself computes no decibel. Side effects (saving, telling other tabs) come in
 * as constructor callbacks, so this class knows nothing of the database.
 */
import { stepWords } from './step-words.ts';
import type { Register } from '../../ledger/register/model.ts';
import { updateLinkedCandidates } from '../../ledger/register/register-link.ts';
import type {
  UncertaintySettings,
  AssessmentPeriod,
  Candidate,
  Duty,
  Phase,
  Project,
  ProjectSettings,
  Propagation,
  Receiver,
} from '../../ledger/model/model.ts';
import type {
  DataProblem,
  Evaluation,
  OptimiseOptions,
  OptimiseResult,
  RankingRow,
} from '../../ledger/model/results.ts';
import { missingForResults, type MissingItem, type ReadinessPlace } from '../../ledger/validate/readiness.ts';
import { referencesTo, withReferencedRowsDeleted, type ReferenceChoice, type RowReferences } from './row-references.ts';
import {
  OPTIMISER_FLEET,
  assessedFleet,
  fleetNameProblem,
  inputsFingerprint,
  isOutOfDate,
  storedFleet,
  withAssessedFleet,
  withFleet,
  withoutFleet,
} from '../../ledger/model/fleets.ts';
import type { Fleet, NamedFleet } from '../../ledger/model/model.ts';
import { complianceStatement, type ComplianceStatement } from '../../ledger/checks/compliance-statement.ts';
import { answerClauses, type ClausesAnswer } from '../../ledger/clauses/answer.ts';
import { EditHistory } from './edit-history.svelte.ts';
import type { MergeConflict } from '../../ledger/file/project-merge.ts';
import { applyCellTexts, type CellChange } from '../tables/apply.ts';
import type { CellProblems } from '../tables/problems.ts';
import { blankCandidate } from '../tables/candidates.ts';
import type { TableDefinition, TableList } from '../tables/column.ts';
import type { CandidateChecks } from './checks-memo.ts';
import { ProjectResults } from './project-results.svelte.ts';
import type { RankingFirmness } from './ranking-firmness.ts';
import { WorkspaceRankings, type ReceiverChoice } from './rankings.svelte.ts';
import { OptimiserRun, type FrontierState, type Optimiser } from './optimiser-run.svelte.ts';
import type { Progress } from '../services/worker-calls.ts';
import { WorkspaceTables } from './workspace-tables.svelte.ts';
import {
  withPeriodAdded,
  withPeriodChanged,
  withCandidateAdded,
  withCandidatesAdded,
  withExcluded,
  withPeriodRemoved,
  withPinned,
  withRowAdded,
  withRowsDeleted,
  withSettings,
  writerTable,
  type AnyTable,
} from './project-edits.ts';

export type { Optimiser } from './optimiser-run.svelte.ts';

export interface WorkspaceOptions {
  /** Called after every edit, undo and redo with the new project (not for {@link Workspace.replaceFromOutside}). */
  onchange?: (project: Project) => void;
  /** An undo or redo left cells alone because another tab changed them since. */
  onskipped?: (conflicts: MergeConflict[], action: 'undo' | 'redo') => void;
  /** The optimiser to run; by default the worker client, loaded on first use. */
  optimise?: Optimiser;
}

export type { ReceiverChoice } from './rankings.svelte.ts';

/** The tabs of an open project. */
export const PROJECT_TABS = [
  'candidates',
  'duties',
  'receivers',
  'phases',
  'clauses',
  'plan',
  'results',
  'quick',
  'register',
  'settings',
] as const;
export type ProjectTab = (typeof PROJECT_TABS)[number];

export class Workspace {
  #edits: EditHistory;
  #optimiser: OptimiserRun;

  /** The open tab. */
  tab = $state<ProjectTab>('candidates');
  /** Duty whose ranking is shown; undefined → the first duty. */
  selectedDutyId = $state<string | undefined>();
  /** Receiver the ranking and the candidate table's level column are for. */
  selectedReceiverId = $state<ReceiverChoice>('worst');

  constructor(project: Project, options: WorkspaceOptions = {}) {
    this.#edits = new EditHistory(project, {
      ...(options.onchange ? { onchange: options.onchange } : {}),
      ...(options.onskipped ? { onskipped: options.onskipped } : {}),
      onreplaced: () => this.#changed(),
    });
    this.#optimiser = new OptimiserRun(options.optimise);
    this.#changed();
  }

  // ---- reading ------------------------------------------------------------------------

  get project(): Project {
    return this.#edits.current;
  }

  get #project(): Project {
    return this.#edits.current;
  }

  get separator(): '.' | ',' {
    return this.#project.settings.decimalSeparator;
  }

  get canUndo(): boolean {
    return this.#edits.canUndo;
  }

  get canRedo(): boolean {
    return this.#edits.canRedo;
  }

  readonly #results = new ProjectResults(() => this.#project);

  readonly #missing = $derived.by(() => missingForResults(this.project));

  /** What the project still needs before results can be computed (empty when nothing). */
  get missing(): MissingItem[] {
    return this.#missing;
  }

  /** Opens the tab where a missing item is filled in. */
  goToPlace(place: ReadinessPlace): void {
    this.tab = place === 'periods' ? 'settings' : place;
  }

  /** The fleet being assessed (the baseline unless another is chosen): its name, choice, and the stored fleet. */
  readonly #assessed = $derived.by(() => assessedFleet(this.project));
  get assessed(): { name: string; fleet: Fleet; stored?: NamedFleet } {
    return this.#assessed;
  }

  readonly #statement = $derived.by(() => {
    const evaluation = this.evaluation;
    return evaluation ? complianceStatement(this.project, evaluation, this.#assessed.name) : undefined;
  });
  /** The compliance statement of the assessed fleet, per phase and receiver. */
  get compliance(): ComplianceStatement | undefined {
    return this.#statement;
  }

  readonly #clauses = $derived.by((): ClausesAnswer | undefined => {
    const evaluation = this.evaluation;
    if (!evaluation || (this.project.clauses ?? []).length === 0) return undefined;
    try {
      // The evaluation skips validation for speed; the clause answer needs the clauses' own problems.
      return answerClauses(this.project, { ...evaluation, problems: this.dataProblems });
    } catch {
      return undefined;
    }
  });
  /** The assessed fleet's answer to the tender clauses, clause by clause (undefined with no clause or no evaluation). */
  get clauseAnswer(): ClausesAnswer | undefined {
    return this.#clauses;
  }

  /** Finds the cheapest fleet that meets every limit and clause and assesses it (one click in the clauses tab). */
  async assessCheapestMeetingClauses(): Promise<void> {
    await this.runOptimiser();
    if (this.optimiserResult && !this.optimiserError && this.optimiserFleet) this.useFleet(OPTIMISER_FLEET);
  }

  /** The evaluation of the assessed fleet, or undefined when the ledger could not evaluate (see {@link evaluationError}). */
  get evaluation(): Evaluation | undefined {
    return this.#results.evaluation;
  }

  get evaluationError(): string | undefined {
    return this.#results.evaluationError;
  }

  /** What a buyer or reviewer checks on every candidate (ledger's candidate checks), by candidate id. */
  get candidateChecks(): CandidateChecks {
    return this.#results.checks;
  }

  /** The duty the ranking is for (the chosen one, else the first). */
  readonly #dutyId = $derived.by(() => {
    const duties = this.#project.duties;
    return duties.find((d) => d.id === this.selectedDutyId)?.id ?? duties[0]?.id;
  });

  get dutyId(): string | undefined {
    return this.#dutyId;
  }

  readonly #rank = new WorkspaceRankings({
    project: () => this.#project,
    evaluation: () => this.evaluation,
    dutyId: () => this.#dutyId,
    receiver: () => this.selectedReceiverId,
  });

  /** The ranking of the chosen duty at the chosen receiver. */
  get ranking(): RankingRow[] {
    return this.#rank.ranking;
  }

  /** Whether the chosen ranking's order could change within the declared uncertainty K, and which pairs are too close to call. */
  get rankingFirmness(): RankingFirmness {
    return this.#rank.firmness;
  }

  /** The ranking row of one candidate (in its own duty, at the chosen receiver). */
  rankingOf(candidateId: string): RankingRow | undefined {
    return this.#rank.rankingOf(candidateId);
  }

  /**
   * The receiver a duty is ranked at: the chosen one, or for 'worst' the receiver with the
   * least margin in the duty's phase (else the first receiver, else the reference receiver).
   */
  receiverFor(dutyId: string): string {
    return this.#rank.receiverFor(dutyId);
  }

  /** Words for the chosen receiver, for column headers. */
  get receiverName(): string {
    return this.#rank.receiverName;
  }

  readonly #tables = new WorkspaceTables({
    project: () => this.#project,
    evaluation: () => this.evaluation,
    ranking: () => this.#rank.byCandidate,
    checks: () => this.#results.checks,
    receiverName: () => this.receiverName,
  });

  get candidateTable(): TableDefinition<Candidate> {
    return this.#tables.candidateTable;
  }
  get dutyTable(): TableDefinition<Duty> {
    return this.#tables.dutyTable;
  }
  get receiverTable(): TableDefinition<Receiver> {
    return this.#tables.receiverTable;
  }
  get phaseTable(): TableDefinition<Phase> {
    return this.#tables.phaseTable;
  }
  get periodTable(): TableDefinition<AssessmentPeriod> {
    return this.#tables.periodTable;
  }

  table(list: TableList): AnyTable {
    return this.#tables.table(list);
  }

  /** Every data problem: validation (at once for a small project, shortly after an edit for a large one) and what the evaluation found. */
  get dataProblems(): DataProblem[] {
    return this.#tables.dataProblems;
  }

  #changed(): void {
    this.#tables.changed();
  }

  /**
   * Changes whenever what a table's cells show may change: made from the three values every
   * figure, message and kept text of a cell is computed from (the project, the receiver the
   * levels are for, the validation found after an edit of a large project), never from what
   * is computed from them, so a grid that waits for it re-reads its rows once per change.
   */
  readonly #cellRevision = $derived.by(() => ({
    project: this.#edits.current,
    receiver: this.selectedReceiverId,
    validation: this.#tables.deferredValidation,
  }));
  get cellRevision(): object {
    return this.#cellRevision;
  }

  /** Problems of one table's cells by {@link cellKey}. */
  problems(list: TableList): CellProblems {
    return this.#tables.problems(list);
  }

  /** The message for one cell, or undefined when it has none. */
  problem(list: TableList, rowId: string, columnId: string): string | undefined {
    return this.#tables.problem(list, rowId, columnId);
  }

  /** The text kept for a cell that could not be read, shown in place of the value. */
  rawText(list: TableList, rowId: string, columnId: string): string | undefined {
    return this.#tables.rawText(list, rowId, columnId);
  }

  // ---- optimiser ----------------------------------------------------------------------

  get optimiserResult(): OptimiseResult | undefined {
    return this.#optimiser.result;
  }
  get optimiserRunning(): boolean {
    return this.#optimiser.running;
  }
  get optimiserError(): string | undefined {
    return this.#optimiser.error;
  }
  /** What the run under way is doing and the share done, when it has said. */
  get optimiserProgress(): Progress | undefined {
    return this.#optimiser.progress;
  }
  /** Where the exact frontier of the optimiser's result stands: tracing, complete or stopped, with its count. */
  get optimiserFrontier(): FrontierState | undefined {
    return this.#optimiser.frontier;
  }
  /**
   * Stops the run under way: before the fleet is found the earlier result and stored fleet stay; while the
   * frontier is traced, the fleet and the frontier points found so far stay.
   */
  cancelOptimiser(): void {
    this.#optimiser.cancel();
  }
  /** Loads the solver ahead of need (when the optimiser is opened), so the first run does not wait for it. */
  warmOptimiser(): void {
    this.#optimiser.warm();
  }
  /** True when the project's inputs changed since the optimiser's result (this session's or the stored one) was found. */
  get optimiserStale(): boolean {
    const stored = storedFleet(this.#project, OPTIMISER_FLEET);
    if (stored) return isOutOfDate(this.#project, stored);
    return this.#optimiser.staleFor(this.#project);
  }

  /** The optimiser's latest fleet as kept in the project (survives a reload), if any. */
  get optimiserFleet(): NamedFleet | undefined {
    return storedFleet(this.#project, OPTIMISER_FLEET);
  }

  /**
   * Finds the cheapest compliant fleet for the current project and keeps it in the project
   * as the fleet {@link OPTIMISER_FLEET} (one undo step), marked with the inputs it was found for.
   */
  async runOptimiser(options: OptimiseOptions = {}): Promise<void> {
    const project = this.#project;
    await this.#optimiser.run(project, options, (result) => {
      // Kept as soon as the fleets are known: the frontier may still be traced for a while.
      const fleet: NamedFleet = {
        name: OPTIMISER_FLEET,
        choice: { ...result.best.fleet },
        origin: 'optimiser',
        foundFor: inputsFingerprint(project),
      };
      if (options.budget !== undefined) fleet.budget = options.budget;
      this.#commit(withFleet(this.#project, fleet));
    });
  }

  // ---- fleets -------------------------------------------------------------------------

  /** Makes a fleet ('baseline' or a stored one) the one assessed (one undo step). */
  useFleet(name: string): void {
    this.#commit(withAssessedFleet(this.#project, name));
  }

  /** Keeps a fleet under a user's name; returns why not when the name cannot be used. */
  saveFleet(name: string, choice: Fleet, assess = true): string | undefined {
    const problem = fleetNameProblem(this.#project, name);
    if (problem) return problem;
    let next = withFleet(this.#project, { name: name.trim(), choice: { ...choice }, origin: 'user' });
    if (assess) next = withAssessedFleet(next, name.trim());
    this.#commit(next);
    return undefined;
  }

  /** Removes a stored fleet; the baseline is assessed when it was the assessed one. */
  removeFleet(name: string): void {
    this.#commit(withoutFleet(this.#project, name));
  }

  /**
   * Puts one machine into the assessed fleet for its duty. A user's fleet is changed in
   * place; the baseline or the optimiser's fleet is first copied into a new user's fleet
   * ("My fleet", "My fleet 2", …), which then is assessed. One undo step.
   */
  chooseForFleet(candidateId: string): void {
    const candidate = this.#project.candidates.find((c) => c.id === candidateId);
    if (!candidate) return;
    const current = this.#assessed;
    const choice = { ...current.fleet, [candidate.dutyId]: candidateId };
    if (current.stored?.origin === 'user') {
      this.#commit(withFleet(this.#project, { ...current.stored, choice }));
      return;
    }
    let name = 'My fleet';
    for (let n = 2; fleetNameProblem(this.#project, name); n++) name = `My fleet ${n}`;
    this.#commit(withAssessedFleet(withFleet(this.#project, { name, choice, origin: 'user' }), name));
  }

  // ---- editing ------------------------------------------------------------------------

  #commit(next: Project): void {
    this.#edits.commit(next);
  }

  /** Applies one user action's cell edits to a table (one undo step). */
  applyCellTexts(list: TableList, changes: readonly CellChange[]): void {
    if (!changes.length) return;
    const table = writerTable(this.#project, list) as TableDefinition<{ id: string }>;
    let hint: { id: string } | undefined;
    if (list === 'candidates' && this.selectedDutyId) {
      const candidates = this.#project.candidates;
      for (let i = candidates.length - 1; i >= 0 && !hint; i--)
        if (candidates[i]!.dutyId === this.selectedDutyId) hint = candidates[i];
      hint ??= blankCandidate('', this.selectedDutyId);
    }
    this.#commit(applyCellTexts(this.#project, table, changes, hint));
  }

  /** What refers to rows about to be deleted (undefined when nothing does), for the question asked before deleting. */
  referencesTo(list: TableList, ids: readonly string[]): RowReferences | undefined {
    return referencesTo(this.#project, list, ids);
  }

  /** Deletes rows others refer to, moving the dependants or deleting them too (one undo step). */
  deleteReferencedRows(refs: RowReferences, choice: ReferenceChoice): void {
    this.#commit(withReferencedRowsDeleted(this.#project, refs, choice));
  }

  /** Deletes rows (one undo step). Deleting a duty deletes its candidates with it. */
  deleteRows(list: TableList, ids: readonly string[]): void {
    if (ids.length) this.#commit(withRowsDeleted(this.#project, list, ids));
  }

  /**
   * Appends a blank row to a table (one undo step) and returns its id; a machine joins the
   * chosen duty. Undefined when it cannot be added (a machine needs a duty first).
   */
  addRow(list: TableList): string | undefined {
    const added = withRowAdded(this.#project, list, this.#dutyId);
    if (!added) return undefined;
    this.#commit(added.next);
    return added.id;
  }

  /** Adds a blank candidate to a duty and returns its id. */
  addCandidate(dutyId: string, fields: Partial<Omit<Candidate, 'id' | 'dutyId'>> = {}): string {
    const { next, id } = withCandidateAdded(this.#project, dutyId, fields);
    this.#commit(next);
    return id;
  }

  /**
   * Adds candidates read from a supplier's list, with the text of their unread cells, as
   * one undo step. Ids already in use are replaced by free ones.
   */
  addCandidates(candidates: readonly Candidate[], unreadCells: Record<string, string> = {}): void {
    if (candidates.length) this.#commit(withCandidatesAdded(this.#project, candidates, unreadCells));
  }

  /**
   * Brings the named candidates copied from the register up to date with it (one undo
   * step); only on the user's request — a copy is never changed by the register itself.
   */
  updateFromRegister(register: Register, candidateIds: readonly string[]): void {
    if (candidateIds.length) this.#commit(updateLinkedCandidates(this.#project, register, candidateIds));
  }

  /** Pins a candidate (the optimiser must choose it); pinning one unpins the others of its duty. */
  setPinned(candidateId: string, pinned: boolean): void {
    this.#commit(withPinned(this.#project, candidateId, pinned));
  }

  /** Excludes a candidate (the optimiser must not choose it); excluding unpins it. */
  setExcluded(candidateId: string, excluded: boolean): void {
    this.#commit(withExcluded(this.#project, candidateId, excluded));
  }

  setName(name: string): void {
    if (name !== this.#project.name) this.#commit({ ...this.#project, name });
  }

  setCurrency(currency: string): void {
    if (currency !== this.#project.currency) this.#commit({ ...this.#project, currency });
  }

  setPropagation(propagation: Propagation): void {
    this.#commit({ ...this.#project, propagation });
  }

  setNotes(notes: string): void {
    this.#commit({ ...this.#project, notes });
  }

  /**
   * Changes project settings. A new decimal separator re-reads the kept text of unread
   * cells, so "104,5" typed before the switch to a decimal comma is now read.
   */
  setSettings(patch: Partial<ProjectSettings>): void {
    this.#commit(withSettings(this.#project, patch));
  }

  /** Changes settings of the uncertainty model (the spreads behind the probability of compliance). */
  setUncertainty(patch: Partial<UncertaintySettings>): void {
    this.#commit({ ...this.#project, uncertainty: { ...(this.#project.uncertainty ?? {}), ...patch } });
  }

  /** Changes an assessment period's name or hours. */
  setPeriod(periodId: string, patch: Partial<{ name: string; start: string; end: string }>): void {
    this.#commit(withPeriodChanged(this.#project, periodId, patch));
  }

  /** Adds an assessment period and returns its id. */
  addPeriod(name = 'New period', start = '07:00', end = '19:00'): string {
    const { next, id } = withPeriodAdded(this.#project, name, start, end);
    this.#commit(next);
    return id;
  }

  /**
   * Removes an assessment period and the receivers' limits for it. Refused, with words
   * saying why, while a phase is assessed over it.
   * @returns undefined when removed, else the reason
   */
  removePeriod(periodId: string): string | undefined {
    const outcome = withPeriodRemoved(this.#project, periodId);
    if (!outcome) return undefined;
    if ('refused' in outcome) return outcome.refused;
    this.#commit(outcome.next);
    return undefined;
  }

  /** Commits an edit made on the site plan (app/plan/plan-edits.ts) as one undo step; an unchanged project is no step. */
  editPlan(next: Project): void {
    if (next !== this.#project) this.#commit(next);
  }

  /** What the latest undo or redo did, in words ("Undid the edit to machine “Dumper 6 t”"); '' before any. */
  lastStep = $state('');

  /** Undoes this tab's latest edit; returns what it undid, in words. */
  undo(): string {
    const step = this.#edits.undo();
    this.lastStep = step ? `Undid ${stepWords(step.before, step.after, 'before')}` : 'Nothing to undo';
    return this.lastStep;
  }

  /** Redoes the latest undone edit; returns what it redid, in words. */
  redo(): string {
    const step = this.#edits.redo();
    this.lastStep = step ? `Redid ${stepWords(step.before, step.after)}` : 'Nothing to redo';
    return this.lastStep;
  }

  /**
   * Takes a project changed elsewhere (another tab). It replaces the current one without
   * an undo step and without calling `onchange`; the undo history is kept, and an undo
   * then undoes only this tab's own edit, leaving the other tab's in place.
   */
  replaceFromOutside(project: Project): void {
    this.#edits.replace(project);
  }

  selectDuty(dutyId: string): void {
    this.selectedDutyId = dutyId;
  }

  selectReceiver(receiver: ReceiverChoice): void {
    this.selectedReceiverId = receiver;
  }
}
