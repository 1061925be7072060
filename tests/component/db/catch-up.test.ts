/** A tab one revision behind reads only the parts that revision wrote, and gets the same project as a whole read. */
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { LedgerDB } from '../../../src/db/LedgerDB.ts';
import { createProject, loadChanges, loadProject, saveProject } from '../../../src/db/projects.ts';
import { partChanges, withParts } from '../../../src/db/project-parts.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';

describe('reading only what changed', () => {
  it('loadChanges after an edit, a deleted row and a renamed project equals loadProject, and keeps unchanged rows', async () => {
    const db = new LedgerDB(`catch-up-${Math.random()}`);
    await db.open();
    try {
      const base = demoProject();
      const record = await createProject(db, base);
      const [first, second, ...rest] = base.candidates;
      const edited = {
        ...base,
        name: 'Renamed in another tab',
        candidates: [{ ...first!, lwaDb: 99 }, ...rest],
      };
      void second;
      const revision = await saveProject(db, record.id, edited);
      const { put, remove } = partChanges(record.id, base, edited);
      const keys = [...put.map((p) => p.key), ...remove];
      const caught = (await loadChanges(db, record.id, base, keys, revision))!;
      const whole = (await loadProject(db, record.id))!;
      expect(caught.project).toEqual(whole.project);
      expect(caught.project.candidates[1]).toBe(base.candidates[2]);
      expect(caught.project.receivers).toBe(base.receivers);
      // another write came in since: undefined, so the caller reads the whole project
      expect(await loadChanges(db, record.id, base, keys, revision - 1)).toBeUndefined();
    } finally {
      db.close();
      await db.delete();
    }
  });

  it('withParts with nothing changed keeps every list', () => {
    const base = demoProject();
    const same = withParts(base, new Map());
    expect(same.candidates).toBe(base.candidates);
    expect(same.name).toBe(base.name);
  });
});
