/**
 * Long work in the browser: opening the results loads the solver ahead of the first run; an
 * optimiser run shows how far it has gone and can be cancelled (the earlier state stays, or the
 * fleet and the curve traced so far when it was already found, and a new run still works); the workbook is written in a worker with its progress shown and
 * can be cancelled. Invented demo data.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { openTab } from './ledger-page.ts';

let browser: BrowserSession;

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('long work shows progress and can be cancelled', () => {
  it('opening the results loads the solver before the first run is asked for', async () => {
    const { page } = browser;
    const wasm = page.waitForResponse((r) => /\.wasm($|\?)/.test(r.url()), { timeout: 60_000 });
    await openTab(page, 'Results');
    const response = await wasm;
    expect(response.ok()).toBe(true);
    expect(page.workers().length).toBeGreaterThan(0);
  }, 90_000);

  it('an optimiser run shows its progress, can be cancelled, and runs again to the end', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Find the cheapest fleet' }).click();
    const bar = page.getByRole('progressbar', { name: 'Optimiser progress' });
    await bar.waitFor();
    // cancelled as soon as the progress shows: the demo's run takes a few seconds, and on a
    // quiet machine it can end while a screenshot is being taken
    await page.getByRole('button', { name: 'Cancel', exact: true }).click();
    // Cancelled before the fleet was found, or stopped while the curve was traced (the fleet stays).
    const said = async () =>
      (await page.getByText('The optimiser run was cancelled.').count()) +
      (await page.getByText(/Stopped after \d+ fleets?\./).count());
    await expect.poll(said).toBe(1);
    expect(await bar.count()).toBe(0);
    await page.getByRole('button', { name: 'Find the cheapest fleet' }).click();
    await bar.waitFor();
    await screenshot(page, 'long-work-optimiser-progress', { selector: '.optimiser' });
    await page.getByRole('button', { name: 'Use this fleet' }).waitFor({ timeout: 100_000 });
    expect(await page.getByText('The optimiser run was cancelled.').count()).toBe(0);
  }, 150_000);

  it('the workbook export shows its progress sheet by sheet, can be cancelled, and downloads', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Export workbook' }).click();
    const bar = page.getByRole('progressbar', { name: 'Workbook export progress' });
    await bar.waitFor();
    await page.getByRole('button', { name: 'Cancel export' }).click();
    await expect.poll(() => page.getByText('The workbook export was cancelled.').count()).toBeGreaterThan(0);
    expect(await bar.count()).toBe(0);

    const steps: string[] = [];
    const status = page.locator('.exporting');
    const download = page.waitForEvent('download', { timeout: 120_000 });
    await page.getByRole('button', { name: 'Export workbook' }).click();
    // read the step words while the export runs (each sheet reports once it is written)
    const watching = (async () => {
      while ((await status.count()) > 0) {
        const text = await status.innerText().catch(() => '');
        if (text && steps[steps.length - 1] !== text) steps.push(text);
        await page.waitForTimeout(50);
      }
    })();
    const file = await download;
    await watching;
    expect(file.suggestedFilename()).toMatch(/\.xlsx$/);
    expect(steps.length).toBeGreaterThan(0);
    expect(steps.join('\n')).toMatch(/%/);
  }, 150_000);
});
