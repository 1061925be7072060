/**
 * Register storage on a LedgerDB: load the buyer's register (an empty one when none is
 * stored yet) and save it, each in one transaction.
 */
import type { LedgerDB } from './LedgerDB.ts';
import type { Register } from '../ledger/register/model.ts';
import { emptyRegister } from '../ledger/register/model.ts';
import { MAIN_REGISTER_ID, type RegisterRecord } from './RegisterRecord.ts';
import { mergeRegisters } from '../ledger/register/register-merge.ts';
import type { MergeConflict } from '../ledger/file/project-merge.ts';

/** The stored register, or an empty one (revision 0, not yet stored). */
export async function loadRegister(db: LedgerDB, id = MAIN_REGISTER_ID): Promise<RegisterRecord> {
  const record = await db.registers.get(id);
  return record ?? { id, register: emptyRegister(), updatedAt: 0, revision: 0 };
}

/** Writes the register and returns its new revision. */
export async function saveRegister(db: LedgerDB, register: Register, id = MAIN_REGISTER_ID): Promise<number> {
  return db.transaction('rw', db.registers, async () => {
    const old = await db.registers.get(id);
    const revision = (old?.revision ?? 0) + 1;
    await db.registers.put({ id, register, updatedAt: Date.now(), revision });
    return revision;
  });
}

export interface RegisterSave {
  /** The revision written. */
  revision: number;
  /** The register as stored now: other tabs' edits with this tab's merged in. */
  register: Register;
  /** Cells both changed; this tab's value was kept (its save is the later one). */
  conflicts: MergeConflict<'machines'>[];
}

/**
 * Saves `mine`, made from `base` (the register as stored at `baseRevision`). When another tab
 * stored a newer revision since, the two are merged cell by cell and a cell both changed keeps
 * mine (saved last); otherwise `mine` is written as it is. One transaction.
 */
export async function saveRegisterOn(
  db: LedgerDB,
  base: Register,
  baseRevision: number,
  mine: Register,
  id = MAIN_REGISTER_ID,
): Promise<RegisterSave> {
  return db.transaction('rw', db.registers, async () => {
    const old = await db.registers.get(id);
    const storedRevision = old?.revision ?? 0;
    const { value, conflicts } =
      old && storedRevision !== baseRevision
        ? mergeRegisters(base, mine, old.register, 'mine')
        : { value: mine, conflicts: [] };
    const revision = storedRevision + 1;
    await db.registers.put({ id, register: value, updatedAt: Date.now(), revision });
    return { revision, register: value, conflicts };
  });
}
