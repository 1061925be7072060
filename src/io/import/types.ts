/**
 * Shapes shared by the supplier-list importer: the raw table read from a file, the
 * column mapping, the per-cell problems and the preview handed to the user before
 * anything is added to a project.
 */
import type { Candidate } from '../../ledger/model/model.ts';
import type { ImportField } from './fields.ts';

/** One cell as read: text, a number stored as a number (workbooks), a boolean, or empty. */
export type RawCell = string | number | boolean | null;

/** One row as read, with its number in the file (1-based, as a spreadsheet shows it). */
export interface RawRow {
  rowNumber: number;
  cells: RawCell[];
}

/** A file read into rows; nothing interpreted yet. Row and column limits already applied. */
export interface RawTable {
  fileName: string;
  kind: 'xlsx' | 'csv' | 'tsv';
  /** The worksheet read (workbooks only). */
  sheetName?: string;
  /** Rows in file order; wholly empty rows are left out. */
  rows: RawRow[];
  /** Widest row, cells. */
  columnCount: number;
  /** Field delimiter found in a text file. */
  delimiter?: string;
  /** Things the reader noticed that the user should know (other sheets not read, …). */
  notes: string[];
  /**
   * A text file's row (record number) whose quoted cell is never closed: the rest of the
   * file was read into it. The preview flags that row as an error.
   */
  unclosedQuoteRow?: number;
}

/** The field each column feeds, by column index; null = not imported. */
export type ColumnMapping = (ImportField | null)[];

/** One problem with one cell (or, with column -1, with a whole row). */
export interface CellProblem {
  /** Row number in the file, 1-based. */
  rowNumber: number;
  /** Column index, 0-based; -1 when the problem concerns the row as a whole. */
  column: number;
  /** The column as the file names it (its header), or "column D". */
  columnName: string;
  /** The field the cell feeds, when mapped. */
  field: ImportField | null;
  /** Full sentence in the pattern `Row 14, LWA: "12O" is not a number (use dB, e.g. 104.5)`. */
  message: string;
  /** error: the cell could not be read (its text is kept, the value is left unset); note: information. */
  severity: 'error' | 'note';
}

/** One imported row: its candidate and what was wrong with it. */
export interface ImportedRow {
  rowNumber: number;
  candidateId: string;
  /** Problems of this row only. */
  problems: CellProblem[];
  /** True when at least one problem is an error. */
  flagged: boolean;
}

/** What an import would add, shown to the user before anything is added. */
export interface ImportPreview {
  candidates: Candidate[];
  rows: ImportedRow[];
  /** Every problem, row by row. */
  problems: CellProblem[];
  /**
   * Text of cells that could not be read, kept exactly as in the file, keyed
   * "candidates/<id>/<field>" as `Project.unreadCells`.
   */
  unreadCells: Record<string, string>;
  /** Statements about the import as a whole (conversions used, defaults applied). */
  notes: string[];
}
