/**
 * The text form of a column mapping, `<column>=<field>,…`, as the command line's --map
 * takes it. A column is named by its header (case and spacing ignored), its letter
 * (A, B, … AA) or its number (1, 2, …); a field by its key (lwaDb, dayRate, …) or
 * "-" / "none" to leave the column out. Later entries override the suggestions.
 */
import { FIELD_SPECS, isImportField } from './fields.ts';
import { columnNumber } from './workbook-guard.ts';
import type { ColumnMapping } from './types.ts';

/** A mapping entry that cannot be applied. */
export class MapSpecError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'MapSpecError';
  }
}

const squash = (s: string) => s.trim().toLowerCase().replace(/\s+/g, ' ');

function findColumn(name: string, headers: readonly string[]): number {
  const wanted = squash(name);
  const byHeader = headers.findIndex((h) => squash(h) === wanted);
  if (byHeader >= 0) return byHeader;
  if (/^[A-Za-z]{1,3}$/.test(name.trim())) {
    const n = columnNumber(name.trim().toUpperCase());
    if (n >= 1 && n <= headers.length) return n - 1;
  }
  if (/^\d+$/.test(name.trim())) {
    const n = Number(name.trim());
    if (n >= 1 && n <= headers.length) return n - 1;
  }
  return -1;
}

/**
 * Applies a `<column>=<field>,…` text to a mapping, returning the new mapping. A field
 * given to one column is taken from any other column that had it.
 * @example applyMapSpec('Noise=lwaDb', ['Model', 'Noise'], ['label', null]) // ['label', 'lwaDb']
 */
export function applyMapSpec(spec: string, headers: readonly string[], base: ColumnMapping): ColumnMapping {
  const mapping = headers.map((_, i) => base[i] ?? null);
  for (const part of spec.split(',')) {
    if (part.trim() === '') continue;
    const eq = part.lastIndexOf('=');
    if (eq <= 0)
      throw new MapSpecError(`--map: ${JSON.stringify(part)} is not <column>=<field> (e.g. "Noise dB=lwaDb")`);
    const columnName = part.slice(0, eq);
    const fieldName = part.slice(eq + 1).trim();
    const column = findColumn(columnName, headers);
    if (column < 0) {
      const shown = headers.map((h, i) => (h === '' ? `#${i + 1}` : JSON.stringify(h))).join(', ');
      throw new MapSpecError(
        `--map: column ${JSON.stringify(columnName.trim())} is not in the header row (columns: ${shown})`,
      );
    }
    if (fieldName === '-' || fieldName.toLowerCase() === 'none') {
      mapping[column] = null;
      continue;
    }
    if (!isImportField(fieldName)) {
      throw new MapSpecError(
        `--map: ${JSON.stringify(fieldName)} is not a field (use one of ${FIELD_SPECS.map((f) => f.key).join(', ')}, or none)`,
      );
    }
    for (let i = 0; i < mapping.length; i++) if (mapping[i] === fieldName) mapping[i] = null;
    mapping[column] = fieldName;
  }
  return mapping;
}

/**
 * The mapping with `field` given to `column` (null leaves the column out). A field lives
 * in one column only, so any other column holding it is cleared.
 * @example assignField(['label', 'lwaDb'], 0, 'lwaDb') // ['lwaDb', null]
 */
export function assignField(mapping: ColumnMapping, column: number, field: ColumnMapping[number]): ColumnMapping {
  return mapping.map((f, i) => (i === column ? field : field !== null && f === field ? null : f));
}
