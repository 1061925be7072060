/**
 * Levels for limit clauses: where a clause is assessed (its receivers, or the points along
 * its boundary), which phases fall in its period, and every candidate's contribution there
 * in the quantity the clause limits.
 *
 * L_Aeq,T is the contribution without the character penalty; the rating level L_Ar,T
 * (ISO 1996-1) adds the project's penalty for tonal or impulsive character. Both come from
 * the ledger's own evaluation (./../evaluate.ts): for a boundary, of a copy of the project
 * in which each assessment point is a receiver (./boundary.ts).
 * Phase level at a point: the energetic sum of the fleet's contributions for the phase's duties.
 * A phase is assessed against the clause when its working hours fall in the clause's period
 * (its own period, or another its remaining hours run into: ../phase-periods.ts); in another
 * period each contribution shifts by the phase's shift into it, 10·lg(T_work,p/T_p) −
 * 10·lg(T_work,own/T_own), as in the matrix.
 */
import type { Candidate, Fleet, Phase, Project } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import type { Clause } from './clause.ts';
import { CLAUSE_DEFAULTS } from './clause.ts';
import { evaluateProject, type EvaluateOptions } from '../prediction/evaluate.ts';
import { characterPenaltyDb } from '../rating/rating.ts';
import { boundaryReceiverId, isBoundaryClause, pointsOfClause, withBoundaryReceivers } from './boundary.ts';
import { candidateIndex } from './scope.ts';
import { dbSumOrNaN } from '../prediction/safe.ts';
import { phasePeriods } from '../prediction/phase-periods.ts';
import { own } from '../model/own.ts';

/** A place a limit clause is assessed at. */
export interface AssessedPoint {
  /** Receiver id (a boundary point's id in the assessment copy). */
  id: string;
  name: string;
}

export interface LimitSetting {
  clause: Clause;
  points: AssessedPoint[];
  /** Phases whose working hours fall in the clause's period, in project order. */
  phases: Phase[];
  /** A candidate's contribution at a point in the clause's quantity over the clause's period (its phase's shift into that period included), dB (NaN when not computable). */
  contributionDb(candidateId: string, pointId: string): number;
  /** Why the clause cannot be assessed, when it cannot. */
  problem?: string;
}

/** The level of one phase at one point for a fleet. */
export interface LimitCell {
  phaseId: string;
  pointId: string;
  levelDb: number;
}

/**
 * The settings of every limit clause, by clause id. One extra evaluation when a clause
 * applies along a boundary: O(candidates × boundary points).
 */
export function limitSettings(
  project: Project,
  evaluation: Evaluation,
  options: EvaluateOptions = {},
): Map<string, LimitSetting> {
  const out = new Map<string, LimitSetting>();
  const limits = (project.clauses ?? []).filter((c) => c.kind === 'limit');
  if (limits.length === 0) return out;
  const byId = candidateIndex(project);
  const withPoints = limits.some(isBoundaryClause) ? withBoundaryReceivers(project) : undefined;
  const boundaryEvaluation = withPoints
    ? evaluateProject(withPoints, undefined, { ...options, skipValidation: true })
    : undefined;
  const dutyPhase = new Map(project.duties.map((d) => [d.id, d.phaseId] as const));
  const unplaced = project.duties.filter((d) => d.location.kind !== 'point').map((d) => d.name);
  for (const clause of limits) {
    const metric = clause.metric ?? CLAUSE_DEFAULTS.metric;
    const source = isBoundaryClause(clause) ? boundaryEvaluation : evaluation;
    const shiftByPhase = new Map<string, number>();
    for (const phase of project.phases) {
      const inPeriod = phasePeriods(project, phase).periods.find((pp) => pp.periodId === clause.periodId);
      if (inPeriod) shiftByPhase.set(phase.id, inPeriod.shiftDb);
    }
    const phases = project.phases.filter((p) => shiftByPhase.has(p.id));
    let points: AssessedPoint[];
    let problem: string | undefined;
    if (isBoundaryClause(clause)) {
      points = pointsOfClause(clause).map((p, k) => ({
        id: boundaryReceiverId(clause.id, k),
        name: `boundary point ${k + 1} (${p.x.toFixed(1)}, ${p.y.toFixed(1)})`,
      }));
      if (points.length === 0) problem = 'the boundary has no readable point';
      else if (unplaced.length > 0)
        problem = `a boundary needs every duty placed on the site grid; ${unplaced.map((n) => JSON.stringify(n)).join(', ')} ${unplaced.length === 1 ? 'is' : 'are'} given by distances only`;
    } else {
      const named = clause.receiverIds ?? [];
      const receivers = named.length === 0 ? project.receivers : project.receivers.filter((r) => named.includes(r.id));
      points = receivers.map((r) => ({ id: r.id, name: r.name }));
      if (points.length === 0) problem = 'the project has no receiver to assess';
    }
    const setting: LimitSetting = {
      clause,
      points,
      phases,
      contributionDb(candidateId, pointId) {
        const c = byId.get(candidateId) as Candidate | undefined;
        if (!c || !source) return NaN;
        const phaseId = dutyPhase.get(c.dutyId);
        const shift = phaseId === undefined ? undefined : shiftByPhase.get(phaseId);
        if (shift === undefined) return NaN;
        const level = source.contributionDb(candidateId, pointId) + shift;
        return metric === 'rating' ? level : level - characterPenaltyDb(c, project.settings);
      },
    };
    if (problem !== undefined) setting.problem = problem;
    out.set(clause.id, setting);
  }
  return out;
}

/**
 * Every phase × point level of a limit clause for a fleet (duties the fleet leaves out use
 * their baseline). O(phases × points × duties).
 */
export function limitCells(project: Project, setting: LimitSetting, fleet: Fleet): LimitCell[] {
  const cells: LimitCell[] = [];
  for (const phase of setting.phases) {
    const duties = project.duties.filter((d) => d.phaseId === phase.id);
    for (const point of setting.points) {
      const levels = duties.map((d) => setting.contributionDb(own(fleet, d.id) ?? d.baselineCandidateId, point.id));
      cells.push({ phaseId: phase.id, pointId: point.id, levelDb: dbSumOrNaN(levels) });
    }
  }
  return cells;
}
