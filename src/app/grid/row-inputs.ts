/**
 * Comparing what a row was made from (see `RowInputsFn` in cell-text.ts): the same when every
 * input is the same value or object (`Object.is`, so NaN equals NaN) in the same order.
 */

/**
 * @example sameInputs([row, 3, NaN], [row, 3, NaN]) // true
 * @example sameInputs([row, {}], [row, {}]) // false: a new object is a change
 */
export function sameInputs(a: readonly unknown[], b: readonly unknown[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) return false;
  return true;
}
