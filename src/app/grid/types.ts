/**
 * Types shared by the grid component and its pure helpers.
 *
 * The grid is generic over the row type: it never parses or computes values,
 * it shows `display(row)` (or the text kept for an unread cell) and reports
 * what the user typed as text, leaving parsing to the owner.
 */

/** What a column holds; decides the editor and the default alignment. */
export type GridColumnKind = 'text' | 'number' | 'choice' | 'boolean' | 'computed';

/** One column of the grid. */
export interface GridColumn<Row> {
  /** Stable identifier, passed back in every change. */
  id: string;
  /** Header text. */
  header: string;
  /** Unit shown under the header, e.g. "dB" or "m". */
  unit?: string;
  /** Initial width in CSS pixels. */
  width?: number;
  kind: GridColumnKind;
  /** Whether the user may type into the column; computed columns never are. */
  editable: boolean;
  /** Value used for sorting (numbers sort numerically, NaN and undefined last). */
  value(row: Row): string | number | boolean | undefined;
  /** Text shown, copied and searched. */
  display(row: Row): string;
  /** Allowed values of a `choice` column; the editor offers the labels and reports the value. */
  choices?: { value: string; label: string }[];
  align?: 'start' | 'end';
  /** What the column accepts, shown as help in the column menu and to screen readers. */
  describe?: string;
}

/**
 * One cell change reported by the grid. `rowId: null` with `newRow: k`
 * (0-based) asks the owner to append the k-th new row (a paste past the end).
 */
export interface GridChange {
  rowId: string | null;
  newRow?: number;
  /** Group key of the row the paste started in, for appended rows of a grouped grid. */
  group?: string;
  columnId: string;
  text: string;
}

/** Row flags shown as small text badges in the first column. */
export interface RowMarks {
  over?: boolean;
  dominated?: boolean;
  freeWin?: boolean;
  baseline?: boolean;
  pinned?: boolean;
  excluded?: boolean;
}

/** How rows are put into collapsible groups. */
export interface GridGrouping<Row> {
  key(row: Row): string;
  label(key: string): string;
}

/** A position in the grid: display row index (−1 = header row) and visible column index. */
export interface CellPos {
  row: number;
  col: number;
}

/** An inclusive rectangle of cells, top ≤ bottom and left ≤ right. */
export interface CellRange {
  top: number;
  bottom: number;
  left: number;
  right: number;
}

/** One line of the body as rendered: a group header or a data row. */
export type DisplayRow<Row> =
  | { kind: 'group'; id: string; key: string; count: number; expanded: boolean }
  | { kind: 'row'; id: string; row: Row; group?: string };
