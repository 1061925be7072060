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
import { ProjectSaver, recoverUnsaved, SAVE_DELAY_MS } from '../../../src/app/shell/saver.ts';
import { demoProject } from '../../../src/ledger/demo.ts';

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
    expect(describeStorageError({ name: 'DatabaseClosedError', inner: { name: 'QuotaExceededError' } })).toMatch(/no more storage space/);
  });
});

describe('ProjectSaver', () => {
  it('saves a scheduled edit within the save delay', async () => {
    const record = await createProject(db, demoProject());
    const saved: number[] = [];
    const saver = new ProjectSaver(db, record.id, record.revision, { onsaved: (r) => saved.push(r) });
    saver.schedule({ ...record.project, name: 'Edited' });
    saver.schedule({ ...record.project, name: 'Edited twice' });
    await new Promise((r) => setTimeout(r, SAVE_DELAY_MS + 100));
    await saver.flush();
    expect(saved).toEqual([2]);
    expect((await loadProject(db, record.id))!.project.name).toBe('Edited twice');
  });

  it('leave() keeps a copy in localStorage that recoverUnsaved writes if the save never landed', async () => {
    const record = await createProject(db, demoProject());
    const saver = new ProjectSaver(db, record.id, record.revision);
    saver.schedule({ ...record.project, name: 'Typed just before closing' });
    // Simulate a page that closes before IndexedDB answers: take the journal, then undo the save.
    saver.leave();
    const journal = Object.keys(localStorage).find((k) => k.includes(record.id))!;
    const kept = localStorage.getItem(journal)!;
    await saver.flush();
    await db.projects.put({ ...record }); // the stored project as it was before the edit
    localStorage.setItem(journal, kept);
    expect(await recoverUnsaved(db)).toEqual([record.id]);
    expect((await loadProject(db, record.id))!.project.name).toBe('Typed just before closing');
    expect(localStorage.getItem(journal)).toBeNull();
  });

  it('recoverUnsaved does not overwrite a project another tab saved since', async () => {
    const record = await createProject(db, demoProject());
    const saver = new ProjectSaver(db, record.id, record.revision);
    saver.schedule({ ...record.project, name: 'Old edit' });
    saver.leave();
    const journal = Object.keys(localStorage).find((k) => k.includes(record.id))!;
    const kept = localStorage.getItem(journal)!;
    await saver.flush();
    await saveProject(db, record.id, { ...record.project, name: 'Newer, from another tab' });
    localStorage.setItem(journal, kept);
    expect(await recoverUnsaved(db)).toEqual([]);
    expect((await loadProject(db, record.id))!.project.name).toBe('Newer, from another tab');
  });
});
