/**
 * The auditable workbook export: a project, its evaluation and (when run) the optimiser's
 * result as an .xlsx a reviewer can check cell by cell.
 *
 * Sheets: inputs, assumptions, paths, contributions, levels, shortlist, compliance, clauses (when the project has tender clauses), confidence, checks.
 * Levels are live formulas on the inputs and assumptions (no project quantity hidden inside a
 * formula), each with its cached result so viewers that do not recalculate show the numbers.
 * The checks sheet adds the Directive 2000/14/EC permissible levels and the operators' daily
 * exposure; a stand-in sound power is marked STAND-IN on every sheet where it appears.
 *
 * Two writers give the same workbook: exceljs's streaming writer (Node; each sheet, and the
 * rows of the large tables, turned into XML as soon as written, native zlib), and the
 * in-memory workbook (browsers, whose exceljs build has no streaming writer; formulas shared
 * down their columns, JSZip deflate at level 1). 5,000 candidates: about 1.1–1.5 s of CPU
 * streaming, 2.7–3.5 s in memory (tests/bench/export.bench.ts).
 *
 * Memory of the streaming writer is bounded: the rows of the tables that grow with the
 * candidates (inputs, sources of LWA, contributions, checks) are made one at a time, committed
 * in order, and the writing waits whenever more than HELD_BYTES of a sheet's XML wait to be
 * compressed; strings are written in their cells (no shared-strings table, which would hold
 * every distinct text until the end). What stays is the project, its evaluation, the cell
 * addresses of each candidate and the compressed file (tests/bench/export-large.bench.ts).
 *
 * Pure TypeScript on exceljs: no DOM, Svelte or Dexie, so the command line and the app share
 * it; the app loads this module with a dynamic import().
 */
import { writeClausesSheet, CLAUSES } from './clauses-sheet.ts';
import ExcelJS from 'exceljs';
import type { Project } from '../../ledger/model/model.ts';
import type { Evaluation, OptimiseResult, RankingRow } from '../../ledger/model/results.ts';
import { INPUTS, writeInputsSheet } from './inputs-sheet.ts';
import { ASSUMPTIONS, writeAssumptionsSheet } from './assumptions-sheet.ts';
import { PATHS, writePathsSheet } from './paths-sheet.ts';
import { CONTRIBUTIONS, writeContributionsSheet } from './contributions-sheet.ts';
import { LEVELS, writeLevelsSheet } from './levels-sheet.ts';
import { COMPLIANCE, writeComplianceSheet } from './compliance-sheet.ts';
import { SHORTLIST, writeShortlistSheet } from './shortlist-sheet.ts';
import { CHECKS, writeChecksSheet } from './checks-sheet.ts';
import { CONFIDENCE, writeConfidenceSheet } from './confidence-sheet.ts';
import { candidateChecks } from '../../ledger/checks/candidate-checks.ts';

export interface WorkbookExportOptions {
  /** The evaluation of the project for the fleet to show (its fleet fills the CHOSEN cells). */
  evaluation: Evaluation;
  /** The optimiser's result, when it has been run: best fleet, hand method, saving. */
  optimise?: OptimiseResult;
  /** Name of the fleet the evaluation is for ('baseline', a stored fleet's name, or words for a fleet solved now). */
  fleetName?: string;
  /**
   * The ranking of each duty's candidates by duty id, when the caller has it. Without it the
   * shortlist ranks each duty at its phase's worst receiver itself.
   */
  rankings?: Record<string, { receiverId: string; rows: RankingRow[] }>;
  /** Workbook creation time (default now); fixed in tests for identical output. */
  created?: Date;
  /**
   * How the file is written: 'stream' (exceljs's streaming writer with native zlib; Node
   * only, about three times quicker for large projects) or 'memory' (the in-memory
   * workbook, which also runs in browsers). Default: 'stream' where exceljs offers it.
   */
  writer?: 'stream' | 'memory';
  /** Hears, after each sheet and before the file is compressed, what is being written and the share done (0 to 1). */
  onProgress?: (progress: { step: string; fraction: number }) => void;
}

/** Share of the export given to writing the sheets; the rest is compressing the file. */
const SHARE_SHEETS = 0.75;

/** Sheet names, in workbook order. */
export const SHEETS = [
  'inputs',
  'assumptions',
  'paths',
  'contributions',
  'levels',
  'shortlist',
  'compliance',
  'confidence',
  'checks',
] as const;

/**
 * Deflate level of the in-memory writer (JSZip's pure-JavaScript deflate): 1 writes about
 * a third more bytes than the default 6 in a third of the time.
 */
export const MEMORY_DEFLATE_LEVEL = 1;
/** Deflate level of the streaming writer (native zlib, quick at its default). */
export const STREAM_DEFLATE_LEVEL = 6;

/** The streaming workbook writer where this build of exceljs has it (Node), else undefined (browsers). */
function streamingWriter(): typeof ExcelJS.stream.xlsx.WorkbookWriter | undefined {
  const stream = (ExcelJS as { stream?: typeof ExcelJS.stream }).stream;
  return stream?.xlsx?.WorkbookWriter;
}

/** Bytes of one sheet's XML the streaming writer may hold waiting for compression before writing waits. */
export const HELD_BYTES = 4 * 2 ** 20;

/** The parts of exceljs's streaming sheet writer the pause reads (not in its published types). */
interface SheetWriterInside {
  /**
   * The sheet's XML on its way to the zip: its own buffers until the zip takes the sheet (after
   * the earlier sheets), then its pipes, the streams that hold it until compressed.
   */
  stream: {
    buffers?: { length: number }[];
    pipes?: { _writableState?: { length?: number }; _readableState?: { length?: number } }[];
  };
  /** Every formula cell written, kept only to resolve shared formulas, which this writer never writes. */
  _formulae: Record<string, unknown>;
}

/**
 * The wait between blocks of rows of a streamed sheet: lets go of the formula cells already
 * written, gives the compression a turn, then waits (2 ms at a time) while more than HELD_BYTES of the sheet's XML wait to be
 * compressed (behind the earlier sheets' XML, compressed one sheet after another).
 */
function pauseFor(sheet: () => ExcelJS.Worksheet | undefined): () => Promise<void> {
  return async () => {
    const writer = sheet() as unknown as SheetWriterInside | undefined;
    if (!writer) return;
    writer._formulae = {};
    // A turn of the event loop every block, so the compression keeps pace with the writing.
    await new Promise((resolve) => setImmediate(resolve));
    for (;;) {
      let held = 0;
      for (const buffer of writer.stream.buffers ?? []) held += buffer.length;
      // (The zip's streams come from an older stream library without writableLength / readableLength.)
      for (const pipe of writer.stream.pipes ?? [])
        held += (pipe._writableState?.length ?? 0) + (pipe._readableState?.length ?? 0);
      if (held <= HELD_BYTES) return;
      await new Promise((resolve) => setTimeout(resolve, 2));
    }
  };
}

/**
 * Writes every sheet into a workbook. With the streaming writer (`streaming`), each sheet is
 * committed as soon as it is written (no sheet writer goes back to an earlier sheet), so its
 * rows are turned into XML and released while the next sheet is built.
 */
async function writeSheets(
  wb: ExcelJS.Workbook,
  project: Project,
  options: WorkbookExportOptions,
  streaming: boolean,
): Promise<void> {
  wb.creator = 'Plant Noise Ledger';
  wb.title = project.name;
  wb.created = options.created ?? new Date();
  wb.modified = wb.created;
  // The in-memory workbook asks spreadsheets to recalculate on load; the streaming writer has
  // no such setting (the cached results are the core's numbers either way).
  if (wb.calcProperties) wb.calcProperties.fullCalcOnLoad = true;
  let written = 0;
  const tell = (step: string, fraction: number) => options.onProgress?.({ step, fraction });
  const done = (name: string) => {
    if (streaming) (wb.getWorksheet(name) as unknown as { commit(): void }).commit();
    written++;
    tell(`Writing the workbook: ${name} sheet written`, (SHARE_SHEETS * written) / (SHEETS.length + 1));
  };
  tell('Writing the workbook: inputs sheet', 0);
  const { evaluation } = options;
  const checks = candidateChecks(project, evaluation);
  const pause = (name: string) => (streaming ? pauseFor(() => wb.getWorksheet(name)) : undefined);
  const inputs = await writeInputsSheet(wb, project, evaluation, checks, pause(INPUTS));
  done(INPUTS);
  await writeAssumptionsSheet(wb, project, checks, evaluation.notes, pause(ASSUMPTIONS));
  done(ASSUMPTIONS);
  const paths = writePathsSheet(wb, project, inputs);
  done(PATHS);
  const contributions = await writeContributionsSheet(wb, project, evaluation, inputs, paths, checks, {
    shareFormulas: !streaming,
    pause: pause(CONTRIBUTIONS),
  });
  done(CONTRIBUTIONS);
  const levels = writeLevelsSheet(wb, project, evaluation, inputs, paths, contributions);
  done(LEVELS);
  writeShortlistSheet(wb, project, options, checks);
  done(SHORTLIST);
  writeComplianceSheet(wb, project, evaluation, inputs, paths, levels, options.fleetName);
  done(COMPLIANCE);
  if (writeClausesSheet(wb, project, evaluation, levels, options.fleetName)) done(CLAUSES);
  writeConfidenceSheet(wb, project, evaluation, options.fleetName);
  done(CONFIDENCE);
  await writeChecksSheet(wb, project, inputs, checks, pause(CHECKS));
  done(CHECKS);
}

/**
 * Builds the workbook in memory (formulas shared down their columns).
 * O(candidates × receivers) cells.
 * @example const wb = await buildWorkbook(project, { evaluation: evaluateProject(project) }); // wb.worksheets.length === 9
 */
export async function buildWorkbook(project: Project, options: WorkbookExportOptions): Promise<ExcelJS.Workbook> {
  const wb = new ExcelJS.Workbook();
  await writeSheets(wb, project, options, false);
  return wb;
}

/**
 * Exports a project as an auditable .xlsx workbook. O(candidates × receivers).
 * @example const bytes = await exportWorkbook(demoProject(), { evaluation: evaluateProject(demoProject()) });
 */
export async function exportWorkbook(project: Project, options: WorkbookExportOptions): Promise<Uint8Array> {
  const Writer = options.writer === 'memory' ? undefined : streamingWriter();
  if (!Writer) {
    const wb = await buildWorkbook(project, options);
    options.onProgress?.({ step: 'Compressing the workbook', fraction: SHARE_SHEETS });
    const buffer = await wb.xlsx.writeBuffer({
      zip: { compression: 'DEFLATE', compressionOptions: { level: MEMORY_DEFLATE_LEVEL } },
    } as Partial<ExcelJS.XlsxWriteOptions>);
    return new Uint8Array(buffer as ArrayBuffer);
  }
  // No stream given: the writer keeps the bytes in memory (its `stream` property).
  const wb = new Writer({ useStyles: true, useSharedStrings: false, zip: { zlib: { level: STREAM_DEFLATE_LEVEL } } });
  // The small tables' rows stay in memory until their sheet is committed, so those sheet
  // writers may fill rows in any order; the large tables commit theirs as written.
  await writeSheets(wb, project, options, true);
  options.onProgress?.({ step: 'Compressing the workbook', fraction: SHARE_SHEETS });
  await wb.commit();
  const buffer = (wb as unknown as { stream: { read(): Uint8Array } }).stream.read();
  return new Uint8Array(buffer.buffer, buffer.byteOffset, buffer.byteLength);
}
