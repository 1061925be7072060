import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { cheapestHire } from '../../../../src/ledger/costs/hire.ts';

/** Exhaustive search over every (months, weeks, days) that covers the duration: the reference the O(1) search must match. */
function bruteForce(days: number, day: number, week?: number, month?: number): number {
  let best = Infinity;
  const maxMonths = month === undefined ? 0 : Math.ceil(days / 28);
  for (let m = 0; m <= maxMonths; m++) {
    const maxWeeks = week === undefined ? 0 : Math.ceil(Math.max(0, days - 28 * m) / 7);
    for (let w = 0; w <= maxWeeks; w++) {
      const d = Math.max(0, days - 28 * m - 7 * w);
      best = Math.min(best, m * (month ?? 0) + w * (week ?? 0) + d * day);
    }
  }
  return best;
}

describe('cheapestHire', () => {
  // Hire-rate breaks, worked by hand (common practice: hire desks price by day, week of 7 days and month of 28 days).
  it.each([
    // days, day, week, month, expected cost, months, weeks, days — working
    [9, 75, 420, undefined, 570, 0, 1, 2], // 1 wk 420 + 2 d × 75 = 570 < 2 wk 840 < 9 d × 75 = 675
    [9, 100, 150, undefined, 300, 0, 2, 0], // 2 wk × 150 = 300 < 1 wk + 2 d = 350: rounded up to a whole week
    [9, 30, 420, undefined, 270, 0, 0, 9], // 9 d × 30 = 270 < 1 wk 420
    [5, 75, 300, undefined, 300, 0, 1, 0], // 5 d × 75 = 375 > 1 wk 300: round up
    [30, 75, 300, 1000, 1150, 1, 0, 2], // 1 month 1000 + 2 d × 75 = 1150 < 1 month + 1 wk 1300 < 5 wk 1500
    [26, 75, 300, 1000, 1000, 1, 0, 0], // 3 wk 900 + 5 d 375 = 1275; 4 wk 1200; 1 month 1000
    [56, 75, 300, 1300, 2400, 0, 8, 0], // month 1300 > 4 weeks 1200: booked as 8 weeks
    [1, 75, 300, 1000, 75, 0, 0, 1],
  ])('%i days at day %d, week %s, month %s costs %d', (days, day, week, month, cost, m, w, d) => {
    const plan = cheapestHire(days, day, week, month);
    expect(plan.cost).toBeCloseTo(cost, 9);
    expect([plan.months, plan.weeks, plan.days]).toEqual([m, w, d]);
  });

  it('cheapestHire(0, …) costs nothing', () => {
    expect(cheapestHire(0, 75, 300, 1000).cost).toBe(0);
  });

  it.each([
    [9, NaN],
    [9, -1],
    [2.5, 75],
    [-3, 75],
  ])('cheapestHire(%d days, day rate %d) is NaN, never 0', (days, day) => {
    expect(cheapestHire(days, day).cost).toBeNaN();
  });

  it('cheapestHire with a week rate that is NaN is NaN', () => {
    expect(cheapestHire(9, 75, NaN).cost).toBeNaN();
  });

  it('cheapestHire equals exhaustive search for any duration up to 200 days and any rates (property)', () => {
    const rate = fc.integer({ min: 1, max: 5000 });
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 200 }),
        rate,
        fc.option(rate, { nil: undefined }),
        fc.option(rate, { nil: undefined }),
        (days, day, week, month) => {
          const plan = cheapestHire(days, day, week, month);
          expect(plan.cost).toBeCloseTo(bruteForce(days, day, week, month), 6);
          expect(plan.months * 28 + plan.weeks * 7 + plan.days).toBeGreaterThanOrEqual(days);
          const recomputed =
            (plan.months ? plan.months * (month as number) : 0) +
            (plan.weeks ? plan.weeks * (week as number) : 0) +
            plan.days * day;
          expect(recomputed).toBeCloseTo(plan.cost, 6);
        },
      ),
      { numRuns: 2000 },
    );
  });
});
