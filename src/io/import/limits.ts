/**
 * Limits on what an imported supplier list may be, and the refusal raised when a file
 * is outside them. Every limit is checked before the costly step it protects: the file
 * size before reading, a workbook's declared uncompressed sizes before anything is
 * expanded, the row and column counts while the rows stream in.
 */

/** Largest file accepted, bytes (20 MB). */
export const MAX_FILE_BYTES = 20 * 1024 * 1024;
/** Most rows accepted in one list, counting the header and any title rows. */
export const MAX_ROWS = 100_000;
/** Most columns accepted in one list. */
export const MAX_COLUMNS = 200;
/** Most cells in one worksheet of a workbook (e.g. 100,000 rows of 20 columns). */
export const MAX_CELLS = 2_000_000;
/** Most bytes a workbook's entries may expand to in total, bytes (200 MB). */
export const MAX_UNCOMPRESSED_BYTES = 200 * 1024 * 1024;
/** Most entries (files) inside a workbook. An ordinary supplier workbook has 10 to 30. */
export const MAX_ZIP_ENTRIES = 2_000;
/** Longest text kept from a single cell, characters; longer text is cut and flagged. */
export const MAX_CELL_CHARS = 2_000;

/** Formats a byte count for a message, e.g. 20971520 → "20 MB". */
export function formatBytes(bytes: number): string {
  if (bytes >= 1024 * 1024 * 1024) return `${(bytes / (1024 * 1024 * 1024)).toFixed(1)} GB`;
  if (bytes >= 1024 * 1024) return `${Math.round(bytes / (1024 * 1024))} MB`;
  if (bytes >= 1024) return `${Math.round(bytes / 1024)} kB`;
  return `${bytes} bytes`;
}

/** Formats a count with thousands separators, e.g. 100000 → "100,000". */
export function formatCount(n: number): string {
  return String(Math.trunc(n)).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/**
 * A file the importer will not read, with a message saying what is wrong and what is
 * accepted. Nothing from a refused file is imported.
 */
export class ImportRefusal extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ImportRefusal';
  }
}

/** The accepted kinds of file, in words, for messages. */
export const ACCEPTED_FILES = 'an .xlsx workbook, or a .csv or .tsv text file';
