/**
 * Which duties a clause covers, and small look-ups shared by the clause checks.
 */
import type { Candidate, Duty, Project } from '../model/model.ts';
import type { Clause } from './clause.ts';

/** True when the clause covers the duty: it names none (every duty) or names this one. */
export function coversDuty(clause: Clause, dutyId: string): boolean {
  return clause.dutyIds === undefined || clause.dutyIds.length === 0 || clause.dutyIds.includes(dutyId);
}

/** The duties a clause covers, in project order. O(duties × names). */
export function dutiesCovered(project: Project, clause: Clause): Duty[] {
  return project.duties.filter((d) => coversDuty(clause, d.id));
}

/** Candidates by id (the first with an id, as a search would find). O(candidates). */
export function candidateIndex(project: Project): Map<string, Candidate> {
  const byId = new Map<string, Candidate>();
  for (const c of project.candidates) if (!byId.has(c.id)) byId.set(c.id, c);
  return byId;
}

/** The clause's name for messages: `Clause 7.3.2` or `Clause 3` (position from 1). */
export function clauseName(clause: Clause, index: number): string {
  return clause.ref.trim() !== '' ? `Clause ${clause.ref.trim()}` : `Clause ${index + 1}`;
}
