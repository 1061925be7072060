/**
 * The auditable workbook export: a project, its evaluation and (when run) the optimiser's
 * result as an .xlsx a reviewer can check cell by cell.
 *
 * Sheets: inputs, assumptions, paths, contributions, levels, shortlist, compliance. Levels
 * are live formulas on the inputs and assumptions (no project quantity hidden inside a
 * formula), each with its cached result so viewers that do not recalculate show the numbers.
 *
 * Pure TypeScript on exceljs: no DOM, Svelte or Dexie, so the command line and the app share
 * it; the app loads this module with a dynamic import().
 */
import ExcelJS from 'exceljs';
import type { Project } from '../../ledger/model.ts';
import type { Evaluation, OptimiseResult, RankingRow } from '../../ledger/results.ts';
import { writeInputsSheet } from './inputs-sheet.ts';
import { writeAssumptionsSheet } from './assumptions-sheet.ts';
import { writePathsSheet } from './paths-sheet.ts';
import { writeContributionsSheet } from './contributions-sheet.ts';
import { writeLevelsSheet } from './levels-sheet.ts';
import { writeComplianceSheet } from './compliance-sheet.ts';
import { writeShortlistSheet } from './shortlist-sheet.ts';

export interface WorkbookExportOptions {
  /** The evaluation of the project for the fleet to show (its fleet fills the CHOSEN cells). */
  evaluation: Evaluation;
  /** The optimiser's result, when it has been run: best fleet, hand method, saving. */
  optimise?: OptimiseResult;
  /**
   * The ranking of each duty's candidates by duty id, when the caller has it. Without it the
   * shortlist ranks each duty at its phase's worst receiver itself.
   */
  rankings?: Record<string, { receiverId: string; rows: RankingRow[] }>;
  /** Workbook creation time (default now); fixed in tests for identical output. */
  created?: Date;
}

/** Sheet names, in workbook order. */
export const SHEETS = ['inputs', 'assumptions', 'paths', 'contributions', 'levels', 'shortlist', 'compliance'] as const;

/**
 * Builds the workbook.
 * O(candidates × receivers) cells.
 * @example const bytes = await exportWorkbook(project, { evaluation: evaluateProject(project) }); // .xlsx bytes
 */
export async function buildWorkbook(project: Project, options: WorkbookExportOptions): Promise<ExcelJS.Workbook> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Plant Noise Ledger';
  wb.title = project.name;
  wb.created = options.created ?? new Date();
  wb.modified = wb.created;
  wb.calcProperties.fullCalcOnLoad = true;
  const { evaluation } = options;
  const inputs = writeInputsSheet(wb, project, evaluation);
  writeAssumptionsSheet(wb, project);
  const paths = writePathsSheet(wb, project, inputs);
  const contributions = writeContributionsSheet(wb, project, evaluation, inputs, paths);
  const levels = writeLevelsSheet(wb, project, evaluation, inputs, paths, contributions);
  writeShortlistSheet(wb, project, options);
  writeComplianceSheet(wb, project, evaluation, inputs, paths, levels);
  return wb;
}

/**
 * Exports a project as an auditable .xlsx workbook.
 * @example const bytes = await exportWorkbook(demoProject(), { evaluation: evaluateProject(demoProject()) });
 */
export async function exportWorkbook(project: Project, options: WorkbookExportOptions): Promise<Uint8Array> {
  const wb = await buildWorkbook(project, options);
  const buffer = await wb.xlsx.writeBuffer();
  return new Uint8Array(buffer as ArrayBuffer);
}
