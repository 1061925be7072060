/**
 * How sure compliance is, from a project typed by hand from nothing (names invented): one
 * receiver, two machines for the one duty, a stated distance and an on-time range; then the
 * probability in the matrix, the simulation in its worker, the cheapest fleet at 90 %, and the
 * trade-off chart switched to cost against the probability that every limit is met.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { cell, grid, openTab, pasteText, typeInto } from './ledger-page.ts';

let browser: BrowserSession;

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('probability of compliance from an empty project', () => {
  it('a project typed by hand shows the probability in the matrix, simulates, and finds the cheapest fleet at 90 %', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'New', exact: true }).click();
    await page.getByRole('dialog').getByRole('textbox').fill('Orrin Yard hoarding works');
    await page.getByRole('button', { name: 'Create' }).click();
    await expect
      .poll(() => page.locator('#project-select option:checked').innerText())
      .toBe('Orrin Yard hoarding works');

    await openTab(page, 'Receivers');
    const receivers = grid(page, 'Receivers');
    await receivers.click();
    await pasteText(page, 'Tamsin House\thome\t0\t0\t4\tyes\t66\r\n');
    await expect
      .poll(async () => (await cell(receivers, 'Tamsin House', 'Limit Weekday daytime')).innerText())
      .toBe('66');

    await openTab(page, 'Machines');
    const machines = grid(page);
    await machines.click();
    await pasteText(page, 'Orrin 8 t excavator\t101\r\nOrrin 8 t excavator, quiet pack\t95\r\n');
    await expect
      .poll(() => machines.locator('[role="gridcell"][aria-colindex="1"]').filter({ hasText: 'quiet pack' }).count())
      .toBe(1);
    await typeInto(await cell(machines, 'Orrin 8 t excavator, quiet pack', 'Day rate'), '260');
    await typeInto(
      await cell(machines, 'Orrin 8 t excavator\t', 'Day rate').catch(() =>
        cell(machines, 'Orrin 8 t excavator', 'Day rate'),
      ),
      '150',
    );

    await openTab(page, 'Duties');
    const duties = grid(page, 'Duties');
    await typeInto(await cell(duties, 'Duty 1', 'Distance to Tamsin House'), '30');
    await typeInto(await cell(duties, 'Duty 1', 'Baseline machine'), 'Orrin 8 t excavator');
    await typeInto(await cell(duties, 'Duty 1', 'On-time lowest'), '50');
    await typeInto(await cell(duties, 'Duty 1', 'On-time highest'), '100');
    await expect.poll(async () => (await cell(duties, 'Duty 1', 'On-time highest')).innerText()).toBe('100');

    await openTab(page, 'Results');
    await page.getByTestId('matrix-show-probability').check();
    await expect
      .poll(() => page.getByTestId('matrix-probability').first().innerText())
      .toMatch(/^P\(meet\) \d+\.\d+ %$/);

    const panel = page.getByTestId('confidence-panel');
    await expect
      .poll(() => panel.innerText())
      .toMatch(/On-time drawn uniformly between its lowest and highest for: Duty 1 50–100 %/);
    await panel.getByTestId('confidence-simulate').click();
    await expect
      .poll(() => panel.getByTestId('confidence-joint').innerText(), { timeout: 30_000 })
      .toMatch(/Every limit met at once: \d+\.\d+ % ± \d+\.\d+ % \(simulated, 10,000 draws, seed 1\)/);
    expect(await panel.innerText()).toMatch(/competent acoustician and the local authority decide/);
    expect(await panel.innerText()).not.toMatch(/made before later edits/);

    await panel.getByTestId('confidence-rank').click();
    await expect
      .poll(() => panel.getByTestId('confidence-ranking').innerText(), { timeout: 30_000 })
      .toMatch(/Orrin 8 t excavator \(in the fleet\)/);
    expect(await panel.getByTestId('confidence-ranking').innerText()).toMatch(/quiet pack/);

    await panel.getByTestId('confidence-target').fill('95x');
    await expect
      .poll(() => panel.innerText())
      .toMatch(/Confidence: "95x" is not accepted \(give a percentage from 1 to 99.99, e.g. 90\)/);
    await panel.getByTestId('confidence-target').fill('90');
    await panel.getByTestId('confidence-find').click();
    await expect
      .poll(() => panel.getByTestId('confidence-fleet').innerText(), { timeout: 60_000 })
      .toMatch(/meets every limit with probability 90.0 %/);
    await panel.getByTestId('confidence-costs').click();
    await expect
      .poll(() => panel.getByTestId('confidence-cost-table').innerText(), { timeout: 90_000 })
      .toMatch(/99 %/);
    await panel.scrollIntoViewIfNeeded();
    await screenshot(page, 'confidence-panel', { selector: '[data-testid="confidence-panel"]' });

    // The trade-off chart draws the cost of confidence: before the optimiser runs, only the probability view.
    const chart = page.locator('figure.trade-off');
    const confidencePoints = chart.getByTestId('confidence-point');
    await expect.poll(() => confidencePoints.count()).toBeGreaterThanOrEqual(4);
    const asked = await confidencePoints.evaluateAll((els) =>
      els.map((e) => Number(e.getAttribute('data-confidence'))),
    );
    for (const c of asked) expect([0.5, 0.8, 0.9, 0.95, 0.99]).toContain(c);
    // The deterministic optimum is marked; the assessed fleet too (one joined mark when both have the same cost and probability).
    expect(
      await chart.locator('[data-mark]').evaluateAll((els) => els.map((e) => e.getAttribute('data-mark'))),
    ).toContain('deterministic');
    // Each point's figures are the ledger's simulation in words, e.g. "Asked 90 %: £…, every limit met at once 93.6 % ± 0.3 %".
    expect(await confidencePoints.nth(0).locator('title').textContent()).toMatch(
      /^Asked \d+ %: .+, every limit met at once (\d+\.\d+ % ± \d+\.\d+ %|above 99\.97 % \(no draw of 10,000 failed\))$/,
    );
    expect(await chart.innerText()).toMatch(/[Aa]ssessed fleet \(baseline\)/);
    expect(await chart.innerText()).toMatch(/competent acoustician and the local authority decide/);
    expect(await chart.getByLabel(/run the optimiser first/).isDisabled()).toBe(true);

    // After the optimiser has run, the labelled choice switches between the two views.
    await page.getByRole('button', { name: 'Find the cheapest fleet' }).click();
    await page.getByRole('button', { name: 'Use this fleet' }).waitFor({ timeout: 100_000 });
    await chart.getByLabel(/worst-case level above its limit \(dB\)/).check();
    await expect.poll(() => chart.locator('[data-mark~="best"]').count()).toBe(1);
    expect(await confidencePoints.count()).toBe(0);
    await chart.getByLabel(/probability that every limit is met at once \(%\)/).check();
    await expect.poll(() => confidencePoints.count()).toBe(asked.length);
    await chart.scrollIntoViewIfNeeded();
    await screenshot(page, 'confidence-trade-off', { selector: 'figure.trade-off' });
  });
});
