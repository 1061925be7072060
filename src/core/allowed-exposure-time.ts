/**
 * Time until a daily exposure criterion is reached.
 *
 * With a criterion level Lc over 8 h and an exchange rate q (dB per halving of time):
 * T = 8 h / 2^((L − Lc)/q). The NIOSH recommended exposure limit uses Lc = 85 dB(A), q = 3 dB
 * (NIOSH 98-126, Criteria for a Recommended Standard: Occupational Noise Exposure, 1998);
 * the US OSHA rule (29 CFR 1910.95) uses 90 dB(A) and 5 dB.
 * With q = 3 this is the time at which L_EX,8h reaches Lc (equal-energy rule).
 */
import { finite, positive } from './check.ts';

export const NIOSH_CRITERION = { criterionDb: 85, exchangeRateDb: 3 } as const;
export const OSHA_CRITERION = { criterionDb: 90, exchangeRateDb: 5 } as const;

/**
 * Allowed daily time at a level before the criterion is reached, hours (may exceed 24 when the level is low).
 * @example allowedHours(88) // 4
 */
export function allowedHours(
  levelDb: number,
  criterion: { criterionDb: number; exchangeRateDb: number } = NIOSH_CRITERION,
): number {
  finite('level', levelDb, 'an A-weighted level in dB');
  positive('exchange rate', criterion.exchangeRateDb, 'an exchange rate in dB greater than 0');
  return 8 / 2 ** ((levelDb - criterion.criterionDb) / criterion.exchangeRateDb);
}
