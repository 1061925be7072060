/**
 * What a cell shows and what is wrong with it.
 *
 * A cell whose text could not be read shows exactly what the user typed,
 * never the parsed value, so nothing typed is lost from view.
 */
import type { GridColumn } from './types.ts';

export type RawTextFn = (rowId: string, columnId: string) => string | undefined;
/** The message for a flagged cell; `row` is the row itself, for owners that look things up by it. */
export type ProblemFn<Row = never> = (rowId: string, columnId: string, row: Row) => string | undefined;
/**
 * Whether any cell of a row may carry a message or a kept text; false lets the grid skip
 * asking the row's cells one by one (an edit re-reads every row on screen).
 */
export type FlaggedFn<Row = never> = (rowId: string, row: Row) => boolean;
/**
 * What a row's texts, messages and marks are made from besides the row itself and the
 * columns (its computed figures, its checks, whether it has a message): the grid re-reads
 * the row only when one of these differs (`Object.is`) from the last read. An owner that
 * cannot list them leaves this out, and every row on screen is re-read with each revision.
 */
export type RowInputsFn<Row = never> = (rowId: string, row: Row) => readonly unknown[];

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
 * @example cellProblem(lwaColumn, 'r1', row, undefined, () => '12O') // → '"12O" could not be read (use dB, e.g. 104.5)'
 */
export function cellProblem<Row>(
  column: GridColumn<Row>,
  rowId: string,
  row: Row,
  problem?: ProblemFn<Row>,
  rawText?: RawTextFn,
): string | undefined {
  const message = problem?.(rowId, column.id, row);
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

const NO_PROBLEMS: readonly (string | undefined)[] = Object.freeze([]);

/**
 * The messages of one row's flagged cells (undefined where a cell has none), in column order;
 * an empty list when `flagged` says the row has none. O(columns), O(1) for a row not flagged.
 */
export function rowProblems<Row>(
  columns: readonly GridColumn<Row>[],
  rowId: string,
  row: Row,
  problem?: ProblemFn<Row>,
  rawText?: RawTextFn,
  flagged?: FlaggedFn<Row>,
): readonly (string | undefined)[] {
  if (flagged && !flagged(rowId, row)) return NO_PROBLEMS;
  return columns.map((column) => cellProblem(column, rowId, row, problem, rawText));
}
