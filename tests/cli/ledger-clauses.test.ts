/**
 * `ledger clauses`: the real command, spawned, on the hand-worked clause site of
 * tests/unit/clauses/clause-project.ts written to a temporary folder.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runLedger } from './run-ledger.ts';
import { serializeProject } from '../../src/ledger/file/project-file.ts';
import { clause, clauseProject } from '../unit/ledger/clauses/clause-project.ts';

let dir = '';
const file = (name: string) => join(dir, name);

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'ledger-clauses-'));
  const clauses = [
    clause('k1', '4.2', {
      kind: 'limit',
      periodId: 'day',
      limitDb: 70,
      metric: 'rating',
      text: 'Rating level at Mill Cottage not above 70 dB.',
    }),
    clause('k2', '5.1', { kind: 'lwa-cap', maxDb: 105 }),
    clause('k5', '9.1', { kind: 'statement', statement: 'Weekly monitoring at Mill Cottage.' }),
  ];
  writeFileSync(file('site.json'), serializeProject(clauseProject(clauses)));
  writeFileSync(file('met.json'), serializeProject(clauseProject([clauses[2]!])));
  const stored = clauseProject(clauses);
  stored.fleets = [{ name: 'Quiet breaker', choice: { brk: 'br2' }, origin: 'user' }];
  stored.assessedFleet = 'Quiet breaker';
  writeFileSync(file('stored.json'), serializeProject(stored));
  const bad = clauseProject([clause('k9', '5.9', { kind: 'lwa-cap', maxDb: 500 })]);
  writeFileSync(file('bad.json'), serializeProject(bad));
});

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('ledger clauses', () => {
  it('answers each clause for the baseline with evidence and the cheapest fix; exit 1 when one fails', () => {
    const r = runLedger(['clauses', file('site.json')]);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('Answer to the tender’s noise clauses, for the baseline fleet:');
    expect(r.stdout).toMatch(/4\.2\s+FAIL\s+limit at receivers or a boundary/);
    // 71.45 dB LAr,T worked by hand in tests/unit/clauses/answer.test.ts.
    expect(r.stdout).toContain('Worst: Works at Mill Cottage, 71.4 dB LAr,T, limit 70.0, margin −1.4 dB.');
    expect(r.stdout).toContain('To pass: Use Breaker quiet instead of Breaker loud for Breaking (+£400).');
    expect(r.stdout).toMatch(/9\.1\s+STATED/);
    expect(r.stdout).toMatch(/5\.1\s+FAIL\s+cap on each machine’s LWA/); // br1 110 dB > 105
    expect(r.stdout).toContain('0 pass, 2 fail, 1 stated, 0 not assessed.');
  });

  it('--fleet best answers for the cheapest fleet meeting every clause; exit 0', () => {
    const r = runLedger(['clauses', file('site.json'), '--fleet', 'best', '--json']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as {
      fleet: Record<string, string>;
      counts: Record<string, number>;
      answers: { status: string }[];
    };
    expect(out.fleet).toEqual({ brk: 'br2', pmp: 'pu1' }); // worked by hand: br2 104 dB ≤ 105, 66.48 dB LAr,T ≤ 70, £1,700
    expect(out.counts).toEqual({ pass: 2, fail: 0, stated: 1, incomplete: 0 });
  });

  it('a project whose clauses are all met exits 0', () => {
    expect(runLedger(['clauses', file('met.json')]).code).toBe(0);
  });

  it('an invalid clause lists the problem with its path and exits 2', () => {
    const r = runLedger(['clauses', file('bad.json')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(
      '$.clauses[0].maxDb  Clause "5.9", cap: 500 is out of range (use a level in dB from 20 to 160, e.g. 105)',
    );
  });

  it('an unknown fleet name is refused with what is accepted; exit 2', () => {
    const r = runLedger(['clauses', file('stored.json'), '--fleet', 'cheap']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(
      '--fleet: "cheap" is not a fleet of this project (use one of "baseline", "best", "Quiet breaker")',
    );
  });

  it('answers for the assessed fleet by default, and for a stored fleet named by --fleet', () => {
    const byDefault = runLedger(['clauses', file('stored.json'), '--json']);
    // Worked by hand: br2 104 dB ≤ 105 (5.1 passes); 4.2: 65.04 (62.04 + 3 impulsive) ⊕ 60.98 (57.98 + 3 tonal) = 66.48 dB LAr,T ≤ 70.
    expect(byDefault.code).toBe(0);
    const out = JSON.parse(byDefault.stdout) as { fleetName: string; fleet: Record<string, string> };
    expect(out.fleetName).toBe('Quiet breaker');
    expect(out.fleet).toEqual({ brk: 'br2', pmp: 'pu1' });
    const base = runLedger(['clauses', file('stored.json'), '--fleet', 'baseline']);
    expect(base.stdout).toContain('for the baseline fleet:');
  });
});
