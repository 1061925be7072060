/**
 * What the map shows when the pointer rests on a point: the phase's level there and its
 * main contributors (each duty's chosen machine), by the same engine as the map.
 */
import type { Fleet, Project, SitePoint } from '../model/model.ts';
import { evaluateProject } from '../prediction/evaluate.ts';
import { mapProject, MAP_RECEIVER_PREFIX } from './map-project.ts';

export interface PointContributor {
  dutyId: string;
  dutyName: string;
  machine: string;
  /** The machine's level at the point in the phase's own period, dB. */
  levelDb: number;
  /** Whether a barrier on the plan screens its path. */
  screenedBy?: string;
}

export interface PointReport {
  levelDb: number;
  /** Loudest first. */
  contributors: PointContributor[];
}

/** The level at a point and its contributors, loudest first. O(duties × 8). */
export function pointReport(
  project: Project,
  phaseId: string,
  fleet: Fleet,
  at: SitePoint,
  heightM: number,
): PointReport {
  const phase = project.phases.find((p) => p.id === phaseId);
  const cut = mapProject(project, phaseId, fleet, [at], heightM);
  const ev = evaluateProject(cut, undefined, { skipValidation: true });
  const rid = `${MAP_RECEIVER_PREFIX}0`;
  const cell = ev.matrix.find(
    (c) => c.receiverId === rid && c.phaseId === phaseId && c.periodId === phase?.periodId && c.ownPeriod,
  );
  const contributors: PointContributor[] = cut.duties.map((d) => {
    const c = cut.candidates.find((x) => x.id === d.baselineCandidateId);
    const terms = ev.contribution(d.baselineCandidateId, rid).terms;
    const barrier = terms.find((t) => t.key === 'abar' && t.label.includes('on the plan'));
    const name = barrier ? /barrier “([^”]*)”/.exec(barrier.label)?.[1] : undefined;
    return {
      dutyId: d.id,
      dutyName: d.name,
      machine: c?.label ?? '',
      levelDb: ev.contributionDb(d.baselineCandidateId, rid),
      ...(name ? { screenedBy: name } : {}),
    };
  });
  contributors.sort((a, b) => (Number.isNaN(b.levelDb) ? -1 : b.levelDb - a.levelDb));
  return { levelDb: cell?.levelDb ?? NaN, contributors };
}
