/**
 * The project being edited, as a reactive value replaced whole on each edit, with undo and
 * redo over the snapshots (./history.ts). Every edit, undo and redo tells the owner
 * (`onchange`, for saving); a project taken from elsewhere replaces the current one
 * without an undo step.
 */
import type { Project } from '../../ledger/model.ts';
import { History } from './history.ts';

export interface EditHistoryEvents {
  /** After every edit, undo and redo (not {@link EditHistory.replace}). */
  onchange?: (project: Project) => void;
  /** After every change of the current project, including {@link EditHistory.replace}. */
  onreplaced?: () => void;
}

export class EditHistory {
  #project: Project = $state.raw(undefined as unknown as Project);
  #history = new History<Project>();
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
    return this.#history.canUndo;
  }

  get canRedo(): boolean {
    void this.#tick;
    return this.#history.canRedo;
  }

  /** Makes `next` the current project as one undo step (nothing when it is the current one). */
  commit(next: Project): void {
    if (next === this.#project) return;
    this.#history.push(this.#project);
    this.#set(next, true);
  }

  undo(): void {
    const before = this.#history.undo(this.#project);
    if (before !== undefined) this.#set(before, true);
  }

  redo(): void {
    const after = this.#history.redo(this.#project);
    if (after !== undefined) this.#set(after, true);
  }

  /** Replaces the current project without an undo step and without `onchange`; the history is kept. */
  replace(project: Project): void {
    this.#project = project;
    this.#events.onreplaced?.();
  }

  #set(project: Project, told: boolean): void {
    this.#project = project;
    this.#tick++;
    this.#events.onreplaced?.();
    if (told) this.#events.onchange?.(project);
  }
}
