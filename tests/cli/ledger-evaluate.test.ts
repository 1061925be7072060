import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runLedger } from './run-ledger.ts';

let dir: string;
let demoFile: string;
let demoText: string;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'ledger-evaluate-'));
  demoText = runLedger(['example']).stdout;
  demoFile = join(dir, 'demo.json');
  writeFileSync(demoFile, demoText);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const write = (name: string, text: string) => {
  const file = join(dir, name);
  writeFileSync(file, text);
  return file;
};

describe('ledger example', () => {
  it('ledger example prints the demo project file as JSON', () => {
    const project = JSON.parse(demoText);
    expect(project.format).toBe('plant-noise-ledger/project');
    expect(project.duties).toHaveLength(12);
    expect(project.name).toMatch(/invented/);
  });
});

describe('ledger evaluate', () => {
  it('ledger evaluate demo.json prints the matrix with OVER in words, the rankings and the ±3 dB caution; exit 0', () => {
    const r = runLedger(['evaluate', demoFile]);
    expect(r.code).toBe(0);
    expect(r.stderr).toBe('');
    expect(r.stdout).toContain('Levels by phase and receiver, dB LAeq,T');
    expect(r.stdout).toMatch(/Demolition and breaking out\s+2 Lantern Row \(home\)\s+76\.9\s+75\.0\s+−1\.9\s+OVER the limit by 1\.9 dB/);
    expect(r.stdout).toContain('within the limit');
    expect(r.stdout).toContain('Duty "Break out the yard slab" — ranked at Saltmarsh Lane Primary School:');
    expect(r.stdout).toContain('ISO 9613-2 quotes ±3 dB');
  });

  it('ledger evaluate --json gives the matrix, the rankings and the caution', () => {
    const r = runLedger(['evaluate', demoFile, '--json']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.matrix).toHaveLength(12);
    expect(out.matrix[0]).toMatchObject({ phaseId: 'ph-demolition', receiverId: 'r-terrace', over: true, limitDb: 75 });
    expect(out.rankings).toHaveLength(12);
    expect(out.rankings[0].rows[0]).toHaveProperty('reductionDb');
    expect(typeof out.costs['slab-rig-breaker'].explanation).toBe('string');
    expect(out.caution).toMatch(/±3 dB/);
  });

  it('ledger evaluate --receiver ranks every duty at that receiver', () => {
    const r = runLedger(['evaluate', demoFile, '--receiver', 'r-office', '--json']);
    const out = JSON.parse(r.stdout);
    expect(out.rankings.every((x: { receiverId: string }) => x.receiverId === 'r-office')).toBe(true);
  });

  it('ledger evaluate --receiver with an unknown id exits 2 naming the accepted ids', () => {
    const r = runLedger(['evaluate', demoFile, '--receiver', 'r-nowhere']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--receiver: "r-nowhere" is not a receiver of this project \(use one of r-terrace, r-school, r-hospital, r-office, @reference\)/);
  });

  it('ledger evaluate on an invalid project lists every problem with its path, value and what is accepted; exit 2, nothing computed', () => {
    const project = JSON.parse(demoText);
    project.currency = 'pounds';
    project.candidates[3].lwaDb = 'loud';
    project.duties[0].onTimePct = 140;
    const r = runLedger(['evaluate', write('bad.json', JSON.stringify(project))]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain('3 problems; nothing computed.');
    expect(r.stderr).toContain('$.currency  Currency: "pounds" is not accepted (use an ISO 4217 currency code');
    expect(r.stderr).toContain('$.candidates[3].lwaDb  Candidate "Kestrune DR9e demolition robot, electric", LWA: "loud" is not a number (use a sound power level in dB');
    expect(r.stderr).toContain('$.duties[0].onTimePct  Duty "Break out the yard slab", on-time: 140 is out of range (use a percentage above 0 and up to 100');
  });

  it('ledger evaluate on broken JSON gives the line and column; exit 2', () => {
    const r = runLedger(['evaluate', write('broken.json', '{\n  "format": "plant-noise-ledger/project",\n  "version": 1\n  "name": "x"\n}')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain("$  Line 4, column 3: expected ',' or '}' after a property value");
  });

  it('ledger evaluate with a missing file or no file exits 2 with one line', () => {
    const missing = runLedger(['evaluate', join(dir, 'nope.json')]);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/no such file/);
    const none = runLedger(['evaluate']);
    expect(none.code).toBe(2);
    expect(none.stderr).toMatch(/missing project file/);
  });
});
