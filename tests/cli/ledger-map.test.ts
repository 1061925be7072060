import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runLedger } from './run-ledger.ts';
import { twoDutyProject, receiver } from '../unit/ledger/fixtures.ts';
import { serializeProject } from '../../src/ledger/file/project-file.ts';
import { evaluateProject } from '../../src/ledger/prediction/evaluate.ts';

let dir: string;
let file: string;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'ledger-map-'));
  const p = twoDutyProject();
  p.barriers = [
    {
      id: 'b1',
      name: 'Site hoarding',
      heightM: 3,
      points: [
        { x: 10, y: -30 },
        { x: 10, y: 30 },
      ],
    },
  ];
  file = join(dir, 'site.json');
  writeFileSync(file, serializeProject(p));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('ledger map', () => {
  it('writes the grid of levels as CSV; a point’s level is the matrix level of a receiver there', () => {
    const out = join(dir, 'map.csv');
    const r = runLedger(['map', file, '--phase', 'ph1', '--spacing', '10', '--height', '1.5', '-o', out]);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/^Wrote .*map\.csv: Works, baseline fleet, \d+ × \d+ points every 10 m at 1\.5 m/);
    const lines = readFileSync(out, 'utf8').trim().split('\n');
    expect(lines[0]).toBe('x,y,level');
    const [x, y, level] = lines[5]!.split(',').map(Number) as [number, number, number];
    const p = twoDutyProject();
    p.barriers = [
      {
        id: 'b1',
        name: 'Site hoarding',
        heightM: 3,
        points: [
          { x: 10, y: -30 },
          { x: 10, y: 30 },
        ],
      },
    ];
    p.receivers = [receiver({ id: 'r1', x, y, heightM: 1.5, facade: false })];
    expect(level).toBeCloseTo(evaluateProject(p).matrix[0]!.levelDb, 2); // written to 2 decimals
  });

  it('writes the plan with its bands, the limit line and the barrier as SVG', () => {
    const out = join(dir, 'map.svg');
    const r = runLedger(['map', file, '--phase', 'ph1', '--limit-of', 'r1', '-o', out]);
    expect(r.code).toBe(0);
    const svg = readFileSync(out, 'utf8');
    expect(svg).toMatch(/^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg"/);
    expect(svg).toContain('Site hoarding · 3 m');
    expect(svg).toContain('Limit of House: 70 dB at the façade, drawn at 67 dB free field');
    expect((svg.match(/<path /g) ?? []).length).toBeGreaterThan(3);
  });

  it('refuses a phase that does not exist, an output that is neither SVG nor CSV, and a receiver that does not exist, naming each', () => {
    let r = runLedger(['map', file, '--phase', 'nope', '-o', join(dir, 'x.svg')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--phase: "nope" is not a phase of this project (use one of "ph1")');
    r = runLedger(['map', file, '--phase', 'ph1', '-o', join(dir, 'x.png')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('does not end in .svg or .csv');
    r = runLedger(['map', file, '--phase', 'ph1', '--limit-of', 'zz', '-o', join(dir, 'x.svg')]);
    expect(r.stderr).toContain('--limit-of: "zz" is not a receiver of this project');
  });
});
