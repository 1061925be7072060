/**
 * Fleets in the browser: the optimiser's fleet made the assessed one reaches the matrix and
 * the compliance statement, survives a reload (with the open tab and chosen duty), travels
 * in the exported project file, and two fleets compare side by side. Invented demo data.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFile } from 'node:fs/promises';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { openTab } from './ledger-page.ts';
import { PROJECT_VERSION } from '../../src/ledger/model/model.ts';

let browser: BrowserSession;
const OPTIMISER = 'Cheapest compliant (optimiser)';

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('fleets', () => {
  it('the optimiser’s fleet, once used, is what the matrix and the compliance statement describe', async () => {
    const { page } = browser;
    await openTab(page, 'Results');
    const matrix = page.getByTestId('results-matrix');
    // the demo's baseline is over its limits somewhere (invented data built that way)
    await expect.poll(() => matrix.innerText()).toMatch(/over the limit/);
    await page.getByRole('button', { name: 'Find the cheapest fleet' }).click();
    await page.getByRole('button', { name: 'Use this fleet' }).click({ timeout: 100_000 });
    await expect.poll(() => page.getByTestId('assessed-fleet').innerText()).toBe(OPTIMISER);
    await expect.poll(() => matrix.innerText()).toContain(`Fleet “${OPTIMISER}”`);
    expect(await matrix.innerText()).toContain('no cell over its limit');
    expect(await page.getByTestId('compliance-statement').innerText()).toMatch(
      /every one of the \d+ assessed phase and receiver pairs is predicted at or under its limit/,
    );
    await screenshot(page, 'fleets-optimiser-used', { fullPage: true });
  }, 120_000);

  it('two fleets compare side by side: levels, margins, cost and what changed', async () => {
    const { page } = browser;
    await page.getByLabel('Fleet to compare with').selectOption('baseline');
    await page.getByRole('button', { name: 'Compare side by side' }).click();
    const table = page.getByTestId('fleet-comparison');
    await expect.poll(() => table.innerText()).toContain('What changes from A to B');
    expect(await table.innerText()).toMatch(/Cost of the fleet/);
    expect(await table.innerText()).toMatch(/▲ over/);
  });

  it('a reload keeps the assessed fleet and the open tab', async () => {
    const { page } = browser;
    await page.getByTestId('save-state').filter({ hasText: 'All edits saved' }).waitFor();
    await page.reload();
    await page.getByTestId('assessed-fleet').waitFor();
    expect(await page.getByRole('tab', { name: 'Results', exact: true }).getAttribute('aria-selected')).toBe('true');
    expect(await page.getByTestId('assessed-fleet').innerText()).toBe(OPTIMISER);
  }, 60_000);

  it('the exported project file holds the fleets and the assessed fleet', async () => {
    const { page } = browser;
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export project file' }).click(),
    ]);
    const path = await download.path();
    const file = JSON.parse(await readFile(path!, 'utf8'));
    // fleets came with version 3; the file is written at the current version
    expect(file.version).toBe(PROJECT_VERSION);
    expect(file.assessedFleet).toBe(OPTIMISER);
    expect(file.fleets.map((f: { name: string }) => f.name)).toContain(OPTIMISER);
  });
});
