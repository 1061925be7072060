/**
 * The first look at a table read from a file: where its header row is, what each column
 * seems to hold, and which decimal separator its numbers use. Everything here is a
 * suggestion the user may change before the preview is built.
 */
import { detectHeaderRow } from './header-row.ts';
import type { DecimalSeparator } from '../../ledger/catalogue/index.ts';
import { guessDecimalSeparator } from './guess-separator.ts';
import { headerText, suggestMapping } from './suggest-mapping.ts';
import type { ColumnMapping, RawTable } from './types.ts';

export interface ImportSetup {
  headerRowIndex: number;
  /** Header text per column ('' for an empty header cell). */
  headers: string[];
  mapping: ColumnMapping;
  decimalSeparator: DecimalSeparator;
}

/** Rows sampled for the decimal separator. */
const DECIMAL_SAMPLE_ROWS = 500;

/** The header row of the table as text, padded to the table's width. */
export function headersAt(table: RawTable, headerRowIndex: number): string[] {
  const cells = table.rows[headerRowIndex]?.cells ?? [];
  return Array.from({ length: table.columnCount }, (_, i) => headerText(cells[i]));
}

/** Suggests the header row, the mapping and the decimal separator of a table. */
export function prepareImport(table: RawTable, headerRowIndex = detectHeaderRow(table.rows)): ImportSetup {
  const headers = headersAt(table, headerRowIndex);
  const sample = table.rows.slice(headerRowIndex + 1, headerRowIndex + 1 + DECIMAL_SAMPLE_ROWS).map((r) => r.cells);
  return {
    headerRowIndex,
    headers,
    mapping: suggestMapping(headers),
    decimalSeparator: table.kind === 'xlsx' ? '.' : guessDecimalSeparator(sample, table.delimiter),
  };
}
