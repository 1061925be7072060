/**
 * What a candidate costs for its duty, all units, with a line that explains it.
 *
 * Hire: the cheapest combination of month (28 days), week (7 days) and day rates for the
 * duty's duration (see ./hire.ts). Purchase: the price less the resale value, spread
 * evenly over the machine's working life, charged for the days of the duty:
 * (price − resale) × duration / life. Both add running cost per day × duration and the
 * one-off charges, then multiply by the number of units.
 * An input that is missing or not a valid number gives NaN (never 0), and the explanation
 * says which input.
 */
import type { Candidate, CandidateCost, Duty } from '../model/model.ts';
import type { DutyCost } from '../model/results.ts';
import { cheapestHire, type HirePlan } from './hire.ts';
import { formatMoney } from './money.ts';

const isMoney = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x) && x >= 0;

function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}

function notComputedCost(candidateId: string, why: string): DutyCost {
  return { candidateId, total: NaN, explanation: `not computed: ${why}` };
}

/** The figures of a computed cost its explanation is written from. */
interface CostFigures {
  /** The candidate's hire or purchase figures, as read when the cost was computed. */
  cost: CandidateCost;
  /** The cheapest hire plan (hire only). */
  plan: HirePlan | undefined;
  days: number;
  count: number;
  running: number;
  charges: number;
  currency: string;
}

/**
 * A computed cost. The explanation is written when first read (an evaluation holds up to a hundred thousand costs
 * and shows a few), from the figures kept with it; it is a getter of the class, not of each object, so a cost is one
 * small object. JSON gives the three fields as a plain cost would.
 */
class ComputedCost implements DutyCost {
  readonly candidateId: string;
  readonly total: number;
  #words: CostFigures | string;
  constructor(candidateId: string, total: number, figures: CostFigures) {
    this.candidateId = candidateId;
    this.total = total;
    this.#words = figures;
  }
  get explanation(): string {
    if (typeof this.#words !== 'string') this.#words = explain(this.#words, this.total);
    return this.#words;
  }
  toJSON(): DutyCost {
    return { candidateId: this.candidateId, total: this.total, explanation: this.explanation };
  }
}

/** "2 units × (1 week £420 + 2 days £75 each + running 9 d × £38 + charges £90) = £1,866". */
function explain(f: CostFigures, total: number): string {
  const money = (x: number) => formatMoney(x, f.currency);
  const { cost, plan, days } = f;
  const parts: string[] = [];
  if (cost.kind === 'hire' && plan) {
    if (plan.months > 0) parts.push(`${plural(plan.months, 'month')} ${money(cost.monthRate as number)}`);
    if (plan.weeks > 0) parts.push(`${plural(plan.weeks, 'week')} ${money(cost.weekRate as number)}`);
    if (plan.days > 0) parts.push(`${plural(plan.days, 'day')} ${money(cost.dayRate)}`);
    if (parts.length > 0 && plan.months + plan.weeks + plan.days > 1) parts[parts.length - 1] += ' each';
    const covered = plan.months * 28 + plan.weeks * 7 + plan.days;
    if (parts.length > 0 && covered > days) parts[parts.length - 1] += ` (covers ${covered} d, cheaper than ${days} d)`;
  } else if (cost.kind === 'purchase') {
    parts.push(
      `purchase (${money(cost.price)} − resale ${money(cost.resaleValue)}) × ${days} d / ${cost.lifeDays} d life`,
    );
  }
  if (f.running > 0) parts.push(`running ${days} d × ${money(f.running)}`);
  if (f.charges > 0) parts.push(`charges ${money(f.charges)}`);
  const inner = parts.length > 0 ? parts.join(' + ') : 'no charges';
  return f.count === 1 ? `${inner} = ${money(total)}` : `${f.count} units × (${inner}) = ${money(total)}`;
}

/**
 * Cost of a candidate for its duty. The explanation is written when first read (an
 * evaluation holds thousands of costs and shows a few).
 * @example dutyCost(hire day £75, week £420, running £38/d, delivery £90; duty 9 days × 2 units).total // 2 × (570 + 342 + 90) = 2004
 */
export function dutyCost(candidate: Candidate, duty: Duty, currency = 'GBP'): DutyCost {
  const days = duty.durationDays;
  if (typeof days !== 'number' || !Number.isInteger(days) || days < 1)
    return notComputedCost(candidate.id, 'the duty’s duration is not a whole number of days');
  const count = duty.count;
  if (typeof count !== 'number' || !Number.isInteger(count) || count < 1)
    return notComputedCost(candidate.id, 'the duty’s number of units is not a whole number of 1 or more');
  if (!isMoney(candidate.runningPerDay))
    return notComputedCost(candidate.id, 'running cost per day is not a number of 0 or more');
  if (!isMoney(candidate.fixedCharges))
    return notComputedCost(candidate.id, 'fixed charges are not a number of 0 or more');

  const cost = candidate.cost;
  let machine: number;
  let plan: HirePlan | undefined;
  if (cost?.kind === 'hire') {
    if (!isMoney(cost.dayRate)) return notComputedCost(candidate.id, 'the day rate is not a number of 0 or more');
    if (cost.weekRate !== undefined && cost.weekRate !== null && !isMoney(cost.weekRate))
      return notComputedCost(candidate.id, 'the week rate is not a number of 0 or more');
    if (cost.monthRate !== undefined && cost.monthRate !== null && !isMoney(cost.monthRate))
      return notComputedCost(candidate.id, 'the month rate is not a number of 0 or more');
    plan = cheapestHire(days, cost.dayRate, cost.weekRate ?? undefined, cost.monthRate ?? undefined);
    machine = plan.cost;
  } else if (cost?.kind === 'purchase') {
    if (!isMoney(cost.price)) return notComputedCost(candidate.id, 'the purchase price is not a number of 0 or more');
    if (!isMoney(cost.resaleValue))
      return notComputedCost(candidate.id, 'the resale value is not a number of 0 or more');
    if (cost.resaleValue > cost.price) return notComputedCost(candidate.id, 'the resale value is above the price');
    if (typeof cost.lifeDays !== 'number' || !Number.isFinite(cost.lifeDays) || cost.lifeDays <= 0)
      return notComputedCost(candidate.id, 'the working life is not a number of days above 0');
    machine = ((cost.price - cost.resaleValue) * days) / cost.lifeDays;
  } else {
    return notComputedCost(candidate.id, 'the cost is neither hire nor purchase');
  }
  const running = candidate.runningPerDay;
  const charges = candidate.fixedCharges;
  const total = (machine + running * days + charges) * count;
  return new ComputedCost(candidate.id, total, { cost, plan, days, count, running, charges, currency });
}
