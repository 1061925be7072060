/**
 * Turning a text file's bytes into a string: a byte-order mark picks UTF-8 or UTF-16;
 * without one, UTF-8 is tried and, if the bytes are not valid UTF-8, Windows-1252 (the
 * usual encoding of older spreadsheet exports, "£" as byte A3). The mark is removed.
 */
import { ImportRefusal } from './limits.ts';

/** Bytes examined for NUL characters, which no text file holds. */
const BINARY_PROBE_BYTES = 8192;

/** Decodes a text file; refuses binary content with a message. */
export function decodeText(bytes: Uint8Array, fileName: string): string {
  const b0 = bytes[0];
  const b1 = bytes[1];
  if (b0 === 0xff && b1 === 0xfe) return new TextDecoder('utf-16le').decode(bytes.subarray(2));
  if (b0 === 0xfe && b1 === 0xff) return new TextDecoder('utf-16be').decode(bytes.subarray(2));
  const probe = bytes.subarray(0, BINARY_PROBE_BYTES);
  if (probe.includes(0)) {
    throw new ImportRefusal(
      `"${fileName}" is not a text file (it holds binary data); an .xlsx workbook, or a .csv or .tsv text file is accepted`,
    );
  }
  const start = b0 === 0xef && b1 === 0xbb && bytes[2] === 0xbf ? 3 : 0;
  const body = bytes.subarray(start);
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(body);
  } catch {
    return new TextDecoder('windows-1252').decode(body);
  }
}
