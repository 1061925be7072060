/**
 * The exact trade-off frontier streamed to the chart, in the real browser (built app, vite preview, Debian
 * Chromium): on the optimiser benchmark's random site of 30 duties × 12 machines × 20 receivers × 5 phases
 * (seed 11, invented), the time from "Find the cheapest fleet" to the first frontier point on the chart and
 * to the status saying the curve is complete (target ≤ 20 s), with the number of fleets. The solver is loaded
 * before the click (the Results tab loads it). Prints figures; asserts nothing.
 */
import { loadavg } from 'node:os';
import { ensureApp, openBrowser, stopOwnApp, waitForGrid } from '../browser/harness.ts';
import { storeProject } from '../browser/seed.ts';
import { siteProject } from '../unit/ledger/optimise/site-project.ts';

const SIZE = { duties: 30, candidates: 12, receivers: 20, phases: 5 };

export async function run(): Promise<void> {
  await ensureApp();
  const browser = await openBrowser();
  try {
    const { page } = browser;
    await storeProject(page, siteProject(SIZE, 11).project);
    await page.reload();
    await waitForGrid(page);
    await page.getByRole('tab', { name: 'Results', exact: true }).click();
    await page.waitForResponse((r) => /\.wasm($|\?)/.test(r.url()), { timeout: 60_000 }).catch(() => undefined);
    const status = page.getByTestId('frontier-status');
    const started = Date.now();
    await page.getByRole('button', { name: 'Find the cheapest fleet' }).click();
    let first = NaN;
    let complete = NaN;
    while (Date.now() - started < 200_000) {
      const state = await status.getAttribute('data-state', { timeout: 200 }).catch(() => null);
      const count = Number(await status.getAttribute('data-count', { timeout: 200 }).catch(() => '0'));
      if (Number.isNaN(first) && count > 0) first = Date.now() - started;
      if (state === 'complete') {
        complete = Date.now() - started;
        break;
      }
      await page.waitForTimeout(25);
    }
    const fleets = await status.getAttribute('data-count').catch(() => '?');
    console.log(
      `exact frontier streamed to the chart, 30×12×20×5 (seed 11), Chromium: first point ${first.toFixed(0)} ms, ` +
        `complete ${complete.toFixed(0)} ms wall with ${fleets} fleets — target complete ≤ 20,000 ms ` +
        `(load ${loadavg()
          .map((x) => x.toFixed(1))
          .join(', ')})`,
    );
  } finally {
    await browser.close();
    await stopOwnApp();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
