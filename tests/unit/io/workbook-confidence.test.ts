/**
 * The workbook's confidence sheet: the probability of compliance with the model's inputs,
 * written from the ledger's seeded simulation (values checked against the ledger's own
 * figures for the same seed, and the hand-worked single-machine case).
 */
import { describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { exportWorkbook } from '../../../src/io/workbook/index.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';
import { evaluateProject } from '../../../src/ledger/prediction/evaluate.ts';
import type { Project } from '../../../src/ledger/model/model.ts';
import { candidate, duty, receiver, twoDutyProject } from '../ledger/fixtures.ts';

async function sheetOf(project: Project) {
  const bytes = await exportWorkbook(project, {
    evaluation: evaluateProject(project),
    created: new Date(0),
    writer: 'memory',
  });
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(bytes as unknown as ArrayBuffer);
  return wb.getWorksheet('confidence') as ExcelJS.Worksheet;
}

describe('confidence sheet', () => {
  it('sits between compliance and checks, states the joint probability, the caution and the model inputs', async () => {
    const ws = await sheetOf(demoProject());
    expect(ws.workbook.worksheets.map((w) => w.name)).toEqual([
      'inputs',
      'assumptions',
      'paths',
      'contributions',
      'levels',
      'shortlist',
      'compliance',
      'confidence',
      'checks',
    ]);
    expect(String(ws.getCell('A2').value)).toMatch(
      /^Every limit met at once: \d+\.\d\d % ± \d+\.\d\d % \(simulated, 10000 draws, seed 1\)/,
    );
    expect(String(ws.getCell('A2').value)).toMatch(/competent acoustician and the local authority decide/);
    const texts: string[] = [];
    ws.eachRow((row) => row.eachCell((c) => texts.push(String(c.value))));
    expect(texts).toContain('K per standard deviation (K = f·σ; from memory of ISO 4871)');
    expect(texts.some((t) => t.startsWith('Shared spreads:'))).toBe(true);
  });

  it('one machine (σ 2 dB, limit 68 dB): the analytic column holds Φ(1.5421) = 0.93848 (worked by hand in tests/unit/ledger/uncertainty.test.ts)', async () => {
    const p = twoDutyProject();
    const ws = await sheetOf({
      ...p,
      receivers: [receiver({ limitsDb: { day: 68 } })],
      duties: [duty({ id: 'u1', name: 'A', baselineCandidateId: 'a1' })],
      candidates: [candidate({ id: 'a1', dutyId: 'u1', label: 'A', lwaDb: 100, uncertaintyDb: 3.29 })],
      uncertainty: { simpleMethodAccuracyDb: 0 },
    });
    // Row 5 is the header, row 6 the one cell; column I the analytic probability.
    expect(ws.getCell('I5').value).toBe('P(meet), analytic');
    expect(ws.getCell('I6').value as number).toBeCloseTo(0.93848, 4);
    const simulated = ws.getCell('G6').value as number;
    const error = ws.getCell('H6').value as number;
    expect(Math.abs(simulated - 0.93848)).toBeLessThan(4 * error);
  });
});
