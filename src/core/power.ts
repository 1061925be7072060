/**
 * Sound power and sound pressure levels and their physical quantities.
 *
 * - Sound power level Lw = 10·lg(W / W0), W0 = 1 pW (ISO 3744 family; IEC 60050-801).
 * - Sound pressure level Lp = 20·lg(p / p0), p0 = 20 µPa (IEC 60050-801).
 * Power takes 10·lg, pressure (a field quantity) takes 20·lg because power goes with its square.
 */
import { dbFromRatio, ratioFromDb } from './decibel.ts';
import { finite, positive } from './check.ts';

/** Reference sound power W0, W (1 pW). */
export const REFERENCE_POWER_W = 1e-12;
/** Reference sound pressure p0, Pa (20 µPa). */
export const REFERENCE_PRESSURE_PA = 20e-6;

/**
 * Sound power level Lw in dB re 1 pW of a sound power in watts: Lw = 10·lg(W / W0).
 * @example lwFromWatts(1) // 120
 */
export function lwFromWatts(watts: number): number {
  positive('sound power', watts, 'a sound power in watts greater than 0, e.g. 0.5');
  return dbFromRatio(watts / REFERENCE_POWER_W);
}

/**
 * Sound power in watts of a sound power level Lw in dB re 1 pW: W = W0·10^(Lw/10).
 * @example wattsFromLw(120) // 1
 */
export function wattsFromLw(lwDb: number): number {
  finite('sound power level', lwDb, 'a level in dB, e.g. 104.5');
  return REFERENCE_POWER_W * ratioFromDb(lwDb);
}

/**
 * Sound pressure level Lp in dB re 20 µPa of an RMS sound pressure in pascals:
 * Lp = 20·lg(p / p0) = 10·lg((p / p0)²).
 * @example lpFromPascals(1) // 93.98
 */
export function lpFromPascals(pascals: number): number {
  positive('sound pressure', pascals, 'an RMS sound pressure in pascals greater than 0, e.g. 0.2');
  return dbFromRatio((pascals / REFERENCE_PRESSURE_PA) ** 2);
}

/**
 * RMS sound pressure in pascals of a sound pressure level in dB re 20 µPa: p = p0·10^(Lp/20).
 * @example pascalsFromLp(94) // 1.00237
 */
export function pascalsFromLp(lpDb: number): number {
  finite('sound pressure level', lpDb, 'a level in dB, e.g. 65');
  return REFERENCE_PRESSURE_PA * Math.sqrt(ratioFromDb(lpDb));
}
