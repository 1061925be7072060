/**
 * Reading and writing register files (JSON, format "plant-noise-ledger/register"), the
 * buyer's machine register on its own, for moving it between browsers and for the
 * command line. Reading checks the JSON syntax (line and column), the format tag, the
 * version (newer refused with a message) and the shape needed to hold the data; values are
 * judged by `validateRegister`. A numeric cell kept as null with its typed text in
 * `unreadCells` reads back as NaN. The JSON Schema is static/register.schema.json.
 */
import type { DataProblem } from '../model/results.ts';
import { findJsonSyntaxError } from '../file/json-syntax.ts';
import { describeValue } from '../../core/input-error.ts';
import { REGISTER_FORMAT, REGISTER_VERSION, type Register } from './model.ts';

export type RegisterParseOutcome = { register: Register } | { problems: DataProblem[] };

type Obj = Record<string, unknown>;
const isObj = (x: unknown): x is Obj => typeof x === 'object' && x !== null && !Array.isArray(x);

/** Reads a register file. */
export function parseRegisterFile(text: string): RegisterParseOutcome {
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
  if (!isObj(data))
    return {
      problems: [
        {
          path: '$',
          message: `File: ${describeValue(data)} is not a register (use a JSON object with "format": ${JSON.stringify(REGISTER_FORMAT)})`,
        },
      ],
    };
  if (data.format !== REGISTER_FORMAT) {
    const hint =
      data.format === 'plant-noise-ledger/project'
        ? 'this is a project file; import it as a project'
        : `use ${JSON.stringify(REGISTER_FORMAT)}`;
    return {
      problems: [
        { path: '$.format', message: `Format: ${describeValue(data.format)} is not a register file (${hint})` },
      ],
    };
  }
  const version = data.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return {
      problems: [
        {
          path: '$.version',
          message: `Version: ${describeValue(version)} is not a known version (use a whole number from 1 to ${REGISTER_VERSION})`,
        },
      ],
    };
  }
  if (version > REGISTER_VERSION) {
    return {
      problems: [
        {
          path: '$.version',
          message: `Version: ${version} is newer than this program reads (it reads versions 1 to ${REGISTER_VERSION}; open the file with a newer version of the program)`,
        },
      ],
    };
  }
  const problems: DataProblem[] = [];
  if (!isObj(data.settings))
    problems.push({
      path: '$.settings',
      message: `settings: ${describeValue(data.settings)} is not an object (use a JSON object { … })`,
    });
  if (!Array.isArray(data.machines))
    problems.push({
      path: '$.machines',
      message: `machines: ${describeValue(data.machines)} is not a list (use a JSON array [ … ])`,
    });
  else
    data.machines.forEach((m, i) => {
      if (!isObj(m))
        problems.push({
          path: `$.machines[${i}]`,
          message: `machines[${i}]: ${describeValue(m)} is not an object (use a JSON object { … })`,
        });
    });
  if (data.unreadCells !== undefined && !isObj(data.unreadCells))
    problems.push({
      path: '$.unreadCells',
      message: `unreadCells: ${describeValue(data.unreadCells)} is not an object (use a JSON object { … })`,
    });
  if (problems.length > 0) return { problems };
  restoreUnread(data);
  return { register: data as unknown as Register };
}

/** Puts NaN back where a cell holds null and its typed text is kept. */
function restoreUnread(file: Obj): void {
  const unread = file.unreadCells;
  if (!isObj(unread)) return;
  for (const key of Object.keys(unread)) {
    const [list, id, field] = key.split('/');
    if (!list || !id || !field) continue;
    const items = file[list];
    const owner = Array.isArray(items) ? items.find((x) => isObj(x) && x.id === id) : isObj(items) ? items : undefined;
    let target: unknown = owner;
    const parts = field.split('.');
    for (const part of parts.slice(0, -1))
      target = isObj(target) || Array.isArray(target) ? (target as Obj)[part] : undefined;
    const last = parts[parts.length - 1] as string;
    if ((isObj(target) || Array.isArray(target)) && (target as Obj)[last] === null) (target as Obj)[last] = NaN;
  }
}

/** Writes a register file: two-space JSON with a final newline; NaN becomes null (its text stays in unreadCells). */
export function serializeRegister(register: Register): string {
  return `${JSON.stringify(register, (_key, value: unknown) => (typeof value === 'number' && !Number.isFinite(value) ? null : value), 2)}\n`;
}
