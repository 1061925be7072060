/**
 * Editing the open project: the project itself, replaced whole on every edit (the model is
 * immutable), undo and redo as a stack of snapshots (./edit-history.svelte.ts), and every
 * edit the app makes to it, each one undo step. Which duty is chosen lives here too, as
 * new machines join it. The figures computed from the project are the Workspace's
 * (./workspace.svelte.ts), which extends this class.
 */
import { stepWords } from './step-words.ts';
import type { Register } from '../../ledger/register/model.ts';
import { updateLinkedCandidates } from '../../ledger/register/register-link.ts';
import type {
  Candidate,
  Project,
  ProjectSettings,
  Propagation,
  UncertaintySettings,
} from '../../ledger/model/model.ts';
import { referencesTo, withReferencedRowsDeleted, type ReferenceChoice, type RowReferences } from './row-references.ts';
import { EditHistory } from './edit-history.svelte.ts';
import type { MergeConflict } from '../../ledger/file/project-merge.ts';
import { applyCellTexts, type CellChange } from '../tables/apply.ts';
import { blankCandidate } from '../tables/candidates.ts';
import type { TableDefinition, TableList } from '../tables/column.ts';
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
} from './project-edits.ts';

export interface EditingOptions {
  /** Called after every edit, undo and redo with the new project (not for {@link ProjectEditing.replaceFromOutside}). */
  onchange?: (project: Project) => void;
  /** An undo or redo left cells alone because another tab changed them since. */
  onskipped?: (conflicts: MergeConflict[], action: 'undo' | 'redo') => void;
}

export class ProjectEditing {
  protected readonly edits: EditHistory;

  /** Duty whose ranking is shown and that new machines join; undefined → the first duty. */
  selectedDutyId = $state<string | undefined>();

  constructor(project: Project, options: EditingOptions = {}) {
    this.edits = new EditHistory(project, {
      ...(options.onchange ? { onchange: options.onchange } : {}),
      ...(options.onskipped ? { onskipped: options.onskipped } : {}),
      onreplaced: () => this.changed(),
    });
  }

  /** Called after every change of the current project (edits, undo, redo, a project from another tab). */
  protected changed(): void {}

  get project(): Project {
    return this.edits.current;
  }

  get separator(): '.' | ',' {
    return this.project.settings.decimalSeparator;
  }

  get canUndo(): boolean {
    return this.edits.canUndo;
  }

  get canRedo(): boolean {
    return this.edits.canRedo;
  }

  /** The duty chosen (the selected one, else the first). */
  readonly #dutyId = $derived.by(() => {
    const duties = this.project.duties;
    return duties.find((d) => d.id === this.selectedDutyId)?.id ?? duties[0]?.id;
  });

  get dutyId(): string | undefined {
    return this.#dutyId;
  }

  selectDuty(dutyId: string): void {
    this.selectedDutyId = dutyId;
  }

  /** Makes `next` the current project as one undo step. */
  protected commit(next: Project): void {
    this.edits.commit(next);
  }

  /** Applies one user action's cell edits to a table (one undo step). */
  applyCellTexts(list: TableList, changes: readonly CellChange[]): void {
    if (!changes.length) return;
    const table = writerTable(this.project, list) as TableDefinition<{ id: string }>;
    let hint: { id: string } | undefined;
    if (list === 'candidates' && this.selectedDutyId) {
      const candidates = this.project.candidates;
      for (let i = candidates.length - 1; i >= 0 && !hint; i--)
        if (candidates[i]!.dutyId === this.selectedDutyId) hint = candidates[i];
      hint ??= blankCandidate('', this.selectedDutyId);
    }
    this.commit(applyCellTexts(this.project, table, changes, hint));
  }

  /** What refers to rows about to be deleted (undefined when nothing does), for the question asked before deleting. */
  referencesTo(list: TableList, ids: readonly string[]): RowReferences | undefined {
    return referencesTo(this.project, list, ids);
  }

  /** Deletes rows others refer to, moving the dependants or deleting them too (one undo step). */
  deleteReferencedRows(refs: RowReferences, choice: ReferenceChoice): void {
    this.commit(withReferencedRowsDeleted(this.project, refs, choice));
  }

  /** Deletes rows (one undo step). Deleting a duty deletes its candidates with it. */
  deleteRows(list: TableList, ids: readonly string[]): void {
    if (ids.length) this.commit(withRowsDeleted(this.project, list, ids));
  }

  /**
   * Appends a blank row to a table (one undo step) and returns its id; a machine joins the
   * chosen duty. Undefined when it cannot be added (a machine needs a duty first).
   */
  addRow(list: TableList): string | undefined {
    const added = withRowAdded(this.project, list, this.dutyId);
    if (!added) return undefined;
    this.commit(added.next);
    return added.id;
  }

  /** Adds a blank candidate to a duty and returns its id. */
  addCandidate(dutyId: string, fields: Partial<Omit<Candidate, 'id' | 'dutyId'>> = {}): string {
    const { next, id } = withCandidateAdded(this.project, dutyId, fields);
    this.commit(next);
    return id;
  }

  /**
   * Adds candidates read from a supplier's list, with the text of their unread cells, as
   * one undo step. Ids already in use are replaced by free ones.
   */
  addCandidates(candidates: readonly Candidate[], unreadCells: Record<string, string> = {}): void {
    if (candidates.length) this.commit(withCandidatesAdded(this.project, candidates, unreadCells));
  }

  /**
   * Brings the named candidates copied from the register up to date with it (one undo
   * step); only on the user's request — a copy is never changed by the register itself.
   */
  updateFromRegister(register: Register, candidateIds: readonly string[]): void {
    if (candidateIds.length) this.commit(updateLinkedCandidates(this.project, register, candidateIds));
  }

  /** Pins a candidate (the optimiser must choose it); pinning one unpins the others of its duty. */
  setPinned(candidateId: string, pinned: boolean): void {
    this.commit(withPinned(this.project, candidateId, pinned));
  }

  /** Excludes a candidate (the optimiser must not choose it); excluding unpins it. */
  setExcluded(candidateId: string, excluded: boolean): void {
    this.commit(withExcluded(this.project, candidateId, excluded));
  }

  setName(name: string): void {
    if (name !== this.project.name) this.commit({ ...this.project, name });
  }

  setCurrency(currency: string): void {
    if (currency !== this.project.currency) this.commit({ ...this.project, currency });
  }

  setPropagation(propagation: Propagation): void {
    this.commit({ ...this.project, propagation });
  }

  setNotes(notes: string): void {
    this.commit({ ...this.project, notes });
  }

  /**
   * Changes project settings. A new decimal separator re-reads the kept text of unread
   * cells, so "104,5" typed before the switch to a decimal comma is now read.
   */
  setSettings(patch: Partial<ProjectSettings>): void {
    this.commit(withSettings(this.project, patch));
  }

  /** Changes settings of the uncertainty model (the spreads behind the probability of compliance). */
  setUncertainty(patch: Partial<UncertaintySettings>): void {
    this.commit({ ...this.project, uncertainty: { ...(this.project.uncertainty ?? {}), ...patch } });
  }

  /** Changes an assessment period's name or hours. */
  setPeriod(periodId: string, patch: Partial<{ name: string; start: string; end: string }>): void {
    this.commit(withPeriodChanged(this.project, periodId, patch));
  }

  /** Adds an assessment period and returns its id. */
  addPeriod(name = 'New period', start = '07:00', end = '19:00'): string {
    const { next, id } = withPeriodAdded(this.project, name, start, end);
    this.commit(next);
    return id;
  }

  /**
   * Removes an assessment period and the receivers' limits for it. Refused, with words
   * saying why, while a phase is assessed over it.
   * @returns undefined when removed, else the reason
   */
  removePeriod(periodId: string): string | undefined {
    const outcome = withPeriodRemoved(this.project, periodId);
    if (!outcome) return undefined;
    if ('refused' in outcome) return outcome.refused;
    this.commit(outcome.next);
    return undefined;
  }

  /** Commits an edit made on the site plan (app/plan/plan-edits.ts) as one undo step; an unchanged project is no step. */
  editPlan(next: Project): void {
    if (next !== this.project) this.commit(next);
  }

  /** What the latest undo or redo did, in words ("Undid the edit to machine “Dumper 6 t”"); '' before any. */
  lastStep = $state('');

  /** Undoes this tab's latest edit; returns what it undid, in words. */
  undo(): string {
    const step = this.edits.undo();
    this.lastStep = step ? `Undid ${stepWords(step.before, step.after, 'before')}` : 'Nothing to undo';
    return this.lastStep;
  }

  /** Redoes the latest undone edit; returns what it redid, in words. */
  redo(): string {
    const step = this.edits.redo();
    this.lastStep = step ? `Redid ${stepWords(step.before, step.after)}` : 'Nothing to redo';
    return this.lastStep;
  }

  /**
   * Takes a project changed elsewhere (another tab). It replaces the current one without
   * an undo step and without calling `onchange`; the undo history is kept, and an undo
   * then undoes only this tab's own edit, leaving the other tab's in place.
   */
  replaceFromOutside(project: Project): void {
    this.edits.replace(project);
  }
}
