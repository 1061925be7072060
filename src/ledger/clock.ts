/**
 * Times of day in a project file: "HH:MM", 00:00 … 24:00 (24:00 only as an end).
 */

const CLOCK = /^([01]\d|2[0-3]):([0-5]\d)$/;

/**
 * Minutes after midnight of a time of day written "HH:MM"; NaN when the text is not one.
 * "24:00" is read as 1440 (the end of the day).
 * @example minutesOfDay("07:30") // 450
 */
export function minutesOfDay(text: unknown): number {
  if (typeof text !== 'string') return NaN;
  if (text === '24:00') return 24 * 60;
  const m = CLOCK.exec(text);
  if (!m) return NaN;
  return Number(m[1]) * 60 + Number(m[2]);
}

/**
 * Hours of overlap between two spans of the same day given as "HH:MM" pairs; NaN when a
 * time is not readable.
 * @example overlapHours("08:00", "18:00", "07:00", "19:00") // 10
 */
export function overlapHours(startA: string, endA: string, startB: string, endB: string): number {
  const a0 = minutesOfDay(startA);
  const a1 = minutesOfDay(endA);
  const b0 = minutesOfDay(startB);
  const b1 = minutesOfDay(endB);
  if ([a0, a1, b0, b1].some(Number.isNaN)) return NaN;
  return Math.max(0, Math.min(a1, b1) - Math.max(a0, b0)) / 60;
}

/** Length of a span "HH:MM"–"HH:MM" in hours; NaN when unreadable, ≤ 0 when the end is not after the start. */
export function spanHours(start: string, end: string): number {
  return (minutesOfDay(end) - minutesOfDay(start)) / 60;
}
