/**
 * The document being edited (the project; the buyer's register), as a reactive value
 * replaced whole on each edit, with undo and redo of this tab's own edits. Every edit, undo and redo tells the owner (`onchange`, for
 * saving); a project taken from elsewhere (another tab) replaces the current one without
 * an undo step.
 *
 * Each undo step keeps the project before and after one edit. Undo puts back what that
 * edit changed and nothing else: when other tabs' edits arrived since, the step is undone
 * cell by cell on top of them (ledger/file/project-merge.ts), and a cell another tab changed
 * since keeps the other tab's value and is reported (`onskipped`).
 */
import type { Project } from '../../ledger/model/model.ts';
import { mergeProjects, type MergeConflict, type RowList } from '../../ledger/file/project-merge.ts';

export interface EditHistoryEvents<T = Project, L extends string = string> {
  /** After every edit, undo and redo (not {@link EditHistory.replace}). */
  onchange?: (project: T) => void;
  /** After every change of the current project, including {@link EditHistory.replace}. */
  onreplaced?: () => void;
  /** An undo or redo left cells alone because another tab changed them since. */
  onskipped?: (conflicts: MergeConflict<L>[], action: 'undo' | 'redo') => void;
}

/** A three-way merge, cell by cell (ledger/file/project-merge.ts), giving the merged document and the cells both changed. */
export type Merge<T, L extends string> = (
  base: T,
  mine: T,
  theirs: T,
  prefer: 'mine' | 'theirs',
) => { value: T; conflicts: MergeConflict<L>[] };

const mergeProject: Merge<Project, RowList> = (base, mine, theirs, prefer) => {
  const { project, conflicts } = mergeProjects(base, mine, theirs, prefer);
  return { value: project, conflicts };
};

export interface Step<T> {
  before: T;
  after: T;
}

/** The most steps kept; the oldest are dropped first. */
const LIMIT = 200;

export class EditHistory<T = Project, L extends string = RowList> {
  #project: T = $state.raw(undefined as unknown as T);
  #past: Step<T>[] = [];
  #future: Step<T>[] = [];
  /** Bumped on every history change so `canUndo`/`canRedo` are reactive. */
  #tick = $state(0);
  #events: EditHistoryEvents<T, L>;
  #merge: Merge<T, L>;

  /** `merge` defaults to the project's; give the register's for the register. */
  constructor(project: T, events: EditHistoryEvents<T, L> = {}, merge?: Merge<T, L>) {
    this.#project = project;
    this.#events = events;
    this.#merge = merge ?? (mergeProject as unknown as Merge<T, L>);
  }

  get current(): T {
    return this.#project;
  }

  get canUndo(): boolean {
    void this.#tick;
    return this.#past.length > 0;
  }

  get canRedo(): boolean {
    void this.#tick;
    return this.#future.length > 0;
  }

  /** Makes `next` the current project as one undo step (nothing when it is the current one). */
  commit(next: T): void {
    if (next === this.#project) return;
    this.#past.push({ before: this.#project, after: next });
    if (this.#past.length > LIMIT) this.#past.shift();
    this.#future = [];
    this.#set(next);
  }

  /** Undoes the latest step; returns it (undefined when there is none). */
  undo(): Step<T> | undefined {
    const step = this.#past.pop();
    if (!step) return undefined;
    this.#future.push(step);
    this.#set(this.#apply(step.after, step.before, 'undo'));
    return step;
  }

  /** Redoes the latest undone step; returns it (undefined when there is none). */
  redo(): Step<T> | undefined {
    const step = this.#future.pop();
    if (!step) return undefined;
    this.#past.push(step);
    this.#set(this.#apply(step.before, step.after, 'redo'));
    return step;
  }

  /** Replaces the current project without an undo step and without `onchange`; the history is kept. */
  replace(project: T): void {
    this.#project = project;
    this.#events.onreplaced?.();
  }

  /** The current project with the change `from` → `to` made on it, leaving other tabs' later edits alone. */
  #apply(from: T, to: T, action: 'undo' | 'redo'): T {
    if (this.#project === from) return to;
    const { value, conflicts } = this.#merge(from, to, this.#project, 'theirs');
    if (conflicts.length) this.#events.onskipped?.(conflicts, action);
    return value;
  }

  #set(project: T): void {
    this.#project = project;
    this.#tick++;
    this.#events.onreplaced?.();
    this.#events.onchange?.(project);
  }
}
