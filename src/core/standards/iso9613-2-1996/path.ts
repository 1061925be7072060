/**
 * ISO 9613-2:1996 — attenuation along one source–receiver path, A = A_div + A_atm + A_gr + A_bar
 * (eq. 4; A_misc is not modelled), with the standard's signs: every A term is an attenuation
 * (positive when it lowers the level; A_gr may be negative over hard ground), D_c a correction
 * that is added: L_AT(DW) = L_W + D_c − A (eq. 3), L_AT(LT) = L_AT(DW) − C_met (eq. 6).
 *
 * Two forms:
 * - octave bands 63 Hz … 8 kHz (clause 6): A_gr by the general method (clause 7.3.1);
 * - an A-weighted estimate for a source known only by L_WA (clause 7.3.1 last paragraph and
 *   clause 7.3.2): by default the general method's terms at 500 Hz (A_atm and A_gr at 500 Hz,
 *   D_Ω = 0 because the general method counts the ground reflection in A_gr); only when the
 *   alternative ground method is chosen, A_gr from eq. 10 with D_Ω from eq. 11 as part of D_c.
 *
 * Screening: a barrier's D_z (eq. 14) or a screening stated as a fixed D_z (a rule of thumb or
 * a stated reduction) replaces the ground effect on the path: A_bar = D_z − A_gr, not below 0
 * (eq. 12). A path takes one screening: a barrier and a stated D_z together are refused.
 */
import { finite, inRange, oneOf } from '../../check.ts';
import { InputError } from '../../input-error.ts';
import { OCTAVE_BANDS_NOMINAL_HZ } from '../../octave-bands.ts';
import { checkAtmosphere, octaveBandAbsorptionUnchecked, REFERENCE_PRESSURE_KPA } from '../iso9613-1-1993.ts';
import { divergenceDb } from './divergence.ts';
import { atmosphericAttenuationDb } from './atmosphere.ts';
import { generalGroundTotalsDb, type GeneralGroundInput } from './ground-general.ts';
import { alternativeGroundAttenuationDb, groundReflectionCorrectionDb } from './ground-alternative.ts';
import { barrierDzDb, barrierKmet, topEdgeBarrierAttenuationDb } from './barrier.ts';
import { meteorologicalCorrectionDb } from './meteorology.ts';
import { groundFactors, projectedDistanceM, type GroundFactors } from './geometry.ts';

/** A barrier over whose top edge the sound is diffracted (clause 7.4). */
export interface BarrierInput {
  /** Path difference z, m (eq. 16 single, eq. 17 double). */
  pathDifferenceM: number;
  /** Double diffraction (thick barrier or two barriers); needs `innerDistanceM`. */
  double?: boolean;
  /** Distance e between the two diffraction edges, m. */
  innerDistanceM?: number;
  /** Source to (first) diffraction edge d_ss, m. With `edgeToReceiverM`; when either is absent the edge is taken midway, which gives the smallest K_met (the least screening). */
  sourceToEdgeM?: number;
  /** (Last) diffraction edge to receiver d_sr, m. */
  edgeToReceiverM?: number;
}

/** Ground method (clause 7.3): 'general' (7.3.1, the default) or 'alternative' (7.3.2, A-weighted levels over mostly porous ground). */
export type GroundMethod = 'general' | 'alternative';

/** The ground methods accepted, in the order a refusal lists them. */
export const GROUND_METHODS: readonly GroundMethod[] = ['general', 'alternative'];

/** Largest screening accepted as a stated D_z, dB (as the simple method's explicit screening). */
export const STATED_DZ_MAX_DB = 40;

export interface PathInput {
  /** Direct source–receiver distance d, m. */
  distanceM: number;
  sourceHeightM: number;
  receiverHeightM: number;
  /** Ground factor G, 0 hard … 1 porous, for the source, middle and receiver regions. */
  groundFactor: number;
  /** G per region where it differs from `groundFactor` (general method only). */
  groundFactors?: Partial<GroundFactors>;
  temperatureC: number;
  humidityPct: number;
  /** Atmospheric pressure, kPa (101.325 when absent). */
  pressureKPa?: number;
  /** A barrier whose D_z comes from eq. 14. */
  barrier?: BarrierInput;
  /** Screening stated as D_z, dB (rule of thumb or a stated reduction), 0 to 40; not with `barrier`. */
  statedDzDb?: number;
  /** Ground method of the A-weighted estimate (default 'general'); octave bands always use the general method. */
  groundMethod?: GroundMethod;
  /** Meteorological correction from C0 in dB (clause 8, eqs 21, 22). Absent: C_met = 0 (downwind). */
  cmet?: { c0Db: number };
}

/** Attenuation terms in one octave band, dB, with the standard's signs (positive lowers the level). */
export interface OctaveBandAttenuation {
  nominalHz: number;
  adiv: number;
  aatm: number;
  agr: number;
  /** A_bar = D_z − A_gr, not below 0 (eq. 12); 0 without screening. */
  abar: number;
  /** D_z of the band, dB, when the path is screened. */
  dz?: number;
  /** A = A_div + A_atm + A_gr + A_bar. */
  total: number;
}

/** The A-weighted estimate's terms, dB, with the standard's signs. */
export interface AWeightedAttenuation {
  groundMethod: GroundMethod;
  adiv: number;
  aatm: number;
  agr: number;
  abar: number;
  /** D_z at 500 Hz, dB, when the path is screened. */
  dz?: number;
  /** D_c = D_I + D_Ω, dB, added to L_WA (D_I = 0: the machine is taken as omnidirectional). */
  dc: number;
  /** D_Ω (eq. 11), the part of D_c for the ground reflection: 0 with the general method. */
  dOmega: number;
  cmet: number;
  /** A = A_div + A_atm + A_gr + A_bar. */
  attenuation: number;
  /** A − D_c + C_met: the amount taken from L_WA. */
  total: number;
}

/** The broadband estimate's terms (the former name of {@link AWeightedAttenuation}). */
export type BroadbandAttenuation = AWeightedAttenuation;

/** D_z of a path at a frequency: from the barrier (eq. 14) or the stated value; undefined when unscreened. */
function pathDz(input: PathInput, frequencyHz: number): number | undefined {
  if (input.barrier) return barrierDz(input.barrier, frequencyHz, input.distanceM);
  return input.statedDzDb;
}

/** Checks the path's screening: one kind at most, a stated D_z in range. */
function checkScreening(input: PathInput): void {
  if (input.statedDzDb === undefined) return;
  if (input.barrier) {
    throw new InputError(
      'screening',
      input.statedDzDb,
      'is given together with a barrier path difference',
      'screen a path once: either a barrier path difference or a rule-of-thumb or stated reduction, not both',
    );
  }
  inRange('screening', input.statedDzDb, 0, STATED_DZ_MAX_DB, `a screening D_z from 0 to ${STATED_DZ_MAX_DB} dB`);
}

function barrierDz(barrier: BarrierInput, frequencyHz: number, distanceM: number): number {
  const z = finite('barrier path difference', barrier.pathDifferenceM, 'a path difference in metres of 0 or more');
  const e = barrier.double ? barrier.innerDistanceM : undefined;
  if (barrier.double && e === undefined) {
    throw new InputError(
      'distance between diffraction edges',
      undefined,
      'given',
      'give e in metres for double diffraction',
    );
  }
  let dss = barrier.sourceToEdgeM;
  let dsr = barrier.edgeToReceiverM;
  if (dss === undefined || dsr === undefined) {
    const half = Math.max(0, (distanceM + z - (e ?? 0)) / 2);
    dss = half;
    dsr = half;
  }
  const kmet = barrierKmet(dss, dsr, distanceM, z);
  return barrierDzDb({
    frequencyHz,
    pathDifferenceM: z,
    double: barrier.double ?? false,
    ...(e === undefined ? {} : { innerDistanceM: e }),
    kmet,
  });
}

/**
 * Visits the terms of each octave band along one path (the checks and sums shared by
 * {@link octaveBandPathAttenuation} and {@link octaveBandPathTotals}). O(8).
 */
function eachOctaveBand(
  input: PathInput,
  visit: (
    band: number,
    nominalHz: number,
    adiv: number,
    aatm: number,
    agr: number,
    abar: number,
    dz: number | undefined,
  ) => void,
): void {
  const dp = projectedDistanceM(input.distanceM, input.sourceHeightM, input.receiverHeightM);
  const pressureKPa = input.pressureKPa ?? REFERENCE_PRESSURE_KPA;
  checkAtmosphere(input.temperatureC, input.humidityPct, pressureKPa);
  checkScreening(input);
  // α per band, computed once per atmosphere (ISO 9613-1:1993, exact mid-band frequencies).
  const alpha = octaveBandAbsorptionUnchecked(input.temperatureC, input.humidityPct, pressureKPa);
  const ground = generalGroundTotalsDb({
    projectedDistanceM: dp,
    sourceHeightM: input.sourceHeightM,
    receiverHeightM: input.receiverHeightM,
    groundFactor: input.groundFactor,
    ...(input.groundFactors ? { groundFactors: input.groundFactors } : {}),
  });
  const adiv = divergenceDb(input.distanceM);
  for (let band = 0; band < OCTAVE_BANDS_NOMINAL_HZ.length; band++) {
    const nominalHz = OCTAVE_BANDS_NOMINAL_HZ[band] as number;
    const aatm = atmosphericAttenuationDb(alpha[band] as number, input.distanceM);
    const agr = ground[band] as number;
    const dz = pathDz(input, nominalHz);
    const abar = dz === undefined ? 0 : topEdgeBarrierAttenuationDb(dz, agr);
    visit(band, nominalHz, adiv, aatm, agr, abar, dz);
  }
}

/**
 * Octave-band attenuation 63 Hz … 8 kHz along one path, dB: A_div (eq. 7), A_atm (eq. 8, α at
 * exact mid-band frequencies from ISO 9613-1:1993), A_gr by the general method (eq. 9, Table 3)
 * and A_bar = D_z − A_gr ≥ 0 (eq. 12; D_z from eq. 14 at the nominal mid-band wavelength, or
 * the stated D_z in every band).
 * @example octaveBandPathAttenuation({ distanceM: 100, sourceHeightM: 1, receiverHeightM: 4, groundFactor: 0, temperatureC: 10, humidityPct: 70 })[0].adiv // 51
 */
export function octaveBandPathAttenuation(input: PathInput): OctaveBandAttenuation[] {
  const bands: OctaveBandAttenuation[] = [];
  eachOctaveBand(input, (_band, nominalHz, adiv, aatm, agr, abar, dz) =>
    bands.push({
      nominalHz,
      adiv,
      aatm,
      agr,
      abar,
      ...(dz === undefined ? {} : { dz }),
      total: adiv + aatm + agr + abar,
    }),
  );
  return bands;
}

/**
 * The totals A = A_div + A_atm + A_gr + A_bar of {@link octaveBandPathAttenuation} in the
 * eight bands, dB, without the parts (for tables of many paths). O(8).
 * @example octaveBandPathTotals({ distanceM: 100, sourceHeightM: 1, receiverHeightM: 4, groundFactor: 0, temperatureC: 10, humidityPct: 70 })[0] // 48.01 (51 + 0.01 − 3)
 */
export function octaveBandPathTotals(input: PathInput): Float64Array {
  const totals = new Float64Array(OCTAVE_BANDS_NOMINAL_HZ.length);
  eachOctaveBand(input, (band, _nominalHz, adiv, aatm, agr, abar) => {
    totals[band] = adiv + aatm + agr + abar;
  });
  return totals;
}

/**
 * C_met of a path, dB (eqs 21, 22): 0 when no C0 is given (downwind).
 * @example pathCmetDb({ …, distanceM: 500, sourceHeightM: 2, receiverHeightM: 4, cmet: { c0Db: 2 } }) // 1.76
 */
export function pathCmetDb(input: PathInput): number {
  if (!input.cmet) return 0;
  const dp = projectedDistanceM(input.distanceM, input.sourceHeightM, input.receiverHeightM);
  return meteorologicalCorrectionDb(input.cmet.c0Db, dp, input.sourceHeightM, input.receiverHeightM);
}

/**
 * The A-weighted estimate for a source known only by L_WA, dB: A_div (eq. 7); A_atm with α at
 * the exact 500 Hz mid-band frequency (eq. 8); A_gr by the general method at 500 Hz (Table 3,
 * D_Ω = 0) or, when the alternative method is chosen, by eq. 10 with h_m = (h_s + h_r)/2 over
 * flat ground and D_Ω from eq. 11 as part of D_c; A_bar = D_z − A_gr ≥ 0 with D_z at 500 Hz
 * (eq. 12, 14) or the stated D_z; C_met (eqs 21, 22).
 * @example aWeightedPathAttenuation({ distanceM: 100, sourceHeightM: 1, receiverHeightM: 4, groundFactor: 1, temperatureC: 10, humidityPct: 70, groundMethod: 'alternative' }).total // 51.99
 */
export function aWeightedPathAttenuation(input: PathInput): AWeightedAttenuation {
  return aWeightedWith(input, undefined);
}

/** {@link aWeightedPathAttenuation}, the general method's eight band A_gr written into `ground` when given. */
function aWeightedWith(input: PathInput, ground: Float64Array | undefined): AWeightedAttenuation {
  const groundMethod = oneOf('ground method', input.groundMethod ?? 'general', GROUND_METHODS);
  const dp = projectedDistanceM(input.distanceM, input.sourceHeightM, input.receiverHeightM);
  const adiv = divergenceDb(input.distanceM);
  const pressureKPa = input.pressureKPa ?? REFERENCE_PRESSURE_KPA;
  checkAtmosphere(input.temperatureC, input.humidityPct, pressureKPa);
  checkScreening(input);
  // α at the exact 500 Hz mid-band frequency: band 3 of the octave-band α (computed once per atmosphere).
  const alpha500 = octaveBandAbsorptionUnchecked(input.temperatureC, input.humidityPct, pressureKPa)[3] as number;
  const aatm = atmosphericAttenuationDb(alpha500, input.distanceM);
  let agr: number;
  let dOmega: number;
  if (groundMethod === 'general') {
    const groundInput: GeneralGroundInput = {
      projectedDistanceM: dp,
      sourceHeightM: input.sourceHeightM,
      receiverHeightM: input.receiverHeightM,
      groundFactor: input.groundFactor,
    };
    if (input.groundFactors) groundInput.groundFactors = input.groundFactors;
    agr = generalGroundTotalsDb(groundInput, ground)[3] as number;
    dOmega = 0;
  } else {
    groundFactors(input.groundFactor, input.groundFactors);
    agr = alternativeGroundAttenuationDb(input.distanceM, (input.sourceHeightM + input.receiverHeightM) / 2);
    dOmega = groundReflectionCorrectionDb(dp, input.sourceHeightM, input.receiverHeightM);
  }
  const dz = pathDz(input, 500);
  const abar = dz === undefined ? 0 : topEdgeBarrierAttenuationDb(dz, agr);
  const cmet = input.cmet
    ? meteorologicalCorrectionDb(input.cmet.c0Db, dp, input.sourceHeightM, input.receiverHeightM)
    : 0;
  const dc = dOmega;
  const attenuation = adiv + aatm + agr + abar;
  const total = attenuation - dc + cmet;
  // Two literals rather than a spread: one object per path (a table computes hundreds of thousands), same keys in the same order.
  return dz === undefined
    ? { groundMethod, adiv, aatm, agr, abar, dc, dOmega, cmet, attenuation, total }
    : { groundMethod, adiv, aatm, agr, abar, dz, dc, dOmega, cmet, attenuation, total };
}

/** {@link aWeightedPathAttenuation} under its former name. */
export const broadbandPathAttenuation = aWeightedPathAttenuation;

/** The eight band A_gr of the last path {@link aWeightedAndBandTotals} computed. */
const groundOfPath = new Float64Array(8);

/**
 * {@link aWeightedPathAttenuation} and, with the general ground method, the band totals of
 * {@link octaveBandPathTotals} written into `totalsOut`, for one path at once: the ground
 * attenuation of Table 3 (eight bands, of which the estimate reads 500 Hz), the divergence
 * and α are computed once for both. The same numbers to the last bit and the same errors
 * as the two calls one after the other (on an error `totalsOut` may be partly written).
 * Returns the estimate; with the alternative ground method `totalsOut` is not written. O(8).
 */
export function aWeightedAndBandTotals(input: PathInput, totalsOut: Float64Array): AWeightedAttenuation {
  const a = aWeightedWith(input, groundOfPath);
  if (a.groundMethod !== 'general') return a;
  // The estimate has checked the distance, heights, atmosphere and screening: the bands read the same values.
  const pressureKPa = input.pressureKPa ?? REFERENCE_PRESSURE_KPA;
  const alpha = octaveBandAbsorptionUnchecked(input.temperatureC, input.humidityPct, pressureKPa);
  const adiv = a.adiv;
  for (let band = 0; band < OCTAVE_BANDS_NOMINAL_HZ.length; band++) {
    const aatm = atmosphericAttenuationDb(alpha[band] as number, input.distanceM);
    const agr = groundOfPath[band] as number;
    const dz = pathDz(input, OCTAVE_BANDS_NOMINAL_HZ[band] as number);
    const abar = dz === undefined ? 0 : topEdgeBarrierAttenuationDb(dz, agr);
    totalsOut[band] = adiv + aatm + agr + abar;
  }
  return a;
}
