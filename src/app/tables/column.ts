/**
 * The column shape every table of the app hands to the Grid, plus what the Workspace needs
 * to write a cell: where the value lives in the model (`field`) and how typed text becomes
 * a value (`write`).
 */
import type { Project } from '../../ledger/model/model.ts';
import type { DecimalSeparator } from './parse.ts';

/** A column as the Grid component takes it (see src/app/grid). */
export interface GridColumnShape<Row> {
  id: string;
  header: string;
  unit?: string;
  width?: number;
  kind: 'text' | 'number' | 'choice' | 'boolean' | 'computed';
  editable: boolean;
  /** Value for sorting and filtering. */
  value(row: Row): string | number | boolean | undefined;
  /** Text shown and copied. */
  display(row: Row): string;
  choices?: { value: string; label: string }[];
  align?: 'start' | 'end';
  /** Accepted input, shown as help. */
  describe?: string;
}

/** What writing a cell's text did. */
export interface WriteOutcome<Row> {
  /** The row with the value written; for unreadable number text the field holds NaN. */
  row: Row;
  /** Present when the text could not be read: the text is then kept as an unread cell. */
  failure?: { problem: string; accepted: string };
}

export interface LedgerColumn<Row> extends GridColumnShape<Row> {
  /**
   * Where the value lives in the row, as a dotted path ("lwaDb", "cost.dayRate",
   * "limitsDb.day"). Names the unread cell ("candidates/c12/lwaDb") and matches data
   * problems found by validation ("$.candidates[3].lwaDb").
   */
  field?: string;
  /** Reads typed text into the row. Present on editable columns. */
  write?(row: Row, text: string): WriteOutcome<Row>;
}

/** The lists of a project that are shown as tables. */
export type TableList = 'candidates' | 'duties' | 'receivers' | 'phases' | 'periods' | 'clauses';

/** Everything a table's columns and rows need to know about the project. */
export interface TableContext {
  project: Project;
  separator: DecimalSeparator;
}

/** One table of the app: its rows, columns and how a new row starts. */
export interface TableDefinition<Row extends { id: string }> {
  list: TableList;
  /** The grid's accessible label, e.g. "Candidate machines". */
  label: string;
  rows(project: Project): Row[];
  columns: LedgerColumn<Row>[];
  /**
   * A new blank row to append. `taken` holds the ids in use (including rows added earlier
   * in the same edit); `hint` is a row near which the user was working, and `group` the
   * group key of the rows the user pasted into, when known.
   */
  blankRow(project: Project, taken: Set<string>, hint?: Row, group?: string): Row;
  /** The project with this list replaced. */
  withRows(project: Project, rows: Row[]): Project;
}

/** The first free id of the form prefix + number, e.g. "c17". */
export function nextId(prefix: string, taken: Set<string>): string {
  let n = taken.size + 1;
  while (taken.has(`${prefix}${n}`)) n++;
  return `${prefix}${n}`;
}

/** Reads a dotted path inside a plain object. */
export function getPath(row: unknown, path: string): unknown {
  let value: unknown = row;
  for (const part of path.split('.')) {
    if (value === null || typeof value !== 'object') return undefined;
    value = (value as Record<string, unknown>)[part];
  }
  return value;
}

/** A copy of `row` with the dotted path set (or removed when `value` is undefined); objects on the way are copied, never mutated. */
export function setPath<Row>(row: Row, path: string, value: unknown): Row {
  const [head, ...rest] = path.split('.');
  const source = (row ?? {}) as Record<string, unknown>;
  const copy: Record<string, unknown> = { ...source };
  if (head === undefined) return row;
  if (rest.length === 0) {
    if (value === undefined) delete copy[head];
    else copy[head] = value;
  } else {
    copy[head] = setPath(source[head] ?? {}, rest.join('.'), value);
  }
  return copy as Row;
}

/** Approximate width of one header character and of the header's sort and menu controls, CSS px. */
const HEADER_CHAR_PX = 8.4;
const HEADER_CONTROLS_PX = 46;

/** The column widened, when needed, so that its whole header fits beside the menu button. */
export function fitHeader<Row>(column: LedgerColumn<Row>): LedgerColumn<Row> {
  const needed = Math.ceil(column.header.length * HEADER_CHAR_PX + HEADER_CONTROLS_PX);
  return (column.width ?? 0) >= needed ? column : { ...column, width: needed };
}
