/**
 * The directive, uncertainty, exposure and penalty content of the exported workbook: the
 * checks sheet (Directive 2000/14/EC permissible levels, operator exposure), the stand-in
 * marker on every sheet where a stand-in level appears, the too-close-to-call notes of the
 * shortlist, and the two writers (streaming and in-memory) giving the same workbook.
 */
import { describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { demoProject } from '../../../src/ledger/model/demo.ts';
import { evaluateProject } from '../../../src/ledger/prediction/evaluate.ts';
import type { Project } from '../../../src/ledger/model/model.ts';
import { exportWorkbook } from '../../../src/io/workbook/index.ts';
import { LEX_HEADER, OVER_PERMISSIBLE, WITHIN_PERMISSIBLE } from '../../../src/io/workbook/checks-sheet.ts';
import { STAND_IN_MARK } from '../../../src/io/workbook/candidate-notes.ts';
import { cellsOf, isoDemoProject, load } from './workbook/fixtures.ts';
import { twoDutyProject } from '../ledger/fixtures.ts';

/** Cached results and recalculated values compared with figures worked by hand, dB. */
const TOLERANCE_DB = 0.01;

async function exported(project: Project, writer?: 'stream' | 'memory') {
  const evaluation = evaluateProject(project);
  const bytes = await exportWorkbook(project, {
    evaluation,
    created: new Date('2026-01-01T00:00:00Z'),
    ...(writer ? { writer } : {}),
  });
  return { evaluation, wb: await load(bytes) };
}

const resultOf = (cell: ExcelJS.Cell): unknown => (cell as unknown as { result: unknown }).result;
const formulaOf = (cell: ExcelJS.Cell): string | undefined =>
  cell.type === ExcelJS.ValueType.Formula ? cell.formula : undefined;

/** The data rows of the table whose header row holds `header`, as a map from candidate ID to its row's cells by header. */
function table(ws: ExcelJS.Worksheet, header: string): Map<string, Map<string, ExcelJS.Cell>> {
  let headerRow = 0;
  ws.eachRow((row, n) => {
    if (headerRow === 0)
      row.eachCell((cell) => {
        if (cell.value === header) headerRow = n;
      });
  });
  expect(headerRow, `a header "${header}" on ${ws.name}`).toBeGreaterThan(0);
  const headers = new Map<number, string>();
  ws.getRow(headerRow).eachCell((cell, c) => headers.set(c, String(cell.value)));
  const out = new Map<string, Map<string, ExcelJS.Cell>>();
  for (let r = headerRow + 1; r <= ws.rowCount; r++) {
    const id = ws.getCell(r, 1).value;
    if (typeof id !== 'string' || id === '') break;
    const cells = new Map<string, ExcelJS.Cell>();
    for (const [c, h] of headers) cells.set(h, ws.getCell(r, c));
    out.set(id, cells);
  }
  return out;
}

describe('exportWorkbook: the checks sheet', () => {
  it.each([
    // Directive 2000/14/EC Art. 12 as amended by 2005/88/EC, item 4 (excavators, P > 15 kW):
    // Stage II 80 + 11·lg P; 80 + 11·lg 120 = 102.87, rounded to 103. Declared 105 → 2 dB over.
    ['dig-21t', 103, 105, OVER_PERMISSIBLE],
    // Same row, P = 70 kW: 80 + 11·lg 70 = 100.30 → 100. Declared 95 → within.
    ['dig-13t-electric', 100, 95, WITHIN_PERMISSIBLE],
    // Item 3 (wheeled loaders, P > 55 kW): 82 + 11·lg P; 82 + 11·lg 100 = 104. Declared 104 → within (not above).
    ['load-wheeled', 104, 104, WITHIN_PERMISSIBLE],
  ])('%s: permissible %d dB, declared guaranteed %d dB, "%s"', async (id, permissible, guaranteed, status) => {
    const { wb } = await exported(demoProject());
    const row = table(wb.getWorksheet('checks') as ExcelJS.Worksheet, 'Permissible LWA (dB; core)').get(id);
    expect(row, id).toBeDefined();
    expect(row!.get('Permissible LWA (dB; core)')!.value).toBe(permissible);
    expect(row!.get('Stage whose figures apply')!.value).toBe('II');
    const declared = row!.get('Declared guaranteed level Ld = L + K (dB; ISO 4871:1996)')!;
    expect(formulaOf(declared)).toMatch(/^IF\(ISNUMBER\(inputs!\$[A-Z]+\$\d+\),IF\(inputs!\$[A-Z]+\$\d+="measured"/);
    expect(resultOf(declared) as number).toBeCloseTo(guaranteed, 9);
    expect(resultOf(row!.get('Margin = permissible − Ld (dB)')!) as number).toBeCloseTo(permissible - guaranteed, 9);
    expect(resultOf(row!.get('Over or within')!)).toBe(status);
  });

  it('a measured pair is checked on L + K: L 84 + K 2 = 86 dB against 93 dB (excavator, P ≤ 15 kW)', async () => {
    // Directive 2000/14/EC Art. 12 as amended, item 4, P ≤ 15 kW: 93 dB (Stage II).
    // ISO 4871:1996: the declared single-number value is L + K.
    const { wb } = await exported(demoProject());
    const row = table(wb.getWorksheet('checks') as ExcelJS.Worksheet, 'Permissible LWA (dB; core)').get(
      'drain-mini-electric',
    )!;
    expect(row.get('Permissible LWA (dB; core)')!.value).toBe(93);
    expect(resultOf(row.get('Declared guaranteed level Ld = L + K (dB; ISO 4871:1996)')!) as number).toBeCloseTo(86, 9);
  });

  it('the stand-in candidate is marked STAND-IN on the checks sheet and shaded by a conditional format', async () => {
    const { wb } = await exported(demoProject());
    const ws = wb.getWorksheet('checks') as ExcelJS.Worksheet;
    const row = table(ws, 'Permissible LWA (dB; core)').get('dump-unlisted')!;
    // Item 3 (dumpers, P ≤ 55 kW): 101 dB (Directive 2000/14/EC Art. 12 as amended by 2005/88/EC).
    expect(row.get('Permissible LWA (dB; core)')!.value).toBe(101);
    expect(resultOf(row.get('Over or within')!)).toBe(STAND_IN_MARK);
    const rules = (
      ws as unknown as { conditionalFormattings: { rules: { formulae?: string[] }[] }[] }
    ).conditionalFormattings.flatMap((c) => c.rules);
    expect(rules.some((r) => r.formulae?.[0]?.includes(STAND_IN_MARK))).toBe(true);
    expect(rules.some((r) => r.formulae?.[0]?.includes(OVER_PERMISSIBLE))).toBe(true);
  });

  it.each([
    // ISO 9612:2009: L_EX,8h = LpA + 10·lg(T/8 h); 103 + 10·lg(2/8) = 96.98 dB(A), over the
    // 87 dB(A) limit value of Directive 2003/10/EC Art. 3. NIOSH 98-126 (85 dB(A), 3 dB exchange):
    // 8 h / 2^((103 − 85)/3) = 8/64 = 0.125 h.
    ['wall-petrol-saw', 96.98, 'limit value (87 dB(A)) reached', 0.125],
    // 84 + 10·lg(6/8) = 82.75 dB(A): the lower action value (80 dB(A)) of Directive 2003/10/EC.
    // 8 h / 2^((84 − 85)/3) = 10.08 h.
    ['slab-rig-breaker', 82.75, 'lower action value (80 dB(A)) reached', 10.08],
  ])('%s: L_EX,8h %d dB(A), "%s", %d h a day to 85 dB(A)', async (id, lex, band, hours) => {
    const { wb } = await exported(demoProject());
    const row = table(wb.getWorksheet('checks') as ExcelJS.Worksheet, LEX_HEADER).get(id)!;
    expect(row, id).toBeDefined();
    const lexCell = row.get(LEX_HEADER)!;
    expect(resultOf(lexCell) as number).toBeCloseTo(lex, 2);
    expect(Math.abs((resultOf(lexCell) as number) - lex)).toBeLessThanOrEqual(TOLERANCE_DB);
    // The 8 h reference is a named cell, never a constant inside the formula.
    expect(formulaOf(lexCell)).toMatch(/\+10\*LOG10\([A-Z]+\d+\/ExposureReferenceH\)/);
    expect(resultOf(row.get('Directive 2003/10/EC value reached (80 / 85 / 87 dB(A))')!)).toBe(band);
    const time = row.get('Time a day until 85 dB(A) is reached = T0 / 2^((LpA − 85)/3) (h)')!;
    expect(Math.abs((resultOf(time) as number) - hours)).toBeLessThanOrEqual(0.005);
    expect(formulaOf(time)).toMatch(/ExposureReferenceH\/2\^\(\([A-Z]+\d+-TimeCriterionDb\)\/ExchangeRateDb\)/);
  });

  it('the exposure caution stands above the exposure table', async () => {
    const { wb } = await exported(demoProject());
    const texts = cellsOf(wb.getWorksheet('checks') as ExcelJS.Worksheet).map((c) => String(c.value));
    const caution = texts.find((t) => t.startsWith('Caution:')) ?? '';
    expect(caution).toMatch(/workplace noise exposure assessment/);
    expect(caution).toMatch(/87 dB\(A\) limit value counts the hearing protection/);
  });
});

describe('exportWorkbook: stand-in, character penalty and level basis on the other sheets', () => {
  it('the stand-in LWA is marked STAND-IN on the inputs, contributions, assumptions and shortlist sheets', async () => {
    const { wb } = await exported(demoProject());
    for (const name of ['inputs', 'contributions', 'assumptions', 'shortlist']) {
      const ws = wb.getWorksheet(name) as ExcelJS.Worksheet;
      const marked = cellsOf(ws).filter((c) => typeof c.value === 'string' && c.value.includes(STAND_IN_MARK));
      expect(marked.length, name).toBeGreaterThan(0);
    }
    // On the contributions sheet the stand-in number itself reads "… dB STAND-IN".
    const contributions = wb.getWorksheet('contributions') as ExcelJS.Worksheet;
    const row = table(contributions, 'Candidate ID').get('dump-unlisted')!;
    const standIn = [...row.entries()].find(([h]) => h.startsWith('STAND-IN'))![1];
    expect(standIn.value).toBe(101);
    expect(standIn.numFmt).toContain('STAND-IN');
  });

  it('the character penalty is its own column, a formula on the CharacterPenaltyDb cell', async () => {
    const { wb } = await exported(demoProject());
    const rows = table(wb.getWorksheet('contributions') as ExcelJS.Worksheet, 'Candidate ID');
    const penalty = (id: string) => rows.get(id)!.get('Character penalty (dB; CharacterPenaltyDb)')!;
    // The demo sets a 3 dB penalty; the breaker is impulsive, the robot has no character (demo data).
    expect(formulaOf(penalty('slab-rig-breaker'))).toMatch(/CharacterPenaltyDb\)$/);
    expect(resultOf(penalty('slab-rig-breaker'))).toBe(3);
    expect(resultOf(penalty('slab-robot'))).toBe(0);
  });

  it('the rated LWA is a formula on L, the declaration, K and LevelBasis: measured 95.5 + K 2.5 = 98 dB', async () => {
    // ISO 4871:1996 single-number value Ld = L + K, on the default guaranteed basis.
    const { wb } = await exported(demoProject());
    const rated = table(wb.getWorksheet('contributions') as ExcelJS.Worksheet, 'Candidate ID')
      .get('shell-14t-electric')!
      .get('LWA used (dB; basis in LevelBasis)')!;
    expect(formulaOf(rated)).toMatch(/LevelBasis="guaranteed"/);
    expect(resultOf(rated) as number).toBeCloseTo(98, 9);
  });

  it('the shortlist says which candidates are too close to call within ±K', async () => {
    // Demo (invented) figures: the cable-electric excavator is rated 95.5 + 2.5 = 98 dB, the
    // hybrid 100 dB; at the same receiver they differ by 2.0 dB, within K = 2.5 dB.
    const project = demoProject();
    const { wb } = await exported(project);
    const texts = cellsOf(wb.getWorksheet('shortlist') as ExcelJS.Worksheet).map((c) => String(c.value));
    const note = texts.find((t) => t.startsWith('TOO CLOSE TO CALL') && t.includes('cable-electric excavator')) ?? '';
    // The rule is the ledger's own, and the note says so.
    expect(note).toMatch(/^TOO CLOSE TO CALL within ±K \(the ledger’s own rule, not ISO 4871’s/);
    // The quieter of the pair is named first.
    expect(note).toMatch(
      /Valdor V14e cable-electric excavator with shears \(\d+\.\d dB\) and Kestrune K24h hybrid excavator with shears \(\d+\.\d dB\) differ by 2\.0 dB, within K 2\.5 dB/,
    );
    expect(texts.some((t) => t.startsWith('The order holds') || t.startsWith('No candidate declares'))).toBe(true);
  });
});

describe('exportWorkbook: shortlist without a site', () => {
  it('with no receiver yet, each duty is still ranked, at the reference receiver', async () => {
    const project: Project = { ...demoProject(), receivers: [], fleets: [] };
    delete project.assessedFleet;
    project.duties = project.duties.map((d) => ({ ...d, location: { kind: 'point', x: 0, y: 0 } }));
    const { wb } = await exported(project);
    const ws = wb.getWorksheet('shortlist') as ExcelJS.Worksheet;
    const texts = cellsOf(ws).map((c) => String(c.value));
    // settings.referenceDistanceM of the demo; the reference receiver is hemispherical, Q = 2 (project-format.md)
    const where = `reference receiver at ${project.settings.referenceDistanceM} m (Q = 2)`;
    const ranked = cellsOf(ws).filter((c) => c.value === where);
    // one row per candidate listed (up to RANKING_ROWS_PER_DUTY per duty; the demo's duties hold fewer)
    expect(ranked.length).toBe(project.candidates.length);
    expect(
      texts.some(
        (t) =>
          t.startsWith('TOO CLOSE TO CALL') || t.startsWith('The order holds') || t.startsWith('No candidate declares'),
      ),
    ).toBe(true);
  });
});

describe('exportWorkbook: the streaming and in-memory writers', () => {
  it.each([
    ['demo', demoProject],
    ['ISO demo', isoDemoProject],
  ])('%s: both writers give every sheet the same values, formulas and cached results', async (_name, make) => {
    const project = make();
    const stream = (await exported(project, 'stream')).wb;
    const memory = (await exported(project, 'memory')).wb;
    expect(memory.worksheets.map((w) => w.name)).toEqual(stream.worksheets.map((w) => w.name));
    for (const ws of stream.worksheets) {
      const other = memory.getWorksheet(ws.name) as ExcelJS.Worksheet;
      const cells = cellsOf(ws);
      expect(cellsOf(other).length, ws.name).toBe(cells.length);
      for (const cell of cells) {
        const twin = other.getCell(cell.address);
        const where = `${ws.name}!${cell.address}`;
        if (cell.type === ExcelJS.ValueType.Formula) {
          // A shared formula reads back as its own formula, moved to its cell.
          expect(formulaOf(twin), where).toBe(formulaOf(cell));
          expect(resultOf(twin), where).toEqual(resultOf(cell));
        } else {
          expect(twin.value, where).toEqual(cell.value);
        }
      }
    }
  });
});

describe('hours in no assessment period', () => {
  it('the levels sheet and the assumptions sheet say them, in the words beside the matrix', async () => {
    // Day period 07:00–19:00 only; the phase works 06:00–20:00: 06:00–07:00 and 19:00–20:00 fall in no period, 2 h (worked by hand).
    const project = twoDutyProject();
    project.phases[0] = { ...project.phases[0]!, start: '06:00', end: '20:00' };
    const { wb } = await exported(project);
    const levels = cellsOf(wb.getWorksheet('levels') as ExcelJS.Worksheet).map((c) => String(c.value));
    expect(levels).toContain('Hours not assessed: working hours in no assessment period');
    expect(levels).toContain(
      'NOT ASSESSED: Phase "Works": 2 h of its working hours 06:00–20:00 fall in no assessment period and are not assessed (add a period that covers them, or shorten the working hours)',
    );
    const assumptions = cellsOf(wb.getWorksheet('assumptions') as ExcelJS.Worksheet).map((c) => String(c.value));
    expect(assumptions.some((t) => t.startsWith('Phase "Works": 2 h of its working hours 06:00–20:00'))).toBe(true);
  });
});
