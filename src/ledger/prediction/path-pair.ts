/**
 * One path of the path table (./path-table.ts): from a duty's location to a receiver.
 *
 * The ledger's side of the prediction engine (../../core/path-prediction.ts): {@link pathSpecOf}
 * turns a duty, a receiver, the project's propagation and the plan's barriers into the
 * engine's path — distance from the geometry (./geometry.ts), source height, the screening
 * typed for the pair or the barrier on the plan that cuts the line of sight
 * (./path-screening.ts), façade. The engine computes it once: {@link pairNumbers} writes its
 * sums into the table's arrays (a table holds tens of thousands of paths and shows a few);
 * {@link pairEntry} labels the same numbers for display and audit, adding the barrier's name
 * and geometry. Each is O(8) core evaluations.
 */
import type { Barrier, Duty, DutyLocation, Propagation, Receiver, SitePoint } from '../model/model.ts';
import type { Term } from '../model/results.ts';
import { pathGeometry, sourceHeightOf } from './geometry.ts';
import { own } from '../model/own.ts';
import {
  pathNumbers,
  pathTerms,
  type PathScreening as EngineScreening,
  type PathSpec,
} from '../../core/path-prediction.ts';
import { pathScreening, type PathScreening } from './path-screening.ts';
import type { ScreeningBarrier } from './barrier-screening.ts';
import { barrierWords } from './plan-barrier-term.ts';

/** Directivity of the reference receiver's spreading: hemisphere (source on hard ground). */
export const REFERENCE_Q = 2;

/** One (duty, receiver) pair of the table, with the terms for display. */
export interface PathEntry {
  distanceM: number;
  /** Terms of the broadband path (spreading, or A_div, A_atm, A_gr, A_bar, D_Ω). */
  pathTerms: Term[];
  /** Octave-band attenuation A per band, dB (ISO 9613-2 general method only). */
  bandAttenuationDb?: number[];
  /** Façade, screening (simple method) and −C_met terms. */
  receiverTerms: Term[];
  /** ISO 9613-2:1996: the accuracy its Table 5 states for the path, or why none is stated, and warnings on the method. */
  notes?: string[];
  /** ISO 9613-2:1996: D_z of a screened path at 500 Hz, dB (a barrier's eq. 14, or the rule of thumb or stated reduction). */
  dz?: number;
  /** Why the pair is not computable, when it is not. */
  problem?: string;
  /** The barrier on the plan that screens the pair (none when a screening is typed for it). */
  barrier?: ScreeningBarrier;
  /** The source point on the site grid (a duty placed on the grid; for a line or area the point chosen for this receiver). */
  sourceAt?: SitePoint;
}

const sumTerms = (terms: readonly Term[]) => terms.reduce((s, t) => s + t.db, 0);

/** The reference receiver's path: hemispherical spreading (Q = 2) at the reference distance, nothing else. */
export function referenceEntry(distanceM: number): PathEntry {
  try {
    const n = pathNumbers({ distanceM, method: 'simple', q: REFERENCE_Q });
    const [spreading] = pathTerms(n).pathTerms;
    return {
      distanceM,
      pathTerms: [{ ...(spreading as Term), label: `${spreading?.label ?? ''} (reference receiver)` }],
      receiverTerms: [],
    };
  } catch (e) {
    return { distanceM, pathTerms: [], receiverTerms: [], problem: `reference receiver: ${(e as Error).message}` };
  }
}

/** A copy of what a pair reads from a duty: id, location (with its distances), source height. */
export function dutyCopy(d: Duty): Duty {
  if (!d || typeof d !== 'object') return d;
  const loc = d.location as DutyLocation | undefined;
  let location = loc;
  if (loc && typeof loc === 'object') {
    location = { ...loc };
    if (location.kind === 'distances' && location.distancesM && typeof location.distancesM === 'object')
      location.distancesM = { ...location.distancesM };
  }
  return { ...d, location: location as DutyLocation };
}

/** A copy of what a pair reads from a receiver: position, height, façade, screening by duty. */
export function receiverCopy(r: Receiver): Receiver {
  if (!r || typeof r !== 'object') return r;
  const screening =
    r.screening && typeof r.screening === 'object'
      ? Object.fromEntries(Object.entries(r.screening).map(([k, s]) => [k, s && typeof s === 'object' ? { ...s } : s]))
      : r.screening;
  return { ...r, screening: screening as Receiver['screening'] };
}

/** The engine's path of a pair, with the geometry and screening it was made from. */
interface PairPath {
  spec: PathSpec;
  distanceM: number;
  sourceAt?: SitePoint;
  screen: PathScreening;
}

/**
 * The engine's path from a duty to a receiver: a typed screening (a typed path difference
 * without distances to an edge), or the plan's barrier with its distances to the edge.
 * Throws what the geometry or screening throws. O(barrier segments).
 */
export function pathSpecOf(prop: Propagation, duty: Duty, receiver: Receiver, barriers?: readonly Barrier[]): PairPath {
  const hs = sourceHeightOf(duty, prop);
  const geo = pathGeometry(duty, receiver, hs);
  // A distance not given yet is incomplete, not a bad number: say where it goes.
  if (duty.location.kind === 'distances' && own(duty.location.distancesM, receiver.id) === undefined)
    throw new Error(
      `no distance given yet (type it under “Distance to ${receiver.name}” in the Duties tab, or give the duty X and Y on the site grid)`,
    );
  const screen = pathScreening(duty.id, receiver, geo.sourceAt, hs, barriers);
  const plan = screen.computed;
  const screening: EngineScreening | undefined =
    screen.typed ??
    (plan
      ? {
          kind: 'barrier',
          pathDifferenceM: plan.pathDifferenceM,
          sourceToEdgeM: plan.sourceToEdgeM,
          edgeToReceiverM: plan.edgeToReceiverM,
        }
      : undefined);
  const spec: PathSpec =
    prop.method === 'simple'
      ? { distanceM: geo.distanceM, method: 'simple', q: prop.q, facade: !!receiver.facade }
      : {
          distanceM: geo.distanceM,
          method: 'iso9613-2:1996',
          propagation: {
            sourceHeightM: hs,
            receiverHeightM: receiver.heightM,
            groundFactor: prop.groundFactor,
            groundMethod: prop.groundMethod,
            temperatureC: prop.temperatureC,
            humidityPct: prop.humidityPct,
            pressureKPa: prop.pressureKPa,
            cmet: { c0Db: prop.c0Db },
          },
          facade: !!receiver.facade,
        };
  if (screening) spec.screening = screening;
  return geo.sourceAt
    ? { spec, distanceM: geo.distanceM, sourceAt: geo.sourceAt, screen }
    : { spec, distanceM: geo.distanceM, screen };
}

/** "(typed; replaces barrier … on the plan)" for a typed screening's label. */
function typedWords(screen: PathScreening): string {
  return `typed${screen.replaced ? `; replaces barrier “${screen.replaced.barrierName}” on the plan` : ''}`;
}

/** The path from a duty to a (real) receiver with all its terms. Never throws: a refused input gives `problem`. */
export function pairEntry(prop: Propagation, duty: Duty, receiver: Receiver, barriers?: readonly Barrier[]): PathEntry {
  const geo = pathGeometry(duty, receiver, sourceHeightOf(duty, prop));
  const entry: PathEntry = {
    distanceM: geo.distanceM,
    pathTerms: [],
    receiverTerms: [],
    ...(geo.sourceAt ? { sourceAt: geo.sourceAt } : {}),
  };
  try {
    const pair = pathSpecOf(prop, duty, receiver, barriers);
    const { screen } = pair;
    if (screen.computed) entry.barrier = screen.computed;
    const general = prop.method === 'iso9613-2:1996' && prop.groundMethod === 'general';
    const bands = general ? new Float64Array(8) : undefined;
    const n = pathNumbers(pair.spec, bands);
    const shown = pathTerms(n);
    const decorate = (t: Term): Term => {
      if (t.key === 'abar' && screen.computed) return { ...t, label: `${t.label}: ${barrierWords(screen.computed)}` };
      if ((t.key === 'abar' || t.key === 'screening') && screen.typed)
        return { ...t, label: `${t.label} (${typedWords(screen)})` };
      return t;
    };
    entry.pathTerms = shown.pathTerms.map(decorate);
    entry.receiverTerms = shown.receiverTerms.map(decorate);
    if (n.iso) {
      entry.notes = [...shown.warnings, ...(shown.accuracy?.notes ?? [])];
      if (n.iso.dz !== undefined) entry.dz = n.iso.dz;
    }
    if (n.bands && bands) entry.bandAttenuationDb = Array.from(bands);
  } catch (e) {
    entry.problem = (e as Error).message;
  }
  return entry;
}

/** Where {@link pairNumbers} writes: the table's arrays at one index, and the pair's band attenuations. */
export interface PairOutput {
  broadbandDb: Float64Array;
  receiverDb: Float64Array;
  hasBands: Uint8Array;
  /** Octave-band A of the last pair written with bands, dB, 8 values; present with the general ground method. */
  bandAttenuationDb?: Float64Array;
}

/**
 * The sums of a pair's path, written at `out[i]`: broadband path + receiver terms and receiver
 * terms alone (NaN when not computable), and under the general method `hasBands[i] = 1` with
 * the octave-band A in `out.bandAttenuationDb`. The same numbers as {@link pairEntry}'s terms
 * (one computation, ../../core/path-prediction.ts). Returns the problem, if any.
 */
export function pairNumbers(
  prop: Propagation,
  duty: Duty,
  receiver: Receiver,
  out: PairOutput,
  i: number,
  barriers?: readonly Barrier[],
): string | undefined {
  try {
    const n = pathNumbers(pathSpecOf(prop, duty, receiver, barriers).spec, out.bandAttenuationDb);
    out.hasBands[i] = n.bands ? 1 : 0;
    out.receiverDb[i] = n.receiverDb;
    out.broadbandDb[i] = n.pathDb + n.receiverDb;
    return undefined;
  } catch (e) {
    const message = (e as Error)?.message;
    return fail(out, i, typeof message === 'string' && message !== '' ? message : String(e));
  }
}

function fail(out: PairOutput, i: number, problem: string): string {
  out.receiverDb[i] = NaN;
  out.broadbandDb[i] = NaN;
  out.hasBands[i] = 0;
  return problem;
}

/** Writes the sums of an entry at `out[i]`, as the table has always read them. Returns its problem. */
export function fromEntry(entry: PathEntry, out: PairOutput, i: number): string | undefined {
  const recv = sumTerms(entry.receiverTerms);
  out.receiverDb[i] = entry.problem ? NaN : recv;
  out.broadbandDb[i] = entry.problem ? NaN : sumTerms(entry.pathTerms) + recv;
  out.hasBands[i] = 0;
  if (out.bandAttenuationDb && entry.bandAttenuationDb) {
    out.hasBands[i] = 1;
    for (let b = 0; b < 8; b++) out.bandAttenuationDb[b] = entry.bandAttenuationDb[b] as number;
  }
  return entry.problem;
}
