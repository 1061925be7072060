/**
 * The path table: how much a path from a duty's location to a receiver changes the level,
 * computed once per (duty, receiver) pair and octave band — attenuation depends on the
 * path, not on the machine, so every candidate of a duty shares its duty's row.
 *
 * Per pair it holds:
 * - the A-weighted broadband path term, dB (signed; negative = attenuation):
 *   simple method 10·lg(Q/(4πr²)); ISO 9613-2:1996 −(A_div + A_atm + A_gr + A_bar) + D_Ω
 *   (alternative method, clause 7.3.2), used for candidates known only by LWA;
 * - for ISO 9613-2:1996 with the general ground method, the transmission of each octave
 *   band 10^(−A_b/10) (clause 7.3.1), used for candidates with octave-band sound power;
 * - the receiver-side terms: façade (+3 dB), rule-of-thumb or explicit screening, −C_met.
 * The reference receiver (id `@reference`) is the last column: hemispherical spreading
 * (Q = 2) at the project's reference distance whatever the method, no façade, no screening.
 *
 * Size O(duties × receivers × 8); building it costs that many path evaluations, done as
 * numbers only (./path-pair.ts). The entries with their labelled terms are written when
 * first read — one for a contribution's terms, all for a workbook — from copies of the
 * inputs taken at build time, so they match the numbers even if the project is changed
 * in place afterwards.
 */
import type { Duty, DutyLocation, Project, Propagation, Receiver } from './model.ts';
import { REFERENCE_RECEIVER_ID } from './model.ts';
import { fromEntry, pairEntry, pairNumbers, referenceEntry, type PathEntry, type PairOutput } from './path-pair.ts';
import { ratioFromDb } from '../core/decibel.ts';

export { REFERENCE_Q, type PathEntry } from './path-pair.ts';

/** Number of octave bands, 63 Hz … 8 kHz. */
export const BAND_COUNT = 8;

export interface PathTable {
  /** Receiver ids in project order, then the reference receiver. */
  receiverIds: string[];
  dutyIds: string[];
  /** entries[duty * receivers + receiver] (written on first read). */
  entries: PathEntry[];
  /** Broadband path + receiver terms, dB, [duty * receivers + receiver]; NaN when not computable. */
  broadbandDb: Float64Array;
  /** Receiver terms alone, dB, [duty * receivers + receiver]. */
  receiverDb: Float64Array;
  /** Octave-band transmission 10^(−A_b/10), [(duty * receivers + receiver) * 8 + band]; present with the ISO general method. */
  bandTransmission?: Float64Array;
  /** True where a pair has octave-band transmissions (ISO general method, real receivers). */
  hasBands: Uint8Array;
}

/** What a table knows beyond its public arrays: problems by pair and how to write an entry. */
interface TableParts {
  problems: Map<number, string>;
  entryAt(i: number): PathEntry;
  /** Octave-band A, dB, by pair and band (general method), for copying pairs into a new table. */
  bandAttenuationDb?: Float64Array;
}
const parts = new WeakMap<PathTable, TableParts>();

/** A copy of what a pair reads from a duty: id, location (with its distances), source height. */
function dutyCopy(d: Duty): Duty {
  const loc = d.location as DutyLocation | undefined;
  let location = loc;
  if (loc && typeof loc === 'object') {
    location = { ...loc };
    if (location.kind === 'distances' && location.distancesM && typeof location.distancesM === 'object') location.distancesM = { ...location.distancesM };
  }
  return { ...d, location: location as DutyLocation };
}

/** A copy of what a pair reads from a receiver: position, height, façade, screening by duty. */
function receiverCopy(r: Receiver): Receiver {
  const screening = r.screening && typeof r.screening === 'object' ? Object.fromEntries(Object.entries(r.screening).map(([k, s]) => [k, s && typeof s === 'object' ? { ...s } : s])) : r.screening;
  return { ...r, screening: screening as Receiver['screening'] };
}

/** Where pair (u, r) of a new table can be copied from an older one: that table and its index, or undefined. */
type Reuse = (u: number, r: number) => { table: PathTable; index: number } | undefined;

/**
 * Builds a table; pairs that `reuse` finds in an older table with the same inputs are
 * copied from it. O(duties × receivers) path evaluations less the copied ones.
 */
function build(project: Project, reuse?: Reuse): PathTable {
  const prop: Propagation = { ...project.propagation };
  const receivers = project.receivers.map(receiverCopy);
  const duties = project.duties.map(dutyCopy);
  const receiverIds = [...receivers.map((r) => r.id), REFERENCE_RECEIVER_ID];
  const nr = receiverIds.length;
  const n = duties.length * nr;
  const general = prop.method === 'iso9613-2:1996' && prop.groundMethod === 'general';
  const out: PairOutput = {
    broadbandDb: new Float64Array(n),
    receiverDb: new Float64Array(n),
    hasBands: new Uint8Array(n),
    ...(general ? { bandAttenuationDb: new Float64Array(n * BAND_COUNT) } : {}),
  };
  const bandTransmission = general ? new Float64Array(n * BAND_COUNT) : undefined;
  const problems = new Map<number, string>();
  const reference = referenceEntry(project.settings.referenceDistanceM);
  const copiedFrom = new Map<number, { table: PathTable; index: number }>();
  for (let u = 0; u < duties.length; u++) {
    for (let r = 0; r < nr; r++) {
      const i = u * nr + r;
      const receiver = receivers[r];
      const old = receiver ? reuse?.(u, r) : undefined;
      let problem: string | undefined;
      if (old) {
        problem = copyPair(old.table, old.index, out, bandTransmission, i);
        copiedFrom.set(i, old);
      } else {
        problem = receiver ? pairNumbers(prop, duties[u] as Duty, receiver, out, i) : fromEntry(reference, out, i);
        if (bandTransmission && out.hasBands[i]) {
          for (let b = 0, k = i * BAND_COUNT; b < BAND_COUNT; b++, k++) bandTransmission[k] = ratioFromDb(-(out.bandAttenuationDb![k] as number));
        }
      }
      if (problem) problems.set(i, problem);
    }
  }
  const written: (PathEntry | undefined)[] = new Array(n);
  const entryAt = (i: number): PathEntry => {
    let e = written[i];
    if (e === undefined) {
      const old = copiedFrom.get(i);
      const receiver = receivers[i % nr];
      e = old ? (parts.get(old.table) as TableParts).entryAt(old.index) : receiver ? pairEntry(prop, duties[Math.floor(i / nr)] as Duty, receiver) : reference;
      written[i] = e;
    }
    return e;
  };
  let all: PathEntry[] | undefined;
  const table: PathTable = {
    receiverIds,
    dutyIds: duties.map((d) => d.id),
    get entries(): PathEntry[] {
      if (all === undefined) {
        for (let i = 0; i < n; i++) entryAt(i);
        all = written as PathEntry[];
      }
      return all;
    },
    broadbandDb: out.broadbandDb,
    receiverDb: out.receiverDb,
    bandTransmission,
    hasBands: out.hasBands,
  };
  parts.set(table, { problems, entryAt, ...(out.bandAttenuationDb ? { bandAttenuationDb: out.bandAttenuationDb } : {}) });
  return table;
}

/** Copies pair `from` of an older table to pair i of the new one. Returns its problem. */
function copyPair(old: PathTable, from: number, out: PairOutput, bandTransmission: Float64Array | undefined, i: number): string | undefined {
  out.broadbandDb[i] = old.broadbandDb[from] as number;
  out.receiverDb[i] = old.receiverDb[from] as number;
  out.hasBands[i] = old.hasBands[from] as number;
  const oldBands = parts.get(old)?.bandAttenuationDb;
  if (bandTransmission && old.bandTransmission && oldBands && out.bandAttenuationDb) {
    bandTransmission.set(old.bandTransmission.subarray(from * BAND_COUNT, (from + 1) * BAND_COUNT), i * BAND_COUNT);
    out.bandAttenuationDb.set(oldBands.subarray(from * BAND_COUNT, (from + 1) * BAND_COUNT), i * BAND_COUNT);
  }
  return parts.get(old)?.problems.get(from);
}

/**
 * Builds the path table of a project. Never throws: a pair the core cannot compute holds
 * NaN and a `problem`.
 * O(duties × receivers × 8).
 */
export function buildPathTable(project: Project): PathTable {
  return build(project);
}

/** The entry of pair i (duty × receivers + receiver), written on first read. O(1) after. */
export function pathEntryAt(table: PathTable, i: number): PathEntry | undefined {
  const p = parts.get(table);
  return p ? (i >= 0 && i < table.broadbandDb.length ? p.entryAt(i) : undefined) : table.entries[i];
}

/** Why pair i is not computable, or undefined. O(1). */
export function pathProblemAt(table: PathTable, i: number): string | undefined {
  const p = parts.get(table);
  return p ? p.problems.get(i) : table.entries[i]?.problem;
}

/** Indices of the pairs that are not computable, in order. O(pairs with a problem · log). */
export function pairsWithProblems(table: PathTable): readonly number[] {
  const p = parts.get(table);
  if (p) return [...p.problems.keys()].sort((a, b) => a - b);
  const found: number[] = [];
  table.entries.forEach((e, i) => {
    if (e?.problem) found.push(i);
  });
  return found;
}
