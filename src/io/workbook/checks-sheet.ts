/**
 * The checks sheet: what a buyer or reviewer checks on each machine beside its levels at
 * the receivers.
 *
 * - Directive 2000/14/EC (as amended by 2005/88/EC): per candidate with a directive type, the
 *   Stage II permissible LWA (computed by the core, blue, with its working and the stage whose
 *   figures apply), the declared guaranteed level Ld (a formula on the inputs: L + K for a
 *   measured pair, ISO 4871:1996), the margin and "OVER" / "within" in words, shaded by
 *   conditional formatting; a STAND-IN where the permissible level replaces a missing value.
 * - Operator exposure: per candidate with an operator-position LpA or hours a day, the daily
 *   exposure L_EX,8h = LpA + 10·lg(T / T0) (ISO 9612:2009), the Directive 2003/10/EC value it
 *   reaches (80 / 85 / 87 dB(A)) and the time a day until 85 dB(A) is reached,
 *   T0 / 2^((LpA − 85)/3) (NIOSH 98-126), all live formulas on the inputs and on named cells
 *   of the assumptions sheet, with the caution that a workplace assessment decides.
 */
import type { CellValue, Workbook } from 'exceljs';
import type { Candidate, Project } from '../../ledger/model/model.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import { EXPOSURE_CAUTION } from '../../ledger/checks/operator-exposure.ts';
import { EXPOSURE_VALUES_DB, exposureBand } from '../../core/standards/directive-2003-10-ec.ts';
import { formula, num, rel, text } from './cells.ts';
import type { CandidateRef, InputRefs } from './refs.ts';
import { candidatesInTableOrder } from './inputs-sheet.ts';
import { limitQuantityWords, STAND_IN_MARK } from './candidate-notes.ts';
import {
  DB_FORMAT,
  HOURS_FORMAT,
  NOTE_FONT,
  OVER_FILL,
  OVER_FONT,
  SIGNED_DB_FORMAT,
  STAND_IN_FILL,
  STAND_IN_FONT,
  printSetup,
  writeTitle,
  FIT_TO_WIDTH,
} from './styles.ts';
import { rowsOf, writeStreamedTable, type TableColumn } from './table.ts';
import { own } from '../../ledger/model/own.ts';

export const CHECKS = 'checks';

/** Words of the directive check, as its formula writes them. */
export const OVER_PERMISSIBLE = 'OVER permissible';
export const WITHIN_PERMISSIBLE = 'within permissible';

/** Header of the L_EX,8h column (the LibreOffice proof finds the column by it). */
export const LEX_HEADER = 'L_EX,8h = LpA + 10·lg(T / T0) (dB(A); ISO 9612:2009)';

/** The declared guaranteed level Ld of a candidate (L + K for a measured pair), or undefined. */
function guaranteedDb(c: Candidate): number | undefined {
  const l = c.lwaDb;
  if (typeof l !== 'number' || !Number.isFinite(l)) return undefined;
  const k = c.uncertaintyDb;
  return c.declaration === 'measured' && typeof k === 'number' && Number.isFinite(k) ? l + k : l;
}

/** The directive status as the status formula computes it. */
function directiveStatus(check: CandidateCheck | undefined, guaranteed: number | undefined): string {
  if (check?.permissible && guaranteed !== undefined)
    return check.overPermissible ? OVER_PERMISSIBLE : WITHIN_PERMISSIBLE;
  if (check?.standIn && check.permissible) return STAND_IN_MARK;
  return '—';
}

/**
 * The Directive 2003/10/EC value a daily exposure reaches, in the words of the band formula.
 * @example exposureBandWords(86) // "upper action value (85 dB(A)) reached"
 */
export function exposureBandWords(dailyExposureDb: number): string {
  const v = EXPOSURE_VALUES_DB;
  switch (exposureBand(dailyExposureDb)) {
    case 'limit value':
      return `limit value (${v.limit} dB(A)) reached`;
    case 'upper action value':
      return `upper action value (${v.upperAction} dB(A)) reached`;
    case 'lower action value':
      return `lower action value (${v.lowerAction} dB(A)) reached`;
    default:
      return `below the lower action value (${v.lowerAction} dB(A))`;
  }
}

async function writeDirectiveTable(
  ws: ReturnType<Workbook['addWorksheet']>,
  startRow: number,
  project: Project,
  inputs: InputRefs,
  checks: Record<string, CandidateCheck>,
  pause: (() => Promise<void>) | undefined,
): Promise<{ next: number }> {
  const listed = candidatesInTableOrder(project).filter((c) => c.directiveCategory);
  const columns: TableColumn[] = [
    { header: 'Candidate ID', role: 'text', width: 14 },
    { header: 'Machine', role: 'text', width: 30, wrap: true },
    { header: 'Directive 2000/14/EC type', role: 'text', width: 16, wrap: true },
    { header: 'Limit depends on (quantity, unit)', role: 'text', width: 28, wrap: true },
    { header: 'Permissible LWA (dB; core)', role: 'core', numFmt: DB_FORMAT, width: 12 },
    { header: 'Stage whose figures apply', role: 'text', width: 14, wrap: true },
    { header: 'Working (Article 12 formula, rounded to the nearest dB)', role: 'text', width: 42, wrap: true },
    {
      header: 'Declared guaranteed level Ld = L + K (dB; ISO 4871:1996)',
      role: 'formula',
      numFmt: DB_FORMAT,
      width: 13,
    },
    { header: 'Margin = permissible − Ld (dB)', role: 'formula', numFmt: SIGNED_DB_FORMAT, width: 11 },
    { header: 'Over or within', role: 'formula', width: 20, wrap: true },
    { header: 'Note', role: 'text', width: 44, wrap: true },
  ];
  const firstRow = startRow + 2;
  const rows = rowsOf(listed, (c, i): CellValue[] => {
    const row = firstRow + i;
    const check = own(checks, c.id);
    const ref = inputs.candidates.get(c.id) as CandidateRef;
    const p = check?.permissible;
    const guaranteed = guaranteedDb(c);
    const [E, H, I] = [5, 8, 9].map((k) => rel(k, row)) as [string, string, string];
    const margin = p && guaranteed !== undefined ? p.levelDb - guaranteed : undefined;
    return [
      text(c.id),
      text(c.label),
      text(c.directiveCategory),
      text(limitQuantityWords(c)),
      p ? num(p.levelDb) : null,
      text(p?.stage ?? ''),
      text(p?.working ?? ''),
      formula(
        `IF(ISNUMBER(${ref.lwa}),IF(${ref.declaration}="measured",${ref.lwa}+N(${ref.uncertainty}),${ref.lwa}),"none declared")`,
        guaranteed ?? 'none declared',
      ),
      formula(`IF(AND(ISNUMBER(${E}),ISNUMBER(${H})),${E}-${H},"—")`, margin ?? '—'),
      formula(
        `IF(ISNUMBER(${I}),IF(${I}<0,"${OVER_PERMISSIBLE}","${WITHIN_PERMISSIBLE}"),IF(AND(ISNUMBER(${E}),ISBLANK(${ref.lwa}),COUNT(${ref.bands})<8),"${STAND_IN_MARK}","—"))`,
        directiveStatus(check, guaranteed),
      ),
      text(check?.permissibleNote ?? ''),
    ];
  });
  // The exposure table below shares the columns and sets the same widths, so the rows can go
  // to the streaming writer as they are written.
  const place = await writeStreamedTable(
    ws,
    startRow,
    'Directive 2000/14/EC permissible sound power level (Stage II, as amended by 2005/88/EC), candidates with a directive type',
    columns,
    rows,
    { sparse: true, pause },
  );
  let next = place.lastRow + 1;
  const without = project.candidates.length - listed.length;
  if (without > 0) {
    const note = ws.getCell(next, 1);
    note.value = `${without} candidate${without === 1 ? '' : 's'} without a directive type ${without === 1 ? 'is' : 'are'} not listed (inputs sheet, column "Directive 2000/14/EC type").`;
    note.font = NOTE_FONT;
    next += 1;
  }
  if (listed.length === 0) return { next: next + 1 };
  const status = `${rel(10, place.firstRow)}:${rel(10, place.lastRow)}`;
  const margin = `${rel(9, place.firstRow)}:${rel(9, place.lastRow)}`;
  ws.addConditionalFormatting({
    ref: `${status} ${margin}`,
    rules: [
      {
        type: 'expression',
        priority: 1,
        formulae: [`$J${place.firstRow}="${OVER_PERMISSIBLE}"`],
        style: { fill: OVER_FILL, font: OVER_FONT },
      },
      {
        type: 'expression',
        priority: 2,
        formulae: [`$J${place.firstRow}="${STAND_IN_MARK}"`],
        style: { fill: STAND_IN_FILL, font: STAND_IN_FONT },
      },
    ],
  });
  return { next: next + 1 };
}

async function writeExposureTable(
  ws: ReturnType<Workbook['addWorksheet']>,
  startRow: number,
  project: Project,
  inputs: InputRefs,
  checks: Record<string, CandidateCheck>,
  pause: (() => Promise<void>) | undefined,
): Promise<number> {
  const given = (x: number | undefined | null) => x !== undefined && x !== null;
  const listed = candidatesInTableOrder(project).filter((c) => given(c.operatorLpaDb) || given(c.operatorHoursPerDay));
  const caution = ws.getCell(startRow, 1);
  caution.value = `Caution: ${EXPOSURE_CAUTION}`;
  caution.font = { bold: true, color: { argb: 'FF8B1A10' } };
  // Widths as the directive table's above (the two tables share the sheet's columns).
  const columns: TableColumn[] = [
    { header: 'Candidate ID', role: 'text', width: 14 },
    { header: 'Machine', role: 'text', width: 30, wrap: true },
    { header: 'Operator LpA (dB(A); inputs)', role: 'formula', numFmt: DB_FORMAT, width: 16 },
    { header: 'Hours a day T (h; inputs)', role: 'formula', numFmt: HOURS_FORMAT, width: 28 },
    { header: LEX_HEADER, role: 'formula', numFmt: DB_FORMAT, width: 12 },
    { header: 'Directive 2003/10/EC value reached (80 / 85 / 87 dB(A))', role: 'formula', width: 14, wrap: true },
    {
      header: 'Time a day until 85 dB(A) is reached = T0 / 2^((LpA − 85)/3) (h)',
      role: 'formula',
      numFmt: HOURS_FORMAT,
      width: 42,
    },
  ];
  const firstRow = startRow + 3;
  const rows = rowsOf(listed, (c, i): CellValue[] => {
    const row = firstRow + i;
    const ref = inputs.candidates.get(c.id) as CandidateRef;
    const exposure = own(checks, c.id)?.exposure;
    const [C, D, E] = [3, 4, 5].map((k) => rel(k, row)) as [string, string, string];
    const lpa = typeof c.operatorLpaDb === 'number' && Number.isFinite(c.operatorLpaDb) ? c.operatorLpaDb : undefined;
    const hours =
      typeof c.operatorHoursPerDay === 'number' && Number.isFinite(c.operatorHoursPerDay)
        ? c.operatorHoursPerDay
        : undefined;
    const lexWords = lpa === undefined || hours === undefined ? 'not computed' : 'hours outside 0–24';
    return [
      text(c.id),
      text(c.label),
      formula(`IF(ISNUMBER(${ref.operatorLpa}),${ref.operatorLpa},"not given")`, lpa ?? 'not given'),
      formula(`IF(ISNUMBER(${ref.operatorHours}),${ref.operatorHours},"not given")`, hours ?? 'not given'),
      formula(
        `IF(AND(ISNUMBER(${C}),ISNUMBER(${D})),IF(AND(${D}>0,${D}<=24),${C}+10*LOG10(${D}/ExposureReferenceH),"hours outside 0–24"),"not computed")`,
        exposure ? exposure.dailyExposureDb : lexWords,
      ),
      formula(
        `IF(ISNUMBER(${E}),IF(${E}>=ExposureLimitDb,"limit value ("&ExposureLimitDb&" dB(A)) reached",IF(${E}>=UpperActionDb,"upper action value ("&UpperActionDb&" dB(A)) reached",IF(${E}>=LowerActionDb,"lower action value ("&LowerActionDb&" dB(A)) reached","below the lower action value ("&LowerActionDb&" dB(A))"))),"—")`,
        exposure ? exposureBandWords(exposure.dailyExposureDb) : '—',
      ),
      formula(
        `IF(ISNUMBER(${C}),ExposureReferenceH/2^((${C}-TimeCriterionDb)/ExchangeRateDb),"—")`,
        exposure ? exposure.hoursTo85 : '—',
      ),
    ];
  });
  // Its rows go to the streaming writer as they are written too: nothing above them changes afterwards.
  const place = await writeStreamedTable(
    ws,
    startRow + 1,
    'Operator exposure (ISO 9612:2009; Directive 2003/10/EC), candidates with an operator LpA or hours a day',
    columns,
    rows,
    { sparse: true, pause },
  );
  if (listed.length === 0) {
    const none = ws.getCell(place.headerRow + 1, 1);
    none.value = 'No candidate gives an operator-position LpA or hours a day (inputs sheet).';
    none.font = NOTE_FONT;
    return place.headerRow + 3;
  }
  ws.addConditionalFormatting({
    ref: `${rel(5, place.firstRow)}:${rel(6, place.lastRow)}`,
    rules: [
      {
        type: 'expression',
        priority: 3,
        formulae: [`AND(ISNUMBER($E${place.firstRow}),$E${place.firstRow}>=UpperActionDb)`],
        style: { fill: OVER_FILL, font: OVER_FONT },
      },
    ],
  });
  return place.lastRow + 2;
}

/** Row of the directive table's title (header below it, candidates from two rows below). */
const DIRECTIVE_START = 5;

/** Writes the checks sheet. O(candidates). `pause`: the streaming writer's wait between blocks of rows. */
export async function writeChecksSheet(
  wb: Workbook,
  project: Project,
  inputs: InputRefs,
  checks: Record<string, CandidateCheck>,
  pause?: () => Promise<void>,
): Promise<void> {
  const ws = wb.addWorksheet(CHECKS, { views: [{ state: 'frozen', ySplit: 3 }], pageSetup: FIT_TO_WIDTH });
  writeTitle(
    ws,
    'Checks: directive limits, declared uncertainty, operator exposure',
    'Per machine: the Directive 2000/14/EC permissible sound power level and the declared guaranteed level against it; the operator’s daily exposure against Directive 2003/10/EC. Formulas on the inputs sheet and on named cells of the assumptions sheet.',
  );
  // The summary above the directive table (written first: the table's rows go to the
  // streaming writer as they are written). Its table's status column is J from row 7.
  const listed = project.candidates.filter((c) => c.directiveCategory).length;
  if (listed > 0) {
    const over = project.candidates.filter((c) => c.directiveCategory && own(checks, c.id)?.overPermissible).length;
    const statusRange = `${rel(10, DIRECTIVE_START + 2)}:${rel(10, DIRECTIVE_START + 1 + listed)}`;
    const summary = ws.getCell(3, 1);
    summary.value = formula(
      `"Over the permissible level: "&COUNTIF(${statusRange},"${OVER_PERMISSIBLE}")&" of "&ROWS(${statusRange})&" candidates with a directive type"`,
      `Over the permissible level: ${over} of ${listed} candidates with a directive type`,
    );
    summary.font = { bold: true };
  }
  const directive = await writeDirectiveTable(ws, DIRECTIVE_START, project, inputs, checks, pause);
  const row = await writeExposureTable(ws, directive.next, project, inputs, checks, pause);
  const note = ws.getCell(row, 1);
  note.value =
    'Permissible levels (blue) are computed by the core from the directive’s Article 12 table and taken as given; the declared levels, margins, exposures and times are formulas.';
  note.font = NOTE_FONT;
  printSetup(ws, { landscape: true, repeatRows: [1, 3] });
}
