/**
 * The printable report in the real browser: print the results view of the invented demo
 * project to an A4 PDF with Chromium, check its pages, and keep images of what is printed
 * under test-output/ for a person to look at.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdir, readFile, readdir } from 'node:fs/promises';
import { join } from 'node:path';
import { ROOT, SCREENSHOT_DIR, ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { openTab } from './ledger-page.ts';

const OUT_DIR = join(ROOT, 'test-output', 'print');
const PDF_PATH = join(OUT_DIR, 'report.pdf');

let browser: BrowserSession;

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser();
  await mkdir(OUT_DIR, { recursive: true });
});

afterAll(async () => {
  await browser?.close();
});

/** Number of pages in a PDF: its page objects ("/Type /Page", not "/Pages"). */
function pdfPageCount(pdf: Buffer): number {
  return pdf.toString('latin1').match(/\/Type\s*\/Page(?![s\w])/g)?.length ?? 0;
}

/** True when a command is on the PATH. */
function has(command: string): boolean {
  return spawnSync('sh', ['-c', `command -v ${command}`], { encoding: 'utf8' }).status === 0;
}

describe('printable report', () => {
  it('the results view holds the report, hidden on screen', async () => {
    const { page } = browser;
    await openTab(page, 'Results');
    const report = page.locator('.pnl-report');
    await report.waitFor({ state: 'attached' });
    expect(await report.isVisible()).toBe(false);
  });

  it('the optimiser’s fleet reaches the results view before printing', async () => {
    const { page } = browser;
    await page.getByRole('button', { name: 'Find the cheapest fleet' }).click();
    await page.getByText('Saving over the best-buy-first fleet').first().waitFor({ timeout: 100_000 });
    await page.getByRole('button', { name: 'Use this fleet' }).click();
    await expect.poll(() => page.getByTestId('assessed-fleet').innerText()).toBe('Cheapest compliant (optimiser)');
  }, 120_000);

  it('in print, only the report shows: project, method with its edition, levels, shortlist, trade-off chart, cautions', async () => {
    const { page } = browser;
    await page.emulateMedia({ media: 'print' });
    await page.evaluate(() => window.dispatchEvent(new Event('beforeprint')));
    try {
      const report = page.locator('.pnl-report');
      await expect.poll(() => report.isVisible()).toBe(true);
      const text = await report.innerText();
      expect(text).toContain('invented demo');
      expect(text).toMatch(/Method/);
      expect(text).toMatch(/Point source with directivity|ISO 9613-2:1996/);
      expect(text).toMatch(/LAeq,T at each receiver/);
      expect(text).toMatch(/Shortlist/);
      // the report describes the optimiser's fleet the user made the assessed one, and says it complies
      expect(text).toContain('Compliance statement for fleet “Cheapest compliant (optimiser)”');
      expect(text).toMatch(/every one of the \d+ assessed phase and receiver pairs is predicted at or under its limit/);
      expect(text).toContain('Machines of fleet “Cheapest compliant (optimiser)”');
      expect(text.indexOf('Compliance statement for')).toBeLessThan(text.indexOf('Shortlist'));
      expect(text).toMatch(/Ranking: /);
      expect(text).toMatch(/±3 dB/);
      expect(text).toMatch(/competent acoustician/);
      expect(await report.locator('svg[role="img"]').count()).toBeGreaterThanOrEqual(1);
      // No app chrome in print: the tabs, the grid and the on-screen results are hidden.
      expect(await page.getByRole('tablist').isVisible()).toBe(false);
      expect(await page.getByRole('button', { name: 'Find the cheapest fleet' }).isVisible()).toBe(false);
      await screenshot(page, 'print-report', { fullPage: true });
      await screenshot(page, 'print-report-receivers', { selector: '[data-testid="report-receivers"]' });
    } finally {
      await page.evaluate(() => window.dispatchEvent(new Event('afterprint')));
      await page.emulateMedia({ media: null });
    }
  });

  it('page.pdf prints an A4 report of a few pages', async () => {
    const { page } = browser;
    expect(await page.locator('.pnl-report').count()).toBe(1);
    // Note the report's text when printing starts: page.pdf fires beforeprint, which fills the report.
    await page.evaluate(() => {
      window.addEventListener(
        'beforeprint',
        () => {
          (window as unknown as { reportTextAtPrint: string }).reportTextAtPrint =
            document.querySelector('.pnl-report')?.textContent ?? '';
        },
        { once: true },
      );
    });
    await page.pdf({ path: PDF_PATH, format: 'A4', printBackground: true, preferCSSPageSize: true });
    const pdf = await readFile(PDF_PATH);
    const printed = await page.evaluate(
      () => (window as unknown as { reportTextAtPrint?: string }).reportTextAtPrint ?? '',
    );
    expect(printed).toContain('Shortlist');
    expect(printed).toContain('±3 dB');
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const pages = pdfPageCount(pdf);
    expect(pages).toBeGreaterThanOrEqual(2);
    expect(pages, `${pages} pages`).toBeLessThanOrEqual(14); // about ten, and a level map for each of the demo's three phases
    // A4 is 210 × 297 mm (ISO 216) = 595.3 × 841.9 points at 72 points per inch; Chromium rounds to whole pixels.
    const box = /\/MediaBox\s*\[\s*0\s+0\s+([\d.]+)\s+([\d.]+)\s*\]/.exec(pdf.toString('latin1'));
    expect(Math.abs(Number(box?.[1]) - 595.3)).toBeLessThan(1.5);
    expect(Math.abs(Number(box?.[2]) - 841.9)).toBeLessThan(1.5);
    // No near-blank pages: on every page but the last the printed text reaches below the page's middle
    // (text positions read with pdfjs; the footer line, under 50 points from the bottom edge, is left out).
    const { getDocument } = await import('pdfjs-dist/legacy/build/pdf.mjs');
    const doc = await getDocument({ data: new Uint8Array(pdf) }).promise;
    for (let i = 1; i < doc.numPages; i++) {
      const content = await (await doc.getPage(i)).getTextContent();
      const lowest = Math.min(
        ...content.items
          .filter((t) => 'str' in t && t.str.trim() !== '' && t.transform[5] > 50)
          .map((t) => ('transform' in t ? (t.transform[5] as number) : Infinity)),
      );
      expect(lowest, `page ${i} of ${doc.numPages} is more than half blank`).toBeLessThan(841.9 / 2);
    }
    // the per-receiver table is printed, one row a receiver
    expect(printed).toContain('Receiver by receiver');
    if (has('pdftoppm')) {
      const prefix = join(SCREENSHOT_DIR, 'print-report-page');
      await mkdir(SCREENSHOT_DIR, { recursive: true });
      const run = spawnSync('pdftoppm', ['-png', '-r', '70', '-f', '1', '-l', '3', PDF_PATH, prefix], {
        encoding: 'utf8',
      });
      expect(run.status).toBe(0);
      const images = (await readdir(SCREENSHOT_DIR)).filter(
        (f) => f.startsWith('print-report-page') && f.endsWith('.png'),
      );
      expect(images.length).toBeGreaterThanOrEqual(2);
    }
  });
  it('a fresh page prints the level map of each phase with its title and legend, without the Site plan tab opened', async () => {
    const fresh = await openBrowser(); // a new profile: the demo, never shown on the Site plan tab
    const { page } = fresh;
    try {
      await openTab(page, 'Results');
      await page.locator('.pnl-report').waitFor({ state: 'attached' }); // the tab loads on first use
      await page.emulateMedia({ media: 'print' });
      await page.evaluate(() => window.dispatchEvent(new Event('beforeprint')));
      const maps = page.getByTestId('report-level-map');
      await expect.poll(() => maps.count()).toBe(3); // the demo's three phases
      const phases = ['Demolition and breaking out', 'Piling and groundworks', 'Frame, services and landscaping'];
      for (let i = 0; i < 3; i++) {
        const map = maps.nth(i);
        expect(await map.locator('h3').innerText()).toBe(`Level map: ${phases[i]}`);
        const img = map.locator('img');
        await expect.poll(() => img.evaluate((e) => (e as HTMLImageElement).naturalWidth)).toBeGreaterThan(0);
        const svg = decodeURIComponent(
          ((await img.getAttribute('src')) ?? '').replace(/^data:image\/svg\+xml;charset=utf-8,/, ''),
        );
        expect(svg).toMatch(/>\d+\+<\/text>/); // the legend's bands
        expect(svg).toContain('free field (no façade term)');
        expect(svg).toContain('Predictions ±3 dB (ISO 9613-2)');
        expect(await map.locator('figcaption').innerText()).toMatch(/free field \(no façade term\), 4 m above ground/);
        expect(svg).toContain(`: ${phases[i]}, `); // the title names the phase and the fleet
      }
      await screenshot(page, 'print-report-level-map', { selector: '[data-testid="report-level-map"]' });
      await screenshot(page, 'print-report-site-plan', { selector: '[data-testid="report-site-plan"]' });
    } finally {
      await fresh.close();
    }
  });
});
