import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { runLedger } from './run-ledger.ts';

let dir: string;
let demoFile: string;
let demoText: string;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'ledger-export-'));
  demoText = runLedger(['example']).stdout;
  demoFile = join(dir, 'demo.json');
  writeFileSync(demoFile, demoText);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function sheetNames(file: string): Promise<string[]> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(readFileSync(file) as unknown as ArrayBuffer);
  return wb.worksheets.map((w) => w.name);
}

describe('ledger export', () => {
  it('ledger export demo.json -o out.xlsx writes the workbook with the optimiser’s fleet and exits 0', async () => {
    const out = join(dir, 'demo.xlsx');
    const r = runLedger(['export', demoFile, '-o', out]);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(
      /^Wrote .*demo\.xlsx \(\d+ kB\) with the cheapest compliant fleet: 12 phase × receiver levels, 0 over the limit\./,
    );
    expect(r.stdout).toMatch(/±3 dB/);
    expect(await sheetNames(out)).toEqual([
      'inputs',
      'assumptions',
      'paths',
      'contributions',
      'levels',
      'shortlist',
      'compliance',
      'confidence',
      'checks',
    ]);
  });

  it('ledger export --output with --fleet baseline reports the baseline fleet and its cells over the limit', () => {
    const out = join(dir, 'baseline.xlsx');
    const r = runLedger(['export', demoFile, '--output', out, '--fleet', 'baseline']);
    expect(r.code).toBe(0);
    // The demo's baselines exceed the limits at the terrace and the school (demo.ts describes it so).
    expect(r.stdout).toMatch(/with the baseline fleet: 12 phase × receiver levels, [1-9]\d* over the limit/);
    expect(existsSync(out)).toBe(true);
  });

  it('ledger export --skip-optimiser writes the baseline fleet without running the optimiser', () => {
    const out = join(dir, 'skip.xlsx');
    const r = runLedger(['export', demoFile, `-o=${out}`, '--skip-optimiser']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/with the baseline fleet/);
  });

  it('ledger export of an invalid project lists the problems with JSON paths, writes nothing and exits 2', () => {
    const project = JSON.parse(demoText);
    project.candidates[0].lwaDb = 'loud';
    project.duties[1].count = 0;
    const bad = join(dir, 'bad.json');
    writeFileSync(bad, JSON.stringify(project));
    const out = join(dir, 'bad.xlsx');
    const r = runLedger(['export', bad, '-o', out]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/problems?; nothing (computed|written)/);
    expect(r.stderr).toMatch(/\$\.candidates\[0\]\.lwaDb/);
    expect(r.stderr).toMatch(/\$\.duties\[1\]\.count/);
    expect(existsSync(out)).toBe(false);
  });

  it.each([
    [['export'], /missing project file/],
    [['export', 'demo.json'], /--output: missing/],
    [['export', 'demo.json', '-o', 'out.csv'], /does not end in \.xlsx/],
    [
      ['export', 'demo.json', '-o', 'x.xlsx', '--fleet', 'cheapest'],
      /--fleet: "cheapest" is not a fleet of this project \(use one of "baseline", "best"\)/,
    ],
    [['export', 'no-such-file.json', '-o', 'x.xlsx'], /no such file/],
  ])('ledger %j is a usage error on one line with exit code 2', (args, message) => {
    const r = runLedger(
      args.map((a) => (a === 'demo.json' ? demoFile : a)),
      { cwd: dir },
    );
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(message);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
  });

  it('ledger export -o into a folder that does not exist says so and exits 2', () => {
    const r = runLedger(['export', demoFile, '-o', join(dir, 'missing', 'out.xlsx')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/cannot be written \(its folder does not exist/);
  });
});
