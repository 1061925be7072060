/**
 * Pasting tab-separated text as copied from a spreadsheet program, in a project that
 * writes decimal commas, then undoing and redoing the paste as one step.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { cell, grid, openTab, pasteText, scrollGridToBottom, shownRows, waitSaved } from './ledger-page.ts';

let browser: BrowserSession;

/** 20 rows: machine name, LWA with a decimal comma, day rate with a decimal comma (invented). */
const ROWS = Array.from({ length: 20 }, (_, i) => [`Pasted machine ${i + 1}`, `${90 + i},5`, `${300 + i * 10},25`]);
const TSV = ROWS.map((r) => r.join('\t')).join('\r\n') + '\r\n';

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('paste, undo and redo', () => {
  let before = 0;
  let overwritten = '';

  it('pastes 20 rows with decimal commas into a comma project', async () => {
    const { page } = browser;
    await openTab(page, 'Settings');
    await page.getByTestId('decimal-separator').selectOption(',');
    await openTab(page, 'Machines');
    const g = grid(page);
    await g.locator('[role="gridcell"]').first().waitFor();
    before = await shownRows(page);

    // Go to the last row's first cell with the keyboard, then paste over it and past the end.
    await g.locator('[role="row"] [role="gridcell"][aria-colindex="1"]').first().click();
    await page.keyboard.press('Control+End');
    await page.keyboard.press('Home');
    overwritten = await page.evaluate(() => {
      const id = document.activeElement?.getAttribute('aria-activedescendant');
      return (id && document.getElementById(id)?.querySelector('.text')?.textContent?.trim()) || '';
    });
    await pasteText(page, TSV);

    // One row overwritten, 19 appended.
    await expect.poll(() => shownRows(page)).toBe(before + 19);
    // 90,5 with a decimal comma is 90.5, shown back with the project's comma (common practice).
    await scrollGridToBottom(g);
    const lwa = await cell(g, 'Pasted machine 20', 'LWA');
    await expect.poll(() => lwa.innerText()).toBe('109,5');
    expect(await lwa.getAttribute('aria-invalid')).toBeNull();
    expect(await (await cell(g, 'Pasted machine 20', 'Day rate')).innerText()).toBe('490,25');
    await screenshot(page, 'after-paste');
    await waitSaved(page);
  });

  it('undo removes the whole paste in one step and redo brings it back', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => shownRows(page)).toBe(before);
    await expect.poll(() => page.getByText('Pasted machine', { exact: false }).count()).toBe(0);
    if (overwritten)
      await expect.poll(() => grid(page).getByText(overwritten, { exact: true }).count()).toBeGreaterThan(0);

    // Redo with the keyboard from the grid.
    await grid(page).focus();
    await page.keyboard.press('Control+Shift+Z');
    await expect.poll(() => shownRows(page)).toBe(before + 19);
    await page.keyboard.press('Control+Z');
    await expect.poll(() => shownRows(page)).toBe(before);
    await page.keyboard.press('Control+Shift+Z');
    await expect.poll(() => shownRows(page)).toBe(before + 19);
  });

  it('deleting pasted rows is one undo step as well', async () => {
    const { page } = browser;
    const g = grid(page);
    await scrollGridToBottom(g);
    const row = await cell(g, 'Pasted machine 20', 'Machine');
    await row.click();
    await page.keyboard.press('Shift+ArrowUp');
    await page.getByRole('button', { name: /Delete 2 rows/ }).click();
    await expect.poll(() => shownRows(page)).toBe(before + 17);
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => shownRows(page)).toBe(before + 19);
  });
});
