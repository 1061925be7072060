/**
 * Hostile files in the real browser: project files and supplier lists built to break the
 * app (a body nested 100,000 levels deep, numbers past any range, ids that are names of
 * JavaScript's own properties, control characters, formula-looking names, a zip bomb), and
 * a stored project that cannot be opened. Each gets a message saying what is wrong; the
 * app stays usable; an edit typed before is never lost. Names are invented.
 */
import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { ensureApp, openBrowser, screenshot, waitForGrid, type BrowserSession } from './harness.ts';
import { cell, grid, rowOf, typeInto, waitSaved } from './ledger-page.ts';
import { storeProject } from './seed.ts';
import { demoProject } from '../../src/ledger/model/demo.ts';
import { serializeProject } from '../../src/ledger/file/project-file.ts';
import type { Project } from '../../src/ledger/model/model.ts';
import { makeZip, workbookShell, zerosDeflated } from '../unit/io/import/zip-fixtures.ts';

let browser: BrowserSession;
// A machine of the invented demo project.
const SECOND = 'Brantor HB20 with muffled housing';
const FORMULA = '=HYPERLINK("http://example.invalid/x","Click me")';

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
  browser.page.on('pageerror', (e) => console.log('page error', e.message));
});

afterAll(async () => {
  await browser?.close();
});

const projectName = () => browser.page.locator('#project-select option:checked').innerText();

async function importProjectText(text: string, name: string): Promise<void> {
  await browser.page
    .locator('input[type="file"][accept=".json,application/json"]')
    .setInputFiles({ name, mimeType: 'application/json', buffer: Buffer.from(text) });
}

/** A typed edit that must survive every refused file. */
async function typedEditKept(): Promise<void> {
  const { page } = browser;
  expect(await (await cell(grid(page), SECOND, 'LWA')).innerText()).toBe('103.5');
}

describe('hostile project files', () => {
  it('a file nested 100,000 levels deep is refused in words; the open project and its edit stay', async () => {
    const { page } = browser;
    await typeInto(await cell(grid(page), SECOND, 'LWA'), '103.5');
    await waitSaved(page);
    const before = await projectName();
    await importProjectText('['.repeat(100_000) + ']'.repeat(100_000), 'deep.ledger.json');
    const alert = page.getByRole('alert').filter({ hasText: 'The project file was not opened' });
    await alert.waitFor();
    expect(await alert.innerText()).toMatch(/nested more than 1000 levels deep; a project file nests at most 64/);
    expect(await alert.innerText()).not.toMatch(/call stack/i);
    expect(await projectName()).toBe(before);
    await typedEditKept();
    await page.getByRole('button', { name: 'Dismiss this message' }).first().click();
  });

  it('a file with rows sharing an id and octave bands as an object is refused with every problem listed', async () => {
    const { page } = browser;
    const file = JSON.parse(serializeProject(demoProject())) as Record<string, unknown[]>;
    const candidates = file.candidates as Record<string, unknown>[];
    candidates[1]!.id = candidates[0]!.id;
    candidates[2]!.bandsDb = { '63': 90 };
    await importProjectText(JSON.stringify(file), 'twice.ledger.json');
    const alert = page.getByRole('alert').filter({ hasText: 'The project file was not opened' });
    await alert.waitFor();
    const text = await alert.innerText();
    expect(text).toContain('candidates[1].id');
    expect(text).toContain('is used twice, also by candidates[0]');
    expect(text).toContain('candidates[2].bandsDb: ');
    await typedEditKept();
    await page.getByRole('button', { name: 'Dismiss this message' }).first().click();
  });

  it('huge numbers, ids named like JavaScript’s own properties and control characters open with each problem at its cell', async () => {
    const { page } = browser;
    const project: Project = demoProject();
    const [a, b, c] = project.candidates;
    project.name = 'Hostile values';
    project.candidates = [
      { ...a!, label: FORMULA },
      { ...b!, lwaDb: 1e308 },
      { ...c!, label: 'Valdor\u0007 crusher\u001b[31m red' },
      { ...a!, id: '__proto__', label: 'Proto breaker' },
      { ...a!, id: 'constructor', label: 'Constructor breaker' },
      { ...a!, id: 'toString', label: 'ToString breaker', lwaDb: 1e-300 },
      ...project.candidates.slice(3),
    ];
    await importProjectText(serializeProject(project), 'hostile.ledger.json');
    await expect.poll(projectName).toBe('Hostile values');
    const g = grid(page);
    await waitForGrid(page);
    // A number past the range is kept as it is and marked, never changed or clipped.
    const huge = await cell(g, SECOND, 'LWA');
    expect(await huge.getAttribute('aria-invalid')).toBe('true');
    expect(await huge.getAttribute('title')).toMatch(/out of range|from \d+ to \d+/);
    // "__proto__" is kept for the program; "constructor" and "toString" are ordinary ids.
    const proto = rowOf(g, 'Proto breaker').locator('[role="gridcell"][aria-colindex="1"]');
    expect(await proto.getAttribute('aria-invalid')).toBe('true');
    expect(await proto.getAttribute('title')).toContain('is a name the program keeps for itself');
    expect(await rowOf(g, 'Constructor breaker').count()).toBe(1);
    expect(await (await cell(g, 'ToString breaker', 'LWA')).getAttribute('aria-invalid')).toBe('true');
    // Control characters stay in the label (the text is the user's), and the page still works.
    expect(await rowOf(g, 'Valdor').locator('[role="gridcell"][aria-colindex="1"]').innerText()).toContain('crusher');
    expect(await rowOf(g, 'Click me').count()).toBe(1);
    await screenshot(page, 'hostile-values');
    // The stored copy keeps every value after a reload.
    await waitSaved(page);
    await page.reload();
    await waitForGrid(page);
    expect(await projectName()).toBe('Hostile values');
    expect(await (await cell(grid(page), SECOND, 'LWA')).getAttribute('aria-invalid')).toBe('true');
    expect(await rowOf(grid(page), 'Proto breaker').count()).toBe(1);
  });

  it('a formula-looking machine name reaches the workbook as text, never as a formula', async () => {
    const { page } = browser;
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export workbook' }).click(),
    ]);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await readFile((await download.path())!)) as unknown as ArrayBuffer);
    const hits: { sheet: string; type: ExcelJS.ValueType; value: unknown }[] = [];
    wb.eachSheet((ws) =>
      ws.eachRow((row) =>
        row.eachCell((c) => {
          // A merged cell repeats its first cell's value: the first cell is checked.
          if (c.type !== ExcelJS.ValueType.Merge && String(c.value).includes('HYPERLINK'))
            hits.push({ sheet: ws.name, type: c.type, value: c.value });
        }),
      ),
    );
    expect(hits.length).toBeGreaterThan(0);
    for (const hit of hits) {
      expect(hit.type).toBe(ExcelJS.ValueType.String);
      expect(typeof hit.value).toBe('string');
    }
    expect(hits.some((h) => h.value === FORMULA)).toBe(true);
  });
});

describe('hostile supplier lists', () => {
  it('a zip bomb is refused from its table of contents, with the limit in words; the project is untouched', async () => {
    const { page } = browser;
    await page.locator('#project-select').selectOption({ label: demoProject().name });
    await waitForGrid(page);
    await typedEditKept();
    await page.getByRole('button', { name: 'Import supplier list' }).first().click();
    const dialog = page.getByRole('dialog');
    // 1 GB of zero bytes, compressed to about 1 MB.
    const bomb = makeZip(
      workbookShell([
        {
          name: 'xl/worksheets/sheet1.xml',
          raw: { compressed: zerosDeflated(1024), uncompressedSize: 1024 * 1024 * 1024 },
        },
      ]),
    );
    await dialog.locator('input[type="file"]').setInputFiles({
      name: 'bomb.xlsx',
      mimeType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
      buffer: Buffer.from(bomb),
    });
    await expect
      .poll(() => dialog.innerText(), { timeout: 20_000 })
      .toMatch(
        /"bomb\.xlsx" would expand to 1\.0 GB when opened; workbooks that expand to at most 200 MB are accepted/,
      );
    await screenshot(page, 'hostile-zip-bomb');
    await page.keyboard.press('Escape');
    await typedEditKept();
  });

  it('a list with control characters, formula-looking names and numbers past any range keeps each as typed and marks it', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Import supplier list' }).first().click();
    const dialog = page.getByRole('dialog');
    // invented supplier list
    const csv = `Model,LWA dB,Day rate\n"${FORMULA.replaceAll('"', '""')}",101,120\nHalden\u0007 pump,1e308,95\nCordell saw,99,1e999\n`;
    await dialog
      .locator('input[type="file"]')
      .setInputFiles({ name: 'hostile.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    const add = dialog.getByRole('button', { name: /^Add 3 machines/ });
    await add.waitFor({ timeout: 20_000 });
    await screenshot(page, 'hostile-list-preview');
    await add.click();
    const g = grid(page);
    await expect.poll(() => rowOf(g, 'Click me').count()).toBe(1);
    const lwa = await cell(g, 'Halden', 'LWA');
    expect(await lwa.innerText()).toContain('1e308');
    expect(await lwa.getAttribute('aria-invalid')).toBe('true');
    const rate = await cell(g, 'Cordell saw', 'Day rate');
    expect(await rate.innerText()).toContain('1e999');
    expect(await rate.getAttribute('aria-invalid')).toBe('true');
    await typedEditKept();
  });
});

describe('a stored project that cannot be opened', () => {
  it('leaves the app usable, names the project and what is wrong, exports its stored text and deletes it on request', async () => {
    const { page } = browser;
    const newer = { ...demoProject(), name: 'Quarry from a newer version', version: 99 } as unknown as Project;
    await storeProject(page, newer, 'from-the-future');
    await page.reload();
    await waitForGrid(page);
    const alert = page.getByRole('region', { name: 'Projects that cannot be opened' }).getByRole('alert');
    await alert.waitFor();
    expect(await alert.innerText()).toContain('“Quarry from a newer version” cannot be opened');
    expect(await alert.innerText()).toContain('Version: 99 is newer than this program reads');
    expect(await projectName()).not.toBe('Quarry from a newer version');
    await typedEditKept();
    await screenshot(page, 'unopenable-project');
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      alert.getByRole('button', { name: 'Export stored text' }).click(),
    ]);
    expect(download.suggestedFilename()).toBe('Quarry-from-a-newer-version.stored.json');
    const raw = JSON.parse(await readFile((await download.path())!, 'utf8')) as { version: number; name: string };
    expect(raw.version).toBe(99);
    expect(raw.name).toBe('Quarry from a newer version');
    await alert.getByRole('button', { name: 'Delete…' }).click();
    await alert.getByRole('button', { name: 'Delete “Quarry from a newer version” for good' }).click();
    await expect.poll(() => alert.count()).toBe(0);
    const names = await page.locator('#project-select option').allInnerTexts();
    expect(names).not.toContain('Quarry from a newer version');
    await page.reload();
    await waitForGrid(page);
    expect(await page.getByRole('region', { name: 'Projects that cannot be opened' }).count()).toBe(0);
  });
});
