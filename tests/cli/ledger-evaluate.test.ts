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
    expect(r.stdout).toContain(
      'Levels by phase, period and receiver, dB (margin = limit − level). Where a tonal or impulsive machine works the level is the rating level LAr,T (ISO 1996-1)',
    );
    // The demo's breaker is impulsive: the demolition cells are rating levels, with LAeq,T and the penalty beside them.
    expect(r.stdout).toMatch(
      /Demolition and breaking out\s+Weekday daytime \(10 of 12 h\)\s+2 Lantern Row \(home\)\s+LAr,T\s+76\.9\s+75\.0\s+−1\.9\s+OVER the limit by 1\.9 dB {2}\[LAeq,T 74\.5 \+ penalty 2\.4\]/,
    );
    expect(r.stdout).toMatch(
      /Piling and groundworks\s+Weekday daytime \(10 of 12 h\)\s+2 Lantern Row \(home\)\s+LAeq,T\s+72\.4/,
    );
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
    expect(r.stderr).toMatch(
      /--receiver: "r-nowhere" is not a receiver of this project \(use one of r-terrace, r-school, r-hospital, r-office, @reference\)/,
    );
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
    expect(r.stderr).toContain(
      '$.candidates[3].lwaDb  Candidate "Kestrune DR9e demolition robot, electric", LWA: "loud" is not a number (use a sound power level in dB',
    );
    expect(r.stderr).toContain(
      '$.duties[0].onTimePct  Duty "Break out the yard slab", on-time: 140 is out of range (use a percentage above 0 and up to 100',
    );
  });

  it('ledger evaluate on broken JSON gives the line and column; exit 2', () => {
    const r = runLedger([
      'evaluate',
      write('broken.json', '{\n  "format": "plant-noise-ledger/project",\n  "version": 1\n  "name": "x"\n}'),
    ]);
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

describe('ledger evaluate: directive, declaration, penalty and exposure checks', () => {
  it('ledger evaluate flags over permissible, the stand-in LWA and the character penalty per candidate in the rankings', () => {
    const r = runLedger(['evaluate', demoFile]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain(
      'Sound power rated on the guaranteed value Ld = L + K (ISO 4871:1996); tonal or impulsive machines carry a character penalty of 3 dB',
    );
    // Excavator 120 kW: 80 + 11·lg 120 = 102.87 → 103 dB (Directive 2000/14/EC Art. 12 item 4, worked by hand); declared 105.
    expect(r.stdout).toMatch(/3 Valdor V21 excavator\s.*baseline, beaten on both, over permissible/);
    expect(r.stdout).toContain(
      'Valdor V21 excavator: guaranteed 105.0 dB is over the permissible 103 dB by 2.0 dB (Directive 2000/14/EC, Stage II)',
    );
    // Dumper 40 kW: P ≤ 55 kW → 101 dB (Art. 12 item 3) stands in for the missing LWA.
    expect(r.stdout).toMatch(/Hedgeby 6 t site dumper .*stand-in LWA/);
    expect(r.stdout).toContain(
      'no declared LWA: the permissible level stands in, conservatively (Directive 2000/14/EC, Stage II): 101 dB',
    );
    expect(r.stdout).toMatch(
      /Brantor HB20 breaker on 20 t excavator\s.*baseline, phase over limit, penalty \+3 dB \(impulsive\)/,
    );
  });

  it('ledger evaluate names the pairs too close to call within ±K', () => {
    const r = runLedger(['evaluate', demoFile]);
    // Crusher guaranteed 106 (K 0) and robot L 104 + K 3 = 107: 1.0 dB apart at any receiver, ≤ 3 dB (ISO 4871 K; ledger rule).
    expect(r.stdout).toContain(
      'Within ±K: Places 1–2 could change within the declared uncertainty K. Too close to call (our own rule, not ISO 4871’s: levels no further apart than the larger K): Valdor jaw crusher attachment on 20 t excavator and Kestrune DR9e demolition robot, electric.',
    );
    expect(r.stdout).toMatch(/differ by 1\.0 dB, within K 3\.0 dB: too close to call/);
  });

  it('ledger evaluate lists operator exposure with LEX,8h, the value reached, the time to 85 dB(A) and the caution', () => {
    const r = runLedger(['evaluate', demoFile]);
    expect(r.stdout).toContain(
      'Operator exposure (LEX,8h by ISO 9612:2009; Directive 2003/10/EC values 80 / 85 / 87 dB(A)',
    );
    // ISO 9612:2009: 103 + 10·lg(2/8) = 96.98 → limit value (Directive 2003/10/EC Art. 3); NIOSH 98-126: 103 dB(A) → 7.5 min.
    expect(r.stdout).toMatch(/Tansk TS350 petrol cut-off saw\s+103\.0\s+2\.0\s+97\.0\s+limit value\s+8 min a day/);
    // 84 + 10·lg(6/8) = 82.75 → lower action value; 8 h / 2^(−1/3) = 10.08 h.
    expect(r.stdout).toMatch(
      /Brantor HB20 breaker on 20 t excavator\s+84\.0\s+6\.0\s+82\.8\s+lower action value\s+10\.1 h a day/,
    );
    expect(r.stdout).toContain(
      'they do not replace a workplace noise exposure assessment. The 87 dB(A) limit value counts the hearing protection worn.',
    );
  });

  it('ledger evaluate --json gives candidateChecks, each ranking’s uncertainty and operatorExposure under their own keys', () => {
    const out = JSON.parse(runLedger(['evaluate', demoFile, '--json']).stdout);
    expect(out.levelBasis).toBe('guaranteed');
    expect(out.characterPenaltyDb).toBe(3);
    // Art. 12 item 3, P ≤ 55 kW → 101 dB; item 4, 80 + 11·lg 120 = 102.87 → 103 dB (worked by hand).
    expect(out.candidateChecks['dump-unlisted']).toMatchObject({
      standIn: true,
      ratedLwaDb: 101,
      overPermissible: false,
      permissible: { levelDb: 101, stage: 'II' },
    });
    expect(out.candidateChecks['dig-21t']).toMatchObject({
      standIn: false,
      ratedLwaDb: 105,
      overPermissible: true,
      permissible: { levelDb: 103 },
    });
    // ISO 4871: L 104 + K 3 = 107 on the guaranteed basis.
    expect(out.candidateChecks['slab-robot']).toMatchObject({ ratedLwaDb: 107, basis: 'guaranteed' });
    expect(out.candidateChecks['slab-rig-breaker'].penaltyDb).toBe(3);
    const slab = out.rankings.find((x: { dutyId: string }) => x.dutyId === 'd-slab');
    expect(slab.uncertainty.firm).toBe(false);
    expect(slab.uncertainty.closePairs[0]).toMatchObject({
      quieterId: 'slab-crusher',
      louderId: 'slab-robot',
      uncertaintyDb: 3,
    });
    expect(slab.uncertainty.places[0]).toMatchObject({ candidateId: 'slab-crusher', bestPlace: 1, worstPlace: 2 });
    const saw = out.operatorExposure.rows.find((x: { candidateId: string }) => x.candidateId === 'wall-petrol-saw');
    expect(saw).toMatchObject({ lpaDb: 103, hoursPerDay: 2, reached: 'limit value', hoursTo85: 0.125 });
    expect(Math.abs(saw.lex8hDb - 96.98)).toBeLessThan(0.01);
    expect(out.operatorExposure.caution).toMatch(/workplace noise exposure assessment/);
  });

  it('ledger evaluate on the measured basis ranks the robot (L 104) ahead of the crusher (106); by default the crusher (106 < 107) leads', () => {
    // ISO 4871:1996: the robot's pair (L 104, K 3) rates 107 as guaranteed, 104 as measured; the crusher is a guaranteed 106 without K.
    const byDefault = JSON.parse(runLedger(['evaluate', demoFile, '--json']).stdout);
    expect(byDefault.rankings[0].rows[0].candidateId).toBe('slab-crusher');
    const project = JSON.parse(demoText);
    project.settings.levelBasis = 'measured';
    const r = runLedger(['evaluate', write('measured.json', JSON.stringify(project)), '--json']);
    const measured = JSON.parse(r.stdout);
    expect(measured.levelBasis).toBe('measured');
    expect(measured.rankings[0].rows[0].candidateId).toBe('slab-robot');
    expect(measured.candidateChecks['slab-robot']).toMatchObject({ ratedLwaDb: 104, basis: 'measured' });
    expect(runLedger(['evaluate', join(dir, 'measured.json')]).stdout).toContain(
      'Sound power rated on the measured value L (ISO 4871:1996)',
    );
  });

  it('ledger evaluate says so when no candidate gives operator exposure data', () => {
    const project = JSON.parse(demoText);
    for (const c of project.candidates) delete c.operatorLpaDb;
    const r = runLedger(['evaluate', write('no-exposure.json', JSON.stringify(project))]);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('No candidate gives an operator-position LpA and hours a day.');
    expect(
      JSON.parse(runLedger(['evaluate', join(dir, 'no-exposure.json'), '--json']).stdout).operatorExposure.rows,
    ).toEqual([]);
  });
});
