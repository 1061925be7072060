/**
 * LedgerDB schema upgrades: each test seeds a database at the old version with
 * fake-indexeddb, reopens it with the current LedgerDB, checks the upgraded records, and
 * deletes the database in `finally`.
 */
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { Dexie } from 'dexie';
import { LedgerDB } from '../../../src/db/LedgerDB.ts';
import { declareVersion1, declareVersion2, declareVersion3, LEDGER_DB_VERSION } from '../../../src/db/schema.ts';
import { loadProject, saveProject } from '../../../src/db/projects.ts';
import { revisionKey } from '../../../src/db/project-parts.ts';
import { loadRegister, saveRegister } from '../../../src/db/registers.ts';
import { demoRegister } from '../../../src/ledger/register/demo-register.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';

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
      expect(LEDGER_DB_VERSION).toBe(4);
      const a = await db.projects.get('a');
      expect(a).toMatchObject({ id: 'a', name: 'Alpha', createdAt: 1000, updatedAt: 1000, revision: 1 });
      expect((await loadProject(db, 'a'))!.project).toEqual(project);
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
      await old
        .table('projects')
        .add({ id: 'a', name: 'Alpha', project, createdAt: 1000, updatedAt: 1500, revision: 4 });
      await old.table('prefs').put({ key: 'lastProjectId', value: 'a' });
      old.close();

      const db = new LedgerDB(name);
      await db.open();
      expect(db.verno).toBe(4);
      expect(await db.projects.get('a')).toEqual({
        id: 'a',
        name: 'Alpha',
        createdAt: 1000,
        updatedAt: 1500,
        revision: 4,
      });
      expect((await loadProject(db, 'a'))!.project).toEqual(project);
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

describe('LedgerDB upgrade from version 3 to 4', () => {
  it('splits every stored project into parts, keeps its revision and unread cells, and later saves write only the rows changed', async () => {
    const name = `upgrade-3-4-${Math.random()}`;
    try {
      const old = new Dexie(name);
      declareVersion1(old);
      declareVersion2(old);
      declareVersion3(old);
      await old.open();
      const project = demoProject();
      const first = project.candidates[0]!;
      const unread = {
        ...project,
        candidates: [{ ...first, lwaDb: NaN }, ...project.candidates.slice(1)],
        unreadCells: { [`candidates/${first.id}/lwaDb`]: 'loud' },
      };
      await old.table('projects').bulkAdd([
        { id: 'a', name: 'Alpha', project, createdAt: 1000, updatedAt: 1500, revision: 7 },
        { id: 'b', name: 'Beta', project: unread, createdAt: 2000, updatedAt: 2500, revision: 2 },
      ]);
      old.close();

      const db = new LedgerDB(name);
      await db.open();
      expect(db.verno).toBe(4);
      // the bookkeeping keeps no body
      expect(await db.projects.get('a')).toEqual({
        id: 'a',
        name: 'Alpha',
        createdAt: 1000,
        updatedAt: 1500,
        revision: 7,
      });
      const a = await loadProject(db, 'a');
      expect(a!.project).toEqual(project);
      expect(a!.revision).toBe(7);
      const b = await loadProject(db, 'b');
      expect(Number.isNaN(b!.project.candidates[0]!.lwaDb)).toBe(true);
      expect(b!.project.unreadCells).toEqual({ [`candidates/${first.id}/lwaDb`]: 'loud' });
      // one part per row, one order per list, the head and the revision marker
      const rows =
        project.candidates.length +
        project.duties.length +
        project.receivers.length +
        project.phases.length +
        project.periods.length;
      const partsOfA = await db.parts
        .where('[projectId+key]')
        .between(['a', Dexie.minKey], ['a', Dexie.maxKey])
        .toArray();
      expect(partsOfA.length).toBe(rows + 5 + 1 + 1);
      expect(partsOfA.some((p) => p.key === revisionKey(7))).toBe(true);
      // a save after the upgrade takes the next revision
      expect(await saveProject(db, 'a', { ...a!.project, name: 'Alpha 2' })).toBe(8);
      expect((await loadProject(db, 'a'))!.project.name).toBe('Alpha 2');
      db.close();
    } finally {
      await Dexie.delete(name);
    }
  });
});
