/**
 * Reading a supplier list's file into raw rows: the file's first bytes decide how it is
 * read (a ZIP archive is a workbook; an OLE compound file is a password-protected
 * workbook or an old .xls, refused), the size limit is checked before anything else.
 */
import { looksLikeZip } from './zip-directory.ts';
import { readXlsx } from './read-xlsx.ts';
import { readDelimited } from './read-delimited.ts';
import { ACCEPTED_FILES, ImportRefusal, MAX_FILE_BYTES, formatBytes } from './limits.ts';
import type { RawTable } from './types.ts';

/** Signature of an OLE compound file (old .xls, or an encrypted .xlsx): D0 CF 11 E0 A1 B1 1A E1. */
const OLE_SIGNATURE = [0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1] as const;

function extension(fileName: string): string {
  const dot = fileName.lastIndexOf('.');
  return dot < 0 ? '' : fileName.slice(dot + 1).toLowerCase();
}

/** True when the bytes start with the OLE compound file signature. */
export function isOleCompoundFile(bytes: Uint8Array): boolean {
  return OLE_SIGNATURE.every((b, i) => bytes[i] === b);
}

/**
 * Reads a supplier list (.xlsx, .csv or .tsv) into raw rows.
 * Throws an ImportRefusal whose message says what is wrong and what is accepted.
 */
export async function readTable(data: Uint8Array | ArrayBuffer, fileName: string): Promise<RawTable> {
  const bytes = data instanceof Uint8Array ? data : new Uint8Array(data);
  const ext = extension(fileName);
  if (bytes.length > MAX_FILE_BYTES) {
    throw new ImportRefusal(
      `"${fileName}" is ${formatBytes(bytes.length)}; files of up to ${formatBytes(MAX_FILE_BYTES)} are accepted (split the list, or delete other sheets)`,
    );
  }
  if (bytes.length === 0)
    throw new ImportRefusal(`"${fileName}" is empty; a header row and one row per machine are expected`);
  if (isOleCompoundFile(bytes)) {
    throw new ImportRefusal(
      ext === 'xls'
        ? `"${fileName}" is an old-style .xls workbook; save it as .xlsx or .csv and import that`
        : `"${fileName}" is password-protected (encrypted) or an old-style .xls workbook; save it without a password as .xlsx, or as .csv`,
    );
  }
  if (looksLikeZip(bytes)) return readXlsx(bytes, fileName);
  if (ext === 'xlsx' || ext === 'xlsm' || ext === 'xls' || ext === 'ods') {
    throw new ImportRefusal(
      `"${fileName}" is not a readable .xlsx workbook (damaged, or another format); ${ACCEPTED_FILES} is accepted`,
    );
  }
  const json = jsonKind(bytes);
  if (json || ext === 'json') {
    throw new ImportRefusal(
      json === 'project'
        ? `"${fileName}" is a project file of this program (JSON), not a supplier list (a supplier list is ${ACCEPTED_FILES}); open it as a project instead (in the app: Open; on the command line: ledger evaluate ${fileName})`
        : `"${fileName}" looks like JSON text, not a supplier list; ${ACCEPTED_FILES} is accepted (save the list from a spreadsheet program as .xlsx or .csv)`,
    );
  }
  return readDelimited(bytes, fileName, ext === 'tsv' || ext === 'tab' ? 'tsv' : 'csv');
}

/**
 * Whether a text file is JSON rather than a table: 'project' when its start names this
 * program's project format, 'json' when it starts like a JSON object or list, else undefined.
 */
function jsonKind(bytes: Uint8Array): 'project' | 'json' | undefined {
  const head = new TextDecoder('utf-8', { fatal: false })
    .decode(bytes.subarray(0, 4096))
    .replace(/^\uFEFF/, '')
    .trimStart();
  if (!head.startsWith('{') && !head.startsWith('[')) return undefined;
  if (/"format"\s*:\s*"plant-noise-ledger\/project"/.test(head)) return 'project';
  // A CSV row may start with "[" or "{" too; call it JSON only when the next token is JSON-like.
  return /^(\{\s*("|\})|\[\s*(\{|\[|"|-?\d|\]|true|false|null))/.test(head) ? 'json' : undefined;
}
