/**
 * Distance at which a point source's level falls to a criterion, and the area inside it.
 *
 * From the point-source relation (common practice; textbook) Lp = Lw + 10·lg(Q / (4π r²)),
 * solving Lp = L_crit for r gives
 *   r = √( Q · 10^((Lw − L_crit)/10) / (4π) ),
 * and the area of the disc inside it A = π r² = Q · 10^((Lw − L_crit)/10) / 4.
 * Each 3 dB less sound power halves the area (10^(−3/10) ≈ 0.501), each 10 dB divides it by 10.
 * Only geometric spreading counts: no air absorption, ground effect, screening or reflection,
 * so beyond a few hundred metres the distance overstates; near the machine (within a few
 * times its size) a point source does not describe it.
 */
import { ratioFromDb } from './decibel.ts';
import { finite } from './check.ts';
import { checkDirectivity } from './directivity.ts';

/**
 * Distance r, m, at which a point source of sound power level `lwDb` falls to `criterionDb`.
 * @example criterionDistanceM(105, 65, 2) // 39.89
 */
export function criterionDistanceM(lwDb: number, criterionDb: number, q: number): number {
  return Math.sqrt(criterionAreaM2(lwDb, criterionDb, q) / Math.PI);
}

/**
 * Area πr², m², of the disc around a point source inside which its level exceeds `criterionDb`:
 * Q · 10^((Lw − L_crit)/10) / 4.
 * @example criterionAreaM2(105, 65, 2) // 5000
 */
export function criterionAreaM2(lwDb: number, criterionDb: number, q: number): number {
  finite('sound power level', lwDb, 'a level in dB, e.g. 104.5');
  finite('criterion', criterionDb, 'a level in dB, e.g. 65');
  const factor = checkDirectivity(q);
  return (factor * ratioFromDb(lwDb - criterionDb)) / 4;
}
