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

  it('a CSV grid point’s level equals `ledger evaluate` at a receiver placed there (no façade), at several points', () => {
    const out = join(dir, 'grid.csv');
    expect(runLedger(['map', file, '--phase', 'ph1', '--spacing', '7', '--height', '2', '-o', out]).code).toBe(0);
    const rows = readFileSync(out, 'utf8').trim().split('\n').slice(1);
    // x, y, level rows, levels in dB to 2 decimals (empty only where not computed)
    for (const line of rows) expect(line).toMatch(/^-?[\d.]+,-?[\d.]+,(-?\d+\.\d\d)?$/);
    // points behind the hoarding (x > 10), in front of it, and one far off
    for (const k of [3, Math.floor(rows.length / 2), rows.length - 4]) {
      const [x, y, level] = rows[k]!.split(',').map(Number) as [number, number, number];
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
      p.receivers = [receiver({ id: 'here', x, y, heightM: 2, facade: false })];
      const placed = join(dir, `placed-${k}.json`);
      writeFileSync(placed, serializeProject(p));
      const ev = runLedger(['evaluate', placed, '--json']);
      expect(ev.code).toBe(0);
      const cell = (
        JSON.parse(ev.stdout) as { matrix: { receiverId: string; ownPeriod: boolean; levelDb: number }[] }
      ).matrix.find((c) => c.receiverId === 'here' && c.ownPeriod);
      expect(level).toBeCloseTo(cell!.levelDb, 2); // the CSV writes 2 decimals
    }
  });

  it('names each bad argument, where it is and what is accepted, and exits 2', () => {
    const svg = join(dir, 'bad.svg');
    const projectAsSvg = join(dir, 'project.svg'); // a project file whose name ends in .svg, given as the output too
    writeFileSync(projectAsSvg, readFileSync(file, 'utf8'));
    const cases: [string[], string][] = [
      [['map', '--phase', 'ph1', '-o', svg], 'missing project file'],
      [['map', file, '-o', svg], '--phase: missing (give a phase id: "ph1")'],
      [['map', file, '--phase', 'ph1'], '--output: missing (give the file to write, e.g. -o map.svg or -o map.csv)'],
      [['map', file, '--phase', 'ph1', '--spacing', '0', '-o', svg], 'a grid spacing in metres above 0, e.g. 2'],
      [['map', file, '--phase', 'ph1', '--spacing', 'wide', '-o', svg], 'a grid spacing in metres above 0, e.g. 2'],
      [['map', file, '--phase', 'ph1', '--step', '50', '-o', svg], 'an isoline step in dB from 0.5 to 20, e.g. 5'],
      [
        ['map', file, '--phase', 'ph1', '--height', '-1', '-o', svg],
        '--height: -1 is out of range (give a height in metres from 0 to 300',
      ],
      [
        ['map', file, '--phase', 'ph1', '--spacing', '0.1', '-o', svg],
        'points over the plan (give a wider spacing: at most 250000 points)',
      ],
      [
        ['map', file, '--phase', 'ph1', '--fleet', 'nope', '-o', svg],
        '--fleet: "nope" is not a fleet of this project (use one of "baseline"',
      ],
      [['map', projectAsSvg, '--phase', 'ph1', '-o', projectAsSvg], 'is the project file itself (give another name)'],
      [['map', join(dir, 'missing.json'), '--phase', 'ph1', '-o', svg], 'missing.json'],
    ];
    for (const [args, message] of cases) {
      const r = runLedger(args);
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.stderr, args.join(' ')).toContain(message);
    }
    // the project file was not touched by the refusal to overwrite it
    expect(readFileSync(projectAsSvg, 'utf8')).toBe(readFileSync(file, 'utf8'));
  });
});
