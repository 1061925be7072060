/**
 * Project storage operations on a LedgerDB: list, load, create, save, rename, duplicate,
 * delete. Each is one transaction, so a reader never sees half an edit.
 */
import { PROJECT_VERSION, type Project } from '../ledger/model.ts';
import { upgradeFile } from '../ledger/upgrade.ts';
import type { LedgerDB } from './LedgerDB.ts';
import type { ProjectRecord, ProjectSummary } from './ProjectRecord.ts';
import { PREF_LAST_PROJECT } from './PrefRecord.ts';

/** A new random id for a stored project. */
export function newProjectId(): string {
  if (typeof crypto !== 'undefined' && typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  return `p-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 10)}`;
}

/** Every project, most recently edited first, without the project bodies' weight in the result. */
export async function listProjects(db: LedgerDB): Promise<ProjectSummary[]> {
  const records = await db.projects.orderBy('updatedAt').reverse().toArray();
  return records.map((r) => ({ id: r.id, name: r.name, updatedAt: r.updatedAt }));
}

/**
 * One stored project. A body written by an older project-file version is upgraded on
 * reading, through the same steps as a file (ledger/upgrade.ts); the next save stores it
 * in the current version.
 */
export async function loadProject(db: LedgerDB, id: string): Promise<ProjectRecord | undefined> {
  const record = await db.projects.get(id);
  return record ? withCurrentBody(record) : record;
}

/** The record with its project body at the current file version (unchanged when it already is, or cannot be upgraded). */
export function withCurrentBody(record: ProjectRecord): ProjectRecord {
  const version = (record.project as { version?: unknown }).version;
  if (version === PROJECT_VERSION || typeof version !== 'number') return record;
  const upgraded = upgradeFile(record.project as unknown as Record<string, unknown>);
  if (!('file' in upgraded)) return record;
  return { ...record, project: upgraded.file as unknown as Project };
}

/** Stores a new project and returns its record (revision 1). */
export async function createProject(db: LedgerDB, project: Project): Promise<ProjectRecord> {
  const now = Date.now();
  const record: ProjectRecord = {
    id: newProjectId(),
    name: project.name,
    project,
    createdAt: now,
    updatedAt: now,
    revision: 1,
  };
  await db.projects.add(record);
  return record;
}

/**
 * Writes the project over the stored one and returns the new revision (the stored
 * revision + 1). Throws when the project no longer exists (deleted in another tab).
 */
export async function saveProject(db: LedgerDB, id: string, project: Project): Promise<number> {
  return db.transaction('rw', db.projects, async () => {
    const old = await db.projects.get(id);
    if (!old) throw new Error(`The project "${project.name}" was deleted in another tab; export it to keep this copy.`);
    const revision = old.revision + 1;
    await db.projects.put({ ...old, name: project.name, project, updatedAt: Date.now(), revision });
    return revision;
  });
}

/** Renames a stored project (the record's name and the project's own name). Returns the new revision. */
export async function renameProject(db: LedgerDB, id: string, name: string): Promise<number> {
  return db.transaction('rw', db.projects, async () => {
    const old = await db.projects.get(id);
    if (!old) throw new Error('That project no longer exists.');
    const revision = old.revision + 1;
    await db.projects.put({ ...old, name, project: { ...old.project, name }, updatedAt: Date.now(), revision });
    return revision;
  });
}

/** Copies a stored project under a new id and the given name. */
export async function duplicateProject(db: LedgerDB, id: string, name: string): Promise<ProjectRecord> {
  const old = await db.projects.get(id);
  if (!old) throw new Error('That project no longer exists.');
  const copy = structuredClone(old.project);
  return createProject(db, { ...copy, name });
}

export async function deleteProject(db: LedgerDB, id: string): Promise<void> {
  await db.transaction('rw', db.projects, db.prefs, async () => {
    await db.projects.delete(id);
    const last = await db.prefs.get(PREF_LAST_PROJECT);
    if (last?.value === id) await db.prefs.delete(PREF_LAST_PROJECT);
  });
}

export async function rememberLastProject(db: LedgerDB, id: string): Promise<void> {
  await db.prefs.put({ key: PREF_LAST_PROJECT, value: id });
}

/** The project to open on start: the last one opened, else the most recently edited, else none. */
export async function projectToOpen(db: LedgerDB): Promise<ProjectRecord | undefined> {
  const last = await db.prefs.get(PREF_LAST_PROJECT);
  if (last) {
    const record = await db.projects.get(last.value);
    if (record) return record;
  }
  return db.projects.orderBy('updatedAt').last();
}
