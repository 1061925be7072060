/**
 * ISO 9613-2:1996 clause 7.3.1 — ground attenuation A_gr, general method (octave bands).
 *
 * A_gr = A_s + A_r + A_m (eq. 9), the source, receiver and middle regions, from Table 3:
 *
 * | band     | A_s or A_r (h = h_s or h_r, G = G_s or G_r) | A_m          |
 * |----------|---------------------------------------------|--------------|
 * | 63 Hz    | −1.5                                        | −3q          |
 * | 125 Hz   | −1.5 + G·a'(h)                              | −3q(1 − G_m) |
 * | 250 Hz   | −1.5 + G·b'(h)                              | −3q(1 − G_m) |
 * | 500 Hz   | −1.5 + G·c'(h)                              | −3q(1 − G_m) |
 * | 1 kHz    | −1.5 + G·d'(h)                              | −3q(1 − G_m) |
 * | 2–8 kHz  | −1.5·(1 − G)                                | −3q(1 − G_m) |
 *
 * a'(h) = 1.5 + 3.0·e^(−0.12(h−5)²)·(1 − e^(−d_p/50)) + 5.7·e^(−0.09h²)·(1 − e^(−2.8·10⁻⁶·d_p²))
 * b'(h) = 1.5 + 8.6·e^(−0.09h²)·(1 − e^(−d_p/50))
 * c'(h) = 1.5 + 14.0·e^(−0.46h²)·(1 − e^(−d_p/50))
 * d'(h) = 1.5 + 5.0·e^(−0.9h²)·(1 − e^(−d_p/50))
 * q = 0 for d_p ≤ 30(h_s + h_r); q = 1 − 30(h_s + h_r)/d_p otherwise.
 * Valid for ground that is flat or of constant slope.
 */
import { positive } from '../../check.ts';
import { checkHeight, groundFactors, type GroundFactors } from './geometry.ts';

const DP_ACCEPTED = 'a projected source–receiver distance in metres greater than 0';

/** a'(h) of Table 3 (125 Hz). */
export function groundShapeA(heightM: number, projectedDistanceM: number): number {
  const h = checkHeight('height', heightM);
  const dp = positive('projected distance', projectedDistanceM, DP_ACCEPTED);
  return (
    1.5 +
    3.0 * Math.exp(-0.12 * (h - 5) ** 2) * (1 - Math.exp(-dp / 50)) +
    5.7 * Math.exp(-0.09 * h * h) * (1 - Math.exp(-2.8e-6 * dp * dp))
  );
}

/** b'(h) of Table 3 (250 Hz). */
export function groundShapeB(heightM: number, projectedDistanceM: number): number {
  const h = checkHeight('height', heightM);
  const dp = positive('projected distance', projectedDistanceM, DP_ACCEPTED);
  return 1.5 + 8.6 * Math.exp(-0.09 * h * h) * (1 - Math.exp(-dp / 50));
}

/** c'(h) of Table 3 (500 Hz). */
export function groundShapeC(heightM: number, projectedDistanceM: number): number {
  const h = checkHeight('height', heightM);
  const dp = positive('projected distance', projectedDistanceM, DP_ACCEPTED);
  return 1.5 + 14.0 * Math.exp(-0.46 * h * h) * (1 - Math.exp(-dp / 50));
}

/** d'(h) of Table 3 (1 kHz). */
export function groundShapeD(heightM: number, projectedDistanceM: number): number {
  const h = checkHeight('height', heightM);
  const dp = positive('projected distance', projectedDistanceM, DP_ACCEPTED);
  return 1.5 + 5.0 * Math.exp(-0.9 * h * h) * (1 - Math.exp(-dp / 50));
}

/** Middle-region factor q of Table 3: 0 when d_p ≤ 30(h_s + h_r), else 1 − 30(h_s + h_r)/d_p. */
export function middleRegionFactor(projectedDistanceM: number, sourceHeightM: number, receiverHeightM: number): number {
  const dp = positive('projected distance', projectedDistanceM, DP_ACCEPTED);
  const span = 30 * (checkHeight('source height', sourceHeightM) + checkHeight('receiver height', receiverHeightM));
  return dp <= span ? 0 : 1 - span / dp;
}

/** A_s or A_r of Table 3 in band `bandIndex` (0 = 63 Hz … 7 = 8 kHz), dB. */
export function regionAttenuationDb(bandIndex: number, g: number, heightM: number, projectedDistanceM: number): number {
  switch (bandIndex) {
    case 0:
      return -1.5;
    case 1:
      return -1.5 + g * groundShapeA(heightM, projectedDistanceM);
    case 2:
      return -1.5 + g * groundShapeB(heightM, projectedDistanceM);
    case 3:
      return -1.5 + g * groundShapeC(heightM, projectedDistanceM);
    case 4:
      return -1.5 + g * groundShapeD(heightM, projectedDistanceM);
    default:
      return -1.5 * (1 - g);
  }
}

/** The three parts of A_gr in one octave band, dB, and their sum. */
export interface GroundAttenuationBand {
  as: number;
  ar: number;
  am: number;
  total: number;
}

export interface GeneralGroundInput {
  /** Source–receiver distance projected onto the ground plane d_p, m. */
  projectedDistanceM: number;
  sourceHeightM: number;
  receiverHeightM: number;
  /** G for all three regions, 0 hard … 1 porous. */
  groundFactor: number;
  /** G per region where it differs. */
  groundFactors?: Partial<GroundFactors>;
}

/**
 * A_gr = A_s + A_r + A_m in each octave band 63 Hz … 8 kHz, dB (eq. 9, Table 3).
 * @example generalGroundAttenuationDb({ projectedDistanceM: 1000, sourceHeightM: 1, receiverHeightM: 1, groundFactor: 0 })[0].total // -5.82
 */
export function generalGroundAttenuationDb(input: GeneralGroundInput): GroundAttenuationBand[] {
  const g = groundFactors(input.groundFactor, input.groundFactors);
  const q = middleRegionFactor(input.projectedDistanceM, input.sourceHeightM, input.receiverHeightM);
  const bands: GroundAttenuationBand[] = [];
  for (let band = 0; band < 8; band++) {
    const as = regionAttenuationDb(band, g.source, input.sourceHeightM, input.projectedDistanceM);
    const ar = regionAttenuationDb(band, g.receiver, input.receiverHeightM, input.projectedDistanceM);
    const am = band === 0 ? -3 * q : -3 * q * (1 - g.middle);
    bands.push({ as, ar, am, total: as + ar + am });
  }
  return bands;
}

/** The last heights' factors of Table 3 that depend on h alone (a path table or a map has few heights). */
const recentHeights: { h: number; e: Float64Array }[] = [];
const RECENT_HEIGHTS = 4;

/**
 * exp(−0.09h²), exp(−0.12(h − 5)²), exp(−0.46h²), exp(−0.9h²) of Table 3's shapes for a height,
 * computed once among the last {@link RECENT_HEIGHTS} heights asked for: the same numbers. O(1).
 */
function heightFactors(h: number): Float64Array {
  for (const r of recentHeights) if (r.h === h) return r.e;
  const e = Float64Array.of(
    Math.exp(-0.09 * h * h),
    Math.exp(-0.12 * (h - 5) ** 2),
    Math.exp(-0.46 * h * h),
    Math.exp(-0.9 * h * h),
  );
  recentHeights.unshift({ h, e });
  if (recentHeights.length > RECENT_HEIGHTS) recentHeights.pop();
  return e;
}

/**
 * The region attenuation of bands 0 … 7 (A_s or A_r of Table 3) for a height and ground
 * factor already checked, dp > 0 finite: the same expressions as {@link regionAttenuationDb},
 * with the factors shared between bands computed once. Adds into out[0 … 7].
 */
function addRegionUnchecked(out: Float64Array, g: number, h: number, decay50: number, decayQuadratic: number): void {
  const e = heightFactors(h);
  const e009 = e[0] as number;
  const shapeA = 1.5 + 3.0 * (e[1] as number) * decay50 + 5.7 * e009 * decayQuadratic;
  const shapeB = 1.5 + 8.6 * e009 * decay50;
  const shapeC = 1.5 + 14.0 * (e[2] as number) * decay50;
  const shapeD = 1.5 + 5.0 * (e[3] as number) * decay50;
  out[0] = -1.5;
  out[1] = -1.5 + g * shapeA;
  out[2] = -1.5 + g * shapeB;
  out[3] = -1.5 + g * shapeC;
  out[4] = -1.5 + g * shapeD;
  const high = -1.5 * (1 - g);
  out[5] = high;
  out[6] = high;
  out[7] = high;
}

const sourceRegion = new Float64Array(8);
const receiverRegion = new Float64Array(8);

/**
 * The totals A_gr = A_s + A_r + A_m of {@link generalGroundAttenuationDb}, band by band,
 * without the parts: the same checks in the same order, then the same sums (to the last
 * bit) with the shape factors' exponentials computed once per region. Written into `into`
 * when given (eight values; a table of many paths reuses one), else into a new array. O(8).
 */
export function generalGroundTotalsDb(input: GeneralGroundInput, into?: Float64Array): Float64Array {
  const g = groundFactors(input.groundFactor, input.groundFactors);
  const q = middleRegionFactor(input.projectedDistanceM, input.sourceHeightM, input.receiverHeightM);
  // middleRegionFactor has checked d_p (finite, > 0) and both heights: the shapes cannot refuse them now.
  const dp = input.projectedDistanceM;
  const decay50 = 1 - Math.exp(-dp / 50);
  const decayQuadratic = 1 - Math.exp(-2.8e-6 * dp * dp);
  addRegionUnchecked(sourceRegion, g.source, input.sourceHeightM, decay50, decayQuadratic);
  addRegionUnchecked(receiverRegion, g.receiver, input.receiverHeightM, decay50, decayQuadratic);
  const totals = into ?? new Float64Array(8);
  for (let band = 0; band < 8; band++) {
    const am = band === 0 ? -3 * q : -3 * q * (1 - g.middle);
    totals[band] = (sourceRegion[band] as number) + (receiverRegion[band] as number) + am;
  }
  return totals;
}
