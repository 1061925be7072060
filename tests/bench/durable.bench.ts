/**
 * Durability benchmark in the real browser (built app, vite preview, Debian Chromium),
 * 14,000 machines stored: time from pressing Enter on a cell edit to the edit being
 * committed in IndexedDB, as seen by a second page of the same site that reads the
 * project's stored revision in a loop (so the figure is when another reader, or a
 * restarted browser, can find the edit; target ≤ 50 ms).
 * Prints figures; asserts nothing.
 */
import type { Page } from 'playwright-core';
import { loadavg } from 'node:os';
import { BASE_URL, ensureApp, openBrowser, stopOwnApp, waitForGrid } from '../browser/harness.ts';
import { storeProject } from '../browser/seed.ts';
import { bigProject } from './ui.bench.ts';

const MACHINES = 14_000;
const EDITS = 15;

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length ? s[Math.floor(s.length / 2)]! : NaN;
};

/** In the watcher page: resolves with Date.now() when the stored revision of `id` exceeds `after`. */
const WATCH = `(async ({ id, after }) => {
  const db = await new Promise((resolve, reject) => {
    const req = indexedDB.open('plant-noise-ledger');
    req.onsuccess = () => resolve(req.result);
    req.onerror = () => reject(req.error);
  });
  const deadline = Date.now() + 10000;
  for (;;) {
    const meta = await new Promise((resolve, reject) => {
      const req = db.transaction('projects').objectStore('projects').get(id);
      req.onsuccess = () => resolve(req.result);
      req.onerror = () => reject(req.error);
    });
    if (meta && meta.revision > after) { db.close(); return { at: Date.now(), revision: meta.revision }; }
    if (Date.now() > deadline) { db.close(); return { at: NaN, revision: after }; }
    await new Promise((resolve) => setTimeout(resolve, 2));
  }
})`;

async function storedRevision(watcher: Page): Promise<number> {
  return ((await watcher.evaluate(`${WATCH}({ id: 'bench', after: -1 })`)) as { revision: number }).revision;
}

export async function run(): Promise<void> {
  await ensureApp();
  const browser = await openBrowser({ open: false });
  try {
    const page = browser.page;
    // Notes when the app asks IndexedDB to commit a write (the save issued), for the split below.
    await page.addInitScript(`{
      const commit = IDBTransaction.prototype.commit;
      window.__commits = [];
      IDBTransaction.prototype.commit = function () { window.__commits.push(Date.now()); return commit.call(this); };
    }`);
    await page.goto(BASE_URL);
    await waitForGrid(page);
    const project = bigProject(MACHINES);
    await storeProject(page, project);
    await page.goto(BASE_URL);
    await waitForGrid(page);
    const watcher = await browser.context.newPage();
    await watcher.goto(`${BASE_URL}project.schema.json`);
    const g = page.getByRole('grid', { name: 'Candidate machines by duty' });
    const lwaCol = await g
      .locator('[role="columnheader"]')
      .evaluateAll((cells) =>
        cells.find((c) => c.querySelector('.name')?.textContent?.trim() === 'LWA')?.getAttribute('aria-colindex'),
      );
    const target = g.locator(`[role="row"] [role="gridcell"][aria-colindex="${lwaCol}"]`).first();
    const times: number[] = [];
    const issued: number[] = [];
    for (let i = 0; i < EDITS; i++) {
      const before = await storedRevision(watcher);
      await target.click();
      await page.keyboard.type(i % 2 === 0 ? '110' : '111');
      const watching = watcher.evaluate(`${WATCH}({ id: 'bench', after: ${before} })`) as Promise<{ at: number }>;
      await page.waitForTimeout(20);
      const pressed = (await page.evaluate(`new Promise((resolve) => {
        const t = Date.now();
        document.activeElement && document.activeElement.dispatchEvent(new KeyboardEvent('keydown', { key: 'Enter', bubbles: true, cancelable: true }));
        resolve(t);
      })`)) as number;
      const { at } = await watching;
      const commits = (await page.evaluate('window.__commits')) as number[];
      const issuedAt = commits.find((t) => t >= pressed) ?? NaN;
      if (i > 0) {
        times.push(at - pressed);
        issued.push(issuedAt - pressed);
      }
      await page.waitForTimeout(300);
    }
    const ok = times.filter((t) => !Number.isNaN(t));
    const sent = issued.filter((t) => !Number.isNaN(t));
    console.log(
      `durable: ${MACHINES} machines, cell edit (Enter) → the write handed to IndexedDB: median ${median(sent).toFixed(0)} ms (min ${Math.min(...sent)}, max ${Math.max(...sent)})`,
    );
    console.log(
      `durable: ${MACHINES} machines, cell edit (Enter) → committed in IndexedDB, seen from another page: median ${median(ok).toFixed(0)} ms (${ok.length} edits, min ${Math.min(...ok)}, max ${Math.max(...ok)}) — target ≤ 50 ms (load average ${loadavg()[0]!.toFixed(2)})`,
    );
  } finally {
    await browser.close();
    await stopOwnApp();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
