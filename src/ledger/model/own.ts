/**
 * Reading a record keyed by ids the user chose. An id such as "toString" or "constructor"
 * must never find a property every object inherits, so records are read through their own
 * properties only.
 */

/**
 * The value stored under `key` in `record` itself, or undefined.
 * @example own({}, 'toString') // undefined (not Object.prototype.toString)
 */
export function own<T>(record: Readonly<Record<string, T>> | null | undefined, key: string): T | undefined {
  return record !== null && record !== undefined && Object.hasOwn(record, key) ? record[key] : undefined;
}
