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
 * Size O(duties × receivers × 8); building it costs that many path evaluations.
 */
import type { Duty, Project, Receiver, Screening } from './model.ts';
import { REFERENCE_RECEIVER_ID } from './model.ts';
import type { Term } from './results.ts';
import { pathGeometry, sourceHeightOf } from './geometry.ts';
import { pointSourceSpreadingDb } from '../core/point-source.ts';
import { FACADE_CORRECTION_DB, screeningReductionDb } from '../core/corrections.ts';
import { broadbandPathAttenuation, octaveBandPathAttenuation } from '../core/standards/iso9613-2-1996/index.ts';
import { ratioFromDb } from '../core/decibel.ts';

/** Number of octave bands, 63 Hz … 8 kHz. */
export const BAND_COUNT = 8;
/** Directivity of the reference receiver's spreading: hemisphere (source on hard ground). */
export const REFERENCE_Q = 2;

/** One (duty, receiver) pair of the table, with the terms for display. */
export interface PathEntry {
  distanceM: number;
  /** Terms of the broadband path (spreading, or A_div, A_atm, A_gr, A_bar, D_Ω). */
  pathTerms: Term[];
  /** Octave-band attenuation A per band, dB (ISO 9613-2 general method only). */
  bandAttenuationDb?: number[];
  /** Façade, screening and −C_met terms. */
  receiverTerms: Term[];
  /** Why the pair is not computable, when it is not. */
  problem?: string;
}

export interface PathTable {
  /** Receiver ids in project order, then the reference receiver. */
  receiverIds: string[];
  dutyIds: string[];
  /** entries[duty * receivers + receiver] */
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

const sumTerms = (terms: readonly Term[]) => terms.reduce((s, t) => s + t.db, 0);

function screeningTerm(screening: Screening | undefined): Term | undefined {
  if (!screening || screening.kind === 'none' || screening.kind === 'barrier') return undefined;
  const labels: Record<string, string> = {
    'top-visible': 'Screening, top of machine just visible',
    hidden: 'Screening, machine fully hidden',
    explicit: 'Screening, stated reduction',
  };
  return { key: 'screening', label: labels[screening.kind] ?? 'Screening', db: -screeningReductionDb(screening) };
}

function referenceEntry(distanceM: number): PathEntry {
  try {
    const db = pointSourceSpreadingDb(distanceM, REFERENCE_Q);
    return {
      distanceM,
      pathTerms: [{ key: 'spreading', label: `Spreading 10·lg(Q/(4πr²)), reference receiver r = ${distanceM} m, Q = ${REFERENCE_Q}`, db }],
      receiverTerms: [],
    };
  } catch (e) {
    return { distanceM, pathTerms: [], receiverTerms: [], problem: `reference receiver: ${(e as Error).message}` };
  }
}

function pairEntry(project: Project, duty: Duty, receiver: Receiver): PathEntry {
  const prop = project.propagation;
  const hs = sourceHeightOf(duty, prop);
  const geo = pathGeometry(duty, receiver, hs);
  const entry: PathEntry = { distanceM: geo.distanceM, pathTerms: [], receiverTerms: [] };
  try {
    const screening = receiver.screening?.[duty.id];
    if (receiver.facade) entry.receiverTerms.push({ key: 'facade', label: 'Façade reflection (assessed 1 m in front of a façade)', db: FACADE_CORRECTION_DB });
    const screen = screeningTerm(screening);
    if (screen) entry.receiverTerms.push(screen);
    if (prop.method === 'simple') {
      if (screening?.kind === 'barrier') {
        entry.problem = 'a barrier path difference needs the ISO 9613-2:1996 method (use top-visible, hidden or an explicit reduction with the simple method)';
        return entry;
      }
      const db = pointSourceSpreadingDb(geo.distanceM, prop.q);
      entry.pathTerms.push({ key: 'spreading', label: `Spreading 10·lg(Q/(4πr²)), r = ${geo.distanceM.toFixed(1)} m, Q = ${prop.q}`, db });
      return entry;
    }
    const input = {
      distanceM: geo.distanceM,
      sourceHeightM: hs,
      receiverHeightM: receiver.heightM,
      groundFactor: prop.groundFactor,
      temperatureC: prop.temperatureC,
      humidityPct: prop.humidityPct,
      pressureKPa: prop.pressureKPa,
      ...(screening?.kind === 'barrier' ? { barrier: { pathDifferenceM: screening.pathDifferenceM } } : {}),
    };
    const broad = broadbandPathAttenuation(input);
    entry.pathTerms.push(
      { key: 'adiv', label: `Geometric divergence A_div, d = ${geo.distanceM.toFixed(1)} m (ISO 9613-2:1996 eq. 7)`, db: -broad.adiv },
      { key: 'aatm', label: 'Atmospheric absorption A_atm (ISO 9613-2:1996 eq. 8)', db: -broad.aatm },
      { key: 'agr', label: 'Ground attenuation A_gr, alternative method (ISO 9613-2:1996 eq. 10)', db: -broad.agr },
    );
    if (broad.abar !== 0) entry.pathTerms.push({ key: 'abar', label: 'Barrier attenuation A_bar (ISO 9613-2:1996 clause 7.4)', db: -broad.abar });
    if (broad.dOmega !== 0) entry.pathTerms.push({ key: 'dOmega', label: 'Directivity correction for ground reflection D_Ω (ISO 9613-2:1996 eq. 11)', db: broad.dOmega });
    if (prop.cmetDb !== 0) entry.receiverTerms.push({ key: 'cmet', label: 'Meteorological correction C_met (ISO 9613-2:1996 clause 8)', db: -prop.cmetDb });
    if (prop.groundMethod === 'general') {
      entry.bandAttenuationDb = octaveBandPathAttenuation(input).map((b) => b.total);
    }
  } catch (e) {
    entry.problem = (e as Error).message;
  }
  return entry;
}

/**
 * Builds the path table of a project. Never throws: a pair the core cannot compute holds
 * NaN and a `problem`.
 * O(duties × receivers × 8).
 */
export function buildPathTable(project: Project): PathTable {
  const receivers = project.receivers;
  const receiverIds = [...receivers.map((r) => r.id), REFERENCE_RECEIVER_ID];
  const nr = receiverIds.length;
  const duties = project.duties;
  const n = duties.length * nr;
  const entries: PathEntry[] = new Array(n);
  const broadbandDb = new Float64Array(n);
  const receiverDb = new Float64Array(n);
  const hasBands = new Uint8Array(n);
  const general = project.propagation.method === 'iso9613-2:1996' && project.propagation.groundMethod === 'general';
  const bandTransmission = general ? new Float64Array(n * BAND_COUNT) : undefined;
  const reference = referenceEntry(project.settings.referenceDistanceM);
  duties.forEach((duty, u) => {
    for (let r = 0; r < nr; r++) {
      const i = u * nr + r;
      const receiver = receivers[r];
      const entry = receiver ? pairEntry(project, duty, receiver) : reference;
      entries[i] = entry;
      const recv = sumTerms(entry.receiverTerms);
      receiverDb[i] = entry.problem ? NaN : recv;
      broadbandDb[i] = entry.problem ? NaN : sumTerms(entry.pathTerms) + recv;
      if (bandTransmission && entry.bandAttenuationDb) {
        hasBands[i] = 1;
        for (let b = 0; b < BAND_COUNT; b++) bandTransmission[i * BAND_COUNT + b] = ratioFromDb(-(entry.bandAttenuationDb[b] as number));
      }
    }
  });
  return { receiverIds, dutyIds: duties.map((d) => d.id), entries, broadbandDb, receiverDb, bandTransmission, hasBands };
}

/** Recently built tables by geometry key: re-evaluating after a change to candidates reuses the paths. */
const recent: { key: string; table: PathTable }[] = [];
const RECENT_TABLES = 4;

/**
 * The path table of a project, reused when the geometry is unchanged since a recent call
 * (same propagation, reference distance, receivers and duty locations). The key is the JSON
 * of those parts: O(duties + receivers) to build, against O(duties × receivers × 8) path
 * evaluations saved.
 */
export function pathTableFor(project: Project): PathTable {
  const key = JSON.stringify([
    project.propagation,
    project.settings?.referenceDistanceM,
    project.receivers.map((r) => [r.id, r.x, r.y, r.heightM, r.facade, r.screening]),
    project.duties.map((d) => [d.id, d.location, d.sourceHeightM]),
  ], (_k, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? String(v) : v));
  const hit = recent.findIndex((e) => e.key === key);
  if (hit >= 0) {
    const [entry] = recent.splice(hit, 1);
    recent.unshift(entry!);
    return entry!.table;
  }
  const table = buildPathTable(project);
  recent.unshift({ key, table });
  if (recent.length > RECENT_TABLES) recent.pop();
  return table;
}

const problemPairs = new WeakMap<PathTable, number[]>();

/**
 * Indices into `entries` of the pairs that are not computable (with a `problem`), in
 * order. Found once per table: O(duties × receivers) the first time, O(1) after.
 */
export function pairsWithProblems(table: PathTable): readonly number[] {
  let found = problemPairs.get(table);
  if (found === undefined) {
    found = [];
    for (let i = 0; i < table.entries.length; i++) if (table.entries[i]?.problem) found.push(i);
    problemPairs.set(table, found);
  }
  return found;
}
