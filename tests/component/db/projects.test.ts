/** Project storage operations on a LedgerDB in fake-indexeddb, and recovery of edits a closed page left behind. */
import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { Dexie } from 'dexie';
import {
  LedgerDB,
  createProject,
  deleteProject,
  duplicateProject,
  listProjects,
  loadProject,
  projectToOpen,
  rememberLastProject,
  renameProject,
  saveProject,
  describeStorageError,
} from '../../../src/db/index.ts';
import { ProjectSaver, recoverUnsaved } from '../../../src/app/session/saver.ts';
import type { Project } from '../../../src/ledger/model/model.ts';
import type { MergeConflict } from '../../../src/ledger/file/project-merge.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';

let db: LedgerDB;
let name: string;

beforeEach(async () => {
  name = `projects-${Math.random()}`;
  db = new LedgerDB(name);
  await db.open();
  localStorage.clear();
});

afterEach(async () => {
  db.close();
  await Dexie.delete(name);
});

describe('project storage', () => {
  it('createProject stores revision 1 and listProjects shows it', async () => {
    const record = await createProject(db, demoProject());
    expect(record.revision).toBe(1);
    expect(await listProjects(db)).toEqual([{ id: record.id, name: record.name, updatedAt: record.updatedAt }]);
  });

  it('saveProject raises the revision and keeps NaN of unread cells', async () => {
    const record = await createProject(db, demoProject());
    const edited = structuredClone(record.project);
    edited.candidates[0]!.lwaDb = NaN;
    edited.unreadCells = { [`candidates/${edited.candidates[0]!.id}/lwaDb`]: '12O' };
    expect(await saveProject(db, record.id, edited)).toBe(2);
    const back = await loadProject(db, record.id);
    expect(back!.revision).toBe(2);
    expect(Number.isNaN(back!.project.candidates[0]!.lwaDb)).toBe(true);
    expect(back!.project.unreadCells).toEqual(edited.unreadCells);
  });

  it('saveProject on a deleted project throws a message in words', async () => {
    const record = await createProject(db, demoProject());
    await deleteProject(db, record.id);
    await expect(saveProject(db, record.id, record.project)).rejects.toThrow(/deleted in another tab/);
  });

  it('renameProject renames the record and the project', async () => {
    const record = await createProject(db, demoProject());
    await renameProject(db, record.id, 'Harbour wall');
    const back = await loadProject(db, record.id);
    expect(back!.name).toBe('Harbour wall');
    expect(back!.project.name).toBe('Harbour wall');
  });

  it('duplicateProject copies under a new id', async () => {
    const record = await createProject(db, demoProject());
    const copy = await duplicateProject(db, record.id, 'Copy');
    expect(copy.id).not.toBe(record.id);
    expect(copy.project.candidates).toEqual(record.project.candidates);
    expect((await listProjects(db)).length).toBe(2);
  });

  it('projectToOpen prefers the last opened project, and forgets it when deleted', async () => {
    const a = await createProject(db, { ...demoProject(), name: 'A' });
    const b = await createProject(db, { ...demoProject(), name: 'B' });
    await rememberLastProject(db, a.id);
    expect((await projectToOpen(db))!.id).toBe(a.id);
    await deleteProject(db, a.id);
    expect((await projectToOpen(db))!.id).toBe(b.id);
  });

  it('describeStorageError puts a full disk in words', () => {
    expect(describeStorageError({ name: 'QuotaExceededError' })).toMatch(/no more storage space/);
    expect(describeStorageError({ name: 'DatabaseClosedError', inner: { name: 'QuotaExceededError' } })).toMatch(
      /no more storage space/,
    );
  });
});

function withLwa(project: Project, index: number, lwaDb: number): Project {
  return { ...project, candidates: project.candidates.map((c, i) => (i === index ? { ...c, lwaDb } : c)) };
}

describe('ProjectSaver', () => {
  it('writes an edit at once, and only the row it changed', async () => {
    const record = await createProject(db, demoProject());
    const saved: { revision: number; keys: string[] }[] = [];
    const saver = new ProjectSaver(db, record, { onsaved: (revision, keys) => saved.push({ revision, keys }) });
    const edited = withLwa(record.project, 0, 111);
    saver.schedule(edited);
    expect(saver.pending).toBe(true);
    await saver.flush();
    expect(saver.pending).toBe(false);
    expect(saved).toEqual([{ revision: 2, keys: [`row/candidates/${record.project.candidates[0]!.id}`] }]);
    expect((await loadProject(db, record.id))!.project).toEqual(edited);
  });

  it('edits made while a write is under way go in the next write', async () => {
    const record = await createProject(db, demoProject());
    const saver = new ProjectSaver(db, record);
    const one = withLwa(record.project, 0, 101);
    const two = withLwa(one, 1, 102);
    saver.schedule(one);
    saver.schedule(two);
    await saver.flush();
    expect((await loadProject(db, record.id))!.project).toEqual(two);
  });

  it('two tabs editing different cells of the same revision: both edits are kept, with no conflict', async () => {
    const record = await createProject(db, demoProject());
    const conflictsB: MergeConflict[][] = [];
    const tabA = new ProjectSaver(db, record);
    const tabB = new ProjectSaver(db, record, {
      onsaved: (_r, _k, c) => conflictsB.push(c),
      onmerged: (_sent, stored) => stored,
    });
    tabA.schedule(withLwa(record.project, 0, 111));
    tabB.schedule(withLwa(record.project, 1, 122));
    await Promise.all([tabA.flush(), tabB.flush()]);
    const back = (await loadProject(db, record.id))!;
    expect(back.revision).toBe(3);
    expect(back.project.candidates[0]!.lwaDb).toBe(111);
    expect(back.project.candidates[1]!.lwaDb).toBe(122);
    expect(conflictsB).toEqual([[]]);
    expect(tabB.base).toEqual(back.project);
  });

  it('two tabs changing the same cell: the value written last is kept and the cell is reported', async () => {
    const record = await createProject(db, demoProject());
    const first = record.project.candidates[0]!;
    const conflicts: MergeConflict[] = [];
    const tabA = new ProjectSaver(db, record);
    const tabB = new ProjectSaver(db, record, { onsaved: (_r, _k, c) => conflicts.push(...c) });
    tabA.schedule(withLwa(record.project, 0, 104));
    await tabA.flush();
    tabB.schedule(withLwa(record.project, 0, 101));
    await tabB.flush();
    expect((await loadProject(db, record.id))!.project.candidates[0]!.lwaDb).toBe(101);
    expect(conflicts).toEqual([
      {
        list: 'candidates',
        rowId: first.id,
        rowName: first.label,
        field: 'lwaDb',
        mine: 101,
        theirs: 104,
        kept: 'mine',
      },
    ]);
  });

  it('a save on a project deleted in another tab fails in words and brings nothing back', async () => {
    const record = await createProject(db, demoProject());
    const errors: string[] = [];
    const saver = new ProjectSaver(db, record, { onerror: (m) => errors.push(m) });
    await deleteProject(db, record.id);
    saver.schedule(withLwa(record.project, 0, 99));
    await saver.flush();
    saver.dispose();
    expect(errors[0]).toMatch(/deleted in another tab/);
    expect(await loadProject(db, record.id)).toBeUndefined();
    expect(await listProjects(db)).toEqual([]);
  });

  it('a failed write stays pending, is said, and is written by the next attempt', async () => {
    const record = await createProject(db, demoProject());
    const errors: string[] = [];
    const saver = new ProjectSaver(db, record, { onerror: (m) => errors.push(m) });
    const idb = db.backendDB();
    const real = idb.transaction.bind(idb);
    const stub = () => {
      throw Object.assign(new Error('quota'), { name: 'QuotaExceededError' });
    };
    (idb as unknown as { transaction: unknown }).transaction = stub;
    saver.schedule(withLwa(record.project, 0, 99));
    await saver.flush();
    expect(errors[0]).toMatch(/no more storage space/);
    expect(saver.pending).toBe(true);
    (idb as unknown as { transaction: unknown }).transaction = real;
    await saver.flush();
    expect(saver.pending).toBe(false);
    expect((await loadProject(db, record.id))!.project.candidates[0]!.lwaDb).toBe(99);
    saver.dispose();
  });
});

describe('recoverUnsaved (copies an earlier version of the app left in localStorage)', () => {
  const key = (id: string) => `plant-noise-ledger/unsaved/${id}`;

  it('writes a copy made on the stored revision, then removes it', async () => {
    const record = await createProject(db, demoProject());
    localStorage.setItem(
      key(record.id),
      JSON.stringify({ project: { ...record.project, name: 'Typed just before closing' }, baseRevision: 1 }),
    );
    expect(await recoverUnsaved(db)).toEqual({ recovered: [record.id], keptApart: [] });
    expect((await loadProject(db, record.id))!.project.name).toBe('Typed just before closing');
    expect(localStorage.getItem(key(record.id))).toBeNull();
  });

  it('keeps a copy another tab superseded as a project of its own, never dropping it silently', async () => {
    const record = await createProject(db, demoProject());
    await saveProject(db, record.id, { ...record.project, name: 'Newer, from another tab' });
    localStorage.setItem(
      key(record.id),
      JSON.stringify({ project: { ...record.project, name: 'Old edit' }, baseRevision: 1 }),
    );
    expect(await recoverUnsaved(db)).toEqual({ recovered: [], keptApart: ['Old edit (recovered copy)'] });
    expect((await loadProject(db, record.id))!.project.name).toBe('Newer, from another tab');
    expect((await listProjects(db)).map((p) => p.name).sort()).toEqual([
      'Newer, from another tab',
      'Old edit (recovered copy)',
    ]);
    expect(localStorage.getItem(key(record.id))).toBeNull();
  });

  it('keeps the copy in localStorage when it cannot be written', async () => {
    const record = await createProject(db, demoProject());
    localStorage.setItem(
      key(record.id),
      JSON.stringify({ project: { ...record.project, name: 'Kept' }, baseRevision: 1 }),
    );
    db.close();
    expect(await recoverUnsaved(db)).toEqual({ recovered: [], keptApart: [] });
    expect(localStorage.getItem(key(record.id))).not.toBeNull();
  });
});
