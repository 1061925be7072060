/** Browser storage of projects: the LedgerDB, its records and the operations on them. */
export { LedgerDB } from './LedgerDB.ts';
export { ledgerDb } from './db.ts';
export type { ProjectRecord, ProjectSummary, StoredProject } from './ProjectRecord.ts';
export type { PrefRecord } from './PrefRecord.ts';
export { PREF_LAST_PROJECT } from './PrefRecord.ts';
export { LEDGER_DB_NAME, LEDGER_DB_VERSION } from './schema.ts';
export { describeStorageError, describeOpenError } from './errors.ts';
export {
  listProjects,
  loadProject,
  loadChanges,
  createProject,
  saveProject,
  saveMerged,
  renameProject,
  duplicateProject,
  deleteProject,
  rememberLastProject,
  projectToOpen,
  storedText,
  UnopenableProjectError,
  newProjectId,
  type MergedSave,
} from './projects.ts';
export { quickSave, RevisionTakenError, type QuickSave } from './quick-save.ts';
export type { RegisterRecord } from './RegisterRecord.ts';
export { MAIN_REGISTER_ID } from './RegisterRecord.ts';
export { loadRegister, saveRegister, saveRegisterOn, type RegisterSave } from './registers.ts';
