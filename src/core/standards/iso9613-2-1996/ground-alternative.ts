/**
 * ISO 9613-2:1996 clause 7.3.2 — ground attenuation A_gr, alternative method for
 * A-weighted levels (sound travelling mostly over porous ground, no pure tones), and the
 * correction D_Ω for reflection by the ground near the source that goes with it.
 */
import { nonNegative, positive } from '../../check.ts';
import { checkHeight } from './geometry.ts';

/**
 * Ground attenuation, alternative method, dB: A_gr = 4.8 − (2h_m/d)·(17 + 300/d) ≥ 0 (eq. 10),
 * h_m the mean height of the propagation path above the ground in m, d the source–receiver
 * distance in m. Negative values are replaced by 0.
 * @example alternativeGroundAttenuationDb(200, 1.5) // 4.52
 */
export function alternativeGroundAttenuationDb(distanceM: number, meanHeightM: number): number {
  const d = positive('distance', distanceM, 'a source–receiver distance in metres greater than 0');
  const hm = nonNegative(
    'mean path height',
    meanHeightM,
    'a mean height of the path above ground in metres of 0 or more',
  );
  return Math.max(0, 4.8 - ((2 * hm) / d) * (17 + 300 / d));
}

/**
 * Directivity correction for the ground reflection, dB, added to D_c when A_gr comes from eq. 10:
 * D_Ω = 10·lg{1 + [d_p² + (h_s − h_r)²] / [d_p² + (h_s + h_r)²]} (eq. 11).
 * Tends to 10·lg 2 = 3.01 dB when d_p is large against the heights.
 * @example groundReflectionCorrectionDb(200, 1, 4) // 3.01
 */
export function groundReflectionCorrectionDb(
  projectedDistanceM: number,
  sourceHeightM: number,
  receiverHeightM: number,
): number {
  const dp = positive(
    'projected distance',
    projectedDistanceM,
    'a projected source–receiver distance in metres greater than 0',
  );
  const hs = checkHeight('source height', sourceHeightM);
  const hr = checkHeight('receiver height', receiverHeightM);
  return 10 * Math.log10(1 + (dp * dp + (hs - hr) ** 2) / (dp * dp + (hs + hr) ** 2));
}
