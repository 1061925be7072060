/**
 * The project a level map evaluates: the phase's duties only, each with the fleet's chosen
 * machine only, placed on the site grid (a duty known only by its distances to the receivers
 * has no distance to a map point: it is left out, and {@link dutiesLeftOff} names it), and one receiver per map point (no façade, no typed screening, no limit,
 * at the map's height). Everything the path and the
 * levels depend on — propagation, settings, periods, phases, barriers, the duties' places
 * and heights — is the project's own.
 */
import type { Fleet, Project, Receiver, SitePoint } from '../model/model.ts';

/** Ids of the map's receivers: this prefix and the point's index (the cut-down project has no other receiver). */
export const MAP_RECEIVER_PREFIX = '@map';

/** The cut-down project for a phase, fleet and points at height `heightM`. O(duties + candidates + points). */
export function mapProject(
  project: Project,
  phaseId: string,
  fleet: Fleet,
  points: readonly SitePoint[],
  heightM: number,
): Project {
  const duties = project.duties.filter((d) => d.phaseId === phaseId && d.location.kind !== 'distances');
  const chosen = new Set(duties.map((d) => fleet[d.id] ?? d.baselineCandidateId));
  const receivers: Receiver[] = points.map((p, i) => ({
    id: `${MAP_RECEIVER_PREFIX}${i}`,
    name: `Map point ${i}`,
    kind: 'other',
    x: p.x,
    y: p.y,
    heightM,
    facade: false,
    limitsDb: {},
    screening: {},
  }));
  return {
    ...project,
    phases: project.phases.filter((p) => p.id === phaseId),
    receivers,
    duties: duties.map((d) => ({ ...d, baselineCandidateId: fleet[d.id] ?? d.baselineCandidateId })),
    candidates: project.candidates.filter((c) => chosen.has(c.id)),
    fleets: [],
  };
}

/** The phase's duties a map cannot place (stated distances, no position on the site grid), by name. */
export function dutiesLeftOff(project: Project, phaseId: string): string[] {
  return project.duties.filter((d) => d.phaseId === phaseId && d.location.kind === 'distances').map((d) => d.name);
}
