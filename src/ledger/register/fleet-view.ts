/**
 * The fleet against a buyer's criterion (e.g. a client's site rule "no machine above
 * 100 dB LWA"): for each type of machine in the register, how many are over it, and what
 * replacing them would cost — each by the register machine of the same type that meets
 * the criterion at the lowest purchase price (the price is what replacing costs up front;
 * the old machine's resale is not counted). O(n log n).
 */
import type { Register, RegisterMachine } from './model.ts';
import { machineAsCandidate } from './machine-candidate.ts';
import { ratedLevel } from '../rating/rated-level.ts';
import { finite } from '../../core/check.ts';

export interface FleetTypeRow {
  /** Directive type, or the category text when the machine has none. */
  type: string;
  machines: number;
  /** Machines whose guaranteed LWA is above the criterion. */
  over: number;
  /** Machines whose LWA is not known (not counted as over or under). */
  unknown: number;
  /** The ids of the machines over. */
  overIds: string[];
  /** The cheapest register machine of the type that meets the criterion, when there is one. */
  replacementId?: string;
  replacementLabel?: string;
  replacementPrice?: number;
  /** over × replacement price; NaN when no machine of the type meets the criterion. */
  replacementCost: number;
}

export interface FleetView {
  criterionLwaDb: number;
  rows: FleetTypeRow[];
  totalOver: number;
  /** Sum of the replacement costs that can be computed. */
  totalReplacementCost: number;
  /** Types with machines over and no machine meeting the criterion. */
  typesWithoutReplacement: string[];
}

const SETTINGS = {
  referenceDistanceM: 10,
  characterPenaltyDb: 0,
  levelBasis: 'guaranteed',
  decimalSeparator: '.',
} as const;

/** The type a machine is counted under. */
export function machineType(machine: RegisterMachine): string {
  return machine.directiveCategory?.trim() || machine.category.trim() || '(no type)';
}

/**
 * Counts the register's machines over an LWA criterion, type by type, and the cost of replacing them.
 * @example fleetView(register, 100).rows[0] // { type: 'excavator', machines: 3, over: 1, replacementCost: 180000, … }
 */
export function fleetView(register: Register, criterionLwaDb: number): FleetView {
  finite('criterion', criterionLwaDb, 'a sound power level in dB, e.g. 100');
  const days = register.settings.workingDaysPerYear;
  const groups = new Map<string, { machine: RegisterMachine; lwa: number }[]>();
  for (const m of register.machines) {
    const lwa = ratedLevel(machineAsCandidate(m, m.id, '-', days), SETTINGS).lwaDb;
    const type = machineType(m);
    const list = groups.get(type) ?? [];
    list.push({ machine: m, lwa });
    groups.set(type, list);
  }
  const rows: FleetTypeRow[] = [...groups.entries()]
    .sort(([a], [b]) => a.localeCompare(b))
    .map(([type, list]) => {
      const overList = list.filter((x) => Number.isFinite(x.lwa) && x.lwa > criterionLwaDb);
      const unknown = list.filter((x) => !Number.isFinite(x.lwa)).length;
      const candidates = list
        .filter(
          (x) =>
            Number.isFinite(x.lwa) &&
            x.lwa <= criterionLwaDb &&
            x.machine.purchase &&
            Number.isFinite(x.machine.purchase.price),
        )
        .sort((a, b) => (a.machine.purchase?.price ?? 0) - (b.machine.purchase?.price ?? 0));
      const best = candidates[0]?.machine;
      const price = best?.purchase?.price;
      return {
        type,
        machines: list.length,
        over: overList.length,
        unknown,
        overIds: overList.map((x) => x.machine.id),
        ...(best && price !== undefined
          ? { replacementId: best.id, replacementLabel: best.label, replacementPrice: price }
          : {}),
        replacementCost: overList.length === 0 ? 0 : price !== undefined ? overList.length * price : NaN,
      };
    });
  return {
    criterionLwaDb,
    rows,
    totalOver: rows.reduce((n, r) => n + r.over, 0),
    totalReplacementCost: rows.reduce((n, r) => n + (Number.isFinite(r.replacementCost) ? r.replacementCost : 0), 0),
    typesWithoutReplacement: rows.filter((r) => r.over > 0 && !Number.isFinite(r.replacementCost)).map((r) => r.type),
  };
}
