/**
 * The Workspace's named edits as pure functions: each takes the current project and
 * returns the next one (a new object; unchanged parts shared), so the Workspace only
 * commits the result as one undo step.
 */
import type {
  AssessmentPeriod,
  Candidate,
  Clause,
  Duty,
  Phase,
  Project,
  ProjectSettings,
  Receiver,
} from '../../ledger/model/model.ts';
import { deleteTableRows, rereadUnread } from '../tables/apply.ts';
import { blankCandidate, candidateTable, groupByDuty } from '../tables/candidates.ts';
import { dutyTable } from '../tables/duties.ts';
import { receiverTable } from '../tables/receivers.ts';
import { phaseTable } from '../tables/phases.ts';
import { periodTable } from '../tables/periods.ts';
import { clauseTable } from '../tables/clauses.ts';
import { nextId, type TableContext, type TableDefinition, type TableList } from '../tables/column.ts';

export type AnyTable =
  | TableDefinition<Candidate>
  | TableDefinition<Duty>
  | TableDefinition<Receiver>
  | TableDefinition<Phase>
  | TableDefinition<AssessmentPeriod>
  | TableDefinition<Clause>;

/** A table for writing only: same parsing as the shown one, no computed figures needed. */
export function writerTable(project: Project, list: TableList): AnyTable {
  const ctx: TableContext = { project, separator: project.settings.decimalSeparator };
  switch (list) {
    case 'candidates':
      return candidateTable({ ...ctx, ranking: new Map(), receiverName: '' });
    case 'duties':
      return dutyTable(ctx);
    case 'receivers':
      return receiverTable(ctx);
    case 'phases':
      return phaseTable(ctx);
    case 'periods':
      return periodTable(ctx);
    case 'clauses':
      return clauseTable(ctx);
  }
}

function withoutKeys<T>(record: Record<string, T>, gone: ReadonlySet<string>): Record<string, T> {
  return Object.fromEntries(Object.entries(record).filter(([k]) => !gone.has(k)));
}

/**
 * Deletes rows of one table. Deleting a duty deletes its candidates and the receivers'
 * screening from it; deleting a receiver deletes the duties' distances to it.
 */
export function withRowsDeleted(project: Project, list: TableList, ids: readonly string[]): Project {
  let next = deleteTableRows(project, writerTable(project, list) as TableDefinition<{ id: string }>, ids);
  if (list === 'duties' && next !== project) {
    const gone = new Set(ids);
    const orphans = next.candidates.filter((c) => gone.has(c.dutyId)).map((c) => c.id);
    if (orphans.length)
      next = deleteTableRows(next, writerTable(next, 'candidates') as TableDefinition<{ id: string }>, orphans);
    // the receivers' screening from a deleted duty goes with it
    if (next.receivers.some((r) => ids.some((id) => id in r.screening))) {
      next = {
        ...next,
        receivers: next.receivers.map((r) =>
          ids.some((id) => id in r.screening) ? { ...r, screening: withoutKeys(r.screening, gone) } : r,
        ),
      };
    }
  }
  if (list === 'receivers' && next !== project) {
    // the duties' stated distances to a deleted receiver go with it
    const gone = new Set(ids);
    next = {
      ...next,
      duties: next.duties.map((d) =>
        d.location.kind === 'distances' && Object.keys(d.location.distancesM).some((k) => gone.has(k))
          ? { ...d, location: { kind: 'distances', distancesM: withoutKeys(d.location.distancesM, gone) } }
          : d,
      ),
    };
  }
  return next;
}

/**
 * Appends a blank row to one table; returns the project and the new row's id, or
 * undefined when the row has nowhere to belong (a machine needs a duty first). A new
 * machine joins `dutyId` (else the first duty).
 */
export function withRowAdded(
  project: Project,
  list: TableList,
  dutyId?: string,
): { next: Project; id: string } | undefined {
  if (list === 'candidates' && project.duties.length === 0) return undefined;
  const table = writerTable(project, list) as TableDefinition<{ id: string }>;
  const rows = table.rows(project);
  const blank = table.blankRow(project, new Set(rows.map((r) => r.id)), rows[rows.length - 1], dutyId);
  return { next: table.withRows(project, [...rows, blank]), id: blank.id };
}

/** Adds a blank candidate (with `fields`) to a duty; returns the project and the new id. */
export function withCandidateAdded(
  project: Project,
  dutyId: string,
  fields: Partial<Omit<Candidate, 'id' | 'dutyId'>> = {},
): { next: Project; id: string } {
  const id = nextId('c', new Set(project.candidates.map((c) => c.id)));
  const candidate: Candidate = { ...blankCandidate(id, dutyId), ...fields };
  return { next: { ...project, candidates: groupByDuty(project, [...project.candidates, candidate]) }, id };
}

/** Adds candidates read from a supplier's list, with their unread cells' text; ids in use are replaced by free ones. */
export function withCandidatesAdded(
  project: Project,
  candidates: readonly Candidate[],
  unreadCells: Record<string, string>,
): Project {
  const taken = new Set(project.candidates.map((c) => c.id));
  const renamed = new Map<string, string>();
  const added = candidates.map((c) => {
    if (!taken.has(c.id)) {
      taken.add(c.id);
      return c;
    }
    const id = nextId('c', taken);
    taken.add(id);
    renamed.set(c.id, id);
    return { ...c, id };
  });
  const unread = { ...(project.unreadCells ?? {}) };
  for (const [key, text] of Object.entries(unreadCells)) {
    const [list, id, ...rest] = key.split('/');
    const newId = id !== undefined ? (renamed.get(id) ?? id) : id;
    unread[[list, newId, ...rest].join('/')] = text;
  }
  const next: Project = { ...project, candidates: groupByDuty(project, [...project.candidates, ...added]) };
  if (Object.keys(unread).length) next.unreadCells = unread;
  return next;
}

/** Pins or unpins a candidate; pinning one unpins the others of its duty and includes it. */
export function withPinned(project: Project, candidateId: string, pinned: boolean): Project {
  const target = project.candidates.find((c) => c.id === candidateId);
  if (!target) return project;
  const candidates = project.candidates.map((c) => {
    if (c.id === candidateId)
      return withFlag(withFlag(c, 'pinned', pinned), 'excluded', pinned ? false : c.excluded === true);
    if (pinned && c.dutyId === target.dutyId && c.pinned) return withFlag(c, 'pinned', false);
    return c;
  });
  return { ...project, candidates };
}

/** Excludes or includes a candidate; excluding unpins it. */
export function withExcluded(project: Project, candidateId: string, excluded: boolean): Project {
  const candidates = project.candidates.map((c) =>
    c.id === candidateId
      ? withFlag(withFlag(c, 'excluded', excluded), 'pinned', excluded ? false : c.pinned === true)
      : c,
  );
  return { ...project, candidates };
}

/** Changes settings; a new decimal separator re-reads the kept text of unread cells. */
export function withSettings(project: Project, patch: Partial<ProjectSettings>): Project {
  let next: Project = { ...project, settings: { ...project.settings, ...patch } };
  if (patch.decimalSeparator && patch.decimalSeparator !== project.settings.decimalSeparator && next.unreadCells) {
    const ctx: TableContext = { project: next, separator: patch.decimalSeparator };
    next = rereadUnread(next, candidateTable({ ...ctx, ranking: new Map(), receiverName: '' }));
    next = rereadUnread(next, dutyTable({ ...ctx, project: next }));
    next = rereadUnread(next, receiverTable({ ...ctx, project: next }));
    next = rereadUnread(next, clauseTable({ ...ctx, project: next }));
  }
  return next;
}

/** Changes an assessment period's name or hours. */
export function withPeriodChanged(
  project: Project,
  periodId: string,
  patch: Partial<{ name: string; start: string; end: string }>,
): Project {
  return { ...project, periods: project.periods.map((p) => (p.id === periodId ? { ...p, ...patch } : p)) };
}

/** Adds an assessment period; returns the project and the new period's id. */
export function withPeriodAdded(
  project: Project,
  name: string,
  start: string,
  end: string,
): { next: Project; id: string } {
  const id = nextId('t', new Set(project.periods.map((p) => p.id)));
  return { next: { ...project, periods: [...project.periods, { id, name, start, end }] }, id };
}

/**
 * Removes an assessment period and the receivers' limits for it, or says why not (a phase
 * is assessed over it).
 */
export function withPeriodRemoved(
  project: Project,
  periodId: string,
): { next: Project } | { refused: string } | undefined {
  const period = project.periods.find((p) => p.id === periodId);
  if (!period) return undefined;
  const users = project.phases.filter((p) => p.periodId === periodId);
  if (users.length) {
    return {
      refused: `Period "${period.name}" is used by ${users.length === 1 ? 'the phase' : 'the phases'} ${users.map((p) => `"${p.name}"`).join(', ')}: choose another period for ${users.length === 1 ? 'it' : 'them'} in the Phases tab first`,
    };
  }
  const receivers = project.receivers.map((r) => {
    if (!(periodId in r.limitsDb)) return r;
    const { [periodId]: _gone, ...limitsDb } = r.limitsDb;
    return { ...r, limitsDb };
  });
  const next: Project = { ...project, periods: project.periods.filter((p) => p.id !== periodId), receivers };
  const suffix = `/limitsDb.${periodId}`;
  const own = `periods/${periodId}/`;
  const unread = Object.entries(project.unreadCells ?? {}).filter(
    ([key]) => !key.startsWith(own) && !(key.startsWith('receivers/') && key.endsWith(suffix)),
  );
  if (unread.length) next.unreadCells = Object.fromEntries(unread);
  else delete next.unreadCells;
  return { next };
}

function withFlag(c: Candidate, flag: 'pinned' | 'excluded', on: boolean): Candidate {
  if ((c[flag] === true) === on) return c;
  const copy = { ...c };
  if (on) copy[flag] = true;
  else delete copy[flag];
  return copy;
}
