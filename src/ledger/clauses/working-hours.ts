/**
 * Hours-of-work restrictions: how much of a span of working hours falls outside the
 * hours a clause allows. Spans are times of day "HH:MM"; an end before the start runs
 * past midnight (22:00–06:00), an end equal to the start is the whole day.
 */
import { minutesOfDay } from '../prediction/clock.ts';

const DAY = 24 * 60;

/** The minutes of a day a span covers, as [from, to) pieces within 0 … 1440. */
function pieces(start: number, end: number): [number, number][] {
  if (end > start) return [[start, end]];
  if (end === start) return [[0, DAY]];
  return [
    [start, DAY],
    [0, end],
  ];
}

/**
 * Hours of the working span that fall outside the allowed span; NaN when a time is not
 * readable. O(1).
 * @example hoursOutside("07:00", "19:00", "08:00", "18:00") // 2
 * @example hoursOutside("23:00", "03:00", "22:00", "06:00") // 0
 */
export function hoursOutside(workStart: string, workEnd: string, allowStart: string, allowEnd: string): number {
  const w0 = minutesOfDay(workStart);
  const w1 = minutesOfDay(workEnd);
  const a0 = minutesOfDay(allowStart);
  const a1 = minutesOfDay(allowEnd);
  if ([w0, w1, a0, a1].some(Number.isNaN)) return NaN;
  const work = pieces(w0, w1);
  const allow = pieces(a0, a1);
  let inside = 0;
  let total = 0;
  for (const [s, e] of work) {
    total += e - s;
    for (const [as, ae] of allow) inside += Math.max(0, Math.min(e, ae) - Math.max(s, as));
  }
  return (total - inside) / 60;
}

/** Length of a working span in hours (an end before the start runs past midnight); NaN when unreadable. */
export function workingSpanHours(start: string, end: string): number {
  const s = minutesOfDay(start);
  const e = minutesOfDay(end);
  if (Number.isNaN(s) || Number.isNaN(e)) return NaN;
  return (e > s ? e - s : e === s ? DAY : DAY - s + e) / 60;
}
