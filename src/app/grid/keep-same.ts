/**
 * Keeping a list's identity when a recomputation gives the same items, so that what reads it
 * reacts to what changed rather than to every recomputation: a `$derived` that returns the
 * kept list is not marked changed, and nothing downstream runs again.
 */

/**
 * `next` when it differs from `kept` (length, or any item by `same`), else `kept`.
 * O(items).
 * @example keepSame(['a', 'b'], ['a', 'b']) // → the first list, the same object
 */
export function keepSame<T>(
  kept: readonly T[] | undefined,
  next: readonly T[],
  same: (a: T, b: T) => boolean = Object.is,
): readonly T[] {
  if (kept === undefined || kept.length !== next.length) return next;
  for (let i = 0; i < next.length; i++) if (!same(kept[i]!, next[i]!)) return next;
  return kept;
}

/**
 * A function that returns each list it is given, or the list it returned last time when the
 * new one has the same items (see {@link keepSame}).
 * @example const keep = keeper<string>(); const a = keep(['x']); keep(['x']) === a // → true
 */
export function keeper<T>(same: (a: T, b: T) => boolean = Object.is): (next: readonly T[]) => readonly T[] {
  let kept: readonly T[] | undefined;
  return (next) => (kept = keepSame(kept, next, same));
}

/** A visible column as the grid lays it out: the column and its width. */
export interface ColumnEntry<Column> {
  column: Column;
  width: number;
}

/** Same column object at the same width. */
export const sameEntry = <Column>(a: ColumnEntry<Column>, b: ColumnEntry<Column>): boolean =>
  a.column === b.column && a.width === b.width;
