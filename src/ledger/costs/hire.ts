/**
 * The cheapest way to hire one machine for a number of days from day, week (7 days) and
 * month (28 days) rates, rounding up to a whole week or month when that is cheaper.
 *
 * Exact in O(1). Because 28 = 4 × 7 and 7 = 7 × 1, the sizes divide each other, so:
 * - the cheapest cover of 7 days is W* = min(week, 7 × day), and of 28 days
 *   M* = min(month, 4 × W*);
 * - covering x days with weeks and days costs g(x) = ⌊x/7⌋·W* + min(W*, (x mod 7)·day),
 *   and g(x + 28) = g(x) + 4·W* ≥ g(x) + M*, so using as many whole months as fit never
 *   costs more: the optimum is either m = ⌊D/28⌋ months and the rest in weeks and days,
 *   or m + 1 months (rounding up).
 * The search below tries exactly those few options.
 */

export const DAYS_PER_WEEK = 7;
export const DAYS_PER_MONTH = 28;

export interface HirePlan {
  months: number;
  weeks: number;
  days: number;
  /** Cost per unit for the plan. */
  cost: number;
}

/** A rate that is offered: a finite number ≥ 0. Absent rates are not offered. */
const offered = (rate: number | undefined): rate is number =>
  typeof rate === 'number' && Number.isFinite(rate) && rate >= 0;

/**
 * Cheapest combination of months, weeks and days covering `durationDays` (whole days ≥ 0).
 * NaN cost when the day rate is missing or invalid or the duration is not a whole number ≥ 0.
 * O(1).
 * @example cheapestHire(9, 75, 420) // { months: 0, weeks: 1, days: 2, cost: 570 }
 * @example cheapestHire(9, 100, 150) // { months: 0, weeks: 2, days: 0, cost: 300 } (rounded up to 2 weeks)
 */
export function cheapestHire(durationDays: number, dayRate: number, weekRate?: number, monthRate?: number): HirePlan {
  if (!offered(dayRate) || !Number.isInteger(durationDays) || durationDays < 0) {
    return { months: 0, weeks: 0, days: 0, cost: NaN };
  }
  if (weekRate !== undefined && !offered(weekRate)) return { months: 0, weeks: 0, days: 0, cost: NaN };
  if (monthRate !== undefined && !offered(monthRate)) return { months: 0, weeks: 0, days: 0, cost: NaN };
  const week = weekRate ?? Infinity;
  const month = monthRate ?? Infinity;

  // A block of 7 days: one week's hire, or 7 single days.
  const weekAsDays = week > DAYS_PER_WEEK * dayRate;
  const weekCost = weekAsDays ? DAYS_PER_WEEK * dayRate : week;
  // A block of 28 days: one month's hire, or 4 blocks of 7 days.
  const monthAsWeeks = month > 4 * weekCost;
  const monthCost = monthAsWeeks ? 4 * weekCost : month;

  const fullMonths = Math.floor(durationDays / DAYS_PER_MONTH);
  const rest = durationDays - fullMonths * DAYS_PER_MONTH;
  const fullWeeks = Math.floor(rest / DAYS_PER_WEEK);
  const restDays = rest - fullWeeks * DAYS_PER_WEEK;

  // Blocks (months, weeks-of-7, days): the few options that can be optimal, tried in this order (no arrays: this runs
  // once per candidate of a project, a hundred thousand times in a large one).
  let months = fullMonths;
  let weeks = fullWeeks;
  let days = restDays;
  let bestCost = months * monthCost + weeks * weekCost + days * dayRate;
  if (!(bestCost < Infinity - 1e-9)) bestCost = Infinity; // as if no option had been taken yet
  const roundedWeeks = fullWeeks + (restDays > 0 ? 1 : 0);
  const weeksCost = fullMonths * monthCost + roundedWeeks * weekCost + 0 * dayRate;
  if (weeksCost < bestCost - 1e-9) {
    bestCost = weeksCost;
    weeks = roundedWeeks;
    days = 0;
  }
  const roundedMonths = fullMonths + (rest > 0 ? 1 : 0);
  const monthsCost = roundedMonths * monthCost + 0 * weekCost + 0 * dayRate;
  if (monthsCost < bestCost - 1e-9) {
    months = roundedMonths;
    weeks = 0;
    days = 0;
  }
  // Express the blocks as hire periods actually booked.
  if (monthAsWeeks) {
    weeks += 4 * months;
    months = 0;
  }
  if (weekAsDays) {
    days += DAYS_PER_WEEK * weeks;
    weeks = 0;
  }
  const cost = (months > 0 ? months * month : 0) + (weeks > 0 ? weeks * week : 0) + days * dayRate;
  return { months, weeks, days, cost };
}
