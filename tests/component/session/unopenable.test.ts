/**
 * A stored project that cannot be opened (a damaged body, a newer version, a failing
 * upgrade) leaves the app usable: another project opens, the damaged one is named with what
 * is wrong, and it can be exported as its stored text or deleted — never dropped silently.
 */
import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import { Session } from '../../../src/app/session/session.svelte.ts';
import UnopenableProjects from '../../../src/app/shell/UnopenableProjects.svelte';
import { LedgerDB } from '../../../src/db/LedgerDB.ts';
import { createProject, loadProject, storedText, UnopenableProjectError } from '../../../src/db/projects.ts';
import { HEAD_KEY, orderKey } from '../../../src/db/project-parts.ts';
import { blankProject } from '../../../src/app/state/blank-project.ts';
import { PREF_LAST_PROJECT } from '../../../src/db/PrefRecord.ts';

async function withDb(run: (db: LedgerDB) => Promise<void>): Promise<void> {
  const db = new LedgerDB(`unopenable-${Math.random()}`);
  await db.open();
  try {
    await run(db);
  } finally {
    db.close();
    await db.delete();
  }
}

/** Stores a good project and one whose head is changed by `damage`; the damaged one is the last opened. */
async function seed(db: LedgerDB, damage: (head: Record<string, unknown>) => void) {
  const good = await createProject(db, blankProject('Good site'));
  const bad = await createProject(db, blankProject('Damaged site'));
  const head = (await db.parts.get([bad.id, HEAD_KEY]))!.value as Record<string, unknown>;
  damage(head);
  await db.parts.put({ projectId: bad.id, key: HEAD_KEY, value: head });
  await db.prefs.put({ key: PREF_LAST_PROJECT, value: bad.id });
  return { good, bad };
}

describe('a stored project that cannot be opened', () => {
  it('loadProject refuses a body of a newer version, naming the version and what this program reads', async () => {
    await withDb(async (db) => {
      const { bad } = await seed(db, (head) => (head.version = 99));
      const error = await loadProject(db, bad.id).catch((e: unknown) => e);
      expect(error).toBeInstanceOf(UnopenableProjectError);
      expect((error as UnopenableProjectError).problems[0]).toMatch(/^Version: 99 is newer than this program reads/);
    });
  });

  it('the session opens another project, names the damaged one with every problem, exports its stored text and deletes it on request', async () => {
    await withDb(async (db) => {
      const { good, bad } = await seed(db, (head) => {
        head.settings = 'broken';
        head.propagation = 7;
      });
      // An order that lists a row which is not an object: the shape check finds it too.
      await db.parts.put({ projectId: bad.id, key: orderKey('receivers'), value: ['r-x'] });
      await db.parts.put({ projectId: bad.id, key: 'row/receivers/r-x', value: 42 });
      const session = new Session();
      try {
        await session.start(db);
        expect(session.workspace?.project.name).toBe('Good site');
        expect(session.currentId).toBe(good.id);
        expect(session.unopenable.map((u) => u.name)).toEqual(['Damaged site']);
        const problems = session.unopenable[0]!.problems;
        expect(problems).toContain('propagation: 7 is not an object (use a JSON object { … })');
        expect(problems.some((p) => p.startsWith('settings: "broken" is not an object'))).toBe(true);
        expect(problems.some((p) => p.startsWith('receivers[0]: 42 is not an object'))).toBe(true);

        render(UnopenableProjects, { session });
        expect(screen.getByRole('alert').textContent).toContain('“Damaged site” cannot be opened');
        // The stored text is the body exactly as kept: the damaged values are in it, unchanged.
        const text = (await session.unopenableText(bad.id))!;
        const raw = JSON.parse(text) as Record<string, unknown>;
        expect(raw.settings).toBe('broken');
        expect(raw.propagation).toBe(7);
        expect(raw.receivers).toEqual([42]);
        expect(await storedText(db, bad.id)).toBe(text);

        // Delete asks twice; the project is then gone from storage and from the list.
        await fireEvent.click(screen.getByRole('button', { name: 'Delete…' }));
        await fireEvent.click(screen.getByRole('button', { name: 'Delete “Damaged site” for good' }));
        await expect.poll(() => session.unopenable.length).toBe(0);
        expect(await db.projects.get(bad.id)).toBeUndefined();
        expect(session.projects.map((p) => p.name)).toEqual(['Good site']);
      } finally {
        await session.stop();
      }
    });
  });

  it('a body whose contents are missing, and an upgrade step that fails, are both named and kept', async () => {
    await withDb(async (db) => {
      const { bad } = await seed(db, () => undefined);
      await db.parts.delete([bad.id, HEAD_KEY]);
      const old = await createProject(db, blankProject('Old site'));
      const head = (await db.parts.get([old.id, HEAD_KEY]))!.value as Record<string, unknown>;
      // A version-7 body whose propagation was lost: upgraded, then refused by the shape check.
      await db.parts.put({ projectId: old.id, key: HEAD_KEY, value: { ...head, version: 7, propagation: null } });
      const session = new Session();
      try {
        await session.start(db);
        expect(session.workspace?.project.name).toBe('Good site');
        await session.switchTo(old.id);
        expect(session.workspace?.project.name).toBe('Good site');
        const byName = new Map(session.unopenable.map((u) => [u.name, u.problems] as const));
        expect(byName.get('Damaged site')).toEqual(['its contents are missing (only its name and dates are stored)']);
        expect(byName.get('Old site')).toEqual(['propagation: null is not an object (use a JSON object { … })']);
        // Without a body, the export holds the bookkeeping and the parts that are left.
        const text = JSON.parse((await session.unopenableText(bad.id))!) as { stored: { name: string } };
        expect(text.stored.name).toBe('Damaged site');
        expect(await db.projects.get(old.id)).toBeDefined();
      } finally {
        await session.stop();
      }
    });
  });
});
