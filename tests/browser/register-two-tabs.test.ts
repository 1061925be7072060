/**
 * The machine register open in two tabs of one browser: edits to different cells of one
 * machine, made at the same moment, are both kept in both tabs and after a reload; undo in
 * one tab takes back that tab's edit only. The machine is invented.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { cell, grid, openTab, typeInto } from './ledger-page.ts';

let browser: BrowserSession;
let a: Page;
let b: Page;
const REGISTER_GRID = 'Machine register';
const MACHINE = 'Orlen RX-14 excavator';

const text = async (page: Page, column: string) => (await cell(grid(page, REGISTER_GRID), MACHINE, column)).innerText();

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
  a = browser.page;
  b = await browser.newPage();
});

afterAll(async () => {
  await browser?.close();
});

describe('the machine register in two tabs', () => {
  it('a machine typed in one tab shows in the other', async () => {
    await openTab(a, 'Machine register');
    const g = grid(a, REGISTER_GRID);
    await g.click();
    await a.keyboard.type(MACHINE);
    await a.keyboard.press('Enter');
    await typeInto(await cell(g, MACHINE, 'LWA'), '101');
    await openTab(b, 'Machine register');
    await expect.poll(() => text(b, 'LWA'), { timeout: 10_000 }).toBe('101');
  });

  it('edits to two cells of one machine at the same moment are both kept, in both tabs and after a reload', async () => {
    await Promise.all([
      typeInto(await cell(grid(a, REGISTER_GRID), MACHINE, 'LWA'), '99'),
      typeInto(await cell(grid(b, REGISTER_GRID), MACHINE, 'Operator LpA'), '77'),
    ]);
    for (const page of [a, b]) {
      await expect.poll(() => text(page, 'LWA'), { timeout: 10_000 }).toBe('99');
      await expect.poll(() => text(page, 'Operator LpA'), { timeout: 10_000 }).toBe('77');
    }
    await b.reload();
    await openTab(b, 'Machine register');
    await expect.poll(() => text(b, 'LWA'), { timeout: 10_000 }).toBe('99');
    expect(await text(b, 'Operator LpA')).toBe('77');
    await screenshot(b, 'register-two-tabs');
  });

  it('undo in one tab takes back that tab’s edit only', async () => {
    await (await cell(grid(a, REGISTER_GRID), MACHINE, 'LWA')).click();
    await a.keyboard.press('Control+z');
    for (const page of [a, b]) {
      await expect.poll(() => text(page, 'LWA'), { timeout: 10_000 }).toBe('101');
      await expect.poll(() => text(page, 'Operator LpA'), { timeout: 10_000 }).toBe('77');
    }
  });

  it('both tabs changing one cell at once end with the value saved last; a replaced value is said', async () => {
    await (await cell(grid(a, REGISTER_GRID), MACHINE, 'Net power')).click();
    await a.keyboard.type('95');
    await (await cell(grid(b, REGISTER_GRID), MACHINE, 'Net power')).click();
    await b.keyboard.type('96');
    await Promise.all([a.keyboard.press('Enter'), b.keyboard.press('Enter')]);
    await expect
      .poll(async () => (await text(a, 'Net power')) === (await text(b, 'Net power')), { timeout: 10_000 })
      .toBe(true);
    const kept = await text(a, 'Net power');
    expect(['95', '96']).toContain(kept);
    // When both saves were made on the same revision, the tab whose value was replaced is told.
    for (const page of [a, b]) {
      const told = page.getByRole('alert').filter({ hasText: 'Another tab saved a different value' });
      if (await told.count()) {
        expect(await told.innerText()).toMatch(new RegExp(`Machine register › ${MACHINE} › Net power: now ${kept}`));
        await screenshot(page, 'register-two-tabs-same-cell');
      }
    }
  });
});
