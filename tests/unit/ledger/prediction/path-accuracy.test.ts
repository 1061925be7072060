import { describe, expect, it } from 'vitest';
import { pathAccuracyNotes, pathTable5AccuracyDb } from '../../../../src/ledger/prediction/path-accuracy.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import type { Project } from '../../../../src/ledger/model/model.ts';
import { twoDutyProject } from '../fixtures.ts';

function isoProject(): Project {
  const p = twoDutyProject();
  p.propagation = {
    method: 'iso9613-2:1996',
    temperatureC: 10,
    humidityPct: 70,
    pressureKPa: 101.325,
    groundFactor: 0.5,
    groundMethod: 'general',
    sourceHeightM: 1.5,
    c0Db: 0,
  };
  p.receivers = p.receivers.map((r) => ({ ...r, facade: false }));
  return p;
}

describe('pathAccuracyNotes (ISO 9613-2:1996 Table 5, ISO 9613-1:1993)', () => {
  it('gives nothing for the simple method', () => {
    expect(pathAccuracyNotes(twoDutyProject())).toEqual([]);
  });
  it('gives nothing when every path is short, low, unscreened and without façade, at 10 °C 70 %', () => {
    expect(pathAccuracyNotes(isoProject())).toEqual([]); // Table 5: d < 1 km, h < 30 m; h_w ≈ 0.86 % inside 0.05–5 %
  });
  it('names a path of 1 km or more (Table 5 states nothing beyond 1 km)', () => {
    const p = isoProject();
    p.duties[0]!.location = { kind: 'point', x: 1200, y: 0 };
    const notes = pathAccuracyNotes(p);
    expect(notes).toHaveLength(1);
    expect(notes[0]!.message).toMatch(
      /no accuracy for paths of 1 km or more, so no ±3 dB is quoted for this path: A → House \(1200 m\)/,
    );
  });
  it('names screened and façade paths (Table 5 excludes screening and reflection)', () => {
    const p = isoProject();
    p.receivers[0]!.screening = { u2: { kind: 'hidden' } };
    p.receivers[0]!.facade = true;
    const text = pathAccuracyNotes(p)
      .map((n) => n.message)
      .join('\n');
    expect(text).toMatch(/screened paths, so no ±3 dB is quoted for this path: B → House/);
    expect(text).toMatch(/reflection .* these 2 paths: A → House; B → House/);
  });
  it('names the first four paths of a reason and counts the rest (3 receivers × 2 duties in front of a façade)', () => {
    const p = isoProject();
    const house = p.receivers[0]!;
    p.receivers = ['House', 'Shop', 'School'].map((name, i) => ({ ...house, id: `r${i}`, name, facade: true }));
    const notes = pathAccuracyNotes(p);
    expect(notes).toHaveLength(1);
    // Duties in project order, receivers in project order: 6 paths, 4 named, "and 2 more".
    expect(notes[0]!.message).toMatch(
      /reflection .*, so no ±3 dB is quoted for these 6 paths: A → House; A → Shop; A → School; B → House; and 2 more$/,
    );
  });
  it('notes an atmosphere outside ISO 9613-1:1993’s stated range (−20 °C, 10 %: h ≈ 0.012 %)', () => {
    const p = isoProject();
    if (p.propagation.method === 'iso9613-2:1996') {
      p.propagation.temperatureC = -20;
      p.propagation.humidityPct = 10;
    }
    expect(pathAccuracyNotes(p)[0]).toMatchObject({ path: '$.propagation' }); // ISO 9613-1:1993 clause 7: 0.05 % to 5 %
  });
  it('evaluateProject carries the notes beside the matrix', () => {
    const p = isoProject();
    p.duties[1]!.location = { kind: 'point', x: 0, y: 1500 };
    expect(
      evaluateProject(p)
        .notes.map((n) => n.message)
        .join(' '),
    ).toMatch(/B → House \(1500 m\)/);
  });
});

describe('pathTable5AccuracyDb (ISO 9613-2:1996 Table 5, per path)', () => {
  it('reads Table 5 from the path: ±3 dB low, ±1 dB for a 5–30 m mean height under 100 m, none when screened', () => {
    const p = isoProject();
    const [a] = p.duties;
    const r = p.receivers[0]!;
    // A at (20, 0), h_s 1.5 m; receiver at (0, 0), 1.5 m: d = 20 m, h = 1.5 m → ±3 dB (Table 5, 0 < h < 5 m)
    expect(pathTable5AccuracyDb(p, a!, r)).toBe(3);
    // receiver at 18.5 m: h = (1.5 + 18.5)/2 = 10 m, d = √(20² + 17²) = 26.2 m → ±1 dB (Table 5, 5 m < h < 30 m, d < 100 m)
    expect(pathTable5AccuracyDb(p, a!, { ...r, heightM: 18.5 })).toBe(1);
    // the same path screened: Table 5 excludes screening → none stated
    expect(pathTable5AccuracyDb(p, a!, { ...r, heightM: 18.5, screening: { u1: { kind: 'hidden' } } })).toBeUndefined();
  });
});
