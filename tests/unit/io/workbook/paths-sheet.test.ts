/**
 * The workbook's paths sheet carries each path's plan geometry: the barrier that screens it
 * with z, d_ss, d_sr and a (ISO 9613-2:1996 eq. 16), and the barrier term under the simple
 * method in a column of its own, so the row's total still sums its terms.
 */
import { describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { exportWorkbook } from '../../../../src/io/workbook/index.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import type { Project } from '../../../../src/ledger/model/model.ts';
import { duty, receiver, twoDutyProject } from '../../ledger/fixtures.ts';

async function pathsOf(project: Project): Promise<ExcelJS.Worksheet> {
  const bytes = await exportWorkbook(project, {
    evaluation: evaluateProject(project),
    created: new Date(0),
    writer: 'memory',
  });
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(bytes as unknown as ArrayBuffer);
  return wb.getWorksheet('paths') as ExcelJS.Worksheet;
}

const cached = (c: ExcelJS.Cell): number => {
  const v = c.value as unknown;
  return typeof v === 'number' ? v : ((v as { result?: number })?.result ?? NaN);
};

describe('paths sheet and the site plan', () => {
  it('names the screening barrier with its eq. 16 geometry, and the simple method’s D_z column sums into the total', async () => {
    const p = twoDutyProject();
    p.duties = [
      duty({ id: 'u1', location: { kind: 'point', x: 0, y: 0 }, sourceHeightM: 1, baselineCandidateId: 'a1' }),
      p.duties[1]!,
    ];
    p.receivers = [receiver({ id: 'r1', x: 20, y: 0, heightM: 1, facade: false })];
    p.barriers = [
      {
        id: 'b1',
        name: 'East hoarding',
        heightM: 3,
        points: [
          { x: 10, y: -50 },
          { x: 10, y: 50 },
        ],
      },
    ];
    const ws = await pathsOf(p);
    const header = ws.getRow(5).values as unknown[];
    const colOf = (h: string) => header.findIndex((v) => String(v) === h);
    const row = ws.getRow(6);
    expect(String(row.getCell(colOf('Barrier screening the path')).value)).toBe('East hoarding');
    expect(cached(row.getCell(colOf('Path difference z (m; eq. 16)')))).toBeCloseTo(0.39608, 5); // 2·√104 − 20 — worked by hand
    expect(cached(row.getCell(colOf('d_ss source–edge (m)')))).toBeCloseTo(10.198, 3);
    expect(cached(row.getCell(colOf('−D_z barrier on the plan, 500 Hz (eq. 14; core)')))).toBeCloseTo(-11.57, 3); // worked by hand, eqs 14 and 18
    // the total is the sum of the term columns, barrier included
    const first = 4;
    const last = colOf('Working hours 10·lg(T_work/T)');
    let sum = 0;
    for (let c = first; c <= last; c++) sum += cached(row.getCell(c)) || 0;
    expect(cached(row.getCell(colOf('Total added to LWA (dB)')))).toBeCloseTo(sum, 9);
  });

  it('lists every duty–receiver path: distance, z, the barrier that screens it, and a typed screening marked as replacing it', async () => {
    const p = twoDutyProject();
    p.duties = [
      duty({ id: 'u1', location: { kind: 'point', x: 0, y: 0 }, sourceHeightM: 1, baselineCandidateId: 'a1' }),
      p.duties[1]!, // u2 at (0, 40), source height 1.5 m (the fixture's)
    ];
    p.receivers = [
      receiver({ id: 'r1', x: 20, y: 0, heightM: 1, facade: false }),
      receiver({
        id: 'r2',
        name: 'Shop',
        x: 20,
        y: 0,
        heightM: 1,
        facade: false,
        screening: { u1: { kind: 'explicit', db: 10 } },
      }),
    ];
    p.barriers = [
      {
        id: 'b1',
        name: 'East hoarding',
        heightM: 3,
        points: [
          { x: 10, y: -50 },
          { x: 10, y: 50 },
        ],
      },
    ];
    const ws = await pathsOf(p);
    const header = ws.getRow(5).values as unknown[];
    const colOf = (h: string) => header.findIndex((v) => String(v) === h);
    const rowOf = (dutyId: string, receiverId: string) => {
      for (let r = 6; r <= ws.rowCount; r++) {
        const row = ws.getRow(r);
        if (row.getCell(1).value === dutyId && row.getCell(2).value === receiverId) return row;
      }
      throw new Error(`no row for ${dutyId} → ${receiverId}`);
    };
    const barrier = (row: ExcelJS.Row) => row.getCell(colOf('Barrier screening the path')).value;
    const z = (row: ExcelJS.Row) => cached(row.getCell(colOf('Path difference z (m; eq. 16)')));
    const dz = (row: ExcelJS.Row) => cached(row.getCell(colOf('−D_z barrier on the plan, 500 Hz (eq. 14; core)')));
    const note = (row: ExcelJS.Row) => String(row.getCell(colOf('Note')).value);

    // u2 (0, 40, 1.5 m) → r1 (20, 0, 1 m), over the hoarding's top (x = 10, 3 m) where the path crosses it at y = 20.
    // Worked by hand: d = √(20² + 40² + 0.5²) = √2000.25 = 44.7242 m; d_ss = √(10² + 1.5²) = 10.1119 m,
    // d_sr = √(10² + 2²) = 10.1980 m, a = 40 m; z = √((10.1119 + 10.1980)² + 40²) − d = 44.8608 − 44.7242 = 0.1366 m;
    // K_met = exp(−√(10.1119·10.1980·44.7242/(2·0.1366))/2000) = exp(−129.93/2000) = 0.9371;
    // D_z = 10·lg(3 + (20/0.68)·0.1366·0.9371) = 10·lg 6.765 = 8.303 dB (ISO 9613-2:1996 eqs 14, 16, 18).
    const far = rowOf('u2', 'r1');
    expect(cached(far.getCell(colOf('Distance d (m)')))).toBeCloseTo(44.7242, 4);
    expect(barrier(far)).toBe('East hoarding');
    expect(z(far)).toBeCloseTo(0.1367, 3); // 0.1366 to the hand arithmetic’s four figures
    expect(cached(far.getCell(colOf('d_ss source–edge (m)')))).toBeCloseTo(10.1119, 4);
    expect(cached(far.getCell(colOf('d_sr edge–receiver (m)')))).toBeCloseTo(10.198, 3);
    expect(cached(far.getCell(colOf('a along the edge (m)')))).toBeCloseTo(40, 9);
    expect(dz(far)).toBeCloseTo(-8.3, 2);
    expect(note(far)).toContain('barrier “East hoarding” on the plan, top 3 m, path difference z = 0.137 m');

    // u1 → r2: a 10 dB reduction typed for the path replaces the barrier (never both): no barrier, no D_z, the note says so.
    const typed = rowOf('u1', 'r2');
    expect(cached(typed.getCell(colOf('Distance d (m)')))).toBe(20); // (0, 0, 1 m) to (20, 0, 1 m) — worked by hand
    expect(barrier(typed)).toBeNull();
    expect(dz(typed)).toBe(0);
    expect(cached(typed.getCell(colOf('Screening')))).toBe(-10);
    expect(note(typed)).toContain('Screening, stated reduction (typed; replaces barrier “East hoarding” on the plan)');

    // u1 → r1: computed from the plan, z = 2·√(10² + 2²) − 20 = 0.3961 m — worked by hand
    const computed = rowOf('u1', 'r1');
    expect(barrier(computed)).toBe('East hoarding');
    expect(z(computed)).toBeCloseTo(0.3961, 4);
  });
});
