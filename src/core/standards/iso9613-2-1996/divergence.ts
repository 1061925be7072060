/**
 * ISO 9613-2:1996 clause 7.1 — geometrical divergence A_div.
 */
import { positive } from '../../check.ts';

/** Reference distance d0, m (eq. 7). */
export const REFERENCE_DISTANCE_M = 1;

/**
 * Attenuation due to geometrical divergence (spherical spreading from a point source), dB:
 * A_div = 20·lg(d/d0) + 11, d the source–receiver distance in m, d0 = 1 m (eq. 7).
 * @example divergenceDb(100) // 51
 */
export function divergenceDb(distanceM: number): number {
  positive('distance', distanceM, 'a source–receiver distance in metres greater than 0');
  return 20 * Math.log10(distanceM / REFERENCE_DISTANCE_M) + 11;
}
