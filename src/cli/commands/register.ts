/**
 * `ledger register import|export`: the buyer's machine register as a file.
 * - import: a supplier list (.xlsx, .csv, .tsv, through the supplier-list importer) or a
 *   register workbook into a register file; an existing register file given as -o keeps its
 *   machines and gains the new ones (never overwritten).
 * - export: a register file as a workbook (register, buyer's shortlist, and the fleet
 *   against a criterion when --fleet-criterion is given).
 */
import { readFile, stat, writeFile } from 'node:fs/promises';
import { resolve } from 'node:path';
import type { Command, Io } from '../command.ts';
import { helpText, numberFlag, parseFlags, textSeparatorOf, UsageError, type FlagSpecs } from '../flags.ts';
import { expandShortOutput } from './export.ts';
import { emptyRegister } from '../../ledger/register/model.ts';
import { parseRegisterFile, serializeRegister } from '../../ledger/register/register-file.ts';
import { compareMachines } from '../../ledger/register/compare.ts';
import { fleetView, machineType } from '../../ledger/register/fleet-view.ts';
import { ImportRefusal } from '../../io/import/index.ts';
import type { Directivity } from '../../ledger/model/model.ts';
import { loadRegister, readMachines } from '../register-files.ts';
import { FLAG_RULES } from '../flag-rules.ts';

const importSpecs: FlagSpecs = {
  output: {
    type: 'string',
    value: '<register.json>',
    help: 'the register file to write (also -o); an existing register file keeps its machines and gains the new ones',
  },
  map: { type: 'string', value: '<column=field,…>', help: 'set or change the column mapping, as for ledger import' },
  'header-row': { type: 'string', value: '<n>', help: 'the row holding the headers (default: found from the cells)' },
  decimal: { type: 'string', value: '<.|,>', help: 'decimal separator of numbers written as text' },
  distance: { type: 'string', value: '<m>', help: 'distance of pressure levels when the list does not give it' },
  q: {
    type: 'string',
    value: '<1|2|4|8>',
    help: 'directivity Q for sound power back-calculated from pressure (default 2)',
  },
  name: { type: 'string', value: '<text>', help: 'name of a new register (default "My machines")' },
  currency: { type: 'string', value: '<ISO 4217>', help: 'currency of a new register (default GBP)' },
};

const exportSpecs: FlagSpecs = {
  output: { type: 'string', value: '<out.xlsx>', help: 'the workbook to write (also -o)' },
  type: {
    type: 'string',
    value: '<directive type>',
    help: 'machines of this type on the buyer’s shortlist (default: all)',
  },
  criterion: { type: 'string', value: '<dB>', help: 'footprint criterion L_Aeq over the day (default 65)' },
  'on-time': { type: 'string', value: '<%>', help: 'on-time through the day (default 100)' },
  reference: {
    type: 'string',
    value: '<machine id>',
    help: 'the machine the others are measured against (default: the loudest)',
  },
  'fleet-criterion': {
    type: 'string',
    value: '<dB LWA>',
    help: 'add the fleet sheet: machines above this LWA and the cost of replacing them',
  },
};

const usage =
  'Usage: ledger register import <supplier file> [--map …] -o <register.json>\n       ledger register export <register.json> -o <workbook.xlsx> [--type <t>] [--criterion <dB>] [--fleet-criterion <dB>]';
const summary = 'keep the buyer’s machine register as a file: import a supplier list, export a workbook';

/** Whether the output exists already (then it must be a register file); a folder is refused. */
async function exists(path: string): Promise<boolean> {
  const info = await stat(path).catch(() => undefined);
  if (info?.isDirectory())
    throw new UsageError(`--output: ${JSON.stringify(path)} is a folder (give a file name, e.g. register.json)`);
  return info !== undefined;
}

/** Writes the output, or says in words why it cannot be written. */
async function writeOutput(output: string, data: string | Uint8Array): Promise<void> {
  try {
    await writeFile(output, data);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    throw new UsageError(
      `--output: ${JSON.stringify(output)} cannot be written (${code === 'ENOENT' ? 'its folder does not exist' : code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' ? 'permission denied' : 'write failed'}; give a writable path)`,
    );
  }
}

async function runImport(argv: string[], io: Io): Promise<number> {
  const { values, positionals } = parseFlags(expandShortOutput(argv), importSpecs, 1);
  const input = positionals[0];
  if (input === undefined) throw new UsageError('missing the supplier list (give a .xlsx, .csv or .tsv file name)');
  const output = values.output;
  if (typeof output !== 'string' || output.trim() === '')
    throw new UsageError('--output: missing (give the register file to write, e.g. -o register.json)');
  if (resolve(output) === resolve(input))
    throw new UsageError(`--output: ${JSON.stringify(output)} is the list itself (give another name)`);
  const q = numberFlag(values, 'q', FLAG_RULES.q) ?? 2;
  if (![1, 2, 4, 8].includes(q)) throw new UsageError(`--q: ${q} is not accepted (give 1, 2, 4 or 8)`);
  const decimal = textSeparatorOf(values);
  const currency = typeof values.currency === 'string' ? values.currency : 'GBP';
  if (!/^[A-Z]{3}$/.test(currency))
    throw new UsageError(
      `--currency: ${JSON.stringify(currency)} is not accepted (give an ISO 4217 code of three capital letters, e.g. GBP)`,
    );
  let register = emptyRegister(typeof values.name === 'string' ? values.name : 'My machines', currency);
  const appending = await exists(output);
  if (appending) {
    // Value problems (an unread cell) do not stop adding machines; only a file that is not a register does.
    const parsed = parseRegisterFile(await readFile(output, 'utf8'));
    const old = 'register' in parsed ? parsed.register : undefined;
    if (!old) {
      for (const p of 'problems' in parsed ? parsed.problems : []) io.err(`  ${p.path}  ${p.message}\n`);
      io.err(
        'The output exists and is not a register file this program can read; nothing was written (give a new file name).\n',
      );
      return 2;
    }
    register = old;
  }
  const distance = numberFlag(values, 'distance', FLAG_RULES.distanceM);
  const headerRow = numberFlag(values, 'header-row', FLAG_RULES.rowNumber);
  let read;
  try {
    read = await readMachines(
      input,
      {
        ...(typeof values.map === 'string' ? { map: values.map } : {}),
        ...(headerRow !== undefined ? { headerRow } : {}),
        ...(decimal !== undefined ? { decimal } : {}),
        ...(distance !== undefined ? { distanceM: distance } : {}),
        q: q as Directivity,
      },
      register.machines.map((m) => m.id),
    );
  } catch (e) {
    if (e instanceof ImportRefusal) {
      io.err(`ledger register import: ${e.message}\nNothing was imported.\n`);
      return 2;
    }
    throw e;
  }
  const unreadCells = { ...(register.unreadCells ?? {}), ...read.unreadCells };
  const next = {
    ...register,
    ...(!appending && read.workingDaysPerYear !== undefined
      ? {
          settings: {
            ...register.settings,
            workingDaysPerYear: read.workingDaysPerYear,
            ...(read.operatorHoursPerDay !== undefined ? { operatorHoursPerDay: read.operatorHoursPerDay } : {}),
          },
        }
      : {}),
    machines: [...register.machines, ...read.machines],
    ...(Object.keys(unreadCells).length ? { unreadCells } : {}),
  };
  await writeOutput(output, serializeRegister(next));
  const lines = [
    `Wrote ${output}: ${read.machines.length} machine${read.machines.length === 1 ? '' : 's'} added${appending ? ` to the ${register.machines.length} already there` : ''}.`,
  ];
  for (const m of read.machines) lines.push(`  ${m.id.padEnd(6)} ${m.label}`);
  if (read.problems.length)
    lines.push(
      `Problems (${read.problems.length}; the text of these cells is kept):`,
      ...read.problems.map((p) => `  ${p}`),
    );
  if (read.notes.length) lines.push('Notes:', ...read.notes.map((n) => `  ${n}`));
  io.out(`${lines.join('\n')}\n`);
  return read.problems.length ? 1 : 0;
}

async function runExport(argv: string[], io: Io): Promise<number> {
  const { values, positionals } = parseFlags(expandShortOutput(argv), exportSpecs, 1);
  const file = positionals[0];
  if (file === undefined)
    throw new UsageError(
      'missing the register file (give its path, e.g. ledger register export register.json -o register.xlsx)',
    );
  const output = values.output;
  if (typeof output !== 'string' || !/\.xlsx$/i.test(output))
    throw new UsageError(
      `--output: ${output === undefined ? 'missing' : `${JSON.stringify(output)} does not end in .xlsx`} (give a workbook name, e.g. -o register.xlsx)`,
    );
  const criterionDb = numberFlag(values, 'criterion', FLAG_RULES.criterionDb) ?? 65;
  const onTimePct = numberFlag(values, 'on-time', FLAG_RULES.onTimePct) ?? 100;
  const fleetCriterion = numberFlag(values, 'fleet-criterion', FLAG_RULES.lwaCriterionDb);
  const register = await loadRegister(file, io, 'register export');
  if (!register) return 2;
  const comparison = compareMachines(register, {
    criterionDb,
    onTimePct,
    ...(typeof values.type === 'string' ? { type: values.type } : {}),
    ...(typeof values.reference === 'string' ? { referenceId: values.reference } : {}),
  });
  if (comparison.rows.length === 0 && typeof values.type === 'string') {
    const types = [...new Set(register.machines.map(machineType))];
    throw new UsageError(`--type: ${JSON.stringify(values.type)} matches no machine (use one of ${types.join(', ')})`);
  }
  if (typeof values.reference === 'string' && comparison.referenceId !== values.reference) {
    throw new UsageError(
      `--reference: ${JSON.stringify(values.reference)} is not among the machines compared (use one of ${comparison.rows.map((r) => r.machineId).join(', ')})`,
    );
  }
  const { exportRegisterWorkbook } = await import('../../io/register-workbook/write.ts');
  const bytes = await exportRegisterWorkbook(register, {
    comparison,
    ...(fleetCriterion !== undefined ? { fleet: fleetView(register, fleetCriterion) } : {}),
  });
  await writeOutput(output, bytes);
  io.out(
    `Wrote ${output}: ${register.machines.length} machines on the register sheet, ${comparison.rows.length} on the buyer’s shortlist${fleetCriterion !== undefined ? `, the fleet against ${fleetCriterion} dB LWA` : ''}.\n`,
  );
  return 0;
}

export const registerCommand: Command = {
  name: 'register',
  summary,
  help: `${helpText(usage, summary, importSpecs).replace('Flags:', 'import flags:')}\nexport flags:\n${helpText('', '', exportSpecs).split('Flags:\n')[1] ?? ''}`,
  async run(argv, io) {
    const [sub, ...rest] = argv;
    if (sub === 'import') return runImport(rest, io);
    if (sub === 'export') return runExport(rest, io);
    throw new UsageError(
      `${sub === undefined ? 'missing what to do' : `${JSON.stringify(sub)}: unknown`} (use ledger register import or ledger register export)`,
    );
  },
};
