/**
 * The contribution kernel: every candidate's level at every receiver from the path table.
 *
 *   L[c, r] = base[c] + path[u(c), r]                                  (LWA only)
 *   L[c, r] = base[c] + 10·lg Σ_b s[c, b]·τ[u(c), r, b] + recv[u(c), r]  (octave bands)
 *
 * base[c] the rated LWA with the duty's and the character terms, s[c, b] the A-weighted
 * spectrum shares (Σ s = 1), τ the band transmissions 10^(−A_b/10) and recv the
 * receiver-side terms of the pair (ISO 9613-2:1996 general method, see ./path-table.ts).
 *
 * A row L[c, ·] depends only on (u(c), base[c], s[c, ·]) and the path table, so
 * {@link levelGrid} keeps the last inputs and levels per path table and, when asked again,
 * copies every row whose inputs are bit-for-bit the same and computes only the others:
 * editing one candidate costs O(candidates × receivers) copied (a memory copy) + O(receivers × 8)
 * instead of O(candidates × receivers × 8). A copied row is exactly what a recomputation would give.
 * Everything sits in flat typed arrays (no object per candidate): at 100,000 candidates a
 * per-candidate array costs more in allocation and garbage collection than the arithmetic.
 */
import type { PathTable } from './path-table.ts';

/** Number of octave bands per candidate and per path, 63 Hz … 8 kHz. */
const B = 8;

/**
 * Writes the levels of one candidate at the nr receivers into `levels` from index `out`:
 * duty row u (−1: the duty does not exist, all NaN), base level, and the spectrum shares
 * at `spectrum[s … s + 7]` when `bands` is true. O(receivers × 8).
 */
function computeRow(
  table: PathTable,
  nr: number,
  u: number,
  base: number,
  bands: boolean,
  spectrum: Float64Array,
  s: number,
  levels: Float64Array,
  out: number,
): void {
  if (u < 0) {
    levels.fill(NaN, out, out + nr);
    return;
  }
  const broad = table.broadbandDb;
  const row = u * nr;
  const tau = table.bandTransmission;
  if (bands && tau) {
    const hasBands = table.hasBands;
    const recv = table.receiverDb;
    const s0 = spectrum[s] as number,
      s1 = spectrum[s + 1] as number,
      s2 = spectrum[s + 2] as number,
      s3 = spectrum[s + 3] as number;
    const s4 = spectrum[s + 4] as number,
      s5 = spectrum[s + 5] as number,
      s6 = spectrum[s + 6] as number,
      s7 = spectrum[s + 7] as number;
    for (let r = 0, i = row, t = row * B; r < nr; r++, i++, t += B) {
      if (hasBands[i]) {
        const energy =
          s0 * (tau[t] as number) +
          s1 * (tau[t + 1] as number) +
          s2 * (tau[t + 2] as number) +
          s3 * (tau[t + 3] as number) +
          s4 * (tau[t + 4] as number) +
          s5 * (tau[t + 5] as number) +
          s6 * (tau[t + 6] as number) +
          s7 * (tau[t + 7] as number);
        // 10·lg of the energy, as dbFromRatio in ../core/decibel.ts writes it (inlined: this line runs candidates × receivers times).
        levels[out + r] = base + 10 * Math.log10(energy) + (recv[i] as number);
      } else {
        levels[out + r] = base + (broad[i] as number);
      }
    }
  } else {
    for (let r = 0; r < nr; r++) levels[out + r] = base + (broad[row + r] as number);
  }
}

/**
 * The contribution kernel over every candidate: levels[c * receivers + r], dB, from each
 * candidate's duty row (dutyOf, −1 for none), base level, and spectrum shares at
 * spectrum[c * 8 …] where withBands[c] is 1. O(candidates × receivers × 8), no allocation
 * but the result.
 */
export function computeLevels(
  table: PathTable,
  dutyOf: Int32Array,
  baseDb: Float64Array,
  spectrum: Float64Array,
  withBands: Uint8Array,
): Float64Array {
  const nr = table.receiverIds.length;
  const nc = dutyOf.length;
  const levels = new Float64Array(nc * nr);
  for (let c = 0; c < nc; c++)
    computeRow(
      table,
      nr,
      dutyOf[c] as number,
      baseDb[c] as number,
      withBands[c] === 1,
      spectrum,
      c * B,
      levels,
      c * nr,
    );
  return levels;
}

/** Inputs of the kernel by candidate, for {@link levelGrid}. */
export interface KernelInputs {
  /** Duty row of each candidate in the path table; −1 when its duty does not exist (row NaN). */
  dutyOf: Int32Array;
  /** base[c], dB: rated LWA + duty terms + character penalty. */
  baseDb: Float64Array;
  /** The eight spectrum shares of candidate c at spectrum[c * 8 …], read where withBands[c] is 1. */
  spectrum: Float64Array;
  /** 1 where the candidate has usable octave bands, 0 where it is known by its LWA only. */
  withBands: Uint8Array;
}

/** Same number, −0 told from 0 and NaN equal to NaN (Object.is, written out for speed). */
function same(a: number, b: number): boolean {
  return a === b ? a !== 0 || 1 / a === 1 / b : a !== a && b !== b;
}

/**
 * Whether candidate c of `a` and of `b` get the same levels: same duty row (through
 * `rowOf` when `b` was computed on the table `a`'s rows were copied from), base and shares. O(8).
 */
function sameRow(a: KernelInputs, b: KernelInputs, c: number, rowOf: Int32Array | undefined): boolean {
  const u = a.dutyOf[c] as number;
  const bu = b.dutyOf[c] as number;
  if (rowOf === undefined || u < 0 ? u !== bu : rowOf[u] !== bu || bu < 0) return false;
  if (!same(a.baseDb[c] as number, b.baseDb[c] as number)) return false;
  const wa = a.withBands[c];
  if (wa !== b.withBands[c]) return false;
  if (wa === 0) return true;
  for (let k = c * B, end = k + B; k < end; k++)
    if (!same(a.spectrum[k] as number, b.spectrum[k] as number)) return false;
  return true;
}

/** The last inputs and levels computed on each path table (a table is rebuilt when the geometry changes). */
const lastByTable = new WeakMap<PathTable, { inputs: KernelInputs; levels: Float64Array }>();

/**
 * The kernel's levels for these inputs, levels[c * receivers + r], dB, in one buffer: a new buffer on every call,
 * never written after it is returned, so earlier results stay as they were. The rows of candidates whose inputs are
 * bit-for-bit those of the previous call on the same path table are copied from its buffer (runs of unchanged rows in
 * one copy each) and only the others computed. On a table's first call, `copiedFrom` — the older table its rows were
 * copied from, same receivers in the same order, and the older row of each duty row — lets the rows of candidates
 * whose duty row was copied be taken from the older table's last call.
 * O(candidates × 8) to compare and O(candidates × receivers) to copy, plus O(receivers × 8) per changed row;
 * O(candidates × receivers × 8) when nothing can be shared. No allocation but the result.
 */
export function levelGrid(
  table: PathTable,
  inputs: KernelInputs,
  copiedFrom?: { donor: PathTable; rowOf: Int32Array },
): Float64Array {
  const nr = table.receiverIds.length;
  const nc = inputs.dutyOf.length;
  const own = lastByTable.get(table);
  const fromDonor = own === undefined && copiedFrom !== undefined ? lastByTable.get(copiedFrom.donor) : undefined;
  const last = own ?? fromDonor;
  const rowOf = fromDonor ? copiedFrom!.rowOf : undefined;
  const shared =
    last && last.levels.length === last.inputs.dutyOf.length * nr ? Math.min(nc, last.inputs.dutyOf.length) : 0;
  const levels = new Float64Array(nc * nr);
  let runStart = -1; // first row of the current run of rows copied from the last call
  for (let c = 0; c < nc; c++) {
    if (c < shared && sameRow(inputs, last!.inputs, c, rowOf)) {
      if (runStart < 0) runStart = c;
      continue;
    }
    if (runStart >= 0) {
      levels.set(last!.levels.subarray(runStart * nr, c * nr), runStart * nr);
      runStart = -1;
    }
    computeRow(
      table,
      nr,
      inputs.dutyOf[c] as number,
      inputs.baseDb[c] as number,
      inputs.withBands[c] === 1,
      inputs.spectrum,
      c * B,
      levels,
      c * nr,
    );
  }
  if (runStart >= 0) levels.set(last!.levels.subarray(runStart * nr, nc * nr), runStart * nr);
  lastByTable.set(table, { inputs, levels });
  return levels;
}
