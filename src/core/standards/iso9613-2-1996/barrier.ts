/**
 * ISO 9613-2:1996 clause 7.4 — screening by a barrier: D_z and A_bar.
 *
 * D_z = 10·lg[3 + (C2/λ)·C3·z·K_met] (eq. 14), C2 = 20 (ground reflections included in the
 * ground term), C3 = 1 for single diffraction, for double diffraction
 * C3 = [1 + (5λ/e)²] / [1/3 + (5λ/e)²] (eq. 15), z the path difference, λ the wavelength at
 * the nominal mid-band frequency, e the distance between the two diffraction edges.
 * K_met = exp[−(1/2000)·√(d_ss·d_sr·d/(2z))] for z > 0, 1 for z ≤ 0 (eq. 18).
 * D_z is not taken above 20 dB (single) or 25 dB (double diffraction).
 * Over the top edge A_bar = D_z − A_gr > 0 (eq. 12); around a vertical edge A_bar = D_z (eq. 13).
 *
 * Near grazing: eq. 14 gives D_z = 10·lg 3 = 4.8 dB at z = 0, so a barrier that just cuts the
 * line of sight would screen 4.8 dB while one just below it screens nothing — a step. Here z
 * is signed: negative when the line of sight passes over the edge (z = −(path over the edge − d)),
 * and eq. 14 is continued down to 0 dB: D_z = 10·lg[max(1, 3 + (C2/λ)·C3·z·K_met)], K_met = 1
 * for z ≤ 0 (eq. 18). D_z then falls from 4.8 dB at z = 0 to 0 dB at z = −λ/10 (C2 = 20, C3 = 1)
 * and stays 0 below, with no step. The same continuation, with the argument kept at 1 or more,
 * is the diffraction term of CNOSSOS-EU (Commission Directive (EU) 2015/996, Annex, 2.5.6:
 * Δ_dif = 10·C_h·lg(3 + (40/λ)·C″·δ) when (40/λ)·C″·δ ≥ −2, else 0; δ negative when the line of
 * sight is not blocked). For z ≥ 0 the figures are eq. 14's unchanged.
 */
import { finite, nonNegative, positive } from '../../check.ts';
import { InputError } from '../../input-error.ts';

/** Constant C2 of eq. 14 when ground reflections are accounted for by A_gr. */
export const BARRIER_C2 = 20;
/** Speed of sound used for the wavelength, m/s. */
export const SPEED_OF_SOUND_M_PER_S = 340;
/** Upper limit of D_z for single diffraction, dB. */
export const BARRIER_SINGLE_CAP_DB = 20;
/** Upper limit of D_z for double diffraction, dB. */
export const BARRIER_DOUBLE_CAP_DB = 25;

const Z_ACCEPTED = 'a path difference in metres (negative when the line of sight passes over the edge)';

/**
 * The most negative path difference that still screens in any octave band, m: D_z reaches 0 dB
 * at z = −λ/10 (C2 = 20, C3 = 1), largest at the lowest band, 63 Hz: −(340/63)/10 = −0.540 m.
 */
export const GRAZING_FADE_M = -SPEED_OF_SOUND_M_PER_S / 63 / 10;

/** Wavelength λ, m, at a frequency: λ = c/f with c = 340 m/s. */
export function wavelengthM(frequencyHz: number): number {
  return SPEED_OF_SOUND_M_PER_S / positive('frequency', frequencyHz, 'a frequency in Hz greater than 0');
}

/**
 * Meteorological correction factor K_met (eq. 18):
 * K_met = exp[−(1/2000)·√(d_ss·d_sr·d/(2z))] for z > 0; 1 for z ≤ 0. Tends to 1 as z grows.
 * d_ss source to first edge, d_sr (last) edge to receiver, d source–receiver, all in m.
 * @example barrierKmet(50, 50, 100, 1) // 0.838
 */
export function barrierKmet(
  sourceToEdgeM: number,
  edgeToReceiverM: number,
  distanceM: number,
  pathDifferenceM: number,
): number {
  const z = finite('path difference', pathDifferenceM, 'a path difference in metres');
  if (z <= 0) return 1;
  const dss = nonNegative('source-to-edge distance', sourceToEdgeM, 'a distance in metres of 0 or more');
  const dsr = nonNegative('edge-to-receiver distance', edgeToReceiverM, 'a distance in metres of 0 or more');
  const d = positive('distance', distanceM, 'a source–receiver distance in metres greater than 0');
  return Math.exp(-(1 / 2000) * Math.sqrt((dss * dsr * d) / (2 * z)));
}

/**
 * C3 of eq. 14: 1 for single diffraction; for double diffraction (eq. 15)
 * C3 = [1 + (5λ/e)²] / [1/3 + (5λ/e)²], tending to 3 for e ≫ λ.
 */
export function barrierC3(wavelength: number, innerDistanceM?: number): number {
  if (innerDistanceM === undefined) return 1;
  const e = positive('distance between diffraction edges', innerDistanceM, 'a distance e in metres greater than 0');
  const r = ((5 * wavelength) / e) ** 2;
  return (1 + r) / (1 / 3 + r);
}

export interface BarrierDzInput {
  /** Frequency whose wavelength is used, Hz (the band's nominal mid-band frequency). */
  frequencyHz: number;
  /** Path difference z, m. */
  pathDifferenceM: number;
  /** Double diffraction (thick barrier or two barriers). */
  double?: boolean;
  /** Distance e between the two diffraction edges, m (double diffraction). */
  innerDistanceM?: number;
  /** K_met of eq. 18 (1 when not given, as for lateral diffraction). */
  kmet?: number;
}

/**
 * Barrier attenuation D_z, dB (eq. 14 with C2 = 20, C3 from eq. 15), capped at 20 dB single /
 * 25 dB double diffraction; a negative z (the line of sight passes over the edge) continues
 * eq. 14 down to 0 dB (see the module's header), so D_z is continuous through grazing.
 * @example barrierDzDb({ frequencyHz: 500, pathDifferenceM: 1 }) // 15.1
 * @example barrierDzDb({ frequencyHz: 500, pathDifferenceM: -0.034 }) // 3.0 (10·lg 2; 0 from z = −0.068 m down)
 */
export function barrierDzDb(input: BarrierDzInput): number {
  const lambda = wavelengthM(input.frequencyHz);
  const z = finite('barrier path difference', input.pathDifferenceM, Z_ACCEPTED);
  const kmet = input.kmet === undefined ? 1 : positive('K_met', input.kmet, 'a factor above 0 and up to 1');
  if (kmet > 1) throw new InputError('K_met', kmet, 'is out of range', 'use a factor above 0 and up to 1');
  let c3 = 1;
  if (input.double) {
    if (input.innerDistanceM === undefined) {
      throw new InputError(
        'distance between diffraction edges',
        undefined,
        'given',
        'give e in metres for double diffraction',
      );
    }
    c3 = barrierC3(lambda, input.innerDistanceM);
  }
  const dz = 10 * Math.log10(Math.max(1, 3 + (BARRIER_C2 / lambda) * c3 * z * kmet));
  return Math.min(dz, input.double ? BARRIER_DOUBLE_CAP_DB : BARRIER_SINGLE_CAP_DB);
}

/**
 * Barrier attenuation over the top edge, dB: A_bar = D_z − A_gr, not below 0 (eq. 12),
 * A_gr the ground attenuation without the barrier.
 * @example topEdgeBarrierAttenuationDb(15.1, 4.5) // 10.6
 */
export function topEdgeBarrierAttenuationDb(dzDb: number, groundAttenuationDb: number): number {
  finite('D_z', dzDb, 'a barrier attenuation in dB');
  finite('A_gr', groundAttenuationDb, 'a ground attenuation in dB');
  return Math.max(0, dzDb - groundAttenuationDb);
}
