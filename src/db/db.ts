/**
 * The app's one LedgerDB, opened on first use. Tests make their own LedgerDB with a
 * name of their choosing instead.
 */
import { LedgerDB } from './LedgerDB.ts';

let instance: LedgerDB | undefined;

/** The shared LedgerDB of this page. */
export function ledgerDb(): LedgerDB {
  instance ??= new LedgerDB();
  return instance;
}
