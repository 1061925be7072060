/**
 * A background tab catching up, in the real browser (built app, Debian Chromium), with
 * 14,000 machines stored: tab A commits a cell edit; tab B hears of it over the
 * BroadcastChannel, reads the stored project and merges it in (app/session/session.svelte.ts
 * `#catchUp`, which reads the whole project). Prints the time from Enter in A to the new value
 * on B's screen, and the time B spends reading the whole project from IndexedDB alone (the
 * same reads as db/projects.ts `loadProject`). Prints figures; asserts nothing.
 */
import { BASE_URL, ensureApp, openBrowser, stopOwnApp, waitForGrid } from '../browser/harness.ts';
import { storeProject } from '../browser/seed.ts';
import { bigProject } from './ui.bench.ts';

const MACHINES = 14_000;
const EDITS = 9;

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length ? s[Math.floor(s.length / 2)]! : NaN;
};

/** In a page: the time to read every part of project `id` in one read transaction, as loadProject does. */
const READ_ALL = `(async (id) => {
  const db = await new Promise((resolve, reject) => {
    const req = indexedDB.open('plant-noise-ledger');
    req.onsuccess = () => resolve(req.result);
    req.onerror = () => reject(req.error);
  });
  const t0 = performance.now();
  const tx = db.transaction(['projects', 'parts'], 'readonly');
  const meta = await new Promise((r) => { const q = tx.objectStore('projects').get(id); q.onsuccess = () => r(q.result); });
  const parts = await new Promise((r) => {
    const q = tx.objectStore('parts').getAll(IDBKeyRange.bound([id, ''], [id, '\\uffff']));
    q.onsuccess = () => r(q.result);
  });
  const ms = performance.now() - t0;
  db.close();
  return { ms, parts: parts.length, revision: meta.revision };
})`;

export async function run(): Promise<void> {
  await ensureApp();
  const browser = await openBrowser({ open: false });
  try {
    const a = browser.page;
    await a.goto(BASE_URL);
    await waitForGrid(a);
    await storeProject(a, bigProject(MACHINES));
    await a.goto(BASE_URL);
    await waitForGrid(a);
    const b = await browser.context.newPage();
    await b.goto(BASE_URL);
    await waitForGrid(b);
    const column = async (page: typeof a) =>
      page
        .getByRole('grid', { name: 'Candidate machines by duty' })
        .locator('[role="columnheader"]')
        .evaluateAll((cells) =>
          cells.find((c) => c.querySelector('.name')?.textContent?.trim() === 'LWA')?.getAttribute('aria-colindex'),
        );
    const cellIn = async (page: typeof a) =>
      page
        .getByRole('grid', { name: 'Candidate machines by duty' })
        .locator(`[role="row"] [role="gridcell"][aria-colindex="${await column(page)}"]`)
        .first();
    const targetA = await cellIn(a);
    const targetB = await cellIn(b);
    const seen: number[] = [];
    for (let i = 0; i < EDITS; i++) {
      const value = String(100 + i);
      await targetA.click();
      await a.keyboard.type(value);
      // B polls its own cell in the page, so the time is B's, not the test runner's.
      const watching = b.evaluate(
        `(async ({ value }) => {
          const grid = document.querySelector('[role="grid"][aria-label="Candidate machines by duty"]');
          for (;;) {
            const cell = grid && grid.querySelector('[role="row"] [role="gridcell"][aria-colindex="${await column(b)}"]');
            if (cell && cell.textContent.trim() === value) return Date.now();
            await new Promise((r) => setTimeout(r, 2));
          }
        })({ value: ${JSON.stringify(value)} })`,
      ) as Promise<number>;
      const pressed = (await a.evaluate(`new Promise((resolve) => {
        const t = Date.now();
        document.activeElement && document.activeElement.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true, cancelable: true }));
        resolve(t);
      })`)) as number;
      const at = await watching;
      if (i > 0) seen.push(at - pressed);
      await a.waitForTimeout(300);
    }
    void targetB;
    const reads: number[] = [];
    let parts = 0;
    for (let i = 0; i < 5; i++) {
      const r = (await b.evaluate(`${READ_ALL}('bench')`)) as { ms: number; parts: number };
      reads.push(r.ms);
      parts = r.parts;
    }
    console.log(
      `catch-up: ${MACHINES} machines, cell edit (Enter) in tab A → new value on screen in background tab B: median ${median(seen).toFixed(0)} ms (${seen.length} edits, min ${Math.min(...seen)}, max ${Math.max(...seen)})`,
    );
    console.log(
      `catch-up: reading the whole stored project (${parts} parts) in one transaction: median ${median(reads).toFixed(0)} ms (min ${Math.min(...reads).toFixed(0)}, max ${Math.max(...reads).toFixed(0)})`,
    );
  } finally {
    await browser.close();
    await stopOwnApp();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
