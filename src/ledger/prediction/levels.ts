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
 * {@link levelRows} keeps the last inputs and rows per path table and, when asked again,
 * shares every row whose inputs are bit-for-bit the same and computes only the others:
 * editing one candidate costs O(candidates + receivers × 8) instead of
 * O(candidates × receivers × 8). A shared row is exactly what a recomputation would give.
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

/** Inputs of the kernel by candidate, for {@link levelRows}. */
export interface KernelInputs {
  /** Duty row of each candidate in the path table; −1 when its duty does not exist (row NaN). */
  dutyOf: Int32Array;
  /** base[c], dB: rated LWA + duty terms + character penalty. */
  baseDb: Float64Array;
  /** The eight spectrum shares of each candidate with octave bands (undefined: LWA only). */
  shares: (Float64Array | undefined)[];
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
  const sa = a.shares[c];
  const sb = b.shares[c];
  if (sa === sb) return true;
  if (sa === undefined || sb === undefined) return false;
  for (let k = 0; k < B; k++) if (!same(sa[k] as number, sb[k] as number)) return false;
  return true;
}

/** Levels by candidate: rows[c][r], dB. Each row is written once, when computed, and then only read. */
export type LevelRows = Float64Array[];

/** The last inputs and rows computed on each path table (a table is rebuilt when the geometry changes). */
const lastByTable = new WeakMap<PathTable, { inputs: KernelInputs; rows: LevelRows }>();

const NO_SHARES = new Float64Array(B);

/**
 * The kernel's levels for these inputs, one row per candidate, sharing every row of the
 * previous call on the same path table whose inputs are unchanged (rows are matched by
 * position; a row is never written after it is computed, so earlier results stay as they
 * were). On a table's first call, `copiedFrom` — the older table its rows were copied
 * from, same receivers in the same order, and the older row of each duty row — lets the
 * rows of candidates whose duty row was copied be shared from the older table's last call.
 * O(candidates × 8) to compare, plus O(receivers × 8) per changed row;
 * O(candidates × receivers × 8) when nothing can be shared, into one buffer.
 */
export function levelRows(
  table: PathTable,
  inputs: KernelInputs,
  copiedFrom?: { donor: PathTable; rowOf: Int32Array },
): LevelRows {
  const nr = table.receiverIds.length;
  const nc = inputs.dutyOf.length;
  const own = lastByTable.get(table);
  const fromDonor = own === undefined && copiedFrom !== undefined ? lastByTable.get(copiedFrom.donor) : undefined;
  const last = own ?? fromDonor;
  const rowOf = fromDonor ? copiedFrom!.rowOf : undefined;
  const shared = last ? Math.min(nc, last.inputs.dutyOf.length) : 0;
  const rows: LevelRows = new Array(nc);
  const buffer = last ? undefined : new Float64Array(nc * nr);
  for (let c = 0; c < nc; c++) {
    if (c < shared && sameRow(inputs, last!.inputs, c, rowOf)) {
      rows[c] = last!.rows[c] as Float64Array;
      continue;
    }
    const row = buffer ? buffer.subarray(c * nr, (c + 1) * nr) : new Float64Array(nr);
    const s = inputs.shares[c];
    computeRow(
      table,
      nr,
      inputs.dutyOf[c] as number,
      inputs.baseDb[c] as number,
      s !== undefined,
      s ?? NO_SHARES,
      0,
      row,
      0,
    );
    rows[c] = row;
  }
  lastByTable.set(table, { inputs, rows });
  return rows;
}
