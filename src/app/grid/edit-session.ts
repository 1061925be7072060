/**
 * One cell being edited: where it is, what it held and what the user has
 * typed so far. Committing yields one change, or nothing when the text is
 * unchanged; cancelling simply drops the session.
 */
import type { CellPos, GridChange, GridColumn } from './types.ts';

export interface EditSession {
  pos: CellPos;
  rowId: string;
  columnId: string;
  /** Text the cell showed when editing began. */
  original: string;
  /** Text in the editor now. */
  text: string;
  /** 'replace' when a typed character started the edit, 'edit' for Enter, F2 or a double click. */
  mode: 'replace' | 'edit';
}

/** Why a column cannot be edited, in words for the status line. */
export function refusalMessage(column: Pick<GridColumn<unknown>, 'header' | 'kind' | 'editable'>): string | undefined {
  if (column.kind === 'computed') return `${column.header} is computed from other columns and cannot be typed into.`;
  if (!column.editable) return `${column.header} is read-only here.`;
  return undefined;
}

/**
 * Starts editing a cell. A typed character replaces the content; Enter or F2
 * keeps it for editing.
 * @example startEdit({ row: 0, col: 1 }, 'r1', 'lwa', '104', 'x').text // → 'x'
 */
export function startEdit(pos: CellPos, rowId: string, columnId: string, current: string, typed?: string): EditSession {
  return {
    pos,
    rowId,
    columnId,
    original: current,
    text: typed ?? current,
    mode: typed === undefined ? 'edit' : 'replace',
  };
}

/** Replaces the editor text. */
export function updateEdit(session: EditSession, text: string): EditSession {
  return { ...session, text };
}

/**
 * The change a commit reports, or null when the text did not change.
 * @example commitEdit(startEdit({ row: 0, col: 0 }, 'r1', 'lwa', '104', '9')) // → { rowId: 'r1', columnId: 'lwa', text: '9' }
 */
export function commitEdit(session: EditSession): GridChange | null {
  if (session.text === session.original) return null;
  return { rowId: session.rowId, columnId: session.columnId, text: session.text };
}

/** The value a choice column stores for typed text: a matching label's value, else the text. */
export function choiceValue<Row>(column: GridColumn<Row>, text: string): string {
  const wanted = text.trim().toLowerCase();
  const match = column.choices?.find(
    (choice) => choice.label.toLowerCase() === wanted || choice.value.toLowerCase() === wanted,
  );
  return match ? match.value : text;
}
