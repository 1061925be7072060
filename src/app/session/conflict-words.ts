/**
 * Words for a cell two tabs changed: which table, which row, which column, and the values,
 * for the message a tab shows when its value was replaced or an undo left a cell alone.
 */
import type { MergeConflict } from '../../ledger/file/project-merge.ts';
import type { Workspace } from '../state/workspace.svelte.ts';
import type { TableList } from '../tables/column.ts';

const LIST_WORDS: Record<MergeConflict['list'], string> = {
  candidates: 'Machines',
  duties: 'Duties',
  receivers: 'Receivers',
  phases: 'Phases',
  periods: 'Periods',
  project: 'Project',
};

function valueWords(value: unknown): string {
  if (value === undefined) return '(nothing)';
  if (typeof value === 'number') return Number.isNaN(value) ? '(unread text)' : String(value);
  if (typeof value === 'string') return `“${value}”`;
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return 'a different setting';
}

/** "Machines › Breaker HB20 › LWA" for a conflict. */
export function conflictPlace(ws: Workspace | undefined, c: MergeConflict): string {
  const parts = [LIST_WORDS[c.list]];
  if (c.rowId !== undefined) parts.push(c.rowName || c.rowId);
  if (c.field) {
    let header = c.field;
    if (ws && c.list !== 'project') {
      const column = ws.table(c.list as TableList).columns.find((col) => col.id === c.field || col.field === c.field);
      if (column) header = column.header;
    }
    parts.push(header);
  } else if (c.rowId !== undefined) {
    parts.push(c.mine === undefined ? '(row deleted here)' : '(whole row)');
  }
  return parts.join(' › ');
}

/** The words for cells whose value this tab committed and another tab's later save replaced, each at `placeOf(c)`. */
function replacedWords<L extends string>(
  conflicts: readonly MergeConflict<L>[],
  placeOf: (c: MergeConflict<L>) => string,
): string {
  const shown = conflicts
    .slice(0, 3)
    .map((c) => `${placeOf(c)}: now ${valueWords(c.mine)} (this tab had ${valueWords(c.theirs)})`);
  const more = conflicts.length > 3 ? `, and ${conflicts.length - 3} more` : '';
  return `Another tab saved a different value after this tab did, and the later one is kept. ${shown.join('; ')}${more}. Type your value again to keep it instead.`;
}

/** The message for the tab whose committed value another tab's later save replaced. */
export function replacedMessage(ws: Workspace | undefined, conflicts: readonly MergeConflict[]): string {
  return replacedWords(conflicts, (c) => conflictPlace(ws, c));
}

/** The message for the tab whose committed register value another tab's later save replaced. */
export function registerReplacedMessage(
  conflicts: readonly MergeConflict<'machines'>[],
  headerOf: (field: string) => string,
): string {
  return replacedWords(
    conflicts,
    (c) => `Machine register › ${c.rowName || c.rowId} › ${c.field ? headerOf(c.field) : '(whole row)'}`,
  );
}

/** The message when an undo or redo left cells another tab changed since. */
export function skippedMessage(
  ws: Workspace | undefined,
  conflicts: readonly MergeConflict[],
  action: 'undo' | 'redo',
): string {
  const shown = conflicts.slice(0, 3).map((c) => `${conflictPlace(ws, c)} (now ${valueWords(c.theirs)})`);
  const more = conflicts.length > 3 ? `, and ${conflicts.length - 3} more` : '';
  return `${action === 'undo' ? 'Undo' : 'Redo'} left alone what another tab changed since: ${shown.join('; ')}${more}. Everything else of this tab's edit was ${action === 'undo' ? 'undone' : 'redone'}.`;
}
