import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { progressLine } from '../../src/cli/progress.ts';
import { main } from '../../src/cli/main.ts';
import type { Io } from '../../src/cli/command.ts';

describe('progressLine', () => {
  it('rewrites one line in place with the share done, and clears it at the end', () => {
    const written: string[] = [];
    const show = progressLine({ write: (t: string) => written.push(t) });
    show('cheapest fleet', 0.35);
    show('hand method', 1);
    show(undefined, 1);
    // 0.35 → " 35 %", 1 → "100 %" (rounded share, three characters); \r and erase-line (ECMA-48 EL) before each.
    expect(written).toEqual(['\r\u001b[K 35 %  cheapest fleet', '\r\u001b[K100 %  hand method', '\r\u001b[K']);
  });

  it('draws at most every 100 ms, and nothing to clear when nothing was drawn', () => {
    vi.useFakeTimers();
    try {
      const written: string[] = [];
      const show = progressLine({ write: (t: string) => written.push(t) });
      show(undefined, 1);
      show('a', 0.1);
      show('b', 0.2);
      vi.advanceTimersByTime(150);
      show('c', 0.3);
      expect(written).toEqual(['\r\u001b[K 10 %  a', '\r\u001b[K 30 %  c']);
    } finally {
      vi.useRealTimers();
    }
  });
});

describe('ledger optimise and export report progress when standard error is a terminal', () => {
  // main() gives a command io.progress only when process.stderr.isTTY (src/cli/main.ts); here an io with progress
  // stands for the terminal, and one without it for a pipe or file.
  const run = async (args: string[], withProgress: boolean) => {
    const steps: (string | undefined)[] = [];
    const out: string[] = [];
    const err: string[] = [];
    const io: Io = {
      out: (t) => out.push(t),
      err: (t) => err.push(t),
      ...(withProgress ? { progress: (step: string | undefined) => steps.push(step) } : {}),
    };
    const code = await main(args, io);
    return { code, steps, out: out.join(''), err: err.join('') };
  };
  let dir: string;
  let demoFile: string;
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'ledger-progress-'));
    demoFile = join(dir, 'demo.json');
    const example = await run(['example'], false);
    writeFileSync(demoFile, example.out);
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('export: the solver’s steps, then each sheet written, then the line cleared; nothing on standard error', async () => {
    const r = await run(['export', demoFile, '-o', join(dir, 'demo.xlsx')], true);
    expect(r.code).toBe(0);
    expect(r.err).toBe('');
    expect(r.steps.some((s) => s?.startsWith('solving: '))).toBe(true);
    expect(r.steps).toContain('Writing the workbook: inputs sheet written');
    expect(r.steps).toContain('Compressing the workbook');
    expect(r.steps.at(-1)).toBeUndefined();
  }, 60_000);

  it('optimise: steps reported and the line cleared at the end', async () => {
    const r = await run(['optimise', demoFile], true);
    expect(r.code).toBe(0);
    expect(r.steps.filter((s) => s !== undefined).length).toBeGreaterThan(0);
    expect(r.steps.at(-1)).toBeUndefined();
  }, 60_000);

  it('without a terminal the same commands write no progress line (only results and messages)', async () => {
    const r = await run(['export', demoFile, '-o', join(dir, 'plain.xlsx'), '--skip-optimiser'], false);
    expect(r.code).toBe(0);
    expect(r.err).toBe('');
    expect(r.out).not.toMatch(/\r|\u001b\[K/);
  }, 60_000);
});
