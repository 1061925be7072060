/**
 * What this tab does when another tab says it stored something: it takes in the open
 * project's newer revisions (merged under this tab's own unsaved edits), reloads the shared
 * register, and tells the user when a value they committed was replaced by another tab's
 * later save. The session owns the database, the saver and the workspace; this reads them
 * through {@link OtherTabsHost} at the moment it needs them, since each can be replaced.
 */
import type { Project } from '../../ledger/model/model.ts';
import { describeStorageError, loadChanges, loadProject, type LedgerDB, type ProjectRecord } from '../../db/index.ts';
import type { Workspace } from '../state/workspace.svelte.ts';
import type { ProjectSaver } from './saver.ts';
import type { StorageMessage } from './tabs-channel.ts';
import type { RegisterStore } from '../register/register-store.svelte.ts';
import { mergeProjects, same, type MergeConflict } from '../../ledger/file/project-merge.ts';
import { registerReplacedMessage, replacedMessage } from './conflict-words.ts';
import { registerColumns } from '../register/register-table.ts';

/** What the session lends this: read afresh on every use. */
export interface OtherTabsHost {
  db(): LedgerDB | undefined;
  saver(): ProjectSaver | undefined;
  workspace(): Workspace | undefined;
  readonly register: RegisterStore;
  notify(tone: 'error' | 'info', text: string): void;
}

/** The value of a conflict's cell in a project (undefined when the row or field is absent). */
function cellValue(project: Project, c: MergeConflict): unknown {
  if (c.list === 'project') return (project as unknown as Record<string, unknown>)[c.field];
  const row = (project[c.list] as unknown as Record<string, unknown>[]).find((r) => r.id === c.rowId);
  if (!row) return undefined;
  return c.field ? row[c.field] : row;
}

export class OtherTabs {
  #host: OtherTabsHost;
  /** The newest revision of the open project another tab said it stored. */
  #heardRevision = 0;
  /** The parts each heard revision of the open project wrote, when its tab said so. */
  #heardKeys = new Map<number, string[]>();
  #catchingUp = false;

  constructor(host: OtherTabsHost) {
    this.#host = host;
  }

  /** A project was opened at `revision`: what was heard of the one before no longer counts. */
  opened(revision: number): void {
    this.#heardRevision = revision;
    this.#heardKeys.clear();
  }

  /** Another tab stored the register or the open project (list changes are the session's). */
  async heard(message: Exclude<StorageMessage, { type: 'list' }>): Promise<void> {
    if (!this.#host.db()) return;
    if (message.type === 'register') {
      if (message.conflicts?.length) this.#toldRegisterReplaced(message.conflicts);
      await this.#host.register.heard(message.revision);
      return;
    }
    const saver = this.#host.saver();
    if (!saver || message.projectId !== saver.projectId) return;
    if (message.conflicts?.length) this.#toldReplaced(message.conflicts);
    this.#heardRevision = Math.max(this.#heardRevision, message.revision);
    if (message.keys) this.#heardKeys.set(message.revision, message.keys);
    await this.catchUp();
  }

  /**
   * Takes in what other tabs stored since this tab's revision, once this tab has nothing
   * waiting to be written (a write of its own merges by itself). Edits of this tab not yet
   * stored are kept on top.
   */
  async catchUp(): Promise<void> {
    const db = this.#host.db();
    const saver = this.#host.saver();
    if (!db || !saver || this.#catchingUp || saver.pending || this.#heardRevision <= saver.revision) return;
    this.#catchingUp = true;
    try {
      const record =
        (await this.#readChanges(db, saver.projectId, saver.revision, saver.base)) ??
        (await loadProject(db, saver.projectId));
      if (!record || record.revision <= saver.revision || saver !== this.#host.saver()) return;
      for (const r of this.#heardKeys.keys()) if (r <= record.revision) this.#heardKeys.delete(r);
      const ws = this.#host.workspace();
      const base = saver.base;
      if (!ws || !saver.adopt(record)) return;
      const next = mergeProjects(base, ws.project, record.project, 'mine').project;
      ws.replaceFromOutside(next);
      if (next !== record.project) saver.schedule(next);
    } catch (error) {
      this.#host.notify('error', describeStorageError(error));
    } finally {
      this.#catchingUp = false;
    }
    if (this.#heardRevision > saver.revision) void this.catchUp();
  }

  /**
   * The stored project at the newest heard revision, reading only the parts the revisions
   * since `from` wrote, when every one of them said which; else undefined (read it whole).
   * At 14,000 machines a whole read takes about 2 s on a busy machine (`npm run bench -- catch-up`).
   */
  async #readChanges(db: LedgerDB, id: string, from: number, base: Project): Promise<ProjectRecord | undefined> {
    const target = this.#heardRevision;
    const keys: string[] = [];
    for (let r = from + 1; r <= target; r++) {
      const written = this.#heardKeys.get(r);
      if (!written) return undefined;
      keys.push(...written);
    }
    return loadChanges(db, id, base, keys, target);
  }

  /** Tells this tab when a register value it committed was replaced by another tab's later save. */
  #toldRegisterReplaced(conflicts: readonly MergeConflict<'machines'>[]): void {
    const machines = this.#host.register.register.machines as unknown as Record<string, unknown>[];
    const mine = conflicts.filter((c) => {
      const row = machines.find((m) => m.id === c.rowId);
      return same(row === undefined ? undefined : c.field ? row[c.field] : row, c.theirs);
    });
    if (!mine.length) return;
    const columns = registerColumns(this.#host.workspace()?.separator ?? '.');
    const headerOf = (field: string) => columns.find((col) => col.id === field || col.field === field)?.header ?? field;
    this.#host.notify('error', registerReplacedMessage(mine, headerOf));
  }

  /** Tells this tab when a value it committed was replaced by another tab's later save. */
  #toldReplaced(conflicts: readonly MergeConflict[]): void {
    const ws = this.#host.workspace();
    if (!ws) return;
    const mine = conflicts.filter((c) => same(cellValue(ws.project, c), c.theirs));
    if (mine.length) this.#host.notify('error', replacedMessage(ws, mine));
  }
}
