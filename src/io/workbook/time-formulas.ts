/**
 * Spreadsheet formulas on times of day held as fractions of a day (07:00 = 0.2917, 24:00 = 1),
 * for daily spans that may cross midnight (an end earlier than the start runs past it).
 * The same rules as ../../ledger/prediction/clock.ts, written as formulas so a reviewer can follow them.
 */

/**
 * Length of a span in days: end − start, plus one day when the end is not after the start.
 * @example spanDays('B5', 'C5') // "IF(C5>B5,C5-B5,C5+1-B5)"
 */
export function spanDays(start: string, end: string): string {
  return `IF(${end}>${start},${end}-${start},${end}+1-${start})`;
}

/**
 * Overlap of two daily spans in days: span A laid out from its start, span B tried a day
 * earlier, the same day and a day later, the three overlaps added.
 * @example overlapDays('A1', 'A2', 'B1', 'B2') // "(MAX(0,MIN(A1+…,B1-1+…)-MAX(A1,B1-1))+…)"
 */
export function overlapDays(startA: string, endA: string, startB: string, endB: string): string {
  const endOfA = `${startA}+${spanDays(startA, endA)}`;
  const lengthB = spanDays(startB, endB);
  const term = (shift: string) => `MAX(0,MIN(${endOfA},${startB}${shift}+${lengthB})-MAX(${startA},${startB}${shift}))`;
  return `(${term('-1')}+${term('')}+${term('+1')})`;
}
