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
 * {@link levelsFor} keeps the last inputs and levels per path table and, when asked again,
 * copies every row whose inputs are bit-for-bit the same and computes only the others:
 * editing one candidate costs O(candidates + receivers × 8) instead of
 * O(candidates × receivers × 8). Copied rows are exactly what a recomputation would give.
 */
import type { PathTable } from './path-table.ts';

/** Number of octave bands per candidate and per path, 63 Hz … 8 kHz. */
const B = 8;

/** Inputs of the kernel, one entry (or 8 for the spectrum) per candidate. */
export interface KernelInputs {
  /** Duty index of each candidate in the path table; −1 when its duty does not exist (row NaN). */
  dutyOf: Int32Array;
  /** base[c], dB: rated LWA + duty terms + character penalty. */
  baseDb: Float64Array;
  /** s[c, b] at [c * 8 + b]; used where withBands[c] is 1. */
  spectrum: Float64Array;
  /** 1 when the candidate has octave-band sound power (and the table has band transmissions). */
  withBands: Uint8Array;
}

/** Writes row c of the levels (nr receivers from `out`). O(receivers × 8). */
function computeRow(table: PathTable, nr: number, c: number, inputs: KernelInputs, levels: Float64Array): void {
  const u = inputs.dutyOf[c] as number;
  const base = inputs.baseDb[c] as number;
  const out = c * nr;
  if (u < 0) {
    levels.fill(NaN, out, out + nr);
    return;
  }
  const broad = table.broadbandDb;
  const row = u * nr;
  const tau = table.bandTransmission;
  if (inputs.withBands[c] && tau) {
    const hasBands = table.hasBands;
    const recv = table.receiverDb;
    const spectrum = inputs.spectrum;
    const s = c * B;
    const s0 = spectrum[s] as number, s1 = spectrum[s + 1] as number, s2 = spectrum[s + 2] as number, s3 = spectrum[s + 3] as number;
    const s4 = spectrum[s + 4] as number, s5 = spectrum[s + 5] as number, s6 = spectrum[s + 6] as number, s7 = spectrum[s + 7] as number;
    for (let r = 0, i = row, t = row * B; r < nr; r++, i++, t += B) {
      if (hasBands[i]) {
        const energy = s0 * (tau[t] as number) + s1 * (tau[t + 1] as number) + s2 * (tau[t + 2] as number) + s3 * (tau[t + 3] as number)
          + s4 * (tau[t + 4] as number) + s5 * (tau[t + 5] as number) + s6 * (tau[t + 6] as number) + s7 * (tau[t + 7] as number);
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
 * The contribution kernel over every candidate: levels[c * receivers + r], dB.
 * O(candidates × receivers × 8), no allocation but the result.
 */
export function computeLevels(table: PathTable, dutyOf: Int32Array, baseDb: Float64Array, spectrum: Float64Array, withBands: Uint8Array): Float64Array {
  const nr = table.receiverIds.length;
  const nc = dutyOf.length;
  const levels = new Float64Array(nc * nr);
  const inputs: KernelInputs = { dutyOf, baseDb, spectrum, withBands };
  for (let c = 0; c < nc; c++) computeRow(table, nr, c, inputs, levels);
  return levels;
}

/** Same number, −0 told from 0 and NaN equal to NaN (Object.is, written out for speed). */
function same(a: number, b: number): boolean {
  return a === b ? a !== 0 || 1 / a === 1 / b : a !== a && b !== b;
}

/** Whether row c of two input sets gives the same levels. O(8). */
function sameRow(a: KernelInputs, b: KernelInputs, c: number): boolean {
  if (a.dutyOf[c] !== b.dutyOf[c] || a.withBands[c] !== b.withBands[c] || !same(a.baseDb[c] as number, b.baseDb[c] as number)) return false;
  if (!a.withBands[c]) return true;
  for (let k = c * B, end = k + B; k < end; k++) if (!same(a.spectrum[k] as number, b.spectrum[k] as number)) return false;
  return true;
}

/** The last inputs and levels computed on each path table (a table is rebuilt when the geometry changes). */
const lastByTable = new WeakMap<PathTable, { inputs: KernelInputs; levels: Float64Array }>();

/**
 * The kernel's levels for these inputs, reusing the rows of the previous call on the same
 * path table whose inputs are unchanged (rows are matched by position). Returns a new
 * array every time; earlier results are never written to.
 * O(candidates × 8) to compare, O(receivers × 8) per changed row, plus a copy of the
 * unchanged rows; O(candidates × receivers × 8) on a table's first call.
 */
export function levelsFor(table: PathTable, inputs: KernelInputs): Float64Array {
  const nr = table.receiverIds.length;
  const nc = inputs.dutyOf.length;
  const last = lastByTable.get(table);
  let levels: Float64Array;
  if (!last) {
    levels = computeLevels(table, inputs.dutyOf, inputs.baseDb, inputs.spectrum, inputs.withBands);
  } else {
    levels = new Float64Array(nc * nr);
    const shared = Math.min(nc, last.inputs.dutyOf.length);
    let c = 0;
    while (c < nc) {
      if (c < shared && sameRow(inputs, last.inputs, c)) {
        // Copy the longest run of unchanged rows at once.
        let end = c + 1;
        while (end < shared && sameRow(inputs, last.inputs, end)) end++;
        levels.set(last.levels.subarray(c * nr, end * nr), c * nr);
        c = end;
      } else {
        computeRow(table, nr, c, inputs, levels);
        c++;
      }
    }
  }
  lastByTable.set(table, { inputs, levels });
  return levels;
}
