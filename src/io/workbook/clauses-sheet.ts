/**
 * The clauses sheet: the answer to the tender's noise clauses, clause by clause, for the
 * fleet the workbook describes, with the evidence as rows a reviewer can follow. Each line
 * compares a figure with its limit (a level at a receiver — a formula on the levels sheet, so
 * it follows a change of the chosen machines on the inputs sheet —, a boundary point's level,
 * a machine's LWA or its level at a distance, a duty's hours outside the allowed hours, or
 * the share reached); its margin and its pass/FAIL are formulas, and the clause's answer is a
 * formula over its lines. A statement clause is "Stated"; a clause that cannot be judged is
 * "Not assessed" with the reason. Only written when the project has clauses.
 */
import type { CellValue, Workbook } from 'exceljs';
import type { Project } from '../../ledger/model/model.ts';
import type { Evaluation } from '../../ledger/model/results.ts';
import { answerClauses, type ClauseAnswer } from '../../ledger/clauses/answer.ts';
import { CLAUSE_KIND_WORDS } from '../../ledger/clauses/clause.ts';
import { validateProject } from '../../ledger/validate/validate.ts';
import { formula, rel, text } from './cells.ts';
import { cellKey, type LevelRefs } from './levels-sheet.ts';
import {
  DB_FORMAT,
  NOTE_FONT,
  OVER_FILL,
  OVER_FONT,
  SIGNED_DB_FORMAT,
  printSetup,
  writeTitle,
  FIT_TO_WIDTH,
} from './styles.ts';
import { writeTable, type TableColumn } from './table.ts';
import { CAUTIONS } from './assumptions-sheet.ts';

export const CLAUSES = 'clauses';

/** Allowance when a figure is compared with its limit (a cap exactly met passes), in the figure's unit. */
const TOLERANCE = 0.000001;

const ANSWER_WORDS = { pass: 'Pass', fail: 'Fail', stated: 'Stated', incomplete: 'Not assessed' } as const;

/** Writes the clauses sheet when the project has clauses; returns whether it did. */
export function writeClausesSheet(
  wb: Workbook,
  project: Project,
  evaluation: Evaluation,
  levels: LevelRefs,
  fleetName = 'baseline',
): boolean {
  const clauses = project.clauses ?? [];
  if (clauses.length === 0) return false;
  const answer = answerClauses(project, {
    ...evaluation,
    problems: [...validateProject(project), ...evaluation.problems],
  });
  const ws = wb.addWorksheet(CLAUSES, { views: [{ state: 'frozen', ySplit: 5, xSplit: 1 }], pageSetup: FIT_TO_WIDTH });
  writeTitle(
    ws,
    `Answer to the tender’s noise clauses for ${fleetName === 'baseline' ? 'the baseline fleet' : `fleet “${fleetName}”`}`,
    'One block per clause: each line compares a figure with its limit (margin = limit − figure; "pass" when the figure is at or under the limit), and the clause’s answer is "Pass" when none of its lines is "FAIL". Levels at receivers are formulas on the levels sheet; a share clause compares the share reached with the least share asked.',
  );
  const columns: TableColumn[] = [
    { header: 'Clause', role: 'input', width: 9 },
    { header: 'Kind', role: 'text', width: 26 },
    { header: 'Answer', role: 'formula', width: 13 },
    { header: 'Evidence: what is compared', role: 'text', width: 44, wrap: true },
    { header: 'Figure (dB, h outside, units or %)', role: 'formula', numFmt: DB_FORMAT, width: 12 },
    { header: 'Limit or cap', role: 'input', numFmt: DB_FORMAT, width: 10 },
    { header: 'Margin = limit − figure', role: 'formula', numFmt: SIGNED_DB_FORMAT, width: 11 },
    { header: 'Line', role: 'formula', width: 9 },
    { header: 'In words', role: 'text', width: 60, wrap: true },
    { header: 'The tender’s words', role: 'input', width: 60, wrap: true },
  ];
  const firstRow = 6;
  const rows: CellValue[][] = [];
  clauses.forEach((clause, i) => {
    const a = answer.answers[i] as ClauseAnswer;
    const start = firstRow + rows.length;
    const head = (answerCell: CellValue): CellValue[] => [
      text(clause.ref),
      text(CLAUSE_KIND_WORDS[clause.kind]),
      answerCell,
    ];
    const words = [
      a.summary,
      a.fix ? `To pass: ${a.fix.text}.` : '',
      a.noFix ?? '',
      a.statement ? `Statement: ${a.statement}` : '',
    ]
      .filter((s) => s !== '')
      .join(' ');
    if (a.status === 'stated' || a.status === 'incomplete' || a.evidence.length === 0) {
      rows.push([
        ...head(text(ANSWER_WORDS[a.status])),
        text(a.evidence.length ? '' : '—'),
        null,
        null,
        null,
        null,
        text(words),
        text(clause.text),
      ]);
      return;
    }
    const lines: CellValue[][] = [];
    if (a.kind === 'share') {
      const first = start;
      for (const e of a.evidence) {
        lines.push([
          null,
          null,
          null,
          text(e.subject),
          e.value ?? null,
          null,
          null,
          text(e.ok ? 'counts' : 'not counted'),
          text(e.figure),
          null,
        ]);
      }
      const last = start + lines.length - 1;
      const r = start + lines.length;
      const [E, F] = [5, 6].map((c) => rel(c, r)) as string[];
      const reached = `SUMIF(${rel(8, first)}:${rel(8, last)},"counts",${rel(5, first)}:${rel(5, last)})/SUM(${rel(5, first)}:${rel(5, last)})*100`;
      const least = clause.minPct as number;
      const counted = a.evidence.filter((e) => e.ok).reduce((s, e) => s + (e.value ?? 0), 0);
      const total = a.evidence.reduce((s, e) => s + (e.value ?? 0), 0);
      const pct = total > 0 ? (100 * counted) / total : NaN;
      lines.push([
        null,
        null,
        null,
        text('Share reached, %'),
        formula(reached, pct),
        least,
        formula(`${E}-${F}`, pct - least),
        formula(`IF(${E}>=${F}-${TOLERANCE},"pass","FAIL")`, a.status === 'pass' ? 'pass' : 'FAIL'),
        null,
        null,
      ]);
    } else {
      for (const e of a.evidence) {
        const r = start + lines.length;
        const [E, F] = [5, 6].map((c) => rel(c, r)) as string[];
        // A level at a receiver in the clause's period is read from the levels sheet (LAeq,T or LAr,T as the clause asks).
        const where =
          a.kind === 'limit' && e.phaseId && e.pointId && clause.periodId
            ? levels.cells.get(cellKey(e.phaseId, clause.periodId, e.pointId))
            : undefined;
        const ref = where
          ? (clause.metric ?? 'laeq') === 'rating'
            ? where.level
            : (where.aeq ?? where.level)
          : undefined;
        const value = e.value ?? NaN;
        const figure: CellValue = ref ? formula(ref, value) : Number.isFinite(value) ? value : null;
        lines.push([
          null,
          null,
          null,
          text(e.subject),
          figure,
          e.limit ?? null,
          formula(
            `IF(AND(ISNUMBER(${E}),ISNUMBER(${F})),${F}-${E},"—")`,
            Number.isFinite(value) && e.limit !== undefined ? e.limit - value : '—',
          ),
          formula(
            `IF(AND(ISNUMBER(${E}),ISNUMBER(${F})),IF(${E}<=${F}+${TOLERANCE},"pass","FAIL"),"FAIL")`,
            e.ok ? 'pass' : 'FAIL',
          ),
          text(e.figure),
          null,
        ]);
      }
    }
    const lineRange = `${rel(8, start)}:${rel(8, start + lines.length - 1)}`;
    const answerCell = formula(`IF(COUNTIF(${lineRange},"FAIL")=0,"Pass","Fail")`, ANSWER_WORDS[a.status]);
    const firstLine = lines[0] as CellValue[];
    const [, , , ...rest] = firstLine;
    lines[0] = [...head(answerCell), ...rest];
    (lines[0] as CellValue[])[8] = text([words, (firstLine[8] as string | null) ?? ''].filter((s) => s).join(' — '));
    (lines[0] as CellValue[])[9] = text(clause.text);
    rows.push(...lines);
  });
  const place = writeTable(ws, 4, 'Clause by clause', columns, rows);
  if (rows.length > 0) {
    ws.addConditionalFormatting({
      ref: `${rel(3, place.firstRow)}:${rel(3, place.lastRow)}`,
      rules: [
        {
          type: 'expression',
          priority: 1,
          formulae: [`${rel(3, place.firstRow)}="Fail"`],
          style: { fill: OVER_FILL, font: OVER_FONT },
        },
      ],
    });
    ws.addConditionalFormatting({
      ref: `${rel(8, place.firstRow)}:${rel(8, place.lastRow)}`,
      rules: [
        {
          type: 'expression',
          priority: 2,
          formulae: [`${rel(8, place.firstRow)}="FAIL"`],
          style: { fill: OVER_FILL, font: OVER_FONT },
        },
      ],
    });
    const summary = ws.getCell(3, 1);
    const c = answer.counts;
    const range = `${rel(3, place.firstRow)}:${rel(3, place.lastRow)}`;
    summary.value = formula(
      `COUNTIF(${range},"Pass")&" pass, "&COUNTIF(${range},"Fail")&" fail, "&COUNTIF(${range},"Stated")&" stated, "&COUNTIF(${range},"Not assessed")&" not assessed"`,
      `${c.pass} pass, ${c.fail} fail, ${c.stated} stated, ${c.incomplete} not assessed`,
    );
    summary.font = { bold: true };
  }
  let row = place.lastRow + 2;
  for (const caution of CAUTIONS) {
    const cell = ws.getCell(row, 1);
    cell.value = caution;
    cell.font = NOTE_FONT;
    row += 1;
  }
  printSetup(ws, { landscape: true, repeatRows: [5, 5] });
  return true;
}
