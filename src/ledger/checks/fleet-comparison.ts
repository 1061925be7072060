/**
 * Two fleets side by side: the level, limit and margin of each at every phase and
 * receiver, their costs, and what changed per duty. Both come from `evaluateProject`, so
 * the figures are the ones the matrix shows for each fleet.
 */
import type { Fleet, Project } from '../model/model.ts';
import { evaluateProject } from '../prediction/evaluate.ts';
import { fleetChanges } from '../model/fleets.ts';

export interface ComparedCell {
  phaseId: string;
  /** The period of the cell: the phase's own, or another its working hours run into. */
  periodId: string;
  ownPeriod: boolean;
  receiverId: string;
  limitDb?: number;
  levelA: number;
  levelB: number;
  /** limit − level for each fleet, dB; undefined without a limit. */
  marginA?: number;
  marginB?: number;
}

export interface FleetComparison {
  cells: ComparedCell[];
  costA: number;
  costB: number;
  /** Over-limit cells of each fleet. */
  overA: number;
  overB: number;
  changes: { dutyId: string; from: string; to: string }[];
}

/**
 * Compares fleet A with fleet B over the whole project.
 * O(2 × evaluation).
 */
export function compareFleets(project: Project, a: Fleet, b: Fleet): FleetComparison {
  const ea = evaluateProject(project, a, { skipValidation: true });
  const eb = evaluateProject(project, b, { skipValidation: true });
  const byKey = new Map(eb.matrix.map((c) => [`${c.phaseId}\u0000${c.periodId}\u0000${c.receiverId}`, c] as const));
  const cells: ComparedCell[] = ea.matrix.map((ca) => {
    const cb = byKey.get(`${ca.phaseId}\u0000${ca.periodId}\u0000${ca.receiverId}`);
    const cell: ComparedCell = {
      phaseId: ca.phaseId,
      periodId: ca.periodId,
      ownPeriod: ca.ownPeriod,
      receiverId: ca.receiverId,
      levelA: ca.levelDb,
      levelB: cb?.levelDb ?? NaN,
    };
    if (ca.limitDb !== undefined) cell.limitDb = ca.limitDb;
    if (ca.marginDb !== undefined) cell.marginA = ca.marginDb;
    if (cb?.marginDb !== undefined) cell.marginB = cb.marginDb;
    return cell;
  });
  return {
    cells,
    costA: ea.fleetCost,
    costB: eb.fleetCost,
    overA: ea.matrix.filter((c) => c.over).length,
    overB: eb.matrix.filter((c) => c.over).length,
    changes: fleetChanges(project, ea.fleet, eb.fleet),
  };
}
