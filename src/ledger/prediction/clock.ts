/**
 * Times of day in a project file: "HH:MM", 00:00 … 24:00 (24:00 only as an end).
 *
 * A span "start–end" repeats every day. When the end is earlier than the start the span
 * crosses midnight: a night period 23:00–07:00 lasts 8 h, night works 23:00–03:00 last 4 h.
 * A span whose end equals its start has no length and is refused by validation; a whole
 * day is written 00:00–24:00.
 */

const CLOCK = /^([01]\d|2[0-3]):([0-5]\d)$/;
const DAY_MINUTES = 24 * 60;

/**
 * Minutes after midnight of a time of day written "HH:MM"; NaN when the text is not one.
 * "24:00" is read as 1440 (the end of the day).
 * @example minutesOfDay("07:30") // 450
 */
export function minutesOfDay(text: unknown): number {
  if (typeof text !== 'string') return NaN;
  if (text === '24:00') return DAY_MINUTES;
  const m = CLOCK.exec(text);
  if (!m) return NaN;
  return Number(m[1]) * 60 + Number(m[2]);
}

/**
 * Length of a daily span in minutes: end − start, plus a day when the end is earlier than
 * the start (the span crosses midnight); 0 when end equals start; NaN when unreadable.
 * @example spanMinutes("23:00", "07:00") // 480
 */
export function spanMinutes(start: unknown, end: unknown): number {
  const s = minutesOfDay(start);
  const e = minutesOfDay(end);
  if (Number.isNaN(s) || Number.isNaN(e) || s === DAY_MINUTES) return NaN;
  return e >= s ? e - s : e + DAY_MINUTES - s;
}

/** Length of a span "HH:MM"–"HH:MM" in hours, crossing midnight when the end is earlier; NaN when unreadable. */
export function spanHours(start: string, end: string): number {
  return spanMinutes(start, end) / 60;
}

/** True when a readable span's end is earlier than its start, so it runs past midnight. */
export function crossesMidnight(start: string, end: string): boolean {
  const s = minutesOfDay(start);
  const e = minutesOfDay(end);
  return !Number.isNaN(s) && !Number.isNaN(e) && e < s;
}

/**
 * Minutes of overlap between two daily spans (either may cross midnight), each repeating
 * every day. The first span is laid out from its start over its length, the second is
 * tried one day earlier, the same day and one day later, and the three overlaps are added
 * (a span of at most a day meets each point of the first span at most once).
 * NaN when a time is not readable. O(1).
 * @example overlapMinutes("22:00", "02:00", "23:00", "07:00") // 180
 */
export function overlapMinutes(startA: string, endA: string, startB: string, endB: string): number {
  const a0 = minutesOfDay(startA);
  const b0 = minutesOfDay(startB);
  const la = spanMinutes(startA, endA);
  const lb = spanMinutes(startB, endB);
  if ([a0, b0, la, lb].some(Number.isNaN)) return NaN;
  let total = 0;
  for (const shift of [-DAY_MINUTES, 0, DAY_MINUTES]) {
    total += Math.max(0, Math.min(a0 + la, b0 + shift + lb) - Math.max(a0, b0 + shift));
  }
  return total;
}

/**
 * Hours of overlap between two daily spans given as "HH:MM" pairs (either may cross
 * midnight); NaN when a time is not readable.
 * @example overlapHours("08:00", "18:00", "07:00", "19:00") // 10
 */
export function overlapHours(startA: string, endA: string, startB: string, endB: string): number {
  return overlapMinutes(startA, endA, startB, endB) / 60;
}

/**
 * The minutes of the day a daily span covers, as a 1440-entry mask (1 = covered), minute m
 * standing for m … m+1 after midnight; undefined when a time is not readable. O(1440).
 * @example minuteMask("23:00", "01:00")?.reduce((a, b) => a + b, 0) // 120
 */
export function minuteMask(start: string, end: string): Uint8Array | undefined {
  const s = minutesOfDay(start);
  const length = spanMinutes(start, end);
  if (Number.isNaN(s) || Number.isNaN(length)) return undefined;
  const mask = new Uint8Array(DAY_MINUTES);
  for (let m = 0; m < length; m++) mask[(s + m) % DAY_MINUTES] = 1;
  return mask;
}
