/**
 * Saves the open project as the user edits. Each committed edit is written at once, in
 * one IndexedDB transaction holding only the rows it changed (db/quick-save.ts), so it is
 * on disk within milliseconds, whatever the project's size, and survives the tab or the
 * browser closing or being killed right after. Edits made while a write is under way go
 * in the next one.
 *
 * Every write carries the revision it was based on. When another tab stored a newer
 * revision first, the two are merged cell by cell (db/projects.ts saveMerged): a cell both
 * changed keeps this tab's value, written last, and the other tabs are told.
 *
 * A write that fails is kept in memory, said in words, and tried again on the next edit
 * and every few seconds; nothing is written to localStorage any more.
 */
import type { Project } from '../../ledger/model/model.ts';
import type { MergeConflict } from '../../ledger/file/project-merge.ts';
import {
  createProject,
  describeStorageError,
  loadProject,
  quickSave,
  RevisionTakenError,
  saveMerged,
  saveProject,
  type LedgerDB,
  type ProjectRecord,
  type StoredProject,
} from '../../db/index.ts';

/** Wait before trying a failed write again, ms. */
export const RETRY_MS = 4000;

export interface SaverEvents {
  /** After a write: the new stored revision, the part keys written, and the cells where this tab's value replaced another tab's. */
  onsaved?: (revision: number, changedKeys: string[], conflicts: MergeConflict[]) => void;
  /**
   * The write was merged with other tabs' edits: `sent` is what this tab wrote, `stored`
   * what is stored now. Returns the tab's project after taking the other tabs' edits in.
   */
  onmerged?: (sent: Project, stored: Project) => Project;
  /** A write failed: the message in words. */
  onerror?: (message: string) => void;
  /** Saving state changed (true while an edit waits or is being written). */
  onpending?: (pending: boolean) => void;
}

export class ProjectSaver {
  readonly projectId: string;
  #db: LedgerDB;
  #events: SaverEvents;
  /** The stored bookkeeping at {@link revision}. */
  #meta: StoredProject;
  /** The project as stored at {@link revision}. */
  #base: Project;
  /** The stored body is an older file version: the next write is whole. */
  #whole: boolean;
  /** The newest project not yet stored, if any. */
  #latest: Project | undefined;
  #running: Promise<void> | undefined;
  #retry: ReturnType<typeof setTimeout> | undefined;
  #disposed = false;

  constructor(db: LedgerDB, record: ProjectRecord, events: SaverEvents = {}) {
    this.#db = db;
    this.projectId = record.id;
    const { project, olderBody, ...meta } = record;
    this.#meta = meta;
    this.#base = project;
    this.#whole = olderBody === true;
    this.#events = events;
  }

  /** The stored revision this tab's project is based on. */
  get revision(): number {
    return this.#meta.revision;
  }

  /** The project as stored at {@link revision}. */
  get base(): Project {
    return this.#base;
  }

  /** True while an edit waits to be written or is being written. */
  get pending(): boolean {
    return this.#latest !== undefined;
  }

  /** Writes the project now (after the write under way, if any). */
  schedule(project: Project): void {
    if (this.#disposed) return;
    this.#latest = project === this.#base && !this.#whole && !this.#running ? undefined : project;
    this.#events.onpending?.(this.#latest !== undefined);
    this.#kick();
  }

  /**
   * Takes a newer stored revision written by another tab (nothing waits to be written).
   * @returns false when an edit of this tab waits, so the revision was not taken
   */
  adopt(record: ProjectRecord): boolean {
    if (this.#latest !== undefined || this.#running) return false;
    const { project, olderBody, ...meta } = record;
    this.#meta = meta;
    this.#base = project;
    this.#whole = olderBody === true;
    return true;
  }

  /** Resolves when every edit scheduled so far is stored (or its write failed). */
  async flush(): Promise<void> {
    if (this.#retry !== undefined && this.#latest !== undefined) {
      clearTimeout(this.#retry);
      this.#retry = undefined;
      this.#kick();
    }
    while (this.#running) await this.#running;
  }

  /** The page is going away: nothing to do but make sure a write is under way. */
  leave(): void {
    if (this.#latest !== undefined && !this.#running) this.#kick();
  }

  /** Stops retrying (the project is being closed or was deleted). */
  dispose(): void {
    this.#disposed = true;
    if (this.#retry !== undefined) clearTimeout(this.#retry);
    this.#retry = undefined;
  }

  #kick(): void {
    if (this.#running || this.#disposed) return;
    if (this.#retry !== undefined) {
      clearTimeout(this.#retry);
      this.#retry = undefined;
    }
    const run = this.#drain().finally(() => {
      if (this.#running === run) this.#running = undefined;
    });
    this.#running = run;
  }

  async #drain(): Promise<void> {
    while (this.#latest !== undefined && !this.#disposed) {
      const sent = this.#latest;
      try {
        await this.#write(sent);
      } catch (error) {
        this.#events.onerror?.(describeStorageError(error));
        this.#retry = setTimeout(() => {
          this.#retry = undefined;
          this.#kick();
        }, RETRY_MS);
        return;
      }
      if (this.#latest === sent) this.#latest = undefined;
    }
    this.#events.onpending?.(false);
  }

  async #write(sent: Project): Promise<void> {
    try {
      const saved = await quickSave(this.#db, this.#meta, this.#whole ? undefined : this.#base, sent);
      this.#meta = { ...this.#meta, name: sent.name, revision: saved.revision, updatedAt: Date.now() };
      this.#base = sent;
      this.#whole = false;
      this.#events.onsaved?.(saved.revision, [...saved.changes.put.map((p) => p.key), ...saved.changes.remove], []);
    } catch (error) {
      if (!(error instanceof RevisionTakenError)) throw error;
      const merged = await saveMerged(this.#db, this.projectId, this.#base, sent);
      this.#meta = { ...this.#meta, name: merged.project.name, revision: merged.revision, updatedAt: Date.now() };
      this.#base = merged.project;
      this.#whole = false;
      const mine = this.#events.onmerged?.(sent, merged.project) ?? merged.project;
      // edits made while this write was under way now sit on top of the merged project
      if (this.#latest !== sent && this.#latest !== undefined) this.#latest = mine;
      this.#events.onsaved?.(merged.revision, [], merged.conflicts);
    }
  }
}

const JOURNAL_PREFIX = 'plant-noise-ledger/unsaved/';

function storage(): Storage | undefined {
  try {
    return typeof localStorage === 'undefined' ? undefined : localStorage;
  } catch {
    return undefined;
  }
}

/** What {@link recoverUnsaved} did with copies an earlier version of the app left in localStorage. */
export interface Recovery {
  /** Projects whose copy was written into the database. */
  recovered: string[];
  /** Copies stored as new projects because their project had moved on in another tab: the new projects' names. */
  keptApart: string[];
}

/**
 * Earlier versions of the app kept a copy of an unsaved edit in localStorage when a page
 * closed. Each copy is written into the database (over its project when the stored project
 * has not moved on since, else as a new project beside it, so no copy is dropped
 * silently) and removed only once it is written.
 */
export async function recoverUnsaved(db: LedgerDB): Promise<Recovery> {
  const result: Recovery = { recovered: [], keptApart: [] };
  const store = storage();
  if (!store) return result;
  const keys: string[] = [];
  for (let i = 0; i < store.length; i++) {
    const key = store.key(i);
    if (key?.startsWith(JOURNAL_PREFIX)) keys.push(key);
  }
  for (const key of keys) {
    const projectId = key.slice(JOURNAL_PREFIX.length);
    let entry: { project: Project; baseRevision: number } | null;
    try {
      entry = JSON.parse(store.getItem(key) ?? 'null', (_k, v) => (v === '__NaN__' ? NaN : v)) as {
        project: Project;
        baseRevision: number;
      } | null;
    } catch {
      entry = null;
    }
    if (!entry || typeof entry !== 'object' || !entry.project || typeof entry.project !== 'object') {
      store.removeItem(key);
      continue;
    }
    try {
      const record = await loadProject(db, projectId);
      if (record && record.revision <= entry.baseRevision) {
        await saveProject(db, projectId, entry.project);
        result.recovered.push(projectId);
      } else {
        const name = `${entry.project.name || 'Project'} (recovered copy)`;
        await createProject(db, { ...entry.project, name });
        result.keptApart.push(name);
      }
      store.removeItem(key);
    } catch {
      // not written: the copy stays for the next start
    }
  }
  return result;
}
