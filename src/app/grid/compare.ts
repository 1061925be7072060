/**
 * Ordering of cell values for sorting: numbers numerically, text in natural
 * order ("M2" before "M10", case ignored), false before true, and numbers
 * before text. Empty values (undefined, NaN) are mapped to undefined by
 * `sortableValue` so that table-core keeps them last in both directions.
 */

const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });

export type SortableValue = string | number | boolean | undefined;

/**
 * A column value ready for sorting: NaN and empty text become undefined.
 * @example sortableValue(NaN) // → undefined
 */
export function sortableValue(value: SortableValue): SortableValue {
  if (typeof value === 'number' && Number.isNaN(value)) return undefined;
  if (value === '') return undefined;
  return value;
}

function typeRank(value: SortableValue): number {
  if (typeof value === 'number') return 0;
  if (typeof value === 'boolean') return 1;
  return 2;
}

/**
 * Ascending comparison of two defined values.
 * @example compareValues('M2', 'M10') // → negative
 */
export function compareValues(a: SortableValue, b: SortableValue): number {
  const rankDifference = typeRank(a) - typeRank(b);
  if (rankDifference !== 0) return rankDifference;
  if (typeof a === 'number' && typeof b === 'number') return a - b;
  if (typeof a === 'boolean' && typeof b === 'boolean') return Number(a) - Number(b);
  return collator.compare(String(a ?? ''), String(b ?? ''));
}
