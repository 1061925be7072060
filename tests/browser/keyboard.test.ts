/**
 * The keyboard in the real browser, on the invented demo: End then Home in the machine grid
 * returns to the first column with the duties' group titles in view; the status line says
 * what an undo and a redo did; the skip link, the page's first Tab stop, reaches the grid.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { cell, grid, openTab, typeInto } from './ledger-page.ts';

let browser: BrowserSession;
// the demo's first machine (invented demo data, src/ledger/model/demo-candidates.ts)
const FIRST = 'Brantor HB20 breaker on 20 t excavator';

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser({ viewport: { width: 1024, height: 700 } });
});

afterAll(async () => {
  await browser?.close();
});

describe('keyboard', () => {
  it('the skip link is the first Tab stop and puts the focus in the grid', async () => {
    const { page } = browser;
    await openTab(page, 'Machines');
    await page.reload();
    await grid(page).locator('[role="gridcell"]').first().waitFor();
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.textContent?.trim())).toBe('Skip to the table');
    expect(await page.getByRole('link', { name: 'Skip to the table' }).isVisible()).toBe(true);
    await page.keyboard.press('Enter');
    await expect
      .poll(() => page.evaluate(() => document.activeElement?.closest('[role="grid"]')?.getAttribute('aria-label')))
      .toBe('Candidate machines by duty');
    // and the keys now move in the grid
    await page.keyboard.press('ArrowDown');
    expect(await page.evaluate(() => document.activeElement?.closest('[role="grid"]') !== null)).toBe(true);
  });

  it('End then Home returns to the first column with the group titles in view', async () => {
    const { page } = browser;
    const g = grid(page);
    await (await cell(g, FIRST, 'Machine')).click();
    const viewport = g.locator('[data-grid-viewport]').or(g).first();
    await page.keyboard.press('End');
    await expect.poll(() => viewport.evaluate((el) => el.scrollLeft)).toBeGreaterThan(0);
    await page.keyboard.press('Home');
    await expect.poll(() => viewport.evaluate((el) => el.scrollLeft)).toBe(0);
    const active = await g
      .locator('[role="gridcell"][aria-selected="true"], .active')
      .first()
      .getAttribute('aria-colindex');
    expect(active).toBe('1');
    const title = g.locator('.group-row').first().locator('.group-cell');
    const box = await title.boundingBox();
    const gridBox = await g.boundingBox();
    expect(box && gridBox && box.x >= gridBox.x - 1).toBe(true);
    expect(await title.innerText()).toMatch(/Break out the yard slab/);
    await screenshot(page, 'keyboard-end-home');
  });

  it('the status line says what an undo and a redo did', async () => {
    const { page } = browser;
    const g = grid(page);
    const lwa = await cell(g, FIRST, 'LWA');
    const before = await lwa.innerText();
    await typeInto(lwa, '109');
    await expect.poll(async () => (await cell(g, FIRST, 'LWA')).innerText()).toBe('109');
    await page.keyboard.press('Control+Z');
    const status = g.locator('xpath=ancestor::*[.//p[@role="status"]][1]').locator('p.status');
    await expect.poll(() => status.innerText()).toBe(`Undid the edit to machine “${FIRST}”`);
    expect(await (await cell(g, FIRST, 'LWA')).innerText()).toBe(before);
    expect(await page.getByTestId('last-step').innerText()).toBe(`Undid the edit to machine “${FIRST}”`);
    await page.keyboard.press('Control+Shift+Z');
    await expect.poll(() => status.innerText()).toBe(`Redid the edit to machine “${FIRST}”`);
    expect(await (await cell(g, FIRST, 'LWA')).innerText()).toBe('109');
    // the header's Undo button says so too
    await page.getByRole('button', { name: 'Undo', exact: true }).click();
    await expect.poll(() => page.getByTestId('last-step').innerText()).toBe(`Undid the edit to machine “${FIRST}”`);
    await screenshot(page, 'keyboard-undo-status');
  });
});
