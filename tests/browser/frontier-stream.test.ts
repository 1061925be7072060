/**
 * The exact trade-off frontier streamed to the chart, in Chromium: on an invented random site of
 * 30 duties × 12 machines × 20 receivers × 5 phases (the size the benchmark targets), the points appear
 * while the curve is traced (the count is read while the status says it is tracing), the finished curve
 * is the core's frontier for the same project (the same fleets' costs and worst-case levels, point for
 * point, and the same count), and "Stop tracing" keeps the points found so far, which are the cheapest of
 * the core's frontier.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureApp, openBrowser, screenshot, waitForGrid, type BrowserSession } from './harness.ts';
import { openTab } from './ledger-page.ts';
import { storeProject } from './seed.ts';
import { siteProject } from '../unit/ledger/optimise/site-project.ts';
import { optimiseFleet } from '../../src/ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../src/ledger/optimise/load-highs.ts';
import type { Page } from 'playwright-core';

let browser: BrowserSession;
/** The core's frontier for the project, as the chart shows it: whole pounds and the level to 0.1 dB. */
let core: string[];

const SIZE = { duties: 30, candidates: 12, receivers: 20, phases: 5 };

/** A point's cost and worst-case level read from its tooltip ("Worst-case level 61.2 dB (0.4 dB under the limit) for £12,345"). */
function shownPoint(title: string): string {
  const [level = '', money = ''] = title.split(' for ');
  return `${money.replace(/[^0-9]/g, '')} ${/[0-9]+\.[0-9]/.exec(level)?.[0] ?? '?'}`;
}

async function chartPoints(page: Page): Promise<string[]> {
  const titles = await page.locator('svg.chart .points circle title').allTextContents();
  return titles.map(shownPoint);
}

/** The card holding the frontier's status and the chart. */
const CHART_CARD = 'section.card:has([data-testid="frontier-status"])';

const status = (page: Page) => page.getByTestId('frontier-status');

beforeAll(async () => {
  const { project, evaluation } = siteProject(SIZE, 11);
  const result = optimiseFleet(project, evaluation, { exactFrontier: true }, await loadHighsSolver());
  core = result.tradeOff.map((p) => `${Math.round(p.cost)} ${p.worstLevelDb.toFixed(1)}`);
  await ensureApp();
  browser = await openBrowser();
  await storeProject(browser.page, project);
  await browser.page.reload();
  await waitForGrid(browser.page);
}, 120_000);

afterAll(async () => {
  await browser?.close();
});

describe('the exact frontier streams to the trade-off chart', () => {
  it('points appear while tracing, and the finished curve is the core’s frontier', async () => {
    const { page } = browser;
    await openTab(page, 'Results');
    await page.getByRole('button', { name: 'Find the cheapest fleet' }).click();
    // read the count while the status still says it is tracing
    const whileTracing: number[] = [];
    let shot = false;
    for (let i = 0; i < 4000; i++) {
      const state = await status(page)
        .getAttribute('data-state', { timeout: 200 })
        .catch(() => null);
      if (state === 'complete') break;
      if (state === 'tracing') {
        const count = Number(await status(page).getAttribute('data-count'));
        whileTracing.push(count);
        if (!shot && count >= 3) {
          shot = true;
          await screenshot(page, 'frontier-streaming-chart', { selector: CHART_CARD });
        }
      }
      await page.waitForTimeout(50);
    }
    expect(await status(page).getAttribute('data-state')).toBe('complete');
    expect(whileTracing.some((n) => n > 0 && n < core.length)).toBe(true);
    expect(Number(await status(page).getAttribute('data-count'))).toBe(core.length);
    expect(await status(page).innerText()).toContain(`Curve complete: ${core.length} fleets.`);
    expect(await chartPoints(page)).toEqual(core);
    await screenshot(page, 'frontier-complete-chart', { selector: CHART_CARD });
    await screenshot(page, 'frontier-complete-panel', { selector: '.optimiser' });
  }, 300_000);

  it('"Stop tracing" keeps the points found so far, the cheapest of the frontier', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Find the cheapest fleet' }).click();
    // the new run's count (until its fleets are known the status still describes the finished curve)
    const tracing = async () =>
      (await status(page).getAttribute('data-state')) === 'tracing' &&
      Number(await status(page).getAttribute('data-count')) >= 5;
    await expect.poll(tracing, { timeout: 200_000, interval: 50 }).toBe(true);
    await page.getByRole('button', { name: 'Stop tracing' }).click();
    await expect.poll(() => status(page).getAttribute('data-state')).toBe('stopped');
    const kept = Number(await status(page).getAttribute('data-count'));
    expect(kept).toBeGreaterThanOrEqual(5);
    expect(kept).toBeLessThan(core.length);
    await page.waitForTimeout(1000);
    expect(Number(await status(page).getAttribute('data-count'))).toBe(kept);
    expect(await chartPoints(page)).toEqual(core.slice(0, kept));
    expect(await status(page).innerText()).toContain(`Stopped after ${kept} fleets.`);
    // the fleet found stays
    expect(await page.getByRole('button', { name: 'Use this fleet' }).count()).toBe(1);
  }, 300_000);
});
