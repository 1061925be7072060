/**
 * The prediction engine, part 2: the terms a machine's working day adds to its level at any
 * receiver (common practice, as in UK and Hong Kong construction noise guidance):
 * number of identical units 10·lg n, on-time 10·lg(η), the working hours spread over the
 * assessment period 10·lg(hours worked inside the period / period length), and a character
 * penalty (tonal or impulsive noise) as stated by the project. The ledger's duties, the app's
 * quick calculation and the command line's `level` all take these terms from here; the path
 * is ./path-prediction.ts.
 */
import type { Term } from './term.ts';
import { countCorrectionDb, onTimeCorrectionDb, workingHoursCorrectionDb } from './corrections.ts';

export interface WorkingDay {
  /** Number of identical units. */
  count: number;
  /** On-time, %. */
  onTimePct: number;
  /** Hours worked inside the assessment period, with `periodHours`; both absent: the whole period. */
  hoursWorked?: number;
  /** Length of the assessment period, h. */
  periodHours?: number;
}

const fmtHours = (h: number) => (Number.isInteger(h) ? String(h) : h.toFixed(2));

/**
 * The working day's terms, in order: units, on-time, and working hours when given; pushed
 * onto `into` one by one, so a term refused part-way leaves the ones before it. Throws
 * InputError on a value out of range. O(1).
 * @example workingDayTerms({ count: 2, onTimePct: 50, hoursWorked: 10, periodHours: 12 }).map((t) => t.db) // [3.01, −3.01, −0.79]
 */
export function workingDayTerms(day: WorkingDay, into: Term[] = []): Term[] {
  const count = day.count;
  into.push({ key: 'count', label: `Number of units 10·lg n, n = ${count}`, db: countCorrectionDb(count) });
  const onTime = day.onTimePct;
  into.push({ key: 'onTime', label: `On-time 10·lg(η), η = ${onTime} %`, db: onTimeCorrectionDb(onTime) });
  if (day.hoursWorked !== undefined || day.periodHours !== undefined) {
    const worked = day.hoursWorked as number;
    const length = day.periodHours as number;
    into.push({
      key: 'workingHours',
      label: `Working hours in the period 10·lg(${fmtHours(worked)} h / ${fmtHours(length)} h)`,
      db: workingHoursCorrectionDb(worked, length),
    });
  }
  return into;
}

/** The character penalty's term, or none when it is 0 dB. */
export function penaltyTerm(penaltyDb: number, character: string): Term[] {
  return penaltyDb === 0 ? [] : [{ key: 'penalty', label: `Character penalty (${character})`, db: penaltyDb }];
}
