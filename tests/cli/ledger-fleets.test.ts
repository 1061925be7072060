/**
 * Fleets on the command line: `optimise --save` stores the fleet found in the project and
 * makes it the assessed one; `evaluate` then reports that fleet (and `--fleet` picks
 * another); `export --fleet <name>` writes a workbook for a stored fleet; an unknown name
 * is refused with the names the project has. Runs the real command on the demo project.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import JSZip from 'jszip';
import { runLedger } from './run-ledger.ts';
import { PROJECT_VERSION } from '../../src/ledger/model/model.ts';

let dir = '';
const file = (name: string) => join(dir, name);

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'ledger-fleets-'));
  const example = runLedger(['example']);
  expect(example.code).toBe(0);
  writeFileSync(file('demo.json'), example.stdout);
}, 60_000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('fleets on the command line', () => {
  it('ledger optimise demo.json --save saved.json stores the fleet found, assessed, in a current-version file', () => {
    const r = runLedger(['optimise', file('demo.json'), '--save', file('saved.json')]);
    expect(r.code).toBe(0);
    expect(r.stderr).toContain('Saved');
    const saved = JSON.parse(readFileSync(file('saved.json'), 'utf8'));
    expect(saved.version).toBe(PROJECT_VERSION);
    expect(saved.assessedFleet).toBe('Cheapest compliant (optimiser)');
    expect(saved.fleets[0]).toMatchObject({ name: 'Cheapest compliant (optimiser)', origin: 'optimiser' });
    expect(Object.keys(saved.fleets[0].choice).length).toBe(saved.duties.length);
  }, 120_000);

  it('ledger evaluate saved.json reports the assessed fleet and its compliance statement; --fleet baseline the baseline', () => {
    const assessed = runLedger(['evaluate', file('saved.json')]);
    expect(assessed.code).toBe(0);
    expect(assessed.stdout).toContain('Fleet assessed: fleet “Cheapest compliant (optimiser)”');
    // the optimiser's fleet meets every limit (that is what it was solved for)
    expect(assessed.stdout).toMatch(
      /With fleet “Cheapest compliant \(optimiser\)”, every one of the \d+ assessed phase and receiver pairs is predicted at or under its limit/,
    );
    const baseline = runLedger(['evaluate', file('saved.json'), '--fleet', 'baseline']);
    expect(baseline.stdout).toContain('Fleet assessed: the baseline fleet');
    // the demo's baseline is over its limits somewhere (invented demo data built that way)
    expect(baseline.stdout).toMatch(
      /With the baseline fleet, \d+ of the \d+ assessed phase and receiver pairs (is|are) predicted over the limit/,
    );
  }, 120_000);

  it('an edit after saving marks the stored optimiser fleet out of date', () => {
    const saved = JSON.parse(readFileSync(file('saved.json'), 'utf8'));
    saved.duties[0].onTimePct = 90;
    writeFileSync(file('edited.json'), JSON.stringify(saved));
    const r = runLedger(['evaluate', file('edited.json')]);
    expect(r.stdout).toContain('out of date; run ledger optimise --save again');
  }, 60_000);

  it('ledger export --fleet <stored name> writes a workbook whose compliance sheet names that fleet', async () => {
    const r = runLedger([
      'export',
      file('saved.json'),
      '-o',
      file('saved.xlsx'),
      '--fleet',
      'cheapest compliant (optimiser)',
      '--skip-optimiser',
    ]);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('with fleet “Cheapest compliant (optimiser)”');
    expect(existsSync(file('saved.xlsx'))).toBe(true);
    const zip = await JSZip.loadAsync(readFileSync(file('saved.xlsx')));
    const strings = (await zip.file('xl/sharedStrings.xml')?.async('string')) ?? '';
    const sheets = await Promise.all(
      Object.keys(zip.files)
        .filter((n) => n.startsWith('xl/worksheets/'))
        .map((n) => zip.file(n)!.async('string')),
    );
    expect(strings + sheets.join('')).toContain('Compliance statement for fleet “Cheapest compliant (optimiser)”');
  }, 120_000);

  it('an unknown fleet name is refused with the names the project has; exit 2', () => {
    const r = runLedger(['evaluate', file('saved.json'), '--fleet', 'quietest']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(
      '--fleet: "quietest" is not a fleet of this project (use one of "baseline", "best", "Cheapest compliant (optimiser)")',
    );
  }, 60_000);
});
