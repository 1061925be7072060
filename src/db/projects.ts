/**
 * Project storage operations on a LedgerDB: list, load, create, save, rename, duplicate,
 * delete. Each is one transaction, so a reader never sees half an edit. A project is
 * stored as parts (./project-parts.ts); every write adds the marker of the revision it
 * makes, so two tabs can never both write the same revision.
 */
import { Dexie } from 'dexie';
import type { Project } from '../ledger/model/model.ts';
import { checkProjectData } from '../ledger/file/project-file.ts';
import { mergeProjects, type MergeConflict } from '../ledger/file/project-merge.ts';
import type { LedgerDB } from './LedgerDB.ts';
import type { ProjectRecord, ProjectSummary, StoredProject } from './ProjectRecord.ts';
import { PREF_LAST_PROJECT } from './PrefRecord.ts';
import {
  KEPT_REVISION_MARKERS,
  withParts,
  fromParts,
  partChanges,
  revisionKey,
  toParts,
  type PartChanges,
  type ProjectPart,
} from './project-parts.ts';

/** A new random id for a stored project. */
export function newProjectId(): string {
  if (typeof crypto !== 'undefined' && typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  return `p-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 10)}`;
}

/** Every project, most recently edited first (the bookkeeping only; bodies are not read). */
export async function listProjects(db: LedgerDB): Promise<ProjectSummary[]> {
  const records = await db.projects.orderBy('updatedAt').reverse().toArray();
  return records.map((r) => ({ id: r.id, name: r.name, updatedAt: r.updatedAt }));
}

/** The key range of all of a project's parts. */
function allParts(db: LedgerDB, id: string) {
  return db.parts.where('[projectId+key]').between([id, Dexie.minKey], [id, Dexie.maxKey], true, true);
}

/** A stored project as it is in storage (no upgrade), or undefined. Call inside a transaction for a consistent read. */
async function readStored(db: LedgerDB, id: string): Promise<ProjectRecord | undefined> {
  const meta = await db.projects.get(id);
  if (!meta) return undefined;
  const parts = await allParts(db, id).toArray();
  const project = fromParts(parts);
  if (!project)
    throw new UnopenableProjectError(meta.id, meta.name, [
      'its contents are missing (only its name and dates are stored)',
    ]);
  return { ...meta, project };
}

/**
 * A stored project that cannot be opened: its body is damaged, was written by a newer
 * version of the program, or could not be upgraded. It is never dropped: the app says so
 * and offers to export its stored text ({@link storedText}) or to delete it.
 */
export class UnopenableProjectError extends Error {
  constructor(
    readonly projectId: string,
    readonly projectName: string,
    /** Every problem found, in words. */
    readonly problems: readonly string[],
  ) {
    super(`The stored project "${projectName}" cannot be opened: ${problems.join('; ')}`);
    this.name = 'UnopenableProjectError';
  }
}

/**
 * One stored project. A body written by an older project-file version is upgraded on
 * reading, through the same steps as a file (ledger/file/upgrade.ts), and marked `olderBody`
 * so that its first save writes it whole in the current version.
 */
export async function loadProject(db: LedgerDB, id: string): Promise<ProjectRecord | undefined> {
  const record = await db.transaction('r', db.projects, db.parts, () => readStored(db, id));
  return record ? withCurrentBody(record) : record;
}

/**
 * The stored project at `revision`, read as `base` (the project at an earlier revision) with
 * only the parts named in `keys` read again: what the revisions between wrote. Undefined when
 * the stored revision is not `revision` (another write came in: read the whole project instead).
 */
export async function loadChanges(
  db: LedgerDB,
  id: string,
  base: Project,
  keys: readonly string[],
  revision: number,
): Promise<ProjectRecord | undefined> {
  return db.transaction('r', db.projects, db.parts, async () => {
    const meta = await db.projects.get(id);
    if (!meta || meta.revision !== revision) return undefined;
    const unique = [...new Set(keys)];
    const parts = await db.parts.bulkGet(unique.map((key) => [id, key] as [string, string]));
    const changed = new Map<string, unknown>();
    unique.forEach((key, i) => changed.set(key, parts[i]?.value));
    return { ...meta, project: withParts(base, changed) };
  });
}

/**
 * The record with its project body at the current file version (the same record when it
 * already is). Throws {@link UnopenableProjectError} when the body is not a project this
 * program can hold: a newer version, a failed upgrade, or a damaged shape (the same checks
 * as a project file, ledger/file/project-file.ts).
 */
export function withCurrentBody(record: ProjectRecord): ProjectRecord {
  const outcome = checkProjectData(record.project);
  if ('problems' in outcome)
    throw new UnopenableProjectError(
      record.id,
      record.name,
      outcome.problems.map((p) => p.message),
    );
  if (outcome.upgradedFrom === undefined)
    return outcome.project === record.project ? record : { ...record, project: outcome.project };
  return { ...record, project: outcome.project, olderBody: true };
}

/**
 * A stored project's text exactly as kept, not upgraded or checked, for the user to save
 * when it cannot be opened: its body as JSON (NaN written as null), or, when the body cannot
 * be put together, its bookkeeping and every stored part. Undefined when there is no such project.
 */
export async function storedText(db: LedgerDB, id: string): Promise<string | undefined> {
  return db.transaction('r', db.projects, db.parts, async () => {
    const meta = await db.projects.get(id);
    if (!meta) return undefined;
    const parts = (await allParts(db, id).toArray()).filter((p) => !p.key.startsWith('rev/'));
    const body = fromParts(parts);
    const value = body ?? { stored: meta, parts };
    try {
      return `${JSON.stringify(value, (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2)}\n`;
    } catch {
      return String(value);
    }
  });
}

function marker(projectId: string, revision: number): ProjectPart {
  return { projectId, key: revisionKey(revision), value: null };
}

/** Writes the changes, the new revision's marker (failing when it exists) and the bookkeeping. Inside a rw transaction. */
async function writeRevision(db: LedgerDB, meta: StoredProject, changes: PartChanges): Promise<void> {
  await db.parts.add(marker(meta.id, meta.revision));
  if (changes.remove.length) await db.parts.bulkDelete(changes.remove.map((key) => [meta.id, key] as [string, string]));
  if (changes.put.length) await db.parts.bulkPut(changes.put);
  await db.projects.put(meta);
  const pruneBelow = meta.revision - KEPT_REVISION_MARKERS;
  if (meta.revision % 100 === 0 && pruneBelow > 0) {
    await db.parts
      .where('[projectId+key]')
      .between([meta.id, revisionKey(0)], [meta.id, revisionKey(pruneBelow)])
      .delete();
  }
}

/** Stores a new project and returns its record (revision 1). */
export async function createProject(db: LedgerDB, project: Project): Promise<ProjectRecord> {
  const now = Date.now();
  const meta: StoredProject = { id: newProjectId(), name: project.name, createdAt: now, updatedAt: now, revision: 1 };
  await db.transaction('rw', db.projects, db.parts, () =>
    writeRevision(db, meta, { put: toParts(meta.id, project), remove: [] }),
  );
  return { ...meta, project };
}

function deletedMessage(name: string): string {
  return `The project "${name}" was deleted in another tab; export it to keep this copy.`;
}

/**
 * Writes the project over the stored one, whatever it holds now (a recovered copy, a
 * test), and returns the new revision. Throws when the project no longer exists.
 */
export async function saveProject(db: LedgerDB, id: string, project: Project): Promise<number> {
  return db.transaction('rw', db.projects, db.parts, async () => {
    const old = await readStored(db, id);
    if (!old) throw new Error(deletedMessage(project.name));
    const revision = old.revision + 1;
    const { project: _old, olderBody: _o, ...meta } = old;
    await writeRevision(
      db,
      { ...meta, name: project.name, updatedAt: Date.now(), revision },
      partChanges(id, old.project, project),
    );
    return revision;
  });
}

export interface MergedSave {
  /** The revision written. */
  revision: number;
  /** The project as stored now: the other tabs' edits with this tab's merged in. */
  project: Project;
  /** Cells both changed; this tab's value was kept (its save is the later one). */
  conflicts: MergeConflict[];
}

/**
 * Saves `mine`, made from `base` (the stored project at the revision this tab last had),
 * when other tabs have stored newer revisions since: their edits and mine are merged cell
 * by cell; a cell both changed keeps mine (committed last), and is listed so the other
 * tab can be told. Throws when the project no longer exists.
 */
export async function saveMerged(db: LedgerDB, id: string, base: Project, mine: Project): Promise<MergedSave> {
  return db.transaction('rw', db.projects, db.parts, async () => {
    const stored = await readStored(db, id);
    if (!stored) throw new Error(deletedMessage(mine.name));
    const current = withCurrentBody(stored);
    const { project, conflicts } = mergeProjects(base, mine, current.project, 'mine');
    const revision = stored.revision + 1;
    const changes = current.olderBody
      ? { put: toParts(id, project), remove: [] }
      : partChanges(id, stored.project, project);
    const { project: _p, olderBody: _o, ...meta } = stored;
    await writeRevision(db, { ...meta, name: project.name, updatedAt: Date.now(), revision }, changes);
    return { revision, project, conflicts };
  });
}

/** Renames a stored project (the record's name and the project's own name). Returns the new revision. */
export async function renameProject(db: LedgerDB, id: string, name: string): Promise<number> {
  return db.transaction('rw', db.projects, db.parts, async () => {
    const old = await readStored(db, id);
    if (!old) throw new Error('That project no longer exists.');
    const revision = old.revision + 1;
    const { project: _p, olderBody: _o, ...meta } = old;
    await writeRevision(
      db,
      { ...meta, name, updatedAt: Date.now(), revision },
      partChanges(id, old.project, { ...old.project, name }),
    );
    return revision;
  });
}

/** Copies a stored project under a new id and the given name. */
export async function duplicateProject(db: LedgerDB, id: string, name: string): Promise<ProjectRecord> {
  const old = await loadProject(db, id);
  if (!old) throw new Error('That project no longer exists.');
  const copy = structuredClone(old.project);
  return createProject(db, { ...copy, name });
}

/**
 * Deletes a project: its bookkeeping and every part but the revision markers, plus the
 * marker of the next revision, so a tab still saving it finds its revision taken, reads
 * again and learns that the project was deleted instead of bringing half of it back.
 */
export async function deleteProject(db: LedgerDB, id: string): Promise<void> {
  await db.transaction('rw', db.projects, db.parts, db.prefs, async () => {
    const meta = await db.projects.get(id);
    await db.projects.delete(id);
    const keyed = db.parts.where('[projectId+key]');
    await keyed.between([id, Dexie.minKey], [id, 'rev/'], true, false).delete();
    await keyed.between([id, 'rev0'], [id, Dexie.maxKey], true, true).delete();
    if (meta) await db.parts.put(marker(id, meta.revision + 1));
    const last = await db.prefs.get(PREF_LAST_PROJECT);
    if (last?.value === id) await db.prefs.delete(PREF_LAST_PROJECT);
  });
}

export async function rememberLastProject(db: LedgerDB, id: string): Promise<void> {
  await db.prefs.put({ key: PREF_LAST_PROJECT, value: id });
}

/**
 * The project to open on start: `preferred` (the one this tab had open before a reload)
 * when it still exists, else the last one opened, else the most recently edited that can
 * be opened, else none. Each stored project that cannot be opened is passed to
 * `onUnopenable` and passed over.
 */
export async function projectToOpen(
  db: LedgerDB,
  preferred?: string,
  onUnopenable: (error: UnopenableProjectError) => void = () => undefined,
): Promise<ProjectRecord | undefined> {
  const tried = new Set<string>();
  const attempt = async (id: string): Promise<ProjectRecord | undefined> => {
    if (tried.has(id)) return undefined;
    tried.add(id);
    try {
      return await loadProject(db, id);
    } catch (error) {
      if (!(error instanceof UnopenableProjectError)) throw error;
      onUnopenable(error);
      return undefined;
    }
  };
  if (preferred) {
    const record = await attempt(preferred);
    if (record) return record;
  }
  const last = await db.prefs.get(PREF_LAST_PROJECT);
  if (last) {
    const record = await attempt(last.value);
    if (record) return record;
  }
  for (const id of await db.projects.orderBy('updatedAt').reverse().primaryKeys()) {
    const record = await attempt(id);
    if (record) return record;
  }
  return undefined;
}
