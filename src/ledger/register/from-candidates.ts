/**
 * Machines for the register from candidates read by the supplier-list importer
 * (io/import): the same noise fields, and the candidate's cost as hire terms or as purchase
 * terms (a life in days is kept as working days). Unread cells move with their machine
 * ("candidates/<id>/cost.price" becomes "machines/<id>/purchase.price").
 */
import type { Candidate } from '../model/model.ts';
import type { RegisterMachine } from './model.ts';
import { copiedValues } from './machine-candidate.ts';

/** One machine from one imported candidate, under the id given. */
export function machineFromCandidate(candidate: Candidate, id: string): RegisterMachine {
  const c = candidate.cost;
  return {
    ...copiedValues({ ...candidate, id } as unknown as RegisterMachine),
    id,
    label: candidate.label,
    category: candidate.category,
    declaration: candidate.declaration,
    lwaOrigin: candidate.lwaOrigin,
    character: candidate.character,
    energy: candidate.energy,
    source: candidate.source,
    runningPerDay: candidate.runningPerDay,
    ...(c.kind === 'purchase'
      ? {
          purchase: { price: c.price, resaleValue: c.resaleValue, life: c.lifeDays, lifeUnit: 'working-days' as const },
        }
      : {
          hire: {
            dayRate: c.dayRate,
            ...(c.weekRate !== undefined ? { weekRate: c.weekRate } : {}),
            ...(c.monthRate !== undefined ? { monthRate: c.monthRate } : {}),
          },
        }),
  };
}

const COST_FIELD: Record<string, string> = {
  'cost.price': 'purchase.price',
  'cost.resaleValue': 'purchase.resaleValue',
  'cost.lifeDays': 'purchase.life',
  'cost.dayRate': 'hire.dayRate',
  'cost.weekRate': 'hire.weekRate',
  'cost.monthRate': 'hire.monthRate',
};

/**
 * Imported candidates as register machines with fresh ids (m1, m2… after those taken), and
 * their unread cells re-keyed for the register.
 */
export function machinesFromImport(
  candidates: readonly Candidate[],
  unreadCells: Readonly<Record<string, string>>,
  takenIds: Iterable<string> = [],
): { machines: RegisterMachine[]; unreadCells: Record<string, string> } {
  const taken = new Set(takenIds);
  let n = 1;
  const idOf = new Map<string, string>();
  const machines = candidates.map((c) => {
    while (taken.has(`m${n}`)) n++;
    const id = `m${n}`;
    taken.add(id);
    idOf.set(c.id, id);
    return machineFromCandidate(c, id);
  });
  const unread: Record<string, string> = {};
  for (const [key, text] of Object.entries(unreadCells)) {
    const [list, cid, field] = key.split('/');
    const id = cid === undefined ? undefined : idOf.get(cid);
    if (list !== 'candidates' || !id || !field) continue;
    unread[`machines/${id}/${COST_FIELD[field] ?? field}`] = text;
  }
  return { machines, unreadCells: unread };
}
