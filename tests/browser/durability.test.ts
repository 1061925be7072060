/**
 * An edit is durable once committed, on a 14,000-machine project: it survives the tab
 * being closed right after Enter, and the browser process being killed (SIGKILL, no
 * chance to run any page code) 100 ms after Enter. Each check reopens the profile and
 * reads the cell back.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { BASE_URL, CHROMIUM_ARGS, CHROMIUM_PATH, ensureApp, waitForGrid } from './harness.ts';
import { storeProject } from './seed.ts';
import { bigProject } from '../bench/ui.bench.ts';
import { columnIndex, grid } from './ledger-page.ts';

const MACHINES = 14_000;
let profileDir: string;

async function launch(): Promise<{ context: BrowserContext; page: Page }> {
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: CHROMIUM_PATH,
    args: CHROMIUM_ARGS,
    headless: true,
    viewport: { width: 1400, height: 900 },
    locale: 'en-GB',
  });
  const page = context.pages()[0] ?? (await context.newPage());
  page.setDefaultTimeout(60_000);
  return { context, page };
}

/** The browser's main process: the child of this test process started with this profile. */
function browserPid(): number {
  const lines = execFileSync('ps', ['-e', '-o', 'pid=,ppid=,args='], { encoding: 'utf8' }).split('\n');
  for (const line of lines) {
    const m = /^\s*(\d+)\s+(\d+)\s+(.*)$/.exec(line);
    if (m && Number(m[2]) === process.pid && m[3]!.includes(profileDir)) return Number(m[1]);
  }
  throw new Error('The browser process of this test was not found');
}

/** The LWA cell of the first machine row. */
async function firstLwa(page: Page) {
  const g = grid(page);
  const col = await columnIndex(g, 'LWA');
  return g.locator(`[role="row"] [role="gridcell"][aria-colindex="${col}"]`).first();
}

async function commitFirstLwa(page: Page, text: string): Promise<void> {
  await (await firstLwa(page)).click();
  await page.keyboard.type(text);
  await page.keyboard.press('Enter');
}

beforeAll(async () => {
  await ensureApp();
  profileDir = await mkdtemp(join(tmpdir(), 'ledger-durable-'));
  const { context, page } = await launch();
  await page.goto(BASE_URL);
  await waitForGrid(page);
  await storeProject(page, bigProject(MACHINES));
  await context.close();
}, 120_000);

afterAll(async () => {
  await rm(profileDir, { recursive: true, force: true });
});

describe(`an edit on a ${MACHINES.toLocaleString('en-GB')}-machine project is durable once committed`, () => {
  it('survives the tab being closed right after Enter', async () => {
    const { context, page } = await launch();
    try {
      await page.goto(BASE_URL);
      await waitForGrid(page);
      await expect
        .poll(
          () =>
            page
              .getByText(/\d+ shown/)
              .first()
              .innerText(),
          { timeout: 60_000 },
        )
        .toMatch(/14,?000 shown/);
      await commitFirstLwa(page, '93.5');
      await page.close();
      const again = await context.newPage();
      await again.goto(BASE_URL);
      await waitForGrid(again);
      await expect.poll(async () => (await firstLwa(again)).innerText(), { timeout: 30_000 }).toBe('93.5');
    } finally {
      await context.close();
    }
  }, 180_000);

  it('survives the browser process being killed 100 ms after Enter', async () => {
    for (const value of ['91', '92.5']) {
      const { context, page } = await launch();
      await page.goto(BASE_URL);
      await waitForGrid(page);
      await commitFirstLwa(page, value);
      await new Promise((r) => setTimeout(r, 100));
      process.kill(browserPid(), 'SIGKILL');
      await context.close().catch(() => undefined);
      const reopened = await launch();
      try {
        await reopened.page.goto(BASE_URL);
        await waitForGrid(reopened.page);
        await expect.poll(async () => (await firstLwa(reopened.page)).innerText(), { timeout: 30_000 }).toBe(value);
      } finally {
        await reopened.context.close();
      }
    }
  }, 240_000);
});
