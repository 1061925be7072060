/**
 * The active cell is always in view: moving across the machine grid with the arrow keys at
 * 1024×700 scrolls sideways just enough to show each cell beside the frozen first column, and
 * moving back brings the first columns back. Invented demo data.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { ensureApp, openBrowser, type BrowserSession } from './harness.ts';
import { MACHINE_GRID, grid } from './ledger-page.ts';

/** How far the active cell sticks out of the grid's viewport (0 when wholly in view), CSS pixels. */
async function activeCellOutside(page: Page): Promise<{ outside: number; col: number; scrollLeft: number }> {
  return page.evaluate((name) => {
    const viewport = document.querySelector(`[role="grid"][aria-label="${name}"]`) as HTMLElement;
    const id = viewport.getAttribute('aria-activedescendant');
    const cell = id ? document.getElementById(id) : null;
    if (!cell) return { outside: Number.POSITIVE_INFINITY, col: -1, scrollLeft: viewport.scrollLeft };
    const v = viewport.getBoundingClientRect();
    const c = cell.getBoundingClientRect();
    const right = v.left + viewport.clientWidth;
    const outside = Math.max(0, v.left - c.left, c.right - right);
    return { outside, col: Number(cell.getAttribute('aria-colindex')), scrollLeft: viewport.scrollLeft };
  }, MACHINE_GRID);
}

describe('the active cell is revealed', () => {
  let browser: BrowserSession;
  beforeAll(async () => {
    await ensureApp();
    browser = await openBrowser({ viewport: { width: 1024, height: 700 } });
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('ArrowRight to the last column and ArrowLeft back keep every active cell wholly in view', async () => {
    const { page } = browser;
    const g = grid(page);
    const colCount = Number(await g.getAttribute('aria-colcount'));
    expect(colCount).toBeGreaterThan(8); // the machine grid is wider than 1024 px
    // a machine's row (a duty's title row takes ←/→ to close and open its group)
    await g.locator('[role="row"]:has([aria-colindex="2"]) [role="gridcell"][aria-colindex="1"]').first().click();
    let scrolled = 0;
    for (let k = 1; k < colCount; k++) {
      await page.keyboard.press('ArrowRight');
      await page.waitForTimeout(30);
      const at = await activeCellOutside(page);
      expect(at.col).toBe(k + 1);
      expect(at.outside).toBeLessThanOrEqual(1);
      scrolled = Math.max(scrolled, at.scrollLeft);
    }
    expect(scrolled).toBeGreaterThan(0);
    for (let k = colCount - 1; k >= 1; k--) {
      await page.keyboard.press('ArrowLeft');
      await page.waitForTimeout(30);
      const at = await activeCellOutside(page);
      expect(at.col).toBe(k);
      expect(at.outside).toBeLessThanOrEqual(1);
    }
  });
});
