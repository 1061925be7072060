/**
 * The Workspace: the project being edited (./project-editing.svelte.ts, which it extends:
 * the project, undo and redo, every edit) and everything computed from it.
 *
 * The project is replaced whole on every edit (the model is immutable), so every derived
 * figure recomputes from one value. The numbers come from src/ledger (evaluation, ranking);
 * the Workspace itself computes no decibel. Side effects (saving, telling other tabs) come in
 * as constructor callbacks, so this class knows nothing of the database.
 */
import { ProjectEditing, type EditingOptions } from './project-editing.svelte.ts';
import type { AssessmentPeriod, Candidate, Duty, Phase, Project, Receiver } from '../../ledger/model/model.ts';
import type {
  DataProblem,
  Evaluation,
  OptimiseOptions,
  OptimiseResult,
  RankingRow,
} from '../../ledger/model/results.ts';
import { missingForResults, type MissingItem, type ReadinessPlace } from '../../ledger/validate/readiness.ts';
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
import type { CellProblems } from '../tables/problems.ts';
import type { TableDefinition, TableList } from '../tables/column.ts';
import type { CandidateChecks } from './checks-memo.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import { own } from '../../ledger/model/own.ts';
import { ProjectResults } from './project-results.svelte.ts';
import type { RankingFirmness } from './ranking-firmness.ts';
import { WorkspaceRankings, type ReceiverChoice } from './rankings.svelte.ts';
import { OptimiserRun, type FrontierState, type Optimiser } from './optimiser-run.svelte.ts';
import type { Progress } from '../services/worker-calls.ts';
import { WorkspaceTables } from './workspace-tables.svelte.ts';
import type { AnyTable } from './project-edits.ts';

export type { Optimiser } from './optimiser-run.svelte.ts';

export interface WorkspaceOptions extends EditingOptions {
  /** The optimiser to run; by default the worker client, loaded on first use. */
  optimise?: Optimiser;
}

export type { ReceiverChoice } from './rankings.svelte.ts';

import type { ProjectTab } from './project-tabs.ts';
export { PROJECT_TABS, type ProjectTab } from './project-tabs.ts';

export class Workspace extends ProjectEditing {
  #optimiser: OptimiserRun;

  /** The open tab. */
  tab = $state<ProjectTab>('candidates');
  /** Receiver the ranking and the candidate table's level column are for. */
  selectedReceiverId = $state<ReceiverChoice>('worst');

  constructor(project: Project, options: WorkspaceOptions = {}) {
    super(project, options);
    this.#optimiser = new OptimiserRun(options.optimise);
    this.changed();
  }

  // ---- reading ------------------------------------------------------------------------

  readonly #results = new ProjectResults(() => this.project);

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

  readonly #rank = new WorkspaceRankings({
    project: () => this.project,
    evaluation: () => this.evaluation,
    dutyId: () => this.dutyId,
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
    project: () => this.project,
    evaluation: () => this.evaluation,
    ranking: () => this.#rank.byCandidate,
    checks: () => this.#results.checks,
    checkOf: (candidate) => this.#results.checkOf(candidate),
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

  protected override changed(): void {
    this.#tables.changed();
  }

  /**
   * Changes whenever what a table's cells show may change: made from the three values every
   * figure, message and kept text of a cell is computed from (the project, the receiver the
   * levels are for, the validation found after an edit of a large project), never from what
   * is computed from them, so a grid that waits for it re-reads its rows once per change.
   */
  readonly #cellRevision = $derived.by(() => ({
    project: this.edits.current,
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
  problem(list: TableList, rowId: string, columnId: string, row?: unknown): string | undefined {
    return this.#tables.problem(list, rowId, columnId, row);
  }

  /** One candidate of the open project by id (a look-up kept across edits, not a search). */
  candidateOf(candidateId: string): Candidate | undefined {
    return this.#rank.candidateOf(candidateId);
  }

  /** One candidate's checks (the same as `candidateChecks[candidate.id]`, without making every machine's). */
  checkOf(candidate: Candidate): CandidateCheck {
    return this.#results.checkOf(candidate);
  }

  /**
   * What a candidate row's cells show besides the machine itself and the columns: its ranking
   * row (kept as the same object while its figures are), its cost for the duty, its checks,
   * whether it has a message (a row with one is always re-read) and the kept unread texts.
   * The grid re-reads a row only when one of these changed, so an edit re-reads the rows it moved.
   */
  candidateRowInputs(rowId: string, row: Candidate): readonly unknown[] {
    return [
      this.rankingOf(rowId),
      own(this.evaluation?.costs, rowId)?.total,
      this.#results.checkOf(row),
      this.flagged('candidates', rowId, row) ? {} : false,
      this.project.unreadCells,
    ];
  }

  /** Whether any cell of a row may carry a message or a kept text (false: none does). */
  flagged(list: TableList, rowId: string, row?: unknown): boolean {
    return this.#tables.flagged(list, rowId, row);
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
    const stored = storedFleet(this.project, OPTIMISER_FLEET);
    if (stored) return isOutOfDate(this.project, stored);
    return this.#optimiser.staleFor(this.project);
  }

  /** The optimiser's latest fleet as kept in the project (survives a reload), if any. */
  get optimiserFleet(): NamedFleet | undefined {
    return storedFleet(this.project, OPTIMISER_FLEET);
  }

  /**
   * Finds the cheapest compliant fleet for the current project and keeps it in the project
   * as the fleet {@link OPTIMISER_FLEET} (one undo step), marked with the inputs it was found for.
   */
  async runOptimiser(options: OptimiseOptions = {}): Promise<void> {
    const project = this.project;
    await this.#optimiser.run(project, options, (result) => {
      // Kept as soon as the fleets are known: the frontier may still be traced for a while.
      const fleet: NamedFleet = {
        name: OPTIMISER_FLEET,
        choice: { ...result.best.fleet },
        origin: 'optimiser',
        foundFor: inputsFingerprint(project),
      };
      if (options.budget !== undefined) fleet.budget = options.budget;
      this.commit(withFleet(this.project, fleet));
    });
  }

  // ---- fleets -------------------------------------------------------------------------

  /** Makes a fleet ('baseline' or a stored one) the one assessed (one undo step). */
  useFleet(name: string): void {
    this.commit(withAssessedFleet(this.project, name));
  }

  /** Keeps a fleet under a user's name; returns why not when the name cannot be used. */
  saveFleet(name: string, choice: Fleet, assess = true): string | undefined {
    const problem = fleetNameProblem(this.project, name);
    if (problem) return problem;
    let next = withFleet(this.project, { name: name.trim(), choice: { ...choice }, origin: 'user' });
    if (assess) next = withAssessedFleet(next, name.trim());
    this.commit(next);
    return undefined;
  }

  /** Removes a stored fleet; the baseline is assessed when it was the assessed one. */
  removeFleet(name: string): void {
    this.commit(withoutFleet(this.project, name));
  }

  /**
   * Puts one machine into the assessed fleet for its duty. A user's fleet is changed in
   * place; the baseline or the optimiser's fleet is first copied into a new user's fleet
   * ("My fleet", "My fleet 2", …), which then is assessed. One undo step.
   */
  chooseForFleet(candidateId: string): void {
    const candidate = this.project.candidates.find((c) => c.id === candidateId);
    if (!candidate) return;
    const current = this.#assessed;
    const choice = { ...current.fleet, [candidate.dutyId]: candidateId };
    if (current.stored?.origin === 'user') {
      this.commit(withFleet(this.project, { ...current.stored, choice }));
      return;
    }
    let name = 'My fleet';
    for (let n = 2; fleetNameProblem(this.project, name); n++) name = `My fleet ${n}`;
    this.commit(withAssessedFleet(withFleet(this.project, { name, choice, origin: 'user' }), name));
  }

  selectReceiver(receiver: ReceiverChoice): void {
    this.selectedReceiverId = receiver;
  }
}
