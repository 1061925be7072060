/**
 * The buyer's register as the app holds it: one register shared by every project, kept in
 * the browser's database (its own table) and written after every edit. Edits are undone
 * and redone like the project's; importing a file or a supplier list is one undo step.
 * Another tab's saved register replaces this tab's when no write of this tab is waiting.
 */
import type { LedgerDB } from '../../db/LedgerDB.ts';
import { loadRegister, saveRegister } from '../../db/registers.ts';
import { emptyRegister, type Register, type RegisterMachine } from '../../ledger/register/model.ts';
import { validateRegister } from '../../ledger/register/validate-register.ts';
import type { DataProblem } from '../../ledger/model/results.ts';
import { History } from '../state/history.ts';

export class RegisterStore {
  register = $state.raw<Register>(emptyRegister());
  /** True once the stored register was read (or there was none). */
  loaded = $state(false);
  /** The last write failed: said so until a later write succeeds. */
  saveFailed = $state(false);
  #history = new History<Register>();
  #undoable = $state(0);
  #db: LedgerDB | undefined;
  #writing: Promise<unknown> = Promise.resolve();
  /** Writes started and not yet finished. */
  #pending = 0;
  /** The stored revision this tab's register is at. */
  #revision = 0;
  /** Called with the new revision after each write (the session tells other tabs). */
  onsaved: ((revision: number) => void) | undefined;

  readonly problems: DataProblem[] = $derived(validateRegister(this.register));

  /** Reads the stored register; without a database the register lives in this tab only. */
  async open(db: LedgerDB | undefined): Promise<void> {
    this.#db = db;
    if (db) {
      try {
        const record = await loadRegister(db);
        this.register = record.register;
        this.#revision = record.revision;
      } catch {
        this.saveFailed = true;
      }
    }
    this.loaded = true;
  }

  get canUndo(): boolean {
    void this.#undoable;
    return this.#history.canUndo;
  }
  get canRedo(): boolean {
    void this.#undoable;
    return this.#history.canRedo;
  }

  /** Replaces the register (one undo step) and writes it. */
  commit(next: Register): void {
    if (next === this.register) return;
    this.#history.push(this.register);
    this.#set(next);
  }

  undo(): void {
    const back = this.#history.undo(this.register);
    if (back) this.#set(back);
  }

  redo(): void {
    const forward = this.#history.redo(this.register);
    if (forward) this.#set(forward);
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

  /** Another tab saved the register at `revision`: read it, unless this tab has a write waiting or is already there. */
  async heard(revision: number): Promise<void> {
    const db = this.#db;
    if (!db || revision <= this.#revision || this.#pending > 0) return;
    const record = await loadRegister(db);
    if (record.revision <= this.#revision || this.#pending > 0) return;
    this.#revision = record.revision;
    this.register = record.register;
    this.#history.clear();
    this.#undoable++;
  }

  /** Waits for the last write (tests, and before leaving the page). */
  async flush(): Promise<void> {
    await this.#writing;
  }

  #set(next: Register): void {
    this.register = next;
    this.#undoable++;
    const db = this.#db;
    if (!db) return;
    this.#pending++;
    this.#writing = this.#writing
      .then(() => saveRegister(db, next))
      .then(
        (revision) => {
          this.saveFailed = false;
          this.#revision = revision;
          this.onsaved?.(revision);
        },
        () => (this.saveFailed = true),
      )
      .finally(() => this.#pending--);
  }
}
