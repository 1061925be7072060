import { describe, expect, it } from 'vitest';
import { crossesMidnight, minuteMask, overlapHours, spanHours } from '../../../../src/ledger/prediction/clock.ts';

describe('clock: daily spans that may cross midnight', () => {
  it.each([
    // [start, end, hours] — worked by hand: end − start, plus 24 h when the end is earlier
    ['07:00', '19:00', 12],
    ['23:00', '07:00', 8],
    ['23:00', '03:00', 4],
    ['00:00', '24:00', 24],
    ['19:30', '00:00', 4.5],
  ])('spanHours(%s, %s) is %d h', (start, end, hours) => {
    expect(spanHours(start, end)).toBe(hours);
  });

  it('spanHours of a span whose end equals its start is 0 (validation refuses it)', () => {
    expect(spanHours('07:00', '07:00')).toBe(0);
  });

  it('spanHours is NaN for unreadable times and for a start of 24:00', () => {
    expect(spanHours('7h', '19:00')).toBeNaN();
    expect(spanHours('24:00', '07:00')).toBeNaN();
  });

  it.each([
    // [span A, span B, overlap hours] — worked by hand on a 24 h clock
    [['08:00', '18:00'], ['07:00', '19:00'], 10],
    [['23:00', '03:00'], ['23:00', '07:00'], 4], // night works inside a night period
    [['22:00', '02:00'], ['23:00', '07:00'], 3], // 23:00–02:00
    [['05:00', '09:00'], ['23:00', '07:00'], 2], // 05:00–07:00, after midnight
    [['23:00', '03:00'], ['07:00', '19:00'], 0],
    [['06:00', '08:00'], ['23:00', '07:00'], 1],
    [['00:00', '24:00'], ['23:00', '07:00'], 8],
    [['20:00', '08:00'], ['06:00', '22:00'], 4], // 20:00–22:00 and 06:00–08:00
  ])('overlapHours(%j, %j) is %d h', (a, b, hours) => {
    expect(overlapHours(a[0]!, a[1]!, b[0]!, b[1]!)).toBe(hours);
    expect(overlapHours(b[0]!, b[1]!, a[0]!, a[1]!)).toBe(hours);
  });

  it('crossesMidnight is true only when the end is earlier than the start', () => {
    expect(crossesMidnight('23:00', '07:00')).toBe(true);
    expect(crossesMidnight('07:00', '19:00')).toBe(false);
    expect(crossesMidnight('00:00', '24:00')).toBe(false);
  });

  it('minuteMask covers the minutes either side of midnight', () => {
    const mask = minuteMask('23:30', '00:30')!;
    expect(mask.reduce((a, b) => a + b, 0)).toBe(60); // worked by hand: 30 min before and 30 after midnight
    expect(mask[23 * 60 + 30]).toBe(1);
    expect(mask[29]).toBe(1);
    expect(mask[30]).toBe(0);
    expect(mask[23 * 60 + 29]).toBe(0);
  });
});
