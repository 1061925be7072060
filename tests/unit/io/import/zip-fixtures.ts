/**
 * Builds ZIP archives byte by byte for the importer's tests (layout: ZIP File Format
 * Specification, APPNOTE.TXT 4.3.7 local header, 4.3.12 central directory header,
 * 4.3.16 end of central directory record), including crafted ones: sizes that lie, an
 * encryption flag, and a part that expands enormously.
 */
import { constants, crc32, deflateRawSync } from 'node:zlib';

export interface FixtureEntry {
  name: string;
  /** The part's content; deflated unless `raw` is given. */
  data?: Uint8Array | string;
  /** Already-deflated bytes, with the sizes to declare. */
  raw?: { compressed: Uint8Array; uncompressedSize: number; crc?: number };
  /** General-purpose flags (bit 0 = encrypted). */
  flags?: number;
  /** Override the declared uncompressed size (a lying directory). */
  declaredSize?: number;
}

function u16(n: number): Uint8Array {
  return new Uint8Array([n & 0xff, (n >>> 8) & 0xff]);
}
function u32(n: number): Uint8Array {
  return new Uint8Array([n & 0xff, (n >>> 8) & 0xff, (n >>> 16) & 0xff, (n >>> 24) & 0xff]);
}
function concat(parts: Uint8Array[]): Uint8Array {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}

/** A ZIP archive of the given entries, every one deflated (method 8). */
export function makeZip(entries: FixtureEntry[]): Uint8Array {
  const enc = new TextEncoder();
  const locals: Uint8Array[] = [];
  const centrals: Uint8Array[] = [];
  let offset = 0;
  for (const e of entries) {
    const name = enc.encode(e.name);
    let compressed: Uint8Array;
    let size: number;
    let crc: number;
    if (e.raw) {
      compressed = e.raw.compressed;
      size = e.raw.uncompressedSize;
      crc = e.raw.crc ?? 0;
    } else {
      const data = typeof e.data === 'string' ? enc.encode(e.data) : (e.data ?? new Uint8Array());
      compressed = new Uint8Array(deflateRawSync(data));
      size = data.length;
      crc = crc32(data);
    }
    if (e.declaredSize !== undefined) size = e.declaredSize;
    const flags = e.flags ?? 0x0800; // UTF-8 names
    const common = [
      u16(20),
      u16(flags),
      u16(8),
      u16(0),
      u16(0x21),
      u32(crc),
      u32(compressed.length),
      u32(size),
      u16(name.length),
      u16(0),
    ];
    const local = concat([u32(0x04034b50), ...common, name, compressed]);
    centrals.push(concat([u32(0x02014b50), u16(20), ...common, u16(0), u16(0), u16(0), u32(0), u32(offset), name]));
    locals.push(local);
    offset += local.length;
  }
  const directory = concat(centrals);
  const end = concat([
    u32(0x06054b50),
    u16(0),
    u16(0),
    u16(entries.length),
    u16(entries.length),
    u32(directory.length),
    u32(offset),
    u16(0),
  ]);
  return concat([...locals, directory, end]);
}

/**
 * Raw deflate data that expands to `megabytes` MB of zero bytes while itself being about
 * 1 kB per MB: one sync-flushed block of 1 MB of zeros repeated, then an empty final block.
 */
export function zerosDeflated(megabytes: number): Uint8Array {
  const block = new Uint8Array(deflateRawSync(new Uint8Array(1 << 20), { finishFlush: constants.Z_SYNC_FLUSH }));
  const last = new Uint8Array(deflateRawSync(new Uint8Array(0)));
  const parts: Uint8Array[] = [];
  for (let i = 0; i < megabytes; i++) parts.push(block);
  parts.push(last);
  return concat(parts);
}

const CONTENT_TYPES =
  '<?xml version="1.0" encoding="UTF-8"?><Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"></Types>';
const WORKBOOK =
  '<?xml version="1.0" encoding="UTF-8"?><workbook xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><sheets><sheet name="S" sheetId="1"/></sheets></workbook>';

/** The parts a workbook's archive must hold besides its sheets (enough for the archive checks). */
export function workbookShell(sheets: FixtureEntry[]): FixtureEntry[] {
  return [{ name: '[Content_Types].xml', data: CONTENT_TYPES }, { name: 'xl/workbook.xml', data: WORKBOOK }, ...sheets];
}

/** Worksheet XML with `rows` rows of `columns` numeric cells (column letters A…). */
export function sheetXml(rows: number, columns: number): string {
  const letters = (n: number) => {
    let s = '';
    for (let k = n; k > 0; k = Math.floor((k - 1) / 26)) s = String.fromCharCode(65 + ((k - 1) % 26)) + s;
    return s;
  };
  const parts: string[] = [
    '<?xml version="1.0" encoding="UTF-8"?><worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><sheetData>',
  ];
  for (let r = 1; r <= rows; r++) {
    let row = `<row r="${r}">`;
    for (let c = 1; c <= columns; c++) row += `<c r="${letters(c)}${r}"><v>${c}</v></c>`;
    parts.push(`${row}</row>`);
  }
  parts.push('</sheetData></worksheet>');
  return parts.join('');
}
