/**
 * Importing supplier lists of candidate machines (.xlsx, .csv, .tsv): read the file into
 * raw rows (readTable), suggest the header row, mapping and decimal separator
 * (prepareImport), and build the preview of what would be added (buildPreview). Pure
 * TypeScript: the app runs readTable in a worker, the command line calls it directly.
 */
export { readTable, isOleCompoundFile } from './read-table.ts';
export { prepareImport, headersAt, type ImportSetup } from './prepare.ts';
export {
  buildPreview,
  unreadCellKey,
  columnName,
  DEFAULT_BACK_CALCULATION_Q,
  type BuildOptions,
} from './build-preview.ts';
export { detectHeaderRow } from './header-row.ts';
export { suggestField, suggestMapping } from './suggest-mapping.ts';
export { applyMapSpec, assignField, MapSpecError } from './map-spec.ts';
export { FIELD_SPECS, fieldSpec, isImportField, type ImportField, type FieldSpec } from './fields.ts';
export { guessDecimalSeparator } from './guess-separator.ts';
export type { DecimalSeparator } from '../../ledger/catalogue/index.ts';
export { freshIds } from './ids.ts';
export * from './limits.ts';
export type * from './types.ts';
