/**
 * The prediction engine, part 1: one path from a source to a receiver — its geometry
 * (distance, heights), the method and the standard's terms, and the receiver's terms
 * (façade, screening, −C_met). The ledger's path table, the app's quick calculation and the
 * command line's `level` all compute a path here; the duty's terms (on-time, count, working
 * hours, character penalty) are ./working-day-terms.ts.
 *
 * Broadband path term, dB (negative = attenuation):
 * - `simple`: 10·lg(Q/(4πr²)) (point source, common practice); a barrier with its distances
 *   to the edge reduces it by D_z at 500 Hz (ISO 9613-2:1996 eq. 14 with K_met of eq. 18, no
 *   ground term to subtract); a rule-of-thumb or stated screening is a receiver term.
 * - `iso9613-2:1996`: D_c − A_div − A_atm − A_gr − A_bar, the A-weighted estimate (general
 *   method's terms at 500 Hz, or eq. 10 with D_Ω in D_c when the alternative method is
 *   chosen); any screening is D_z, counted once in A_bar = D_z − A_gr (eq. 12). With the
 *   general ground method also the attenuation A of each octave band (A_bar included).
 * Receiver terms: façade +3 dB (common practice); the simple method's screening; −C_met
 * (eqs 21, 22).
 *
 * {@link pathNumbers} computes a path once, as numbers; {@link pathTerms} labels those
 * numbers for display without computing anything again, and its terms add up to the same
 * sums, in the same order, to the last bit.
 */
import type { Term } from './term.ts';
import { oneOf } from './check.ts';
import { InputError } from './input-error.ts';
import { checkDirectivity } from './directivity.ts';
import { pointSourceSpreadingDb } from './point-source.ts';
import { FACADE_CORRECTION_DB, screeningReductionDb, type ScreeningChoice } from './corrections.ts';
import { barrierDzDb, barrierKmet } from './standards/iso9613-2-1996/barrier.ts';
import {
  aWeightedAndBandTotals,
  aWeightedPathAttenuation,
  GROUND_METHODS,
  octaveBandPathTotals,
  pathCmetDb,
  type Accuracy,
  type AWeightedAttenuation,
  type PathInput,
} from './standards/iso9613-2-1996/index.ts';
import { isoMachineTerms, type IsoMachineTerms } from './iso9613-machine-terms.ts';
import { SCREENING_WORDS } from './screening-words.ts';

/** Propagation settings for the ISO 9613-2:1996 method (everything of a path except its distance and screening). */
export type Iso9613Propagation = Omit<PathInput, 'distanceM' | 'statedDzDb'>;

/**
 * A path's screening: a rule of thumb or stated reduction, or a barrier's path difference z,
 * with the distances from source to edge and edge to receiver when the barrier's place is known
 * (a barrier on the plan). A path is screened once.
 */
export type PathScreening =
  ScreeningChoice | { kind: 'barrier'; pathDifferenceM: number; sourceToEdgeM?: number; edgeToReceiverM?: number };

export interface PathSpec {
  /** Source–receiver distance, m. */
  distanceM: number;
  method: 'simple' | 'iso9613-2:1996';
  /** Directivity Q of the simple method: 1, 2, 4 or 8. */
  q?: number;
  /** Heights, ground, atmosphere and C0 of the ISO 9613-2:1996 method. */
  propagation?: Iso9613Propagation;
  screening?: PathScreening;
  /** Assessed 1 m in front of a façade: +3 dB. */
  facade?: boolean;
}

/** A path computed: the sums and the values they are made of. */
export interface PathNumbers {
  spec: PathSpec;
  /** Simple method: 10·lg(Q/(4πr²)), dB, and Q. */
  spreadingDb?: number;
  q?: number;
  /** Simple method: D_z at 500 Hz of a barrier with its distances to the edge, dB (a reduction, positive). */
  barrierDb?: number;
  /** Simple method: a rule-of-thumb or stated screening, dB (a reduction, positive). */
  screeningDb?: number;
  /** ISO 9613-2:1996: the path as the standard's input, and its A-weighted estimate. */
  isoInput?: PathInput;
  iso?: AWeightedAttenuation;
  /** +3 dB in front of a façade, else 0. */
  facadeDb: number;
  /** Broadband path terms summed, dB. */
  pathDb: number;
  /** Receiver terms summed (façade, simple screening, −C_met), dB. */
  receiverDb: number;
}

/** What a simple-method path takes instead of a barrier path difference alone. */
const SIMPLE_SCREENING_ACCEPTED =
  'use top-visible, hidden or a stated reduction with the simple method, or a barrier on the plan';

/** Frequency whose wavelength the simple method's barrier term uses, Hz. */
export const SIMPLE_METHOD_BARRIER_HZ = 500;

/**
 * D_z at 500 Hz of a barrier whose edge is placed, dB (positive = reduction): eq. 14 with
 * C2 = 20, C3 = 1 and K_met of eq. 18, capped at 20 dB — the rule the broadband ISO estimate
 * uses (clause 8: terms at 500 Hz), with nothing to subtract as the simple method has no ground term.
 * @example simpleMethodBarrierDb({ pathDifferenceM: 0.396, sourceToEdgeM: 10.2, edgeToReceiverM: 10.2, distanceM: 20 }) // 11.2
 */
export function simpleMethodBarrierDb(b: {
  pathDifferenceM: number;
  sourceToEdgeM: number;
  edgeToReceiverM: number;
  distanceM: number;
}): number {
  const kmet = barrierKmet(b.sourceToEdgeM, b.edgeToReceiverM, b.distanceM, b.pathDifferenceM);
  return barrierDzDb({ frequencyHz: SIMPLE_METHOD_BARRIER_HZ, pathDifferenceM: b.pathDifferenceM, kmet });
}

/** The ISO 9613-2:1996 input of a path: the propagation, the distance and the screening as D_z or a barrier. */
function isoInputOf(spec: PathSpec): PathInput {
  const p = spec.propagation;
  if (!p)
    throw new InputError(
      'propagation',
      undefined,
      'given',
      'give heights, ground factor, temperature and humidity for the ISO 9613-2:1996 method',
    );
  const groundMethod = oneOf('ground method', p.groundMethod ?? 'general', GROUND_METHODS);
  // Every key written in one order (no spread): the standard's functions then read one object shape, fast.
  const input: PathInput = {
    distanceM: spec.distanceM,
    sourceHeightM: p.sourceHeightM,
    receiverHeightM: p.receiverHeightM,
    groundFactor: p.groundFactor,
    groundFactors: p.groundFactors,
    temperatureC: p.temperatureC,
    humidityPct: p.humidityPct,
    pressureKPa: p.pressureKPa,
    barrier: p.barrier,
    statedDzDb: undefined,
    groundMethod,
    cmet: p.cmet,
  };
  const s = spec.screening;
  if (!s || s.kind === 'none') return input;
  if (p.barrier) {
    if (s.kind === 'barrier')
      throw new InputError('screening', 'barrier', 'is given twice', 'describe the barrier once');
    throw new InputError(
      'screening',
      s.kind === 'explicit' ? s.db : s.kind,
      'is given together with a barrier path difference',
      'screen a path once: a barrier path difference, or a rule-of-thumb or stated screening, not both',
    );
  }
  if (s.kind === 'barrier') {
    input.barrier = { pathDifferenceM: s.pathDifferenceM };
    if (s.sourceToEdgeM !== undefined) input.barrier.sourceToEdgeM = s.sourceToEdgeM;
    if (s.edgeToReceiverM !== undefined) input.barrier.edgeToReceiverM = s.edgeToReceiverM;
  } else {
    const dz = screeningReductionDb(s);
    if (dz > 0) input.statedDzDb = dz;
  }
  return input;
}

/**
 * A path's sums, computed once. With the ISO general ground method and `bandsOut` given, the
 * octave-band attenuations A (63 Hz … 8 kHz) are written into it and `true` returned in
 * `bands`. Throws InputError on bad input. O(8).
 */
export function pathNumbers(spec: PathSpec, bandsOut?: Float64Array): PathNumbers & { bands: boolean } {
  const s = spec.screening;
  const facadeDb = spec.facade ? FACADE_CORRECTION_DB : 0;
  if (spec.facade !== undefined && typeof spec.facade !== 'boolean') {
    throw new InputError('façade', spec.facade, 'is not accepted', 'use true (1 m in front of a façade) or false');
  }
  if (spec.method === 'simple') {
    // Receiver terms first, path terms after: the order of the terms in pathTerms.
    let receiverDb = facadeDb;
    let screeningDb: number | undefined;
    if (s && s.kind !== 'none' && s.kind !== 'barrier') {
      screeningDb = screeningReductionDb(s);
      receiverDb += -screeningDb;
    }
    const q = checkDirectivity(spec.q ?? 2);
    let barrierDb: number | undefined;
    if (s?.kind === 'barrier') {
      if (s.sourceToEdgeM === undefined || s.edgeToReceiverM === undefined)
        throw new InputError('screening', 'barrier', 'needs the ISO 9613-2:1996 method', SIMPLE_SCREENING_ACCEPTED);
    }
    const spreadingDb = pointSourceSpreadingDb(spec.distanceM, q);
    let pathDb = spreadingDb;
    if (s?.kind === 'barrier') {
      barrierDb = simpleMethodBarrierDb({
        pathDifferenceM: s.pathDifferenceM,
        sourceToEdgeM: s.sourceToEdgeM as number,
        edgeToReceiverM: s.edgeToReceiverM as number,
        distanceM: spec.distanceM,
      });
      pathDb += -barrierDb;
    }
    return {
      spec,
      spreadingDb,
      q,
      ...(barrierDb === undefined ? {} : { barrierDb }),
      ...(screeningDb === undefined ? {} : { screeningDb }),
      facadeDb,
      pathDb,
      receiverDb: receiverDb,
      bands: false,
    };
  }
  const input = isoInputOf(spec);
  // With bands asked for, the estimate and the bands in one pass (the ground term of Table 3 computed once).
  const bands = bandsOut !== undefined && input.groundMethod === 'general';
  const a = bands ? aWeightedAndBandTotals(input, bandsOut) : aWeightedPathAttenuation(input);
  // The sums in the order of the terms (isoMachineTerms): D_c, −A_div, −A_atm, −A_gr, −A_bar; façade, −C_met.
  let pathDb = 0;
  pathDb += a.dc;
  pathDb += -a.adiv;
  pathDb += -a.aatm;
  pathDb += -a.agr;
  if (a.dz !== undefined) pathDb += -a.abar;
  let receiverDb = 0;
  receiverDb += facadeDb;
  receiverDb += -a.cmet;
  return { spec, isoInput: input, iso: a, facadeDb, pathDb, receiverDb, bands };
}

/**
 * The band part of {@link pathNumbers} alone, for a path whose source has octave bands under
 * the ISO 9613-2:1996 general ground method: the octave-band attenuations A (63 Hz … 8 kHz)
 * written into `bandsOut` and the receiver terms (façade, −C_met) returned, dB — the same
 * numbers as pathNumbers gives in `bandsOut` and `receiverDb`, without the A-weighted single
 * figure the band sum does not use (a level map asks this for every grid point and machine).
 * Throws what pathNumbers throws on the same path. O(8).
 * @example pathBandNumbers({ distanceM: 100, method: 'iso9613-2:1996', propagation: { sourceHeightM: 1, receiverHeightM: 4, groundFactor: 0, temperatureC: 10, humidityPct: 70 } }, out) // 0 (out[0] = 48.01)
 */
export function pathBandNumbers(spec: PathSpec, bandsOut: Float64Array): number {
  if (spec.method !== 'iso9613-2:1996')
    throw new InputError('method', spec.method, 'has no octave bands', 'use the ISO 9613-2:1996 general method');
  if (spec.facade !== undefined && typeof spec.facade !== 'boolean') {
    throw new InputError('façade', spec.facade, 'is not accepted', 'use true (1 m in front of a façade) or false');
  }
  const input = isoInputOf(spec);
  if (input.groundMethod !== 'general')
    throw new InputError('ground method', input.groundMethod, 'has no octave bands', 'use the general method');
  bandsOut.set(octaveBandPathTotals(input));
  let receiverDb = 0;
  receiverDb += spec.facade ? FACADE_CORRECTION_DB : 0;
  receiverDb += -pathCmetDb(input);
  return receiverDb;
}

/** A path's terms for display: the path's own, the receiver's, and notes on accuracy and method. */
export interface PathTerms {
  pathTerms: Term[];
  receiverTerms: Term[];
  /** ISO 9613-2:1996: the accuracy its Table 5 states, or why none is stated. */
  accuracy?: Accuracy;
  /** ISO 9613-2:1996: warnings on the method chosen. */
  warnings: string[];
  /** ISO 9613-2:1996: the standard's terms as labelled by ./iso9613-machine-terms.ts. */
  iso?: IsoMachineTerms;
}

const SCREENING_LABELS: Record<string, string> = {
  'top-visible': `Screening, ${SCREENING_WORDS['top-visible'].long} (rule of thumb)`,
  hidden: `Screening, ${SCREENING_WORDS.hidden.long} (rule of thumb)`,
  explicit: 'Screening, stated reduction',
};

/** The terms of a path computed by {@link pathNumbers}, labelled; nothing is computed again but the accuracy notes. */
export function pathTerms(n: PathNumbers): PathTerms {
  const d = n.spec.distanceM;
  const receiverTerms: Term[] = [];
  if (n.spec.facade)
    receiverTerms.push({
      key: 'facade',
      label: 'Façade reflection (assessed 1 m in front of a façade)',
      db: FACADE_CORRECTION_DB,
    });
  if (n.iso === undefined) {
    const s = n.spec.screening;
    if (n.screeningDb !== undefined && s)
      receiverTerms.push({ key: 'screening', label: SCREENING_LABELS[s.kind] ?? 'Screening', db: -n.screeningDb });
    const pathTerms: Term[] = [
      {
        key: 'spreading',
        label: `Point-source spreading 10·lg(Q/(4πr²)), Q = ${n.q}, r = ${d.toFixed(1)} m`,
        db: n.spreadingDb as number,
      },
    ];
    if (n.barrierDb !== undefined)
      pathTerms.push({
        key: 'abar',
        label: 'Barrier D_z at 500 Hz, simple method (ISO 9613-2:1996 eq. 14, no ground term to subtract)',
        db: -n.barrierDb,
      });
    return { pathTerms, receiverTerms, warnings: [] };
  }
  const iso = isoMachineTerms(n.isoInput as PathInput, undefined, n.spec.facade === true, n.iso);
  const pathTerms: Term[] = [];
  for (const t of iso.terms) {
    if (t.key === 'cmet') receiverTerms.push(t);
    else if (t.key === 'adiv') pathTerms.push({ ...t, label: `${t.label}, d = ${d.toFixed(1)} m` });
    else pathTerms.push(t);
  }
  return { pathTerms, receiverTerms, accuracy: iso.accuracy, warnings: iso.warnings, iso };
}
