/**
 * A new project built by hand from nothing: the first row of each grid by its add button,
 * by typing into the empty grid and by pasting into it; the list of what is still missing
 * with its links; deleting a phase that duties work in; and a paste into a group that
 * holds fewer rows than the paste, which adds rows to that duty only. Names are invented.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { cell, grid, openTab, pasteText, rowOf } from './ledger-page.ts';

let browser: BrowserSession;

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
});

afterAll(async () => {
  await browser?.close();
});

async function newProject(name: string): Promise<void> {
  const { page } = browser;
  await page.getByRole('button', { name: 'New', exact: true }).click();
  await page.getByRole('dialog').getByRole('textbox').fill(name);
  await page.getByRole('button', { name: 'Create' }).click();
  await expect.poll(() => page.locator('#project-select option:checked').innerText()).toBe(name);
}

describe('a new project from nothing', () => {
  it('pasting into the empty receivers grid creates the first receiver', async () => {
    const { page } = browser;
    await newProject('Larkspur Mews extension');
    await openTab(page, 'Receivers');
    const g = grid(page, 'Receivers');
    await expect.poll(() => g.innerText()).toContain('No rows yet');
    await g.click();
    // Receiver, kind, X, Y, height, façade, limit for the one period (invented)
    await pasteText(page, 'Wren Cottage\thome\t0\t60\t4\tyes\t65\r\n');
    await expect.poll(async () => (await cell(g, 'Wren Cottage', 'Limit Weekday daytime')).innerText()).toBe('65');
    expect(await (await cell(g, 'Wren Cottage', 'Y')).innerText()).toBe('60');
  });

  it('typing into the empty machines grid creates the first machine, in the project’s duty', async () => {
    const { page } = browser;
    await openTab(page, 'Machines');
    const g = grid(page);
    await g.click();
    await page.keyboard.type('Fenwick 8 t excavator');
    await page.keyboard.press('Enter');
    await expect
      .poll(() =>
        g.locator('[role="gridcell"][aria-colindex="1"]').filter({ hasText: 'Fenwick 8 t excavator' }).count(),
      )
      .toBe(1);
    await screenshot(page, 'new-project-first-machine');
    // a new row is plainly incomplete, never "NaN is not a number"
    const day = await cell(g, 'Fenwick 8 t excavator', 'Day rate');
    await expect.poll(() => day.getAttribute('title')).toMatch(/not filled in/);
    expect(await g.innerText()).not.toContain('NaN');
  });

  it('the add button adds the first row of an empty grid and starts editing its name', async () => {
    const { page } = browser;
    await openTab(page, 'Phases');
    await page.getByRole('button', { name: '+ Add phase' }).click();
    await page.keyboard.type('Piling');
    await page.keyboard.press('Enter');
    const g = grid(page, 'Phases of the works');
    await expect
      .poll(() => g.locator('[role="gridcell"][aria-colindex="1"]').allInnerTexts())
      .toEqual(['Phase 1', 'Piling']);
  });

  it('what is still missing is listed with links to where it is filled in', async () => {
    const { page } = browser;
    await openTab(page, 'Machines');
    const missing = page.getByTestId('missing').first();
    await expect.poll(() => missing.innerText()).toMatch(/No LWA for “Fenwick 8 t excavator”/);
    expect(await missing.innerText()).toMatch(/No place for “Duty 1”/);
    await screenshot(page, 'new-project-missing');
    // nothing at a receiver can be worked out yet: no empty matrix beside the grid
    expect(await page.getByTestId('matrix').count()).toBe(0);
    await openTab(page, 'Results');
    const pane = page.getByRole('tabpanel');
    const list = pane.getByTestId('missing');
    await expect.poll(() => list.innerText()).toMatch(/No LWA for “Fenwick 8 t excavator”/);
    expect(await list.innerText()).toContain('No level at a receiver can be predicted yet');
    // only what helps: no matrix, statement, ranking or optimiser with nothing in them
    expect(await pane.locator('table').count()).toBe(0);
    expect(await pane.getByTestId('results-matrix').count()).toBe(0);
    expect(await pane.getByTestId('compliance-statement').count()).toBe(0);
    expect(await pane.getByRole('button', { name: 'Find the cheapest fleet' }).count()).toBe(0);
    await screenshot(page, 'new-project-results-missing', { fullPage: true });
    // a browser print says the same plainly
    const printed = await page.evaluate(() => {
      window.dispatchEvent(new Event('beforeprint'));
      const text = document.querySelector('.pnl-report')?.textContent ?? '';
      const tables = document.querySelectorAll('.pnl-report table').length;
      window.dispatchEvent(new Event('afterprint'));
      return { text, tables };
    });
    expect(printed.text).toContain('Still missing before results can be computed');
    expect(printed.text).toMatch(/No LWA for “Fenwick 8 t excavator”.*\(tab Machines\)/);
    expect(printed.tables).toBe(0);
    await list.getByRole('button', { name: 'Go to Duties' }).first().click();
    await expect
      .poll(() => page.getByRole('tab', { name: 'Duties', exact: true }).getAttribute('aria-selected'))
      .toBe('true');
  });

  it('deleting a phase a duty works in asks, by name, and moves the duty', async () => {
    const { page } = browser;
    await openTab(page, 'Phases');
    const g = grid(page, 'Phases of the works');
    await (await cell(g, 'Phase 1', 'Phase')).click();
    await page.getByRole('button', { name: 'Delete row' }).click();
    const dialog = page.getByRole('dialog');
    await expect
      .poll(() => dialog.getByTestId('delete-references').innerText())
      .toBe('Phase “Phase 1”: the duty “Duty 1” works in it.');
    await screenshot(page, 'delete-referenced-phase');
    await dialog.getByRole('button', { name: 'Move the duties and delete' }).click();
    await expect.poll(() => g.locator('[role="gridcell"][aria-colindex="1"]').allInnerTexts()).toEqual(['Piling']);
    await openTab(page, 'Duties');
    expect(await (await cell(grid(page, 'Duties'), 'Duty 1', 'Phase')).innerText()).toBe('Piling');
  });
});

describe('paste into a group', () => {
  // The demo's first two duties and their machines (invented demo data, src/ledger/model/demo-candidates.ts).
  const LAST_OF_SLAB = 'Kestrune DR9e demolition robot, electric';
  const FIRST_OF_SHELL = 'Valdor V21 excavator with shears';

  it('pasting more rows than a duty holds adds rows to that duty and leaves the next duty alone', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'New demo project' }).click();
    await openTab(page, 'Machines');
    const g = grid(page);
    await rowOf(g, FIRST_OF_SHELL).waitFor();
    const groupCount = (label: string) => g.locator('.group-row', { hasText: label }).locator('.count').innerText();
    const slabBefore = await groupCount('Break out the yard slab');
    const shellBefore = await groupCount('Pull down the warehouse shell');
    await rowOf(g, LAST_OF_SLAB).locator('[role="gridcell"][aria-colindex="1"]').click();
    await pasteText(page, ['Pasted rig 1', 'Pasted rig 2', 'Pasted rig 3'].join('\r\n') + '\r\n');
    // one row overwritten (the last of the slab duty), two added to that duty
    await expect.poll(() => groupCount('Break out the yard slab')).toBe(`${Number.parseInt(slabBefore, 10) + 2} rows`);
    expect(await groupCount('Pull down the warehouse shell')).toBe(shellBefore);
    expect(await rowOf(g, FIRST_OF_SHELL).count()).toBe(1);
    await screenshot(page, 'paste-into-group');
  });
});
