/**
 * `ledger confidence` and `ledger optimise --confidence`: the real commands, spawned, on the
 * demo project (from `ledger example`) and on a hand-made one-machine project.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runLedger } from './run-ledger.ts';
import { serializeProject } from '../../src/ledger/file/project-file.ts';
import { candidate, duty, receiver, twoDutyProject } from '../unit/ledger/fixtures.ts';

let dir = '';
const file = (name: string) => join(dir, name);

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'ledger-confidence-'));
  const example = runLedger(['example']);
  expect(example.code).toBe(0);
  writeFileSync(file('demo.json'), example.stdout);
  // One machine, guaranteed 100 dB with K 3.29 (σ 2 dB), exact paths: P = Φ(1.5421) = 0.93848 at a limit of 68 dB (worked by hand in tests/unit/ledger/uncertainty.test.ts).
  const p = twoDutyProject();
  writeFileSync(
    file('one.json'),
    serializeProject({
      ...p,
      receivers: [receiver({ limitsDb: { day: 68 } })],
      duties: [duty({ id: 'u1', name: 'A', baselineCandidateId: 'a1' })],
      candidates: [candidate({ id: 'a1', dutyId: 'u1', label: 'A', lwaDb: 100, uncertaintyDb: 3.29 })],
      uncertainty: { simpleMethodAccuracyDb: 0 },
    }),
  );
}, 60_000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('ledger confidence', () => {
  it('prints the probability of every limit at once, each cell’s figures, the model and the caution', () => {
    const r = runLedger(['confidence', file('demo.json')]);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/10,000 draws, seed 1/);
    expect(r.stdout).toMatch(/Every limit met at once: \d+\.\d % ± \d+\.\d %/);
    expect(r.stdout).toMatch(/90 %-sure level/);
    expect(r.stdout).toMatch(/σ = K \/ 1.645/);
    expect(r.stdout).toMatch(/competent acoustician and the local authority decide/);
  });
  it('one machine: the simulated probability is within 4 standard errors of Φ(1.5421) = 0.93848, the analytic one equal to it (worked by hand)', () => {
    const r = runLedger(['confidence', file('one.json'), '--json', '--draws', '40000', '--seed', '3']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.cells[0].analytic.probability).toBeCloseTo(0.93848, 4);
    expect(Math.abs(out.joint.probability - 0.93848)).toBeLessThan(4 * out.joint.standardError);
  });
  it('the same seed gives the same figures; --draws below 100 is refused naming the flag and the range', () => {
    const a = runLedger(['confidence', file('demo.json'), '--json', '--draws', '1000', '--seed', '9']);
    const b = runLedger(['confidence', file('demo.json'), '--json', '--draws', '1000', '--seed', '9']);
    expect(a.stdout).toBe(b.stdout);
    const bad = runLedger(['confidence', file('demo.json'), '--draws', '10']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/--draws: 10 is out of range \(give a whole number of draws from 100 to 1000000/);
  });
});

describe('ledger optimise --confidence', () => {
  it('0.9 on the demo: a fleet verified at 90 % or more, checked independently, with its extra cost over the deterministic optimum', () => {
    const r = runLedger(['optimise', file('demo.json'), '--confidence', '0.9', '--json']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.found).toBe(true);
    expect(out.verified.probability).toBeGreaterThanOrEqual(0.9);
    expect(out.check.draws).toBe(40_000);
    expect(out.check.probability).toBeGreaterThanOrEqual(0.9 - 3 * out.check.standardError);
    expect(out.extraCost).toBeCloseTo(out.cost - out.deterministic.cost, 6);
  });
  it('prints how the confidence was verified and the model', () => {
    const r = runLedger(['optimise', file('demo.json'), '--confidence', '0.9']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^Verified: every limit met at once in/m);
    expect(r.stdout).toMatch(/^Independent check:/m);
    expect(r.stdout).toMatch(/How: Each limit was tightened/);
    expect(r.stdout).toMatch(/^What more confidence costs/m);
    expect(r.stdout).toMatch(/^ +90 % +£[\d,.]+ +every limit at once/m);
  });
  it('--confidence 1.5 is refused with the range; --draws without --confidence is refused', () => {
    const a = runLedger(['optimise', file('demo.json'), '--confidence', '1.5']);
    expect(a.code).toBe(2);
    expect(a.stderr).toMatch(/--confidence: 1.5 is out of range \(give a probability from 0.01 to 0.9999/);
    const b = runLedger(['optimise', file('demo.json'), '--draws', '500']);
    expect(b.code).toBe(2);
    expect(b.stderr).toMatch(/--draws: only used with --confidence/);
  });
});
