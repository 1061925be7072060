/** The register kept in the browser's database: saved after each edit, undone, and read by another tab only when it has nothing waiting. */
import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { Dexie } from 'dexie';
import { LedgerDB } from '../../../src/db/LedgerDB.ts';
import { loadRegister } from '../../../src/db/registers.ts';
import { RegisterStore } from '../../../src/app/register/register-store.svelte.ts';
import { demoRegister } from '../../../src/ledger/register/demo-register.ts';

let db: LedgerDB;
let name: string;

beforeEach(async () => {
  name = `register-${Math.random()}`;
  db = new LedgerDB(name);
  await db.open();
});

afterEach(async () => {
  db.close();
  await Dexie.delete(name);
});

describe('RegisterStore', () => {
  it('starts empty, saves each edit with a new revision, and undoes', async () => {
    const store = new RegisterStore();
    await store.open(db);
    expect(store.register.machines).toEqual([]);
    const told: number[] = [];
    store.onsaved = (r) => told.push(r);
    store.commit(demoRegister());
    await store.flush();
    expect((await loadRegister(db)).register.machines).toHaveLength(5);
    store.undo();
    await store.flush();
    expect(store.register.machines).toEqual([]);
    expect((await loadRegister(db)).register.machines).toEqual([]);
    expect(told).toEqual([1, 2]);
  });

  it('another tab’s saved register replaces this one’s when this tab has nothing waiting', async () => {
    const here = new RegisterStore();
    const there = new RegisterStore();
    await here.open(db);
    await there.open(db);
    let heard = 0;
    there.onsaved = (r) => (heard = r);
    there.commit(demoRegister());
    await there.flush();
    await here.heard(heard);
    expect(here.register.machines.map((m) => m.id)).toEqual(['m1', 'm2', 'm3', 'm4', 'm5']);
    // an old revision is ignored
    await here.heard(0);
    expect(here.register.machines).toHaveLength(5);
  });

  it('adds imported machines with their unread text as one undo step', async () => {
    const store = new RegisterStore();
    await store.open(db);
    const m = { ...demoRegister().machines[0]!, lwaDb: NaN };
    store.addMachines([m], { 'machines/m1/lwaDb': '1O2' });
    expect(store.register.unreadCells).toEqual({ 'machines/m1/lwaDb': '1O2' });
    expect(store.problems.map((p) => p.path)).toContain('$.machines[0].lwaDb');
    store.undo();
    expect(store.register.machines).toEqual([]);
    await store.flush();
  });

  it('two tabs editing different machines at the same moment: both edits are kept, in storage and in both tabs', async () => {
    const seed = new RegisterStore();
    await seed.open(db);
    seed.commit(demoRegister());
    await seed.flush();
    const a = new RegisterStore();
    const b = new RegisterStore();
    await a.open(db);
    await b.open(db);
    const told: Record<string, number> = {};
    a.onsaved = (r) => (told.a = r);
    b.onsaved = (r) => (told.b = r);
    const edit = (store: RegisterStore, id: string, lwaDb: number) =>
      store.commit({
        ...store.register,
        machines: store.register.machines.map((m) => (m.id === id ? { ...m, lwaDb } : m)),
      });
    // Both commit before either write lands: both writes are based on the same revision.
    edit(a, 'm1', 111);
    edit(b, 'm2', 112);
    await Promise.all([a.flush(), b.flush()]);
    await a.heard(told.b!);
    await b.heard(told.a!);
    for (const store of [a, b]) {
      expect(store.register.machines.find((m) => m.id === 'm1')!.lwaDb).toBe(111);
      expect(store.register.machines.find((m) => m.id === 'm2')!.lwaDb).toBe(112);
    }
    const stored = (await loadRegister(db)).register.machines;
    expect(stored.find((m) => m.id === 'm1')!.lwaDb).toBe(111);
    expect(stored.find((m) => m.id === 'm2')!.lwaDb).toBe(112);
  });

  it('undo in one tab undoes only that tab’s edit, cell by cell, never the other tab’s', async () => {
    const seed = new RegisterStore();
    await seed.open(db);
    seed.commit(demoRegister());
    await seed.flush();
    const a = new RegisterStore();
    const b = new RegisterStore();
    await a.open(db);
    await b.open(db);
    const before = a.register.machines.find((m) => m.id === 'm1')!.lwaDb;
    let savedByA = 0;
    let savedByB = 0;
    a.onsaved = (r) => (savedByA = r);
    b.onsaved = (r) => (savedByB = r);
    a.commit({ ...a.register, machines: a.register.machines.map((m) => (m.id === 'm1' ? { ...m, lwaDb: 90 } : m)) });
    await a.flush();
    await b.heard(savedByA);
    b.commit({
      ...b.register,
      machines: b.register.machines.map((m) => (m.id === 'm2' ? { ...m, label: 'Renamed in B' } : m)),
    });
    await b.flush();
    await a.heard(savedByB);
    expect(a.register.machines.find((m) => m.id === 'm2')!.label).toBe('Renamed in B');
    // The other tab's saved register no longer empties this tab's undo.
    expect(a.canUndo).toBe(true);
    a.undo();
    await a.flush();
    expect(a.register.machines.find((m) => m.id === 'm1')!.lwaDb).toBe(before);
    expect(a.register.machines.find((m) => m.id === 'm2')!.label).toBe('Renamed in B');
    const stored = (await loadRegister(db)).register.machines;
    expect(stored.find((m) => m.id === 'm1')!.lwaDb).toBe(before);
    expect(stored.find((m) => m.id === 'm2')!.label).toBe('Renamed in B');
    await b.heard(savedByA);
    expect(b.register.machines.find((m) => m.id === 'm1')!.lwaDb).toBe(before);
    expect(b.register.machines.find((m) => m.id === 'm2')!.label).toBe('Renamed in B');
  });
});
