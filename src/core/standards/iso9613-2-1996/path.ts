/**
 * ISO 9613-2:1996 — attenuation along one source–receiver path, A = A_div + A_atm + A_gr + A_bar
 * (eq. 4; A_misc is not modelled), in octave bands (clause 6) or as a broadband estimate for
 * A-weighted data (clause 7.3.2 and clause 8: α at 500 Hz, alternative ground method with D_Ω).
 */
import { finite } from '../../check.ts';
import { InputError } from '../../input-error.ts';
import { OCTAVE_BANDS_NOMINAL_HZ } from '../../octave-bands.ts';
import { checkAtmosphere, octaveBandAbsorptionUnchecked, REFERENCE_PRESSURE_KPA } from '../iso9613-1-1993.ts';
import { divergenceDb } from './divergence.ts';
import { atmosphericAttenuationDb } from './atmosphere.ts';
import { generalGroundTotalsDb } from './ground-general.ts';
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
  barrier?: BarrierInput;
  /** Meteorological correction: C0 in dB (clause 8). Absent: C_met = 0 (downwind). */
  cmet?: { c0Db: number };
}

/** Attenuation terms in one octave band, dB (positive = the level falls). */
export interface OctaveBandAttenuation {
  nominalHz: number;
  adiv: number;
  aatm: number;
  agr: number;
  abar: number;
  /** A_div + A_atm + A_gr + A_bar. */
  total: number;
}

/** Broadband attenuation terms for A-weighted data, dB. */
export interface BroadbandAttenuation {
  adiv: number;
  aatm: number;
  agr: number;
  abar: number;
  /** D_Ω, dB, a gain: it is subtracted in `total`. */
  dOmega: number;
  cmet: number;
  /** A_div + A_atm + A_gr + A_bar − D_Ω + C_met: the amount taken from L_WA. */
  total: number;
}

function barrierDz(barrier: BarrierInput, frequencyHz: number, distanceM: number): number {
  const z = finite('barrier path difference', barrier.pathDifferenceM, 'a path difference in metres of 0 or more');
  const e = barrier.double ? barrier.innerDistanceM : undefined;
  if (barrier.double && e === undefined) {
    throw new InputError('distance between diffraction edges', undefined, 'given', 'give e in metres for double diffraction');
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
function eachOctaveBand(input: PathInput, visit: (band: number, nominalHz: number, adiv: number, aatm: number, agr: number, abar: number) => void): void {
  const dp = projectedDistanceM(input.distanceM, input.sourceHeightM, input.receiverHeightM);
  const pressureKPa = input.pressureKPa ?? REFERENCE_PRESSURE_KPA;
  checkAtmosphere(input.temperatureC, input.humidityPct, pressureKPa);
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
    const abar = input.barrier ? topEdgeBarrierAttenuationDb(barrierDz(input.barrier, nominalHz, input.distanceM), agr) : 0;
    visit(band, nominalHz, adiv, aatm, agr, abar);
  }
}

/**
 * Octave-band attenuation 63 Hz … 8 kHz along one path, dB: A_div (eq. 7), A_atm (eq. 8, α at
 * exact mid-band frequencies from ISO 9613-1:1993), A_gr by the general method (eq. 9, Table 3)
 * and A_bar over the top edge (eq. 12, 14), D_z at the nominal mid-band wavelength.
 * @example octaveBandPathAttenuation({ distanceM: 100, sourceHeightM: 1, receiverHeightM: 4, groundFactor: 0, temperatureC: 10, humidityPct: 70 })[0].adiv // 51
 */
export function octaveBandPathAttenuation(input: PathInput): OctaveBandAttenuation[] {
  const bands: OctaveBandAttenuation[] = [];
  eachOctaveBand(input, (_band, nominalHz, adiv, aatm, agr, abar) => bands.push({ nominalHz, adiv, aatm, agr, abar, total: adiv + aatm + agr + abar }));
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
 * Broadband attenuation for A-weighted sound power, dB: A_div (eq. 7); A_atm with α at the
 * exact 500 Hz mid-band frequency (clause 8); A_gr by the alternative method (eq. 10) with
 * h_m = (h_s + h_r)/2 over flat ground, and D_Ω (eq. 11); A_bar = D_z − A_gr > 0 with D_z at
 * 500 Hz (eq. 12, 14); C_met (eqs 21, 22). `groundFactor` is checked but eq. 10 does not use it.
 * @example broadbandPathAttenuation({ distanceM: 100, sourceHeightM: 1, receiverHeightM: 4, groundFactor: 1, temperatureC: 10, humidityPct: 70 }).total // 51.99
 */
export function broadbandPathAttenuation(input: PathInput): BroadbandAttenuation {
  const dp = projectedDistanceM(input.distanceM, input.sourceHeightM, input.receiverHeightM);
  groundFactors(input.groundFactor, input.groundFactors);
  const adiv = divergenceDb(input.distanceM);
  const pressureKPa = input.pressureKPa ?? REFERENCE_PRESSURE_KPA;
  checkAtmosphere(input.temperatureC, input.humidityPct, pressureKPa);
  // α at the exact 500 Hz mid-band frequency: band 3 of the octave-band α (computed once per atmosphere).
  const alpha500 = octaveBandAbsorptionUnchecked(input.temperatureC, input.humidityPct, pressureKPa)[3] as number;
  const aatm = atmosphericAttenuationDb(alpha500, input.distanceM);
  const agr = alternativeGroundAttenuationDb(input.distanceM, (input.sourceHeightM + input.receiverHeightM) / 2);
  const dOmega = groundReflectionCorrectionDb(dp, input.sourceHeightM, input.receiverHeightM);
  const abar = input.barrier ? topEdgeBarrierAttenuationDb(barrierDz(input.barrier, 500, input.distanceM), agr) : 0;
  const cmet = input.cmet ? meteorologicalCorrectionDb(input.cmet.c0Db, dp, input.sourceHeightM, input.receiverHeightM) : 0;
  return { adiv, aatm, agr, abar, dOmega, cmet, total: adiv + aatm + agr + abar - dOmega + cmet };
}
