/**
 * Saves the open project as the user edits: a change is written to IndexedDB once the
 * user pauses ({@link SAVE_DELAY_MS}, at most {@link SAVE_MAX_DELAY_MS} while editing on)
 * and the browser is idle, and at once when the page is hidden or closed.
 * So that a reload never loses a committed edit, a change not yet confirmed by IndexedDB
 * is also written synchronously to localStorage when the page goes away, and written into
 * the database on the next start ({@link recoverUnsaved}).
 */
import type { Project } from '../../ledger/model.ts';
import { saveProject, loadProject, describeStorageError, type LedgerDB } from '../../db/index.ts';

/**
 * Quiet time after the last edit before it is saved, ms. Writing a large project to
 * IndexedDB copies all of it on the main thread (tens of ms for 5,000 machines), so the
 * write waits until the user pauses and the browser is idle, never in an edit's frame.
 */
export const SAVE_DELAY_MS = 200;
/** Longest wait between an edit and its save while the user keeps editing, ms. */
export const SAVE_MAX_DELAY_MS = 2000;
/** Longest wait for the browser to be idle once a save is due, ms. */
const IDLE_TIMEOUT_MS = 500;

const JOURNAL_PREFIX = 'plant-noise-ledger/unsaved/';

interface JournalEntry {
  project: Project;
  /**
   * The highest stored revision this copy may replace: the revision the edit was made on,
   * plus one when this tab's own earlier save was still being written (it may or may not
   * have landed). A higher stored revision means another tab saved since.
   */
  baseRevision: number;
}

export interface SaverEvents {
  /** After a save: the new stored revision. */
  onsaved?: (revision: number) => void;
  /** A save failed: the message in words. */
  onerror?: (message: string) => void;
  /** Saving state changed (true while an edit waits or is being written). */
  onpending?: (pending: boolean) => void;
}

export class ProjectSaver {
  readonly projectId: string;
  #db: LedgerDB;
  #events: SaverEvents;
  #pending: Project | undefined;
  #timer: ReturnType<typeof setTimeout> | undefined;
  /** When the oldest unsaved edit was scheduled (Date.now(), ms). */
  #firstPendingAt: number | undefined;
  #idle: number | undefined;
  #writing: Promise<void> = Promise.resolve();
  /** The project being written now, until IndexedDB confirms it. */
  #inFlight: Project | undefined;
  /** The project last copied to localStorage by {@link leave}. */
  #journaled: Project | undefined;
  /** The stored revision this tab's project corresponds to. */
  revision: number;

  constructor(db: LedgerDB, projectId: string, revision: number, events: SaverEvents = {}) {
    this.#db = db;
    this.projectId = projectId;
    this.revision = revision;
    this.#events = events;
  }

  /** True while an edit waits to be written. */
  get pending(): boolean {
    return this.#pending !== undefined;
  }

  /**
   * Queues the project to be saved {@link SAVE_DELAY_MS} after the last edit (at most
   * {@link SAVE_MAX_DELAY_MS} after the first unsaved one), when the browser is idle.
   */
  schedule(project: Project): void {
    this.#pending = project;
    this.#events.onpending?.(true);
    const now = Date.now();
    this.#firstPendingAt ??= now;
    if (this.#timer !== undefined) clearTimeout(this.#timer);
    const wait = Math.max(0, Math.min(SAVE_DELAY_MS, this.#firstPendingAt + SAVE_MAX_DELAY_MS - now));
    this.#timer = setTimeout(() => {
      this.#timer = undefined;
      this.#whenIdle(() => void this.flush());
    }, wait);
  }

  /** Runs `write` when the browser is idle (at once where it cannot say). */
  #whenIdle(write: () => void): void {
    if (typeof requestIdleCallback !== 'function') return write();
    if (this.#idle !== undefined) return;
    this.#idle = requestIdleCallback(
      () => {
        this.#idle = undefined;
        write();
      },
      { timeout: IDLE_TIMEOUT_MS },
    );
  }

  /** Writes the waiting edit now; resolves when it is stored (or failed). */
  async flush(): Promise<void> {
    this.#cancelTimers();
    this.#firstPendingAt = undefined;
    const project = this.#pending;
    if (project === undefined) return this.#writing;
    this.#pending = undefined;
    const write = this.#writing.then(async () => {
      this.#inFlight = project;
      try {
        this.revision = await saveProject(this.#db, this.projectId, project);
        if (project === this.#journaled) {
          clearJournal(this.projectId);
          this.#journaled = undefined;
        }
        this.#events.onsaved?.(this.revision);
      } catch (error) {
        writeJournal(this.projectId, { project, baseRevision: this.revision });
        this.#events.onerror?.(describeStorageError(error));
      } finally {
        this.#inFlight = undefined;
        if (this.#pending === undefined) this.#events.onpending?.(false);
      }
    });
    this.#writing = write;
    return write;
  }

  /**
   * The page is going away: start the database write and keep a synchronous copy in
   * localStorage in case the page closes before IndexedDB confirms it.
   */
  leave(): void {
    const project = this.#pending ?? this.#inFlight;
    if (project !== undefined) {
      const writing = this.#inFlight !== undefined ? 1 : 0;
      writeJournal(this.projectId, { project, baseRevision: this.revision + writing });
      this.#journaled = project;
    }
    void this.flush();
  }

  /** Stops the timer without saving (the project is being closed after a flush). */
  dispose(): void {
    this.#cancelTimers();
  }

  #cancelTimers(): void {
    if (this.#timer !== undefined) clearTimeout(this.#timer);
    this.#timer = undefined;
    if (this.#idle !== undefined && typeof cancelIdleCallback === 'function') cancelIdleCallback(this.#idle);
    this.#idle = undefined;
  }
}

function storage(): Storage | undefined {
  try {
    return typeof localStorage === 'undefined' ? undefined : localStorage;
  } catch {
    return undefined;
  }
}

function writeJournal(projectId: string, entry: JournalEntry): void {
  try {
    storage()?.setItem(JOURNAL_PREFIX + projectId, JSON.stringify(entry, (_k, v) => (typeof v === 'number' && Number.isNaN(v) ? '__NaN__' : v)));
  } catch {
    // localStorage full or refused: the IndexedDB write is still under way.
  }
}

function clearJournal(projectId: string): void {
  try {
    storage()?.removeItem(JOURNAL_PREFIX + projectId);
  } catch {
    // nothing to clear
  }
}

/**
 * Writes into the database the edits a closed page left in localStorage, when the stored
 * project has not moved on since (its revision is still the one the edit was made on).
 * Returns the ids of the projects recovered.
 */
export async function recoverUnsaved(db: LedgerDB): Promise<string[]> {
  const store = storage();
  if (!store) return [];
  const recovered: string[] = [];
  const keys: string[] = [];
  for (let i = 0; i < store.length; i++) {
    const key = store.key(i);
    if (key?.startsWith(JOURNAL_PREFIX)) keys.push(key);
  }
  for (const key of keys) {
    const projectId = key.slice(JOURNAL_PREFIX.length);
    try {
      const entry = JSON.parse(store.getItem(key) ?? 'null', (_k, v) => (v === '__NaN__' ? NaN : v)) as JournalEntry | null;
      const record = await loadProject(db, projectId);
      if (entry && record && record.revision <= entry.baseRevision) {
        await saveProject(db, projectId, entry.project);
        recovered.push(projectId);
      }
    } catch {
      // unreadable entry: drop it
    }
    store.removeItem(key);
  }
  return recovered;
}
