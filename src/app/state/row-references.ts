/**
 * What refers to rows about to be deleted, and the two ways out a user is offered: move
 * the dependants to another row of the same list, or delete them too. Things are named by
 * their names, never by internal ids. Pure functions over the project; the Workspace
 * commits the outcome as one undo step.
 */
import type { Project } from '../../ledger/model/model.ts';
import type { TableList } from '../tables/column.ts';
import { withPeriodRemoved, withRowsDeleted } from './project-edits.ts';
import { groupByDuty } from '../tables/candidates.ts';

/** The rows that depend on the ones being deleted, in words, with where they could move. */
export interface RowReferences {
  list: TableList;
  ids: string[];
  /** e.g. 'Phase “Piling”' or '2 phases (“Piling”, “Groundworks”)'. */
  subject: string;
  /** e.g. 'the duties “Dig” and “Pile” work in it'. */
  dependants: string;
  /** Name of the dependants' kind, plural, for the buttons ("duties", "machines", "phases"). */
  dependantKind: string;
  /** Rows of the same list the dependants can move to (none when moving makes no sense). */
  moveTargets: { id: string; name: string }[];
}

export type ReferenceChoice = { kind: 'move'; to: string } | { kind: 'delete-too' };

const quoted = (name: string) => `“${name.trim() === '' ? '(unnamed)' : name}”`;
function nameList(names: readonly string[], limit = 4): string {
  const shown = names.slice(0, limit).map(quoted);
  if (names.length > limit) return `${shown.join(', ')} and ${names.length - limit} more`;
  return shown.length <= 1 ? (shown[0] ?? '') : `${shown.slice(0, -1).join(', ')} and ${shown[shown.length - 1]}`;
}

const KIND: Record<TableList, [string, string]> = {
  candidates: ['Machine', 'machines'],
  duties: ['Duty', 'duties'],
  receivers: ['Receiver', 'receivers'],
  phases: ['Phase', 'phases'],
  periods: ['Period', 'periods'],
  clauses: ['Clause', 'clauses'],
};

function subjectOf(list: TableList, names: string[]): string {
  const [one, many] = KIND[list];
  return names.length === 1 ? `${one} ${quoted(names[0] ?? '')}` : `${names.length} ${many} (${nameList(names)})`;
}

/**
 * What refers to the rows `ids` of `list`: duties to a phase, machines to a duty, phases to
 * an assessment period. Undefined when nothing does (the rows can go at once). A receiver's
 * own limits, distances and screening are its data and go with it; they are not listed.
 */
export function referencesTo(project: Project, list: TableList, ids: readonly string[]): RowReferences | undefined {
  const gone = new Set(ids);
  const nameOf = (rows: readonly { id: string; name: string }[]) =>
    rows.filter((r) => gone.has(r.id)).map((r) => r.name);
  const keep = (rows: readonly { id: string; name: string }[]) =>
    rows.filter((r) => !gone.has(r.id)).map((r) => ({ id: r.id, name: r.name }));
  if (list === 'phases') {
    const duties = project.duties.filter((d) => gone.has(d.phaseId));
    if (!duties.length) return undefined;
    return {
      list,
      ids: [...ids],
      subject: subjectOf(list, nameOf(project.phases)),
      dependants: `${duties.length === 1 ? 'the duty' : 'the duties'} ${nameList(duties.map((d) => d.name))} ${duties.length === 1 ? 'works' : 'work'} in it`,
      dependantKind: 'duties',
      moveTargets: keep(project.phases),
    };
  }
  if (list === 'duties') {
    const machines = project.candidates.filter((c) => gone.has(c.dutyId));
    if (!machines.length) return undefined;
    return {
      list,
      ids: [...ids],
      subject: subjectOf(list, nameOf(project.duties)),
      dependants: `${machines.length === 1 ? 'the machine' : `${machines.length} machines`} ${nameList(machines.map((c) => c.label))} ${machines.length === 1 ? 'is' : 'are'} offered for it`,
      dependantKind: 'machines',
      moveTargets: keep(project.duties),
    };
  }
  if (list === 'periods') {
    const phases = project.phases.filter((p) => gone.has(p.periodId));
    if (!phases.length) return undefined;
    return {
      list,
      ids: [...ids],
      subject: subjectOf(list, nameOf(project.periods)),
      dependants: `${phases.length === 1 ? 'the phase' : 'the phases'} ${nameList(phases.map((p) => p.name))} ${phases.length === 1 ? 'is' : 'are'} assessed over it`,
      dependantKind: 'phases',
      moveTargets: keep(project.periods),
    };
  }
  return undefined;
}

/**
 * Deletes the rows after the user's choice: their dependants move to `to` first, or are
 * deleted too (a deleted phase takes its duties and their machines; a deleted period its
 * phases, their duties and machines, and the receivers' limits for it).
 */
export function withReferencedRowsDeleted(project: Project, refs: RowReferences, choice: ReferenceChoice): Project {
  const gone = new Set(refs.ids);
  let next = project;
  if (refs.list === 'phases') {
    if (choice.kind === 'move')
      next = { ...next, duties: next.duties.map((d) => (gone.has(d.phaseId) ? { ...d, phaseId: choice.to } : d)) };
    else
      next = withRowsDeleted(
        next,
        'duties',
        next.duties.filter((d) => gone.has(d.phaseId)).map((d) => d.id),
      );
    return withRowsDeleted(next, 'phases', refs.ids);
  }
  if (refs.list === 'duties') {
    if (choice.kind === 'move') {
      // a pin belongs to the old duty's choice, so a moved machine is no longer pinned
      const moved = next.candidates.map((c) => {
        if (!gone.has(c.dutyId)) return c;
        const { pinned: _pin, ...rest } = c;
        return { ...rest, dutyId: choice.to };
      });
      next = { ...next, candidates: groupByDuty(next, moved) };
    }
    return withRowsDeleted(next, 'duties', refs.ids);
  }
  if (refs.list === 'periods') {
    if (choice.kind === 'move')
      next = { ...next, phases: next.phases.map((p) => (gone.has(p.periodId) ? { ...p, periodId: choice.to } : p)) };
    else
      next = withReferencedRowsDeleted(
        next,
        { ...refs, list: 'phases', ids: next.phases.filter((p) => gone.has(p.periodId)).map((p) => p.id) },
        { kind: 'delete-too' },
      );
    for (const id of refs.ids) {
      const outcome = withPeriodRemoved(next, id);
      if (outcome && 'next' in outcome) next = outcome.next;
    }
    return next;
  }
  return withRowsDeleted(next, refs.list, refs.ids);
}
