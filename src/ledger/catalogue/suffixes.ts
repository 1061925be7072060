/**
 * Unit words a typed or imported number may carry after it ("104 dB(A)", "7.5 kW", "6 h"),
 * ignored when the number is read. Longest first, so "dB(A)" is taken before "dB".
 */
export const DB_SUFFIXES = ['dB(A)', 'dB (A)', 'dBA', 'dB'] as const;
export const HOUR_SUFFIXES = ['hours', 'hrs', 'h'] as const;
export const KW_SUFFIXES = ['kW'] as const;
export const DAY_SUFFIXES = ['days', 'day', 'd'] as const;
/** The size a Directive 2000/14/EC limit is set by: breaker mass, cutting width, generator power. */
export const SIZE_SUFFIXES = ['kg', 'cm', 'kW'] as const;
/** Currency signs and codes a sum of money may carry before or after it ("£1,250", "95 €", "120 CHF"). */
export const CURRENCY_SIGNS = ['£', '€', '$', '¥', 'GBP', 'EUR', 'USD', 'CHF', 'kr'] as const;
export const METRE_SUFFIXES = ['metres', 'meters', 'm'] as const;
export const PERCENT_SUFFIXES = ['%'] as const;
