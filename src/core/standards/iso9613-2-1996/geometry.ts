/**
 * Geometry shared by the ISO 9613-2:1996 terms: heights, ground factors and the
 * source–receiver distance projected onto the ground plane.
 */
import { finite, inRange, nonNegative, positive } from '../../check.ts';
import { InputError } from '../../input-error.ts';

/** Ground factor G per region (clause 7.3.1): 0 hard, 1 porous. */
export interface GroundFactors {
  source: number;
  middle: number;
  receiver: number;
}

const G_ACCEPTED = 'a ground factor G from 0 (hard) to 1 (porous)';

/** Checks a ground factor G (0 hard … 1 porous). */
export function checkGroundFactor(input: string, g: number): number {
  return inRange(input, g, 0, 1, G_ACCEPTED);
}

/** Checks a height above ground, m (0 or more). */
export function checkHeight(input: string, heightM: number): number {
  return nonNegative(input, heightM, 'a height above ground in metres of 0 or more');
}

/**
 * Source–receiver distance projected onto the ground plane d_p, m, from the direct
 * distance d and the heights: d_p = √(d² − (h_s − h_r)²).
 */
export function projectedDistanceM(distanceM: number, sourceHeightM: number, receiverHeightM: number): number {
  positive('distance', distanceM, 'a source–receiver distance in metres greater than 0');
  checkHeight('source height', sourceHeightM);
  checkHeight('receiver height', receiverHeightM);
  const dh = sourceHeightM - receiverHeightM;
  const dp2 = distanceM * distanceM - dh * dh;
  if (!(dp2 > 0)) {
    throw new InputError(
      'distance',
      distanceM,
      `is not longer than the height difference of ${Math.abs(dh)} m`,
      'use a direct source–receiver distance longer than the height difference',
    );
  }
  return Math.sqrt(dp2);
}

/** Resolves one G for all regions, or a G per region where given. */
export function groundFactors(g: number, perRegion?: Partial<GroundFactors>): GroundFactors {
  finite('ground factor', g, G_ACCEPTED);
  return {
    source: checkGroundFactor('source ground factor', perRegion?.source ?? g),
    middle: checkGroundFactor('middle ground factor', perRegion?.middle ?? g),
    receiver: checkGroundFactor('receiver ground factor', perRegion?.receiver ?? g),
  };
}
