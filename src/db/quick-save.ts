/**
 * The save made after each edit: one IndexedDB transaction that writes only the parts the
 * edit changed, the new revision's marker and the bookkeeping, issued at once (no read
 * first) and committed explicitly, so the edit is on disk within milliseconds even while
 * the page is busy redrawing. When another tab stored that revision first, adding the
 * marker fails, nothing is written, and {@link RevisionTakenError} says to merge instead.
 */
import type { Project } from '../ledger/model/model.ts';
import type { LedgerDB } from './LedgerDB.ts';
import type { StoredProject } from './ProjectRecord.ts';
import { KEPT_REVISION_MARKERS, partChanges, revisionKey, toParts, type PartChanges } from './project-parts.ts';

/** Another tab stored the revision this save would make: merge with what is stored (./projects.ts saveMerged). */
export class RevisionTakenError extends Error {
  constructor() {
    super('Another tab saved this project first.');
    this.name = 'RevisionTakenError';
  }
}

export interface QuickSave {
  /** The revision written. */
  revision: number;
  /** What was written (for telling other tabs which parts to read). */
  changes: PartChanges;
}

/**
 * Writes `project` as revision `meta.revision + 1`, given `base`, the project as stored at
 * `meta.revision` (undefined: write every part). Resolves when IndexedDB has committed.
 */
export function quickSave(
  db: LedgerDB,
  meta: StoredProject,
  base: Project | undefined,
  project: Project,
): Promise<QuickSave> {
  const id = meta.id;
  const revision = meta.revision + 1;
  const changes = base ? partChanges(id, base, project) : { put: toParts(id, project), remove: [] };
  const idb = db.backendDB();
  return new Promise<QuickSave>((resolve, reject) => {
    let tx: IDBTransaction;
    try {
      tx = idb.transaction(['projects', 'parts'], 'readwrite');
    } catch (error) {
      reject(error);
      return;
    }
    const parts = tx.objectStore('parts');
    parts.add({ projectId: id, key: revisionKey(revision), value: null });
    for (const key of changes.remove) parts.delete([id, key]);
    for (const part of changes.put) parts.put(part);
    tx.objectStore('projects').put({
      ...meta,
      name: project.name,
      updatedAt: Date.now(),
      revision,
    } satisfies StoredProject);
    const pruneBelow = revision - KEPT_REVISION_MARKERS;
    if (revision % 100 === 0 && pruneBelow > 0)
      parts.delete(IDBKeyRange.bound([id, revisionKey(0)], [id, revisionKey(pruneBelow)]));
    tx.oncomplete = () => resolve({ revision, changes });
    tx.onabort = () => {
      const error = tx.error;
      reject(
        error?.name === 'ConstraintError'
          ? new RevisionTakenError()
          : (error ?? new Error('The save was cancelled by the browser.')),
      );
    };
    if (typeof tx.commit === 'function') tx.commit();
  });
}
