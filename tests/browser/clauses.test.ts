/**
 * Tender clauses from an empty project typed by hand: a receiver, a phase, a duty and two
 * machines, then three clauses pasted into the empty clauses grid (a limit at the receiver,
 * a cap on each machine's LWA, a statement). The answer shows the cap failing for the loud
 * baseline machine with the quieter one as the fix; one click finds and assesses the
 * cheapest fleet meeting every clause; the printed report carries the clause-by-clause table;
 * the workbook (opened with exceljs) and `ledger evaluate` on the exported file describe that fleet.
 * Names are invented.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { ROOT, ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { cell, grid, openTab, pasteText, typeInto } from './ledger-page.ts';

let browser: BrowserSession;

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('tender clauses from an empty project', () => {
  it('a project typed by hand: receiver, phase, duty, two machines', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'New', exact: true }).click();
    await page.getByRole('dialog').getByRole('textbox').fill('Thornbury Lane culvert');
    await page.getByRole('button', { name: 'Create' }).click();
    await expect.poll(() => page.locator('#project-select option:checked').innerText()).toBe('Thornbury Lane culvert');

    await openTab(page, 'Receivers');
    const receivers = grid(page, 'Receivers');
    await receivers.click();
    await pasteText(page, 'Wren Cottage\thome\t0\t0\t1.5\tno\t70\r\n');
    await expect.poll(async () => (await cell(receivers, 'Wren Cottage', 'X')).innerText()).toBe('0');

    // A new project starts with one phase and one duty to fill in.
    await openTab(page, 'Phases');
    await typeInto(await cell(grid(page, 'Phases of the works'), 'Phase 1', 'Phase'), 'Culvert works');

    await openTab(page, 'Duties');
    const duties = grid(page, 'Duties');
    await typeInto(await cell(duties, 'Duty 1', 'Duty'), 'Breaking out');
    await typeInto(await cell(duties, 'Breaking out', 'Days needed'), '10');
    await typeInto(await cell(duties, 'Breaking out', 'X'), '50');
    await typeInto(await cell(duties, 'Breaking out', 'Y'), '0');

    await openTab(page, 'Machines');
    const machines = grid(page);
    await machines.click();
    await pasteText(page, 'Breaker loud\t110\t100\r\nBreaker quiet\t104\t140\r\n');
    await expect.poll(async () => (await cell(machines, 'Breaker quiet', 'LWA')).innerText()).toBe('104');
    await openTab(page, 'Duties');
    await typeInto(await cell(duties, 'Breaking out', 'Baseline machine'), 'Breaker loud');
    await expect
      .poll(async () => (await cell(duties, 'Breaking out', 'Baseline machine')).innerText())
      .toBe('Breaker loud');
    await screenshot(page, 'clauses-duties', { fullPage: true });
  });

  it('three clauses pasted into the empty clauses grid are answered: the cap fails with its fix, the statement is stated', async () => {
    const { page } = browser;
    await openTab(page, 'Clauses');
    const clauses = grid(page, 'Tender noise clauses');
    await expect.poll(() => clauses.innerText()).toContain('No rows yet');
    await clauses.click();
    await pasteText(
      page,
      [
        '4.2\tNoise at Wren Cottage shall not exceed 70 dB LAeq,T over the working day.\tLimit\tWeekday daytime\t70',
        '5.1\tNo item of plant shall have a sound power level above 105 dB LWA.\tLWA cap',
        '9.1\tThe contractor shall monitor noise weekly and report to the engineer.\tStatement',
      ].join('\r\n') + '\r\n',
    );
    await typeInto(await cell(clauses, '5.1', 'Cap'), '105');
    await typeInto(
      await cell(clauses, '9.1', 'Contractor’s statement'),
      'Weekly attended monitoring at Wren Cottage, results sent each Friday.',
    );
    const answer = page.locator('.clause-answer');
    // Breaker loud (the duty's baseline, the first machine) has LWA 110 > 105: the cap fails; the statement is stated.
    await expect.poll(() => answer.locator('tr', { hasText: '5.1' }).locator('.status').innerText()).toBe('Fail');
    expect(await answer.locator('tr', { hasText: '9.1' }).locator('.status').innerText()).toBe('Stated');
    expect(await answer.locator('tr', { hasText: '5.1' }).innerText()).toMatch(
      /To pass: Use Breaker quiet instead of Breaker loud for Breaking out/,
    );
    await screenshot(page, 'clauses-answer-baseline', { fullPage: true });
  });

  it('a typo in a clause’s receivers is kept as typed and marked; the clause is not assessed until it is corrected', async () => {
    const { page } = browser;
    const clauses = grid(page, 'Tender noise clauses');
    const receiversCell = await cell(clauses, '4.2', 'Receivers');
    await typeInto(receiversCell, 'Wren Cotage');
    await expect
      .poll(() => receiversCell.getAttribute('title'))
      .toMatch(/"Wren Cotage" is not a receiver of this project/);
    expect(await receiversCell.innerText()).toContain('Wren Cotage');
    await screenshot(page, 'clauses-typo', { fullPage: true });
    const answer = page.locator('.clause-answer');
    await expect
      .poll(() => answer.locator('tr', { hasText: '4.2' }).locator('.status').innerText())
      .toBe('Not assessed');
    await typeInto(receiversCell, 'Wren Cottage');
    await screenshot(page, 'clauses-typo-corrected', { fullPage: true });
    await expect
      .poll(() => answer.locator('tr', { hasText: '4.2' }).locator('.status').innerText())
      .not.toBe('Not assessed');
  });

  it('one click finds and assesses the cheapest fleet that meets every clause', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Find and assess the cheapest fleet that meets every clause' }).click();
    const counts = page.getByTestId('clause-counts');
    await expect
      .poll(() => counts.innerText(), { timeout: 100_000 })
      .toMatch(/0 fail, 1 stated, 0 not assessed\. Every clause is met or answered\./);
    expect(await page.locator('.clause-answer tr', { hasText: '5.1' }).locator('.status').innerText()).toBe('Pass');
    await screenshot(page, 'clauses-answer-cheapest', { fullPage: true });
  }, 120_000);

  it('the printed report carries the clause-by-clause answer', async () => {
    const { page } = browser;
    await openTab(page, 'Results');
    await page.emulateMedia({ media: 'print' });
    await page.evaluate(() => window.dispatchEvent(new Event('beforeprint')));
    try {
      const section = page.locator('.pnl-report section.clauses');
      await section.waitFor();
      const text = await section.innerText();
      expect(text).toContain('Answer to the tender’s noise clauses, clause by clause');
      expect(text).toMatch(/5\.1[\s\S]*cap on each machine’s LWA[\s\S]*Pass/);
      expect(text).toMatch(/9\.1[\s\S]*Stated[\s\S]*Weekly attended monitoring/);
      await screenshot(page, 'clauses-report', { selector: '.pnl-report section.clauses' });
    } finally {
      await page.evaluate(() => window.dispatchEvent(new Event('afterprint')));
      await page.emulateMedia({ media: 'screen' });
    }
  });

  it('the assessed fleet reaches the workbook (opened with exceljs) and the command line (ledger evaluate on the exported file)', async () => {
    const { page } = browser;
    const fleet = await page.getByTestId('assessed-fleet').innerText();
    const [book] = await Promise.all([
      page.waitForEvent('download', { timeout: 120_000 }),
      page.getByRole('button', { name: 'Export workbook' }).click(),
    ]);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile((await book.path())!);
    const compliance = wb.getWorksheet('compliance');
    const texts: string[] = [];
    compliance?.eachRow((row) => row.eachCell((c) => texts.push(String(c.text))));
    expect(texts.join('\n')).toContain(fleet);
    expect(texts.join('\n')).toContain('Wren Cottage');

    const [file] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export project file' }).click(),
    ]);
    const run = spawnSync('node', [join(ROOT, 'src/cli/bin.mjs'), 'evaluate', (await file.path())!], {
      encoding: 'utf8',
      cwd: ROOT,
    });
    // the command line assesses the same stored fleet the app assessed, by its name
    expect(run.stdout).toContain(fleet);
    expect(run.stdout).toContain('Wren Cottage');
  }, 180_000);
});
