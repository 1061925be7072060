/**
 * Reading a supplier list for the import dialog, off the main thread: each read starts a
 * module worker (src/app/workers/import.worker.ts), transfers the file's bytes to it and
 * ends it when the answer comes, when the user cancels, or after a time limit, so that
 * nothing a file holds can hang the page. The size limit is checked before the file is
 * even read into memory.
 */
import type { ImportSetup } from '../../io/import/prepare.ts';
import type { RawTable } from '../../io/import/types.ts';
import { MAX_FILE_BYTES, formatBytes } from '../../io/import/limits.ts';

/** Message to the worker. */
export interface WorkerRequest {
  id: number;
  bytes: ArrayBuffer;
  fileName: string;
}

/** What reading a file gave: the table and suggested setup, or why the file was refused. */
export type ReadOutcome = { ok: true; table: RawTable; setup: ImportSetup } | { ok: false; message: string };

/** Message from the worker. */
export type WorkerReply = { id: number } & ReadOutcome;

/** The part of a File the reader needs. */
export interface ChosenFile {
  name: string;
  size: number;
  arrayBuffer(): Promise<ArrayBuffer>;
}

/** Reads a chosen file into a table; never rejects (a problem is an outcome with a message). */
export type ImportReader = (file: ChosenFile, signal?: AbortSignal) => Promise<ReadOutcome>;

/** Longest a read may take before the worker is stopped, ms. */
export const READ_TIME_LIMIT_MS = 60_000;

/** Refuses a file by its size before reading it; undefined when the size is acceptable. */
export function refuseBySize(file: ChosenFile): ReadOutcome | undefined {
  if (file.size > MAX_FILE_BYTES) {
    return {
      ok: false,
      message: `"${file.name}" is ${formatBytes(file.size)}; files of up to ${formatBytes(MAX_FILE_BYTES)} are accepted (split the list, or delete other sheets)`,
    };
  }
  return undefined;
}

let nextId = 1;

/** Reads a file in a fresh worker, stopped after READ_TIME_LIMIT_MS or when `signal` aborts. */
export const readInWorker: ImportReader = async (file, signal) => {
  const refused = refuseBySize(file);
  if (refused) return refused;
  const bytes = await file.arrayBuffer();
  return new Promise<ReadOutcome>((resolve) => {
    const id = nextId++;
    const worker = new Worker(new URL('../workers/import.worker.ts', import.meta.url), {
      type: 'module',
      name: 'supplier-list-reader',
    });
    let settled = false;
    const finish = (outcome: ReadOutcome) => {
      if (settled) return;
      settled = true;
      clearTimeout(timer);
      signal?.removeEventListener('abort', onAbort);
      worker.terminate();
      resolve(outcome);
    };
    const onAbort = () => finish({ ok: false, message: `Reading "${file.name}" was cancelled; nothing was imported.` });
    const timer = setTimeout(
      () =>
        finish({
          ok: false,
          message: `Reading "${file.name}" took longer than ${READ_TIME_LIMIT_MS / 1000} s and was stopped; nothing was imported (try a smaller list, or save it as .csv).`,
        }),
      READ_TIME_LIMIT_MS,
    );
    signal?.addEventListener('abort', onAbort);
    worker.onmessage = (event: MessageEvent<WorkerReply>) => {
      if (event.data.id !== id) return;
      const { id: _id, ...outcome } = event.data;
      finish(outcome as ReadOutcome);
    };
    worker.onerror = (event) => {
      event.preventDefault();
      finish({
        ok: false,
        message: `"${file.name}" could not be read (${event.message || 'the reader stopped'}); nothing was imported.`,
      });
    };
    worker.postMessage({ id, bytes, fileName: file.name } satisfies WorkerRequest, [bytes]);
  });
};

/**
 * Reads a file on the calling thread (tests, and environments without workers). The
 * same reader code runs; only the thread differs.
 */
export const readInProcess: ImportReader = async (file) => {
  const refused = refuseBySize(file);
  if (refused) return refused;
  const { readTable, prepareImport, ImportRefusal } = await import('../../io/import/index.ts');
  try {
    const table = await readTable(await file.arrayBuffer(), file.name);
    return { ok: true, table, setup: prepareImport(table) };
  } catch (e) {
    if (e instanceof ImportRefusal) return { ok: false, message: e.message };
    return {
      ok: false,
      message: `"${file.name}" could not be read (${e instanceof Error ? e.message : String(e)}); nothing was imported.`,
    };
  }
};
