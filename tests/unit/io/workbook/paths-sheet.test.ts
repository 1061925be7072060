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
    expect(String(row.getCell(colOf('Barrier cutting the line of sight')).value)).toBe('East hoarding');
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
});
