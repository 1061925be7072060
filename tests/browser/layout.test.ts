/**
 * Layout at the two screen sizes the app is made for: at 1024×700 no tab scrolls the page
 * sideways, the tabs keep to one line and the header to two; at 1440×900 the header is one
 * line with every action in it shown and named, and the demo's
 * four-receiver matrix and the ranking fit their cards without a sideways scroll, on the
 * results tab and beside the machine grid; grid headers are never cut. Invented demo data.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { openTab } from './ledger-page.ts';

const TABS = ['Machines', 'Duties', 'Receivers', 'Phases', 'Clauses', 'Results', 'Quick calculation', 'Settings'];

/** Page width beyond the window, in CSS pixels (0 when nothing scrolls sideways). */
async function sidewaysOverflow(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
}

/** Grid headers whose text is cut (wider or taller than the room it has). */
async function clippedHeaders(page: Page): Promise<string[]> {
  return page.evaluate(() =>
    [...document.querySelectorAll('[role="columnheader"] .name')]
      .filter((el) => el.scrollHeight > el.clientHeight + 1 || el.scrollWidth > el.clientWidth + 1)
      .map((el) => el.textContent ?? ''),
  );
}

describe('layout at 1024×700', () => {
  let browser: BrowserSession;
  beforeAll(async () => {
    await ensureApp();
    browser = await openBrowser({ viewport: { width: 1024, height: 700 } });
  });
  afterAll(async () => {
    await browser?.close();
  });

  it.each(TABS)('the %s tab has no horizontal scroll and no cut grid header', async (tab) => {
    const { page } = browser;
    await openTab(page, tab);
    await page.waitForTimeout(300);
    expect(await sidewaysOverflow(page)).toBe(0);
    expect(await clippedHeaders(page)).toEqual([]);
    await screenshot(page, `layout-1024-${tab.toLowerCase().replace(/\s+/g, '-')}`, { fullPage: true });
  });

  it('the Results tab’s ranking shows every column and its buttons without a sideways scroll', async () => {
    const { page } = browser;
    await openTab(page, 'Results');
    await page.locator('.ranking tbody tr').first().waitFor();
    const overflow = await page.evaluate(() =>
      [...document.querySelectorAll('.ranking .scroll')].map((el) => el.scrollWidth - el.clientWidth),
    );
    expect(overflow.length).toBeGreaterThanOrEqual(1);
    expect(overflow.every((o) => o <= 0)).toBe(true);
  });

  it('the tab row is one line and the header at most two', async () => {
    const { page } = browser;
    await openTab(page, 'Machines');
    const tops = await page.evaluate(() =>
      [...document.querySelectorAll('[role="tab"]')].map((t) => Math.round(t.getBoundingClientRect().top)),
    );
    expect(tops.length).toBe(10);
    expect(new Set(tops).size).toBe(1);
    // two lines of header buttons (each about 30 px with its gap) and the bar's padding
    const header = await page.locator('header.top').evaluate((el) => el.getBoundingClientRect().height);
    expect(header).toBeLessThan(90);
    await screenshot(page, 'layout-1024-header', { selector: 'header.top' });
  });
});

describe('layout at 1440×900', () => {
  let browser: BrowserSession;
  beforeAll(async () => {
    await ensureApp();
    browser = await openBrowser({ viewport: { width: 1440, height: 900 } });
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('the header is one line, every action in it shown, named and in the Tab order', async () => {
    const { page } = browser;
    await openTab(page, 'Machines');
    const header = page.locator('header.top');
    // one line of buttons (about 30 px) and the bar's padding
    expect(await header.evaluate((el) => el.getBoundingClientRect().height)).toBeLessThan(50);
    const controls = await header.evaluate((root) =>
      [...root.querySelectorAll('button, select')]
        .filter((el) => el.getClientRects().length > 0)
        .map((el) => ({ top: Math.round(el.getBoundingClientRect().top), tabIndex: (el as HTMLElement).tabIndex })),
    );
    expect(controls.length).toBe(12);
    expect(controls.every((c) => Math.abs(c.top - (controls[0]?.top ?? NaN)) <= 3)).toBe(true);
    expect(controls.every((c) => c.tabIndex === 0)).toBe(true);
    const names = [
      'New',
      'New demo project',
      'Rename',
      'Duplicate',
      'Delete',
      'Undo',
      'Redo',
      'Export workbook',
      'Export project file',
      'Import project file',
      'Import supplier list',
    ];
    for (const name of names) expect(await header.getByRole('button', { name, exact: true }).isVisible()).toBe(true);
    expect(await header.getByRole('combobox', { name: 'Project' }).isVisible()).toBe(true);
    await screenshot(page, 'layout-1440-header', { selector: 'header.top' });
  });

  it('the four-receiver matrix and the ranking fit without a sideways scroll', async () => {
    const { page } = browser;
    await openTab(page, 'Results');
    const matrix = page.getByTestId('results-matrix');
    await matrix.locator('thead th').nth(4).waitFor();
    // the demo has four receivers (invented data): corner cell + four columns
    expect(await matrix.locator('thead th').count()).toBe(5);
    const overflow = await page.evaluate(() =>
      [...document.querySelectorAll('[data-testid="results-matrix"] .matrix, .ranking .scroll')].map(
        (el) => el.scrollWidth - el.clientWidth,
      ),
    );
    expect(overflow.length).toBeGreaterThanOrEqual(2);
    expect(overflow.every((o) => o <= 0)).toBe(true);
    expect(await sidewaysOverflow(page)).toBe(0);
    await screenshot(page, 'layout-1440-results', { fullPage: true });
  });

  it('beside the machine grid, the four-receiver matrix and the ranking fit: nothing scrolls sideways, no header is cut', async () => {
    const { page } = browser;
    await openTab(page, 'Machines');
    const aside = page.getByRole('complementary', { name: 'Results for the project' });
    await aside.getByTestId('ranking').locator('tbody tr').first().waitFor();
    expect(await aside.getByTestId('matrix').locator('thead th').count()).toBe(5);
    const found = await aside.evaluate((root) => {
      const wider = [...root.querySelectorAll('*')]
        .filter((el) => el.scrollWidth > el.clientWidth + 1 && !el.classList.contains('visually-hidden'))
        .filter((el) => getComputedStyle(el).overflowX !== 'visible')
        .map((el) => `${el.tagName.toLowerCase()}.${el.className}: ${el.scrollWidth} > ${el.clientWidth}`);
      const cut = [...root.querySelectorAll('th')]
        .filter((el) => el.scrollWidth > el.clientWidth + 1 || el.scrollHeight > el.clientHeight + 1)
        .map((el) => el.textContent?.trim() ?? '');
      // every ranking column and every action button lies inside the aside
      const right = root.getBoundingClientRect().right;
      const outside = [...root.querySelectorAll('th, td, button')]
        .filter((el) => el.getClientRects().length > 0 && el.getBoundingClientRect().right > right + 1)
        .map((el) => el.textContent?.trim() ?? '');
      return { wider, cut, outside };
    });
    expect(found).toEqual({ wider: [], cut: [], outside: [] });
    expect(await aside.getByTestId('ranking').getByRole('button', { name: /^Pin / }).first().isVisible()).toBe(true);
    expect(await sidewaysOverflow(page)).toBe(0);
    await screenshot(page, 'layout-1440-machines', { fullPage: true });
  });
});
