/**
 * The site plan's words on the invented demo at 1024×700: every receiver's and duty's name
 * lies within the plan (none cut at its edge), no two names overlap, every word is at least
 * 11 CSS px high on screen, and no two grid-line numbers print over or beside each other in a corner.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureApp, openBrowser, screenshot, type BrowserSession } from './harness.ts';
import { openTab } from './ledger-page.ts';

let browser: BrowserSession;

beforeAll(async () => {
  await ensureApp();
  browser = await openBrowser({ viewport: { width: 1024, height: 700 } });
});

afterAll(async () => {
  await browser?.close();
});

describe('site plan words', () => {
  it('every name on the plan lies within it, and the grid numbers never meet', async () => {
    const { page } = browser;
    await openTab(page, 'Site plan');
    const svg = page.locator('svg.canvas');
    await svg.locator('g.receiver text').first().waitFor();
    const found = await svg.evaluate((el) => {
      const canvas = el as SVGSVGElement;
      const view = canvas.viewBox.baseVal;
      const cut = [...canvas.querySelectorAll<SVGTextElement>('text')]
        .filter((t) => t.textContent?.trim())
        .filter((t) => {
          const b = t.getBBox();
          return b.x < view.x - 0.5 || b.x + b.width > view.x + view.width + 0.5 || b.y < view.y - 0.5;
        })
        .map((t) => t.textContent ?? '');
      const numbers = [...canvas.querySelectorAll<SVGTextElement>('g.grid text')].map((t) => ({
        text: t.textContent ?? '',
        r: t.getBoundingClientRect(),
      }));
      const meeting: string[] = [];
      for (let i = 0; i < numbers.length; i++)
        for (let j = i + 1; j < numbers.length; j++) {
          const a = numbers[i]!.r;
          const b = numbers[j]!.r;
          // on one line (boxes overlap vertically) and closer than a character's width apart
          const sameLine = a.top < b.bottom && b.top < a.bottom;
          const gap = Math.max(b.left - a.right, a.left - b.right);
          if (sameLine && gap < a.height * 0.6 && Math.abs(a.top - b.top) > 0.5)
            meeting.push(`${numbers[i]!.text} / ${numbers[j]!.text}`);
        }
      // the size each word is drawn at on screen, CSS px
      const scale = canvas.getScreenCTM()?.a ?? NaN;
      const small = [...canvas.querySelectorAll<SVGTextElement>('g.grid text, g.receiver text, g.duty text')]
        .map((t) => ({ text: t.textContent ?? '', px: Number(t.getAttribute('font-size')) * scale }))
        .filter((t) => !(t.px >= 11))
        .map((t) => `${t.text}: ${t.px.toFixed(1)} px`);
      const names = [...canvas.querySelectorAll<SVGTextElement>('g.receiver text, g.duty text')].map((t) => ({
        text: t.textContent ?? '',
        r: t.getBoundingClientRect(),
      }));
      const overlapping: string[] = [];
      for (let i = 0; i < names.length; i++)
        for (let j = i + 1; j < names.length; j++) {
          const a = names[i]!.r;
          const b = names[j]!.r;
          if (a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom)
            overlapping.push(`${names[i]!.text} / ${names[j]!.text}`);
        }
      return {
        cut,
        meeting,
        small,
        overlapping,
        receivers: canvas.querySelectorAll('g.receiver text').length,
        duties: canvas.querySelectorAll('g.duty text').length,
      };
    });
    expect(found.receivers).toBeGreaterThanOrEqual(4);
    expect(found.cut).toEqual([]);
    expect(found.meeting).toEqual([]);
    expect(found.small).toEqual([]);
    expect(found.overlapping).toEqual([]);
    console.log(`site plan at 1024: ${found.receivers} receiver names, ${found.duties} duty names written`);
    await screenshot(page, 'site-plan-labels-1024');
  });
});
