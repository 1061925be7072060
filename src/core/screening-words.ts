/**
 * The words for the two rule-of-thumb screening choices, written once for the app, the
 * workbook and the command line. The rule itself is common practice in UK and Hong Kong
 * construction noise guidance: a hoarding, bund or building that leaves only the top of a
 * machine in the receiver's line of sight takes about 5 dB off its level, one that takes the
 * machine out of sight altogether about 10 dB (./corrections.ts). The wording is our own.
 */
export const SCREENING_RULE_SOURCE = 'rule of thumb, common practice in UK and Hong Kong construction noise guidance';

export interface ScreeningWords {
  /** A few words for a grid cell, also read back when typed. */
  short: string;
  /** A phrase for a label or a sentence, without the reduction. */
  long: string;
}

export const SCREENING_WORDS: Readonly<Record<'top-visible' | 'hidden', ScreeningWords>> = {
  'top-visible': { short: 'top in sight', long: 'partly screened, only the machine’s top in sight' },
  hidden: { short: 'out of sight', long: 'screened, the machine wholly out of sight' },
};
