/**
 * Reading the files the register commands take: a register file, a project file (its
 * candidates become machines to compare), or a supplier list / register workbook to import.
 * Problems go to standard error, one per line with its path or cell.
 */
import { readFile, stat } from 'node:fs/promises';
import { basename } from 'node:path';
import type { Io } from './command.ts';
import { UsageError } from './flags.ts';
import type { Register, RegisterMachine } from '../ledger/register/model.ts';
import { emptyRegister } from '../ledger/register/model.ts';
import { parseRegisterFile } from '../ledger/register/register-file.ts';
import { validateRegister } from '../ledger/register/validate-register.ts';
import { machinesFromImport } from '../ledger/register/from-candidates.ts';
import { parseProjectFile } from '../ledger/file/project-file.ts';
import type { Directivity } from '../ledger/model/model.ts';
import {
  ImportRefusal,
  MAX_FILE_BYTES,
  applyMapSpec,
  buildPreview,
  formatBytes,
  MapSpecError,
  prepareImport,
  readTable,
} from '../io/import/index.ts';

async function readText(file: string, what: string): Promise<string> {
  try {
    return await readFile(file, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    throw new UsageError(
      `${JSON.stringify(file)}: ${code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'is a folder' : 'cannot be read'} (give the path of ${what})`,
    );
  }
}

/** Reads and checks a register file; undefined after printing its problems. */
export async function loadRegister(file: string, io: Io, command: string): Promise<Register | undefined> {
  const parsed = parseRegisterFile(await readText(file, 'a register file, e.g. from ledger register import'));
  const problems = 'problems' in parsed ? parsed.problems : validateRegister(parsed.register);
  if (problems.length > 0) {
    io.err(
      `ledger ${command}: ${file}: ${problems.length} problem${problems.length === 1 ? '' : 's'}; nothing done.\n`,
    );
    for (const p of problems) io.err(`  ${p.path}  ${p.message}\n`);
    return undefined;
  }
  return 'register' in parsed ? parsed.register : undefined;
}

/**
 * A register file as is, or a project file's candidates as a register (each candidate one
 * machine, with its cost basis); undefined after printing problems.
 */
export async function loadRegisterOrProject(file: string, io: Io, command: string): Promise<Register | undefined> {
  const text = await readText(file, 'a register or project file');
  if (/"plant-noise-ledger\/project"/.test(text.slice(0, 400))) {
    const parsed = parseProjectFile(text);
    if ('problems' in parsed) {
      io.err(
        `ledger ${command}: ${file}: ${parsed.problems.length} problem${parsed.problems.length === 1 ? '' : 's'}; nothing done.\n`,
      );
      for (const p of parsed.problems) io.err(`  ${p.path}  ${p.message}\n`);
      return undefined;
    }
    const { machines } = machinesFromImport(parsed.project.candidates, {});
    // Keep the candidates' own ids so the output names them as the project does.
    const renamed = machines.map((m, i) => ({ ...m, id: parsed.project.candidates[i]!.id }));
    return { ...emptyRegister(parsed.project.name, parsed.project.currency), machines: renamed };
  }
  return loadRegister(file, io, command);
}

export interface SupplierReadOptions {
  map?: string;
  headerRow?: number;
  decimal?: '.' | ',';
  distanceM?: number;
  q: Directivity;
}

export interface SupplierRead {
  machines: RegisterMachine[];
  unreadCells: Record<string, string>;
  problems: string[];
  notes: string[];
  workingDaysPerYear?: number;
  operatorHoursPerDay?: number;
}

/**
 * Machines from a supplier list (.xlsx, .csv, .tsv) through the importer, or from a register
 * workbook (an .xlsx with a "register" sheet) as exported. New ids avoid `takenIds`.
 */
export async function readMachines(
  path: string,
  options: SupplierReadOptions,
  takenIds: Iterable<string>,
): Promise<SupplierRead> {
  const name = basename(path);
  const info = await stat(path).catch(() => {
    throw new UsageError(`${JSON.stringify(path)}: no such file (give a .xlsx, .csv or .tsv file name)`);
  });
  if (!info.isFile())
    throw new UsageError(`${JSON.stringify(path)}: not a file (give a .xlsx, .csv or .tsv file name)`);
  if (info.size > MAX_FILE_BYTES)
    throw new ImportRefusal(
      `"${name}" is ${formatBytes(info.size)}; files of up to ${formatBytes(MAX_FILE_BYTES)} are accepted`,
    );
  const bytes = new Uint8Array(await readFile(path));
  if (/\.xlsx$/i.test(name)) {
    const { readRegisterWorkbook } = await import('../io/register-workbook/read.ts');
    const read = await readRegisterWorkbook(bytes, options.decimal).catch(() => undefined);
    if (read && read.problems.every((p) => !p.startsWith('Workbook: no sheet') && !p.includes('no header row'))) {
      const taken = new Set(takenIds);
      const clash = read.machines.filter((m) => taken.has(m.id));
      if (clash.length > 0) {
        let n = 1;
        const renamed = new Map<string, string>();
        for (const m of clash) {
          while (taken.has(`m${n}`)) n++;
          renamed.set(m.id, `m${n}`);
          taken.add(`m${n}`);
        }
        read.machines = read.machines.map((m) => (renamed.has(m.id) ? { ...m, id: renamed.get(m.id)! } : m));
        read.unreadCells = Object.fromEntries(
          Object.entries(read.unreadCells).map(([k, v]) => {
            const [list, id, ...rest] = k.split('/');
            return [renamed.has(id!) ? [list, renamed.get(id!), ...rest].join('/') : k, v];
          }),
        );
      }
      return { ...read, notes: [`Read the register sheet of "${name}".`] };
    }
  }
  const table = await readTable(bytes, name);
  let headerRowIndex: number | undefined;
  if (options.headerRow !== undefined) {
    headerRowIndex = table.rows.findIndex((r) => r.rowNumber === options.headerRow);
    if (headerRowIndex < 0)
      throw new UsageError(
        `--header-row: row ${options.headerRow} is empty or not in the file (give the number of a row holding the headers)`,
      );
  }
  const setup = prepareImport(table, headerRowIndex);
  let mapping = setup.mapping;
  if (options.map !== undefined) {
    try {
      mapping = applyMapSpec(options.map, setup.headers, mapping);
    } catch (e) {
      if (e instanceof MapSpecError) throw new UsageError(e.message);
      throw e;
    }
  }
  const preview = buildPreview(table, {
    headerRowIndex: setup.headerRowIndex,
    mapping,
    decimalSeparator: options.decimal ?? setup.decimalSeparator,
    dutyId: '',
    ...(options.distanceM !== undefined ? { pressureDistanceM: options.distanceM } : {}),
    directivityQ: options.q,
  });
  const { machines, unreadCells } = machinesFromImport(preview.candidates, preview.unreadCells, takenIds);
  return {
    machines,
    unreadCells,
    problems: preview.problems.filter((p) => p.severity === 'error').map((p) => p.message),
    notes: [
      ...table.notes,
      ...preview.notes,
      ...preview.problems.filter((p) => p.severity === 'note').map((p) => p.message),
    ],
  };
}
