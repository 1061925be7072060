/**
 * The exact trade-off frontier streamed to the chart, in Chromium: on an invented random site of
 * 30 duties × 12 machines × 20 receivers × 5 phases (the size the benchmark targets), the points appear
 * while the curve is traced, the finished curve is the core's frontier for the same project (the same fleets'
 * costs and worst-case levels, point for point, and the same count), and "Stop tracing" keeps the points found
 * so far, which are the cheapest of the core's frontier.
 *
 * Nothing here depends on how fast the solver is: the page records every change of the status line as it
 * happens (a mutation observer, not polling), so "points appear while tracing" is read from that record once
 * the curve is complete, and the stop is clicked by the observer itself the moment the fifth point is shown.
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

/** One change of the status line as the page saw it. */
interface StatusChange {
  state: string | null;
  count: number;
}

/**
 * Records every change of the frontier status (state and count) in the page as it happens; with `stopAt`, clicks
 * "Stop tracing" from the observer the moment the count reaches it while tracing (before the next point can
 * arrive: a worker message is a task of its own, the observer runs within the task that showed the point).
 */
async function recordStatus(page: Page, stopAt?: number): Promise<void> {
  await page.evaluate((stopAt) => {
    const changes: StatusChange[] = [];
    let last = '';
    let stopped = false;
    const look = () => {
      const el = document.querySelector('[data-testid="frontier-status"]');
      if (!el) return;
      const change = { state: el.getAttribute('data-state'), count: Number(el.getAttribute('data-count')) };
      const key = `${change.state} ${change.count}`;
      if (key === last) return;
      last = key;
      changes.push(change);
      if (stopAt !== undefined && !stopped && change.state === 'tracing' && change.count >= stopAt) {
        const button = [...el.querySelectorAll('button')].find((b) => b.textContent?.trim() === 'Stop tracing');
        if (button) {
          stopped = true;
          button.click();
        }
      }
    };
    const observer = new MutationObserver(look);
    observer.observe(document.body, {
      subtree: true,
      childList: true,
      attributes: true,
      attributeFilter: ['data-state', 'data-count'],
    });
    (window as unknown as { statusChanges: StatusChange[] }).statusChanges = changes;
  }, stopAt);
}

const statusChanges = (page: Page) =>
  page.evaluate(() => (window as unknown as { statusChanges: StatusChange[] }).statusChanges.slice());

describe('the exact frontier streams to the trade-off chart', () => {
  it('points appear while tracing, and the finished curve is the core’s frontier', async () => {
    const { page } = browser;
    await openTab(page, 'Results');
    await recordStatus(page);
    await page.getByRole('button', { name: 'Find the cheapest fleet' }).click();
    await expect
      .poll(() => status(page).getAttribute('data-state'), { timeout: 200_000, interval: 100 })
      .toBe('complete');
    const changes = await statusChanges(page);
    const tracing = changes.filter((c) => c.state === 'tracing').map((c) => c.count);
    // shown one by one while tracing: 0 (the fleet found), then every count up to the whole curve
    expect(tracing[0]).toBe(0);
    expect(tracing).toEqual(Array.from({ length: core.length + 1 }, (_, i) => i));
    expect(changes[changes.length - 1]).toEqual({ state: 'complete', count: core.length });
    expect(await status(page).innerText()).toContain(`Curve complete: ${core.length} fleets.`);
    expect(await chartPoints(page)).toEqual(core);
    await screenshot(page, 'frontier-complete-chart', { selector: CHART_CARD });
    await screenshot(page, 'frontier-complete-panel', { selector: '.optimiser' });
  }, 300_000);

  it('"Stop tracing" keeps the points found so far, the cheapest of the frontier', async () => {
    const { page } = browser;
    await recordStatus(page, 5);
    await page.getByRole('button', { name: 'Find the cheapest fleet' }).click();
    await expect
      .poll(() => status(page).getAttribute('data-state'), { timeout: 200_000, interval: 100 })
      .toBe('stopped');
    const kept = Number(await status(page).getAttribute('data-count'));
    expect(kept).toBe(5);
    expect(kept).toBeLessThan(core.length);
    const changes = await statusChanges(page);
    expect(changes[changes.length - 1]).toEqual({ state: 'stopped', count: 5 });
    // from the new run's first fleet on, the curve never completed
    const run = changes.slice(changes.findIndex((c) => c.state === 'tracing' && c.count === 0));
    expect(run.map((c) => c.count)).toEqual([0, 1, 2, 3, 4, 5, 5]);
    expect(run.some((c) => c.state === 'complete')).toBe(false);
    expect(await chartPoints(page)).toEqual(core.slice(0, kept));
    expect(await status(page).innerText()).toContain(`Stopped after ${kept} fleets.`);
    await screenshot(page, 'frontier-stopped-chart', { selector: CHART_CARD });
    // the fleet found stays
    expect(await page.getByRole('button', { name: 'Use this fleet' }).count()).toBe(1);
  }, 300_000);
});
