/**
 * Reading and writing project files (JSON, format "plant-noise-ledger/project").
 *
 * Reading: JSON syntax (errors with line and column), the format tag, the version (older
 * files are upgraded step by step, newer ones refused with a message), and the shape the
 * program needs to hold the data (lists are lists, objects are objects). Values are not
 * judged here — `validateProject` lists every value problem, so the app can open a file
 * with a wrong number and show it at its cell. A numeric cell that holds null and has an
 * entry in `unreadCells` is read back as NaN.
 * Writing: pretty-printed JSON; NaN becomes null, and `unreadCells` keeps what was typed.
 */
import type { Project } from '../model/model.ts';
import { PROJECT_FORMAT, PROJECT_VERSION } from '../model/model.ts';
import type { DataProblem } from '../model/results.ts';
import { findJsonSyntaxError } from './json-syntax.ts';
import { upgradeFile } from './upgrade.ts';
import { describeValue } from '../../core/input-error.ts';

export type ParseOutcome = { project: Project; upgradedFrom?: number } | { problems: DataProblem[] };

type Obj = Record<string, unknown>;
const isObj = (x: unknown): x is Obj => typeof x === 'object' && x !== null && !Array.isArray(x);

/** Lists and the objects inside each item the program needs to hold a project. */
const SHAPE: { list: string; objects: string[] }[] = [
  { list: 'periods', objects: [] },
  { list: 'phases', objects: [] },
  { list: 'receivers', objects: ['limitsDb', 'screening'] },
  { list: 'duties', objects: ['location'] },
  { list: 'candidates', objects: ['cost'] },
];

function shapeProblems(file: Obj): DataProblem[] {
  const problems: DataProblem[] = [];
  const need = (path: string, value: unknown, what: 'object' | 'list') => {
    const ok = what === 'list' ? Array.isArray(value) : isObj(value);
    if (!ok) {
      const accepted = what === 'list' ? 'a JSON array [ … ]' : 'a JSON object { … }';
      problems.push({
        path,
        message: `${path.slice(2)}: ${describeValue(value)} ${value === undefined ? 'is missing' : `is not ${what === 'list' ? 'a list' : 'an object'}`} (use ${accepted})`,
      });
    }
    return ok;
  };
  need('$.propagation', file.propagation, 'object');
  need('$.settings', file.settings, 'object');
  for (const { list, objects } of SHAPE) {
    if (!need(`$.${list}`, file[list], 'list')) continue;
    (file[list] as unknown[]).forEach((item, i) => {
      if (!need(`$.${list}[${i}]`, item, 'object')) return;
      for (const key of objects) need(`$.${list}[${i}].${key}`, (item as Obj)[key], 'object');
    });
  }
  for (const { list } of SHAPE) {
    if (!Array.isArray(file[list])) continue;
    // Rows are found by id everywhere (grid, storage, merging of two tabs): an id must be text and used once.
    const seen = new Map<string, number>();
    (file[list] as unknown[]).forEach((item, i) => {
      if (!isObj(item)) return;
      const id = item.id;
      const path = `$.${list}[${i}].id`;
      if (typeof id !== 'string' || id === '') {
        problems.push({
          path,
          message: `${path.slice(2)}: ${describeValue(id)} is not an id (use a short text unique in its list, e.g. "c12")`,
        });
        return;
      }
      const first = seen.get(id);
      if (first !== undefined)
        problems.push({
          path,
          message: `${path.slice(2)}: ${describeValue(id)} is used twice, also by ${list}[${first}] (give each row its own id)`,
        });
      else seen.set(id, i);
    });
  }
  if (Array.isArray(file.candidates)) {
    (file.candidates as unknown[]).forEach((item, i) => {
      if (!isObj(item) || item.bandsDb === undefined || item.bandsDb === null) return;
      if (!Array.isArray(item.bandsDb)) {
        const path = `$.candidates[${i}].bandsDb`;
        problems.push({
          path,
          message: `${path.slice(2)}: ${describeValue(item.bandsDb)} is not a list (use a JSON array of 8 octave-band levels, 63 Hz to 8 kHz, e.g. [95, 98, 101, 100, 99, 96, 92, 86])`,
        });
      }
    });
  }
  if (file.unreadCells !== undefined) need('$.unreadCells', file.unreadCells, 'object');
  if (file.clauses !== undefined && need('$.clauses', file.clauses, 'list')) {
    (file.clauses as unknown[]).forEach((item, i) => need(`$.clauses[${i}]`, item, 'object'));
  }
  return problems;
}

/** The screening kinds that need no figure, accepted as bare words ("hidden") as well as objects. */
const SCREENING_WORDS = new Set(['none', 'top-visible', 'hidden']);

/**
 * Reads a receiver's screening given as a bare word (`"hidden"`) as the object it stands for
 * (`{ "kind": "hidden" }`); any other value is left as it is for validation to name. Same
 * meaning, so no file version. O(receivers × duties).
 */
function screeningWordsAsObjects(file: Obj): void {
  const receivers = file.receivers;
  if (!Array.isArray(receivers)) return;
  for (const r of receivers) {
    if (!isObj(r) || !isObj(r.screening)) continue;
    const screening = r.screening;
    for (const [dutyId, value] of Object.entries(screening))
      if (typeof value === 'string' && SCREENING_WORDS.has(value)) screening[dutyId] = { kind: value };
  }
}

/** Puts NaN back into numeric cells that hold null and whose typed text is kept in unreadCells. */
function restoreUnread(file: Obj): void {
  const unread = file.unreadCells;
  if (!isObj(unread)) return;
  for (const key of Object.keys(unread)) {
    const [list, id, field] = key.split('/');
    if (!list || !id || !field) continue;
    const items = file[list];
    const owner = Array.isArray(items) ? items.find((x) => isObj(x) && x.id === id) : isObj(items) ? items : undefined;
    if (!isObj(owner)) continue;
    const parts = field.split('.');
    let target: unknown = owner;
    for (const part of parts.slice(0, -1))
      target = isObj(target) || Array.isArray(target) ? (target as Obj)[part] : undefined;
    const last = parts[parts.length - 1] as string;
    if ((isObj(target) || Array.isArray(target)) && (target as Obj)[last] === null) (target as Obj)[last] = NaN;
  }
}

/** Deepest nesting a project file may have; a real one nests about six levels. */
export const MAX_NESTING = 64;

/**
 * How deeply brackets nest in a JSON text, outside strings; stops counting past 1000.
 * A linear scan, so a file nested 100,000 levels deep is refused before any recursive reader sees it.
 */
function nestingDepth(text: string): number {
  let depth = 0;
  let max = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text.charCodeAt(i);
    if (inString) {
      if (ch === 0x5c)
        i++; // backslash: skip the escaped character
      else if (ch === 0x22) inString = false;
    } else if (ch === 0x22) inString = true;
    else if (ch === 0x7b || ch === 0x5b) {
      depth++;
      if (depth > max) max = depth;
      if (max > 1000) return max;
    } else if (ch === 0x7d || ch === 0x5d) depth--;
  }
  return max;
}

/**
 * Reads a project file.
 * @example parseProjectFile('{ "format": …') // { problems: [{ path: '$', message: 'Line 3, column 5: expected … ' }] }
 */
export function parseProjectFile(fileText: string): ParseOutcome {
  // A UTF-8 byte-order mark is not part of the JSON; editors on some systems write one.
  const text = fileText.charCodeAt(0) === 0xfeff ? fileText.slice(1) : fileText;
  const depth = nestingDepth(text);
  if (depth > MAX_NESTING) {
    return {
      problems: [
        {
          path: '$',
          message: `File: lists and objects are nested ${depth > 1000 ? 'more than 1000' : depth} levels deep; a project file nests at most ${MAX_NESTING} (this is not a project file of this program, or it is damaged)`,
        },
      ],
    };
  }
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    const where = findJsonSyntaxError(text);
    const message = where
      ? `Line ${where.line}, column ${where.column}: ${where.message} (the file must be valid JSON)`
      : 'The file is not valid JSON (check quotes, commas and brackets)';
    return { problems: [{ path: '$', message }] };
  }
  return checkProjectData(data);
}

/**
 * Checks a project already parsed from JSON (a file, or a body kept in the browser's
 * storage): the format tag, the version (older bodies upgraded, newer refused, a failing
 * upgrade step reported), and the shape the program needs. Values are left to `validateProject`.
 * @example checkProjectData({ format: 'plant-noise-ledger/project', version: 99 }) // { problems: [{ path: '$.version', … }] }
 */
export function checkProjectData(data: unknown): ParseOutcome {
  if (!isObj(data))
    return {
      problems: [
        {
          path: '$',
          message: `File: ${describeValue(data)} is not a project (use a JSON object with "format": ${JSON.stringify(PROJECT_FORMAT)})`,
        },
      ],
    };
  if (data.format !== PROJECT_FORMAT) {
    return {
      problems: [
        {
          path: '$.format',
          message: `Format: ${describeValue(data.format)} is not a project file of this program (use ${JSON.stringify(PROJECT_FORMAT)})`,
        },
      ],
    };
  }
  let upgraded: ReturnType<typeof upgradeFile>;
  try {
    upgraded = upgradeFile(data);
  } catch (error) {
    const why = error instanceof Error ? error.message : String(error);
    return {
      problems: [
        {
          path: '$.version',
          message: `Version: upgrading from version ${describeValue(data.version)} to ${PROJECT_VERSION} failed (${why}); the data is damaged or was not written by this program`,
        },
      ],
    };
  }
  if ('error' in upgraded) {
    const message =
      upgraded.error === 'newer'
        ? `Version: ${describeValue(upgraded.version)} is newer than this program reads (it reads versions 1 to ${PROJECT_VERSION}; open the file with a newer version of the program)`
        : `Version: ${describeValue(upgraded.version)} is not a known version (use a whole number from 1 to ${PROJECT_VERSION})`;
    return { problems: [{ path: '$.version', message }] };
  }
  const problems = shapeProblems(upgraded.file);
  if (problems.length > 0) return { problems };
  screeningWordsAsObjects(upgraded.file);
  restoreUnread(upgraded.file);
  const project = upgraded.file as unknown as Project;
  return upgraded.from === PROJECT_VERSION ? { project } : { project, upgradedFrom: upgraded.from };
}

/**
 * Writes a project file: JSON with two-space indentation and a final newline. NaN (an
 * unread cell) is written as null; the typed text stays in `unreadCells`.
 * @example serializeProject(demoProject()).startsWith('{\n  "format": "plant-noise-ledger/project"') // true
 */
export function serializeProject(project: Project): string {
  return `${JSON.stringify(project, (_key, value: unknown) => (typeof value === 'number' && !Number.isFinite(value) ? null : value), 2)}\n`;
}
