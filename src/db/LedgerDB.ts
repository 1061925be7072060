/**
 * LedgerDB: the browser's IndexedDB store for projects and preferences (Dexie 4).
 * Indexes and versions are declared in ./schema.ts, each with the reason for it.
 */
import { Dexie, type EntityTable, type Table } from 'dexie';
import type { ProjectPart } from './project-parts.ts';
import type { StoredProject } from './ProjectRecord.ts';
import type { PrefRecord } from './PrefRecord.ts';
import type { RegisterRecord } from './RegisterRecord.ts';
import { LEDGER_DB_NAME, declareVersion1, declareVersion2, declareVersion3, declareVersion4 } from './schema.ts';

export class LedgerDB extends Dexie {
  /** Projects' bookkeeping by id; indexes `name`, `updatedAt`. The bodies are in {@link parts}. */
  projects!: EntityTable<StoredProject, 'id'>;
  /** Preferences by key. */
  prefs!: EntityTable<PrefRecord, 'key'>;
  /** The buyer's machine registers by id (schema version 3). */
  registers!: EntityTable<RegisterRecord, 'id'>;
  /** Projects' parts by [projectId, key] (schema version 4): head, orders, rows, revision markers. */
  parts!: Table<ProjectPart, [string, string]>;

  constructor(name = LEDGER_DB_NAME, options?: ConstructorParameters<typeof Dexie>[1]) {
    super(name, options);
    declareVersion1(this);
    declareVersion2(this);
    declareVersion3(this);
    declareVersion4(this);
  }
}
