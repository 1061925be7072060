/**
 * The levels sheet: phase × receiver. Three blocks of the same shape — the predicted phase
 * total LAeq,T (live formulas summing the chosen machines' energies on the contributions
 * sheet), the limit for the phase's period (a reference to the receiver's limit on the inputs
 * sheet), and a status marker — with the levels over their limit shaded by conditional
 * formatting.
 */
import type { Workbook } from 'exceljs';
import type { Project } from '../../ledger/model.ts';
import type { Evaluation, MatrixCell } from '../../ledger/results.ts';
import { abs, formula, rel, text } from './cells.ts';
import type { InputRefs } from './refs.ts';
import type { ContributionRefs } from './contributions-sheet.ts';
import type { PathRefs } from './paths-sheet.ts';
import { CELL_BORDER, DB_FORMAT, OVER_FILL, OVER_FONT, printSetup, styleHeaderRow, writeSection, writeTitle, FIT_TO_WIDTH } from './styles.ts';

export const LEVELS = 'levels';

/** Text a level cell shows when no duty of the phase is working. */
export const NONE_WORKING = 'none working';
/** Marker of a level over its limit. */
export const OVER_MARK = 'OVER';

export interface LevelRefs {
  /** Address of the level, limit and status cells per `${phaseId}\u0000${receiverId}`. */
  cells: Map<string, { level: string; limit: string; status: string }>;
  /** Rows and columns of the level block, for tests and readers. */
  levelBlock: { firstRow: number; lastRow: number; firstColumn: number; lastColumn: number };
}

export const cellKey = (phaseId: string, receiverId: string) => `${phaseId}\u0000${receiverId}`;

/** Writes the levels sheet. */
export function writeLevelsSheet(wb: Workbook, project: Project, evaluation: Evaluation, inputs: InputRefs, paths: PathRefs, contributions: ContributionRefs): LevelRefs {
  const ws = wb.addWorksheet(LEVELS, { views: [{ state: 'frozen', ySplit: 5, xSplit: 3 }], pageSetup: FIT_TO_WIDTH });
  writeTitle(
    ws,
    'Predicted levels, phase × receiver, dB LAeq,T',
    'Each level is 10·lg of the sum of 10^(L/10) over the chosen machines of the phase (contributions sheet). Shaded and marked OVER where it exceeds the limit. Estimates, about ±3 dB.',
  );
  const receiverIds = paths.receiverIds;
  const receiverName = (id: string) => project.receivers.find((r) => r.id === id)?.name ?? 'reference receiver';
  const phases = project.phases;
  const firstColumn = 4;
  const lastColumn = firstColumn + receiverIds.length - 1;
  const matrix = new Map<string, MatrixCell>(evaluation.matrix.map((m) => [cellKey(m.phaseId, m.receiverId), m]));
  const refs: LevelRefs = { cells: new Map(), levelBlock: { firstRow: 0, lastRow: -1, firstColumn, lastColumn } };

  const block = (startRow: number, title: string): number => {
    writeSection(ws, startRow, title, lastColumn);
    const header = ws.getRow(startRow + 1);
    header.getCell(1).value = 'Phase ID';
    header.getCell(2).value = 'Phase';
    header.getCell(3).value = 'Period ID';
    receiverIds.forEach((id, k) => {
      header.getCell(firstColumn + k).value = text(receiverName(id));
    });
    styleHeaderRow(ws, startRow + 1, 1, lastColumn);
    phases.forEach((p, i) => {
      const row = ws.getRow(startRow + 2 + i);
      const phaseRef = inputs.phases.get(p.id);
      row.getCell(1).value = phaseRef ? formula(phaseRef.id, text(p.id)) : text(p.id);
      row.getCell(2).value = phaseRef ? formula(phaseRef.name, text(p.name)) : text(p.name);
      row.getCell(3).value = text(p.periodId);
      for (let c = 1; c <= lastColumn; c++) row.getCell(c).border = CELL_BORDER;
    });
    return startRow + 2;
  };

  const levelFirst = block(4, 'Predicted LAeq,T (dB)');
  const limitStart = levelFirst + phases.length + 1;
  const limitFirst = block(limitStart, 'Limit for the phase’s period (dB)');
  const statusStart = limitFirst + phases.length + 1;
  const statusFirst = block(statusStart, 'Status against the limit');
  refs.levelBlock = { firstRow: levelFirst, lastRow: levelFirst + phases.length - 1, firstColumn, lastColumn };

  phases.forEach((p, i) => {
    receiverIds.forEach((receiverId, k) => {
      const column = firstColumn + k;
      const cell = matrix.get(cellKey(p.id, receiverId));
      const energy = contributions.energyRange.get(receiverId) as string;
      const phaseIdCell = `$A${levelFirst + i}`;
      const sum = `SUMPRODUCT((${contributions.phaseRange}=${phaseIdCell})*${energy})`;
      const levelCell = ws.getCell(levelFirst + i, column);
      const level = cell?.levelDb ?? NaN;
      levelCell.value = formula(`IF(${sum}=0,"${NONE_WORKING}",10*LOG10(${sum}))`, level === -Infinity ? NONE_WORKING : level);
      levelCell.numFmt = DB_FORMAT;

      const limitAddress = inputs.receivers.get(receiverId)?.limitByPeriod.get(p.periodId);
      const limitCell = ws.getCell(limitFirst + i, column);
      limitCell.value = limitAddress ? formula(`IF(ISNUMBER(${limitAddress}),${limitAddress},"no limit")`, cell?.limitDb ?? 'no limit') : 'no limit';
      limitCell.numFmt = DB_FORMAT;

      const L = rel(column, levelFirst + i);
      const M = rel(column, limitFirst + i);
      const statusCell = ws.getCell(statusFirst + i, column);
      const status = cell?.limitDb === undefined || !Number.isFinite(level) ? (Number.isNaN(level) ? 'not computed' : '—') : cell.over ? OVER_MARK : 'within';
      statusCell.value = formula(
        `IF(ISERROR(${L}),"not computed",IF(AND(ISNUMBER(${L}),ISNUMBER(${M})),IF(${L}>${M},"${OVER_MARK}","within"),"—"))`,
        status,
      );
      refs.cells.set(cellKey(p.id, receiverId), { level: abs(LEVELS, column, levelFirst + i), limit: abs(LEVELS, column, limitFirst + i), status: abs(LEVELS, column, statusFirst + i) });
    });
  });

  if (phases.length > 0 && receiverIds.length > 0) {
    const topLeft = rel(firstColumn, levelFirst);
    const limitTopLeft = rel(firstColumn, limitFirst);
    ws.addConditionalFormatting({
      ref: `${topLeft}:${rel(lastColumn, levelFirst + phases.length - 1)}`,
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
      ref: `${statusTopLeft}:${rel(lastColumn, statusFirst + phases.length - 1)}`,
      rules: [{ type: 'expression', priority: 2, formulae: [`${statusTopLeft}="${OVER_MARK}"`], style: { fill: OVER_FILL, font: OVER_FONT } }],
    });
  }
  ws.getColumn(1).width = 12;
  ws.getColumn(2).width = 32;
  ws.getColumn(3).width = 10;
  for (let c = firstColumn; c <= lastColumn; c++) ws.getColumn(c).width = 16;
  printSetup(ws, { landscape: receiverIds.length > 5, repeatRows: [1, 2] });
  return refs;
}
