/**
 * The buyer's comparison of register machines, with no site: whole-life cost per working
 * year (owned and hired), the Directive 2000/14/EC margin, the noise footprint at a
 * criterion, operator exposure at the buyer's daily hours, and — against a reference
 * machine — the footprint and decibels each unit of extra whole-life cost buys. Machines
 * that no other beats on both cost and LWA are marked. O(n²) in the machines compared.
 */
import type { ProjectSettings } from '../model/model.ts';
import type { Register, RegisterMachine } from './model.ts';
import { machineAsCandidate } from './machine-candidate.ts';
import { wholeLifeCost, type WholeLifeCost } from './whole-life-cost.ts';
import { machineFootprint, type Footprint, type FootprintConditions } from './footprint.ts';
import { nonDominated } from './non-dominated.ts';
import { ratedLevel } from '../rating/rated-level.ts';
import { OFF_BASIS_MARK } from '../rating/rating.ts';
import { checkPermissible } from '../rating/permissible.ts';
import { exposureFor, type OperatorExposure } from '../checks/operator-exposure.ts';
import { formatMoney } from '../costs/money.ts';
import { inRange } from '../../core/check.ts';

export interface CompareOptions extends FootprintConditions {
  /** Working days a year; the register's setting when absent. */
  workingDaysPerYear?: number;
  /** Operator hours a day; the register's setting when absent. */
  operatorHoursPerDay?: number;
  /** Only machines of this Directive 2000/14/EC type (or, failing that, this category text). */
  type?: string;
  /** Only these machines (by id), in this order. */
  machineIds?: readonly string[];
  /** The machine the others are measured against; the loudest compared machine when absent. */
  referenceId?: string;
  /** Which whole-life cost the chart, the reference comparison and the marks use. */
  costBasis?: 'owned' | 'hired';
}

/** A machine against the reference machine. */
export interface AgainstReference {
  /** Reference LWA − this LWA, dB (positive: quieter). */
  dbReduction: number;
  /** Reference footprint − this footprint, m². */
  areaReductionM2: number;
  /** That reduction as a share of the reference footprint, %. */
  areaReductionPct: number;
  /** This whole-life cost − the reference's, per year. */
  extraCostPerYear: number;
  /** dB of reduction per 1,000 of extra whole-life cost a year; NaN when it costs no more. */
  dbPerThousand: number;
  /** m² of footprint reduction per 1,000 of extra whole-life cost a year; NaN when it costs no more. */
  m2PerThousand: number;
  /** Quieter and costs no more: a reduction for nothing. */
  freeWin: boolean;
}

export interface CompareRow {
  machineId: string;
  label: string;
  category: string;
  directiveCategory?: string;
  /** Guaranteed LWA (L + K), dB; NaN when not known. */
  lwaDb: number;
  /** No declared LWA: the permissible level stands in. */
  standIn: boolean;
  lwaExplanation: string;
  /** Directive 2000/14/EC permissible level, dB, when the machine is an Article 12 type with its quantity. */
  permissibleDb?: number;
  /** permissible − guaranteed LWA, dB (positive: under the limit). */
  directiveMarginDb?: number;
  /** Why there is no margin, in words. */
  directiveNote?: string;
  footprint: Footprint;
  cost: WholeLifeCost;
  /** The cost the marks and the reference comparison use (owned or hired). */
  costPerYear: number;
  exposure?: OperatorExposure;
  /** Undefined for the reference itself. */
  againstReference?: AgainstReference;
  isReference: boolean;
  /** No other compared machine is both cheaper (or as cheap) and quieter (or as quiet). */
  nonDominated: boolean;
}

export interface Comparison {
  rows: CompareRow[];
  referenceId?: string;
  workingDaysPerYear: number;
  operatorHoursPerDay: number;
  criterionDb: number;
  onTimePct: number;
  costBasis: 'owned' | 'hired';
  currency: string;
}

const SETTINGS: ProjectSettings = {
  referenceDistanceM: 10,
  characterPenaltyDb: 0,
  levelBasis: 'guaranteed',
  decimalSeparator: '.',
};

/** The machines a comparison takes: the ids asked for, else those of the type, else all. */
export function selectMachines(
  register: Register,
  options: Pick<CompareOptions, 'type' | 'machineIds'>,
): RegisterMachine[] {
  if (options.machineIds) {
    const byId = new Map(register.machines.map((m) => [m.id, m] as const));
    return options.machineIds.map((id) => byId.get(id)).filter((m): m is RegisterMachine => m !== undefined);
  }
  const type = options.type?.trim().toLowerCase();
  if (!type) return register.machines;
  return register.machines.filter(
    (m) => (m.directiveCategory ?? '').toLowerCase() === type || m.category.toLowerCase() === type,
  );
}

/**
 * Compares register machines. Throws InputError for a bad criterion, on-time, working days
 * or hours; a machine whose own figures are missing gets NaN figures, never zero.
 */
export function compareMachines(register: Register, options: CompareOptions): Comparison {
  const days = options.workingDaysPerYear ?? register.settings.workingDaysPerYear;
  inRange('working days a year', days, 1, 366, 'a whole number of days from 1 to 366, e.g. 200');
  const hours = options.operatorHoursPerDay ?? register.settings.operatorHoursPerDay;
  inRange('operator hours a day', hours, Number.MIN_VALUE, 24, 'hours above 0 and at most 24, e.g. 8');
  const costBasis = options.costBasis ?? 'owned';
  const money = (x: number) => formatMoney(x, register.currency);
  const machines = selectMachines(register, options);
  const base = machines.map((m) => {
    const candidate = machineAsCandidate(m, m.id, '-', days);
    const rated = ratedLevel(candidate, SETTINGS);
    const check = checkPermissible(candidate);
    const permissibleDb = check.permissible?.levelDb;
    const cost = wholeLifeCost(m, days, money);
    const lpa = m.operatorLpaDb;
    const exposure = lpa !== undefined && Number.isFinite(lpa) ? exposureFor(lpa, hours) : undefined;
    return {
      machineId: m.id,
      label: m.label,
      category: m.category,
      ...(m.directiveCategory ? { directiveCategory: m.directiveCategory } : {}),
      lwaDb: rated.lwaDb,
      standIn: rated.standIn,
      lwaExplanation: rated.offBasis ? `${rated.explanation}; ${OFF_BASIS_MARK}: ${rated.offBasis}` : rated.explanation,
      ...(permissibleDb !== undefined
        ? { permissibleDb, directiveMarginDb: permissibleDb - rated.lwaDb }
        : { directiveNote: check.note ?? 'no permissible level' }),
      footprint: machineFootprint(rated.lwaDb, options),
      cost,
      costPerYear: costBasis === 'owned' ? cost.ownedPerYear : cost.hiredPerYear,
      ...(exposure ? { exposure } : {}),
    };
  });
  const marks = nonDominated(base.map((r) => ({ cost: r.costPerYear, noise: r.lwaDb })));
  const reference =
    options.referenceId !== undefined
      ? base.find((r) => r.machineId === options.referenceId)
      : base
          .filter((r) => Number.isFinite(r.lwaDb))
          .reduce<(typeof base)[number] | undefined>(
            (loudest, r) => (!loudest || r.lwaDb > loudest.lwaDb ? r : loudest),
            undefined,
          );
  const rows: CompareRow[] = base.map((r, i) => {
    const isReference = reference?.machineId === r.machineId;
    const row: CompareRow = { ...r, isReference, nonDominated: marks[i] as boolean };
    if (reference && !isReference) row.againstReference = againstReference(r, reference);
    return row;
  });
  return {
    rows,
    ...(reference ? { referenceId: reference.machineId } : {}),
    workingDaysPerYear: days,
    operatorHoursPerDay: hours,
    criterionDb: options.criterionDb,
    onTimePct: options.onTimePct,
    costBasis,
    currency: register.currency,
  };
}

interface Figures {
  lwaDb: number;
  footprint: Footprint;
  costPerYear: number;
}

/** One machine against the reference. */
export function againstReference(row: Figures, reference: Figures): AgainstReference {
  const dbReduction = reference.lwaDb - row.lwaDb;
  const areaReductionM2 = reference.footprint.areaM2 - row.footprint.areaM2;
  const extraCostPerYear = row.costPerYear - reference.costPerYear;
  const pays = extraCostPerYear > 0;
  return {
    dbReduction,
    areaReductionM2,
    areaReductionPct: (100 * areaReductionM2) / reference.footprint.areaM2,
    extraCostPerYear,
    dbPerThousand: pays ? dbReduction / (extraCostPerYear / 1000) : NaN,
    m2PerThousand: pays ? areaReductionM2 / (extraCostPerYear / 1000) : NaN,
    freeWin: dbReduction > 0 && extraCostPerYear <= 0,
  };
}
