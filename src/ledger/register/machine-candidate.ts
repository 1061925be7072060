/**
 * A register machine as a project's candidate for a duty: a copy of its noise data and
 * costs that remembers the register entry it came from (`registerLink`), so the project
 * can later show where the copy and the register differ and update it on request.
 *
 * Costs: a candidate has one basis. Purchase is used when the machine has purchase terms
 * (its life converted to working days with the buyer's working days a year), else hire.
 */
import type { Candidate, CandidateCost } from '../model/model.ts';
import type { RegisterMachine } from './model.ts';

export type CostBasis = CandidateCost['kind'];

/** The basis a machine is copied on when none is asked for: purchase when it has purchase terms, else hire. */
export function defaultBasis(machine: RegisterMachine): CostBasis {
  return machine.purchase ? 'purchase' : 'hire';
}

/** The machine's cost on one basis, as a candidate holds it; NaN amounts when the machine lacks them. */
export function machineCost(machine: RegisterMachine, basis: CostBasis, workingDaysPerYear: number): CandidateCost {
  if (basis === 'hire') {
    const h = machine.hire;
    if (!h) return { kind: 'hire', dayRate: NaN };
    return {
      kind: 'hire',
      dayRate: h.dayRate,
      ...(h.weekRate !== undefined ? { weekRate: h.weekRate } : {}),
      ...(h.monthRate !== undefined ? { monthRate: h.monthRate } : {}),
    };
  }
  const p = machine.purchase;
  if (!p) return { kind: 'purchase', price: NaN, lifeDays: NaN, resaleValue: 0 };
  const lifeDays = p.lifeUnit === 'working-days' ? p.life : p.life * workingDaysPerYear;
  return { kind: 'purchase', price: p.price, lifeDays, resaleValue: p.resaleValue };
}

/** The fields a candidate copies from its register entry (besides the cost), in the order differences are listed. */
export const COPIED_FIELDS = [
  'label',
  'category',
  'directiveCategory',
  'netPowerKw',
  'directiveQuantity',
  'lwaDb',
  'declaration',
  'uncertaintyDb',
  'lwaOrigin',
  'bandsDb',
  'operatorLpaDb',
  'character',
  'energy',
  'source',
  'runningPerDay',
] as const satisfies readonly (keyof Candidate & keyof RegisterMachine)[];

export type CopiedField = (typeof COPIED_FIELDS)[number];

/** The machine's copied fields, leaving out those it does not have. */
export function copiedValues(machine: RegisterMachine): Partial<Pick<Candidate, CopiedField>> {
  const out: Record<string, unknown> = {};
  for (const key of COPIED_FIELDS) {
    const value = machine[key];
    if (value !== undefined) out[key] = Array.isArray(value) ? [...value] : value;
  }
  return out as Partial<Pick<Candidate, CopiedField>>;
}

/**
 * A new candidate for `dutyId` copied from a register machine.
 * @example machineAsCandidate(m, 'c7', 'd2', 200).registerLink // { machineId: 'm3', basis: 'purchase' }
 */
export function machineAsCandidate(
  machine: RegisterMachine,
  id: string,
  dutyId: string,
  workingDaysPerYear: number,
  basis: CostBasis = defaultBasis(machine),
): Candidate {
  return {
    id,
    dutyId,
    label: machine.label,
    category: machine.category,
    declaration: machine.declaration,
    lwaOrigin: machine.lwaOrigin,
    character: machine.character,
    energy: machine.energy,
    source: machine.source,
    runningPerDay: machine.runningPerDay,
    ...copiedValues(machine),
    cost: machineCost(machine, basis, workingDaysPerYear),
    fixedCharges: 0,
    registerLink: { machineId: machine.id, basis },
  };
}
