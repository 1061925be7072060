/**
 * The compliance sheet: per phase, period and receiver the predicted level, the limit, the
 * margin, the method, and a sentence a contractor can put in a tender return, e.g.
 * "Predicted LAeq,12h at Elm Row school during Earthworks is 63.2 dB, 1.8 dB under the 65 dB
 * limit (ISO 9613-2:1996 method, ±3 dB)." Where a tonal or impulsive machine draws the
 * character penalty the level is the rating level L_Ar,T (ISO 1996-1) and the sentence says
 * so, with L_Aeq,T and the penalty. The sentence is a formula too, so it follows any change
 * made on the inputs sheet.
 */
import type { CellValue, Workbook } from 'exceljs';
import type { Project } from '../../ledger/model/model.ts';
import type { Evaluation } from '../../ledger/model/results.ts';
import { spanHours } from '../../ledger/prediction/clock.ts';
import { complianceStatement } from '../../ledger/checks/compliance-statement.ts';
import { formula, num, rel, text } from './cells.ts';
import { spanDays } from './time-formulas.ts';
import type { InputRefs } from './refs.ts';
import { cellKey, NONE_WORKING, OVER_MARK, type LevelRefs } from './levels-sheet.ts';
import type { PathRefs } from './paths-sheet.ts';
import { ACCURACY_DB, CAUTIONS, methodName } from './assumptions-sheet.ts';
import {
  DB_FORMAT,
  NOTE_FONT,
  OVER_FILL,
  OVER_FONT,
  SIGNED_DB_FORMAT,
  printSetup,
  writeSection,
  writeTitle,
  FIT_TO_WIDTH,
} from './styles.ts';
import { writeTable, type TableColumn } from './table.ts';

export const COMPLIANCE = 'compliance';

const NOT_COMPUTED_SENTENCE = 'Not computed: an input this level needs is missing or not valid (see the inputs sheet).';

/**
 * The tender sentence for one phase and receiver, as the formula computes it.
 * @example complianceSentence({ hours: 12, receiver: 'Elm Row school', phase: 'Earthworks', level: 63.2, limit: 65, method: 'ISO 9613-2:1996' })
 * // "Predicted LAeq,12h at Elm Row school during Earthworks is 63.2 dB, 1.8 dB under the 65 dB limit (ISO 9613-2:1996 method, ±3 dB)."
 */
export function complianceSentence(s: {
  hours: number;
  receiver: string;
  phase: string;
  level: number;
  limit?: number;
  method: string;
  levelAeq?: number;
}): string {
  if (Number.isNaN(s.level)) return NOT_COMPUTED_SENTENCE;
  if (s.level === -Infinity) return `No machine is working at ${s.receiver} during ${s.phase}.`;
  const rated = s.levelAeq !== undefined && Number.isFinite(s.levelAeq);
  const head = rated
    ? `Predicted rating level LAr,${s.hours}h at ${s.receiver} during ${s.phase} is ${s.level.toFixed(1)} dB (LAeq,${s.hours}h ${(s.levelAeq as number).toFixed(1)} dB + character penalty ${(s.level - (s.levelAeq as number)).toFixed(1)} dB)`
    : `Predicted LAeq,${s.hours}h at ${s.receiver} during ${s.phase} is ${s.level.toFixed(1)} dB`;
  let middle = ', with no limit set for this period';
  if (s.limit !== undefined && Number.isFinite(s.limit)) {
    const margin = s.limit - s.level;
    middle = `, ${Math.abs(margin).toFixed(1)} dB ${margin >= 0 ? 'under' : 'over'} the ${s.limit} dB limit`;
  }
  return `${head}${middle} (${s.method} method, ±${ACCURACY_DB} dB).`;
}

/** Writes the compliance sheet. */
export function writeComplianceSheet(
  wb: Workbook,
  project: Project,
  evaluation: Evaluation,
  inputs: InputRefs,
  paths: PathRefs,
  levels: LevelRefs,
  fleetName = 'baseline',
): void {
  const ws = wb.addWorksheet(COMPLIANCE, {
    views: [{ state: 'frozen', ySplit: 5, xSplit: 2 }],
    pageSetup: FIT_TO_WIDTH,
  });
  const statement = complianceStatement(project, evaluation, fleetName);
  const measures = new Map(
    statement.lines.map((l) => [cellKey(l.phaseId, l.periodId, l.receiverId), l.measures.join('; ')] as const),
  );
  writeTitle(
    ws,
    `Compliance statement for ${statement.fleet}`,
    `${statement.summary} Per phase and receiver: predicted level, limit, margin (limit − level), a sentence for a tender return, and what the result relies on. Formulas: they follow any change on the inputs sheet (change a CHOSEN machine there and the levels follow).`,
  );
  const receiverName = (id: string) => project.receivers.find((r) => r.id === id)?.name ?? 'the reference receiver';
  const method = methodName(project);
  const columns: TableColumn[] = [
    { header: 'Phase', role: 'formula', width: 28 },
    { header: 'Receiver', role: 'formula', width: 28 },
    { header: 'Period T (h)', role: 'formula', numFmt: '0.##', width: 8 },
    {
      header: 'Predicted level (dB): LAeq,T, or LAr,T where column K gives LAeq,T',
      role: 'formula',
      numFmt: DB_FORMAT,
      width: 13,
    },
    { header: 'Limit (dB)', role: 'formula', numFmt: DB_FORMAT, width: 10 },
    { header: 'Margin = limit − level (dB)', role: 'formula', numFmt: SIGNED_DB_FORMAT, width: 12 },
    { header: 'Status', role: 'formula', width: 12 },
    { header: 'Method', role: 'formula', width: 18 },
    { header: 'Statement for a tender return', role: 'formula', width: 70, wrap: true },
    { header: 'Relies on (machines chosen, on-time, screening, hours)', role: 'text', width: 60, wrap: true },
    {
      header: 'LAeq,T without the character penalty (dB; where a penalty applies)',
      role: 'formula',
      numFmt: DB_FORMAT,
      width: 13,
    },
    { header: 'Hours worked in the period (h; computed by the program)', role: 'core', numFmt: '0.##', width: 9 },
  ];
  const firstRow = 6;
  const rows: CellValue[][] = [];
  for (const cell of evaluation.matrix) {
    const phase = project.phases.find((p) => p.id === cell.phaseId);
    const period = project.periods.find((p) => p.id === cell.periodId);
    const phaseRef = phase ? inputs.phases.get(phase.id) : undefined;
    const periodRef = period ? inputs.periods.get(period.id) : undefined;
    const receiverRef = inputs.receivers.get(cell.receiverId);
    const where = levels.cells.get(cellKey(cell.phaseId, cell.periodId, cell.receiverId));
    if (!where || !paths.receiverIds.includes(cell.receiverId)) continue;
    const row = firstRow + rows.length;
    const hours = period ? spanHours(period.start, period.end) : NaN;
    const level = cell.levelDb;
    const limit = cell.limitDb;
    const margin = cell.marginDb;
    const [A, B, C, D, E, F, , H, , , K] = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11].map((c) => rel(c, row)) as string[];
    const status = Number.isNaN(level)
      ? 'not computed'
      : limit === undefined || level === -Infinity
        ? '—'
        : cell.over
          ? OVER_MARK
          : 'within';
    const phaseWords = cell.ownPeriod
      ? (phase?.name ?? cell.phaseId)
      : `${phase?.name ?? cell.phaseId} (${period?.name ?? cell.periodId} hours)`;
    const sentence = complianceSentence({
      hours,
      receiver: receiverName(cell.receiverId),
      phase: phaseWords,
      level,
      ...(limit !== undefined ? { limit } : {}),
      ...(cell.levelAeqDb !== undefined ? { levelAeq: cell.levelAeqDb } : {}),
      method,
    });
    const phaseFormula = phaseRef
      ? cell.ownPeriod || !periodRef
        ? phaseRef.name
        : `${phaseRef.name}&" ("&${periodRef.name}&" hours)"`
      : undefined;
    const plain = `"Predicted LAeq,"&ROUND(${C},2)&"h at "&${B}&" during "&${A}&" is "&TEXT(${D},"0.0")&" dB"`;
    const ratedHead = `"Predicted rating level LAr,"&ROUND(${C},2)&"h at "&${B}&" during "&${A}&" is "&TEXT(${D},"0.0")&" dB (LAeq,"&ROUND(${C},2)&"h "&TEXT(${K},"0.0")&" dB + character penalty "&TEXT(${D}-${K},"0.0")&" dB)"`;
    rows.push([
      phaseFormula ? formula(phaseFormula, text(phaseWords)) : text(phaseWords),
      receiverRef
        ? formula(receiverRef.name, text(receiverName(cell.receiverId)))
        : text(receiverName(cell.receiverId)),
      periodRef
        ? formula(`ROUND(${spanDays(periodRef.start, periodRef.end)}*24,4)`, Math.round(hours * 1e4) / 1e4)
        : null,
      formula(where.level, level === -Infinity ? NONE_WORKING : level),
      formula(where.limit, limit ?? 'no limit'),
      formula(
        `IF(AND(ISNUMBER(${D}),ISNUMBER(${E})),${E}-${D},"—")`,
        margin !== undefined && Number.isFinite(margin) ? margin : '—',
      ),
      formula(where.status, status),
      formula('Method', method),
      formula(
        `IF(ISERROR(${D}),"${NOT_COMPUTED_SENTENCE}",IF(ISNUMBER(${D}),IF(ISNUMBER(${K}),${ratedHead},${plain})&IF(ISNUMBER(${E}),", "&TEXT(ABS(${F}),"0.0")&" dB "&IF(${F}>=0,"under","over")&" the "&${E}&" dB limit",", with no limit set for this period")&" ("&${H}&" method, ±"&AccuracyDb&" dB).","No machine is working at "&${B}&" during "&${A}&"."))`,
        sentence,
      ),
      text(measures.get(cellKey(cell.phaseId, cell.periodId, cell.receiverId)) ?? ''),
      where.aeq && cell.levelAeqDb !== undefined
        ? formula(where.aeq, cell.levelAeqDb === -Infinity ? NONE_WORKING : cell.levelAeqDb)
        : text('—'),
      num(cell.hoursWorked),
    ]);
  }
  const place = writeTable(ws, 4, 'Predicted levels against the limits', columns, rows);
  // Wrapped statements need their rows tall enough (spreadsheets do not all fit rows on load).
  rows.forEach((values, i) => {
    const sentence = String((values[8] as { result?: unknown } | null)?.result ?? '');
    ws.getRow(place.firstRow + i).height = Math.max(1, Math.ceil(sentence.length / 68)) * 13 + 3;
  });
  if (rows.length > 0) {
    const statusRange = `${rel(7, place.firstRow)}:${rel(7, place.lastRow)}`;
    ws.addConditionalFormatting({
      ref: statusRange,
      rules: [
        {
          type: 'expression',
          priority: 1,
          formulae: [`${rel(7, place.firstRow)}="${OVER_MARK}"`],
          style: { fill: OVER_FILL, font: OVER_FONT },
        },
      ],
    });
    ws.addConditionalFormatting({
      ref: `${rel(4, place.firstRow)}:${rel(4, place.lastRow)}`,
      rules: [
        {
          type: 'expression',
          priority: 2,
          formulae: [
            `AND(ISNUMBER(D${place.firstRow}),ISNUMBER(E${place.firstRow}),D${place.firstRow}>E${place.firstRow})`,
          ],
          style: { fill: OVER_FILL, font: OVER_FONT },
        },
      ],
    });
    const summary = ws.getCell(3, 1);
    const overCount = evaluation.matrix.filter((m) => m.over).length;
    summary.value = formula(
      `"Cells over their limit: "&COUNTIF(${statusRange},"${OVER_MARK}")&" of "&ROWS(${statusRange})`,
      `Cells over their limit: ${overCount} of ${rows.length}`,
    );
    summary.font = { bold: true };
  }
  let row = place.lastRow + 2;
  writeSection(ws, row, 'Cautions', 9);
  for (const c of CAUTIONS) {
    row += 1;
    const cell = ws.getCell(row, 1);
    cell.value = c;
    cell.font = NOTE_FONT;
  }
  printSetup(ws, { landscape: true, repeatRows: [5, 5] });
}
