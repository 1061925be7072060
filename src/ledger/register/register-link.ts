/**
 * Candidates copied from the register against the register as it is now: which differ,
 * in which fields, and the candidate brought up to date when — and only when — the user
 * asks. A copy is the project's own: nothing here changes a project by itself.
 */
import type { Candidate, Project } from '../model/model.ts';
import type { Register, RegisterMachine } from './model.ts';
import { COPIED_FIELDS, copiedValues, machineCost, type CopiedField } from './machine-candidate.ts';

/** One field where a linked candidate and its register machine differ. */
export interface LinkDifference {
  /** Dotted field of the candidate, e.g. "lwaDb", "cost.price". */
  field: string;
  /** Words for the field. */
  label: string;
  /** The candidate's value as text ("" when absent). */
  inProject: string;
  /** The register's value as text ("" when absent). */
  inRegister: string;
}

export type LinkStatus =
  | { state: 'same' }
  | { state: 'differs'; differences: LinkDifference[] }
  /** The register has no machine with the linked id (deleted, or another register). */
  | { state: 'missing' };

const LABELS: Record<
  | CopiedField
  | 'cost.dayRate'
  | 'cost.weekRate'
  | 'cost.monthRate'
  | 'cost.price'
  | 'cost.resaleValue'
  | 'cost.lifeDays',
  string
> = {
  label: 'label',
  category: 'category',
  directiveCategory: 'directive type',
  netPowerKw: 'net power, kW',
  directiveQuantity: 'directive quantity',
  lwaDb: 'LWA, dB',
  declaration: 'declaration',
  uncertaintyDb: 'K, dB',
  lwaOrigin: 'LWA obtained as',
  bandsDb: 'octave bands',
  operatorLpaDb: 'operator LpA, dB',
  character: 'character',
  energy: 'energy',
  source: 'source',
  runningPerDay: 'running cost per day',
  'cost.dayRate': 'day rate',
  'cost.weekRate': 'week rate',
  'cost.monthRate': 'month rate',
  'cost.price': 'price',
  'cost.resaleValue': 'resale value',
  'cost.lifeDays': 'life, working days',
};

function text(value: unknown): string {
  if (value === undefined || value === null) return '';
  if (typeof value === 'number') return Number.isNaN(value) ? 'unread' : String(Math.round(value * 1000) / 1000);
  if (Array.isArray(value)) return value.map(text).join(' ');
  return String(value);
}

function same(a: unknown, b: unknown): boolean {
  if (Array.isArray(a) || Array.isArray(b)) {
    if (!Array.isArray(a) || !Array.isArray(b) || a.length !== b.length) return false;
    return a.every((x, i) => same(x, b[i]));
  }
  if (typeof a === 'number' && typeof b === 'number') return Object.is(a, b) || Math.abs(a - b) < 1e-9;
  return a === b;
}

/**
 * The fields in which a linked candidate differs from its register machine (the copied
 * fields, then the cost on the link's basis). O(fields).
 */
export function linkDifferences(
  candidate: Candidate,
  machine: RegisterMachine,
  workingDaysPerYear: number,
): LinkDifference[] {
  const out: LinkDifference[] = [];
  const copied = copiedValues(machine) as Record<string, unknown>;
  for (const key of COPIED_FIELDS) {
    const mine = (candidate as unknown as Record<string, unknown>)[key];
    const theirs = copied[key];
    if (!same(mine, theirs))
      out.push({ field: key, label: LABELS[key], inProject: text(mine), inRegister: text(theirs) });
  }
  const basis = candidate.registerLink?.basis ?? candidate.cost.kind;
  const cost = machineCost(machine, basis, workingDaysPerYear) as unknown as Record<string, unknown>;
  const mineCost = candidate.cost as unknown as Record<string, unknown>;
  if (candidate.cost.kind !== basis) {
    out.push({ field: 'cost.kind', label: 'cost basis', inProject: candidate.cost.kind, inRegister: basis });
    return out;
  }
  const keys =
    basis === 'hire'
      ? (['dayRate', 'weekRate', 'monthRate'] as const)
      : (['price', 'resaleValue', 'lifeDays'] as const);
  for (const k of keys) {
    if (!same(mineCost[k], cost[k]))
      out.push({
        field: `cost.${k}`,
        label: LABELS[`cost.${k}`],
        inProject: text(mineCost[k]),
        inRegister: text(cost[k]),
      });
  }
  return out;
}

/** The state of one linked candidate against the register. */
export function linkStatus(candidate: Candidate, register: Register): LinkStatus | undefined {
  const link = candidate.registerLink;
  if (!link) return undefined;
  const machine = register.machines.find((m) => m.id === link.machineId);
  if (!machine) return { state: 'missing' };
  const differences = linkDifferences(candidate, machine, register.settings.workingDaysPerYear);
  return differences.length === 0 ? { state: 'same' } : { state: 'differs', differences };
}

/** The state of every linked candidate of a project, by candidate id. O(candidates + machines). */
export function projectLinkStatus(project: Project, register: Register): Map<string, LinkStatus> {
  const out = new Map<string, LinkStatus>();
  for (const c of project.candidates) {
    const status = linkStatus(c, register);
    if (status) out.set(c.id, status);
  }
  return out;
}

/**
 * The candidate brought up to date with its register machine: the copied fields and the
 * cost on the link's basis are replaced; its id, duty, operator hours, one-off charges,
 * pin and exclusion stay the project's. Unread cells of replaced fields are the caller's
 * to clear (see `updateLinkedCandidates`).
 */
export function candidateFromMachine(
  candidate: Candidate,
  machine: RegisterMachine,
  workingDaysPerYear: number,
): Candidate {
  const basis = candidate.registerLink?.basis ?? candidate.cost.kind;
  const kept: Record<string, unknown> = { ...candidate };
  for (const key of COPIED_FIELDS) delete kept[key];
  return {
    ...(kept as unknown as Candidate),
    ...copiedValues(machine),
    label: machine.label,
    category: machine.category,
    declaration: machine.declaration,
    lwaOrigin: machine.lwaOrigin,
    character: machine.character,
    energy: machine.energy,
    source: machine.source,
    runningPerDay: machine.runningPerDay,
    cost: machineCost(machine, basis, workingDaysPerYear),
    registerLink: { machineId: machine.id, basis },
  };
}

/**
 * The project with the chosen linked candidates updated from the register (on request).
 * Candidates not named, not linked, or whose machine is missing are left as they are;
 * unread cells of the updated candidates' replaced fields are dropped, since the value now
 * comes from the register.
 */
export function updateLinkedCandidates(project: Project, register: Register, candidateIds: readonly string[]): Project {
  const wanted = new Set(candidateIds);
  const byId = new Map(register.machines.map((m) => [m.id, m] as const));
  const updated = new Set<string>();
  const candidates = project.candidates.map((c) => {
    const machine = c.registerLink && wanted.has(c.id) ? byId.get(c.registerLink.machineId) : undefined;
    if (!machine) return c;
    updated.add(c.id);
    return candidateFromMachine(c, machine, register.settings.workingDaysPerYear);
  });
  if (updated.size === 0) return project;
  let unreadCells = project.unreadCells;
  if (unreadCells) {
    const replaced = new Set<string>([...COPIED_FIELDS, 'cost']);
    const kept = Object.entries(unreadCells).filter(([key]) => {
      const [list, id, field] = key.split('/');
      return !(
        list === 'candidates' &&
        id !== undefined &&
        updated.has(id) &&
        field !== undefined &&
        replaced.has(field.split('.')[0] as string)
      );
    });
    unreadCells = Object.fromEntries(kept);
  }
  return { ...project, candidates, ...(unreadCells ? { unreadCells } : {}) };
}
