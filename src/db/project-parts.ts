/**
 * A stored project as parts (schema version 4): so that an edit writes only what changed,
 * a project is kept as many small records instead of one body.
 *
 * - `head`: the project without its five row lists (name, settings, propagation, fleets,
 *   unread cells' text…);
 * - `order/<list>`: the ids of a list's rows in order (written only when rows are added,
 *   deleted or moved);
 * - `row/<list>/<id>`: one row (one machine, duty, receiver, phase or period);
 * - `rev/<revision>`: an empty marker per stored revision. A save made on revision R adds
 *   the marker of R + 1 in the same transaction; when another tab stored R + 1 first, the
 *   add fails, the whole transaction is undone, and the save is merged instead
 *   (./projects.ts {@link saveMerged}). So a save needs no read before its writes.
 *
 * Pure functions: no Dexie, no IndexedDB.
 */
import type { Project } from '../ledger/model/model.ts';
import { ROW_LISTS, type RowList } from '../ledger/file/project-merge.ts';

/** One stored part: primary key [projectId, key]. */
export interface ProjectPart {
  projectId: string;
  key: string;
  value: unknown;
}

export const HEAD_KEY = 'head';
export const orderKey = (list: RowList): string => `order/${list}`;
export const rowKey = (list: RowList, id: string): string => `row/${list}/${id}`;
/** Revision markers sort by number: the revision is written with 12 digits. */
export const revisionKey = (revision: number): string => `rev/${String(revision).padStart(12, '0')}`;

/** Revision markers older than this many revisions are pruned (a tab that far behind reloads first). */
export const KEPT_REVISION_MARKERS = 1000;

/** The changes a save writes: parts to put and part keys to delete. */
export interface PartChanges {
  put: ProjectPart[];
  remove: string[];
}

function headOf(project: Project): Record<string, unknown> {
  const head: Record<string, unknown> = { ...project };
  for (const list of ROW_LISTS) delete head[list];
  return head;
}

function headChanged(before: Project, after: Project): boolean {
  const keys = new Set([...Object.keys(before), ...Object.keys(after)]);
  for (const key of keys) {
    if ((ROW_LISTS as readonly string[]).includes(key)) continue;
    if ((before as unknown as Record<string, unknown>)[key] !== (after as unknown as Record<string, unknown>)[key])
      return true;
  }
  return false;
}

/** Every part of a project (a new project, or one rewritten whole). */
export function toParts(projectId: string, project: Project): ProjectPart[] {
  const parts: ProjectPart[] = [{ projectId, key: HEAD_KEY, value: headOf(project) }];
  for (const list of ROW_LISTS) {
    const rows = project[list] as readonly { id: string }[];
    parts.push({ projectId, key: orderKey(list), value: rows.map((r) => r.id) });
    for (const row of rows) parts.push({ projectId, key: rowKey(list, row.id), value: row });
  }
  return parts;
}

/**
 * What to write to turn the stored `before` into `after`: rows that are not the very same
 * object are written (edits replace a row, never change it in place), orders that differ,
 * and the head when one of its fields is not the same object. Costs one pass over each
 * list comparing references.
 */
export function partChanges(projectId: string, before: Project, after: Project): PartChanges {
  const put: ProjectPart[] = [];
  const remove: string[] = [];
  if (headChanged(before, after)) put.push({ projectId, key: HEAD_KEY, value: headOf(after) });
  for (const list of ROW_LISTS) {
    const was = before[list] as readonly { id: string }[];
    const now = after[list] as readonly { id: string }[];
    if (was === now) continue;
    if (was.length === now.length) {
      const rows: ProjectPart[] = [];
      let sameOrder = true;
      for (let i = 0; i < now.length; i++) {
        const a = was[i]!;
        const b = now[i]!;
        if (a === b) continue;
        if (a.id !== b.id) {
          sameOrder = false;
          break;
        }
        rows.push({ projectId, key: rowKey(list, b.id), value: b });
      }
      if (sameOrder) {
        put.push(...rows);
        continue;
      }
    }
    const old = new Map(was.map((r) => [r.id, r] as const));
    for (const row of now) {
      if (old.get(row.id) !== row) put.push({ projectId, key: rowKey(list, row.id), value: row });
      old.delete(row.id);
    }
    for (const id of old.keys()) remove.push(rowKey(list, id));
    put.push({ projectId, key: orderKey(list), value: now.map((r) => r.id) });
  }
  return { put, remove };
}

/**
 * The project from its parts. A row missing from the order is added at the end of its
 * list; an id in the order without a row is skipped (neither happens unless storage was
 * damaged). Undefined when there is no head.
 */
export function fromParts(parts: readonly ProjectPart[]): Project | undefined {
  let head: Record<string, unknown> | undefined;
  const orders = new Map<string, string[]>();
  const rows = new Map<string, Map<string, unknown>>();
  for (const part of parts) {
    if (part.key === HEAD_KEY) head = part.value as Record<string, unknown>;
    else if (part.key.startsWith('order/')) orders.set(part.key.slice(6), part.value as string[]);
    else if (part.key.startsWith('row/')) {
      const slash = part.key.indexOf('/', 4);
      const list = part.key.slice(4, slash);
      const id = part.key.slice(slash + 1);
      let byId = rows.get(list);
      if (!byId) rows.set(list, (byId = new Map()));
      byId.set(id, part.value);
    }
  }
  if (!head) return undefined;
  const project: Record<string, unknown> = { ...head };
  for (const list of ROW_LISTS) {
    const byId = rows.get(list) ?? new Map<string, unknown>();
    const out: unknown[] = [];
    for (const id of orders.get(list) ?? []) {
      const row = byId.get(id);
      if (row === undefined) continue;
      out.push(row);
      byId.delete(id);
    }
    for (const row of byId.values()) out.push(row);
    project[list] = out;
  }
  return project as unknown as Project;
}

/**
 * The project `base` with some of its parts replaced: `changed` maps a part key to its stored
 * value, or to undefined when the part is no longer stored (a deleted row). Rows and lists
 * not named keep their identity, so a catch-up after a one-cell edit copies one row and one
 * list. Used by a tab that knows which parts the revisions it missed wrote.
 */
export function withParts(base: Project, changed: ReadonlyMap<string, unknown>): Project {
  const head = changed.get(HEAD_KEY) as Record<string, unknown> | undefined;
  const project: Record<string, unknown> = head ? { ...head } : { ...base };
  for (const list of ROW_LISTS) {
    const rows = base[list] as readonly { id: string }[];
    const order = changed.get(orderKey(list)) as string[] | undefined;
    const prefix = `row/${list}/`;
    let touched = order !== undefined;
    if (!touched) for (const key of changed.keys()) if (key.startsWith(prefix)) touched = true;
    if (!touched) {
      project[list] = rows;
      continue;
    }
    const byId = new Map(rows.map((r) => [r.id, r] as const));
    const pick = (id: string): unknown => {
      const key = rowKey(list, id);
      return changed.has(key) ? changed.get(key) : byId.get(id);
    };
    project[list] = (order ?? rows.map((r) => r.id)).map(pick).filter((r) => r !== undefined);
  }
  return project as unknown as Project;
}
