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
import type { Candidate, Duty } from '../model/model.ts';
import type { DutyCost } from '../model/results.ts';
import { cheapestHire } from './hire.ts';
import { formatMoney } from './money.ts';

const isMoney = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x) && x >= 0;

function plural(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}

function notComputedCost(candidateId: string, why: string): DutyCost {
  return { candidateId, total: NaN, explanation: `not computed: ${why}` };
}

/**
 * Cost of a candidate for its duty. The explanation is written when first read (an
 * evaluation holds thousands of costs and shows a few).
 * @example dutyCost(hire day £75, week £420, running £38/d, delivery £90; duty 9 days × 2 units).total // 2 × (570 + 342 + 90) = 2004
 */
export function dutyCost(candidate: Candidate, duty: Duty, currency = 'GBP'): DutyCost {
  const notComputed = (why: string) => notComputedCost(candidate.id, why);

  const days = duty.durationDays;
  if (typeof days !== 'number' || !Number.isInteger(days) || days < 1)
    return notComputed('the duty’s duration is not a whole number of days');
  const count = duty.count;
  if (typeof count !== 'number' || !Number.isInteger(count) || count < 1)
    return notComputed('the duty’s number of units is not a whole number of 1 or more');
  if (!isMoney(candidate.runningPerDay)) return notComputed('running cost per day is not a number of 0 or more');
  if (!isMoney(candidate.fixedCharges)) return notComputed('fixed charges are not a number of 0 or more');

  const cost = candidate.cost;
  let machine: number;
  let describeMachine: (money: (x: number) => string) => string[];
  if (cost?.kind === 'hire') {
    if (!isMoney(cost.dayRate)) return notComputed('the day rate is not a number of 0 or more');
    if (cost.weekRate !== undefined && cost.weekRate !== null && !isMoney(cost.weekRate))
      return notComputed('the week rate is not a number of 0 or more');
    if (cost.monthRate !== undefined && cost.monthRate !== null && !isMoney(cost.monthRate))
      return notComputed('the month rate is not a number of 0 or more');
    const plan = cheapestHire(days, cost.dayRate, cost.weekRate ?? undefined, cost.monthRate ?? undefined);
    machine = plan.cost;
    describeMachine = (money) => {
      const parts: string[] = [];
      if (plan.months > 0) parts.push(`${plural(plan.months, 'month')} ${money(cost.monthRate as number)}`);
      if (plan.weeks > 0) parts.push(`${plural(plan.weeks, 'week')} ${money(cost.weekRate as number)}`);
      if (plan.days > 0) parts.push(`${plural(plan.days, 'day')} ${money(cost.dayRate)}`);
      if (parts.length > 0 && plan.months + plan.weeks + plan.days > 1) parts[parts.length - 1] += ' each';
      const covered = plan.months * 28 + plan.weeks * 7 + plan.days;
      if (parts.length > 0 && covered > days)
        parts[parts.length - 1] += ` (covers ${covered} d, cheaper than ${days} d)`;
      return parts;
    };
  } else if (cost?.kind === 'purchase') {
    if (!isMoney(cost.price)) return notComputed('the purchase price is not a number of 0 or more');
    if (!isMoney(cost.resaleValue)) return notComputed('the resale value is not a number of 0 or more');
    if (cost.resaleValue > cost.price) return notComputed('the resale value is above the price');
    if (typeof cost.lifeDays !== 'number' || !Number.isFinite(cost.lifeDays) || cost.lifeDays <= 0)
      return notComputed('the working life is not a number of days above 0');
    machine = ((cost.price - cost.resaleValue) * days) / cost.lifeDays;
    describeMachine = (money) => [
      `purchase (${money(cost.price)} − resale ${money(cost.resaleValue)}) × ${days} d / ${cost.lifeDays} d life`,
    ];
  } else {
    return notComputed('the cost is neither hire nor purchase');
  }
  const running = candidate.runningPerDay;
  const charges = candidate.fixedCharges;
  const total = (machine + running * days + charges) * count;
  let explanation: string | undefined;
  return {
    candidateId: candidate.id,
    total,
    get explanation(): string {
      if (explanation === undefined) {
        const money = (x: number) => formatMoney(x, currency);
        const parts = describeMachine(money);
        if (running > 0) parts.push(`running ${days} d × ${money(running)}`);
        if (charges > 0) parts.push(`charges ${money(charges)}`);
        const inner = parts.length > 0 ? parts.join(' + ') : 'no charges';
        explanation = count === 1 ? `${inner} = ${money(total)}` : `${count} units × (${inner}) = ${money(total)}`;
      }
      return explanation;
    },
  };
}
