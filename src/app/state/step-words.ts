/**
 * What an undo step changed, in words for the status line ("Undid the edit to machine
 * “Dumper 6 t”", "Redid adding duty “Pump the slab”"). Things are named by their names,
 * never by internal ids: an edited row by the name it shows once the step is undone or redone. Rows are compared by identity: an edit replaces the rows it changes
 * (the Workspace never changes a row in place), so unchanged rows are the same objects.
 */
import type { Project } from '../../ledger/model/model.ts';

/** The project's lists of named rows, with the word for one row. */
const LISTS = [
  ['candidates', 'machine', 'machines'],
  ['duties', 'duty', 'duties'],
  ['receivers', 'receiver', 'receivers'],
  ['phases', 'phase', 'phases'],
  ['periods', 'period', 'periods'],
  ['clauses', 'clause', 'clauses'],
  ['fleets', 'fleet', 'fleets'],
  ['barriers', 'barrier', 'barriers'],
] as const;

type Row = { id?: string; name?: string; label?: string; ref?: string };

function nameOf(row: Row | undefined): string {
  const name = row?.label || row?.name || row?.ref;
  return name ? `“${name}”` : 'without a name';
}

function rowsOf(project: Project, list: (typeof LISTS)[number][0]): readonly Row[] {
  const rows = (project as unknown as Record<string, unknown>)[list];
  return Array.isArray(rows) ? (rows as Row[]) : [];
}

/** "machine “X”" for one row, "3 machines" for more. */
function counted(rows: readonly Row[], one: string, many: string): string {
  return rows.length === 1 ? `${one} ${nameOf(rows[0])}` : `${rows.length} ${many}`;
}

/**
 * Words for the change from `before` to `after`: what was added, deleted or edited, by name.
 * O(rows of the lists that changed).
 * @example stepWords(p, withLwaEdited) // "the edit to machine “Dumper 6 t”"
 */
export function stepWords(before: Project, after: Project, namesFrom: 'before' | 'after' = 'after'): string {
  const shown = namesFrom === 'before' ? before : after;
  const parts: string[] = [];
  for (const [list, one, many] of LISTS) {
    const was = rowsOf(before, list);
    const now = rowsOf(after, list);
    if (was === now) continue;
    const wasById = new Map(was.map((r) => [r.id ?? r.name, r] as const));
    const nowById = new Map(now.map((r) => [r.id ?? r.name, r] as const));
    const added = now.filter((r) => !wasById.has(r.id ?? r.name));
    const removed = was.filter((r) => !nowById.has(r.id ?? r.name));
    const edited = now
      .filter((r) => {
        const old = wasById.get(r.id ?? r.name);
        return old !== undefined && old !== r;
      })
      .map((r) => (shown === before ? (wasById.get(r.id ?? r.name) as Row) : r));
    if (added.length) parts.push(`adding ${counted(added, one, many)}`);
    if (removed.length) parts.push(`deleting ${counted(removed, one, many)}`);
    if (edited.length) parts.push(`the edit to ${counted(edited, one, many)}`);
    if (!added.length && !removed.length && !edited.length && now.some((r, i) => r !== was[i]))
      parts.push(`the new order of the ${many}`);
  }
  if (!parts.length && before.unreadCells !== after.unreadCells) {
    // a cell that could not be read keeps its text under "<list>/<row id>/<field>"
    const keys = new Set([...Object.keys(before.unreadCells ?? {}), ...Object.keys(after.unreadCells ?? {})]);
    for (const key of keys) {
      if (before.unreadCells?.[key] === after.unreadCells?.[key]) continue;
      const [list, id] = key.split('/');
      const entry = LISTS.find(([l]) => l === list);
      if (entry) parts.push(`the edit to ${entry[1]} ${nameOf(rowsOf(shown, entry[0]).find((r) => r.id === id))}`);
      break;
    }
  }
  if (!parts.length) {
    if (before.assessedFleet !== after.assessedFleet) parts.push('the choice of the fleet assessed');
    else if (before.name !== after.name) parts.push('the project’s new name');
    else if (before.settings !== after.settings || before.propagation !== after.propagation)
      parts.push('the change to the settings');
    else if (before.sitePlan !== after.sitePlan) parts.push('the change to the site plan');
  }
  if (!parts.length) return 'the last edit';
  return parts.length > 2 ? `${parts.slice(0, 2).join(' and ')} and more` : parts.join(' and ');
}
