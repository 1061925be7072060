/**
 * A whole tender typed by hand into a new project: a second period, two phases, two receivers
 * with limits in both periods, two duties with three machines each; one machine pinned; the
 * optimiser's fleet made the assessed one; then the matrix, the printed report's compliance
 * statement and the exported workbook's compliance sheet must all describe that fleet and say
 * it complies. Places, companies and machines are invented.
 *
 * The figures were chosen so that the baseline fails and a quieter fleet passes, worked by hand
 * with the point-source relation Lp = LWA − 20·lg r − 8 (Q = 2, common practice) plus
 * 10·lg(hours worked / period hours) and +3 dB at a façade (common practice):
 * - "Dig the foundations" at (0, 10), Alder House at (0, 50) with a façade: r ≈ 40 m,
 *   10 h of a 12 h day → 106 − 32.0 − 8.0 − 0.8 + 3 = 68.2 dB over the 65 dB day limit; the
 *   electric excavator (98) gives 60.2 dB and the pinned choice complies.
 * - "Pump the slab" at (20, 10), 3 h of a 4 h evening: to Alder House r ≈ 44.7 m,
 *   107 − 33.0 − 8.0 − 1.2 + 3 = 67.8 dB over the 60 dB evening limit; the silenced pump (98)
 *   gives 58.8 dB; to Birch Court (90, 0) r ≈ 70.7 m, 98 → 51.8 dB under 60 dB.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFile } from 'node:fs/promises';
import type { Locator, Page } from 'playwright-core';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { cell, grid, openTab, typeInto } from './ledger-page.ts';

let browser: BrowserSession;
const OPTIMISER = 'Cheapest compliant (optimiser)';
const PINNED = 'Tarnby T14e excavator, electric';
const SILENCED = 'Hexley P40s line pump, silenced';

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
});

afterAll(async () => {
  await browser?.close();
});

/** Adds a row with the grid's add button and types its name. */
async function addNamed(page: Page, add: string, name: string): Promise<void> {
  await page.getByRole('button', { name: `+ ${add}` }).click();
  await page.keyboard.type(name);
  await page.keyboard.press('Enter');
}

/** Types each value into the row's cells, column by header. */
async function fill(g: Locator, row: string, values: Record<string, string>): Promise<void> {
  for (const [header, text] of Object.entries(values)) {
    await typeInto(await cell(g, row, header), text);
    await expect.poll(async () => (await cell(g, row, header)).innerText()).not.toBe('');
  }
}

describe('a whole tender from an empty project', () => {
  it('a second period is added in the settings', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'New', exact: true }).click();
    await page.getByRole('dialog').getByRole('textbox').fill('Harrowgate Lane tender');
    await page.getByRole('button', { name: 'Create' }).click();
    await expect.poll(() => page.locator('#project-select option:checked').innerText()).toBe('Harrowgate Lane tender');
    await openTab(page, 'Settings');
    const periods = page.getByTestId('periods-editor');
    await periods.getByRole('button', { name: 'Add a period' }).click();
    const second = periods.getByRole('group').nth(1);
    await second.getByLabel('Name').fill('Weekday evening');
    await second.getByLabel('Name').press('Tab');
    await second.getByLabel('From').fill('19:00');
    await second.getByLabel('From').press('Tab');
    await second.getByLabel('To').fill('23:00');
    await second.getByLabel('To').press('Tab');
    await expect
      .poll(() => periods.getByRole('group').nth(1).getAttribute('aria-label'))
      .toBe('Period 2: Weekday evening');
  });

  it('two phases, each in its own period', async () => {
    const { page } = browser;
    await openTab(page, 'Phases');
    const g = grid(page, 'Phases of the works');
    await typeInto(await cell(g, 'Phase 1', 'Phase'), 'Groundworks');
    await addNamed(page, 'Add phase', 'Evening pour');
    await fill(g, 'Evening pour', { 'Own period': 'Weekday evening', 'Work starts': '19:00', 'Work ends': '22:00' });
    expect(await (await cell(g, 'Evening pour', 'Own period')).innerText()).toMatch(/Weekday evening/);
    expect(await (await cell(g, 'Groundworks', 'Own period')).innerText()).toMatch(/Weekday daytime/);
  });

  it('two receivers with a limit in each period, typed into the receivers grid', async () => {
    const { page } = browser;
    await openTab(page, 'Receivers');
    const g = grid(page, 'Receivers');
    await g.click();
    await page.keyboard.type('Alder House');
    await page.keyboard.press('Enter');
    await fill(g, 'Alder House', {
      Kind: 'home',
      X: '0',
      Y: '50',
      Height: '4',
      Façade: 'yes',
      'Limit Weekday daytime': '65',
      'Limit Weekday evening': '60',
    });
    await addNamed(page, 'Add receiver', 'Birch Court');
    await fill(g, 'Birch Court', {
      Kind: 'home',
      X: '90',
      Y: '0',
      Height: '4',
      Façade: 'no',
      'Limit Weekday daytime': '70',
      'Limit Weekday evening': '60',
    });
    expect(await (await cell(g, 'Alder House', 'Limit Weekday evening')).innerText()).toBe('60');
    await screenshot(page, 'whole-tender-receivers');
    expect(await g.innerText()).not.toMatch(/NaN/);
  });

  it('two duties placed on the site grid', async () => {
    const { page } = browser;
    await openTab(page, 'Duties');
    const g = grid(page, 'Duties');
    await typeInto(await cell(g, 'Duty 1', 'Duty'), 'Dig the foundations');
    await fill(g, 'Dig the foundations', { X: '0', Y: '10' });
    await addNamed(page, 'Add duty', 'Pump the slab');
    await fill(g, 'Pump the slab', { Phase: 'Evening pour', 'Days needed': '4', X: '20', Y: '10' });
    expect(await (await cell(g, 'Pump the slab', 'Phase')).innerText()).toBe('Evening pour');
    expect(await (await cell(g, 'Dig the foundations', 'Phase')).innerText()).toBe('Groundworks');
  });

  it('three machines for each duty, typed into the machines grid', async () => {
    const { page } = browser;
    await openTab(page, 'Machines');
    const g = grid(page);
    const machines: [string, string, string, string][] = [
      ['Dig the foundations', 'Tarnby T14 excavator', '106', '380'],
      ['Dig the foundations', PINNED, '98', '560'],
      ['Dig the foundations', 'Corvane C12 excavator', '101', '430'],
      ['Pump the slab', 'Hexley P40 line pump', '107', '600'],
      ['Pump the slab', SILENCED, '98', '820'],
      ['Pump the slab', 'Moray MP3 pump, electric', '96', '990'],
    ];
    for (const [duty, name, lwa, rate] of machines) {
      await addNamed(page, 'Add machine', name);
      await fill(g, name, { Duty: duty, LWA: lwa, 'Day rate': rate });
    }
    await screenshot(page, 'whole-tender-machines');
    // what is still missing names the baselines and leads to them
    const missing = page.getByTestId('missing').first();
    await expect
      .poll(() => missing.innerText())
      .toMatch(/No baseline machine for “Dig the foundations”, “Pump the slab”/);
    await missing.getByRole('button', { name: 'Go to Duties' }).first().click();
    const duties = grid(page, 'Duties');
    await fill(duties, 'Dig the foundations', { 'Baseline machine': 'Tarnby T14 excavator' });
    await fill(duties, 'Pump the slab', { 'Baseline machine': 'Hexley P40 line pump' });
    expect(await (await cell(duties, 'Dig the foundations', 'Baseline machine')).innerText()).toBe(
      'Tarnby T14 excavator',
    );
    expect(await (await cell(duties, 'Pump the slab', 'Baseline machine')).innerText()).toBe('Hexley P40 line pump');
  });

  it('the baseline is over its limits, and nothing is missing any more', async () => {
    const { page } = browser;
    await openTab(page, 'Results');
    const matrix = page.getByTestId('results-matrix');
    await expect.poll(() => matrix.innerText()).toMatch(/over the limit/);
    expect(await page.getByTestId('missing').count()).toBe(0);
    await screenshot(page, 'whole-tender-baseline', { fullPage: true });
  });

  it('a machine pinned in the ranking, the optimiser run, and its fleet used', async () => {
    const { page } = browser;
    const ranking = page.locator('.ranking').first();
    await ranking.getByLabel('Duty').selectOption({ label: 'Dig the foundations' });
    await page.getByRole('button', { name: `Pin ${PINNED}` }).click();
    await expect.poll(() => page.getByRole('button', { name: `Unpin ${PINNED}` }).count()).toBe(1);
    await page.getByRole('button', { name: 'Find the cheapest fleet' }).click();
    await page.getByRole('button', { name: 'Use this fleet' }).click({ timeout: 100_000 });
    await expect.poll(() => page.getByTestId('assessed-fleet').innerText()).toBe(OPTIMISER);
    const matrix = page.getByTestId('results-matrix');
    await expect.poll(() => matrix.innerText()).toContain(`Fleet “${OPTIMISER}”`);
    expect(await matrix.innerText()).toContain('no cell over its limit');
    const statement = await page.getByTestId('compliance-statement').innerText();
    expect(statement).toMatch(
      /every one of the 4 assessed phase and receiver pairs is predicted at or under its limit/,
    );
    expect(statement).toContain(PINNED);
    expect(statement).toContain(SILENCED);
    await screenshot(page, 'whole-tender-fleet-used', { fullPage: true });
  }, 150_000);

  it('the printed report states that fleet and that it complies', async () => {
    const { page } = browser;
    await page.emulateMedia({ media: 'print' });
    await page.evaluate(() => window.dispatchEvent(new Event('beforeprint')));
    try {
      const report = page.locator('.pnl-report');
      await expect.poll(() => report.isVisible()).toBe(true);
      const text = await report.innerText();
      expect(text).toContain(`Compliance statement for fleet “${OPTIMISER}”`);
      expect(text).toMatch(/every one of the 4 assessed phase and receiver pairs is predicted at or under its limit/);
      expect(text).toContain(`Machines of fleet “${OPTIMISER}”`);
      expect(text).toContain(PINNED);
      expect(text).toContain(SILENCED);
      expect(text).not.toMatch(/NaN/);
      await screenshot(page, 'whole-tender-report', { fullPage: true });
    } finally {
      await page.evaluate(() => window.dispatchEvent(new Event('afterprint')));
      await page.emulateMedia({ media: null });
    }
  });

  it('the exported workbook’s compliance sheet states that fleet and that it complies', async () => {
    const { page } = browser;
    const download = page.waitForEvent('download', { timeout: 120_000 });
    await page.getByRole('button', { name: 'Export workbook' }).click();
    const file = await download;
    const path = await file.path();
    const { default: ExcelJS } = await import('exceljs');
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await readFile(path!)) as unknown as ArrayBuffer);
    const sheet = wb.getWorksheet('compliance');
    expect(sheet).toBeDefined();
    const lines: string[] = [];
    sheet!.eachRow((row) => {
      const values = (row.values as unknown[]).map((v) =>
        v && typeof v === 'object' && 'result' in v ? String((v as { result: unknown }).result) : String(v ?? ''),
      );
      lines.push(values.join(' | '));
    });
    const all = lines.join('\n');
    expect(all).toContain(`Compliance statement for fleet “${OPTIMISER}”`);
    expect(all).toMatch(/every one of the 4 assessed phase and receiver pairs is predicted at or under its limit/);
    expect(all).toContain(PINNED);
    expect(all).toContain(SILENCED);
    expect(all).not.toMatch(/over the \d+ dB limit/);
    expect((all.match(/under the \d+ dB limit/g) ?? []).length).toBe(4);
  }, 150_000);
});
