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
import type { Barrier, Duty, Project, Propagation, SitePoint } from '../model/model.ts';
import { REFERENCE_RECEIVER_ID } from '../model/model.ts';
import {
  dutyCopy,
  fromEntry,
  pairEntry,
  pairNumbers,
  receiverCopy,
  referenceEntry,
  type PathEntry,
  type PairOutput,
} from './path-pair.ts';
import { ratioFromDb } from '../../core/decibel.ts';

export { REFERENCE_Q, type PathEntry } from './path-pair.ts';

/** A copy of the barriers a table reads (points and heights), so a later change in place does not reach it. */
function barriersCopy(barriers: readonly Barrier[] | undefined): Barrier[] | undefined {
  if (!Array.isArray(barriers)) return undefined;
  return barriers.map((b) =>
    b && typeof b === 'object'
      ? { ...b, points: Array.isArray(b.points) ? b.points.map((p: SitePoint) => ({ ...p })) : b.points }
      : b,
  );
}

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
  /** The older table pairs were copied from, if any. */
  reuse?: Reuse;
}
const parts = new WeakMap<PathTable, TableParts>();

/**
 * Pairs of a new table that can be copied from an older one built with the same
 * propagation and reference distance: for each duty, the older table's row with the same
 * duty inputs (−1: none), and likewise for each receiver's column.
 */
interface Reuse {
  donor: PathTable;
  rowOf: Int32Array;
  columnOf: Int32Array;
}

/**
 * Builds a table; pairs that `reuse` finds in an older table with the same inputs are
 * copied from it. O(duties × receivers) path evaluations less the copied ones.
 */
function build(project: Project, reuseFrom?: Reuse): PathTable {
  let reuse = reuseFrom;
  const prop: Propagation = { ...project.propagation };
  const barriers = barriersCopy(project.barriers);
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
    ...(general ? { bandAttenuationDb: new Float64Array(BAND_COUNT) } : {}),
  };
  const bandTransmission = general ? new Float64Array(n * BAND_COUNT) : undefined;
  const problems = new Map<number, string>();
  const donorParts = reuse ? parts.get(reuse.donor) : undefined;
  if (reuse && !donorParts) reuse = undefined;
  const donorNr = reuse ? reuse.donor.receiverIds.length : 0;
  const reference = referenceEntry(project.settings.referenceDistanceM);
  const sameColumns = reuse !== undefined && donorNr === nr && reuse.columnOf.every((c, r) => c === r);
  for (let u = 0; u < duties.length; u++) {
    const ou = reuse ? (reuse.rowOf[u] as number) : -1;
    if (ou >= 0 && sameColumns) {
      copyRow(reuse!.donor, donorParts!, ou, out, bandTransmission, u, nr, problems);
      continue;
    }
    for (let r = 0; r < nr; r++) {
      const i = u * nr + r;
      const receiver = receivers[r];
      const or = ou >= 0 && receiver ? (reuse!.columnOf[r] as number) : -1;
      let problem: string | undefined;
      if (or >= 0) {
        problem = copyPair(reuse!.donor, donorParts!, ou * donorNr + or, out, bandTransmission, i);
      } else {
        problem = receiver
          ? pairNumbers(prop, duties[u] as Duty, receiver, out, i, barriers)
          : fromEntry(reference, out, i);
        if (bandTransmission && out.hasBands[i]) {
          for (let b = 0, k = i * BAND_COUNT; b < BAND_COUNT; b++, k++)
            bandTransmission[k] = ratioFromDb(-(out.bandAttenuationDb![b] as number));
        }
      }
      if (problem) problems.set(i, problem);
    }
  }
  let written: (PathEntry | undefined)[] | undefined;
  const entryAt = (i: number): PathEntry => {
    written ??= new Array(n);
    let e = written[i];
    if (e === undefined) {
      // A copied pair is written from this table's own inputs: they are the ones it was copied for.
      const receiver = receivers[i % nr];
      e = receiver ? pairEntry(prop, duties[Math.floor(i / nr)] as Duty, receiver, barriers) : reference;
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
  parts.set(table, { problems, entryAt, ...(reuse ? { reuse } : {}) });
  return table;
}

/** Copies pair `from` of an older table (with its parts) to pair i of the new one. Returns its problem. O(8). */
function copyPair(
  old: PathTable,
  oldParts: TableParts,
  from: number,
  out: PairOutput,
  bandTransmission: Float64Array | undefined,
  i: number,
): string | undefined {
  out.broadbandDb[i] = old.broadbandDb[from] as number;
  out.receiverDb[i] = old.receiverDb[from] as number;
  out.hasBands[i] = old.hasBands[from] as number;
  const oldTau = old.bandTransmission;
  if (bandTransmission && oldTau) {
    for (let b = 0, k = i * BAND_COUNT, l = from * BAND_COUNT; b < BAND_COUNT; b++, k++, l++)
      bandTransmission[k] = oldTau[l] as number;
  }
  return oldParts.problems.get(from);
}

/** Copies row `from` of an older table with the same receivers, in order, to row u of the new one. O(receivers × 8). */
function copyRow(
  old: PathTable,
  oldParts: TableParts,
  from: number,
  out: PairOutput,
  bandTransmission: Float64Array | undefined,
  u: number,
  nr: number,
  problems: Map<number, string>,
): void {
  const a = from * nr;
  const i = u * nr;
  out.broadbandDb.set(old.broadbandDb.subarray(a, a + nr), i);
  out.receiverDb.set(old.receiverDb.subarray(a, a + nr), i);
  out.hasBands.set(old.hasBands.subarray(a, a + nr), i);
  if (bandTransmission && old.bandTransmission)
    bandTransmission.set(old.bandTransmission.subarray(a * BAND_COUNT, (a + nr) * BAND_COUNT), i * BAND_COUNT);
  for (let r = 0; r < nr; r++) {
    const problem = oldParts.problems.get(a + r);
    if (problem) problems.set(i + r, problem);
  }
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
const keyText = (value: unknown) =>
  JSON.stringify(value, (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? String(v) : v));

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
 * (same propagation, reference distance, barriers, receivers and duty locations): the key is the
 * JSON of those parts, O(duties + receivers) to build, against O(duties × receivers × 8)
 * path evaluations saved. When the geometry changed, every pair whose duty, receiver,
 * propagation and reference distance are as in a recent table is copied from it: moving
 * one duty recomputes one row, O(receivers × 8); moving a receiver, one column.
 */
export function pathTableFor(project: Project): PathTable {
  const context = keyText([project.propagation, project.settings?.referenceDistanceM, project.barriers ?? []]);
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
    reuse = {
      donor: donor.table,
      rowOf: Int32Array.from(dutyKeys, (k) => oldDuties.get(k) ?? -1),
      columnOf: Int32Array.from(receiverKeys, (k) => oldReceivers.get(k) ?? -1),
    };
  }
  const table = build(project, reuse);
  recent.unshift({ key, context, receiverKeys, dutyKeys, table });
  if (recent.length > RECENT_TABLES) recent.pop();
  return table;
}

/**
 * The older table a table's pairs were copied from, handed over once (then forgotten, so
 * that a chain of edits does not keep every older table alive): the donor, for each duty
 * row the donor's row it equals (−1: recomputed), and whether the receivers are the
 * donor's, in the same order (then a copied row is the donor's row, reference column
 * included). Lets the kernel share the levels of candidates whose duty did not move. O(receivers).
 */
export function takeDonor(table: PathTable): { donor: PathTable; rowOf: Int32Array; sameColumns: boolean } | undefined {
  const p = parts.get(table);
  const reuse = p?.reuse;
  if (!p || !reuse) return undefined;
  p.reuse = undefined;
  let sameColumns = reuse.columnOf.length === reuse.donor.receiverIds.length - 1;
  for (let r = 0; sameColumns && r < reuse.columnOf.length; r++) sameColumns = reuse.columnOf[r] === r;
  return { donor: reuse.donor, rowOf: reuse.rowOf, sameColumns };
}
