/**
 * ISO 4871:1996 Acoustics — Declaration and verification of noise emission values of
 * machinery and equipment.
 *
 * A declaration is either the dual-number form (measured value L and its uncertainty K) or
 * the single-number form, the declared value Ld = L + K (clause 3). The guaranteed sound power
 * level of Directive 2000/14/EC is a single-number value.
 *
 * For ranking: two candidates whose rated values differ by less than the uncertainties allow
 * could swap places. The ledger calls a pair "too close to call" when their difference is
 * not more than the larger of their two K (each level could be up to K lower than rated).
 */
import { nonNegative, finite, positive } from '../check.ts';

/**
 * How many standard deviations the declared uncertainty K stands for: K ≈ 1.645·σ, the
 * one-sided 95 % point of a normal distribution, for a declared value a batch of machines
 * stays under with 95 % probability. From memory of ISO 4871:1996 and its use with
 * ISO 3744-type measurements; a project may set another factor.
 */
export const K_PER_STANDARD_DEVIATION = 1.645;

/**
 * Standard deviation σ of a machine's true level about its mean, dB, from its declared
 * uncertainty K: σ = K / f, f = {@link K_PER_STANDARD_DEVIATION} by default (from memory).
 * @example standardDeviationFromK(3.29) // 2
 */
export function standardDeviationFromK(
  uncertaintyDb: number,
  kPerStandardDeviation: number = K_PER_STANDARD_DEVIATION,
): number {
  nonNegative('uncertainty K', uncertaintyDb, 'an uncertainty K in dB of 0 or more');
  positive('K per standard deviation', kPerStandardDeviation, 'a factor greater than 0, e.g. 1.645');
  return uncertaintyDb / kPerStandardDeviation;
}

/**
 * Declared single-number value Ld = L + K (clause 3.x, single-number form).
 * @example declaredValueDb(101, 2) // 103
 */
export function declaredValueDb(measuredDb: number, uncertaintyDb: number): number {
  finite('measured level L', measuredDb, 'a level in dB');
  nonNegative('uncertainty K', uncertaintyDb, 'an uncertainty K in dB of 0 or more');
  return measuredDb + uncertaintyDb;
}

/** A rated level with the uncertainty K behind it. */
export interface UncertainLevel {
  id: string;
  levelDb: number;
  uncertaintyDb: number;
}

/**
 * Pairs whose order could change within ±K: |La − Lb| ≤ max(Ka, Kb). O(n²) over the list.
 * @example closeCalls([{id:'a',levelDb:100,uncertaintyDb:2},{id:'b',levelDb:101.5,uncertaintyDb:1}]) // [['a','b']]
 */
export function closeCalls(levels: readonly UncertainLevel[]): [string, string][] {
  const pairs: [string, string][] = [];
  for (let i = 0; i < levels.length; i++) {
    for (let j = i + 1; j < levels.length; j++) {
      const a = levels[i] as UncertainLevel;
      const b = levels[j] as UncertainLevel;
      if (!Number.isFinite(a.levelDb) || !Number.isFinite(b.levelDb)) continue;
      if (Math.abs(a.levelDb - b.levelDb) <= Math.max(a.uncertaintyDb, b.uncertaintyDb)) pairs.push([a.id, b.id]);
    }
  }
  return pairs;
}
