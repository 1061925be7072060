/**
 * Working-day corrections added to a machine's predicted level (common practice, as in UK and
 * Hong Kong construction noise guidance): on-time, number of units, working hours within the
 * assessment period, façade reflection and rule-of-thumb screening.
 */
import { dbFromRatio } from './decibel.ts';
import { finite, inRange, positive, wholeNumber } from './check.ts';
import { InputError } from './input-error.ts';

/** Façade correction, dB: assessment 1 m in front of a façade (common practice; ISO 1996-2 discusses it). */
export const FACADE_CORRECTION_DB = 3;
/** Screening reduction, dB, when a screen leaves only the machine's top in sight (rule of thumb, ./screening-words.ts). */
export const SCREENING_TOP_VISIBLE_DB = 5;
/** Screening reduction, dB, when a screen takes the machine wholly out of sight (rule of thumb, ./screening-words.ts). */
export const SCREENING_HIDDEN_DB = 10;
/** Largest explicit screening reduction accepted, dB (above it a screen is being over-credited). */
export const SCREENING_EXPLICIT_MAX_DB = 40;

/** A screening choice: a rule of thumb or an explicit reduction in dB (positive = reduction). */
export type ScreeningChoice =
  { kind: 'none' } | { kind: 'top-visible' } | { kind: 'hidden' } | { kind: 'explicit'; db: number };

/**
 * On-time correction, dB: 10·lg(η) with η = on-time / 100, 0 < on-time ≤ 100 %.
 * @example onTimeCorrectionDb(50) // -3.01
 */
export function onTimeCorrectionDb(onTimePct: number): number {
  finite('on-time', onTimePct, 'a percentage above 0 and up to 100');
  if (onTimePct <= 0 || onTimePct > 100) {
    throw new InputError('on-time', onTimePct, 'is out of range', 'use a percentage above 0 and up to 100');
  }
  return dbFromRatio(onTimePct / 100);
}

/**
 * Correction for n identical machines, dB: 10·lg n (n a whole number ≥ 1).
 * @example countCorrectionDb(10) // 10
 */
export function countCorrectionDb(count: number): number {
  wholeNumber('count', count, 1, 'a whole number of machines, 1 or more');
  return dbFromRatio(count);
}

/**
 * Spreading the working hours over the assessment period, dB: 10·lg(worked / period),
 * 0 < worked ≤ period (any unit of time, the same for both).
 * @example workingHoursCorrectionDb(10, 12) // -0.79
 */
export function workingHoursCorrectionDb(workingHours: number, periodHours: number): number {
  positive('assessment period', periodHours, 'a duration greater than 0, e.g. 12 hours');
  positive('working hours', workingHours, `a duration above 0 and up to the period of ${periodHours}`);
  if (workingHours > periodHours) {
    throw new InputError(
      'working hours',
      workingHours,
      `are longer than the period of ${periodHours}`,
      `use a duration above 0 and up to ${periodHours}`,
    );
  }
  return dbFromRatio(workingHours / periodHours);
}

/**
 * Screening reduction, dB, as a positive number: 0 none, 5 only the top in sight, 10 out of sight
 * (rule of thumb, common practice), or an explicit value from 0 to 40 dB.
 * @example screeningReductionDb({ kind: 'hidden' }) // 10
 */
export function screeningReductionDb(screening: ScreeningChoice): number {
  switch (screening?.kind) {
    case 'none':
      return 0;
    case 'top-visible':
      return SCREENING_TOP_VISIBLE_DB;
    case 'hidden':
      return SCREENING_HIDDEN_DB;
    case 'explicit':
      return inRange(
        'screening',
        screening.db,
        0,
        SCREENING_EXPLICIT_MAX_DB,
        `a reduction from 0 to ${SCREENING_EXPLICIT_MAX_DB} dB`,
      );
    default:
      throw new InputError(
        'screening',
        screening,
        'is not accepted',
        'use none, top-visible (5 dB), hidden (10 dB) or an explicit reduction in dB',
      );
  }
}
