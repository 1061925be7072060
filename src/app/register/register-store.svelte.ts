/**
 * The buyer's register as the app holds it: one register shared by every project, kept in
 * the browser's database (its own table) and written after every edit. Edits are undone
 * and redone like the project's (app/state/edit-history.svelte.ts): an undo puts back only
 * what this tab's step changed, cell by cell, leaving other tabs' later edits alone;
 * importing a file or a supplier list is one undo step.
 *
 * Two tabs: every write carries the revision it was made on (db/registers.ts
 * `saveRegisterOn`); when another tab stored a newer one first, the two are merged cell by
 * cell (ledger/register/register-merge.ts) and a cell both changed keeps the value saved
 * last; the cells it replaced go with the news of the save (`onsaved`), so the tab whose
 * value was replaced is told. Another tab's saved register is merged in when it is heard,
 * keeping this tab's edits not yet written on top.
 */
import type { LedgerDB } from '../../db/LedgerDB.ts';
import { loadRegister, saveRegisterOn } from '../../db/registers.ts';
import { emptyRegister, type Register, type RegisterMachine } from '../../ledger/register/model.ts';
import { validateRegister } from '../../ledger/register/validate-register.ts';
import { mergeRegisters } from '../../ledger/register/register-merge.ts';
import type { MergeConflict } from '../../ledger/file/project-merge.ts';
import type { DataProblem } from '../../ledger/model/results.ts';
import { EditHistory } from '../state/edit-history.svelte.ts';

export class RegisterStore {
  /** True once the stored register was read (or there was none). */
  loaded = $state(false);
  /** The last write failed: said so until a later write succeeds. */
  saveFailed = $state(false);
  #edits: EditHistory<Register, 'machines'>;
  #db: LedgerDB | undefined;
  #writing: Promise<unknown> = Promise.resolve();
  /** Writes started and not yet finished. */
  #pending = 0;
  /** The stored revision this tab's register is based on, and the register as stored then. */
  #revision = 0;
  #base: Register;
  /** Called with the new revision after each write (the session tells other tabs). */
  onsaved: ((revision: number, conflicts: MergeConflict<'machines'>[]) => void) | undefined;
  /** An undo or redo left cells alone because another tab changed them since. */
  onskipped: ((conflicts: MergeConflict<'machines'>[], action: 'undo' | 'redo') => void) | undefined;

  constructor() {
    this.#base = emptyRegister();
    this.#edits = new EditHistory<Register, 'machines'>(
      this.#base,
      {
        onchange: () => this.#write(),
        onskipped: (conflicts, action) => this.onskipped?.(conflicts, action),
      },
      mergeRegisters,
    );
  }

  get register(): Register {
    return this.#edits.current;
  }

  readonly problems: DataProblem[] = $derived(validateRegister(this.register));

  /** Reads the stored register; without a database the register lives in this tab only. */
  async open(db: LedgerDB | undefined): Promise<void> {
    this.#db = db;
    if (db) {
      try {
        const record = await loadRegister(db);
        this.#base = record.register;
        this.#revision = record.revision;
        this.#edits.replace(record.register);
      } catch {
        this.saveFailed = true;
      }
    }
    this.loaded = true;
  }

  get canUndo(): boolean {
    return this.#edits.canUndo;
  }
  get canRedo(): boolean {
    return this.#edits.canRedo;
  }

  /** Replaces the register (one undo step) and writes it. */
  commit(next: Register): void {
    this.#edits.commit(next);
  }

  undo(): void {
    this.#edits.undo();
  }

  redo(): void {
    this.#edits.redo();
  }

  /** Adds machines (fresh ids already given) with the text of their unread cells, as one undo step. */
  addMachines(machines: readonly RegisterMachine[], unreadCells: Record<string, string> = {}): void {
    if (!machines.length) return;
    const unread = { ...(this.register.unreadCells ?? {}), ...unreadCells };
    this.commit({
      ...this.register,
      machines: [...this.register.machines, ...machines],
      ...(Object.keys(unread).length ? { unreadCells: unread } : {}),
    });
  }

  /**
   * Another tab saved the register at `revision`: its edits are merged in, cell by cell, with
   * this tab's edits not yet written kept on top (a write of this tab waiting merges by itself).
   * The undo history is kept: an undo still undoes only this tab's own steps.
   */
  async heard(revision: number): Promise<void> {
    const db = this.#db;
    if (!db || revision <= this.#revision || this.#pending > 0) return;
    const record = await loadRegister(db);
    if (record.revision <= this.#revision || this.#pending > 0) return;
    const merged = mergeRegisters(this.#base, this.register, record.register, 'mine').value;
    this.#revision = record.revision;
    this.#base = record.register;
    this.#edits.replace(merged);
    if (merged !== record.register) this.#write();
  }

  /** Waits for the last write (tests, and before leaving the page). */
  async flush(): Promise<void> {
    await this.#writing;
  }

  /**
   * Writes the register as it is when the write starts (edits queued behind a write go in
   * the next one, on top of whatever that write merged in).
   */
  #write(): void {
    const db = this.#db;
    if (!db) return;
    this.#pending++;
    this.#writing = this.#writing
      .then(async () => {
        const next = this.register;
        if (next === this.#base) return;
        const saved = await saveRegisterOn(db, this.#base, this.#revision, next);
        this.saveFailed = false;
        this.#revision = saved.revision;
        this.#base = saved.register;
        // Another tab's edits came in with this write: keep them, and this tab's later edits on top.
        if (saved.register !== next)
          this.#edits.replace(mergeRegisters(next, this.register, saved.register, 'mine').value);
        this.onsaved?.(saved.revision, saved.conflicts);
      })
      .catch(() => (this.saveFailed = true))
      .finally(() => this.#pending--);
  }
}
