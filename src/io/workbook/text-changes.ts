/**
 * What the workbook cannot hold as typed. An .xlsx (XML 1.0) cannot carry most control
 * characters, nor half of a surrogate pair; `cells.text` removes the former and replaces
 * the latter with U+FFFD. This module finds every text of a project that will be written
 * changed, so the export can say so, naming each one; the project itself is not changed.
 */
import type { Project } from '../../ledger/model/model.ts';

/** Characters an .xlsx (XML 1.0) cannot hold: C0 controls other than tab, line feed, carriage return. */
export const NOT_IN_XML = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]/g;
/** Half of a surrogate pair with no other half. */
export const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

export interface TextChange {
  /** Where the text is, e.g. `candidates[c12].label` (lists by id). */
  place: string;
  /** What happens to it, e.g. "2 control characters removed". */
  change: string;
}

function count(re: RegExp, s: string): number {
  return s.match(new RegExp(re.source, 'g'))?.length ?? 0;
}

/** How a text changes on its way into the workbook, in words, or undefined when it does not. */
export function describeTextChange(s: string): string | undefined {
  const controls = count(NOT_IN_XML, s);
  const halves = count(LONE_SURROGATE, s);
  const parts = [
    controls ? `${controls} control character${controls === 1 ? '' : 's'} removed` : '',
    halves ? `${halves} broken character${halves === 1 ? '' : 's'} (half a surrogate pair) written as �` : '',
  ].filter(Boolean);
  return parts.length ? parts.join(', ') : undefined;
}

/**
 * Every text of the project that the workbook will hold changed. Lists are named by their
 * items' ids. O(size of the project).
 * @example workbookTextChanges(p) // [{ place: 'candidates[c3].label', change: '1 control character removed' }]
 */
export function workbookTextChanges(project: Project): TextChange[] {
  const out: TextChange[] = [];
  const walk = (value: unknown, place: string, depth: number): void => {
    if (depth > 64) return;
    if (typeof value === 'string') {
      const change = describeTextChange(value);
      if (change) out.push({ place, change });
      return;
    }
    if (Array.isArray(value)) {
      value.forEach((item, i) => {
        const id =
          typeof item === 'object' && item !== null && typeof (item as { id?: unknown }).id === 'string'
            ? (item as { id: string }).id
            : String(i);
        walk(item, `${place}[${id}]`, depth + 1);
      });
      return;
    }
    if (typeof value === 'object' && value !== null) {
      for (const [k, v] of Object.entries(value)) {
        const keyChange = describeTextChange(k);
        if (keyChange) out.push({ place: `${place ? `${place}.` : ''}${k}`, change: keyChange });
        walk(v, place ? `${place}.${k}` : k, depth + 1);
      }
    }
  };
  walk(project, '', 0);
  return out;
}
