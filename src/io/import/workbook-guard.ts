/**
 * Checks an .xlsx workbook before it is opened, so that nothing large is ever expanded:
 *
 * 1. From the central directory alone (nothing expanded): the number of parts, encryption,
 *    compression methods, and the total size the parts declare they expand to.
 * 2. Each part is then expanded with a ceiling at its declared size (a part that lies
 *    about its size is stopped there), output discarded; worksheet parts are scanned as
 *    they stream for their rows, columns and cells, and refused past the limits.
 *
 * Only then does the workbook library open the file.
 */
import { entryData, readZipDirectory, type ZipEntry } from './zip-directory.ts';
import { InflateCeilingError, InflateDataError, inflateBounded } from './inflate-bounded.ts';
import {
  ACCEPTED_FILES,
  ImportRefusal,
  MAX_CELLS,
  MAX_COLUMNS,
  MAX_ROWS,
  MAX_UNCOMPRESSED_BYTES,
  MAX_ZIP_ENTRIES,
  formatBytes,
  formatCount,
} from './limits.ts';

/** What the scan learnt about each worksheet part. */
export interface SheetScan {
  part: string;
  rows: number;
  columns: number;
  cells: number;
}

const WORKSHEET_PART = /^xl\/worksheets\/[^/]+\.xml$/i;
/** Longest tail carried between chunks so a tag split across two chunks is still seen, characters. */
const TAIL_CHARS = 64;

/** Column letters to a 1-based number: A → 1, Z → 26, AA → 27. */
export function columnNumber(letters: string): number {
  let n = 0;
  for (let i = 0; i < letters.length; i++) n = n * 26 + (letters.charCodeAt(i) - 64);
  return n;
}

/** Column number (1-based) to letters: 1 → A, 27 → AA. */
export function columnLetters(n: number): string {
  let s = '';
  for (let k = n; k > 0; k = Math.floor((k - 1) / 26)) s = String.fromCharCode(65 + ((k - 1) % 26)) + s;
  return s;
}

/** Counts rows, the widest column reference and cells in worksheet XML as it streams. */
class SheetCounter {
  rows = 0;
  columns = 0;
  cells = 0;
  private tail = '';
  private readonly decoder = new TextDecoder('utf-8');

  constructor(
    private readonly part: string,
    private readonly fileName: string,
  ) {}

  push(chunk: Uint8Array): void {
    const text = this.tail + this.decoder.decode(chunk, { stream: true });
    const fresh = this.tail.length;
    const rowTag = /<(?:[A-Za-z_][\w.-]*:)?row[\s>/]/g;
    const cellTag = /<(?:[A-Za-z_][\w.-]*:)?c[\s>/]/g;
    const cellRef = /\sr="([A-Z]{1,3})\d+"/g;
    for (let m = rowTag.exec(text); m; m = rowTag.exec(text)) if (m.index + m[0].length > fresh) this.rows++;
    for (let m = cellTag.exec(text); m; m = cellTag.exec(text)) if (m.index + m[0].length > fresh) this.cells++;
    for (let m = cellRef.exec(text); m; m = cellRef.exec(text)) {
      if (m.index + m[0].length <= fresh) continue;
      const col = columnNumber(m[1] as string);
      if (col > this.columns) this.columns = col;
    }
    this.tail = text.slice(-TAIL_CHARS);
    const where = `"${this.fileName}"`;
    if (this.rows > MAX_ROWS) {
      throw new ImportRefusal(
        `${where} has more than ${formatCount(MAX_ROWS)} rows in one sheet; lists of up to ${formatCount(MAX_ROWS)} rows are accepted (split the list)`,
      );
    }
    if (this.columns > MAX_COLUMNS) {
      throw new ImportRefusal(
        `${where} uses column ${columnLetters(this.columns)} (more than ${MAX_COLUMNS} columns); lists of up to ${MAX_COLUMNS} columns are accepted (delete unused columns)`,
      );
    }
    if (this.cells > MAX_CELLS) {
      throw new ImportRefusal(
        `${where} has more than ${formatCount(MAX_CELLS)} cells; lists of up to ${formatCount(MAX_CELLS)} cells are accepted (split the list)`,
      );
    }
  }

  result(): SheetScan {
    return { part: this.part, rows: this.rows, columns: this.columns, cells: this.cells };
  }
}

/**
 * Checks a workbook's archive; returns the scan of its worksheets. Throws an ImportRefusal
 * with a message for the user when the workbook is refused.
 */
export async function checkWorkbookArchive(bytes: Uint8Array, fileName: string): Promise<SheetScan[]> {
  const entries = readZipDirectory(bytes, fileName);
  if (entries.length > MAX_ZIP_ENTRIES) {
    throw new ImportRefusal(
      `"${fileName}" holds ${formatCount(entries.length)} parts; workbooks of up to ${formatCount(MAX_ZIP_ENTRIES)} parts are accepted`,
    );
  }
  if (entries.some((e) => (e.flags & 1) !== 0)) {
    throw new ImportRefusal(`"${fileName}" is encrypted (password-protected); save it without a password, or as .csv`);
  }
  const odd = entries.find((e) => e.method !== 0 && e.method !== 8);
  if (odd) {
    throw new ImportRefusal(
      `"${fileName}" uses a compression method this importer does not read (method ${odd.method} in "${odd.name}"); save it again as .xlsx, or as .csv`,
    );
  }
  let declared = 0;
  for (const e of entries) {
    if (e.uncompressedSize === 0xffffffff || e.compressedSize === 0xffffffff) {
      throw new ImportRefusal(
        `"${fileName}" has a part over 4 GB ("${e.name}"); workbooks that expand to at most ${formatBytes(MAX_UNCOMPRESSED_BYTES)} are accepted`,
      );
    }
    declared += e.uncompressedSize;
  }
  if (declared > MAX_UNCOMPRESSED_BYTES) {
    throw new ImportRefusal(
      `"${fileName}" would expand to ${formatBytes(declared)} when opened; workbooks that expand to at most ${formatBytes(MAX_UNCOMPRESSED_BYTES)} are accepted (it was not opened)`,
    );
  }
  const names = new Set(entries.map((e) => e.name));
  if (!names.has('[Content_Types].xml') || !entries.some((e) => /^xl\/workbook\d*\.xml$/i.test(e.name))) {
    throw new ImportRefusal(`"${fileName}" is a ZIP archive but not an .xlsx workbook; ${ACCEPTED_FILES} is accepted`);
  }
  const scans: SheetScan[] = [];
  for (const entry of entries) scans.push(...(await verifyEntry(bytes, entry, fileName)));
  return scans;
}

async function verifyEntry(bytes: Uint8Array, entry: ZipEntry, fileName: string): Promise<SheetScan[]> {
  const data = entryData(bytes, entry, fileName);
  const isSheet = WORKSHEET_PART.test(entry.name);
  const counter = isSheet ? new SheetCounter(entry.name, fileName) : undefined;
  if (entry.method === 0) {
    if (entry.compressedSize !== entry.uncompressedSize) {
      throw new ImportRefusal(
        `"${fileName}" is damaged: the part "${entry.name}" has inconsistent sizes (save it again as .xlsx, or as .csv)`,
      );
    }
    counter?.push(data);
    return counter ? [counter.result()] : [];
  }
  try {
    await inflateBounded(data, entry.uncompressedSize, counter ? (chunk) => counter.push(chunk) : undefined);
  } catch (e) {
    if (e instanceof InflateCeilingError) {
      throw new ImportRefusal(
        `"${fileName}" is refused: the part "${entry.name}" expands past the ${formatBytes(entry.uncompressedSize)} its table of contents declares (a damaged or crafted file); it was not opened`,
      );
    }
    if (e instanceof InflateDataError) {
      throw new ImportRefusal(
        `"${fileName}" is damaged: the part "${entry.name}" cannot be expanded (save it again as .xlsx, or as .csv)`,
      );
    }
    throw e;
  }
  return counter ? [counter.result()] : [];
}
