/**
 * The buyer's machine register as stored (added in schema version 3): one record per
 * register, the register itself in exactly its file's shape. The app keeps one register,
 * under the id "main", shared by every project.
 */
import type { Register } from '../ledger/register/model.ts';

export interface RegisterRecord {
  /** "main" for the app's register. */
  id: string;
  register: Register;
  /** Milliseconds since 1970 of the last save. */
  updatedAt: number;
  /** Count of saves from 1; another tab seeing a higher one reloads the register. */
  revision: number;
}

/** The id of the register the app keeps. */
export const MAIN_REGISTER_ID = 'main';
