/**
 * Three-way merge of projects, cell by cell, for two tabs (or an undo) changing one project.
 *
 * A "cell" is one field of one row of a list (candidates, duties, receivers, phases,
 * periods; rows matched by id), one top-level field of the project, or one entry of
 * `unreadCells`. Given the project both sides started from (`base`), one side's version
 * (`mine`) and the other's (`theirs`), every cell changed on one side only takes that
 * side's value; a cell changed on both sides to different values is a conflict, settled
 * by `prefer` and listed. Unchanged rows and lists keep their identity, so a merge of a
 * one-cell edit into a 14,000-machine project copies one row and one array.
 */
import type { Project } from '../model/model.ts';

/** The lists whose rows are merged by id. */
export const ROW_LISTS = ['periods', 'phases', 'receivers', 'duties', 'candidates'] as const;
export type RowList = (typeof ROW_LISTS)[number];

/** A cell both sides changed to different values. */
export interface MergeConflict<L extends string = RowList> {
  /** The row's list, or 'project' for a top-level field. */
  list: L | 'project';
  /** The row's id (absent for a top-level field). */
  rowId?: string;
  /** The row's label or name on the side kept, for messages. */
  rowName?: string;
  /** The row's field (or the top-level field); for a whole row added or deleted on one side, '' */
  field: string;
  /** This side's value (undefined: the row or field is absent). */
  mine: unknown;
  /** The other side's value. */
  theirs: unknown;
  /** Which value the merge kept. */
  kept: 'mine' | 'theirs';
}

export interface MergeResult {
  project: Project;
  conflicts: MergeConflict[];
}

type Row = { id: string } & Record<string, unknown>;
type Bag = Record<string, unknown>;

/**
 * Deep equality of plain JSON values; NaN equals NaN (an unread cell's number).
 * @example same({ a: [1, NaN] }, { a: [1, NaN] }) // true
 */
export function same(a: unknown, b: unknown): boolean {
  if (Object.is(a, b)) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (!same(a[i], b[i])) return false;
    return true;
  }
  const ka = Object.keys(a);
  const kb = Object.keys(b);
  if (ka.length !== kb.length) return false;
  for (const k of ka) {
    if (!Object.hasOwn(b, k) || !same((a as Bag)[k], (b as Bag)[k])) return false;
  }
  return true;
}

function get(bag: Bag | undefined, key: string): unknown {
  return bag !== undefined && Object.hasOwn(bag, key) ? bag[key] : undefined;
}

/**
 * Merges the keys of three records. Returns `theirs` itself when nothing of mine is taken.
 * `onConflict` hears each key changed on both sides.
 */
function mergeBags<T extends Bag>(
  base: T,
  mine: T,
  theirs: T,
  prefer: 'mine' | 'theirs',
  skip: ReadonlySet<string>,
  onConflict: (key: string, m: unknown, t: unknown) => void,
): T {
  if (mine === base || mine === theirs) return theirs;
  if (theirs === base) return mine;
  let out: Bag | undefined;
  const keys = new Set([...Object.keys(base), ...Object.keys(mine), ...Object.keys(theirs)]);
  for (const key of keys) {
    if (skip.has(key)) continue;
    const b = get(base, key);
    const m = get(mine, key);
    const t = get(theirs, key);
    if (m === b || same(m, b)) continue;
    if (t === m || same(t, m)) continue;
    if (!same(t, b)) {
      onConflict(key, m, t);
      if (prefer === 'theirs') continue;
    }
    out ??= { ...theirs };
    if (m === undefined) delete out[key];
    else out[key] = m;
  }
  return (out ?? theirs) as T;
}

function rowName(row: Row | undefined): string | undefined {
  if (!row) return undefined;
  const label = row.label ?? row.name;
  return typeof label === 'string' ? label : undefined;
}

function byId(rows: readonly Row[]): Map<string, Row> {
  const map = new Map<string, Row>();
  for (const row of rows) map.set(row.id, row);
  return map;
}

/** Merges one list's rows by id; rows only I added are placed after the row that precedes them in my list. */
function mergeRows<L extends string>(
  list: L,
  base: readonly Row[],
  mine: readonly Row[],
  theirs: readonly Row[],
  prefer: 'mine' | 'theirs',
  conflicts: MergeConflict<L>[],
): readonly Row[] {
  if (mine === base || mine === theirs) return theirs;
  if (theirs === base) return mine;
  const b = byId(base);
  const m = byId(mine);
  const t = byId(theirs);
  const conflict = (rowId: string, field: string, mv: unknown, tv: unknown, name: string | undefined) => {
    const c: MergeConflict<L> = { list, rowId, field, mine: mv, theirs: tv, kept: prefer };
    if (name !== undefined) c.rowName = name;
    conflicts.push(c);
  };
  let changed = false;
  const out: Row[] = [];
  for (const tr of theirs) {
    const br = b.get(tr.id);
    const mr = m.get(tr.id);
    if (br === undefined) {
      // added by them (or by both under one id)
      if (mr === undefined || same(mr, tr)) out.push(tr);
      else {
        conflict(tr.id, '', mr, tr, rowName(prefer === 'mine' ? mr : tr));
        out.push(prefer === 'mine' ? mr : tr);
        changed ||= prefer === 'mine';
      }
      continue;
    }
    if (mr === undefined) {
      // I deleted it
      if (tr === br || same(tr, br)) {
        changed = true;
        continue;
      }
      conflict(tr.id, '', undefined, tr, rowName(tr));
      if (prefer === 'mine') {
        changed = true;
        continue;
      }
      out.push(tr);
      continue;
    }
    const merged = mergeBags(br, mr, tr, prefer, new Set(['id']), (field, mv, tv) =>
      conflict(tr.id, field, mv, tv, rowName(prefer === 'mine' ? mr : tr)),
    );
    if (merged !== tr) changed = true;
    out.push(merged);
  }
  // Rows of mine missing from theirs: ones I added, and ones they deleted that I changed.
  const present = new Set(out.map((r) => r.id));
  for (let i = 0; i < mine.length; i++) {
    const mr = mine[i]!;
    if (present.has(mr.id) || t.has(mr.id)) continue;
    const br = b.get(mr.id);
    if (br !== undefined) {
      // they deleted it
      if (mr === br || same(mr, br)) continue;
      conflict(mr.id, '', mr, undefined, rowName(mr));
      if (prefer === 'theirs') continue;
    }
    let at = 0;
    for (let j = i - 1; j >= 0; j--) {
      const prev = mine[j]!.id;
      if (present.has(prev)) {
        at = out.findIndex((r) => r.id === prev) + 1;
        break;
      }
    }
    out.splice(at, 0, mr);
    present.add(mr.id);
    changed = true;
  }
  return changed ? out : theirs;
}

/** "candidates/c12/lwaDb" → ["candidates", "c12", "lwaDb"] (the field part may hold more slashes). */
function splitUnreadKey(key: string): [string, string, string] {
  const a = key.indexOf('/');
  const b = a < 0 ? -1 : key.indexOf('/', a + 1);
  if (a < 0 || b < 0) return [key, '', ''];
  return [key.slice(0, a), key.slice(a + 1, b), key.slice(b + 1)];
}

/**
 * Merges `mine` and `theirs`, both made from `base`. `prefer` settles a cell changed on
 * both sides: 'mine' when this side's write is the later one, 'theirs' to leave the other
 * side's value (an undo must not undo another tab's edit).
 */
export function mergeProjects(base: Project, mine: Project, theirs: Project, prefer: 'mine' | 'theirs'): MergeResult {
  const { value, conflicts } = mergeDocuments(base, mine, theirs, ROW_LISTS, prefer);
  return { project: value, conflicts };
}

/** A document with lists of rows (matched by id), other top-level fields, and optional `unreadCells`. */
type Document<L extends string> = { [K in L]: readonly { id: string }[] } & { unreadCells?: Record<string, string> };

/**
 * The three-way merge of any document whose `lists` hold rows with ids (a project; the
 * buyer's register with its `machines`), cell by cell as described above. Returns `theirs`
 * itself when nothing of mine is taken.
 */
export function mergeDocuments<L extends string, D extends Document<L>>(
  base: D,
  mine: D,
  theirs: D,
  lists: readonly L[],
  prefer: 'mine' | 'theirs',
): { value: D; conflicts: MergeConflict<L>[] } {
  if (mine === base || mine === theirs) return { value: theirs, conflicts: [] };
  if (theirs === base) return { value: mine, conflicts: [] };
  const conflicts: MergeConflict<L>[] = [];
  const HEAD_SKIP = new Set<string>([...lists, 'unreadCells']);
  const head = mergeBags(
    base as unknown as Bag,
    mine as unknown as Bag,
    theirs as unknown as Bag,
    prefer,
    HEAD_SKIP,
    (field, m, t) => conflicts.push({ list: 'project', field, mine: m, theirs: t, kept: prefer }),
  );
  const next: Bag = head === (theirs as unknown as Bag) ? { ...theirs } : { ...head };
  for (const list of lists) {
    next[list] = mergeRows(
      list,
      base[list] as unknown as Row[],
      mine[list] as unknown as Row[],
      theirs[list] as unknown as Row[],
      prefer,
      conflicts,
    );
  }
  const unread = mergeBags(
    base.unreadCells ?? {},
    mine.unreadCells ?? {},
    theirs.unreadCells ?? {},
    prefer,
    new Set(),
    (key, m, t) => {
      // an unread cell's text goes with its field: listed once, under the field
      const [list, rowId, path = ''] = splitUnreadKey(key);
      const field = path.split('.')[0] ?? path;
      if (conflicts.some((c) => c.list === list && c.rowId === rowId && c.field === field)) return;
      if (!(lists as readonly string[]).includes(list)) return;
      const row = (theirs[list as L] as unknown as Row[]).find((r) => r.id === rowId);
      const c: MergeConflict<L> = { list: list as L, rowId, field, mine: m, theirs: t, kept: prefer };
      const name = rowName(row);
      if (name !== undefined) c.rowName = name;
      conflicts.push(c);
    },
  );
  if (Object.keys(unread).length) next.unreadCells = unread;
  else delete next.unreadCells;
  let unchanged =
    (theirs.unreadCells ?? {}) === unread || (theirs.unreadCells === undefined && !Object.keys(unread).length);
  for (const key of Object.keys(next)) {
    if (key !== 'unreadCells' && next[key] !== (theirs as unknown as Bag)[key]) unchanged = false;
  }
  if (Object.keys(next).length !== Object.keys(theirs).length) unchanged = false;
  return { value: unchanged ? theirs : (next as unknown as D), conflicts };
}
