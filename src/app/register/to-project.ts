/**
 * Register machines as a project's candidates: copies that remember their register entry
 * (ledger/register/machine-candidate.ts), with the text of unread noise cells carried over
 * so nothing typed is lost on the way.
 */
import type { Candidate, Project } from '../../ledger/model/model.ts';
import type { Register } from '../../ledger/register/model.ts';
import {
  COPIED_FIELDS,
  defaultBasis,
  machineAsCandidate,
  type CostBasis,
} from '../../ledger/register/machine-candidate.ts';
import { nextId } from '../tables/column.ts';

const CARRIED = new Set<string>(COPIED_FIELDS);

/**
 * New candidates for `dutyId`, one per machine id (in the order given), with their unread
 * cells. `basis` chooses the cost the copy carries: purchase or hire, or "own" — purchase
 * when the machine has purchase terms, else hire. A basis the machine has no terms for
 * leaves the amounts missing (flagged in the project), never invented.
 */
export function candidatesFromRegister(
  register: Register,
  machineIds: readonly string[],
  project: Project,
  dutyId: string,
  basis: CostBasis | 'own' = 'own',
): { candidates: Candidate[]; unreadCells: Record<string, string> } {
  const taken = new Set(project.candidates.map((c) => c.id));
  const byId = new Map(register.machines.map((m) => [m.id, m] as const));
  const candidates: Candidate[] = [];
  const unreadCells: Record<string, string> = {};
  for (const mid of machineIds) {
    const machine = byId.get(mid);
    if (!machine) continue;
    const id = nextId('c', taken);
    taken.add(id);
    candidates.push(
      machineAsCandidate(
        machine,
        id,
        dutyId,
        register.settings.workingDaysPerYear,
        basis === 'own' ? defaultBasis(machine) : basis,
      ),
    );
    for (const [key, text] of Object.entries(register.unreadCells ?? {})) {
      const [list, rowId, field] = key.split('/');
      if (list === 'machines' && rowId === mid && field !== undefined && CARRIED.has(field.split('.')[0] as string))
        unreadCells[`candidates/${id}/${field}`] = text;
    }
  }
  return { candidates, unreadCells };
}
