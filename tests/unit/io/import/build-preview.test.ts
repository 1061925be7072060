import { describe, expect, it } from 'vitest';
import {
  applyMapSpec,
  buildPreview,
  freshIds,
  MapSpecError,
  prepareImport,
  readTable,
} from '../../../../src/io/import/index.ts';

const enc = (s: string) => new TextEncoder().encode(s);
async function table(csv: string) {
  return readTable(enc(csv), 'list.csv');
}

describe('buildPreview(table, options)', () => {
  it('buildPreview keeps flagged rows, in file order, with row numbers of the file', async () => {
    const t = await table('Quiet plant 2024\n\nModel,LWA dB,Rate per day\nA,101,50\nB,12O,60\nC,99,70\n');
    const p = buildPreview(t, { ...prepareImport(t), dutyId: 'd1' });
    expect(p.rows.map((r) => [r.rowNumber, r.flagged])).toEqual([
      [4, false],
      [5, true],
      [6, false],
    ]);
    expect(p.candidates.map((c) => c.label)).toEqual(['A', 'B', 'C']);
    expect(p.problems.map((x) => x.message)).toEqual([
      'Row 5, LWA dB: "12O" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)',
    ]);
    expect(p.candidates.every((c) => c.dutyId === 'd1')).toBe(true);
  });

  it("buildPreview gives ids that avoid the project's ids", async () => {
    const t = await table('Model,LWA\nA,100\nB,101\n');
    const p = buildPreview(t, { ...prepareImport(t), dutyId: 'd1', existingIds: ['c1', 'c3', 'x9'] });
    expect(p.candidates.map((c) => c.id)).toEqual(['c4', 'c5']);
  });

  it('buildPreview: a K column makes the declaration measured unless the LWA header says guaranteed', async () => {
    const a = await table('Model,LWA,K\nA,100,2\n');
    expect(buildPreview(a, { ...prepareImport(a), dutyId: '' }).candidates[0]).toMatchObject({
      declaration: 'measured',
      uncertaintyDb: 2,
    });
    const b = await table('Model,Guaranteed LWA,K\nA,100,2\n');
    expect(buildPreview(b, { ...prepareImport(b), dutyId: '' }).candidates[0]?.declaration).toBe('guaranteed');
  });

  it('buildPreview: week rate only stands in for the day rate, with a note', async () => {
    const t = await table('Model,LWA,Weekly rate\nA,100,350\n');
    const p = buildPreview(t, { ...prepareImport(t), dutyId: '' });
    expect(p.candidates[0]?.cost).toEqual({ kind: 'hire', dayRate: 350, weekRate: 350 });
    expect(p.problems[0]).toMatchObject({
      severity: 'note',
      message: 'Row 2: no day rate, so the week rate is charged for any shorter hire',
    });
  });

  it('buildPreview: a price makes a purchase, which needs a working life', async () => {
    const t = await table('Model,LWA,Price,Service life days\nA,100,25000,1500\nB,101,30000,\n');
    const p = buildPreview(t, { ...prepareImport(t), dutyId: '' });
    expect(p.candidates[0]?.cost).toEqual({ kind: 'purchase', price: 25000, lifeDays: 1500, resaleValue: 0 });
    expect(p.candidates[1]?.cost.kind).toBe('purchase');
    expect(p.rows[1]?.flagged).toBe(true);
  });

  it('buildPreview reads eight octave bands into bandsDb, and notes an incomplete set', async () => {
    const header = 'Model,63 Hz,125 Hz,250 Hz,500 Hz,1 kHz,2 kHz,4 kHz,8 kHz';
    const t = await table(`${header}\nA,90,92,95,97,98,96,93,88\nB,90,92,,,,,,\n`);
    const p = buildPreview(t, { ...prepareImport(t), dutyId: '' });
    expect(p.candidates[0]?.bandsDb).toEqual([90, 92, 95, 97, 98, 96, 93, 88]);
    expect(p.candidates[1]?.bandsDb).toBeUndefined();
    expect(p.problems.map((x) => x.message)).toContain(
      'Row 3: 2 of the 8 octave bands (63 Hz to 8 kHz) given, so the bands are not used',
    );
  });

  it('buildPreview keeps the eight band texts together when a band cannot be read', async () => {
    const header = 'Model,63 Hz,125 Hz,250 Hz,500 Hz,1 kHz,2 kHz,4 kHz,8 kHz';
    const t = await table(`${header}\nA,90,92,9x,97,98,96,93,88\n`);
    const p = buildPreview(t, { ...prepareImport(t), dutyId: '' });
    expect(p.unreadCells['candidates/c1/bandsDb']).toBe('90 92 9x 97 98 96 93 88');
    expect(p.problems[0]?.message).toBe(
      'Row 2, 250 Hz: "9x" is not a number (use an octave-band sound power level in dB from 0 to 170, e.g. 98)',
    );
  });

  it('buildPreview: a missing label becomes "Row n", an unmapped list says what is missing', async () => {
    const t = await table('Model,Colour\n,red\n');
    const p = buildPreview(t, { ...prepareImport(t), dutyId: '' });
    expect(p.candidates[0]?.label).toBe('Row 2');
    expect(p.notes).toEqual([
      'No column gives the sound power (LWA, watts, or LpA at a distance): the machines are imported without it, and a permissible level may stand in where one applies.',
      'No column gives a hire rate or a price: costs are left empty (not computed) until entered.',
    ]);
  });

  it('buildPreview uses the mapping given, not the suggestion', async () => {
    const t = await table('Model,Noise,Other\nA,100,7\n');
    const setup = prepareImport(t);
    const p = buildPreview(t, { ...setup, mapping: ['label', null, 'lwaDb'], dutyId: '' });
    expect(p.problems[0]?.message).toBe(
      'Row 2, Other: "7" is out of range (use a sound power level in dB from 40 to 150, e.g. 104.5; a sound power in watts belongs in a "Sound power, W" column)',
    );
  });
});

describe('applyMapSpec(spec, headers, base)', () => {
  const headers = ['Model', 'Noise dB', 'Cost'];
  it('applyMapSpec names columns by header, letter or number', () => {
    expect(applyMapSpec('noise db=lwaDb, C=dayRate', headers, [null, null, null])).toEqual([null, 'lwaDb', 'dayRate']);
    expect(applyMapSpec('1=label,3=price', headers, [null, null, null])).toEqual(['label', null, 'price']);
  });
  it('applyMapSpec moves a field from its old column and clears with none', () => {
    expect(applyMapSpec('Cost=label', headers, ['label', 'lwaDb', null])).toEqual([null, 'lwaDb', 'label']);
    expect(applyMapSpec('Noise dB=none', headers, ['label', 'lwaDb', null])).toEqual(['label', null, null]);
  });
  it('applyMapSpec refuses unknown columns and fields, __proto__ included, with a message', () => {
    expect(() => applyMapSpec('Colour=label', headers, [])).toThrow(
      new MapSpecError('--map: column "Colour" is not in the header row (columns: "Model", "Noise dB", "Cost")'),
    );
    expect(() => applyMapSpec('Model=__proto__', headers, [])).toThrow(
      /^--map: "__proto__" is not a field \(use one of label, category/,
    );
    expect(() => applyMapSpec('Model', headers, [])).toThrow(
      '--map: "Model" is not <column>=<field> (e.g. "Noise dB=lwaDb")',
    );
  });
});

describe('freshIds(existing, count)', () => {
  it('freshIds counts on from the highest used number', () => {
    expect(freshIds(['c1', 'c7', 'x'], 2)).toEqual(['c8', 'c9']);
    expect(freshIds([], 0)).toEqual([]);
  });
});
