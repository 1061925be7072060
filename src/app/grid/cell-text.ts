/**
 * What a cell shows and what is wrong with it.
 *
 * A cell whose text could not be read shows exactly what the user typed,
 * never the parsed value, so nothing typed is lost from view.
 */
import type { GridColumn } from './types.ts';

export type RawTextFn = (rowId: string, columnId: string) => string | undefined;
export type ProblemFn = (rowId: string, columnId: string) => string | undefined;

/**
 * The text shown, copied and edited for a cell: the kept raw text when there
 * is one, otherwise the column's display text.
 * @example cellText(column, row, 'r1', () => '12O') // → '12O'
 */
export function cellText<Row>(column: GridColumn<Row>, row: Row, rowId: string, rawText?: RawTextFn): string {
  return rawText?.(rowId, column.id) ?? column.display(row);
}

/**
 * The message for a flagged cell: the owner's message, or, for kept text
 * without one, a plain statement naming what the column accepts.
 * @example cellProblem(lwaColumn, 'r1', undefined, () => '12O') // → '"12O" could not be read (use dB, e.g. 104.5)'
 */
export function cellProblem<Row>(
  column: GridColumn<Row>,
  rowId: string,
  problem?: ProblemFn,
  rawText?: RawTextFn,
): string | undefined {
  const message = problem?.(rowId, column.id);
  if (message !== undefined) return message;
  const raw = rawText?.(rowId, column.id);
  if (raw === undefined) return undefined;
  return `"${raw}" could not be read${column.describe ? ` (${column.describe})` : ''}`;
}

/** The texts of one row's cells, in column order. O(columns). */
export function rowTexts<Row>(
  columns: readonly GridColumn<Row>[],
  row: Row,
  rowId: string,
  rawText?: RawTextFn,
): string[] {
  return columns.map((column) => cellText(column, row, rowId, rawText));
}

/** The messages of one row's flagged cells (undefined where a cell has none), in column order. O(columns). */
export function rowProblems<Row>(
  columns: readonly GridColumn<Row>[],
  rowId: string,
  problem?: ProblemFn,
  rawText?: RawTextFn,
): (string | undefined)[] {
  return columns.map((column) => cellProblem(column, rowId, problem, rawText));
}
