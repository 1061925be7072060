/**
 * Named fleets of a project: the baseline (the duties' baselines, never stored), the
 * optimiser's latest result and fleets the user makes, and which of them is assessed.
 * The matrix, rankings, report and workbook all describe the assessed fleet.
 */
import type { Fleet, NamedFleet, Project } from './model.ts';

/** The name every project's baseline fleet answers to. */
export const BASELINE_FLEET = 'baseline';
/** Reserved on the command line: solve afresh for the cheapest compliant fleet. */
export const BEST_FLEET = 'best';
/** The name the optimiser's latest result is kept under. */
export const OPTIMISER_FLEET = 'Cheapest compliant (optimiser)';

const same = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/** The baseline fleet: every duty's baseline candidate. */
export function baselineChoice(project: Project): Fleet {
  return Object.fromEntries(project.duties.map((d) => [d.id, d.baselineCandidateId]));
}

/** A stored fleet by name (case ignored), or undefined. */
export function storedFleet(project: Project, name: string): NamedFleet | undefined {
  return project.fleets?.find((f) => same(f.name, name));
}

/** The candidate ids of a fleet by name: 'baseline' or a stored fleet; undefined when unknown. */
export function fleetByName(project: Project, name: string): Fleet | undefined {
  if (same(name, BASELINE_FLEET)) return baselineChoice(project);
  const found = storedFleet(project, name);
  return found ? completeChoice(project, found.choice) : undefined;
}

/**
 * A stored choice made whole for the current project: duties it leaves out, and choices
 * that are no longer a candidate of their duty, take the duty's baseline.
 */
export function completeChoice(project: Project, choice: Fleet): Fleet {
  const own = new Map(project.candidates.map((c) => [c.id, c.dutyId] as const));
  return Object.fromEntries(
    project.duties.map((d) => {
      const pick = choice[d.id];
      return [d.id, pick !== undefined && own.get(pick) === d.id ? pick : d.baselineCandidateId];
    }),
  );
}

/** The fleet being assessed: its name (as stored) and its choice; the baseline when none is set or the name is gone. */
export function assessedFleet(project: Project): { name: string; fleet: Fleet; stored?: NamedFleet } {
  const name = project.assessedFleet;
  const stored = name === undefined ? undefined : storedFleet(project, name);
  if (!stored) return { name: BASELINE_FLEET, fleet: baselineChoice(project) };
  return { name: stored.name, fleet: completeChoice(project, stored.choice), stored };
}

/** Words for a fleet's name in headings: "the baseline fleet" or "fleet “…”". */
export function fleetWords(name: string): string {
  return same(name, BASELINE_FLEET) ? 'the baseline fleet' : `fleet “${name}”`;
}

/** Why a name cannot be given to a user's fleet, or undefined when it can. */
export function fleetNameProblem(project: Project, name: string, except?: string): string | undefined {
  const t = name.trim();
  if (t === '') return 'Fleet name: not filled in (type a name, e.g. “Quiet option A”)';
  if (same(t, BASELINE_FLEET) || same(t, BEST_FLEET))
    return `Fleet name: "${t}" is reserved (use another name, e.g. “Quiet option A”)`;
  if (project.fleets?.some((f) => same(f.name, t) && (except === undefined || !same(f.name, except))))
    return `Fleet name: "${t}" is already used (use another name)`;
  return undefined;
}

/**
 * The project with a fleet stored under `fleet.name` (replacing one of that name). Every
 * duty's pick is stored as given, so the fleet stays what was chosen when a baseline changes.
 */
export function withFleet(project: Project, fleet: NamedFleet): Project {
  const others = (project.fleets ?? []).filter((f) => !same(f.name, fleet.name));
  return { ...project, fleets: [...others, fleet] };
}

/** The project with a fleet removed; a removed assessed fleet hands over to the baseline. */
export function withoutFleet(project: Project, name: string): Project {
  const next: Project = { ...project, fleets: (project.fleets ?? []).filter((f) => !same(f.name, name)) };
  if (next.assessedFleet !== undefined && same(next.assessedFleet, name)) delete next.assessedFleet;
  if (next.fleets?.length === 0) delete next.fleets;
  return next;
}

/** The project assessing the named fleet ('baseline' clears the choice). */
export function withAssessedFleet(project: Project, name: string): Project {
  const next: Project = { ...project };
  if (same(name, BASELINE_FLEET)) delete next.assessedFleet;
  else next.assessedFleet = storedFleet(project, name)?.name ?? name;
  return next;
}

/**
 * A fingerprint of everything an optimiser result depends on: the project without its
 * name, notes, fleets and the assessed fleet's name. Two projects with the same inputs
 * give the same fingerprint (FNV-1a, 32 bits, of the JSON text, in hex).
 * O(size of the project).
 */
export function inputsFingerprint(project: Project): string {
  const { name: _n, notes: _o, fleets: _f, assessedFleet: _a, ...inputs } = project;
  const text = JSON.stringify(inputs);
  let hash = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    hash ^= text.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193) >>> 0;
  }
  return hash.toString(16).padStart(8, '0');
}

/** True when a fleet the optimiser found was found for other inputs than the project's now. */
export function isOutOfDate(project: Project, fleet: NamedFleet): boolean {
  return fleet.origin === 'optimiser' && fleet.foundFor !== undefined && fleet.foundFor !== inputsFingerprint(project);
}

/** Duties whose choice differs between two fleets, with both picks. */
export function fleetChanges(project: Project, a: Fleet, b: Fleet): { dutyId: string; from: string; to: string }[] {
  return project.duties.flatMap((d) => {
    const from = a[d.id] ?? d.baselineCandidateId;
    const to = b[d.id] ?? d.baselineCandidateId;
    return from === to ? [] : [{ dutyId: d.id, from, to }];
  });
}
