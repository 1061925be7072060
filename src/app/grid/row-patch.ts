/**
 * The fast path for an edit: when the owner replaced some row objects but
 * kept every row in place (same ids in the same order) and each replaced row
 * keeps its group, its sort values and its filter result, the displayed
 * structure cannot have changed, so the display list is patched instead of
 * rebuilding table-core's row model. An edit then costs O(n) identity checks
 * and no new row objects.
 */
import type { DisplayRow } from './types.ts';

/**
 * The rows replaced in place, by id, or null when rows were added, removed,
 * reordered or re-keyed, or a replaced row would move (`keepsPlace` false).
 * @example replacedRows([a, b], [a, b2], (r) => r.id) // → Map { 'b' → b2 }
 */
export function replacedRows<Row>(
  before: readonly Row[],
  after: readonly Row[],
  rowId: (row: Row) => string,
  keepsPlace?: (before: Row, after: Row) => boolean,
): Map<string, Row> | null {
  if (before.length !== after.length) return null;
  const replaced = new Map<string, Row>();
  for (let i = 0; i < after.length; i++) {
    const old = before[i] as Row;
    const now = after[i] as Row;
    if (old === now) continue;
    const id = rowId(now);
    if (id !== rowId(old)) return null;
    if (keepsPlace && !keepsPlace(old, now)) return null;
    replaced.set(id, now);
  }
  return replaced;
}

/**
 * The display list with replaced rows swapped in; entries for unchanged rows
 * keep their identity, so only the edited rows re-render.
 */
export function patchDisplay<Row>(rows: readonly DisplayRow<Row>[], replaced: Map<string, Row>): DisplayRow<Row>[] {
  if (replaced.size === 0) return rows.slice();
  return rows.map((line) => {
    if (line.kind !== 'row') return line;
    const row = replaced.get(line.id);
    return row === undefined ? line : { ...line, row };
  });
}
