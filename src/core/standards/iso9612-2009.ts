/**
 * ISO 9612:2009 Acoustics — Determination of occupational noise exposure — Engineering method.
 *
 * Daily noise exposure level L_EX,8h from an equivalent level over the effective duration
 * of the working day: L_EX,8h = L_Aeq,Te + 10·lg(Te / T0), T0 = 8 h (the standard's definition of
 * the daily noise exposure level). For several tasks the task contributions add energetically
 * (task-based strategy): L_EX,8h = 10·lg Σ (Tm/T0)·10^(L_Aeq,T,m /10).
 */
import { dbSum } from '../decibel.ts';
import { finite, inRange } from '../check.ts';

/** Reference duration T0 of the daily exposure, hours. */
export const REFERENCE_DURATION_H = 8;

/**
 * Daily noise exposure level L_EX,8h, dB, from a level L_Aeq,Te (dB(A)) and its duration Te (h).
 * @example dailyExposureDb(90, 2) // 83.98
 */
export function dailyExposureDb(levelDb: number, hours: number): number {
  finite('level', levelDb, 'an A-weighted level in dB');
  inRange('hours', hours, Number.MIN_VALUE, 24, 'hours of exposure a day, more than 0 and at most 24');
  return levelDb + 10 * Math.log10(hours / REFERENCE_DURATION_H);
}

/** One task of a working day: its level L_Aeq,T,m in dB(A) and its duration Tm in hours. */
export interface ExposureTask {
  levelDb: number;
  hours: number;
}

/**
 * Daily exposure from several tasks (energetic sum of each task's L_EX,8h contribution).
 * @example dailyExposureFromTasksDb([{ levelDb: 90, hours: 2 }, { levelDb: 80, hours: 6 }]) // 85.0
 */
export function dailyExposureFromTasksDb(tasks: readonly ExposureTask[]): number {
  const total = tasks.reduce((h, t) => h + t.hours, 0);
  inRange('hours', total, Number.MIN_VALUE, 24, 'tasks adding up to more than 0 and at most 24 hours');
  return dbSum(
    tasks.map((t, i) => {
      finite(`task ${i + 1} level`, t.levelDb, 'an A-weighted level in dB');
      return dailyExposureDb(t.levelDb, t.hours);
    }),
  );
}
