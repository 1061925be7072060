/**
 * Point source in a free field (common practice; textbook):
 * Lp = Lw + 10·lg(Q / (4π r²)), r in metres, Q the directivity factor (1, 2, 4 or 8).
 * Equivalently Lp = Lw − 20·lg r − 10.99 + 10·lg Q.
 */
import { dbFromRatio } from './decibel.ts';
import { finite, positive } from './check.ts';
import { checkDirectivity } from './directivity.ts';

const DISTANCE_ACCEPTED = 'a distance in metres greater than 0, e.g. 25';

/**
 * Spreading term of a point source, dB (signed): 10·lg(Q / (4π r²)).
 * Negative beyond r = √(Q/(4π)) (0.282 m for Q = 1).
 * @example pointSourceSpreadingDb(10, 2) // -27.98
 */
export function pointSourceSpreadingDb(distanceM: number, q: number): number {
  positive('distance', distanceM, DISTANCE_ACCEPTED);
  const factor = checkDirectivity(q);
  return dbFromRatio(factor / (4 * Math.PI * distanceM * distanceM));
}

/**
 * Sound pressure level Lp at distance r from a point source of sound power level Lw:
 * Lp = Lw + 10·lg(Q / (4π r²)).
 * @example pointSourceLevelDb(100, 10, 2) // 72.02
 */
export function pointSourceLevelDb(lwDb: number, distanceM: number, q: number): number {
  finite('sound power level', lwDb, 'a level in dB, e.g. 104.5');
  return lwDb + pointSourceSpreadingDb(distanceM, q);
}

/**
 * Back-calculation of the sound power level from a pressure level measured at a distance:
 * Lw = Lp − 10·lg(Q / (4π r²)) = Lp + 20·lg r + 10.99 − 10·lg Q.
 * @example soundPowerFromPressureDb(72.02, 10, 2) // 100.0
 */
export function soundPowerFromPressureDb(lpDb: number, distanceM: number, q: number): number {
  finite('sound pressure level', lpDb, 'a level in dB, e.g. 78');
  return lpDb - pointSourceSpreadingDb(distanceM, q);
}
