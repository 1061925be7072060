/**
 * The level-versus-distance chart in the real browser, for every duty of the invented demo:
 * every word lies inside the drawing (nothing cut at its edges), no two words overlap, no word
 * covers a read-out dot or the phase-total mark, each line is read at the present distance,
 * and the chart says the limit is for the phase total.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { openTab } from './ledger-page.ts';

let browser: BrowserSession;

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser({ viewport: { width: 1440, height: 900 } });
});

afterAll(async () => {
  await browser?.close();
});

interface Layout {
  outside: string[];
  overlapping: string[];
  covering: string[];
  readouts: number;
  lines: number;
}

describe('distance chart', () => {
  it('for every demo duty the words are inside the drawing, apart, and clear of the marked points', async () => {
    const { page } = browser;
    await openTab(page, 'Results');
    const chart = page.locator('figure.distance svg.chart');
    await chart.waitFor();
    const picker = page.locator('.ranking').first().getByLabel('Duty');
    const duties = await picker.locator('option').allInnerTexts();
    expect(duties.length).toBeGreaterThan(5);
    for (const [i, duty] of duties.entries()) {
      await picker.selectOption({ label: duty });
      await expect.poll(() => chart.locator('title').first().textContent()).toContain(duty);
      const layout: Layout = await chart.evaluate((svg) => {
        // on-screen boxes (a rotated axis title included), against the drawing's own box
        const r = svg.getBoundingClientRect();
        const box = { x: r.left, y: r.top, width: r.right, height: r.bottom };
        // a text's box holds its font's whole line height; the glyphs fill about the middle 70 %
        const ink = (b: DOMRect) => new DOMRect(b.x, b.y + b.height * 0.15, b.width, b.height * 0.7);
        const texts = [...svg.querySelectorAll('text')].filter((t) => (t.textContent ?? '').trim() !== '');
        const boxes = texts.map((t) => ({ text: t.textContent ?? '', b: ink(t.getBoundingClientRect()) }));
        const outside = boxes
          .filter(
            ({ b }) =>
              b.x < box.x - 0.5 ||
              b.y < box.y - 0.5 ||
              b.x + b.width > box.width + 0.5 ||
              b.y + b.height > box.height + 0.5,
          )
          .map((t) => t.text);
        const overlapping: string[] = [];
        for (let a = 0; a < boxes.length; a++)
          for (let b = a + 1; b < boxes.length; b++) {
            const p = boxes[a]!.b;
            const q = boxes[b]!.b;
            if (
              p.x < q.x + q.width - 1 &&
              q.x < p.x + p.width - 1 &&
              p.y < q.y + q.height - 1 &&
              q.y < p.y + p.height - 1
            )
              overlapping.push(`${boxes[a]!.text} / ${boxes[b]!.text}`);
          }
        const marks = [...svg.querySelectorAll('circle.readout, .phase-total path')].map((m) => {
          const c = m.getBoundingClientRect();
          return { x: c.x + c.width / 2, y: c.y + c.height / 2 };
        });
        const covering = boxes
          .filter(({ b }) =>
            marks.some((m) => m.x >= b.x && m.x <= b.x + b.width && m.y >= b.y && m.y <= b.y + b.height),
          )
          .map((t) => t.text);
        return {
          outside,
          overlapping,
          covering,
          readouts: svg.querySelectorAll('circle.readout').length,
          lines: svg.querySelectorAll('.line path').length,
        };
      });
      expect(layout.outside, duty).toEqual([]);
      expect(layout.overlapping, duty).toEqual([]);
      expect(layout.covering, duty).toEqual([]);
      // each drawn line is read at the present distance
      expect(layout.readouts, duty).toBe(layout.lines);
      if (i === 0) await screenshot(page, 'distance-chart-first-duty', { selector: 'figure.distance' });
    }
    expect(await page.getByTestId('distance-limit-words').innerText()).toMatch(
      /The limit applies to the phase total of /,
    );
  });
});
