/**
 * Reading a ZIP archive's central directory (an .xlsx workbook is a ZIP archive) without
 * expanding anything: the end-of-central-directory record gives where the directory is,
 * and each directory record gives an entry's name, compression method, flags and its
 * compressed and uncompressed sizes. Layout from the ZIP File Format Specification
 * (APPNOTE.TXT, sections 4.3.12 central directory header and 4.3.16 end of central
 * directory record). All multi-byte numbers are little-endian.
 */
import { ImportRefusal } from './limits.ts';

/** Signature of the end-of-central-directory record, "PK\x05\x06". */
const EOCD_SIGNATURE = 0x06054b50;
/** Signature of a central directory file header, "PK\x01\x02". */
const CENTRAL_SIGNATURE = 0x02014b50;
/** Signature of a local file header, "PK\x03\x04". */
const LOCAL_SIGNATURE = 0x04034b50;
/** Signature of the ZIP64 end-of-central-directory locator, "PK\x06\x07". */
const ZIP64_LOCATOR_SIGNATURE = 0x07064b50;
/** Fixed length of the end-of-central-directory record, bytes (comment excluded). */
const EOCD_LENGTH = 22;
/** Fixed length of a central directory header, bytes (name, extra, comment excluded). */
const CENTRAL_LENGTH = 46;
/** Fixed length of a local file header, bytes (name and extra excluded). */
const LOCAL_LENGTH = 30;
/** Longest archive comment, bytes; bounds the backward search for the end record. */
const MAX_COMMENT = 0xffff;

export interface ZipEntry {
  name: string;
  /** 0 stored, 8 deflated. */
  method: number;
  /** General-purpose bit flags; bit 0 = encrypted. */
  flags: number;
  compressedSize: number;
  /** As the directory declares it; checked again while expanding. */
  uncompressedSize: number;
  /** Offset of the entry's local header from the start of the archive. */
  localHeaderOffset: number;
}

/** True when the bytes start like a ZIP archive (a local header, or an empty archive's end record). */
export function looksLikeZip(bytes: Uint8Array): boolean {
  return (
    bytes.length >= 4 &&
    bytes[0] === 0x50 &&
    bytes[1] === 0x4b &&
    (bytes[2] === 3 || bytes[2] === 5) &&
    (bytes[3] === 4 || bytes[3] === 6)
  );
}

function u16(view: DataView, at: number): number {
  return view.getUint16(at, true);
}
function u32(view: DataView, at: number): number {
  return view.getUint32(at, true);
}

/**
 * Lists a ZIP archive's entries from its central directory; nothing is expanded.
 * Throws an ImportRefusal naming the file when the archive is damaged or uses ZIP64.
 * O(entries).
 */
export function readZipDirectory(bytes: Uint8Array, fileName: string): ZipEntry[] {
  const damaged = (what: string) =>
    new ImportRefusal(
      `"${fileName}" is damaged: ${what} (save it again from the spreadsheet program as .xlsx, or as .csv)`,
    );
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  if (bytes.length < EOCD_LENGTH) throw damaged('it is too short to be a workbook');
  let eocd = -1;
  const stop = Math.max(0, bytes.length - EOCD_LENGTH - MAX_COMMENT);
  for (let at = bytes.length - EOCD_LENGTH; at >= stop; at--) {
    if (u32(view, at) === EOCD_SIGNATURE && at + EOCD_LENGTH + u16(view, at + 20) === bytes.length) {
      eocd = at;
      break;
    }
  }
  if (eocd < 0) throw damaged('its table of contents (the ZIP end record) is missing');
  const entryCount = u16(view, eocd + 10);
  const directorySize = u32(view, eocd + 12);
  const directoryOffset = u32(view, eocd + 16);
  const zip64 = eocd >= 20 && u32(view, eocd - 20) === ZIP64_LOCATOR_SIGNATURE;
  if (zip64 || entryCount === 0xffff || directoryOffset === 0xffffffff || directorySize === 0xffffffff) {
    throw new ImportRefusal(
      `"${fileName}" is a ZIP64 archive, made for contents over 4 GB; workbooks that expand to at most a few hundred MB are accepted`,
    );
  }
  if (directoryOffset + directorySize > eocd) throw damaged('its table of contents points outside the file');
  const entries: ZipEntry[] = [];
  let at = directoryOffset;
  const decoder = new TextDecoder('utf-8');
  for (let i = 0; i < entryCount; i++) {
    if (at + CENTRAL_LENGTH > eocd || u32(view, at) !== CENTRAL_SIGNATURE)
      throw damaged(`entry ${i + 1} of its table of contents is unreadable`);
    const flags = u16(view, at + 8);
    const method = u16(view, at + 10);
    const compressedSize = u32(view, at + 20);
    const uncompressedSize = u32(view, at + 24);
    const nameLength = u16(view, at + 28);
    const extraLength = u16(view, at + 30);
    const commentLength = u16(view, at + 32);
    const localHeaderOffset = u32(view, at + 42);
    if (at + CENTRAL_LENGTH + nameLength > eocd) throw damaged(`entry ${i + 1} of its table of contents is cut short`);
    const name = decoder.decode(bytes.subarray(at + CENTRAL_LENGTH, at + CENTRAL_LENGTH + nameLength));
    entries.push({ name, method, flags, compressedSize, uncompressedSize, localHeaderOffset });
    at += CENTRAL_LENGTH + nameLength + extraLength + commentLength;
  }
  return entries;
}

/**
 * The compressed bytes of an entry, located through its local header.
 * Throws an ImportRefusal when the header or the data lie outside the file.
 */
export function entryData(bytes: Uint8Array, entry: ZipEntry, fileName: string): Uint8Array {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const at = entry.localHeaderOffset;
  const bad = () =>
    new ImportRefusal(
      `"${fileName}" is damaged: the part "${entry.name}" cannot be found (save it again as .xlsx, or as .csv)`,
    );
  if (at + LOCAL_LENGTH > bytes.length || u32(view, at) !== LOCAL_SIGNATURE) throw bad();
  const start = at + LOCAL_LENGTH + u16(view, at + 26) + u16(view, at + 28);
  const end = start + entry.compressedSize;
  if (end > bytes.length) throw bad();
  return bytes.subarray(start, end);
}
