/**
 * Fresh identifiers for imported candidates that collide with none already in the
 * project: prefix + number, counting on from the highest number already used. O(n).
 * @example freshIds(['c1', 'c7', 'x'], 2) // ['c8', 'c9']
 */
export function freshIds(existing: Iterable<string>, count: number, prefix = 'c'): string[] {
  const pattern = new RegExp(`^${prefix.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}(\\d+)$`);
  const taken = new Set<string>();
  let highest = 0;
  for (const id of existing) {
    taken.add(id);
    const m = pattern.exec(id);
    if (m) highest = Math.max(highest, Number(m[1]));
  }
  const ids: string[] = [];
  for (let n = highest + 1; ids.length < count; n++) {
    const id = `${prefix}${n}`;
    if (!taken.has(id)) ids.push(id);
  }
  return ids;
}
