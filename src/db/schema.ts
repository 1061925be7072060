/**
 * The LedgerDB schema, one function per version so an upgrade test can open a database
 * at an old version, seed it, and reopen it at the current one.
 *
 * Dexie keeps every declared version: a database opened by newer code runs the upgrade
 * functions of each version above the one stored, in order. Never edit a shipped
 * version; add a new one.
 */
import type { Dexie, Transaction } from 'dexie';
import type { Project } from '../ledger/model/model.ts';
import { revisionKey, toParts } from './project-parts.ts';

/** The database name in the browser. */
export const LEDGER_DB_NAME = 'plant-noise-ledger';

/** The latest schema version this code declares. */
export const LEDGER_DB_VERSION = 4;

/**
 * Version 1: projects keyed by id, listed by name; preferences by key.
 * - `projects`: primary key `id` (a random string, assigned by the app); index `name` so the
 *   project list comes out sorted without reading every project body.
 * - `prefs`: primary key `key`; no other index (a handful of rows, read by key).
 */
export function declareVersion1(db: Dexie): void {
  db.version(1).stores({
    projects: 'id, name',
    prefs: 'key',
  });
}

/**
 * Version 2: records gain `updatedAt` and `revision`.
 * - index `updatedAt` so "most recently edited first" and "open the last edited project"
 *   read only the index;
 * - `revision` is not indexed: it is read together with the record it belongs to.
 * Upgrade: existing records take `updatedAt` from `createdAt` (or now when absent) and
 * `revision` 1.
 */
export function declareVersion2(db: Dexie): void {
  db.version(2)
    .stores({
      projects: 'id, name, updatedAt',
      prefs: 'key',
    })
    .upgrade(upgradeToVersion2);
}

/** Adds `updatedAt` and `revision` to every project stored by version 1. */
export async function upgradeToVersion2(tx: Transaction): Promise<void> {
  const now = Date.now();
  await tx
    .table('projects')
    .toCollection()
    .modify((record: Record<string, unknown>) => {
      const created = typeof record.createdAt === 'number' ? record.createdAt : now;
      if (typeof record.createdAt !== 'number') record.createdAt = created;
      if (typeof record.updatedAt !== 'number') record.updatedAt = created;
      if (typeof record.revision !== 'number') record.revision = 1;
    });
}

/**
 * Version 3: the buyer's machine register, kept across projects.
 * - `registers`: primary key `id` ("main" for the app's register); no other index (one or a
 *   few rows, read by key). The register body is stored whole, in its file's shape.
 * Upgrade: nothing to convert (the table is new); projects and preferences stay as they are.
 */
export function declareVersion3(db: Dexie): void {
  db.version(3).stores({
    projects: 'id, name, updatedAt',
    prefs: 'key',
    registers: 'id',
  });
}

/**
 * Version 4: a project is stored as parts (./project-parts.ts), so an edit writes the rows
 * it changed, not the whole project.
 * - `projects` keeps only the bookkeeping (id, name, createdAt, updatedAt, revision);
 * - `parts`: primary key `[projectId+key]` (the project's head, each list's order, each row,
 *   and one marker per revision); a project's parts are read or deleted as one key range.
 * Upgrade: each stored project body is split into parts, with the marker of its revision,
 * and removed from its `projects` record.
 */
export function declareVersion4(db: Dexie): void {
  db.version(4)
    .stores({
      projects: 'id, name, updatedAt',
      prefs: 'key',
      registers: 'id',
      parts: '[projectId+key]',
    })
    .upgrade(upgradeToVersion4);
}

/** Splits every project body stored by version 3 into parts. */
export async function upgradeToVersion4(tx: Transaction): Promise<void> {
  const projects = tx.table('projects');
  const parts = tx.table('parts');
  const records = (await projects.toArray()) as Record<string, unknown>[];
  for (const record of records) {
    const id = String(record.id);
    const body = record.project as Project | undefined;
    const revision = typeof record.revision === 'number' ? record.revision : 1;
    if (body && typeof body === 'object')
      await parts.bulkPut([...toParts(id, body), { projectId: id, key: revisionKey(revision), value: null }]);
    const { project: _body, ...meta } = record;
    await projects.put({ ...meta, revision });
  }
}
