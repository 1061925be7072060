/**
 * Browser test harness: builds the app once, serves the build with `vite preview` on
 * 127.0.0.1 at a port of this checkout's own (see PORT), and opens Debian's Chromium through playwright-core with a fresh
 * persistent profile (its own IndexedDB) for each test file.
 *
 * Use from a test file:
 *   beforeAll(async () => { await ensureApp(); browser = await openBrowser(); });
 *   afterAll(() => browser.close());
 * `ensureApp` reuses the server the browser project's global setup started; run alone
 * (e.g. from a benchmark) it builds and starts one itself and stops it at process exit.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdtemp, mkdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

/** The repository root. */
export const ROOT = fileURLToPath(new URL('../..', import.meta.url));
/**
 * Port the harness serves on: 4317 plus a number from 0 to 499 drawn from this checkout's
 * folder, so that two checkouts testing at once never test each other's build (a run that
 * finds its port serving reuses that server). LEDGER_TEST_PORT overrides it.
 */
export const PORT = Number(process.env.LEDGER_TEST_PORT ?? 4317 + checkoutOffset(ROOT));

/** A number from 0 to 499 from a folder's path (FNV-1a), the same on every run. */
function checkoutOffset(folder: string): number {
  let hash = 0x811c9dc5;
  for (let i = 0; i < folder.length; i++) hash = Math.imul(hash ^ folder.charCodeAt(i), 0x01000193) >>> 0;
  return hash % 500;
}
export const BASE_URL = `http://127.0.0.1:${PORT}/`;
export const CHROMIUM_PATH = '/usr/bin/chromium';
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];
/** Where screenshots go (git-ignored). */
export const SCREENSHOT_DIR = join(ROOT, 'test-output', 'screenshots');

const VITE = join(ROOT, 'node_modules', '.bin', 'vite');

/** Builds the app into dist/ (`vite build`). Throws with the build's output when it fails. */
export function buildApp(): void {
  const result = spawnSync(VITE, ['build', '--logLevel', 'error'], { cwd: ROOT, encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`vite build failed:\n${result.stdout}\n${result.stderr}`);
}

/** True when something answers on the harness port. */
export async function serverIsUp(): Promise<boolean> {
  try {
    const response = await fetch(BASE_URL, { signal: AbortSignal.timeout(1500) });
    return response.ok;
  } catch {
    return false;
  }
}

/** Starts `vite preview` on the harness port and resolves when it answers. */
export async function startPreview(): Promise<{ stop(): Promise<void> }> {
  const child: ChildProcess = spawn(VITE, ['preview', '--host', '127.0.0.1', '--strictPort', '--port', String(PORT)], {
    cwd: ROOT,
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true,
  });
  let output = '';
  child.stdout?.on('data', (d) => (output += String(d)));
  child.stderr?.on('data', (d) => (output += String(d)));
  const stop = async () => {
    if (child.exitCode !== null || child.pid === undefined) return;
    try {
      process.kill(-child.pid, 'SIGTERM');
    } catch {
      // already gone
    }
    await new Promise((resolve) => {
      if (child.exitCode !== null) resolve(undefined);
      else child.once('exit', resolve);
      setTimeout(resolve, 3000);
    });
  };
  for (let i = 0; i < 100; i++) {
    if (child.exitCode !== null) throw new Error(`vite preview exited (${child.exitCode}):\n${output}`);
    if (await serverIsUp()) return { stop };
    await new Promise((r) => setTimeout(r, 150));
  }
  await stop();
  throw new Error(`vite preview did not answer on ${BASE_URL}:\n${output}`);
}

let own: Promise<{ stop(): Promise<void> }> | undefined;

/** Makes sure the built app is being served: reuses a running server, else builds and starts one. */
export async function ensureApp(): Promise<void> {
  if (await serverIsUp()) return;
  own ??= (async () => {
    buildApp();
    const server = await startPreview();
    process.once('exit', () => void server.stop());
    return server;
  })();
  await own;
}

/** Stops the server {@link ensureApp} started in this process, if any. */
export async function stopOwnApp(): Promise<void> {
  if (!own) return;
  const server = await own;
  own = undefined;
  await server.stop();
}

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  /** The profile folder (deleted on close). */
  profileDir: string;
  /** Opens another tab in the same profile (same IndexedDB). */
  newPage(): Promise<Page>;
  close(): Promise<void>;
}

/** Launches Chromium with a fresh persistent profile and opens one tab on the app. */
export async function openBrowser(
  options: { viewport?: { width: number; height: number }; open?: boolean } = {},
): Promise<BrowserSession> {
  const profileDir = await mkdtemp(join(tmpdir(), 'ledger-profile-'));
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: CHROMIUM_PATH,
    args: CHROMIUM_ARGS,
    headless: true,
    viewport: options.viewport ?? { width: 1600, height: 1000 },
    permissions: ['clipboard-read', 'clipboard-write'],
    locale: 'en-GB',
  });
  const page = context.pages()[0] ?? (await context.newPage());
  page.setDefaultTimeout(20_000);
  if (options.open !== false) await gotoApp(page);
  return {
    context,
    page,
    profileDir,
    async newPage() {
      const p = await context.newPage();
      p.setDefaultTimeout(20_000);
      await gotoApp(p);
      return p;
    },
    async close() {
      await context.close();
      await rm(profileDir, { recursive: true, force: true });
    },
  };
}

/** Opens the app and waits until the machine grid shows rows. */
export async function gotoApp(page: Page): Promise<void> {
  await page.goto(BASE_URL);
  await waitForGrid(page);
}

/** Waits until a grid with at least one data cell is on screen. */
export async function waitForGrid(page: Page): Promise<void> {
  await page.locator('[role="grid"] [role="gridcell"]').first().waitFor({ state: 'visible' });
}

/** Saves a full-page screenshot under test-output/screenshots/<name>.png and returns its path. */
export async function screenshot(
  page: Page,
  name: string,
  options: { fullPage?: boolean; selector?: string } = {},
): Promise<string> {
  await mkdir(SCREENSHOT_DIR, { recursive: true });
  const path = join(SCREENSHOT_DIR, `${name}.png`);
  if (options.selector) await page.locator(options.selector).first().screenshot({ path });
  else await page.screenshot({ path, fullPage: options.fullPage ?? false });
  return path;
}
