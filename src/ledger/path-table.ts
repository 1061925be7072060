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
  if (!d || typeof d !== 'object') return d;
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
  if (!r || typeof r !== 'object') return r;
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
  for (let u = 0; u < duties.length; u++) {
    for (let r = 0; r < nr; r++) {
      const i = u * nr + r;
      const receiver = receivers[r];
      const old = receiver ? reuse?.(u, r) : undefined;
      let problem: string | undefined;
      if (old) {
        problem = copyPair(old.table, old.index, out, bandTransmission, i);
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
      // A copied pair is written from this table's own inputs: they are the ones it was copied for.
      const receiver = receivers[i % nr];
      e = receiver ? pairEntry(prop, duties[Math.floor(i / nr)] as Duty, receiver) : reference;
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

/** Indices of the pairs that are not computable, in order. O(pairs with a problem). */
export function pairsWithProblems(table: PathTable): readonly number[] {
  const p = parts.get(table);
  if (p) return [...p.problems.keys()]; // added in index order
  const found: number[] = [];
  table.entries.forEach((e, i) => {
    if (e?.problem) found.push(i);
  });
  return found;
}

/** JSON text of a key part; non-finite numbers written as text so NaN and null differ. */
const keyText = (value: unknown) => JSON.stringify(value, (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? String(v) : v));

/** Recently built tables with the key parts they were built for. */
interface Recent {
  key: string;
  /** Propagation and reference distance: pairs can be copied only between tables that share it. */
  context: string;
  receiverKeys: string[];
  dutyKeys: string[];
  table: PathTable;
}
const recent: Recent[] = [];
const RECENT_TABLES = 4;

/** Index of each key's first occurrence. O(keys). */
function firstIndex(keys: readonly string[]): Map<string, number> {
  const m = new Map<string, number>();
  keys.forEach((k, i) => {
    if (!m.has(k)) m.set(k, i);
  });
  return m;
}

/**
 * The path table of a project, reused when the geometry is unchanged since a recent call
 * (same propagation, reference distance, receivers and duty locations): the key is the
 * JSON of those parts, O(duties + receivers) to build, against O(duties × receivers × 8)
 * path evaluations saved. When the geometry changed, every pair whose duty, receiver,
 * propagation and reference distance are as in a recent table is copied from it: moving
 * one duty recomputes one row, O(receivers × 8); moving a receiver, one column.
 */
export function pathTableFor(project: Project): PathTable {
  const context = keyText([project.propagation, project.settings?.referenceDistanceM]);
  const receiverKeys = project.receivers.map((r) => keyText([r.id, r.x, r.y, r.heightM, r.facade, r.screening]));
  const dutyKeys = project.duties.map((d) => keyText([d.id, d.location, d.sourceHeightM]));
  // JSON text never holds a raw U+0000 or U+0001, so the parts cannot run into each other.
  const key = `${context}\u0000${receiverKeys.join('\u0001')}\u0000${dutyKeys.join('\u0001')}`;
  const hit = recent.findIndex((e) => e.key === key);
  if (hit >= 0) {
    const [entry] = recent.splice(hit, 1);
    recent.unshift(entry!);
    return entry!.table;
  }
  const donor = recent.find((e) => e.context === context);
  let reuse: Reuse | undefined;
  if (donor) {
    const oldReceivers = firstIndex(donor.receiverKeys);
    const oldDuties = firstIndex(donor.dutyKeys);
    const oldNr = donor.table.receiverIds.length;
    const rowOf = dutyKeys.map((k) => oldDuties.get(k) ?? -1);
    const columnOf = receiverKeys.map((k) => oldReceivers.get(k) ?? -1);
    reuse = (u, r) => {
      const ou = rowOf[u] as number;
      const or = columnOf[r] as number;
      return ou < 0 || or < 0 ? undefined : { table: donor.table, index: ou * oldNr + or };
    };
  }
  const table = build(project, reuse);
  recent.unshift({ key, context, receiverKeys, dutyKeys, table });
  if (recent.length > RECENT_TABLES) recent.pop();
  return table;
}
