/**
 * Field checks for validating a project: each records a DataProblem with the JSON path, a
 * message in the core's pattern (where, the value, what is wrong, what is accepted) and,
 * when the user typed text into a numeric cell that could not be read, that text.
 */
import type { DataProblem } from '../model/results.ts';
import { describeValue } from '../../core/input-error.ts';
import { ID_ACCEPTED } from './validate-rules.ts';

type Obj = Record<string, unknown>;

export interface NumberRule {
  min?: number;
  max?: number;
  /** The minimum itself is refused (a value must be above it). */
  aboveMin?: boolean;
  integer?: boolean;
  /** Words for what is accepted, e.g. "a level in dB from 30 to 160, e.g. 104.5". */
  accepted: string;
  /** Unit words a value typed as text may carry after the number (the catalogue's), for readers of text such as the flags. */
  suffixes?: readonly string[];
  /** Signs a value typed as text may carry before the number (a currency). */
  prefixes?: readonly string[];
}

export class ProblemList {
  readonly problems: DataProblem[] = [];
  constructor(private readonly unread: Readonly<Record<string, string>> = {}) {}

  /**
   * Records a problem: `${where}: ${value} ${problem} (${accepted})`; a value that was
   * never given reads `${where}: missing (${accepted})`, an empty one
   * `${where}: not filled in (${accepted})`.
   */
  add(path: string, where: string, value: unknown, problem: string, accepted: string): void {
    const shown =
      value === undefined && problem === 'is missing'
        ? 'missing'
        : problem === 'is not filled in' || (problem === 'is empty' && typeof value === 'string')
          ? 'not filled in'
          : `${describeValue(value)} ${problem}`;
    this.problems.push({ path, message: `${where}: ${shown} (${accepted})` });
  }

  /** True when text typed into this cell could not be read. */
  isUnread(cell: string): boolean {
    return this.unread[cell] !== undefined;
  }

  /** A problem that has no single value to show. */
  note(path: string, message: string): void {
    this.problems.push({ path, message });
  }

  /**
   * A number within a rule. `cell` is the unread-cell key ("<list>/<id>/<field>"): when text
   * typed there could not be read, that text is reported instead of the NaN it left.
   * Returns true when the value is acceptable.
   */
  number(path: string, where: string, value: unknown, rule: NumberRule, cell?: string): boolean {
    const typed = cell === undefined ? undefined : this.unread[cell];
    if (typed !== undefined) {
      this.add(path, where, typed, 'is not a number', `use ${rule.accepted}`);
      return false;
    }
    if (value === null || (typeof value === 'number' && Number.isNaN(value))) {
      // a new row's cell the user has not typed into yet (a file stores it as null)
      this.add(path, where, value, 'is not filled in', `use ${rule.accepted}`);
      return false;
    }
    if (typeof value !== 'number' || !Number.isFinite(value)) {
      this.add(path, where, value, value === undefined ? 'is missing' : 'is not a number', `use ${rule.accepted}`);
      return false;
    }
    const low = rule.min !== undefined && (rule.aboveMin ? value <= rule.min : value < rule.min);
    const high = rule.max !== undefined && value > rule.max;
    if (low || high) {
      this.add(path, where, value, 'is out of range', `use ${rule.accepted}`);
      return false;
    }
    if (rule.integer && !Number.isInteger(value)) {
      this.add(path, where, value, 'is not a whole number', `use ${rule.accepted}`);
      return false;
    }
    return true;
  }

  /** An optional number: absent (undefined) is fine; null or NaN is not unless typed text explains it. */
  optionalNumber(path: string, where: string, value: unknown, rule: NumberRule, cell?: string): boolean {
    if (value === undefined && (cell === undefined || this.unread[cell] === undefined)) return true;
    return this.number(path, where, value, rule, cell);
  }

  /** A string; `nonEmpty` refuses "" and blanks. */
  text(path: string, where: string, value: unknown, nonEmpty: boolean, accepted: string): boolean {
    if (typeof value !== 'string') {
      this.add(path, where, value, value === undefined ? 'is missing' : 'is not text', `use ${accepted}`);
      return false;
    }
    if (nonEmpty && value.trim() === '') {
      this.add(path, where, value, 'is empty', `use ${accepted}`);
      return false;
    }
    return true;
  }

  /** One of a fixed list of values. */
  oneOf<T>(path: string, where: string, value: unknown, allowed: readonly T[]): value is T {
    if (!(allowed as readonly unknown[]).includes(value)) {
      this.add(
        path,
        where,
        value,
        value === undefined ? 'is missing' : 'is not accepted',
        `use one of ${allowed.map((a) => JSON.stringify(a)).join(', ')}`,
      );
      return false;
    }
    return true;
  }

  /** true or false; `optional` accepts absence. */
  bool(path: string, where: string, value: unknown, optional: boolean): boolean {
    if (optional && value === undefined) return true;
    if (typeof value !== 'boolean') {
      this.add(path, where, value, value === undefined ? 'is missing' : 'is not true or false', 'use true or false');
      return false;
    }
    return true;
  }

  /** A list (JSON array). */
  list(path: string, where: string, value: unknown): value is unknown[] {
    if (!Array.isArray(value)) {
      this.add(path, where, value, value === undefined ? 'is missing' : 'is not a list', 'use a JSON array [ … ]');
      return false;
    }
    return true;
  }

  /** An object (JSON object, not an array or null). */
  object(path: string, where: string, value: unknown): value is Record<string, unknown> {
    if (typeof value !== 'object' || value === null || Array.isArray(value)) {
      this.add(path, where, value, value === undefined ? 'is missing' : 'is not an object', 'use a JSON object { … }');
      return false;
    }
    return true;
  }
}

/** JSON path of a property: `.name` when it is a plain identifier, else `["key"]`. */
export function prop(base: string, key: string): string {
  return /^[A-Za-z_$][\w$]*$/.test(key) ? `${base}.${key}` : `${base}[${JSON.stringify(key)}]`;
}

/** Where an item is, in words: `Receiver "Wren Terrace"` or `Receiver 3` when unnamed. */
export function itemWords(kind: string, item: Obj, index: number, nameKey = 'name'): string {
  const name = item[nameKey];
  return typeof name === 'string' && name.trim() !== '' ? `${kind} ${JSON.stringify(name)}` : `${kind} ${index + 1}`;
}

/** Checks ids of a list: present, text, unique. Returns the set of ids. */
export function checkIds(p: ProblemList, listPath: string, kind: string, items: Obj[], nameKey = 'name'): Set<string> {
  const ids = new Set<string>();
  items.forEach((item, i) => {
    const where = `${itemWords(kind, item, i, nameKey)}, id`;
    const path = `${listPath}[${i}].id`;
    if (!p.text(path, where, item.id, true, ID_ACCEPTED.replace(/^use /, ''))) return;
    const id = item.id as string;
    if (id === '__proto__') p.add(path, where, id, 'is a name the program keeps for itself', ID_ACCEPTED);
    else if (ids.has(id)) p.add(path, where, id, `is used twice in ${listPath.slice(2)}`, ID_ACCEPTED);
    ids.add(id);
  });
  return ids;
}
