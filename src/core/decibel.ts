/**
 * Decibel arithmetic, written once and called everywhere else.
 *
 * Levels of incoherent sources add energetically: L = 10·lg Σ 10^(Li/10)
 * (common practice; ISO 1996-1:2016 clause 3 defines the equivalent level the same way).
 * No other module sums levels itself.
 */
import { finite, positive, wholeNumber } from './check.ts';
import { InputError } from './input-error.ts';

/** Level in dB of an energy (power or mean-square) ratio: 10·lg(ratio). */
export function dbFromRatio(ratio: number): number {
  return 10 * Math.log10(ratio);
}

/** Energy ratio of a level in dB: 10^(L/10). */
export function ratioFromDb(levelDb: number): number {
  return 10 ** (levelDb / 10);
}

/**
 * Energetic sum of levels, L = 10·lg Σ 10^(Li/10).
 * An empty list is silence: −Infinity. Levels of −Infinity (a source switched off) add nothing.
 * O(n).
 * @example dbSum([90, 90]) // 93.0103
 */
export function dbSum(levelsDb: readonly number[]): number {
  let energy = 0;
  for (let i = 0; i < levelsDb.length; i++) {
    const level = levelsDb[i] as number;
    if (Number.isNaN(level) || level === Infinity) finite(`level ${i + 1}`, level, 'a level in dB');
    energy += 10 ** (level / 10);
  }
  return energy === 0 ? -Infinity : 10 * Math.log10(energy);
}

/**
 * Energetic mean of levels, L = 10·lg[(1/n) Σ 10^(Li/10)].
 * @example dbMean([80, 90]) // 87.4036
 */
export function dbMean(levelsDb: readonly number[]): number {
  if (levelsDb.length === 0) throw new InputError('levels', [], 'is empty', 'give at least one level');
  return dbSum(levelsDb) - 10 * Math.log10(levelsDb.length);
}

/**
 * Energetic subtraction: the level that, added to `partDb`, gives `totalDb`.
 * L = 10·lg(10^(Ltotal/10) − 10^(Lpart/10)). Used to take a source (or a background)
 * out of a total. Throws when the remainder is not positive.
 * @example dbSub(93.0103, 90) // 90.0
 */
export function dbSub(totalDb: number, partDb: number): number {
  finite('total level', totalDb, 'a level in dB');
  if (partDb === -Infinity) return totalDb;
  finite('level to subtract', partDb, 'a level in dB');
  const remainder = 10 ** (totalDb / 10) - 10 ** (partDb / 10);
  if (!(remainder > 0)) {
    throw new InputError(
      'level to subtract',
      partDb,
      `is not below the total of ${totalDb} dB, so nothing would remain`,
      'subtract a level lower than the total',
    );
  }
  return 10 * Math.log10(remainder);
}

/**
 * Level of n identical incoherent sources: L + 10·lg n (common practice).
 * @example dbOfIdentical(90, 10) // 100
 */
export function dbOfIdentical(levelDb: number, count: number): number {
  finite('level', levelDb, 'a level in dB');
  wholeNumber('count', count, 1, 'a whole number of machines, 1 or more');
  return levelDb + 10 * Math.log10(count);
}

/** One period of an assessment: its level and its duration (any unit of time). */
export interface TimedLevel {
  levelDb: number;
  duration: number;
}

/**
 * Equivalent continuous level over periods of different level (ISO 1996-1, eq. for L_Aeq,T):
 * LAeq,T = 10·lg[(1/T) Σ ti·10^(Li/10)], with T = Σ ti unless a longer `totalDuration` is given
 * (the remaining time is silent).
 * O(n).
 * @example timeAverageDb([{ levelDb: 80, duration: 4 }, { levelDb: 70, duration: 4 }]) // 77.40
 */
export function timeAverageDb(periods: readonly TimedLevel[], totalDuration?: number): number {
  if (periods.length === 0) throw new InputError('periods', [], 'is empty', 'give at least one period');
  let weighted = 0;
  let sumDurations = 0;
  periods.forEach((p, i) => {
    if (p.levelDb !== -Infinity) finite(`period ${i + 1} level`, p.levelDb, 'a level in dB');
    const t = finite(`period ${i + 1} duration`, p.duration, 'a duration of 0 or more');
    if (t < 0) throw new InputError(`period ${i + 1} duration`, t, 'is out of range', 'use a duration of 0 or more');
    weighted += t * 10 ** (p.levelDb / 10);
    sumDurations += t;
  });
  const total =
    totalDuration === undefined ? sumDurations : positive('total duration', totalDuration, 'a duration greater than 0');
  if (total <= 0)
    throw new InputError('periods', periods, 'have no duration', 'give at least one period longer than 0');
  if (total < sumDurations - 1e-9) {
    throw new InputError(
      'total duration',
      total,
      `is shorter than the periods (${sumDurations})`,
      'use a total at least as long as the periods',
    );
  }
  return weighted === 0 ? -Infinity : 10 * Math.log10(weighted / total);
}
