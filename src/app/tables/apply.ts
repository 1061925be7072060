/**
 * Writing grid edits into a project, immutably. One call takes every change of one user
 * action (typing, Delete, paste, fill down) and returns the new project; text that cannot
 * be read is kept in `project.unreadCells` under "<list>/<row id>/<field>".
 */
import type { Project } from '../../ledger/model/model.ts';
import type { LedgerColumn, TableDefinition, TableList } from './column.ts';

/** One cell edit as the Grid reports it. `rowId` null with `newRow` k: the k-th row to append. */
export interface CellChange {
  rowId: string | null;
  newRow?: number;
  /** Group key of the row a paste started in (for candidates: the duty id), for appended rows. */
  group?: string;
  columnId: string;
  text: string;
}

/** The unread-cell key of a field, e.g. "candidates/c12/lwaDb". */
export function unreadKey(list: TableList, rowId: string, field: string): string {
  return `${list}/${rowId}/${field}`;
}

/** The field a column writes, for unread keys and problem paths. */
export function fieldOf<Row>(column: LedgerColumn<Row>): string {
  return column.field ?? column.id;
}

/**
 * Applies cell edits to a project and returns the new one (the input is not changed).
 * Changes to unknown rows or read-only columns are ignored. New rows are made by the
 * table's `blankRow`, near `hint` (e.g. the duty a new candidate joins).
 *
 * O(changes + rows).
 */
export function applyCellTexts<Row extends { id: string }>(
  project: Project,
  table: TableDefinition<Row>,
  changes: readonly CellChange[],
  hint?: Row,
): Project {
  const rows = [...table.rows(project)];
  // A typed cell or two looks its row up by a pass over the rows; a paste or a fill builds the
  // look-up once. The ids taken are gathered only when a new row needs one.
  const place = rowPlaces(rows, changes.length);
  let taken: Set<string> | undefined;
  const appended = new Map<number, string>();
  const columns = new Map(table.columns.map((c) => [c.id, c] as const));
  const unread: Record<string, string> = { ...(project.unreadCells ?? {}) };
  let touched = false;

  for (const change of changes) {
    const column = columns.get(change.columnId);
    if (!column?.editable || !column.write) continue;
    let at: number | undefined;
    if (change.rowId === null) {
      const k = change.newRow ?? 0;
      let id = appended.get(k);
      if (id === undefined) {
        taken ??= new Set(rows.map((r) => r.id));
        const blank = table.blankRow(project, taken, hint ?? rows[rows.length - 1], change.group);
        id = blank.id;
        taken.add(id);
        appended.set(k, id);
        place.added(id, rows.length);
        rows.push(blank);
      }
      at = place.of(id);
    } else {
      at = place.of(change.rowId);
    }
    if (at === undefined) continue;
    const row = rows[at]!;
    const key = unreadKey(table.list, row.id, fieldOf(column));
    // Writing back the text a cell shows changes nothing (a paste of the same block, a fill
    // down onto equal cells): the stored value stays exactly as it was, even where the cell
    // shows it rounded or a list's names would read back differently.
    if (change.rowId !== null && !(key in unread) && showsText(column, row, change.text)) continue;
    const outcome = column.write(row, change.text);
    const unreadBefore = unread[key];
    if (outcome.failure) unread[key] = change.text;
    else delete unread[key];
    if (unread[key] === unreadBefore && sameData(outcome.row, row)) continue;
    rows[at] = outcome.row;
    touched = true;
  }
  if (!touched) return project;
  const next = table.withRows(project, rows);
  return withUnread(next, unread);
}

/** Changes up to this many find their rows by a pass over the rows rather than a look-up built first. */
const SCAN_LIMIT = 4;

/**
 * Where each row id sits: by a pass over the rows for a few changes (no look-up of thousands
 * of ids made for one typed cell), else by a map built on first use. O(rows) per look-up
 * or O(rows) once.
 */
function rowPlaces<Row extends { id: string }>(
  rows: readonly Row[],
  changes: number,
): { of(id: string): number | undefined; added(id: string, at: number): void } {
  const added = new Map<string, number>();
  let index: Map<string, number> | undefined;
  return {
    of(id) {
      const fresh = added.get(id);
      if (fresh !== undefined) return fresh;
      if (changes <= SCAN_LIMIT) {
        // the last row with the id, as the map below gives (ids are unique in a valid project)
        for (let at = rows.length - 1; at >= 0; at--) if (rows[at]!.id === id) return at;
        return undefined;
      }
      index ??= new Map(rows.map((r, i) => [r.id, i] as const));
      return index.get(id);
    },
    added(id, at) {
      added.set(id, at);
    },
  };
}

/** True when `text` is what the cell shows now. */
function showsText<Row>(column: LedgerColumn<Row>, row: Row, text: string): boolean {
  return column.display(row) === text;
}

/**
 * Equality of plain project data (objects, arrays, strings, numbers, booleans), NaN equal to
 * NaN; an absent key equals a key holding undefined.
 *
 * @example sameData({ a: [1, NaN] }, { a: [1, NaN], b: undefined }) // true
 */
export function sameData(a: unknown, b: unknown): boolean {
  if (Object.is(a, b)) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((item, i) => sameData(item, b[i]));
  const left = a as Record<string, unknown>;
  const right = b as Record<string, unknown>;
  const keys = new Set([...Object.keys(left), ...Object.keys(right)]);
  for (const k of keys) if (!sameData(left[k], right[k])) return false;
  return true;
}

/** Removes rows by id, with their unread cells. */
export function deleteTableRows<Row extends { id: string }>(
  project: Project,
  table: TableDefinition<Row>,
  ids: readonly string[],
): Project {
  const drop = new Set(ids);
  const rows = table.rows(project).filter((r) => !drop.has(r.id));
  if (rows.length === table.rows(project).length) return project;
  const unread: Record<string, string> = {};
  for (const [key, text] of Object.entries(project.unreadCells ?? {})) {
    const [list, id] = key.split('/');
    if (list === table.list && id !== undefined && drop.has(id)) continue;
    unread[key] = text;
  }
  return withUnread(table.withRows(project, rows), unread);
}

/**
 * Reads every unread cell of a table again (after the decimal separator changed, text
 * such as "104,5" may now be readable); cells that now read are written and forgotten.
 */
export function rereadUnread<Row extends { id: string }>(project: Project, table: TableDefinition<Row>): Project {
  const changes: CellChange[] = [];
  for (const [key, text] of Object.entries(project.unreadCells ?? {})) {
    const [list, rowId, ...rest] = key.split('/');
    if (list !== table.list || rowId === undefined) continue;
    const field = rest.join('/');
    const column = table.columns.find((c) => fieldOf(c) === field);
    if (!column) continue;
    const row = table.rows(project).find((r) => r.id === rowId);
    if (row && column.write && !column.write(row, text).failure) changes.push({ rowId, columnId: column.id, text });
  }
  return changes.length ? applyCellTexts(project, table, changes) : project;
}

function withUnread(project: Project, unread: Record<string, string>): Project {
  const next: Project = { ...project };
  if (Object.keys(unread).length) next.unreadCells = unread;
  else delete next.unreadCells;
  return next;
}
