/**
 * What the buyer's page shows, computed from the register and the buyer's choices: the
 * types to pick from, the comparison (core: ledger/register/compare.ts), the rows sorted
 * as asked, and the chart's points. No decibel or cost is computed here; figures come from
 * the core and are only formatted and ordered.
 */
import type { Register } from '../../ledger/register/model.ts';
import { compareMachines, type Comparison, type CompareRow } from '../../ledger/register/compare.ts';
import { machineType } from '../../ledger/register/fleet-view.ts';
import { InputError } from '../../core/input-error.ts';
import { readNumberCell, type DecimalSeparator, type NumberRule } from '../tables/parse.ts';

/** The types of the register's machines, in order of first appearance. */
export function registerTypes(register: Register): string[] {
  return [...new Set(register.machines.map(machineType))];
}

/** The `type` choice that compares the machines the buyer ticked. */
export const TICKED = '@ticked';

export interface BuyerChoices {
  /** A type of `registerTypes`, "" for every machine, or TICKED for the ticked ones. */
  type: string;
  /** Machine ids ticked, in the order ticked (for TICKED). */
  ticked?: readonly string[];
  criterionText: string;
  onTimeText: string;
  referenceId: string;
  costBasis: 'owned' | 'hired';
}

export const CRITERION_RULE: NumberRule = {
  accepted: 'use a level L_Aeq in dB from 20 to 120, e.g. 65',
  min: 20,
  max: 120,
  suffixes: ['dB(A)', 'dBA', 'dB'],
};
export const ON_TIME_RULE: NumberRule = {
  accepted: 'use a percentage above 0 and up to 100, e.g. 80',
  min: 0,
  minExclusive: true,
  max: 100,
  suffixes: ['%'],
};
export const LWA_CRITERION_RULE: NumberRule = {
  accepted: 'use a sound power level in dB from 30 to 160, e.g. 100',
  min: 30,
  max: 160,
  suffixes: ['dB(A)', 'dBA', 'dB'],
};
export const DAYS_RULE: NumberRule = {
  accepted: 'use a whole number of days from 1 to 366, e.g. 200',
  min: 1,
  max: 366,
  whole: true,
  suffixes: ['days', 'd'],
};
export const HOURS_RULE: NumberRule = {
  accepted: 'use hours above 0 and up to 24, e.g. 8',
  min: 0,
  minExclusive: true,
  max: 24,
  suffixes: ['h'],
};

/** A number typed in a field: its value, or the message saying what is wrong and what is accepted (the text stays in the field). */
export function readField(
  label: string,
  text: string,
  rule: NumberRule,
  separator: DecimalSeparator,
): { value: number } | { message: string } {
  const r = readNumberCell(text, separator, rule);
  return r.ok ? { value: r.value } : { message: `${label}: ${JSON.stringify(text)} ${r.problem} (${r.accepted})` };
}

export type BuyerOutcome =
  { comparison: Comparison; messages: string[] } | { comparison?: undefined; messages: string[] };

/** The comparison for the buyer's choices, or the messages saying which choice cannot be read. */
export function buyerComparison(register: Register, choices: BuyerChoices, separator: DecimalSeparator): BuyerOutcome {
  const criterion = readField('Criterion', choices.criterionText, CRITERION_RULE, separator);
  const onTime = readField('On-time', choices.onTimeText, ON_TIME_RULE, separator);
  const messages = [criterion, onTime].flatMap((x) => ('message' in x ? [x.message] : []));
  if (!('value' in criterion) || !('value' in onTime)) return { messages };
  const machineIds =
    choices.type === TICKED
      ? (choices.ticked ?? []).filter((id) => register.machines.some((m) => m.id === id))
      : choices.type === ''
        ? register.machines.map((m) => m.id)
        : register.machines.filter((m) => machineType(m) === choices.type).map((m) => m.id);
  const referenceId = machineIds.includes(choices.referenceId) ? choices.referenceId : undefined;
  try {
    const comparison = compareMachines(register, {
      criterionDb: criterion.value,
      onTimePct: onTime.value,
      machineIds,
      costBasis: choices.costBasis,
      ...(referenceId ? { referenceId } : {}),
    });
    return { comparison, messages };
  } catch (e) {
    if (e instanceof InputError) return { messages: [e.message] };
    throw e;
  }
}

export type SortKey = 'label' | 'lwa' | 'margin' | 'area' | 'owned' | 'hired' | 'dbPerThousand' | 'exposure';

const KEY: Record<SortKey, (r: CompareRow) => number | string> = {
  label: (r) => r.label.toLowerCase(),
  lwa: (r) => r.lwaDb,
  margin: (r) => r.directiveMarginDb ?? NaN,
  area: (r) => r.footprint.areaM2,
  owned: (r) => r.cost.ownedPerYear,
  hired: (r) => r.cost.hiredPerYear,
  dbPerThousand: (r) => r.againstReference?.dbPerThousand ?? NaN,
  exposure: (r) => r.exposure?.dailyExposureDb ?? NaN,
};

/** The rows sorted by a column; figures not known always last. */
export function sortRows(rows: readonly CompareRow[], key: SortKey, descending: boolean): CompareRow[] {
  const get = KEY[key];
  return [...rows].sort((a, b) => {
    const x = get(a);
    const y = get(b);
    const xBad = typeof x === 'number' && !Number.isFinite(x);
    const yBad = typeof y === 'number' && !Number.isFinite(y);
    if (xBad || yBad) return xBad === yBad ? 0 : xBad ? 1 : -1;
    const c = typeof x === 'string' ? x.localeCompare(String(y)) : x - (y as number);
    return descending ? -c : c;
  });
}
