/**
 * The fleet buyer from an empty register typed by hand: three excavators added to the
 * register (one typed, two pasted), compared without a site (whole-life cost, directive
 * margin, footprint, against the loudest), one copied into a duty of the open project, and
 * the register kept across a reload. Machines and figures are invented.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFile } from 'node:fs/promises';
import ExcelJS from 'exceljs';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { cell, grid, openTab, pasteText, typeInto } from './ledger-page.ts';

let browser: BrowserSession;
const REGISTER_GRID = 'Machine register';

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
});

afterAll(async () => {
  await browser?.close();
});

const comparisonRow = (name: string) =>
  browser.page
    .getByRole('region', { name: 'Compare machines (no site needed)' })
    .getByRole('row')
    .filter({ hasText: name });

describe('the machine register from nothing', () => {
  it('typing the first machine into the empty register grid, then pasting two more', async () => {
    const { page } = browser;
    await openTab(page, 'Machine register');
    const g = grid(page, REGISTER_GRID);
    await expect.poll(() => g.innerText()).toContain('No rows yet');
    await g.click();
    await page.keyboard.type('Hollin EX-20');
    await page.keyboard.press('Enter');
    await expect
      .poll(() => g.locator('[role="gridcell"][aria-colindex="1"]').allInnerTexts())
      .toEqual(['Hollin EX-20']);
    await typeInto(await cell(g, 'Hollin EX-20', 'Directive type'), 'excavator');
    await typeInto(await cell(g, 'Hollin EX-20', 'LWA'), '103');
    await typeInto(await cell(g, 'Hollin EX-20', 'Net power'), '110');
    await typeInto(await cell(g, 'Hollin EX-20', 'Price'), '170000');
    // purchase terms begun: what is not typed yet is flagged, never filled in
    await expect
      .poll(async () => (await cell(g, 'Hollin EX-20', 'Resale value')).getAttribute('title'))
      .toMatch(/resale value/i);
    await typeInto(await cell(g, 'Hollin EX-20', 'Resale value'), '60000');
    await typeInto(await cell(g, 'Hollin EX-20', 'Life'), '8');
    await typeInto(await cell(g, 'Hollin EX-20', 'Running per day'), '90');
    await typeInto(await cell(g, 'Hollin EX-20', 'Operator LpA'), '78');
    // a typing slip is kept as typed and marked
    await typeInto(await cell(g, 'Hollin EX-20', 'K'), '2,5');
    const k = await cell(g, 'Hollin EX-20', 'K');
    await expect.poll(() => k.innerText()).toContain('2,5');
    await expect.poll(() => k.getAttribute('aria-invalid')).toBe('true');
    expect(await k.getAttribute('title')).toMatch(
      /^"Hollin EX-20" \(row 1\), K: "2,5" is not a number with a decimal point/,
    );
    await page.keyboard.press('Control+Z');
    await expect.poll(() => k.innerText()).not.toContain('2,5');

    // two more, pasted below the first from a spreadsheet: Machine … Directive type, LWA (columns 1–4)
    await page.getByRole('button', { name: '+ Add machine' }).click();
    await page.keyboard.press('Escape');
    await pasteText(
      page,
      'Pellow Q20 quiet\texcavator 20 t\texcavator\t100\r\nGarrick 200\texcavator 20 t\texcavator\t101\r\n',
    );
    await expect
      .poll(() => g.locator('[role="gridcell"][aria-colindex="1"]').allInnerTexts())
      .toEqual(['Hollin EX-20', 'Pellow Q20 quiet', 'Garrick 200']);
    // and their other figures pasted as a block starting at Net power
    await (await cell(g, 'Pellow Q20 quiet', 'Net power')).click();
    await pasteText(page, '110\t\t182000\t65000\t8\tyears\t88\r\n110\t\t160000\t50000\t8\tyears\t96\r\n');
    await typeInto(await cell(g, 'Pellow Q20 quiet', 'Operator LpA'), '74');
    await expect.poll(async () => (await cell(g, 'Garrick 200', 'Running per day')).innerText()).toBe('96');
    await screenshot(page, 'register-grid');
  });

  it('compares them without a site: whole-life cost, margin, footprint, against the loudest', async () => {
    const { page } = browser;
    await page.getByRole('combobox', { name: 'Machines compared' }).selectOption('excavator');
    // Whole-life cost a year at 200 working days, worked by hand: (price − resale) / 8 years + running × 200
    //   Hollin (170,000 − 60,000)/8 + 90 × 200 = 31,750; Pellow (182,000 − 65,000)/8 + 88 × 200 = 32,225;
    //   Garrick (160,000 − 50,000)/8 + 96 × 200 = 32,950.
    await expect.poll(() => comparisonRow('Hollin EX-20').innerText()).toContain('£31,750');
    expect(await comparisonRow('Pellow Q20 quiet').innerText()).toContain('£32,225');
    expect(await comparisonRow('Garrick 200').innerText()).toContain('£32,950');
    // Footprint at 65 dB, 100 % on-time, Q = 2: A = 2 · 10^((LWA − 65)/10) / 4 (worked by hand from Lp = Lw + 10 lg(Q/4πr²)):
    //   103 dB → 3,155 m²; 100 dB → 1,581 m² (3 dB less: half); 101 dB → 1,991 m².
    expect(await comparisonRow('Hollin EX-20').innerText()).toContain('3,155 m²');
    expect(await comparisonRow('Pellow Q20 quiet').innerText()).toContain('1,581 m²');
    expect(await comparisonRow('Garrick 200').innerText()).toContain('1,991 m²');
    // Directive 2000/14/EC Art. 12 Stage II, excavator P = 110 kW: 80 + 11 lg 110 = 102.46 → 102 dB (worked by hand);
    // Hollin 103 is 1 dB over (−1.0), Pellow 2.0 under.
    expect(await comparisonRow('Hollin EX-20').innerText()).toMatch(/−1\.0/);
    expect(await comparisonRow('Pellow Q20 quiet').innerText()).toMatch(/\b2\.0\b/);
    // Against the loudest (Hollin): Pellow 3 dB for £475 a year more → 3 / 0.475 = 6.32 dB per 1,000 (worked by hand)
    expect(await comparisonRow('Hollin EX-20').innerText()).toContain('reference');
    expect(await comparisonRow('Pellow Q20 quiet').innerText()).toContain('6.32 dB');
    // Garrick is dearer and louder than Pellow: not marked; Hollin (cheapest) and Pellow (quietest) are
    expect(await comparisonRow('Hollin EX-20').innerText()).toContain('none beats it');
    expect(await comparisonRow('Pellow Q20 quiet').innerText()).toContain('none beats it');
    expect(await comparisonRow('Garrick 200').innerText()).not.toContain('none beats it');
    await page.getByRole('img', { name: /Whole-life cost a year against LWA/ }).waitFor();
    // any selection: the two ticked, compared on their own (the louder, Garrick, is then the reference)
    await comparisonRow('Pellow Q20 quiet').getByRole('checkbox').check();
    await comparisonRow('Garrick 200').getByRole('checkbox').check();
    await page.getByRole('combobox', { name: 'Machines compared' }).selectOption('the machines ticked');
    await expect
      .poll(() => page.getByRole('region', { name: 'Compare machines (no site needed)' }).locator('tbody tr').count())
      .toBe(2);
    expect(await comparisonRow('Garrick 200').innerText()).toContain('reference');
    await comparisonRow('Pellow Q20 quiet').getByRole('checkbox').uncheck();
    await comparisonRow('Garrick 200').getByRole('checkbox').uncheck();
    await page.getByRole('combobox', { name: 'Machines compared' }).selectOption('excavator');
    // a criterion that cannot be read is kept and explained
    await page.getByLabel(/^Footprint criterion, dB L/).fill('6S');
    await expect
      .poll(() => page.getByRole('alert').filter({ hasText: 'Criterion' }).innerText())
      .toContain('"6S" is not a number');
    await page.getByLabel(/^Footprint criterion, dB L/).fill('65');
    await screenshot(page, 'register-comparison', { fullPage: true });
  });

  it('copies a machine into a duty of the project; the register stays after a reload', async () => {
    const { page } = browser;
    await comparisonRow('Pellow Q20 quiet').getByRole('checkbox').check();
    await page.getByRole('button', { name: 'Add to the duty as candidates' }).click();
    await expect
      .poll(() => page.getByRole('status').filter({ hasText: 'copied to' }).innerText())
      .toMatch(/1 machine copied to/);
    await openTab(page, 'Machines');
    const machines = grid(page);
    await expect.poll(async () => (await cell(machines, 'Pellow Q20 quiet', 'LWA')).innerText()).toBe('100');
    await page.reload();
    await openTab(page, 'Machine register');
    await expect
      .poll(() => grid(page, REGISTER_GRID).locator('[role="gridcell"][aria-colindex="1"]').allInnerTexts())
      .toEqual(['Hollin EX-20', 'Pellow Q20 quiet', 'Garrick 200']);
  });

  it('a change in the register shows on the project’s copy and reaches it only on request', async () => {
    const { page } = browser;
    const g = grid(page, REGISTER_GRID);
    await typeInto(await cell(g, 'Pellow Q20 quiet', 'LWA'), '99');
    await openTab(page, 'Machines');
    const links = page.getByRole('region', { name: 'Copies from the machine register' });
    await expect.poll(() => links.innerText()).toContain('1 copy differs from the machine register');
    expect(await links.innerText()).toContain('LWA, dB: 100 here, 99 in the register');
    const machines = grid(page);
    // the copy is the project's own: still 100 until the user asks
    expect(await (await cell(machines, 'Pellow Q20 quiet', 'LWA')).innerText()).toBe('100');
    await screenshot(page, 'register-copy-differs');
    await links.getByRole('checkbox').check();
    await links.getByRole('button', { name: 'Update the ticked copies from the register' }).click();
    await expect.poll(async () => (await cell(machines, 'Pellow Q20 quiet', 'LWA')).innerText()).toBe('99');
    await expect.poll(() => links.innerText()).toContain('1 machine copied from the register, all as in the register.');
  });

  it('exports the register workbook with the buyer’s shortlist and reads it back, adding its machines under free ids', async () => {
    const { page } = browser;
    await openTab(page, 'Machine register');
    await page.getByRole('combobox', { name: 'Machines compared' }).selectOption('excavator');
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export register workbook' }).click(),
    ]);
    const path = (await download.path())!;
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await readFile(path)) as unknown as ArrayBuffer);
    expect(wb.worksheets.map((w) => w.name)).toEqual(['register', 'buyer shortlist', 'fleet']);
    const shortlist = wb.getWorksheet('buyer shortlist')!;
    const header = shortlist.getRow(6).values as unknown[];
    const owned = [7, 8, 9].map((r) => shortlist.getRow(r).getCell(header.indexOf('Owned per year')).value);
    // worked by hand above: 31,750, 32,225 and 32,950 a year
    expect(owned).toEqual([31750, 32225, 32950]);
    await page.locator('input[type="file"][accept*=".xlsx"]').setInputFiles({
      name: 'register.xlsx',
      mimeType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
      buffer: await readFile(path),
    });
    const g = grid(page, REGISTER_GRID);
    await expect.poll(() => g.locator('[role="gridcell"][aria-colindex="1"]').count()).toBe(6);
    await expect
      .poll(() =>
        page.getByText(/3 machines from "register.xlsx" added to the register \(m1 → m4, m2 → m5, m3 → m6/).count(),
      )
      .toBe(1);
  });

  it('imports a supplier list into the register through the same importer, with no duty asked for', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Import supplier list' }).last().click();
    const dialog = page.getByRole('dialog');
    // invented supplier list; one LWA mistyped ("1O4") is kept as typed
    const csv =
      'Model,LWA dB,Price,Resale,Life days,Running per day\nTamsin C30 compressor,97,21000,6000,1600,30\nTamsin C30S compressor,1O4,23500,7000,1600,30\n';
    await dialog
      .locator('input[type="file"]')
      .setInputFiles({ name: 'tamsin.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await expect.poll(() => dialog.getByRole('button', { name: /^Add 2 machines to the register$/ }).count()).toBe(1);
    expect(await dialog.getByRole('combobox', { name: 'Duty' }).count()).toBe(0);
    await screenshot(page, 'register-import-preview');
    await dialog.getByRole('button', { name: 'Add 2 machines to the register' }).click();
    const g = grid(page, REGISTER_GRID);
    await expect.poll(() => g.locator('[role="gridcell"][aria-colindex="1"]').count()).toBe(8);
    const lwa = await cell(g, 'Tamsin C30S compressor', 'LWA');
    expect(await lwa.innerText()).toContain('1O4');
    expect(await lwa.getAttribute('aria-invalid')).toBe('true');
    // a life kept in working days: 1,600 days at 200 a year is 8 years, (21,000 − 6,000) / 8 + 30 × 200 = 7,875 a year (worked by hand)
    await page.getByRole('combobox', { name: 'Machines compared' }).selectOption('every machine');
    await expect.poll(() => comparisonRow('Tamsin C30 compressor').innerText()).toContain('£7,875');
  });
});
