/**
 * The auditable workbook export: sheets, live formulas with cached results, no project
 * quantity hidden in a formula, text that looks like a formula stays text, and the candidate
 * list comes back unchanged.
 */
import { describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import JSZip from 'jszip';
import { demoProject } from '../../../src/ledger/model/demo.ts';
import { evaluateProject } from '../../../src/ledger/prediction/evaluate.ts';
import type { Project } from '../../../src/ledger/model/model.ts';
import { exportWorkbook, SHEETS } from '../../../src/io/workbook/index.ts';
import { optimiseFleet } from '../../../src/ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../../src/ledger/optimise/load-highs.ts';
import { readCandidateTable } from '../../../src/io/workbook/read-candidates.ts';
import { complianceSentence } from '../../../src/io/workbook/compliance-sheet.ts';
import { HOSTILE, cellsOf, hostileProject, isoDemoProject, load } from './workbook/fixtures.ts';

/** Cached results are the core's numbers, written with full precision. */
const CACHE_TOLERANCE_DB = 1e-9;

async function exported(project: Project) {
  const evaluation = evaluateProject(project);
  const bytes = await exportWorkbook(project, { evaluation, created: new Date('2026-01-01T00:00:00Z') });
  return { evaluation, bytes, wb: await load(bytes) };
}

/** The level block of the levels sheet: rows after the first "Phase ID" header. */
function levelCells(wb: ExcelJS.Workbook, project: Project): ExcelJS.Cell[][] {
  const ws = wb.getWorksheet('levels') as ExcelJS.Worksheet;
  let header = 0;
  ws.eachRow((row, n) => {
    if (header === 0 && row.getCell(1).value === 'Phase ID') header = n;
  });
  const receivers = Math.max(1, project.receivers.length);
  return project.phases.map((_, i) => Array.from({ length: receivers }, (_, k) => ws.getCell(header + 1 + i, 4 + k)));
}

const formulaOf = (cell: ExcelJS.Cell): string | undefined => {
  const v = cell.value as { formula?: string; sharedFormula?: string } | null;
  return v && typeof v === 'object' ? (v.formula ?? (v.sharedFormula ? `=${v.sharedFormula}` : undefined)) : undefined;
};
/** The cached result (exceljs's `value` copy drops a result of 0, `result` does not). */
const resultOf = (cell: ExcelJS.Cell): unknown => (cell as unknown as { result: unknown }).result;

describe('exportWorkbook', () => {
  it('exportWorkbook(demo) writes the eight sheets in order', async () => {
    const { wb } = await exported(demoProject());
    expect(wb.worksheets.map((w) => w.name)).toEqual([...SHEETS]);
  });

  it.each([
    ['demo (simple method)', demoProject],
    ['demo under ISO 9613-2:1996, general method, with a barrier', isoDemoProject],
  ])('exportWorkbook(%s): every level is a formula whose cached result is the core’s level', async (_name, make) => {
    const project = make();
    const { wb, evaluation } = await exported(project);
    const cells = levelCells(wb, project);
    evaluation.matrix.forEach((m) => {
      const i = project.phases.findIndex((p) => p.id === m.phaseId);
      const k = project.receivers.findIndex((r) => r.id === m.receiverId);
      const cell = cells[i]?.[k] as ExcelJS.Cell;
      expect(formulaOf(cell)).toMatch(/SUMPRODUCT\(\(contributions!\$C\$\d+:\$C\$\d+=\$A\d+\)\*contributions!/);
      // The core's own number is the reference here: the cache must be exactly what it computed.
      expect(resultOf(cell) as number).toBeCloseTo(m.levelDb, -Math.log10(CACHE_TOLERANCE_DB));
    });
  });

  it('exportWorkbook: formulas hold no project quantity, only the constants of their shape', async () => {
    const { wb } = await exported(isoDemoProject());
    // 10 of 10·lg, 20 of 20·lg d (ISO 9613-2:1996 eq. 7), 4 of 4π, 2 of d², 8 octave bands,
    // 100 per cent, 24 hours a day, 0 and 1 as truth values, 2 as the base of the halving of
    // time at each exchange-rate step: the formulas' shape (common practice). The exposure
    // values 80/85/87 dB(A), T0 = 8 h and the 3 dB exchange rate are named cells.
    const allowed = new Set([0, 1, 2, 4, 8, 10, 20, 24, 100]);
    const found = new Set<number>();
    for (const name of ['paths', 'contributions', 'levels', 'compliance', 'checks', 'shortlist', 'assumptions']) {
      for (const cell of cellsOf(wb.getWorksheet(name) as ExcelJS.Worksheet)) {
        const f = formulaOf(cell);
        if (!f) continue;
        const stripped = f
          .replace(/"[^"]*"/g, '""')
          .replace(/\$?[A-Z]{1,3}\$?\d+/g, 'REF')
          .replace(/[A-Za-z_][A-Za-z0-9_.]*/g, 'NAME');
        for (const m of stripped.matchAll(/\d+(\.\d+)?/g)) found.add(Number(m[0]));
      }
    }
    expect([...found].filter((n) => !allowed.has(n))).toEqual([]);
  });

  it('exportWorkbook: the settings the formulas use are named cells on the assumptions sheet', async () => {
    const { wb } = await exported(isoDemoProject());
    const names = wb.definedNames.model.map((n) => n.name);
    for (const n of [
      'FacadeDb',
      'ScreenTopVisibleDb',
      'ScreenHiddenDb',
      'CharacterPenaltyDb',
      'LevelBasis',
      'AdivConstantDb',
      'TemperatureC',
      'HumidityPct',
      'AWeightingDb',
      'Currency',
      'Method',
      'ExposureReferenceH',
      'LowerActionDb',
      'UpperActionDb',
      'ExposureLimitDb',
      'TimeCriterionDb',
      'ExchangeRateDb',
    ]) {
      expect(names).toContain(n);
    }
    const facade = wb.definedNames.model.find((n) => n.name === 'FacadeDb')?.ranges[0] as string;
    expect(facade.startsWith('assumptions!')).toBe(true);
    // Façade correction +3 dB (common practice; ISO 1996-2 discusses it).
    expect(wb.getWorksheet('assumptions')?.getCell(facade.split('!')[1]!.replaceAll('$', '')).value).toBe(3);
  });

  it('exportWorkbook: every formula cell on the levels and compliance sheets carries a cached result', async () => {
    const { wb } = await exported(demoProject());
    for (const name of ['levels', 'compliance', 'contributions', 'paths', 'checks']) {
      for (const cell of cellsOf(wb.getWorksheet(name) as ExcelJS.Worksheet)) {
        if (formulaOf(cell) === undefined) continue;
        expect(resultOf(cell), `${name}!${cell.address}`).not.toBeUndefined();
      }
    }
  });

  it('exportWorkbook: the compliance sentence reads as a tender return would quote it', async () => {
    const project = demoProject();
    const { wb, evaluation } = await exported(project);
    const ws = wb.getWorksheet('compliance') as ExcelJS.Worksheet;
    const sentence = resultOf(ws.getCell('I6')) as string;
    const m = evaluation.matrix[0]!;
    const receiver = project.receivers.find((r) => r.id === m.receiverId)!.name;
    const phase = project.phases.find((p) => p.id === m.phaseId)!.name;
    // The demo's demolition phase has an impulsive breaker: a rating level, with LAeq,T and the penalty beside it.
    expect(m.levelAeqDb).toBeDefined();
    expect(sentence).toContain(
      `Predicted rating level LAr,12h at ${receiver} during ${phase} is ${m.levelDb.toFixed(1)} dB (LAeq,12h ${m.levelAeqDb!.toFixed(1)} dB + character penalty ${(m.levelDb - m.levelAeqDb!).toFixed(1)} dB)`,
    );
    expect(sentence).toMatch(/\(simple point-source method, ±3 dB\)\.$/);
    const plain = evaluation.matrix.findIndex((c) => c.levelAeqDb === undefined);
    expect(resultOf(ws.getCell(`I${6 + plain}`)) as string).toMatch(/^Predicted LAeq,12h at /);
  });

  it('complianceSentence gives the margin in words: under, over, no limit, not computed', () => {
    // Example figures of the sentence's own documentation (invented).
    const base = { hours: 12, receiver: 'Elm Row school', phase: 'Earthworks', method: 'ISO 9613-2:1996' };
    expect(complianceSentence({ ...base, level: 63.2, limit: 65 })).toBe(
      'Predicted LAeq,12h at Elm Row school during Earthworks is 63.2 dB, 1.8 dB under the 65 dB limit (ISO 9613-2:1996 method, ±3 dB).',
    );
    expect(complianceSentence({ ...base, level: 66.04, limit: 65 })).toContain('66.0 dB, 1.0 dB over the 65 dB limit');
    expect(complianceSentence({ ...base, level: 60 })).toContain('with no limit set for this period');
    expect(complianceSentence({ ...base, level: NaN, limit: 65 })).toMatch(/^Not computed/);
    expect(complianceSentence({ ...base, level: 66.04, levelAeq: 63.04, limit: 65 })).toBe(
      'Predicted rating level LAr,12h at Elm Row school during Earthworks is 66.0 dB (LAeq,12h 63.0 dB + character penalty 3.0 dB), 1.0 dB over the 65 dB limit (ISO 9613-2:1996 method, ±3 dB).',
    );
  });

  it('exportWorkbook: over-limit levels are shaded by a conditional format and marked OVER', async () => {
    const project = demoProject();
    const { wb, evaluation } = await exported(project);
    const ws = wb.getWorksheet('levels') as ExcelJS.Worksheet;
    const rules = (ws as unknown as { conditionalFormattings: { ref: string; rules: { type: string }[] }[] })
      .conditionalFormattings;
    expect(rules.length).toBeGreaterThanOrEqual(1);
    expect(rules[0]!.rules[0]!.type).toBe('expression');
    const overCount = evaluation.matrix.filter((m) => m.over).length;
    const marks = cellsOf(ws).filter((c) => resultOf(c) === 'OVER').length;
    expect(overCount).toBeGreaterThan(0); // the demo's baseline fleet is over at the terrace and school
    expect(marks).toBe(overCount);
  });

  it('exportWorkbook: frozen panes, A4 print setup fitted to width, repeated header rows', async () => {
    const { wb } = await exported(demoProject());
    for (const ws of wb.worksheets) {
      expect(ws.views[0]?.state, ws.name).toBe('frozen');
      expect(ws.pageSetup.paperSize, ws.name).toBe(9);
      expect(ws.pageSetup.fitToWidth, ws.name).toBe(1);
      expect(ws.pageSetup.printTitlesRow, ws.name).toMatch(/^\$?\d+:\$?\d+$/);
    }
  });

  it.each(['stream', 'memory'] as const)(
    'exportWorkbook (%s writer): every sheet carries the fit-to-page flag spreadsheets print by',
    async (writer) => {
      const project = demoProject();
      const bytes = await exportWorkbook(project, { evaluation: evaluateProject(project), writer });
      const zip = await JSZip.loadAsync(bytes);
      const sheets = Object.keys(zip.files).filter((f) => /^xl\/worksheets\/sheet\d+\.xml$/.test(f));
      expect(sheets).toHaveLength(SHEETS.length);
      for (const file of sheets) {
        const xml = await zip.file(file)!.async('string');
        expect(xml, file).toMatch(/<sheetPr>.*<pageSetUpPr fitToPage="1"\/>.*<\/sheetPr>/s);
        expect(xml, file).toMatch(/<pageSetup[^>]*fitToWidth="1"[^>]*fitToHeight="0"/);
      }
    },
  );

  it('exportWorkbook: text beginning with =, +, - or @ stays text, never a formula', async () => {
    const project = hostileProject();
    const { bytes, wb } = await exported(project);
    const texts = new Map<string, ExcelJS.Cell>();
    for (const ws of wb.worksheets)
      for (const cell of cellsOf(ws)) if (typeof cell.value === 'string') texts.set(cell.value, cell);
    for (const h of HOSTILE.slice(0, 4)) {
      const cell = texts.get(h);
      expect(cell, h).toBeDefined();
      expect(cell?.type).toBe(ExcelJS.ValueType.String);
    }
    // The raw XML: no <f> element holds any of the hostile strings.
    const zip = await JSZip.loadAsync(bytes);
    for (const file of Object.keys(zip.files).filter((f) => f.startsWith('xl/worksheets/') && f.endsWith('.xml'))) {
      const xml = await zip.file(file)!.async('string');
      for (const f of xml.matchAll(/<f[^>]*>([^<]*)<\/f>/g)) {
        expect(f[1]).not.toMatch(/HYPERLINK|SUM\(A1:A2\)|1\/0/);
      }
    }
    // A control character that XML cannot carry is dropped; the rest of the text is kept.
    expect(texts.has('=1/0bell')).toBe(true);
  });

  it('exportWorkbook: a receiver name like a formula reaches the compliance sentence as text', async () => {
    const project = hostileProject();
    const { wb } = await exported(project);
    const ws = wb.getWorksheet('compliance') as ExcelJS.Worksheet;
    expect(resultOf(ws.getCell('I6')) as string).toContain(`at ${HOSTILE[3]} during ${HOSTILE[1]} is`);
  });

  it.each([
    ['demo', demoProject],
    ['ISO demo', isoDemoProject],
    ['hostile text', hostileProject],
  ])('readCandidateTable(exportWorkbook(%s)) gives back every candidate unchanged', async (_name, make) => {
    const project = make();
    const { bytes } = await exported(project);
    const read = await readCandidateTable(bytes);
    expect(read.problems).toEqual([]);
    const byId = (a: { id: string }, b: { id: string }) => a.id.localeCompare(b.id);
    const expected = project.candidates
      .map((c) => ({ ...c, label: c.label.replace(/[\u0000-\u0008]/g, '') }))
      .sort(byId);
    expect(JSON.parse(JSON.stringify([...read.candidates].sort(byId)))).toEqual(JSON.parse(JSON.stringify(expected)));
  });

  it('exportWorkbook keeps text typed into a number cell (an unread cell) as typed', async () => {
    const project = demoProject();
    const c = project.candidates[0]!;
    (c as { lwaDb?: number }).lwaDb = NaN;
    project.unreadCells = { [`candidates/${c.id}/lwaDb`]: '12O' };
    const evaluation = evaluateProject(project);
    const bytes = await exportWorkbook(project, { evaluation });
    const read = await readCandidateTable(bytes);
    expect(read.unreadCells[`candidates/${c.id}/lwaDb`]).toBe('12O');
    expect(read.problems[0]?.message).toMatch(/Declared LWA \(dB\): "12O" is not a number/);
  });

  it('exportWorkbook with the optimiser’s result shows the four fleets, their costs and the saving over the hand method', async () => {
    const project = demoProject();
    const baseline = evaluateProject(project);
    const optimise = optimiseFleet(project, baseline, { tradeOff: false }, await loadHighsSolver());
    const evaluation = evaluateProject(project, optimise.best.fleet);
    const wb = await load(await exportWorkbook(project, { evaluation, optimise }));
    const ws = wb.getWorksheet('shortlist') as ExcelJS.Worksheet;
    const cells = cellsOf(ws);
    const label = cells.find((c) => c.value === 'Saving over the best-buy-first fleet');
    expect(label).toBeDefined();
    // The optimiser's own figure is the reference: the sheet must carry it unchanged.
    expect(ws.getCell(label!.row, label!.col + 1).value).toBeCloseTo(optimise.savingOverHand as number, 6);
    const headers = cells
      .filter((c) => typeof c.value === 'string' && c.value.endsWith(': machine'))
      .map((c) => c.value);
    expect(headers).toHaveLength(4);
    const total = cells.find((c) => c.value === 'Total') as ExcelJS.Cell;
    expect(ws.getCell(total.row, 5).value).toBeCloseTo(evaluation.fleetCost, 6);
    expect(ws.getCell(total.row, 7).value).toBeCloseTo(optimise.best.cost, 6);
  });

  it('exportWorkbook of a project without receivers evaluates at the reference receiver', async () => {
    const project = demoProject();
    project.receivers = [];
    const { wb, evaluation } = await exported(project);
    const cells = levelCells(wb, project);
    evaluation.matrix.forEach((m, i) => expect(resultOf(cells[i]![0]!) as number).toBeCloseTo(m.levelDb, 9));
  });
});
