/**
 * ISO 9613-2:1996 clause 7.2 — atmospheric absorption A_atm, with α from ISO 9613-1:1993.
 */
import { nonNegative, positive } from '../../check.ts';

/**
 * Attenuation due to atmospheric absorption, dB: A_atm = α·d/1000 (eq. 8),
 * α the atmospheric attenuation coefficient in dB/km at the band's mid-band frequency,
 * d the source–receiver distance in m.
 * @example atmosphericAttenuationDb(4.98, 200) // 0.996
 */
export function atmosphericAttenuationDb(alphaDbPerKm: number, distanceM: number): number {
  nonNegative('attenuation coefficient', alphaDbPerKm, 'a coefficient in dB/km of 0 or more');
  positive('distance', distanceM, 'a source–receiver distance in metres greater than 0');
  return (alphaDbPerKm * distanceM) / 1000;
}
