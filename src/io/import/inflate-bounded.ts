/**
 * Expanding one deflated ZIP entry with a hard ceiling on the output, so an entry that
 * expands past what its directory record declares (a crafted or damaged workbook) is
 * stopped at the ceiling instead of filling memory. The input is fed in small slices so
 * that even the most compressible data (deflate expands at most about 1,032 : 1) yields
 * at most a few MB per step before the count is checked.
 * Uses the platform's DecompressionStream('deflate-raw') (browsers, workers, Node ≥ 20).
 */

/** Compressed bytes fed per step. 4 kB expands to at most about 4 MB. */
const SLICE_BYTES = 4096;

/** The output passed the ceiling. */
export class InflateCeilingError extends Error {
  constructor(readonly ceilingBytes: number) {
    super(`expands past ${ceilingBytes} bytes`);
    this.name = 'InflateCeilingError';
  }
}

/** The data is not valid deflate. */
export class InflateDataError extends Error {
  constructor(cause: unknown) {
    super(cause instanceof Error ? cause.message : String(cause));
    this.name = 'InflateDataError';
  }
}

/**
 * Expands raw deflate data, handing each output chunk to `onChunk`, and returns the
 * number of bytes produced. Throws InflateCeilingError as soon as the output passes
 * `ceilingBytes`, InflateDataError when the data is not valid deflate. O(output).
 */
export async function inflateBounded(
  data: Uint8Array,
  ceilingBytes: number,
  onChunk?: (chunk: Uint8Array) => void,
): Promise<number> {
  const stream = new DecompressionStream('deflate-raw');
  const writer = stream.writable.getWriter();
  const reader = stream.readable.getReader();
  const feeding = (async () => {
    for (let at = 0; at < data.length; at += SLICE_BYTES) {
      await writer.write(data.subarray(at, at + SLICE_BYTES) as Uint8Array<ArrayBuffer>);
    }
    await writer.close();
  })();
  feeding.catch(() => undefined);
  let total = 0;
  try {
    for (;;) {
      let step: { done: boolean; value?: Uint8Array };
      try {
        step = (await reader.read()) as { done: boolean; value?: Uint8Array };
      } catch (e) {
        throw new InflateDataError(e);
      }
      if (step.done || !step.value) break;
      total += step.value.byteLength;
      if (total > ceilingBytes) throw new InflateCeilingError(ceilingBytes);
      onChunk?.(step.value);
    }
    try {
      await feeding;
    } catch (e) {
      throw new InflateDataError(e);
    }
    return total;
  } catch (e) {
    reader.cancel().catch(() => undefined);
    writer.abort().catch(() => undefined);
    throw e;
  }
}
