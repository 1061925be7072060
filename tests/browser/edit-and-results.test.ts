/**
 * Editing the machine grid in the real browser: an edit reaches the matrix, a bad value is
 * kept and flagged with results "not computed", and a whole row can be walked and edited
 * with the keyboard alone. Values are the invented demo project's.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { cell, grid, matrixText, typeInto, openTab } from './ledger-page.ts';

let browser: BrowserSession;
// The demo's first duty's baseline machine (invented demo data).
const FIRST_MACHINE = 'Brantor HB20 breaker on 20 t excavator';

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('machine grid editing', () => {
  it('first visit opens the demo project with its machines and the matrix', async () => {
    const { page } = browser;
    await expect.poll(() => page.locator('#project-select option:checked').innerText()).toContain('invented demo');
    expect(await matrixText(page)).toMatch(/dB/);
    await screenshot(page, 'main-grid');
  });

  it('typing a new LWA for a baseline machine changes the matrix', async () => {
    const { page } = browser;
    const g = grid(page);
    const before = await matrixText(page);
    await typeInto(await cell(g, FIRST_MACHINE, 'LWA'), '100');
    await expect.poll(async () => (await cell(g, FIRST_MACHINE, 'LWA')).innerText()).toBe('100');
    await expect.poll(() => matrixText(page)).not.toBe(before);
  });

  it('a bad value is kept as typed, flagged with a message, and its results read "not computed"', async () => {
    const { page } = browser;
    const g = grid(page);
    const lwa = await cell(g, FIRST_MACHINE, 'LWA');
    await typeInto(lwa, '12O');
    await expect.poll(() => lwa.innerText()).toContain('12O');
    await expect.poll(() => lwa.getAttribute('aria-invalid')).toBe('true');
    const message = await lwa.getAttribute('title');
    // named by the machine first, then its row number (a row number alone changes on sorting)
    expect(message).toMatch(
      new RegExp(
        `^"${FIRST_MACHINE}[^"]*" \\(row \\d+\\), LWA: "12O" is not a number \\(use a sound power level in dB from 40 to 150, e\\.g\\. 104\\.5\\)$`,
      ),
    );
    const level = await cell(g, FIRST_MACHINE, 'Level');
    await expect.poll(() => level.innerText()).toBe('not computed');
    expect(await matrixText(page)).toContain('not computed');
    await screenshot(page, 'bad-value-flagged');
  });

  it('the Results tab shows matrix, ranking and cautions', async () => {
    const { page } = browser;
    await openTab(page, 'Results');
    await page.getByTestId('results-matrix').waitFor();
    await expect
      .poll(() =>
        page
          .getByRole('region', { name: /caution/i })
          .or(page.getByLabel('Cautions'))
          .first()
          .innerText(),
      )
      .toMatch(/±3 dB/);
    // The demo has operators with a declared LpA and hours: the exposure panel lists them with its caution.
    const exposure = page.getByTestId('exposure-panel');
    expect(await exposure.innerText()).toMatch(
      /Operator exposure[\s\S]*LEX,8h[\s\S]*workplace noise exposure assessment/,
    );
    await screenshot(page, 'results', { fullPage: true });
    await openTab(page, 'Machines');
  });

  it('keyboard alone walks a row, edits a cell and comes back', async () => {
    const { page } = browser;
    const g = grid(page);
    // Reach the grid with Tab from the top of the page.
    await page.locator('body').focus();
    let onGrid = false;
    for (let i = 0; i < 80 && !onGrid; i++) {
      await page.keyboard.press('Tab');
      onGrid = await page.evaluate(
        () =>
          document.activeElement?.getAttribute('role') === 'grid' &&
          (document.activeElement as HTMLElement).getAttribute('aria-label') === 'Candidate machines by duty',
      );
    }
    expect(onGrid).toBe(true);
    const active = () =>
      page.evaluate(() => {
        const gridEl = document.activeElement as HTMLElement;
        const id = gridEl.getAttribute('aria-activedescendant');
        const c = id ? document.getElementById(id) : null;
        return c
          ? {
              col: Number(c.getAttribute('aria-colindex')),
              text: c.textContent?.trim() ?? '',
              row: c.closest('[role="row"]')?.getAttribute('aria-rowindex'),
            }
          : null;
      });
    // Move to the first cell, down into a machine row, and to its first column.
    await page.keyboard.press('Control+Home');
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('Home');
    for (let i = 0; i < 5 && (await active())?.col !== 1; i++) await page.keyboard.press('ArrowDown');
    const start = await active();
    expect(start?.col).toBe(1);
    const visited: number[] = [];
    for (let i = 0; i < 5; i++) {
      await page.keyboard.press('Tab');
      const now = await active();
      expect(now?.row).toBe(start?.row);
      visited.push(now!.col);
    }
    expect(visited).toEqual([2, 3, 4, 5, 6]);
    // Back to the day rate (column 3) with Shift+Tab, then edit it with Enter, type, Enter.
    for (let i = 0; i < 3; i++) await page.keyboard.press('Shift+Tab');
    expect((await active())?.col).toBe(3);
    await page.keyboard.press('Enter');
    await page.keyboard.press('Control+A');
    await page.keyboard.type('455');
    await page.keyboard.press('Enter');
    const dayRate = g.locator(`[role="row"][aria-rowindex="${start?.row}"] [role="gridcell"][aria-colindex="3"]`);
    await expect.poll(() => dayRate.innerText()).toBe('455');
    // Escape cancels an edit: the value stays.
    await dayRate.click();
    await page.keyboard.type('999');
    await page.keyboard.press('Escape');
    await expect.poll(() => dayRate.innerText()).toBe('455');
    await screenshot(page, 'keyboard-walk');
  });
});
