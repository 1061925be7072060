/**
 * LedgerDB schema upgrades: each test seeds a database at the old version with
 * fake-indexeddb, reopens it with the current LedgerDB, checks the upgraded records, and
 * deletes the database in `finally`.
 */
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { Dexie } from 'dexie';
import { LedgerDB } from '../../../src/db/LedgerDB.ts';
import { declareVersion1, declareVersion2, LEDGER_DB_VERSION } from '../../../src/db/schema.ts';
import { loadRegister, saveRegister } from '../../../src/db/registers.ts';
import { demoRegister } from '../../../src/ledger/register/demo-register.ts';
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
      expect(LEDGER_DB_VERSION).toBe(3);
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

describe('LedgerDB upgrade from version 2 to 3', () => {
  it('keeps every project and preference and adds an empty register table that stores and reads a register', async () => {
    const name = `upgrade-2-3-${Math.random()}`;
    try {
      const old = new Dexie(name);
      declareVersion1(old);
      declareVersion2(old);
      await old.open();
      const project = demoProject();
      await old.table('projects').add({ id: 'a', name: 'Alpha', project, createdAt: 1000, updatedAt: 1500, revision: 4 });
      await old.table('prefs').put({ key: 'lastProjectId', value: 'a' });
      old.close();

      const db = new LedgerDB(name);
      await db.open();
      expect(db.verno).toBe(3);
      expect(await db.projects.get('a')).toEqual({ id: 'a', name: 'Alpha', project, createdAt: 1000, updatedAt: 1500, revision: 4 });
      expect(await db.prefs.get('lastProjectId')).toEqual({ key: 'lastProjectId', value: 'a' });
      expect(await db.registers.count()).toBe(0);
      const empty = await loadRegister(db);
      expect(empty.revision).toBe(0);
      expect(empty.register.machines).toEqual([]);
      const register = demoRegister();
      expect(await saveRegister(db, register)).toBe(1);
      expect(await saveRegister(db, register)).toBe(2);
      expect((await loadRegister(db)).register).toEqual(register);
      db.close();
    } finally {
      await Dexie.delete(name);
    }
  });
});
