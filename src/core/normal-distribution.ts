/**
 * The standard normal distribution: its cumulative distribution function Φ and its inverse.
 *
 * Φ(z) = ½·[1 + erf(z/√2)], with erf from Abramowitz & Stegun, Handbook of Mathematical
 * Functions (1964), formula 7.1.26 (absolute error of erf below 1.5·10⁻⁷). The inverse is
 * found by bisection on Φ, so Φ(Φ⁻¹(p)) = p to the accuracy of Φ.
 */
import { InputError } from './input-error.ts';

/** Abramowitz & Stegun 7.1.26 coefficients for erf(x), x ≥ 0. */
const P = 0.3275911;
const A1 = 0.254829592;
const A2 = -0.284496736;
const A3 = 1.421413741;
const A4 = -1.453152027;
const A5 = 1.061405429;

/**
 * Error function erf(x) (Abramowitz & Stegun 7.1.26; odd: erf(−x) = −erf(x)). O(1).
 * @example erf(1) // 0.8427 (tables: 0.842701)
 */
export function erf(x: number): number {
  const sign = x < 0 ? -1 : 1;
  const ax = Math.abs(x);
  const t = 1 / (1 + P * ax);
  const y = 1 - ((((A5 * t + A4) * t + A3) * t + A2) * t + A1) * t * Math.exp(-ax * ax);
  return sign * y;
}

/**
 * Standard normal cumulative distribution Φ(z): the probability that a standard normal
 * variable is at or below z. Φ(−∞) = 0, Φ(+∞) = 1, NaN for NaN. O(1).
 * @example normalCdf(1.6449) // 0.95
 */
export function normalCdf(z: number): number {
  if (Number.isNaN(z)) return NaN;
  if (z === Infinity) return 1;
  if (z === -Infinity) return 0;
  return Math.min(1, Math.max(0, 0.5 * (1 + erf(z / Math.SQRT2))));
}

/**
 * Inverse of Φ: the z with Φ(z) = p, for 0 < p < 1 (bisection, 200 halvings of [−40, 40];
 * 0 → −∞, 1 → +∞). Throws for p outside [0, 1]. O(1).
 * @example normalQuantile(0.9) // 1.2816
 */
export function normalQuantile(p: number): number {
  if (typeof p !== 'number' || !(p >= 0 && p <= 1))
    throw new InputError('probability', p, 'is out of range', 'use a probability from 0 to 1');
  if (p === 0) return -Infinity;
  if (p === 1) return Infinity;
  let lo = -40;
  let hi = 40;
  for (let i = 0; i < 200 && hi - lo > 1e-12; i++) {
    const mid = (lo + hi) / 2;
    if (normalCdf(mid) < p) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}
