/** `ledger import`: the real command, spawned, with lists written to a temporary folder. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { runLedger } from './run-ledger.ts';

let dir = '';
const file = (name: string) => join(dir, name);

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'ledger-import-'));
  writeFileSync(
    file('list.csv'),
    'Quiet plant list\n\nModel,LWA dB,Rate £/day,Notes\nExcavator 14 t,99,310,\nBreaker,12O,85,loud\n',
  );
  writeFileSync(file('semi.csv'), '\ufeffModel;LWA dB(A);Miete € / day\nBagger;104,5;1.250,50\n');
  writeFileSync(file('empty.csv'), '');
  const secret = Buffer.alloc(2048);
  Buffer.from([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1]).copy(secret);
  writeFileSync(file('secret.xlsx'), secret);
  const wb = new ExcelJS.Workbook();
  const ws = wb.addWorksheet('Plant');
  ws.addRow(['Machine', 'Sound power (W)', 'Weekly rate']);
  ws.addRow(['Generator 20 kVA', 0.1, 400]);
  writeFileSync(file('list.xlsx'), Buffer.from(await wb.xlsx.writeBuffer()));
});

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('ledger import', () => {
  it('ledger import list.csv prints the mapping, the candidates and every problem; exit 1 for unread cells', () => {
    const r = runLedger(['import', file('list.csv'), '--duty', 'd1']);
    expect(r.code).toBe(1);
    expect(r.stdout).toContain('Read "list.csv": header in row 3, delimiter ",", decimal point.');
    expect(r.stdout).toMatch(/B\s+LWA dB\s+→ lwaDb/);
    expect(r.stdout).toMatch(/D\s+Notes\s+→ not imported/);
    expect(r.stdout).toMatch(/4\s+c1\s+Excavator 14 t\s+99\.0\s+declared\s+hire 310\.00\/day/);
    expect(r.stdout).toMatch(/! 5\s+c2\s+Breaker\s+unread/);
    expect(r.stdout).toContain(
      'Row 5, LWA dB: "12O" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)',
    );
  });

  it('ledger import semi.csv reads semicolons, a byte-order mark and decimal commas; exit 0', () => {
    const r = runLedger(['import', file('semi.csv'), '--json']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.decimalSeparator).toBe(',');
    expect(out.mapping.map((m: { field: string }) => m.field)).toEqual(['label', 'lwaDb', 'dayRate']);
    expect(out.candidates[0]).toMatchObject({ label: 'Bagger', lwaDb: 104.5, cost: { kind: 'hire', dayRate: 1250.5 } });
    expect(out.problems).toEqual([]);
  });

  it('ledger import list.xlsx converts watts and marks the conversion', () => {
    const r = runLedger(['import', file('list.xlsx'), '--json']);
    expect(r.code).toBe(0);
    const c = JSON.parse(r.stdout).candidates[0];
    expect(c.lwaDb).toBeCloseTo(110, 6); // 0.1 W → 10·lg(0.1 / 1e-12) = 110 dB (worked by hand)
    expect(c.lwaOrigin).toBe('from-watts');
  });

  it('ledger import --map changes the mapping; --json lists unread cells', () => {
    const r = runLedger(['import', file('list.csv'), '--map', 'Notes=category,B=none', '--json']);
    const out = JSON.parse(r.stdout);
    expect(out.mapping.map((m: { field: string | null }) => m.field)).toEqual(['label', null, 'dayRate', 'category']);
    expect(out.candidates[1].category).toBe('loud');
    expect(r.code).toBe(0);
  });

  it.each([
    [['import', 'nowhere.csv'], 'ledger import: "nowhere.csv": no such file (give a .xlsx, .csv or .tsv file name)\n'],
    [['import'], 'ledger import: missing the supplier list (give a .xlsx, .csv or .tsv file name)\n'],
    [['import', 'x.csv', '--decimal', ';'], 'ledger import: --decimal: ";" is not accepted (give . or ,)\n'],
  ])('ledger %j is a usage error, exit 2', (args, message) => {
    const r = runLedger(args);
    expect(r.code).toBe(2);
    expect(r.stderr).toBe(message);
  });

  it('ledger import --map with an unknown field is a usage error, exit 2', () => {
    const r = runLedger(['import', file('list.csv'), '--map', 'Notes=colour']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^ledger import: --map: "colour" is not a field \(use one of label, category, /);
  });

  it('ledger import of refused files exits 2 with the reason and nothing imported', () => {
    const empty = runLedger(['import', file('empty.csv')]);
    expect(empty.code).toBe(2);
    expect(empty.stderr).toBe(
      'ledger import: "empty.csv" is empty; a header row and one row per machine are expected\nNothing was imported.\n',
    );
    const secret = runLedger(['import', file('secret.xlsx')]);
    expect(secret.code).toBe(2);
    expect(secret.stderr).toContain('"secret.xlsx" is password-protected (encrypted) or an old-style .xls workbook');
    expect(secret.stdout).toBe('');
  });
});
