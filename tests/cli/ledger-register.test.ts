/** `ledger register import|export` and `ledger compare`: the real commands, spawned, in a temporary folder. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runLedger } from './run-ledger.ts';
import { demoRegister } from '../../src/ledger/register/demo-register.ts';
import { serializeRegister } from '../../src/ledger/register/register-file.ts';

let dir = '';
const file = (name: string) => join(dir, name);

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'ledger-register-'));
  writeFileSync(
    file('list.csv'),
    'Model,LWA dB,Price,Resale,Life days,Running per day,Category\nExcavator A,102,165000,55000,1600,95,excavator\nExcavator B,99,178000,60000,1600,92,excavator\nBreaker,12O,9000,1000,800,10,breaker\n',
  );
  writeFileSync(file('demo.json'), serializeRegister(demoRegister()));
});

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('ledger register', () => {
  it('register import list.csv -o reg.json writes the machines, keeps unread text, exit 1', () => {
    const r = runLedger(['register', 'import', file('list.csv'), '-o', file('reg.json')]);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('Wrote');
    expect(r.stdout).toContain(
      'Row 4, LWA dB: "12O" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)',
    );
    const reg = JSON.parse(readFileSync(file('reg.json'), 'utf8'));
    expect(reg.format).toBe('plant-noise-ledger/register');
    expect(reg.machines.map((m: { label: string }) => m.label)).toEqual(['Excavator A', 'Excavator B', 'Breaker']);
    expect(reg.machines[0].purchase).toEqual({
      price: 165000,
      resaleValue: 55000,
      life: 1600,
      lifeUnit: 'working-days',
    });
    expect(reg.unreadCells).toEqual({ 'machines/m3/lwaDb': '12O' });
    // importing again into the same file keeps what is there and adds
    const again = runLedger(['register', 'import', file('list.csv'), '-o', file('reg.json')]);
    expect(again.stdout).toContain('3 machines added to the 3 already there');
    expect(JSON.parse(readFileSync(file('reg.json'), 'utf8')).machines).toHaveLength(6);
  });

  it('register export → workbook → register import gives the same machines', () => {
    const out = runLedger([
      'register',
      'export',
      file('demo.json'),
      '-o',
      file('demo.xlsx'),
      '--fleet-criterion',
      '100',
    ]);
    expect(out.code).toBe(0);
    expect(out.stdout).toContain(
      '5 machines on the register sheet, 5 on the buyer’s shortlist, the fleet against 100 dB LWA',
    );
    const back = runLedger(['register', 'import', file('demo.xlsx'), '-o', file('back.json')]);
    expect(back.code).toBe(0);
    expect(JSON.parse(readFileSync(file('back.json'), 'utf8')).machines).toEqual(demoRegister().machines);
  });

  it('refuses a folder as output, a type or reference the register does not hold, saying what is accepted', () => {
    const folder = runLedger(['register', 'import', file('list.csv'), '-o', dir]);
    expect(folder.code).toBe(2);
    expect(folder.stderr).toBe(
      `ledger register: --output: ${JSON.stringify(dir)} is a folder (give a file name, e.g. register.json)\n`,
    );
    const type = runLedger(['register', 'export', file('demo.json'), '-o', file('t.xlsx'), '--type', 'crane']);
    expect(type.code).toBe(2);
    expect(type.stderr).toBe(
      'ledger register: --type: "crane" matches no machine (use one of excavator, compressor)\n',
    );
    const ref = runLedger([
      'register',
      'export',
      file('demo.json'),
      '-o',
      file('t.xlsx'),
      '--type',
      'compressor',
      '--reference',
      'm1',
    ]);
    expect(ref.stderr).toBe(
      'ledger register: --reference: "m1" is not among the machines compared (use one of m4, m5)\n',
    );
  });

  it('register with no sub-command says what is accepted, exit 2', () => {
    const r = runLedger(['register', 'list']);
    expect(r.code).toBe(2);
    expect(r.stderr).toBe('ledger register: "list": unknown (use ledger register import or ledger register export)\n');
  });
});

describe('ledger compare', () => {
  it('compares the excavators: whole-life cost, margin, footprint, marks', () => {
    const r = runLedger([
      'compare',
      file('demo.json'),
      '--type',
      'excavator',
      '--criterion',
      '65',
      '--on-time',
      '100',
      '--days-per-year',
      '200',
    ]);
    expect(r.code).toBe(0);
    // worked by hand (tests/unit/register/compare.test.ts): m1 £32,750 a year owned, 2,506 m²; m2 £33,150, 3 dB less, 7.5 dB per 1,000
    expect(r.stdout).toMatch(
      /\* m1\s+Tarnfield TX200 excavator 20 t\s+102\.0\s+0\.0\s+28\.2\s+2,506\s+£32,750\s+£45,300\s+ref/,
    );
    expect(r.stdout).toMatch(/\* m2 .*£33,150.*\s3\.0\s+7\.5\s/);
    expect(r.stdout).toMatch(/^ {2}m3 /m);
    expect(r.stdout).toContain('hemispherical spreading (Q = 2)');
  });

  it('--json gives the figures; a bad flag value exits 2 with a message', () => {
    const r = runLedger(['compare', file('demo.json'), '--type', 'compressor', '--json']);
    const out = JSON.parse(r.stdout);
    expect(out.rows.map((x: { machineId: string }) => x.machineId)).toEqual(['m4', 'm5']);
    // Directive 2000/14/EC Art. 12, compressors P > 15 kW: 95 + 2·lg 30 = 97.95 → 98 dB (worked by hand); m4 LWA 96
    expect(out.rows[0].directiveMarginDb).toBe(2);
    const bad = runLedger(['compare', file('demo.json'), '--days-per-year', 'many']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toBe(
      'ledger compare: --days-per-year: "many" is not a number (give a whole number of days from 1 to 366, e.g. 200)\n',
    );
  });

  it('without --type compares type by type: each type against its own loudest machine', () => {
    const r = runLedger(['compare', file('demo.json')]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('excavator (3):');
    expect(r.stdout).toContain('compressor (2):');
    // the compressors' reference is the louder compressor m5 (98 dB), not the loudest excavator:
    // m4 is 98 − 96 = 2 dB quieter (worked by hand from the demo's LWA) and costs less a year, so "free"
    expect(r.stdout).toMatch(/\* m4 .*\s2\.0\s+free\s/);
    expect(r.stdout).toMatch(/ {2}m5 .*\sref\s/);
    const json = JSON.parse(runLedger(['compare', file('demo.json'), '--json']).stdout);
    expect(json.byType.map((g: { type: string; referenceId: string }) => [g.type, g.referenceId])).toEqual([
      ['excavator', 'm1'],
      ['compressor', 'm5'],
    ]);
  });

  it('refuses flags out of range, an unknown reference and an unknown type, saying what is accepted', () => {
    const criterion = runLedger(['compare', file('demo.json'), '--criterion', '500']);
    expect(criterion.code).toBe(2);
    expect(criterion.stderr).toContain('--criterion: 500 is out of range');
    const days = runLedger(['compare', file('demo.json'), '--days-per-year', '200.5']);
    expect(days.stderr).toContain(
      '--days-per-year: 200.5 is not a whole number (give a whole number of days from 1 to 366, e.g. 200)',
    );
    const ref = runLedger(['compare', file('demo.json'), '--reference', 'm9']);
    expect(ref.stderr).toBe(
      'ledger compare: --reference: "m9" is not a machine of the file (use one of m1, m2, m3, m4, m5)\n',
    );
    const type = runLedger(['compare', file('demo.json'), '--type', 'crane']);
    expect(type.stderr).toBe('ledger compare: --type: "crane" matches no machine (use one of excavator, compressor)\n');
  });

  it('--machines compares any selection in one table, against the loudest of it', () => {
    const r = runLedger(['compare', file('demo.json'), '--machines', 'm2,m4', '--json']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.rows.map((x: { machineId: string }) => x.machineId)).toEqual(['m2', 'm4']);
    // demo LWA: m2 99 dB, m4 96 dB → m2 is the reference, m4 3 dB quieter (worked by hand)
    expect(out.referenceId).toBe('m2');
    expect(out.rows[1].againstReference.dbReduction).toBe(3);
    const bad = runLedger(['compare', file('demo.json'), '--machines', 'm2,m9']);
    expect(bad.stderr).toBe(
      'ledger compare: --machines: "m9" not in the file (use ids of the file separated by commas, e.g. m1,m2)\n',
    );
  });

  it('compares a project file’s candidates too', () => {
    const example = runLedger(['example']);
    writeFileSync(file('site.json'), example.stdout);
    const r = runLedger(['compare', file('site.json'), '--criterion', '70']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^Comparison of \d+ machines: criterion 70 dB/);
  });
});
