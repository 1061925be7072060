/**
 * What a reviewer checks, in the real browser on the invented demo project: the stand-in
 * level of the dumper without noise data and the over-permissible excavator in the machine
 * grid, the ranking's firmness and the operator exposure panel in the Results tab, and the
 * screening editor in the Receivers tab. Expected levels carry their source.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { cell, grid, openTab } from './ledger-page.ts';

let browser: BrowserSession;
// Invented demo machines.
const STAND_IN = 'Hedgeby 6 t site dumper';
const OVER_PERMISSIBLE = 'Valdor V21 excavator with shears';

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
});

afterAll(async () => {
  await browser?.close();
});

async function filterGrid(text: string): Promise<void> {
  const { page } = browser;
  const filter = page.getByPlaceholder('Filter rows…').first();
  await filter.fill(text);
  await page.waitForTimeout(200);
}

describe('directive checks, exposure and screening', () => {
  it('the machine grid marks the stand-in level and the machine over its permissible level', async () => {
    const { page } = browser;
    const g = grid(page);
    await filterGrid('Hedgeby');
    const rated = await cell(g, STAND_IN, 'LWA used');
    // Directive 2000/14/EC Art. 12 item 3 (dumpers), Stage II, P ≤ 55 kW: 101 dB stands in.
    await expect.poll(() => rated.innerText()).toContain('101.0 (stand-in)');
    expect(await rated.getAttribute('title')).toMatch(/^Stand-in: no declared LWA/);
    expect(await (await cell(g, STAND_IN, 'Flags')).innerText()).toContain('stand-in LWA');
    await rated.scrollIntoViewIfNeeded();
    await screenshot(page, 'grid-stand-in');

    await filterGrid('Valdor V21 excavator with');
    const permissible = await cell(g, OVER_PERMISSIBLE, 'Permissible LWA');
    // Directive 2000/14/EC Art. 12 item 4, Stage II: 80 + 11·lg 120 = 102.87 → 103 dB; declared 105 dB is over it.
    await expect.poll(() => permissible.innerText()).toContain('103 (over)');
    expect(await (await cell(g, OVER_PERMISSIBLE, 'Flags')).innerText()).toContain('over permissible');
    await filterGrid('');
  });

  it('the Results tab shows the stand-in flag in the ranking and the operator exposure panel with its caution', async () => {
    const { page } = browser;
    await openTab(page, 'Results');
    await page.getByTestId('results-matrix').waitFor();
    await page.getByRole('combobox', { name: /^Duty/ }).first().selectOption({ label: 'Move spoil across the site' });
    const ranking = page.getByRole('region', { name: /^Ranking: Move spoil across the site/ });
    await expect
      .poll(() => ranking.getByRole('row', { name: new RegExp(STAND_IN) }).innerText())
      .toContain('stand-in LWA');
    const panel = page.getByTestId('exposure-panel');
    await panel.scrollIntoViewIfNeeded();
    const text = await panel.innerText();
    expect(text).toContain('Tansk TS350 petrol cut-off saw');
    // ISO 9612: 103 + 10·lg(2/8) = 97.0 dB(A), over the 87 dB(A) limit value (Directive 2003/10/EC Art. 3).
    expect(text).toContain('97.0 dB(A)');
    expect(text).toMatch(/limit value \(87 dB\(A\)\) reached/);
    expect(text).toContain('do not replace a workplace noise exposure assessment');
    await screenshot(page, 'results-exposure', { selector: '[data-testid="exposure-panel"]' });
    await screenshot(page, 'results-checks', { fullPage: true });
  });

  it('the screening editor hides a duty from a receiver and the matrix follows', async () => {
    const { page } = browser;
    await openTab(page, 'Results');
    const matrix = page.getByTestId('results-matrix');
    const before = await matrix.innerText();
    await openTab(page, 'Receivers');
    const editor = page.getByTestId('screening-editor');
    await editor.waitFor();
    const select = editor.getByRole('combobox', { name: 'Screening of 2 Lantern Row from Break out the yard slab' });
    await select.selectOption('hidden');
    await expect.poll(() => select.inputValue()).toBe('hidden');
    const other = editor.getByRole('combobox', {
      name: 'Screening of Saltmarsh Lane Primary School from Break out the yard slab',
    });
    await other.selectOption('explicit');
    const amount = editor.getByRole('textbox', {
      name: 'Reduction in dB, Saltmarsh Lane Primary School from Break out the yard slab',
    });
    await amount.fill('7,5x');
    await amount.press('Enter');
    await expect.poll(() => editor.getByText(/"7,5x dB" is not a reduction in dB/).count()).toBe(1);
    await screenshot(page, 'receivers-screening', { fullPage: true });
    await amount.fill('7.5');
    await amount.press('Enter');
    await expect.poll(() => editor.getByText(/is not a reduction in dB/).count()).toBe(0);
    await openTab(page, 'Results');
    await expect.poll(() => page.getByTestId('results-matrix').innerText()).not.toBe(before);
  });

  it('Settings edits a period’s hours as typed text and keeps a bad time with its message', async () => {
    const { page } = browser;
    await openTab(page, 'Settings');
    const editor = page.getByTestId('periods-editor');
    const to = editor.getByRole('textbox', { name: 'To' });
    await to.fill('7pm');
    await to.press('Tab');
    await expect.poll(() => editor.getByText(/"7pm" is not a time/).count()).toBe(1);
    expect(await to.inputValue()).toBe('7pm');
    await screenshot(page, 'settings-periods');
    await to.fill('19:00');
    await to.press('Tab');
    await expect.poll(() => editor.getByText(/is not a time/).count()).toBe(0);
  });
});
