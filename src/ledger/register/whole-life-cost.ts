/**
 * Whole-life cost of a machine per working year, for a buyer comparing machines without a
 * site: what owning it costs a year, and what hiring it for the same working days would.
 *
 * Owning: (price − resale value) / life in years + running cost per day × working days a
 * year. A life kept in working days converts to years with the buyer's working days a year
 * (life in years = life in days / days a year). Common practice: straight-line spreading of
 * the loss of value; no interest, tax or maintenance beyond the running cost stated.
 * Hiring: the cheapest cover of the working days from the day, week (7 days) and month
 * (28 days) rates (./../hire.ts, booked as one continuous period) plus the same running cost.
 */
import type { RegisterMachine } from './model.ts';
import { cheapestHire } from '../costs/hire.ts';

export interface WholeLifeCost {
  /** Life in years used, NaN when not known. */
  lifeYears: number;
  /** (price − resale) / life in years, per year; NaN without purchase terms. */
  ownershipPerYear: number;
  /** running per day × working days a year. */
  runningPerYear: number;
  /** ownership + running per year; NaN without purchase terms. */
  ownedPerYear: number;
  /** Hire for the working days + running per year; NaN without hire terms. */
  hiredPerYear: number;
  /** The working in words, e.g. "(£180,000 − £60,000) / 8 years + £95 × 200 days = £34,000". */
  explanation: string;
}

const finiteNumber = (x: number | undefined): x is number => typeof x === 'number' && Number.isFinite(x);

/**
 * Whole-life cost per working year of one machine.
 * @example wholeLifeCost({ purchase: { price: 180000, resaleValue: 60000, life: 8, lifeUnit: 'years' }, runningPerDay: 95, … }, 200).ownedPerYear // 34000
 */
export function wholeLifeCost(
  machine: RegisterMachine,
  workingDaysPerYear: number,
  money: (x: number) => string = (x) => x.toFixed(0),
): WholeLifeCost {
  const days = workingDaysPerYear;
  const daysOk = finiteNumber(days) && days > 0 && days <= 366;
  const runningPerYear =
    daysOk && finiteNumber(machine.runningPerDay) && machine.runningPerDay >= 0 ? machine.runningPerDay * days : NaN;
  const p = machine.purchase;
  let lifeYears = NaN;
  let ownershipPerYear = NaN;
  let explanation = 'no purchase terms';
  if (p) {
    if (finiteNumber(p.life) && p.life > 0) lifeYears = p.lifeUnit === 'years' ? p.life : daysOk ? p.life / days : NaN;
    if (finiteNumber(p.price) && finiteNumber(p.resaleValue) && Number.isFinite(lifeYears))
      ownershipPerYear = (p.price - p.resaleValue) / lifeYears;
    const lifeWords =
      p.lifeUnit === 'years' ? `${fmt(p.life)} years` : `(${fmt(p.life)} days / ${fmt(days)} days a year)`;
    explanation = `(${money(p.price)} − ${money(p.resaleValue)}) / ${lifeWords} + ${money(machine.runningPerDay)} × ${fmt(days)} days = ${money(ownershipPerYear + runningPerYear)}`;
  }
  const h = machine.hire;
  let hiredPerYear = NaN;
  if (h && daysOk && Number.isInteger(days))
    hiredPerYear = cheapestHire(days, h.dayRate, h.weekRate, h.monthRate).cost + runningPerYear;
  return {
    lifeYears,
    ownershipPerYear,
    runningPerYear,
    ownedPerYear: ownershipPerYear + runningPerYear,
    hiredPerYear,
    explanation,
  };
}

function fmt(x: number): string {
  return Number.isFinite(x) ? String(Math.round(x * 100) / 100) : 'not known';
}
