/**
 * The Workspace's tables (candidates, duties, receivers, phases, periods, tender clauses) with their
 * computed columns, and the data problems flagged on their cells: validation (at once for
 * a small project, shortly after an edit for a large one) and what the evaluation found.
 * Everything is `$derived` from the sources the Workspace passes in.
 */
import type { AssessmentPeriod, Candidate, Clause, Duty, Phase, Project, Receiver } from '../../ledger/model/model.ts';
import type { DataProblem, Evaluation, RankingRow } from '../../ledger/model/results.ts';
import { validateProject } from '../../ledger/validate/validate.ts';
import { tableProblems, cellKey, problemRows, type CellProblems } from '../tables/problems.ts';
import { candidateTable, type CandidateFigures } from '../tables/candidates.ts';
import { dutyTable } from '../tables/duties.ts';
import { receiverTable } from '../tables/receivers.ts';
import { phaseTable } from '../tables/phases.ts';
import { periodTable } from '../tables/periods.ts';
import { clauseTable } from '../tables/clauses.ts';
import type { TableContext, TableDefinition, TableList } from '../tables/column.ts';
import { NOTICE_COLUMNS, checkHasNotice, checkNotice } from '../tables/check-columns.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import { own } from '../../ledger/model/own.ts';
import type { CandidateChecks } from './checks-memo.ts';
import type { AnyTable } from './project-edits.ts';

/** What the tables are computed from (read inside `$derived` and cell effects, so reactive). */
export interface TableSources {
  project(): Project;
  evaluation(): Evaluation | undefined;
  /** Ranking row of every candidate at the chosen receiver, by candidate id. */
  ranking(): Map<string, RankingRow>;
  checks(): CandidateChecks;
  /** One candidate's checks (kept per candidate object, so no table of every machine is made). */
  checkOf(candidate: Candidate): CandidateCheck;
  /** Words for the chosen receiver, for the level column's header. */
  receiverName(): string;
}

/** What the candidate table's columns are built from; they are rebuilt only when one of these changes. */
interface CandidateShape {
  separator: '.' | ',';
  currency: string;
  duties: Project['duties'];
  receiverName: string;
}

export class WorkspaceTables {
  #sources: TableSources;

  /**
   * The candidate table's figures, read live: each getter returns the current value, so
   * the columns can stay the same objects across edits (the grid then patches the edited
   * rows instead of rebuilding 5,000) while every cell still shows current figures.
   */
  #live: CandidateFigures;
  #shape: CandidateShape | undefined;
  #candidates: TableDefinition<Candidate> | undefined;

  constructor(sources: TableSources) {
    this.#sources = sources;
    this.#live = {
      get project() {
        return sources.project();
      },
      get separator() {
        return sources.project().settings.decimalSeparator;
      },
      get evaluation() {
        return sources.evaluation();
      },
      get ranking() {
        return sources.ranking();
      },
      get receiverName() {
        return sources.receiverName();
      },
      checkOf: (candidate) => sources.checkOf(candidate),
    };
  }

  readonly #context = $derived.by((): TableContext => {
    const project = this.#sources.project();
    return { project, separator: project.settings.decimalSeparator };
  });

  /** The candidate table: the same object until the separator, currency, duties or chosen receiver change. */
  readonly #candidateTable = $derived.by(() => {
    const project = this.#sources.project();
    const shape: CandidateShape = {
      separator: project.settings.decimalSeparator,
      currency: project.currency,
      duties: project.duties,
      receiverName: this.#sources.receiverName(),
    };
    const kept = this.#shape;
    if (
      !this.#candidates ||
      !kept ||
      kept.separator !== shape.separator ||
      kept.currency !== shape.currency ||
      kept.duties !== shape.duties ||
      kept.receiverName !== shape.receiverName
    ) {
      this.#shape = shape;
      this.#candidates = candidateTable(this.#live);
    }
    return this.#candidates;
  });
  readonly #dutyTable = $derived(dutyTable(this.#context));
  readonly #receiverTable = $derived(receiverTable(this.#context));
  readonly #phaseTable = $derived(phaseTable(this.#context));
  readonly #periodTable = $derived(periodTable(this.#context));
  readonly #clauseTable = $derived(clauseTable(this.#context));

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
  get clauseTable(): TableDefinition<Clause> {
    return this.#clauseTable;
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
      case 'clauses':
        return this.#clauseTable;
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
    const found = this.#sources.evaluation()?.problems ?? [];
    const validation =
      this.#sources.project().candidates.length <= SYNC_VALIDATION_LIMIT
        ? safeValidate(this.#sources.project())
        : this.#deferredValidation;
    return found.length ? [...validation, ...found] : validation;
  });

  get dataProblems(): DataProblem[] {
    return this.#dataProblems;
  }

  /** The validation found shortly after the latest edit of a large project (empty for a small one). */
  get deferredValidation(): readonly DataProblem[] {
    return this.#deferredValidation;
  }

  /** Call after every change of the project: schedules the validation of a large one. */
  changed(): void {
    if (this.#sources.project().candidates.length <= SYNC_VALIDATION_LIMIT) return;
    clearTimeout(this.#validationTimer);
    this.#validationTimer = setTimeout(() => {
      this.#deferredValidation = safeValidate(this.#sources.project());
    }, DEFERRED_VALIDATION_MS);
  }

  readonly #candidateProblems = $derived.by(() =>
    tableProblems(this.#sources.project(), this.#candidateTable, this.#dataProblems),
  );
  readonly #dutyProblems = $derived.by(() =>
    tableProblems(this.#sources.project(), this.#dutyTable, this.#dataProblems),
  );
  readonly #receiverProblems = $derived.by(() =>
    tableProblems(this.#sources.project(), this.#receiverTable, this.#dataProblems),
  );
  readonly #phaseProblems = $derived.by(() =>
    tableProblems(this.#sources.project(), this.#phaseTable, this.#dataProblems),
  );
  readonly #periodProblems = $derived.by(() =>
    tableProblems(this.#sources.project(), this.#periodTable, this.#dataProblems),
  );
  readonly #clauseProblems = $derived.by(() =>
    tableProblems(this.#sources.project(), this.#clauseTable, this.#dataProblems),
  );

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
      case 'clauses':
        return this.#clauseProblems;
    }
  }

  /**
   * The message for one cell, or undefined when it has none. `row`, the candidate itself when
   * the grid passes it, spares looking its checks up among every machine's.
   */
  problem(list: TableList, rowId: string, columnId: string, row?: unknown): string | undefined {
    const found = this.problems(list).get(cellKey(rowId, columnId));
    if (found !== undefined || list !== 'candidates' || !NOTICE_COLUMNS.has(columnId)) return found;
    const check = row ? this.#sources.checkOf(row as Candidate) : own(this.#sources.checks(), rowId);
    return checkNotice(check, columnId);
  }

  /** The rows with at least one problem, by the problems they were found in (made when first asked; not reactive: a cache). */
  #flaggedRows = new WeakMap<CellProblems, Set<string>>();

  /**
   * Whether any cell of a row may carry a message or a kept text: a problem of the row, a
   * candidate's check notice, or any unread text in the project (then every row is asked
   * cell by cell, as unread text is rare). False lets the grid skip the row's cells.
   */
  flagged(list: TableList, rowId: string, row?: unknown): boolean {
    const unread = this.#sources.project().unreadCells;
    if (unread && Object.keys(unread).length > 0) return true;
    const problems = this.problems(list);
    let rows = this.#flaggedRows.get(problems);
    if (!rows) {
      rows = problemRows(problems);
      this.#flaggedRows.set(problems, rows);
    }
    if (rows.has(rowId)) return true;
    if (list !== 'candidates') return false;
    const check = row ? this.#sources.checkOf(row as Candidate) : own(this.#sources.checks(), rowId);
    return checkHasNotice(check);
  }

  /** The text kept for a cell that could not be read, shown in place of the value. */
  rawText(list: TableList, rowId: string, columnId: string): string | undefined {
    const unread = this.#sources.project().unreadCells;
    if (!unread) return undefined;
    const column = this.table(list).columns.find((c) => c.id === columnId);
    if (!column) return undefined;
    return unread[`${list}/${rowId}/${column.field ?? column.id}`];
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
    return [
      {
        path: '$',
        message: `The project could not be checked: ${error instanceof Error ? error.message : String(error)}`,
      },
    ];
  }
}
