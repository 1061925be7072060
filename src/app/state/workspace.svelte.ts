/**
 * The Workspace: the project being edited and everything computed from it.
 *
 * The project lives in a private `$state.raw` and is replaced whole on every edit (the
 * model is immutable), so undo and redo are a stack of snapshots and every derived figure
 * recomputes from one value. The numbers come from src/ledger (evaluation, ranking); the
 * Workspace itself computes no decibel. Side effects (saving, telling other tabs) come in
 * as constructor callbacks, so this class knows nothing of the database.
 */
import type { AssessmentPeriod, Candidate, Duty, Phase, Project, ProjectSettings, Propagation, Receiver } from '../../ledger/model.ts';
import { REFERENCE_RECEIVER_ID } from '../../ledger/model.ts';
import type { DataProblem, Evaluation, OptimiseOptions, OptimiseResult, RankingRow } from '../../ledger/results.ts';
import { evaluateProject } from '../../ledger/evaluate.ts';
import { validateProject } from '../../ledger/validate.ts';
import { rankDuty } from '../../ledger/rank.ts';
import { History } from './history.ts';
import { applyCellTexts, deleteTableRows, rereadUnread, type CellChange } from '../tables/apply.ts';
import { tableProblems, cellKey, type CellProblems } from '../tables/problems.ts';
import { blankCandidate, candidateTable, groupByDuty, type CandidateFigures } from '../tables/candidates.ts';
import { dutyTable } from '../tables/duties.ts';
import { receiverTable } from '../tables/receivers.ts';
import { phaseTable } from '../tables/phases.ts';
import { periodTable } from '../tables/periods.ts';
import { nextId, type TableContext, type TableDefinition, type TableList } from '../tables/column.ts';
import { ChecksMemo, type CandidateChecks } from './checks-memo.ts';
import { checkNotice } from '../tables/check-columns.ts';
import { rankingFirmness, type RankingFirmness } from './ranking-firmness.ts';

/** Runs the optimiser (in a worker in the app; directly in tests). */
export type Optimiser = (project: Project, options: OptimiseOptions) => Promise<OptimiseResult>;

export interface WorkspaceOptions {
  /** Called after every edit, undo and redo with the new project (not for {@link Workspace.replaceFromOutside}). */
  onchange?: (project: Project) => void;
  /** The optimiser to run; by default the worker client, loaded on first use. */
  optimise?: Optimiser;
}

/** The receiver choice for rankings: a receiver id, or the worst-affected receiver of the duty's phase. */
export type ReceiverChoice = string | 'worst';

type AnyTable = TableDefinition<Candidate> | TableDefinition<Duty> | TableDefinition<Receiver> | TableDefinition<Phase> | TableDefinition<AssessmentPeriod>;

// A glob rather than a plain import() so the Workspace builds before the client exists.
const optimiseClient = import.meta.glob<{ optimiseInWorker: Optimiser }>('../services/optimise-client.ts');

const defaultOptimise: Optimiser = async (project, options) => {
  const load = optimiseClient['../services/optimise-client.ts'];
  if (!load) throw new Error('The optimiser is not available in this build.');
  const { optimiseInWorker } = await load();
  return optimiseInWorker(project, options);
};

export class Workspace {
  #project: Project = $state.raw(undefined as unknown as Project);
  #history = new History<Project>();
  /** Bumped on every history change so `canUndo`/`canRedo` are reactive. */
  #historyTick = $state(0);
  #onchange: ((project: Project) => void) | undefined;
  #optimise: Optimiser;

  /** Duty whose ranking is shown; undefined → the first duty. */
  selectedDutyId = $state<string | undefined>();
  /** Receiver the ranking and the candidate table's level column are for. */
  selectedReceiverId = $state<ReceiverChoice>('worst');

  #optimiserResult = $state.raw<OptimiseResult | undefined>();
  #optimiserFor = $state.raw<Project | undefined>();
  #optimiserRunning = $state(false);
  #optimiserError = $state<string | undefined>();

  constructor(project: Project, options: WorkspaceOptions = {}) {
    this.#project = project;
    this.#onchange = options.onchange;
    this.#optimise = options.optimise ?? defaultOptimise;
    this.#changed();
  }

  // ---- reading ------------------------------------------------------------------------

  get project(): Project {
    return this.#project;
  }

  get separator(): '.' | ',' {
    return this.#project.settings.decimalSeparator;
  }

  get canUndo(): boolean {
    void this.#historyTick;
    return this.#history.canUndo;
  }

  get canRedo(): boolean {
    void this.#historyTick;
    return this.#history.canRedo;
  }

  /** The evaluation of the baseline fleet, or undefined when the ledger could not evaluate (see {@link evaluationError}). */
  readonly #evaluated = $derived.by((): { evaluation?: Evaluation; error?: string } => {
    try {
      return { evaluation: evaluateProject(this.#project, undefined, { skipValidation: true }) };
    } catch (error) {
      return { error: error instanceof Error ? error.message : String(error) };
    }
  });

  get evaluation(): Evaluation | undefined {
    return this.#evaluated.evaluation;
  }

  get evaluationError(): string | undefined {
    return this.#evaluated.error;
  }

  #checksMemo = new ChecksMemo();
  /**
   * What a buyer or reviewer checks on every candidate (ledger's candidate checks):
   * permissible level, rated LWA and stand-in, character penalty, operator exposure; by
   * candidate id. Unchanged candidates reuse their check (./checks-memo.ts).
   */
  readonly #candidateChecks = $derived(this.#checksMemo.checks(this.#project));

  get candidateChecks(): CandidateChecks {
    return this.#candidateChecks;
  }

  /** The duty the ranking is for (the chosen one, else the first). */
  readonly #dutyId = $derived.by(() => {
    const duties = this.#project.duties;
    return duties.find((d) => d.id === this.selectedDutyId)?.id ?? duties[0]?.id;
  });

  get dutyId(): string | undefined {
    return this.#dutyId;
  }

  /** Ranking rows of every duty at the chosen receiver, by candidate id. O(Σ ranking cost per duty). */
  readonly #rankings = $derived.by(() => {
    const evaluation = this.evaluation;
    const byCandidate = new Map<string, RankingRow>();
    const byDuty = new Map<string, RankingRow[]>();
    if (!evaluation) return { byCandidate, byDuty };
    for (const duty of this.#project.duties) {
      let rows: RankingRow[];
      try {
        rows = rankDuty(this.#project, evaluation, duty.id, this.receiverFor(duty.id));
      } catch {
        rows = [];
      }
      byDuty.set(duty.id, rows);
      for (const row of rows) byCandidate.set(row.candidateId, row);
    }
    return { byCandidate, byDuty };
  });

  /** The ranking of the chosen duty at the chosen receiver. */
  get ranking(): RankingRow[] {
    const id = this.#dutyId;
    return id ? (this.#rankings.byDuty.get(id) ?? []) : [];
  }

  /** Whether the chosen ranking's order could change within the declared uncertainty K, and which pairs are too close to call. */
  readonly #firmness = $derived(rankingFirmness(this.ranking, this.#project.candidates));

  get rankingFirmness(): RankingFirmness {
    return this.#firmness;
  }

  /** The ranking row of one candidate (in its own duty, at the chosen receiver). */
  rankingOf(candidateId: string): RankingRow | undefined {
    return this.#rankings.byCandidate.get(candidateId);
  }

  /**
   * The receiver a duty is ranked at: the chosen one, or for 'worst' the receiver with the
   * least margin in the duty's phase (else the first receiver, else the reference receiver).
   */
  receiverFor(dutyId: string): string {
    const chosen = this.selectedReceiverId;
    const receivers = this.#project.receivers;
    if (chosen !== 'worst' && (chosen === REFERENCE_RECEIVER_ID || receivers.some((r) => r.id === chosen))) return chosen;
    const duty = this.#project.duties.find((d) => d.id === dutyId);
    const worst = duty ? this.evaluation?.worstReceiverByPhase[duty.phaseId] : undefined;
    return worst ?? receivers[0]?.id ?? REFERENCE_RECEIVER_ID;
  }

  /** Words for the chosen receiver, for column headers. */
  get receiverName(): string {
    const chosen = this.selectedReceiverId;
    if (chosen === REFERENCE_RECEIVER_ID) return 'reference receiver';
    return this.#project.receivers.find((r) => r.id === chosen)?.name ?? 'worst receiver';
  }

  readonly #context = $derived<TableContext>({ project: this.#project, separator: this.#project.settings.decimalSeparator });

  readonly #candidateTable = $derived.by(() => {
    const figures: CandidateFigures = {
      ...this.#context,
      ranking: this.#rankings.byCandidate,
      checks: this.#candidateChecks,
      receiverName: this.receiverName,
      ...(this.evaluation ? { evaluation: this.evaluation } : {}),
    };
    return candidateTable(figures);
  });
  readonly #dutyTable = $derived(dutyTable(this.#context));
  readonly #receiverTable = $derived(receiverTable(this.#context));
  readonly #phaseTable = $derived(phaseTable(this.#context));
  readonly #periodTable = $derived(periodTable(this.#context));

  get candidateTable(): TableDefinition<Candidate> {
    return this.#candidateTable;
  }
  get dutyTable(): TableDefinition<Duty> {
    return this.#dutyTable;
  }
  get receiverTable(): TableDefinition<Receiver> {
    return this.#receiverTable;
  }
  get phaseTable(): TableDefinition<Phase> {
    return this.#phaseTable;
  }
  get periodTable(): TableDefinition<AssessmentPeriod> {
    return this.#periodTable;
  }

  table(list: TableList): AnyTable {
    switch (list) {
      case 'candidates':
        return this.#candidateTable;
      case 'duties':
        return this.#dutyTable;
      case 'receivers':
        return this.#receiverTable;
      case 'phases':
        return this.#phaseTable;
      case 'periods':
        return this.#periodTable;
    }
  }

  /** A table for writing only: same parsing, no computed figures needed. */
  #writer(list: TableList): AnyTable {
    const ctx: TableContext = { project: this.#project, separator: this.separator };
    switch (list) {
      case 'candidates':
        return candidateTable({ ...ctx, ranking: new Map(), receiverName: '' });
      case 'duties':
        return dutyTable(ctx);
      case 'receivers':
        return receiverTable(ctx);
      case 'phases':
        return phaseTable(ctx);
      case 'periods':
        return periodTable(ctx);
    }
  }

  /** Validation of a large project, found shortly after the edit so the results show first. */
  #deferredValidation = $state.raw<DataProblem[]>([]);
  #validationTimer: ReturnType<typeof setTimeout> | undefined;

  /**
   * Every data problem: validation (at once for a small project, shortly after an edit for
   * a large one) and what the evaluation found.
   */
  readonly #dataProblems = $derived.by((): DataProblem[] => {
    const found = this.evaluation?.problems ?? [];
    const validation = this.#project.candidates.length <= SYNC_VALIDATION_LIMIT ? safeValidate(this.#project) : this.#deferredValidation;
    return found.length ? [...validation, ...found] : validation;
  });

  get dataProblems(): DataProblem[] {
    return this.#dataProblems;
  }

  #changed(): void {
    if (this.#project.candidates.length <= SYNC_VALIDATION_LIMIT) return;
    clearTimeout(this.#validationTimer);
    this.#validationTimer = setTimeout(() => {
      this.#deferredValidation = safeValidate(this.#project);
    }, DEFERRED_VALIDATION_MS);
  }

  readonly #candidateProblems = $derived(tableProblems(this.#project, this.#candidateTable, this.#dataProblems));
  readonly #dutyProblems = $derived(tableProblems(this.#project, this.#dutyTable, this.#dataProblems));
  readonly #receiverProblems = $derived(tableProblems(this.#project, this.#receiverTable, this.#dataProblems));
  readonly #phaseProblems = $derived(tableProblems(this.#project, this.#phaseTable, this.#dataProblems));
  readonly #periodProblems = $derived(tableProblems(this.#project, this.#periodTable, this.#dataProblems));

  /** Problems of one table's cells by {@link cellKey}. */
  problems(list: TableList): CellProblems {
    switch (list) {
      case 'candidates':
        return this.#candidateProblems;
      case 'duties':
        return this.#dutyProblems;
      case 'receivers':
        return this.#receiverProblems;
      case 'phases':
        return this.#phaseProblems;
      case 'periods':
        return this.#periodProblems;
    }
  }

  /** The message for one cell, or undefined when it has none. */
  problem(list: TableList, rowId: string, columnId: string): string | undefined {
    const found = this.problems(list).get(cellKey(rowId, columnId));
    if (found !== undefined || list !== 'candidates') return found;
    return checkNotice(this.#candidateChecks[rowId], columnId);
  }

  /** The text kept for a cell that could not be read, shown in place of the value. */
  rawText(list: TableList, rowId: string, columnId: string): string | undefined {
    const unread = this.#project.unreadCells;
    if (!unread) return undefined;
    const column = this.table(list).columns.find((c) => c.id === columnId);
    if (!column) return undefined;
    return unread[`${list}/${rowId}/${column.field ?? column.id}`];
  }

  // ---- optimiser ----------------------------------------------------------------------

  get optimiserResult(): OptimiseResult | undefined {
    return this.#optimiserResult;
  }
  get optimiserRunning(): boolean {
    return this.#optimiserRunning;
  }
  get optimiserError(): string | undefined {
    return this.#optimiserError;
  }
  /** True when the project changed since the optimiser's result was found. */
  get optimiserStale(): boolean {
    return this.#optimiserResult !== undefined && this.#optimiserFor !== this.#project;
  }

  /** Finds the cheapest compliant fleet for the current project. */
  async runOptimiser(options: OptimiseOptions = {}): Promise<void> {
    const project = this.#project;
    this.#optimiserRunning = true;
    this.#optimiserError = undefined;
    try {
      const result = await this.#optimise($state.snapshot(project) as Project, options);
      this.#optimiserResult = result;
      this.#optimiserFor = project;
    } catch (error) {
      this.#optimiserError = error instanceof Error ? error.message : String(error);
    } finally {
      this.#optimiserRunning = false;
    }
  }

  // ---- editing ------------------------------------------------------------------------

  #commit(next: Project): void {
    if (next === this.#project) return;
    this.#history.push(this.#project);
    this.#project = next;
    this.#historyTick++;
    this.#changed();
    this.#onchange?.(next);
  }

  /** Applies one user action's cell edits to a table (one undo step). */
  applyCellTexts(list: TableList, changes: readonly CellChange[]): void {
    if (!changes.length) return;
    const table = this.#writer(list) as TableDefinition<{ id: string }>;
    let hint: { id: string } | undefined;
    if (list === 'candidates' && this.selectedDutyId) {
      const own = this.#project.candidates.filter((c) => c.dutyId === this.selectedDutyId);
      hint = own[own.length - 1] ?? blankCandidate('', this.selectedDutyId);
    }
    this.#commit(applyCellTexts(this.#project, table, changes, hint));
  }

  /** Deletes rows (one undo step). Deleting a duty deletes its candidates with it. */
  deleteRows(list: TableList, ids: readonly string[]): void {
    if (!ids.length) return;
    let next = deleteTableRows(this.#project, this.#writer(list) as TableDefinition<{ id: string }>, ids);
    if (list === 'duties' && next !== this.#project) {
      const gone = new Set(ids);
      const orphans = next.candidates.filter((c) => gone.has(c.dutyId)).map((c) => c.id);
      if (orphans.length) {
        next = deleteTableRows(next, candidateTable({ project: next, separator: this.separator, ranking: new Map(), receiverName: '' }), orphans);
      }
    }
    this.#commit(next);
  }

  /** Adds a blank candidate to a duty and returns its id. */
  addCandidate(dutyId: string, fields: Partial<Omit<Candidate, 'id' | 'dutyId'>> = {}): string {
    const id = nextId('c', new Set(this.#project.candidates.map((c) => c.id)));
    const candidate: Candidate = { ...blankCandidate(id, dutyId), ...fields };
    this.#commit({ ...this.#project, candidates: groupByDuty(this.#project, [...this.#project.candidates, candidate]) });
    return id;
  }

  /**
   * Adds candidates read from a supplier's list, with the text of their unread cells, as
   * one undo step. Ids already in use are replaced by free ones.
   */
  addCandidates(candidates: readonly Candidate[], unreadCells: Record<string, string> = {}): void {
    if (!candidates.length) return;
    const taken = new Set(this.#project.candidates.map((c) => c.id));
    const renamed = new Map<string, string>();
    const added = candidates.map((c) => {
      if (!taken.has(c.id)) {
        taken.add(c.id);
        return c;
      }
      const id = nextId('c', taken);
      taken.add(id);
      renamed.set(c.id, id);
      return { ...c, id };
    });
    const unread = { ...(this.#project.unreadCells ?? {}) };
    for (const [key, text] of Object.entries(unreadCells)) {
      const [list, id, ...rest] = key.split('/');
      const newId = id !== undefined ? (renamed.get(id) ?? id) : id;
      unread[[list, newId, ...rest].join('/')] = text;
    }
    const next: Project = { ...this.#project, candidates: groupByDuty(this.#project, [...this.#project.candidates, ...added]) };
    if (Object.keys(unread).length) next.unreadCells = unread;
    this.#commit(next);
  }

  /** Pins a candidate (the optimiser must choose it); pinning one unpins the others of its duty. */
  setPinned(candidateId: string, pinned: boolean): void {
    const target = this.#project.candidates.find((c) => c.id === candidateId);
    if (!target) return;
    const candidates = this.#project.candidates.map((c) => {
      if (c.id === candidateId) return withFlag(withFlag(c, 'pinned', pinned), 'excluded', pinned ? false : c.excluded === true);
      if (pinned && c.dutyId === target.dutyId && c.pinned) return withFlag(c, 'pinned', false);
      return c;
    });
    this.#commit({ ...this.#project, candidates });
  }

  /** Excludes a candidate (the optimiser must not choose it); excluding unpins it. */
  setExcluded(candidateId: string, excluded: boolean): void {
    const candidates = this.#project.candidates.map((c) =>
      c.id === candidateId ? withFlag(withFlag(c, 'excluded', excluded), 'pinned', excluded ? false : c.pinned === true) : c,
    );
    this.#commit({ ...this.#project, candidates });
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
    let next: Project = { ...this.#project, settings: { ...this.#project.settings, ...patch } };
    if (patch.decimalSeparator && patch.decimalSeparator !== this.separator && next.unreadCells) {
      const ctx: TableContext = { project: next, separator: patch.decimalSeparator };
      next = rereadUnread(next, candidateTable({ ...ctx, ranking: new Map(), receiverName: '' }));
      next = rereadUnread(next, dutyTable({ ...ctx, project: next }));
      next = rereadUnread(next, receiverTable({ ...ctx, project: next }));
    }
    this.#commit(next);
  }

  /** Changes an assessment period's name or hours. */
  setPeriod(periodId: string, patch: Partial<{ name: string; start: string; end: string }>): void {
    const periods = this.#project.periods.map((p) => (p.id === periodId ? { ...p, ...patch } : p));
    this.#commit({ ...this.#project, periods });
  }

  /** Adds an assessment period and returns its id. */
  addPeriod(name = 'New period', start = '07:00', end = '19:00'): string {
    const id = nextId('t', new Set(this.#project.periods.map((p) => p.id)));
    this.#commit({ ...this.#project, periods: [...this.#project.periods, { id, name, start, end }] });
    return id;
  }

  /**
   * Removes an assessment period and the receivers' limits for it. Refused, with words
   * saying why, while a phase is assessed over it.
   * @returns undefined when removed, else the reason
   */
  removePeriod(periodId: string): string | undefined {
    const period = this.#project.periods.find((p) => p.id === periodId);
    if (!period) return undefined;
    const users = this.#project.phases.filter((p) => p.periodId === periodId);
    if (users.length) {
      return `Period "${period.name}" is used by ${users.length === 1 ? 'the phase' : 'the phases'} ${users.map((p) => `"${p.name}"`).join(', ')}: choose another period for ${users.length === 1 ? 'it' : 'them'} in the Phases tab first`;
    }
    const receivers = this.#project.receivers.map((r) => {
      if (!(periodId in r.limitsDb)) return r;
      const { [periodId]: _gone, ...limitsDb } = r.limitsDb;
      return { ...r, limitsDb };
    });
    const next: Project = { ...this.#project, periods: this.#project.periods.filter((p) => p.id !== periodId), receivers };
    const suffix = `/limitsDb.${periodId}`;
    const own = `periods/${periodId}/`;
    const unread = Object.entries(this.#project.unreadCells ?? {}).filter(([key]) => !key.startsWith(own) && !(key.startsWith('receivers/') && key.endsWith(suffix)));
    if (unread.length) next.unreadCells = Object.fromEntries(unread);
    else delete next.unreadCells;
    this.#commit(next);
    return undefined;
  }

  undo(): void {
    const before = this.#history.undo(this.#project);
    if (before === undefined) return;
    this.#project = before;
    this.#historyTick++;
    this.#changed();
    this.#onchange?.(before);
  }

  redo(): void {
    const after = this.#history.redo(this.#project);
    if (after === undefined) return;
    this.#project = after;
    this.#historyTick++;
    this.#changed();
    this.#onchange?.(after);
  }

  /**
   * Takes a project changed elsewhere (another tab). It replaces the current one without
   * an undo step and without calling `onchange`; the undo history is kept, so an undo
   * returns to this tab's own earlier state.
   */
  replaceFromOutside(project: Project): void {
    this.#project = project;
    this.#changed();
  }

  selectDuty(dutyId: string): void {
    this.selectedDutyId = dutyId;
  }

  selectReceiver(receiver: ReceiverChoice): void {
    this.selectedReceiverId = receiver;
  }
}

/** Projects up to this many candidates are validated with every edit; larger ones shortly after it. */
const SYNC_VALIDATION_LIMIT = 1000;
/** Delay before a large project is validated after an edit, ms. */
const DEFERRED_VALIDATION_MS = 150;

function safeValidate(project: Project): DataProblem[] {
  try {
    return validateProject(project);
  } catch (error) {
    return [{ path: '$', message: `The project could not be checked: ${error instanceof Error ? error.message : String(error)}` }];
  }
}

function withFlag(c: Candidate, flag: 'pinned' | 'excluded', on: boolean): Candidate {
  if ((c[flag] === true) === on) return c;
  const copy = { ...c };
  if (on) copy[flag] = true;
  else delete copy[flag];
  return copy;
}
