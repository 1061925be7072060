/**
 * `ledger optimise`: the real command, spawned, on the demo project (from `ledger example`)
 * and on broken copies of it written to a temporary folder.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runLedger, type LedgerRun } from './run-ledger.ts';

let dir = '';
const file = (name: string) => join(dir, name);
let human: LedgerRun;
let json: LedgerRun;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'ledger-optimise-'));
  const example = runLedger(['example']);
  expect(example.code).toBe(0);
  writeFileSync(file('demo.json'), example.stdout);
  const broken = JSON.parse(example.stdout);
  broken.candidates[0].lwaDb = '12O';
  broken.duties[0].count = -1;
  writeFileSync(file('broken.json'), JSON.stringify(broken, null, 2));
  human = runLedger(['optimise', file('demo.json')]);
  json = runLedger(['optimise', file('demo.json'), '--json']);
}, 180_000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('ledger optimise on the demo project', () => {
  it('ledger optimise demo.json prints the proven cheapest fleet, its levels, the hand method, the curve and the caution; exit 0', () => {
    expect(human.stderr).toBe('');
    expect(human.code).toBe(0);
    expect(human.stdout).toMatch(/Cheapest fleet that meets every limit: £[\d,.]+, proven optimal \(HiGHS\)\./);
    expect(human.stdout).toContain('Chosen fleet:');
    expect(human.stdout).toContain('Levels with the chosen fleet, dB LAeq,T');
    expect(human.stdout).toContain('Best-buy-first fleet');
    expect(human.stdout).toContain('Trade-off: least cost for each worst-case margin');
    expect(human.stdout).toContain('ISO 9613-2 quotes ±3 dB');
    expect(human.stdout).not.toContain('OVER by');
  });

  it('ledger optimise demo.json --json: every phase total of the chosen fleet is at or under its limit', () => {
    expect(json.code).toBe(0);
    const out = JSON.parse(json.stdout);
    expect(out.feasible).toBe(true);
    expect(out.proven).toBe(true);
    const limited = out.matrix.filter((c: { limitDb?: number }) => c.limitDb !== undefined);
    expect(limited.length).toBeGreaterThan(0);
    // Solver feasibility is 1e-9 of the limit energy; 1e-6 dB allows for it.
    for (const c of limited) expect(c.levelDb).toBeLessThanOrEqual(c.limitDb + 1e-6);
    expect(out.best.over).toEqual([]);
  });

  it('ledger optimise demo.json --json: the baseline is over, the exact fleet beats the hand method, the curve rises', () => {
    const out = JSON.parse(json.stdout);
    expect(out.baseline.over.length).toBeGreaterThan(0);
    expect(out.hand.compliant).toBe(true);
    expect(out.savingOverHand).toBeGreaterThan(0);
    expect(out.hand.cost - out.best.cost).toBeCloseTo(out.savingOverHand, 6);
    const curve: { worstMarginDb: number; cost: number }[] = out.tradeOff;
    expect(curve.length).toBeGreaterThan(1);
    for (let i = 1; i < curve.length; i++) {
      expect(curve[i]!.worstMarginDb).toBeGreaterThan(curve[i - 1]!.worstMarginDb);
      expect(curve[i]!.cost).toBeGreaterThan(curve[i - 1]!.cost);
    }
    expect(out.caution).toContain('±3 dB');
  });

  it('ledger optimise demo.json --budget below the cheapest compliant cost: says no fleet meets every limit and names the cells over; exit 1', () => {
    const best = JSON.parse(json.stdout).best.cost as number;
    const r = runLedger(['optimise', file('demo.json'), '--budget', String(Math.floor(best - 100))]);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('NO FLEET MEETS EVERY LIMIT within the budget');
    expect(r.stdout).toContain('Still over with this fleet:');
    expect(r.stdout).toMatch(/in [^:]+: [\d.]+ dB against [\d.]+ dB, over by [\d.]+ dB/);
  });
});

describe('ledger optimise bad input', () => {
  it('ledger optimise broken.json lists every problem with its JSON path; exit 2, nothing on stdout', () => {
    const r = runLedger(['optimise', file('broken.json')]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain('2 problems; nothing computed.');
    expect(r.stderr).toContain('$.duties[0].count');
    expect(r.stderr).toContain('$.candidates[0].lwaDb');
    expect(r.stderr).toContain('"12O" is not a number');
  });

  it('ledger optimise demo.json --budget abc is refused in one line; exit 2', () => {
    const r = runLedger(['optimise', file('demo.json'), '--budget', 'abc']);
    expect(r.code).toBe(2);
    expect(r.stderr).toBe(
      'ledger optimise: --budget: "abc" is not a number (give an amount of money of 0 or more, e.g. 420)\n',
    );
  });

  it('ledger optimise demo.json --budget -5 is refused; exit 2', () => {
    const r = runLedger(['optimise', file('demo.json'), '--budget=-5']);
    expect(r.code).toBe(2);
    expect(r.stderr).toBe(
      'ledger optimise: --budget: -5 is out of range (give an amount of money of 0 or more, e.g. 420)\n',
    );
  });

  it('ledger optimise with no file says what to give; exit 2', () => {
    const r = runLedger(['optimise']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('missing project file');
  });

  it('ledger optimise missing.json says there is no such file; exit 2', () => {
    const r = runLedger(['optimise', file('missing.json')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('no such file');
  });
});

describe('ledger optimise --frontier', () => {
  it('writes every fleet no other beats on both cost and margin: costs and margins both rise row by row', () => {
    const r = runLedger(['optimise', file('demo.json'), '--frontier', file('frontier.csv')]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('Exact frontier: every fleet no other beats on both cost and worst margin');
    const rows = readFileSync(file('frontier.csv'), 'utf8').trim().split('\n');
    expect(rows[0]).toMatch(/^worst margin dB,worst-case level dB,cost GBP,duties changed,/);
    expect(r.stderr).toContain(`Wrote ${rows.length - 1} frontier fleets to`);
    const points = rows.slice(1).map((row) => row.split(',').map(Number));
    expect(points.length).toBeGreaterThan(2);
    // The definition of the frontier (no fleet beats another on both): in order of cost, margins strictly rise.
    for (let i = 1; i < points.length; i++) {
      expect(points[i]![2]).toBeGreaterThan(points[i - 1]![2]!);
      expect(points[i]![0]).toBeGreaterThan(points[i - 1]![0]!);
    }
  });

  it('a file ending neither in .csv nor .json is refused with what is accepted; exit 2', () => {
    const r = runLedger(['optimise', file('demo.json'), '--frontier', file('frontier.txt')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--frontier');
    expect(r.stderr).toContain('.csv');
  });
});
