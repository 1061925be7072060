/**
 * Printing at once after opening the app, before the results tab was ever opened: the
 * printed report is there (its code loads with the project) and Ctrl+P pressed before that
 * code arrived waits for it. Invented demo data.
 */
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL, ensureApp, openBrowser, waitForGrid, type BrowserSession } from './harness.ts';

let browser: BrowserSession | undefined;

beforeAll(async () => {
  await ensureApp();
});

afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

describe('printing at once after the app opens', () => {
  it('a page printed from the first moment shows the report with its compliance statement, on the machines tab', async () => {
    browser = await openBrowser({ open: false });
    const { page } = browser;
    await page.emulateMedia({ media: 'print' });
    await page.goto(BASE_URL);
    await page.locator('[role="tab"][aria-selected="true"]').waitFor({ state: 'attached' });
    expect(await page.locator('[role="tab"][aria-selected="true"]').innerText()).toBe('Machines');
    const report = page.locator('.pnl-report');
    await expect.poll(() => report.innerText(), { timeout: 20_000 }).toContain('Compliance statement for');
    expect(await report.isVisible()).toBe(true);
    expect(await report.innerText()).toMatch(/±3 dB/);
  });

  it('Ctrl+P pressed before the report’s code has arrived waits for it, then prints the report', async () => {
    browser = await openBrowser({ open: false });
    const { page } = browser;
    // The browser's print is replaced by a note of what the report held when printing began
    // (Chromium fires beforeprint first, which builds the report's content).
    await page.addInitScript(() => {
      const w = window as unknown as { printedText?: string };
      window.print = () => {
        window.dispatchEvent(new Event('beforeprint'));
        w.printedText = document.querySelector('.pnl-report')?.textContent ?? '';
        window.dispatchEvent(new Event('afterprint'));
      };
    });
    // Hold the report's code back until after Ctrl+P.
    let release: () => void = () => {};
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route(/\/assets\/Report-[^/]*\.js$/, async (route) => {
      await held;
      await route.continue();
    });
    await page.goto(BASE_URL);
    await waitForGrid(page);
    await page.keyboard.press('Control+P');
    await page.waitForTimeout(300);
    expect(await page.evaluate(() => (window as unknown as { printedText?: string }).printedText)).toBeUndefined();
    release();
    await expect
      .poll(() => page.evaluate(() => (window as unknown as { printedText?: string }).printedText ?? ''))
      .toContain('Compliance statement for');
    const printed = await page.evaluate(() => (window as unknown as { printedText?: string }).printedText ?? '');
    expect(printed).toContain('Shortlist');
  });
});

describe('printing from the browser’s own menu', () => {
  /** Fires what the browser's menu print fires and returns the report's text as it stood then. */
  async function menuPrint(page: import('playwright-core').Page): Promise<string> {
    return page.evaluate(() => {
      window.dispatchEvent(new Event('beforeprint'));
      const text = document.querySelector('.pnl-report')?.textContent ?? '';
      window.dispatchEvent(new Event('afterprint'));
      return text;
    });
  }

  it('the report’s code is fetched right after the first paint, while the projects are still opening', async () => {
    browser = await openBrowser({ open: false });
    const { page } = browser;
    // The browser's database never answers, so no project opens.
    await page.addInitScript(() => {
      IDBFactory.prototype.open = function () {
        return new EventTarget() as IDBOpenDBRequest;
      };
    });
    const reportCode = page.waitForRequest(/\/assets\/Report-[^/]*\.js$/, { timeout: 10_000 });
    await page.goto(BASE_URL);
    await reportCode;
    expect(await page.getByRole('status').filter({ hasText: 'Opening your projects' }).isVisible()).toBe(true);
    // the last resort: paper says what happened rather than coming out blank
    expect(await menuPrint(page)).toContain('still opening when printing began');
  });

  it('when the report’s code is still missing, paper says to print again', async () => {
    browser = await openBrowser({ open: false });
    const { page } = browser;
    await page.route(/\/assets\/Report-[^/]*\.js$/, () => {
      // never answered
    });
    await page.goto(BASE_URL);
    await waitForGrid(page);
    expect(await menuPrint(page)).toContain('The report was still loading when printing began');
  });
});
