/**
 * IEC 61672-1:2013 Electroacoustics — Sound level meters — Part 1: Specifications.
 * Frequency weighting A at the octave-band nominal frequencies 63 Hz … 8 kHz (Table 3,
 * rounded to 0.1 dB), and the A-weighted total of an octave-band spectrum.
 */
import { dbSum } from '../decibel.ts';
import { checkOctaveBands } from '../octave-bands.ts';

/**
 * A-weighting, dB, at 63, 125, 250, 500, 1000, 2000, 4000 and 8000 Hz
 * (IEC 61672-1:2013 Table 3, nominal frequencies).
 */
export const A_WEIGHTING_OCTAVE_DB: readonly number[] = Object.freeze([-26.2, -16.1, -8.6, -3.2, 0, 1.2, 1.0, -1.1]);

/**
 * A-weighted total of eight octave-band levels (63 Hz … 8 kHz): L_A = 10·lg Σ 10^((Li + Ai)/10).
 * @example aWeightedTotalDb([100, 100, 100, 100, 100, 100, 100, 100]) // 106.99
 */
export function aWeightedTotalDb(bandsDb: readonly number[]): number {
  const bands = checkOctaveBands('octave-band levels', bandsDb);
  return dbSum(bands.map((level, i) => level + (A_WEIGHTING_OCTAVE_DB[i] as number)));
}

/** Each of eight octave-band levels with its A-weighting added, dB. */
export function aWeightedBandsDb(bandsDb: readonly number[]): number[] {
  return checkOctaveBands('octave-band levels', bandsDb).map(
    (level, i) => level + (A_WEIGHTING_OCTAVE_DB[i] as number),
  );
}
