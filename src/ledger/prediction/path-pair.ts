/**
 * One path of the path table (./path-table.ts): from a duty's location to a receiver.
 *
 * Two forms of the same computation:
 * - {@link pairEntry}: the path with its terms and their labels, for display and audit;
 * - {@link pairNumbers}: only the sums the kernel needs, written into the table's arrays
 *   without building a term, label or entry (a table holds tens of thousands of paths
 *   and shows a few). The sums are taken in the same order as the terms', so both forms
 *   give the same numbers to the last bit.
 *
 * Broadband path term, dB (negative = attenuation): simple method 10·lg(Q/(4πr²)) and the
 * rule-of-thumb or stated screening as a receiver term; ISO 9613-2:1996 D_c − A_div − A_atm
 * − A_gr − A_bar, the A-weighted estimate (general method's terms at 500 Hz, or eq. 10 with
 * D_Ω in D_c when the alternative method is chosen), where any screening is D_z counted once
 * in A_bar = D_z − A_gr (eq. 12). Receiver terms: façade +3 dB, −C_met (eqs 21, 22, per path).
 * A barrier on the plan that cuts the line of sight screens a path with nothing typed for it
 * (./path-screening.ts): its D_z in A_bar under the ISO method, D_z at 500 Hz under the simple
 * method (./plan-barrier-term.ts).
 * With the general ground method, the attenuation A of each octave band (A_bar included).
 * Each is O(8) core evaluations.
 */
import type { Barrier, Duty, DutyLocation, Propagation, Receiver, Screening, SitePoint } from '../model/model.ts';
import type { Term } from '../model/results.ts';
import { pathGeometry, sourceHeightOf } from './geometry.ts';
import { pointSourceSpreadingDb } from '../../core/point-source.ts';
import { FACADE_CORRECTION_DB, screeningReductionDb } from '../../core/corrections.ts';
import {
  aWeightedPathAttenuation,
  octaveBandPathTotals,
  pathCmetDb,
  type PathInput,
} from '../../core/standards/iso9613-2-1996/index.ts';
import { isoMachineTerms } from '../../core/iso9613-machine-terms.ts';
import { pathScreening, type PathScreening } from './path-screening.ts';
import type { ScreeningBarrier } from './barrier-screening.ts';
import { simpleMethodBarrierDb, barrierWords } from './plan-barrier-term.ts';

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

const BARRIER_NEEDS_ISO =
  'a barrier path difference needs the ISO 9613-2:1996 method (use top-visible, hidden or an explicit reduction with the simple method)';

function screeningTerm(screen: PathScreening): Term | undefined {
  const screening = screen.typed;
  if (!screening || screening.kind === 'none' || screening.kind === 'barrier') return undefined;
  const labels: Record<string, string> = {
    'top-visible': 'Screening, top of machine just visible',
    hidden: 'Screening, machine fully hidden',
    explicit: 'Screening, stated reduction',
  };
  const label = `${labels[screening.kind] ?? 'Screening'} (typed${screen.replaced ? `; replaces barrier “${screen.replaced.barrierName}” on the plan` : ''})`;
  return { key: 'screening', label, db: -screeningReductionDb(screening) };
}

/** The reference receiver's path: hemispherical spreading (Q = 2) at the reference distance, nothing else. */
export function referenceEntry(distanceM: number): PathEntry {
  try {
    const db = pointSourceSpreadingDb(distanceM, REFERENCE_Q);
    return {
      distanceM,
      pathTerms: [
        {
          key: 'spreading',
          label: `Spreading 10·lg(Q/(4πr²)), reference receiver r = ${distanceM} m, Q = ${REFERENCE_Q}`,
          db,
        },
      ],
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

/**
 * The ISO 9613-2:1996 inputs of a pair: a typed path difference, the plan's barrier with its
 * distances to the edge, or a rule-of-thumb or stated reduction taken as D_z.
 */
function isoInput(
  prop: Extract<Propagation, { method: 'iso9613-2:1996' }>,
  distanceM: number,
  hs: number,
  receiver: Receiver,
  screen: PathScreening,
): PathInput {
  const typed: Screening | undefined = screen.typed;
  const plan = screen.computed;
  const input: PathInput = {
    distanceM,
    sourceHeightM: hs,
    receiverHeightM: receiver.heightM,
    groundFactor: prop.groundFactor,
    groundMethod: prop.groundMethod,
    temperatureC: prop.temperatureC,
    humidityPct: prop.humidityPct,
    pressureKPa: prop.pressureKPa,
    cmet: { c0Db: prop.c0Db },
  };
  if (typed?.kind === 'barrier') input.barrier = { pathDifferenceM: typed.pathDifferenceM };
  else if (typed) {
    const dz = screeningReductionDb(typed);
    if (dz > 0) input.statedDzDb = dz;
  } else if (plan)
    input.barrier = {
      pathDifferenceM: plan.pathDifferenceM,
      sourceToEdgeM: plan.sourceToEdgeM,
      edgeToReceiverM: plan.edgeToReceiverM,
    };
  return input;
}

/** The path from a duty to a (real) receiver with all its terms. Never throws: a refused input gives `problem`. */
export function pairEntry(prop: Propagation, duty: Duty, receiver: Receiver, barriers?: readonly Barrier[]): PathEntry {
  const hs = sourceHeightOf(duty, prop);
  const geo = pathGeometry(duty, receiver, hs);
  const entry: PathEntry = {
    distanceM: geo.distanceM,
    pathTerms: [],
    receiverTerms: [],
    ...(geo.sourceAt ? { sourceAt: geo.sourceAt } : {}),
  };
  try {
    const screen = pathScreening(duty.id, receiver, geo.sourceAt, hs, barriers);
    if (screen.computed) entry.barrier = screen.computed;
    if (receiver.facade)
      entry.receiverTerms.push({
        key: 'facade',
        label: 'Façade reflection (assessed 1 m in front of a façade)',
        db: FACADE_CORRECTION_DB,
      });
    if (prop.method === 'simple') {
      const typedTerm = screeningTerm(screen);
      if (typedTerm) entry.receiverTerms.push(typedTerm);
      if (screen.typed?.kind === 'barrier') {
        entry.problem = BARRIER_NEEDS_ISO;
        return entry;
      }
      const db = pointSourceSpreadingDb(geo.distanceM, prop.q);
      entry.pathTerms.push({
        key: 'spreading',
        label: `Spreading 10·lg(Q/(4πr²)), r = ${geo.distanceM.toFixed(1)} m, Q = ${prop.q}`,
        db,
      });
      if (screen.computed) {
        entry.pathTerms.push({
          key: 'abar',
          label: `Barrier D_z at 500 Hz, simple method (ISO 9613-2:1996 eq. 14, no ground term to subtract): ${barrierWords(screen.computed)}`,
          db: -simpleMethodBarrierDb(screen.computed),
        });
      }
      return entry;
    }
    const input = isoInput(prop, geo.distanceM, hs, receiver, screen);
    const iso = isoMachineTerms(input, undefined, receiver.facade === true);
    for (const t of iso.terms) {
      if (t.key === 'cmet') entry.receiverTerms.push(t);
      else if (t.key === 'adiv') entry.pathTerms.push({ ...t, label: `${t.label}, d = ${geo.distanceM.toFixed(1)} m` });
      else if (t.key === 'abar' && screen.computed)
        entry.pathTerms.push({ ...t, label: `${t.label}: ${barrierWords(screen.computed)}` });
      else if (t.key === 'abar' && screen.typed)
        entry.pathTerms.push({
          ...t,
          label: `${t.label} (typed${screen.replaced ? `; replaces barrier “${screen.replaced.barrierName}” on the plan` : ''})`,
        });
      else entry.pathTerms.push(t);
    }
    entry.notes = [...iso.warnings, ...iso.accuracy.notes];
    if (iso.aWeighted?.dz !== undefined) entry.dz = iso.aWeighted.dz;
    if (prop.groundMethod === 'general') {
      entry.bandAttenuationDb = Array.from(octaveBandPathTotals(input));
    }
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
 * The sums of {@link pairEntry} for a pair, written at `out[i]`: broadband path + receiver
 * terms and receiver terms alone (NaN when not computable), and under the general method
 * `hasBands[i] = 1` with the octave-band A in `out.bandAttenuationDb`. Returns the problem, if any. When something
 * unexpected is thrown (not an error with a message), falls back to {@link pairEntry}.
 */
export function pairNumbers(
  prop: Propagation,
  duty: Duty,
  receiver: Receiver,
  out: PairOutput,
  i: number,
  barriers?: readonly Barrier[],
): string | undefined {
  const hs = sourceHeightOf(duty, prop);
  const geo = pathGeometry(duty, receiver, hs);
  let path = 0;
  let recv = 0;
  try {
    const screen = pathScreening(duty.id, receiver, geo.sourceAt, hs, barriers);
    const screening = screen.typed;
    if (receiver.facade) recv += FACADE_CORRECTION_DB;
    if (prop.method === 'simple') {
      if (screening && screening.kind !== 'none' && screening.kind !== 'barrier')
        recv += -screeningReductionDb(screening);
      if (screening?.kind === 'barrier') return fail(out, i, BARRIER_NEEDS_ISO);
      path += pointSourceSpreadingDb(geo.distanceM, prop.q);
      if (screen.computed) path += -simpleMethodBarrierDb(screen.computed);
    } else {
      const input = isoInput(prop, geo.distanceM, hs, receiver, screen);
      // The same sums in the same order as the terms of pairEntry (isoMachineTerms).
      const a = aWeightedPathAttenuation(input);
      path += a.dc;
      path += -a.adiv;
      path += -a.aatm;
      path += -a.agr;
      if (a.dz !== undefined) path += -a.abar;
      recv += -pathCmetDb(input);
      if (prop.groundMethod === 'general' && out.bandAttenuationDb) {
        out.bandAttenuationDb.set(octaveBandPathTotals(input));
        out.hasBands[i] = 1;
      }
    }
  } catch (e) {
    const message = (e as Error)?.message;
    if (typeof message === 'string' && message !== '') return fail(out, i, message);
    return fromEntry(pairEntry(prop, duty, receiver, barriers), out, i);
  }
  out.receiverDb[i] = recv;
  out.broadbandDb[i] = path + recv;
  return undefined;
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
