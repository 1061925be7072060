/**
 * The assessment periods a phase's working hours fall in.
 *
 * A phase is assessed in its own period (`phase.periodId`) for the hours it works inside
 * it, and the working hours outside its own period are assessed in every other period
 * they fall in: works 07:00–21:00 whose own period is a day period 07:00–19:00, with an
 * evening period 19:00–23:00, count 12 h in the day and 2 h in the evening. Hours inside
 * the own period are not assessed again in another period covering the same times of day
 * (periods carry no day of the week: "weekday daytime" and "Saturday morning" may share
 * hours). Each period's level spreads the hours worked in it over its length,
 * 10·lg(T_work,p / T_p) (common practice, as in UK and Hong Kong construction noise
 * guidance; ISO 1996-1 defines L_Aeq,T over the time interval T).
 *
 * The phase's contributions and rankings are given in its own period; in another period p
 * every contribution shifts by the same amount, 10·lg(T_work,p / T_p) − 10·lg(T_work,own /
 * T_own), because the machines' hours are the phase's hours. Working hours in no period at
 * all are not assessed and are named in a note. Never throws.
 */
import type { Phase, Project } from '../model/model.ts';
import { minuteMask } from './clock.ts';
import { dbFromRatio } from '../../core/decibel.ts';

/** One period a phase is assessed in. */
export interface PhasePeriod {
  periodId: string;
  /** Working hours of the phase assessed in this period, h (> 0). */
  hoursWorked: number;
  /** Length of the period T, h. */
  periodHours: number;
  /** True for the phase's own period (its contributions and rankings are given in it). */
  own: boolean;
  /**
   * What this period's level adds to the level in the phase's own period, dB:
   * 10·lg(T_work,p/T_p) − 10·lg(T_work,own/T_own); 0 for the own period; NaN when the own
   * period is not assessed.
   */
  shiftDb: number;
}

export interface PhasePeriods {
  /** The own period first (when the phase works in it), then the others in project order. */
  periods: PhasePeriod[];
  /** Working hours inside no period at all, h (not assessed). */
  unassessedHours: number;
}

const count = (mask: Uint8Array, keep: (m: number) => boolean) => {
  let n = 0;
  for (let m = 0; m < mask.length; m++) if (mask[m] && keep(m)) n += 1;
  return n;
};

/**
 * Periods a phase is assessed in, with the hours split. O(1440 × periods).
 * @example phasePeriods(project, { start: '07:00', end: '21:00', periodId: 'day', … })
 * // { periods: [{ periodId: 'day', hoursWorked: 12, periodHours: 12, own: true, shiftDb: 0 },
 * //             { periodId: 'evening', hoursWorked: 2, periodHours: 4, own: false, shiftDb: -3.01 }], unassessedHours: 0 }
 */
export function phasePeriods(project: Project, phase: Phase): PhasePeriods {
  const periods = Array.isArray(project.periods) ? project.periods : [];
  const works = phase ? minuteMask(phase.start, phase.end) : undefined;
  if (!works) return { periods: [], unassessedHours: 0 };
  const ownPeriod = periods.find((p) => p.id === phase.periodId);
  const ownMask = ownPeriod ? minuteMask(ownPeriod.start, ownPeriod.end) : undefined;
  const covered = new Uint8Array(works.length);
  const found: PhasePeriod[] = [];
  let own: PhasePeriod | undefined;
  if (ownPeriod && ownMask) {
    const worked = count(works, (m) => ownMask[m] === 1);
    for (let m = 0; m < ownMask.length; m++) covered[m] = ownMask[m] as number;
    if (worked > 0)
      own = {
        periodId: ownPeriod.id,
        hoursWorked: worked / 60,
        periodHours: count(ownMask, () => true) / 60,
        own: true,
        shiftDb: 0,
      };
  }
  for (const period of periods) {
    if (period === ownPeriod) continue;
    const mask = minuteMask(period.start, period.end);
    if (!mask) continue;
    const worked = count(works, (m) => mask[m] === 1 && ownMask?.[m] !== 1);
    for (let m = 0; m < mask.length; m++) if (mask[m]) covered[m] = 1;
    if (worked > 0)
      found.push({
        periodId: period.id,
        hoursWorked: worked / 60,
        periodHours: count(mask, () => true) / 60,
        own: false,
        shiftDb: NaN,
      });
  }
  const ownDb = own ? dbFromRatio(own.hoursWorked / own.periodHours) : NaN;
  for (const p of found) p.shiftDb = dbFromRatio(p.hoursWorked / p.periodHours) - ownDb;
  return { periods: own ? [own, ...found] : found, unassessedHours: count(works, (m) => covered[m] !== 1) / 60 };
}

const hoursText = (h: number) => (Number.isInteger(h) ? `${h} h` : `${h.toFixed(2)} h`);

/**
 * A note for every phase with working hours outside all periods, e.g.
 * "Phase "Night works": 1 h of its working hours 22:00–03:00 fall in no assessment period and are not assessed (add a period that covers them, or shorten the working hours)".
 * O(phases × periods × 1440).
 */
export function unassessedHourNotes(project: Project): { path: string; message: string }[] {
  const notes: { path: string; message: string }[] = [];
  (Array.isArray(project.phases) ? project.phases : []).forEach((phase, i) => {
    const { unassessedHours } = phasePeriods(project, phase);
    if (unassessedHours > 0) {
      notes.push({
        path: `$.phases[${i}]`,
        message: `Phase ${JSON.stringify(phase.name)}: ${hoursText(unassessedHours)} of its working hours ${phase.start}–${phase.end} fall in no assessment period and are not assessed (add a period that covers them, or shorten the working hours)`,
      });
    }
  });
  return notes;
}
