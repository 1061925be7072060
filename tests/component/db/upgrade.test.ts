/**
 * LedgerDB schema upgrades: each test seeds a database at the old version with
 * fake-indexeddb, reopens it with the current LedgerDB, checks the upgraded records, and
 * deletes the database in `finally`.
 */
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { Dexie } from 'dexie';
import { LedgerDB } from '../../../src/db/LedgerDB.ts';
import { declareVersion1, LEDGER_DB_VERSION } from '../../../src/db/schema.ts';
import { demoProject } from '../../../src/ledger/demo.ts';

describe('LedgerDB upgrade from version 1 to 2', () => {
  it('adds updatedAt (from createdAt) and revision 1 to every stored project, and the updatedAt index', async () => {
    const name = `upgrade-1-2-${Math.random()}`;
    try {
      const old = new Dexie(name);
      declareVersion1(old);
      await old.open();
      const project = demoProject();
      await old.table('projects').bulkAdd([
        { id: 'a', name: 'Alpha', project, createdAt: 1000 },
        { id: 'b', name: 'Beta', project: { ...project, name: 'Beta' }, createdAt: 2000 },
      ]);
      await old.table('prefs').put({ key: 'lastProjectId', value: 'b' });
      old.close();

      const db = new LedgerDB(name);
      await db.open();
      expect(db.verno).toBe(LEDGER_DB_VERSION);
      const a = await db.projects.get('a');
      expect(a).toMatchObject({ id: 'a', name: 'Alpha', createdAt: 1000, updatedAt: 1000, revision: 1 });
      expect(a!.project).toEqual(project);
      // The new index answers: most recently edited first.
      const order = await db.projects.orderBy('updatedAt').reverse().primaryKeys();
      expect(order).toEqual(['b', 'a']);
      expect(await db.prefs.get('lastProjectId')).toEqual({ key: 'lastProjectId', value: 'b' });
      db.close();
    } finally {
      await Dexie.delete(name);
    }
  });

  it('gives a version-1 record without createdAt a time and revision 1', async () => {
    const name = `upgrade-1-2-bare-${Math.random()}`;
    try {
      const old = new Dexie(name);
      declareVersion1(old);
      await old.open();
      await old.table('projects').add({ id: 'x', name: 'Bare', project: demoProject() });
      old.close();

      const db = new LedgerDB(name);
      const record = await db.projects.get('x');
      expect(record!.revision).toBe(1);
      expect(typeof record!.updatedAt).toBe('number');
      expect(record!.createdAt).toBe(record!.updatedAt);
      db.close();
    } finally {
      await Dexie.delete(name);
    }
  });
});
