/**
 * Reading a .csv or .tsv file into raw rows with papaparse (loaded only here, by dynamic
 * import): quoted cells with delimiters and line breaks inside, the delimiter guessed
 * among comma, semicolon, tab and bar (tab for .tsv), a byte-order mark removed. Rows and
 * columns are counted while the rows stream and the reading stops at the limits.
 */
import { decodeText } from './decode-text.ts';
import { ImportRefusal, MAX_COLUMNS, MAX_ROWS, formatCount } from './limits.ts';
import type { RawCell, RawRow, RawTable } from './types.ts';

/** Characters parsed per slice. */
const CHUNK_CHARS = 256 * 1024;

/** Reads delimited text. Throws ImportRefusal with a message. */
export async function readDelimited(bytes: Uint8Array, fileName: string, kind: 'csv' | 'tsv'): Promise<RawTable> {
  const text = decodeText(bytes, fileName);
  if (text.trim() === '') {
    throw new ImportRefusal(`"${fileName}" is empty; a header row and one row per machine are expected`);
  }
  const Papa = (await import('papaparse')).default;
  const rows: RawRow[] = [];
  const notes: string[] = [];
  let record = 0;
  let columnCount = 0;
  let refusal: ImportRefusal | undefined;
  let unclosedQuoteRow: number | undefined;
  let delimiter: string | undefined;
  Papa.parse<string[]>(text, {
    delimiter: kind === 'tsv' ? '\t' : '',
    delimitersToGuess: [',', ';', '\t', '|'],
    skipEmptyLines: false,
    // Parsed in slices: stopping at the row limit then costs only the slices read so far.
    chunkSize: CHUNK_CHARS,
    step: (step, parser) => {
      record++;
      delimiter ??= step.meta.delimiter;
      const fields = step.data;
      if (step.errors.some((e) => e.code === 'MissingQuotes') && unclosedQuoteRow === undefined)
        unclosedQuoteRow = record;
      if (fields.length > MAX_COLUMNS) {
        refusal = new ImportRefusal(
          `"${fileName}" has ${formatCount(fields.length)} columns in row ${record}; lists of up to ${MAX_COLUMNS} columns are accepted (delete unused columns, or check the delimiter)`,
        );
        parser.abort();
        return;
      }
      const cells: RawCell[] = new Array(fields.length);
      let any = false;
      for (let i = 0; i < fields.length; i++) {
        const f = fields[i] as string;
        if (f === '') cells[i] = null;
        else {
          cells[i] = f;
          if (!any && f.trim() !== '') any = true;
        }
      }
      if (!any) return;
      if (rows.length >= MAX_ROWS) {
        refusal = new ImportRefusal(
          `"${fileName}" has more than ${formatCount(MAX_ROWS)} rows; lists of up to ${formatCount(MAX_ROWS)} rows are accepted (split the list)`,
        );
        parser.abort();
        return;
      }
      if (fields.length > columnCount) columnCount = fields.length;
      rows.push({ rowNumber: record, cells });
    },
  });
  if (refusal) throw refusal;
  if (rows.length === 0)
    throw new ImportRefusal(`"${fileName}" is empty; a header row and one row per machine are expected`);
  return {
    fileName,
    kind,
    rows,
    columnCount,
    notes,
    ...(delimiter ? { delimiter } : {}),
    ...(unclosedQuoteRow !== undefined ? { unclosedQuoteRow } : {}),
  };
}
