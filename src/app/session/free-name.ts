/**
 * A project name no stored project has yet, for a copy: the name itself when free, else
 * "name (copy)", then "name (copy 2)", "name (copy 3)", … Compared without case or
 * surrounding spaces, as a user would read the project list.
 * @example freeCopyName('Yard', ['Yard']) // "Yard (copy)"
 * @example freeCopyName('Yard', ['Yard', 'yard (copy)']) // "Yard (copy 2)"
 * @example freeCopyName('Yard', [], false) // "Yard"
 */
export function freeCopyName(base: string, taken: readonly string[], alwaysCopy = true): string {
  const names = new Set(taken.map((n) => n.trim().toLowerCase()));
  const free = (n: string) => !names.has(n.trim().toLowerCase());
  if (!alwaysCopy && free(base)) return base;
  if (free(`${base} (copy)`)) return `${base} (copy)`;
  for (let n = 2; ; n++) if (free(`${base} (copy ${n})`)) return `${base} (copy ${n})`;
}
