/**
 * Register storage on a LedgerDB: load the buyer's register (an empty one when none is
 * stored yet) and save it, each in one transaction.
 */
import type { LedgerDB } from './LedgerDB.ts';
import type { Register } from '../ledger/register/model.ts';
import { emptyRegister } from '../ledger/register/model.ts';
import { MAIN_REGISTER_ID, type RegisterRecord } from './RegisterRecord.ts';

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
