/**
 * The project being edited, as a reactive value replaced whole on each edit, with undo and
 * redo of this tab's own edits. Every edit, undo and redo tells the owner (`onchange`, for
 * saving); a project taken from elsewhere (another tab) replaces the current one without
 * an undo step.
 *
 * Each undo step keeps the project before and after one edit. Undo puts back what that
 * edit changed and nothing else: when other tabs' edits arrived since, the step is undone
 * cell by cell on top of them (ledger/file/project-merge.ts), and a cell another tab changed
 * since keeps the other tab's value and is reported (`onskipped`).
 */
import type { Project } from '../../ledger/model/model.ts';
import { mergeProjects, type MergeConflict } from '../../ledger/file/project-merge.ts';

export interface EditHistoryEvents {
  /** After every edit, undo and redo (not {@link EditHistory.replace}). */
  onchange?: (project: Project) => void;
  /** After every change of the current project, including {@link EditHistory.replace}. */
  onreplaced?: () => void;
  /** An undo or redo left cells alone because another tab changed them since. */
  onskipped?: (conflicts: MergeConflict[], action: 'undo' | 'redo') => void;
}

interface Step {
  before: Project;
  after: Project;
}

/** The most steps kept; the oldest are dropped first. */
const LIMIT = 200;

export class EditHistory {
  #project: Project = $state.raw(undefined as unknown as Project);
  #past: Step[] = [];
  #future: Step[] = [];
  /** Bumped on every history change so `canUndo`/`canRedo` are reactive. */
  #tick = $state(0);
  #events: EditHistoryEvents;

  constructor(project: Project, events: EditHistoryEvents = {}) {
    this.#project = project;
    this.#events = events;
  }

  get current(): Project {
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
  commit(next: Project): void {
    if (next === this.#project) return;
    this.#past.push({ before: this.#project, after: next });
    if (this.#past.length > LIMIT) this.#past.shift();
    this.#future = [];
    this.#set(next);
  }

  undo(): void {
    const step = this.#past.pop();
    if (!step) return;
    this.#future.push(step);
    this.#set(this.#apply(step.after, step.before, 'undo'));
  }

  redo(): void {
    const step = this.#future.pop();
    if (!step) return;
    this.#past.push(step);
    this.#set(this.#apply(step.before, step.after, 'redo'));
  }

  /** Replaces the current project without an undo step and without `onchange`; the history is kept. */
  replace(project: Project): void {
    this.#project = project;
    this.#events.onreplaced?.();
  }

  /** The current project with the change `from` → `to` made on it, leaving other tabs' later edits alone. */
  #apply(from: Project, to: Project, action: 'undo' | 'redo'): Project {
    if (this.#project === from) return to;
    const { project, conflicts } = mergeProjects(from, to, this.#project, 'theirs');
    if (conflicts.length) this.#events.onskipped?.(conflicts, action);
    return project;
  }

  #set(project: Project): void {
    this.#project = project;
    this.#tick++;
    this.#events.onreplaced?.();
    this.#events.onchange?.(project);
  }
}
