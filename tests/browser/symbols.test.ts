/**
 * Symbols render as symbols: no tab of the demo shows a symbol written with a raw underscore
 * (L_WA, A_div, D_Ω, L_EX,8h); each is set with a real subscript. Invented demo data.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { openTab } from './ledger-page.ts';

const TABS = [
  'Machines',
  'Duties',
  'Receivers',
  'Phases',
  'Clauses',
  'Results',
  'Quick calculation',
  'Machine register',
  'Settings',
];

/** Visible text runs holding a letter, an underscore and a letter (a symbol not set as one). */
async function rawSymbols(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const found: string[] = [];
    const walker = document.createTreeWalker(document.body, NodeFilter.SHOW_TEXT);
    for (let n = walker.nextNode(); n; n = walker.nextNode()) {
      const text = n.textContent ?? '';
      const m = /(?<![\p{L}\p{N}_])\p{L}_[\p{L}\p{N}Ω]/u.exec(text);
      if (!m) continue;
      const el = n.parentElement;
      if (!el || el.closest('script, style, [hidden], [aria-hidden="true"]') || el.getClientRects().length === 0)
        continue;
      found.push(text.trim().slice(Math.max(0, m.index - 30), m.index + 30));
    }
    return found;
  });
}

describe('symbols in the app', () => {
  let browser: BrowserSession;
  beforeAll(async () => {
    await ensureApp();
    browser = await openBrowser({ viewport: { width: 1440, height: 900 } });
  });
  afterAll(async () => {
    await browser?.close();
  });

  it.each(TABS)('the %s tab shows no symbol with a raw underscore', async (tab) => {
    const { page } = browser;
    await openTab(page, tab);
    await page.waitForTimeout(500);
    expect(await rawSymbols(page)).toEqual([]);
  });

  it('the quick calculation by ISO 9613-2:1996 shows its terms and band table as symbols', async () => {
    const { page } = browser;
    await openTab(page, 'Quick calculation');
    await page.getByLabel('ISO 9613-2:1996 outdoor propagation').check();
    await page.getByTestId('quick-level').waitFor();
    await page.waitForTimeout(300);
    expect(await rawSymbols(page)).toEqual([]);
  });

  it('the Site plan tab, with its level map shown and the pointer over the plan, shows no raw underscore', async () => {
    const { page } = browser;
    await openTab(page, 'Site plan');
    await page.getByRole('button', { name: 'Show level map' }).click();
    await page.getByLabel('Legend').waitFor();
    await expect
      .poll(() => page.getByRole('status').filter({ hasText: 'Computing' }).count(), { timeout: 30_000 })
      .toBe(0);
    const plan = page
      .locator('svg')
      .filter({ has: page.locator('.receiver') })
      .first();
    const box = await plan.boundingBox();
    if (box) await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.waitForTimeout(300);
    expect(await rawSymbols(page)).toEqual([]);
    // the legend names the quantity with its subscript
    expect(await page.getByLabel('Legend').locator('sub').count()).toBeGreaterThanOrEqual(1);
    await screenshot(page, 'site-plan-tab-map');
  });
});
