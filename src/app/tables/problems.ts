/**
 * Which cells of a table carry a problem, and the message for each: text that could not
 * be read (kept in `project.unreadCells`) and data problems found by validation (JSON
 * paths such as "$.candidates[3].lwaDb").
 */
import type { Project } from '../../ledger/model/model.ts';
import type { DataProblem } from '../../ledger/model/results.ts';
import type { TableDefinition } from './column.ts';
import { fieldOf } from './apply.ts';
import { cellMessage } from './parse.ts';

/** Problem messages of one table by "<row id>\u0000<column id>". */
export type CellProblems = Map<string, string>;

export const cellKey = (rowId: string, columnId: string): string => `${rowId}\u0000${columnId}`;

/**
 * The ids of the rows with at least one problem. O(problems).
 * @example problemRows(new Map([[cellKey('c1', 'lwaDb'), 'No LWA']])) // Set {'c1'}
 */
export function problemRows(problems: CellProblems): Set<string> {
  const rows = new Set<string>();
  // column ids never hold the separator; a row id might, so the last one splits them
  for (const key of problems.keys()) rows.add(key.slice(0, key.lastIndexOf('\u0000')));
  return rows;
}

const PATH = /^\$\.(\w+)\[(\d+)\]\.?(.*)$/;
/** A bracketed key in a JSON path, e.g. `["d-slab"]`, written as a dotted field part. */
const BRACKET_KEY = /\["((?:[^"\\]|\\.)*)"\]/g;

/**
 * Collects the problems of one table. Unreadable text comes first (its message tells what
 * is accepted); a validation problem fills a cell that has none yet. A problem whose field
 * no column shows goes on the row's first column, unless it is about the whole row and the
 * row holds unread text: then it is a consequence of that text, whose own message says
 * what to type.
 *
 * O(unread cells + problems + rows + columns).
 */
export function tableProblems<Row extends { id: string }>(
  project: Project,
  table: TableDefinition<Row>,
  dataProblems: readonly DataProblem[],
): CellProblems {
  const out: CellProblems = new Map();
  const rows = table.rows(project);
  const byField = new Map(table.columns.filter((c) => c.editable).map((c) => [fieldOf(c), c] as const));
  const prefix = `${table.list}/`;
  const unread = Object.entries(project.unreadCells ?? {}).filter(([key]) => key.startsWith(prefix));
  const rowsWithUnread = new Set(unread.map(([key]) => key.split('/')[1]));
  const first = table.columns[0];
  if (unread.length) {
    const position = new Map(rows.map((r, i) => [r.id, i] as const));
    for (const [key, text] of unread) {
      const [, rowId, ...rest] = key.split('/');
      const column = byField.get(rest.join('/'));
      const at = rowId === undefined ? undefined : position.get(rowId);
      if (!column?.write || at === undefined) continue;
      const failure = column.write(rows[at]!, text).failure;
      const name = first && first.id !== column.id ? first.display(rows[at]!) : '';
      const message = failure
        ? cellMessage(at + 1, column.header, text, failure.problem, failure.accepted, name)
        : cellMessage(at + 1, column.header, text, 'was not read', 'type it again', name);
      out.set(cellKey(rows[at]!.id, column.id), message);
    }
  }
  for (const problem of dataProblems) {
    const m = PATH.exec(problem.path);
    if (!m || m[1] !== table.list) continue;
    const row = rows[Number(m[2])];
    if (!row) continue;
    const field = (m[3] ?? '')
      .replace(BRACKET_KEY, (_all, key: string) => `.${key}`)
      .replace(/^\./, '')
      .replace(/\[\d+\]$/, '');
    if (field === '' && rowsWithUnread.has(row.id)) continue;
    let column = byField.get(field);
    if (!column) {
      for (const [f, c] of byField) {
        if (field.startsWith(`${f}.`) || f.startsWith(`${field}.`)) {
          column = c;
          break;
        }
      }
    }
    column ??= first;
    if (!column) continue;
    const key = cellKey(row.id, column.id);
    if (!out.has(key)) out.set(key, problem.message);
  }
  return out;
}
