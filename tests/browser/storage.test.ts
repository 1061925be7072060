/**
 * Storage in the real browser: every edit survives a reload (even one made just before
 * it), and a second tab on the same project sees the first tab's edits.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureApp, openBrowser, waitForGrid, type BrowserSession } from './harness.ts';
import { cell, grid, typeInto, waitSaved } from './ledger-page.ts';

let browser: BrowserSession;
// Machines of the invented demo project.
const FIRST = 'Brantor HB20 breaker on 20 t excavator';
const SECOND = 'Brantor HB20 with muffled housing';
const THIRD = 'Valdor jaw crusher attachment on 20 t excavator';

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('saving as you edit', () => {
  it('a reload finds every edit, including one made just before the reload', async () => {
    const { page } = browser;
    const g = grid(page);
    await typeInto(await cell(g, FIRST, 'LWA'), '111');
    await typeInto(await cell(g, SECOND, 'LWA'), 'loud');
    await waitSaved(page);
    // No wait for the save: the reload follows the edit at once.
    await typeInto(await cell(g, THIRD, 'LWA'), '99.5');
    await page.reload();
    await waitForGrid(page);
    await expect.poll(async () => (await cell(grid(page), FIRST, 'LWA')).innerText()).toBe('111');
    const kept = await cell(grid(page), SECOND, 'LWA');
    expect(await kept.innerText()).toContain('loud');
    expect(await kept.getAttribute('aria-invalid')).toBe('true');
    expect(await (await cell(grid(page), THIRD, 'LWA')).innerText()).toBe('99.5');
    // Again at different moments of the save: right after Enter, and a little later.
    for (const [value, waitMs] of [
      ['97', 0],
      ['98.5', 120],
      ['96', 230],
    ] as const) {
      await typeInto(await cell(grid(page), THIRD, 'LWA'), value);
      if (waitMs) await page.waitForTimeout(waitMs);
      await page.reload();
      await waitForGrid(page);
      await expect.poll(async () => (await cell(grid(page), THIRD, 'LWA')).innerText()).toBe(value);
    }
  });

  it('a second tab on the same project sees an edit made in the first', async () => {
    const { page } = browser;
    const other = await browser.newPage();
    await typeInto(await cell(grid(page), FIRST, 'Day rate'), '512');
    await expect
      .poll(async () => (await cell(grid(other), FIRST, 'Day rate')).innerText(), { timeout: 10_000 })
      .toBe('512');
    // And back the other way.
    await typeInto(await cell(grid(other), FIRST, 'Day rate'), '513');
    await expect
      .poll(async () => (await cell(grid(page), FIRST, 'Day rate')).innerText(), { timeout: 10_000 })
      .toBe('513');
    await other.close();
  });

  it('a renamed project keeps its new name after a reload', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Rename' }).click();
    const input = page.getByRole('dialog').getByLabel('Name');
    await input.fill('Harbour wall works');
    await page.getByRole('dialog').getByRole('button', { name: 'Rename' }).click();
    await expect.poll(() => page.locator('#project-select option:checked').innerText()).toBe('Harbour wall works');
    await page.reload();
    await waitForGrid(page);
    await expect.poll(() => page.locator('#project-select option:checked').innerText()).toBe('Harbour wall works');
  });
});
