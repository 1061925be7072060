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
});
