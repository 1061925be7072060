/**
 * The levels sheet: one row per phase and period it is assessed in (its own period first,
 * then each other period its working hours run into), one column per receiver. Three
 * blocks of the same shape — the predicted phase total (live formulas summing the chosen
 * machines' energies on the contributions sheet, which hold the working hours in the
 * phase's own period; a row for another period adds the shift 10·lg(T_work,p/T_p) −
 * 10·lg(T_work,own/T_own) from the columns beside it), the limit for the row's period (a
 * reference to the receiver's limit on the inputs sheet), and a status marker — with the
 * levels over their limit shaded by conditional formatting. Where a tonal or impulsive
 * machine draws the character penalty the level is the rating level L_Ar,T (ISO 1996-1);
 * the contributions sheet shows the penalty as its own term.
 */
import type { Workbook } from 'exceljs';
import type { Project } from '../../ledger/model/model.ts';
import type { Evaluation, MatrixCell } from '../../ledger/model/results.ts';
import { abs, formula, num, rel, text } from './cells.ts';
import { overlapDays, spanDays } from './time-formulas.ts';
import { overlapHours } from '../../ledger/prediction/clock.ts';
import { unassessedHourNotes } from '../../ledger/prediction/phase-periods.ts';
import type { InputRefs } from './refs.ts';
import type { ContributionRefs } from './contributions-sheet.ts';
import type { PathRefs } from './paths-sheet.ts';
import {
  CELL_BORDER,
  DB_FORMAT,
  SIGNED_DB_FORMAT,
  OVER_FILL,
  OVER_FONT,
  printSetup,
  styleHeaderRow,
  writeSection,
  writeTitle,
  FIT_TO_WIDTH,
} from './styles.ts';

export const LEVELS = 'levels';

/** Text a level cell shows when no duty of the phase is working. */
export const NONE_WORKING = 'none working';
/** Marker of a level over its limit. */
export const OVER_MARK = 'OVER';
/** Number format of hours. */
const HOURS_FORMAT = '0.##';

export interface LevelRefs {
  /** Address of the level, limit and status cells per `cellKey(phaseId, periodId, receiverId)`; `aeq`: L_Aeq,T without the penalty, when the sheet has that block. */
  cells: Map<string, { level: string; limit: string; status: string; aeq?: string }>;
  /** Rows and columns of the level block, for tests and readers. */
  levelBlock: { firstRow: number; lastRow: number; firstColumn: number; lastColumn: number };
}

export const cellKey = (phaseId: string, periodId: string, receiverId: string) =>
  `${phaseId}\u0000${periodId}\u0000${receiverId}`;

/** One row of each block: a phase in one period it is assessed in. */
interface LevelRow {
  phase: Project['phases'][number];
  cell: MatrixCell;
}

/** Writes the levels sheet. */
export function writeLevelsSheet(
  wb: Workbook,
  project: Project,
  evaluation: Evaluation,
  inputs: InputRefs,
  paths: PathRefs,
  contributions: ContributionRefs,
): LevelRefs {
  const ws = wb.addWorksheet(LEVELS, { views: [{ state: 'frozen', ySplit: 5, xSplit: 3 }], pageSetup: FIT_TO_WIDTH });
  writeTitle(
    ws,
    'Predicted levels, phase × receiver, dB LAeq,T (LAr,T where a character penalty applies)',
    'Each level is 10·lg of the sum of 10^(L/10) over the chosen machines of the phase (contributions sheet); a row for another period than the phase’s own adds the shift in its last column. Where a tonal or impulsive machine draws the character penalty the level is the rating level LAr,T (ISO 1996-1) = LAeq,T + penalty (the penalty is a term of its own on the contributions sheet). Shaded and marked OVER where it exceeds the limit. Estimates, about ±3 dB.',
  );
  const receiverIds = paths.receiverIds;
  const receiverName = (id: string) => project.receivers.find((r) => r.id === id)?.name ?? 'reference receiver';
  const firstColumn = 4;
  const lastColumn = firstColumn + receiverIds.length - 1;
  const hoursColumn = lastColumn + 1;
  const lengthColumn = lastColumn + 2;
  const shiftColumn = lastColumn + 3;
  const matrix = new Map<string, MatrixCell>(
    evaluation.matrix.map((m) => [cellKey(m.phaseId, m.periodId, m.receiverId), m]),
  );
  // The rows: each phase with each period it is assessed in, in the evaluation's order.
  const rowsOf: LevelRow[] = [];
  for (const phase of project.phases) {
    const seen = new Set<string>();
    for (const m of evaluation.matrix) {
      if (m.phaseId !== phase.id || seen.has(m.periodId)) continue;
      seen.add(m.periodId);
      rowsOf.push({ phase, cell: m });
    }
    if (seen.size === 0)
      rowsOf.push({
        phase,
        cell: {
          phaseId: phase.id,
          receiverId: '',
          periodId: phase.periodId,
          ownPeriod: true,
          hoursWorked: NaN,
          periodHours: NaN,
          levelDb: NaN,
          over: false,
        },
      });
  }
  const refs: LevelRefs = { cells: new Map(), levelBlock: { firstRow: 0, lastRow: -1, firstColumn, lastColumn } };

  const block = (startRow: number, title: string, withHours: boolean): number => {
    writeSection(ws, startRow, title, withHours ? shiftColumn : lastColumn);
    const header = ws.getRow(startRow + 1);
    header.getCell(1).value = 'Phase ID';
    header.getCell(2).value = 'Phase';
    header.getCell(3).value = 'Period ID';
    receiverIds.forEach((id, k) => {
      header.getCell(firstColumn + k).value = text(receiverName(id));
    });
    if (withHours) {
      header.getCell(hoursColumn).value = 'Hours worked in the period (h)';
      header.getCell(lengthColumn).value = 'Period T (h)';
      header.getCell(shiftColumn).value = 'Shift from the phase’s own period (dB)';
    }
    styleHeaderRow(ws, startRow + 1, 1, withHours ? shiftColumn : lastColumn);
    rowsOf.forEach(({ phase: p, cell }, i) => {
      const row = ws.getRow(startRow + 2 + i);
      const phaseRef = inputs.phases.get(p.id);
      row.getCell(1).value = phaseRef ? formula(phaseRef.id, text(p.id)) : text(p.id);
      row.getCell(2).value = cell.ownPeriod
        ? phaseRef
          ? formula(phaseRef.name, text(p.name))
          : text(p.name)
        : text(`↳ ${p.name}, hours past its own period`);
      row.getCell(3).value = text(cell.periodId);
      for (let c = 1; c <= (withHours ? shiftColumn : lastColumn); c++) row.getCell(c).border = CELL_BORDER;
    });
    return startRow + 2;
  };

  const levelFirst = block(4, 'Predicted LAeq,T or rating level LAr,T (dB)', true);
  const limitStart = levelFirst + rowsOf.length + 1;
  const limitFirst = block(limitStart, 'Limit for the row’s period (dB)', false);
  const statusStart = limitFirst + rowsOf.length + 1;
  const statusFirst = block(statusStart, 'Status against the limit', false);
  // Where a penalty applies anywhere: L_Aeq,T without it, beside the rating levels.
  const rated = evaluation.matrix.some((m) => m.levelAeqDb !== undefined);
  const aeqFirst = rated
    ? block(
        statusFirst + rowsOf.length + 1,
        'LAeq,T without the character penalty (dB): the rating level LAr,T above less the penalty',
        false,
      )
    : 0;
  refs.levelBlock = { firstRow: levelFirst, lastRow: levelFirst + rowsOf.length - 1, firstColumn, lastColumn };

  // Hours worked, period length and the shift, for every row of the level block.
  const ownRowOf = new Map<string, number>();
  rowsOf.forEach(({ phase: p, cell }, i) => {
    if (cell.ownPeriod) ownRowOf.set(p.id, levelFirst + i);
  });
  rowsOf.forEach(({ phase: p, cell }, i) => {
    const row = levelFirst + i;
    const phaseRef = inputs.phases.get(p.id);
    const periodRef = inputs.periods.get(cell.periodId);
    const ownPeriod = project.periods.find((x) => x.id === p.periodId);
    const period = project.periods.find((x) => x.id === cell.periodId);
    const hours = ws.getCell(row, hoursColumn);
    // Hours in another period that shares times of day with the own period are the program's count (the own period's hours are not counted twice).
    const sharesOwnHours =
      !cell.ownPeriod &&
      ownPeriod !== undefined &&
      period !== undefined &&
      overlapHours(ownPeriod.start, ownPeriod.end, period.start, period.end) > 0;
    hours.value =
      phaseRef && periodRef && !sharesOwnHours
        ? formula(`${overlapDays(phaseRef.start, phaseRef.end, periodRef.start, periodRef.end)}*24`, cell.hoursWorked)
        : num(cell.hoursWorked);
    hours.numFmt = HOURS_FORMAT;
    const length = ws.getCell(row, lengthColumn);
    length.value = periodRef
      ? formula(`${spanDays(periodRef.start, periodRef.end)}*24`, cell.periodHours)
      : num(cell.periodHours);
    length.numFmt = HOURS_FORMAT;
    const own = ownRowOf.get(p.id);
    const shift = ws.getCell(row, shiftColumn);
    const shiftDb = cell.ownPeriod
      ? 0
      : 10 * Math.log10(cell.hoursWorked / cell.periodHours) -
        10 *
          Math.log10(
            own === undefined
              ? NaN
              : (rowsOf[own - levelFirst]?.cell.hoursWorked ?? NaN) /
                  (rowsOf[own - levelFirst]?.cell.periodHours ?? NaN),
          );
    shift.value = cell.ownPeriod
      ? 0
      : own === undefined
        ? formula('NA()', NaN)
        : formula(
            `10*LOG10(${rel(hoursColumn, row)}/${rel(lengthColumn, row)})-10*LOG10(${rel(hoursColumn, own)}/${rel(lengthColumn, own)})`,
            shiftDb,
          );
    shift.numFmt = SIGNED_DB_FORMAT;
  });

  rowsOf.forEach(({ phase: p, cell: rowCell }, i) => {
    receiverIds.forEach((receiverId, k) => {
      const column = firstColumn + k;
      const cell = matrix.get(cellKey(p.id, rowCell.periodId, receiverId));
      const energy = contributions.energyRange.get(receiverId) as string;
      const phaseIdCell = `$A${levelFirst + i}`;
      const sum = `SUMPRODUCT((${contributions.phaseRange}=${phaseIdCell})*${energy})`;
      const shift = rowCell.ownPeriod ? '' : `+$${rel(shiftColumn, levelFirst + i)}`;
      const levelCell = ws.getCell(levelFirst + i, column);
      const level = cell?.levelDb ?? NaN;
      levelCell.value = formula(
        `IF(${sum}=0,"${NONE_WORKING}",10*LOG10(${sum})${shift})`,
        level === -Infinity ? NONE_WORKING : level,
      );
      levelCell.numFmt = DB_FORMAT;

      const limitAddress = inputs.receivers.get(receiverId)?.limitByPeriod.get(rowCell.periodId);
      const limitCell = ws.getCell(limitFirst + i, column);
      limitCell.value = limitAddress
        ? formula(`IF(ISNUMBER(${limitAddress}),${limitAddress},"no limit")`, cell?.limitDb ?? 'no limit')
        : 'no limit';
      limitCell.numFmt = DB_FORMAT;

      const L = rel(column, levelFirst + i);
      const M = rel(column, limitFirst + i);
      const statusCell = ws.getCell(statusFirst + i, column);
      const status =
        cell?.limitDb === undefined || !Number.isFinite(level)
          ? Number.isNaN(level)
            ? 'not computed'
            : '—'
          : cell.over
            ? OVER_MARK
            : 'within';
      statusCell.value = formula(
        `IF(ISERROR(${L}),"not computed",IF(AND(ISNUMBER(${L}),ISNUMBER(${M})),IF(${L}>${M},"${OVER_MARK}","within"),"—"))`,
        status,
      );
      const addresses: { level: string; limit: string; status: string; aeq?: string } = {
        level: abs(LEVELS, column, levelFirst + i),
        limit: abs(LEVELS, column, limitFirst + i),
        status: abs(LEVELS, column, statusFirst + i),
      };
      if (rated) {
        const aeqSum = `SUMPRODUCT((${contributions.phaseRange}=${phaseIdCell})*${energy}/10^(${contributions.penaltyRange}/10))`;
        const aeq = cell?.levelAeqDb ?? level;
        const aeqCell = ws.getCell(aeqFirst + i, column);
        aeqCell.value = formula(
          `IF(${aeqSum}=0,"${NONE_WORKING}",10*LOG10(${aeqSum})${shift})`,
          aeq === -Infinity ? NONE_WORKING : aeq,
        );
        aeqCell.numFmt = DB_FORMAT;
        addresses.aeq = abs(LEVELS, column, aeqFirst + i);
      }
      refs.cells.set(cellKey(p.id, rowCell.periodId, receiverId), addresses);
    });
  });

  const nRows = rowsOf.length;
  if (nRows > 0 && receiverIds.length > 0) {
    const topLeft = rel(firstColumn, levelFirst);
    const limitTopLeft = rel(firstColumn, limitFirst);
    ws.addConditionalFormatting({
      ref: `${topLeft}:${rel(lastColumn, levelFirst + nRows - 1)}`,
      rules: [
        {
          type: 'expression',
          priority: 1,
          formulae: [`AND(ISNUMBER(${topLeft}),ISNUMBER(${limitTopLeft}),${topLeft}>${limitTopLeft})`],
          style: { fill: OVER_FILL, font: OVER_FONT },
        },
      ],
    });
    const statusTopLeft = rel(firstColumn, statusFirst);
    ws.addConditionalFormatting({
      ref: `${statusTopLeft}:${rel(lastColumn, statusFirst + nRows - 1)}`,
      rules: [
        {
          type: 'expression',
          priority: 2,
          formulae: [`${statusTopLeft}="${OVER_MARK}"`],
          style: { fill: OVER_FILL, font: OVER_FONT },
        },
      ],
    });
  }
  // Working hours that fall in no assessment period: said here, in the words beside the matrix, never dropped.
  const unassessed = unassessedHourNotes(project);
  if (unassessed.length > 0) {
    // Below the last block (the streaming writer keeps no row count).
    const start = (aeqFirst || statusFirst) + rowsOf.length + 1;
    writeSection(ws, start, 'Hours not assessed: working hours in no assessment period', shiftColumn);
    unassessed.forEach((n, i) => {
      const row = ws.getRow(start + 1 + i);
      const phaseId = project.phases[Number(/\[(\d+)\]/.exec(n.path)?.[1])]?.id ?? '';
      row.getCell(1).value = text(phaseId);
      row.getCell(2).value = `NOT ASSESSED: ${n.message}`;
    });
  }
  ws.getColumn(1).width = 12;
  ws.getColumn(2).width = 32;
  ws.getColumn(3).width = 10;
  for (let c = firstColumn; c <= lastColumn; c++) ws.getColumn(c).width = 16;
  for (let c = hoursColumn; c <= shiftColumn; c++) ws.getColumn(c).width = 14;
  printSetup(ws, { landscape: receiverIds.length > 5, repeatRows: [1, 2] });
  return refs;
}
