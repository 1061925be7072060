/**
 * `--decimal-comma`: every command reads numbers as a spreadsheet in a European locale writes
 * them — in every quantity flag ("12,5 m" is 12.5 m) and in the delimited text it reads (a
 * supplier list, octave bands). Without it a decimal comma is refused, naming the flag.
 * Runs the real `ledger` command.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runLedger } from './run-ledger.ts';
import { FLAG_RULES } from '../../src/cli/flag-rules.ts';
import { numberFlag } from '../../src/cli/flags.ts';

let dir = '';
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'ledger-comma-'));
  // A comma-delimited list whose rate is quoted with a thousands point, as a German spreadsheet exports it;
  // its LWA is copied from a data sheet with a point, so the cells alone suggest a decimal point.
  writeFileSync(join(dir, 'list.csv'), 'Model,LWA dB,Rate per day\nBagger,104.5,"1.250"\n');
});
afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

const levelOf = (out: string) => (JSON.parse(out) as { level: number }).level;

describe('ledger --decimal-comma', () => {
  it('level --lw "104,5" --distance "12,5 m" --decimal-comma gives what --lw 104.5 --distance 12.5 gives', () => {
    const comma = runLedger(['level', '--lw', '104,5', '--distance', '12,5 m', '--decimal-comma', '--json']);
    const point = runLedger(['level', '--lw', '104.5', '--distance', '12.5', '--json']);
    expect(comma.code).toBe(0);
    expect(comma.stdout).toBe(point.stdout);
    // worked by hand: 104.5 + 10·lg(2 / (4π·12.5²)) = 104.5 − 29.92 = 74.58 dB (hemispherical spreading, Q = 2)
    expect(levelOf(comma.stdout)).toBeCloseTo(74.58, 2);
  });

  it('without the flag "12,5 m" is refused, and the message names --decimal-comma', () => {
    const r = runLedger(['level', '--lw', '104', '--distance', '12,5 m']);
    expect(r.code).toBe(2);
    expect(r.stderr).toBe(
      'ledger level: --distance: "12,5 m" is not a number with a decimal point (give a distance in metres above 0, e.g. 45; for a decimal comma add --decimal-comma)\n',
    );
  });

  it('a point alone still reads as a decimal point with the flag (data sheets print "104.5"); thousands points are read', () => {
    expect(numberFlag({ lw: '104.5', 'decimal-comma': true }, 'lw', FLAG_RULES.lwaDb)).toBe(104.5);
    expect(numberFlag({ budget: '€1.250,50', 'decimal-comma': true }, 'budget', FLAG_RULES.money)).toBe(1250.5);
    expect(numberFlag({ budget: '1,250', 'decimal-comma': true }, 'budget', FLAG_RULES.money)).toBe(1.25);
  });

  it('octave bands are separated by semicolons with a decimal comma', () => {
    const comma = runLedger([
      'level',
      '--bands',
      '95,5;98;101;102;100;97;93;88',
      '--distance',
      '10',
      '--decimal-comma',
      '--json',
    ]);
    const point = runLedger(['level', '--bands', '95.5,98,101,102,100,97,93,88', '--distance', '10', '--json']);
    expect(comma.code).toBe(0);
    expect(comma.stdout).toBe(point.stdout);
  });

  it('import reads a delimited list with a decimal comma: "1.250" is 1250 a day, not 1.25', () => {
    const guessed = runLedger(['import', join(dir, 'list.csv'), '--json']);
    const comma = runLedger(['import', join(dir, 'list.csv'), '--decimal-comma', '--json']);
    expect(comma.code).toBe(0);
    const rate = (out: string) =>
      (JSON.parse(out) as { candidates: { lwaDb: number; cost: { dayRate: number } }[] }).candidates[0]!;
    expect(rate(comma.stdout)).toMatchObject({ lwaDb: 104.5, cost: { dayRate: 1250 } });
    expect((JSON.parse(comma.stdout) as { decimalSeparator: string }).decimalSeparator).toBe(',');
    // without the flag the cells decide: "104.5" can only be a decimal point, and "1.250" is then 1.25
    expect((JSON.parse(guessed.stdout) as { decimalSeparator: string }).decimalSeparator).toBe('.');
    expect(rate(guessed.stdout)).toMatchObject({ lwaDb: 104.5, cost: { dayRate: 1.25 } });
  });

  it('--decimal . with --decimal-comma is refused', () => {
    const r = runLedger(['import', join(dir, 'list.csv'), '--decimal', '.', '--decimal-comma']);
    expect(r.code).toBe(2);
    expect(r.stderr).toBe('ledger import: --decimal: "." disagrees with --decimal-comma (give one of them)\n');
  });

  it('every command lists --decimal-comma in its help', () => {
    for (const command of ['level', 'evaluate', 'optimise', 'import', 'register']) {
      expect(runLedger([command, '--help']).stdout).toMatch(/--decimal-comma\s+read numbers with a decimal comma/);
    }
  });
});
