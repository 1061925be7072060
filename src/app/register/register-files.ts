/**
 * The register's files in the app: the register file (JSON, with its schema), the register
 * workbook (register, buyer's shortlist, fleet) and reading a register file back. Each loads
 * its code on first use.
 */
import type { Register } from '../../ledger/register/model.ts';
import type { Comparison } from '../../ledger/register/compare.ts';
import type { FleetView } from '../../ledger/register/fleet-view.ts';
import { parseRegisterFile, serializeRegister } from '../../ledger/register/register-file.ts';
import { download, fileNameFor } from '../shell/file-actions.svelte.ts';

export function exportRegisterFile(register: Register): void {
  download(serializeRegister(register), fileNameFor(register.name || 'register', 'register.json'), 'application/json');
}

export async function exportRegisterWorkbook(
  register: Register,
  comparison: Comparison | undefined,
  fleet: FleetView | undefined,
): Promise<void> {
  const { exportRegisterWorkbook: build } = await import('../../io/register-workbook/write.ts');
  const bytes = await build(register, { ...(comparison ? { comparison } : {}), ...(fleet ? { fleet } : {}) });
  download(
    bytes as BlobPart,
    fileNameFor(register.name || 'register', 'xlsx'),
    'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
  );
}

/**
 * What reading a register file into the app's register does: an empty register takes the
 * file as it is (name, currency, settings, machines); otherwise the file's machines are
 * added under free ids and the register's own settings stay. Throws with every problem,
 * one per line, when the file is not a register this program reads.
 */
export async function readRegisterFile(
  file: File,
  current: Register,
): Promise<{ register: Register; message: string }> {
  if (/\.xlsx$/i.test(file.name)) return readRegisterWorkbookFile(file, current);
  const parsed = parseRegisterFile(await file.text());
  if ('problems' in parsed)
    throw new Error(
      `The register file "${file.name}" was not read:\n${parsed.problems.map((p) => `${p.path}  ${p.message}`).join('\n')}`,
    );
  const incoming = parsed.register;
  if (current.machines.length === 0)
    return {
      register: incoming,
      message: `Register "${incoming.name}" read from "${file.name}": ${incoming.machines.length} machines.`,
    };
  return mergeRegister(current, incoming, file.name);
}

/** The current register with the other's machines added under ids not in use (their unread cells follow them). */
export function mergeRegister(
  current: Register,
  incoming: Register,
  fileName: string,
): { register: Register; message: string } {
  const mine = new Set(current.machines.map((m) => m.id));
  // The incoming ids that are free keep their id; only the clashing ones move, to ids used by neither.
  const taken = new Set([...mine, ...incoming.machines.map((m) => m.id)]);
  const renamed = new Map<string, string>();
  let n = 1;
  const machines = incoming.machines.map((m) => {
    if (!mine.has(m.id)) return m;
    while (taken.has(`m${n}`)) n++;
    const id = `m${n}`;
    taken.add(id);
    renamed.set(m.id, id);
    return { ...m, id };
  });
  const unread = { ...(current.unreadCells ?? {}) };
  for (const [key, text] of Object.entries(incoming.unreadCells ?? {})) {
    const [list, id, ...rest] = key.split('/');
    unread[[list, id !== undefined ? (renamed.get(id) ?? id) : id, ...rest].join('/')] = text;
  }
  const register: Register = {
    ...current,
    machines: [...current.machines, ...machines],
    ...(Object.keys(unread).length ? { unreadCells: unread } : {}),
  };
  const renames = renamed.size
    ? ` (${[...renamed].map(([a, b]) => `${a} → ${b}`).join(', ')}: ids already in use)`
    : '';
  return {
    register,
    message: `${machines.length} machines from "${fileName}" added to the register${renames}; the register's own name, currency and settings are kept.`,
  };
}

/**
 * A register workbook (as exported, perhaps edited in a spreadsheet program) read back:
 * its machines are added like a register file's; cells that cannot be read keep their text
 * and are listed. The archive is checked before it is expanded, as for a supplier list.
 */
async function readRegisterWorkbookFile(
  file: File,
  current: Register,
): Promise<{ register: Register; message: string }> {
  const { MAX_FILE_BYTES, formatBytes } = await import('../../io/import/limits.ts');
  if (file.size > MAX_FILE_BYTES)
    throw new Error(
      `"${file.name}" is ${formatBytes(file.size)}; files of up to ${formatBytes(MAX_FILE_BYTES)} are accepted.`,
    );
  const bytes = new Uint8Array(await file.arrayBuffer());
  const { checkWorkbookArchive } = await import('../../io/import/workbook-guard.ts');
  await checkWorkbookArchive(bytes, file.name);
  const { readRegisterWorkbook } = await import('../../io/register-workbook/read.ts');
  const read = await readRegisterWorkbook(bytes);
  if (read.problems.some((p) => p.startsWith('Workbook:')))
    throw new Error(`The register workbook "${file.name}" was not read:\n${read.problems.join('\n')}`);
  const incoming: Register = {
    ...current,
    settings: {
      workingDaysPerYear: read.workingDaysPerYear ?? current.settings.workingDaysPerYear,
      operatorHoursPerDay: read.operatorHoursPerDay ?? current.settings.operatorHoursPerDay,
    },
    machines: read.machines,
    ...(Object.keys(read.unreadCells).length ? { unreadCells: read.unreadCells } : {}),
  };
  const unreadNote = read.problems.length
    ? ` ${read.problems.length} cell${read.problems.length === 1 ? '' : 's'} could not be read and keep their text: ${read.problems.join('; ')}`
    : '';
  if (current.machines.length === 0)
    return { register: incoming, message: `${read.machines.length} machines read from "${file.name}".${unreadNote}` };
  const merged = mergeRegister(current, incoming, file.name);
  return { register: merged.register, message: merged.message + unreadNote };
}
