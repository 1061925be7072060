/**
 * Two tabs on one project, in the real browser: edits to different cells within 100 ms
 * of each other are both kept; when both change one cell, the later save is kept and the
 * other tab is told; undo in one tab undoes only that tab's edit; an editor left open
 * over a cell another tab changed says so; a reload reopens the tab's own project.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { ensureApp, openBrowser, screenshot, waitForGrid, type BrowserSession } from './harness.ts';
import { cell, grid, typeInto } from './ledger-page.ts';

let browser: BrowserSession;
let a: Page;
let b: Page;
// Machines of the invented demo project.
const FIRST = 'Brantor HB20 breaker on 20 t excavator';
const SECOND = 'Brantor HB20 with muffled housing';
const THIRD = 'Valdor jaw crusher attachment on 20 t excavator';

const text = async (page: Page, row: string, column: string) => (await cell(grid(page), row, column)).innerText();

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
  a = browser.page;
  b = await browser.newPage();
  for (const [name, page] of [
    ['A', a],
    ['B', b],
  ] as const)
    page.on('pageerror', (e) => console.log(name, 'page error', e.message));
});

afterAll(async () => {
  await browser?.close();
});

describe('two tabs on one project', () => {
  it('edits to different cells made within 100 ms in two tabs are both kept, in both tabs and after a reload', async () => {
    await Promise.all([
      typeInto(await cell(grid(a), FIRST, 'LWA'), '111'),
      typeInto(await cell(grid(b), SECOND, 'LWA'), '112'),
    ]);
    for (const page of [a, b]) {
      await expect.poll(() => text(page, FIRST, 'LWA'), { timeout: 10_000 }).toBe('111');
      await expect.poll(() => text(page, SECOND, 'LWA'), { timeout: 10_000 }).toBe('112');
    }
    await b.reload();
    await waitForGrid(b);
    expect(await text(b, FIRST, 'LWA')).toBe('111');
    expect(await text(b, SECOND, 'LWA')).toBe('112');
  });

  it('two tabs changing one cell at the same moment: both end with the value saved last, and a replaced value is said', async () => {
    await typeInto(await cell(grid(a), THIRD, 'LWA'), '104');
    await expect.poll(() => text(b, THIRD, 'LWA'), { timeout: 10_000 }).toBe('104');
    // Both tabs type over 104 and commit within a few ms of each other.
    await (await cell(grid(a), THIRD, 'LWA')).click();
    await a.keyboard.type('99');
    await (await cell(grid(b), THIRD, 'LWA')).click();
    await b.keyboard.type('101');
    await Promise.all([a.keyboard.press('Enter'), b.keyboard.press('Enter')]);
    await expect
      .poll(async () => (await text(a, THIRD, 'LWA')) === (await text(b, THIRD, 'LWA')), { timeout: 10_000 })
      .toBe(true);
    const kept = await text(a, THIRD, 'LWA');
    expect(['101', '99']).toContain(kept);
    // When both saves were based on the same revision, the tab whose value was replaced is told.
    for (const page of [a, b]) {
      const told = page.getByRole('alert').filter({ hasText: 'Another tab saved a different value' });
      if (await told.count()) {
        expect(await told.innerText()).toContain(`now ${kept}`);
        await screenshot(page, 'two-tabs-same-cell');
        await page.getByRole('button', { name: 'Dismiss this message' }).first().click();
      }
    }
    await a.reload();
    await waitForGrid(a);
    expect(await text(a, THIRD, 'LWA')).toBe(kept);
  });

  it('undo in one tab undoes only that tab’s edit, not the other tab’s', async () => {
    const before = await text(b, SECOND, 'Day rate');
    await typeInto(await cell(grid(b), SECOND, 'Day rate'), '777');
    await typeInto(await cell(grid(a), FIRST, 'Day rate'), '555');
    await expect.poll(() => text(b, FIRST, 'Day rate'), { timeout: 10_000 }).toBe('555');
    await expect.poll(() => text(a, SECOND, 'Day rate'), { timeout: 10_000 }).toBe('777');
    await b.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => text(b, SECOND, 'Day rate')).toBe(before);
    expect(await text(b, FIRST, 'Day rate')).toBe('555');
    await expect.poll(() => text(a, SECOND, 'Day rate'), { timeout: 10_000 }).toBe(before);
    expect(await text(a, FIRST, 'Day rate')).toBe('555');
  });

  it('an editor left open over a cell another tab changed says so, and Enter keeps what was typed', async () => {
    const target = await cell(grid(b), FIRST, 'Running per day');
    await target.click();
    await b.keyboard.type('42');
    await typeInto(await cell(grid(a), FIRST, 'Running per day'), '61');
    const note = b.getByRole('alert').filter({ hasText: 'Changed in another tab to “61”' });
    await note.waitFor({ timeout: 10_000 });
    await screenshot(b, 'two-tabs-editor-underneath');
    await b.keyboard.press('Enter');
    await expect.poll(() => text(a, FIRST, 'Running per day'), { timeout: 10_000 }).toBe('42');
    expect(await text(b, FIRST, 'Running per day')).toBe('42');
  });

  it('a reload reopens the project this tab had open, though another tab opened another since', async () => {
    const demoName = await a.locator('#project-select option:checked').innerText();
    await b.getByRole('button', { name: 'New', exact: true }).click();
    await b.getByRole('dialog').getByRole('textbox').fill('Second site');
    await b.getByRole('button', { name: 'Create' }).click();
    await expect.poll(() => b.locator('#project-select option:checked').innerText()).toBe('Second site');
    await a.reload();
    await waitForGrid(a);
    await expect.poll(() => a.locator('#project-select option:checked').innerText()).toBe(demoName);
  });
});
