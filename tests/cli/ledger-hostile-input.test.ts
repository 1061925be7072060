/**
 * The command line under hostile input: every reproduction of issue "Nothing lost", section
 * "Command line", run through the real `ledger` command.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { runLedger } from './run-ledger.ts';
import { demoProject } from '../../src/ledger/model/demo.ts';
import { serializeProject } from '../../src/ledger/file/project-file.ts';

const dir = mkdtempSync(join(tmpdir(), 'ledger-hostile-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const file = (name: string, text: string) => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};

describe('numeric flags: the project file’s ranges, decimal numbers only, once each', () => {
  it.each([
    [
      ['level', '--lw', '1e308', '--distance', '10'],
      /--lw: 1e308 is out of range \(give a sound power level in dB from 40 to 150/,
    ],
    [['power', '--watts', '1e308'], /--watts: 1e308 is out of range/],
    [
      ['exposure', '--level', '1e308', '--hours', '2'],
      /--level: 1e308 is out of range \(give an operator-position level LpA in dB from 40 to 140/,
    ],
    [
      ['level', '--lw', '100', '--distance', '10', '--count', '1e300'],
      /--count: 1e300 is out of range \(give a whole number of units from 1 to 1000\)/,
    ],
    [['level', '--lw', '100', '--distance', '10', '--count', '2.5'], /--count: 2.5 is not a whole number/],
    [['level', '--lw', '100', '--distance', '0x10'], /--distance: "0x10" is not a number/],
    [['level', '--lw', 'Infinity', '--distance', '10'], /--lw: "Infinity" is not a number/],
    [['level', '--lw', '100', '--lw', '90', '--distance', '10'], /--lw: given more than once \(give it once\)/],
    [['level', '--lw', '100', '--distance=10', '--distance', '20'], /--distance: given more than once/],
    [['optimise', 'p.json', '--time-limit', '0'], /--time-limit: 0 is out of range \(give a number of seconds above 0/],
  ])('ledger %j exits 2 naming the flag', (args, message) => {
    const r = runLedger(args);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(message);
    expect(r.stdout).toBe('');
  });

  it('a distance of 1e-300 m is refused naming --distance, not "Infinity is not a finite number" (4πr² underflows to 0; worked by hand)', () => {
    const level = runLedger(['level', '--lw', '100', '--distance', '1e-300']);
    expect(level.code).toBe(2);
    expect(level.stderr).toMatch(/^ledger level: --distance: 1e-300 gives a result that is not a finite number/);
    const back = runLedger(['back', '--lp', '80', '--distance', '1e-300']);
    expect(back.code).toBe(2);
    expect(back.stderr).toMatch(/--distance: 1e-300/);
  });

  it('values inside the ranges still work: --lw 100 --distance 10 gives 72.0 dB(A) (100 + 10·lg(2/(4π·100)) = 72.0, worked by hand)', () => {
    const r = runLedger(['level', '--lw', '100', '--distance', '10']);
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^72\.0 dB\(A\)/);
  });
});

describe('project files', () => {
  it('a UTF-8 file with a byte-order mark is read (the app reads it too)', () => {
    const path = file('bom.json', `\uFEFF${serializeProject(demoProject())}`);
    const r = runLedger(['evaluate', path, '--json']);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout).project).toBe(demoProject().name);
  });

  it('ids such as "toString" and "constructor" are the project’s own, never inherited properties', () => {
    const demo = demoProject();
    let text = serializeProject(demo);
    const rename = (from: string, to: string) => (text = text.split(JSON.stringify(from)).join(JSON.stringify(to)));
    rename(demo.duties[0]!.id, 'toString');
    rename(demo.receivers[0]!.id, 'constructor');
    rename(demo.candidates[0]!.id, 'valueOf');
    rename(demo.periods[0]!.id, 'hasOwnProperty');
    const path = file('proto.json', text);
    const renamed = runLedger(['evaluate', path, '--json']);
    const plain = runLedger(['evaluate', file('plain.json', serializeProject(demo)), '--json']);
    expect(renamed.stderr).toBe('');
    expect(renamed.stdout).not.toMatch(/native code/);
    expect(renamed.code).toBe(0);
    // The same project under other ids gives the same levels.
    const levels = (out: string) => (JSON.parse(out).matrix as { levelDb: number }[]).map((m) => m.levelDb);
    expect(levels(renamed.stdout)).toEqual(levels(plain.stdout));
  });

  it('the id "__proto__" is refused with the path and what is accepted', () => {
    const demo = demoProject();
    const text = serializeProject(demo).split(JSON.stringify(demo.receivers[0]!.id)).join('"__proto__"');
    const r = runLedger(['evaluate', file('protoid.json', text)]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/\$\.receivers\[0\]\.id .*"__proto__" is a name the program keeps for itself/);
  });
});

describe('supplier lists', () => {
  it('a CSV whose quote is never closed is a problem with a non-zero exit, not one long label', () => {
    const path = file('unclosed.csv', 'label,LWA,day rate\nPump,"101.5\nBreaker,104,30\nRoller,99,40\n');
    const r = runLedger(['import', path]);
    expect(r.code).toBe(1);
    expect(r.stdout).toMatch(/Row 2: a quoted cell is not closed, so every line after it was read into this row/);
  });

  it('`import project.json` is refused saying the file is a project file', () => {
    const path = file('project.json', serializeProject(demoProject()));
    const r = runLedger(['import', path]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/"project\.json" is a project file of this program \(JSON\), not a supplier list/);
    expect(r.stdout).not.toMatch(/Candidates read/);
  });

  it('other JSON text is refused as JSON', () => {
    const r = runLedger(['import', file('list.csv', '[{"label": "Pump"}]\n')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/looks like JSON text, not a supplier list/);
  });
});

describe('terminal output and the workbook', () => {
  const demo = demoProject();
  const hostile = structuredClone(demo);
  hostile.candidates[0]!.label = 'Pump\u001b[2J\u0007';
  hostile.candidates[1]!.label = 'Half \uD800 pair';
  hostile.receivers[0]!.name = 'Row\r overwritten';
  const path = file('controls.json', JSON.stringify(hostile));

  it('control characters in labels are printed escaped, never raw', () => {
    const r = runLedger(['evaluate', path]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('Pump\\u001b[2J\\u0007');
    expect(r.stdout).toContain('Row\\u000d overwritten');
    expect(r.stdout).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f]/);
  });

  it('the JSON output stays JSON and keeps the label as typed', () => {
    const r = runLedger(['evaluate', path, '--json']);
    const out = JSON.parse(r.stdout);
    expect(out.rankings.flatMap((x: { rows: { candidateId: string }[] }) => x.rows).length).toBeGreaterThan(0);
    expect(r.stdout).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f]/);
  });

  it('the workbook export warns, naming each text it changes; --time-limit is accepted', () => {
    const out = join(dir, 'controls.xlsx');
    const r = runLedger(['export', path, '-o', out, '--time-limit', '20']);
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/warning: 2 texts could not be written as typed/);
    expect(r.stderr).toContain(`candidates[${demo.candidates[0]!.id}].label: 2 control characters removed`);
    expect(r.stderr).toContain(`candidates[${demo.candidates[1]!.id}].label: 1 broken character`);
    expect(readFileSync(out).subarray(0, 2).toString()).toBe('PK');
  });
});

describe('a reader that closes early', () => {
  it('`ledger import list.csv | head -c 10` exits quietly with 0, without a stack trace (EPIPE)', () => {
    // 5,000 rows print about 400 kB, far more than a pipe's buffer.
    const rows = Array.from({ length: 5000 }, (_, i) => `Machine ${i},${90 + (i % 20)},${100 + i}`);
    const path = file('long.csv', `label,LWA,day rate\n${rows.join('\n')}\n`);
    const bin = fileURLToPath(new URL('../../src/cli/bin.mjs', import.meta.url));
    const r = spawnSync(
      '/bin/bash',
      [
        '-c',
        `"${process.execPath}" "${bin}" import "${path}" | head -c 10 >/dev/null; echo "status=\${PIPESTATUS[0]}"`,
      ],
      { encoding: 'utf8', timeout: 60_000 },
    );
    expect(r.stderr).toBe('');
    expect(r.stdout).toContain('status=0');
  }, 60_000);
});
