/**
 * Level versus distance: the contribution each candidate of a duty would make at a receiver
 * if the receiver stood at each of a list of distances from the duty's machines.
 *
 * The curve runs through the ledger's own evaluation, so it uses exactly the propagation,
 * corrections and rating of the results: rated LWA (+ character penalty), the duty's
 * units, on-time and working hours, the path (simple point source with Q, or
 * ISO 9613-2:1996), and the receiver's façade and screening for this duty. To do so the
 * receiver is copied once per distance and the duty is placed at that stated (straight-line)
 * distance from each copy; one evaluation then gives every point.
 *
 * Without a receiver the assessment point is free-standing: 1.5 m above ground, no façade,
 * no screening and no limit.
 *
 * The evaluation runs on a reduced project that holds only what the curve needs: this
 * duty, its candidates, its phase and that phase's period, and one copy of the receiver per
 * distance. The rest of the project (other duties, their thousands of candidates, the other
 * receivers) is neither evaluated nor validated, so the cost does not grow with it.
 *
 * Cost: O(project candidates) to pick the duty's own, then one evaluation of
 * (duty's candidates, or the chosen ones) × (distances) contributions after
 * O(distances × 8) path evaluations.
 */
import type { Project, Receiver } from '../model/model.ts';
import { evaluateProject } from './evaluate.ts';
import { pathGeometry, sourceHeightOf } from './geometry.ts';
import { InputError } from '../../core/input-error.ts';
import { own } from '../model/own.ts';
import { limitOf } from '../model/limits.ts';

/** Height of the free-standing assessment point used without a receiver, m (common practice: 1.5 m). */
export const FREE_POINT_HEIGHT_M = 1.5;

export interface DistancePoint {
  distanceM: number;
  /** Contribution, dB LAeq,T; NaN when an input it needs is missing or unreadable. */
  levelDb: number;
}

export interface DistanceCurve {
  candidateId: string;
  label: string;
  isBaseline: boolean;
  points: DistancePoint[];
  /** Contribution at the duty's present distance from the receiver, dB LAeq,T; present when that distance is known. */
  atCurrentDb?: number;
}

export interface DistanceCurves {
  dutyId: string;
  receiverId?: string;
  /** The receiver's limit for the duty's phase period, dB LAeq,T, when it has one. */
  limitDb?: number;
  /** The duty's present distance to the receiver, m, when known. */
  currentDistanceM?: number;
  curves: DistanceCurve[];
}

const SYNTHETIC_PREFIX = '@distance-';

export interface DistanceCurveOptions {
  /** Draw only these candidates of the duty (in the duty's order); by default every candidate of the duty. */
  candidateIds?: readonly string[];
}

/**
 * Predicted contribution of each candidate of a duty (or of the chosen few) at each distance.
 * @example levelVersusDistance(p, 'd1', [10, 20]).curves[0].points // [{ distanceM: 10, levelDb: 77.0 }, { distanceM: 20, levelDb: 71.0 }] (LWA 105, Q = 2)
 */
export function levelVersusDistance(
  project: Project,
  dutyId: string,
  distancesM: readonly number[],
  receiverId?: string,
  options: DistanceCurveOptions = {},
): DistanceCurves {
  const duty = project.duties.find((d) => d.id === dutyId);
  if (!duty)
    throw new InputError(
      'duty',
      dutyId,
      'does not exist',
      `use one of ${project.duties.map((d) => d.id).join(', ') || '(no duties yet)'}`,
    );
  distancesM.forEach((d, i) => {
    if (typeof d !== 'number' || !Number.isFinite(d) || d <= 0) {
      throw new InputError(
        `distance ${i + 1}`,
        d,
        'is out of range',
        'use a distance in metres greater than 0, e.g. 25',
      );
    }
  });

  let base: Receiver;
  if (receiverId !== undefined) {
    const found = project.receivers.find((r) => r.id === receiverId);
    if (!found)
      throw new InputError(
        'receiver',
        receiverId,
        'does not exist',
        `use one of ${project.receivers.map((r) => r.id).join(', ') || '(no receivers yet)'}`,
      );
    base = found;
  } else {
    base = {
      id: '@free',
      name: 'free-standing point',
      kind: 'other',
      x: 0,
      y: 0,
      heightM: FREE_POINT_HEIGHT_M,
      facade: false,
      limitsDb: {},
      screening: {},
    };
  }

  let currentDistanceM: number | undefined;
  if (receiverId !== undefined) {
    const current = pathGeometry(duty, base, sourceHeightOf(duty, project.propagation)).distanceM;
    if (Number.isFinite(current) && current > 0) currentDistanceM = current;
  }
  // The present distance is evaluated with the others, so its read-out is the ledger's own figure.
  const every = currentDistanceM === undefined ? distancesM : [...distancesM, currentDistanceM];
  const screening = own(base.screening, dutyId);
  const receivers: Receiver[] = every.map((_, i) => ({
    ...base,
    id: `${SYNTHETIC_PREFIX}${i}`,
    screening: screening ? { [dutyId]: screening } : {},
  }));
  const distances: Record<string, number> = {};
  every.forEach((d, i) => {
    distances[`${SYNTHETIC_PREFIX}${i}`] = d;
  });
  const chosen = options.candidateIds ? new Set(options.candidateIds) : undefined;
  const candidates = project.candidates.filter((c) => c.dutyId === dutyId && (!chosen || chosen.has(c.id)));
  const phase = project.phases.find((p) => p.id === duty.phaseId);
  const period = phase ? project.periods.find((p) => p.id === phase.periodId) : undefined;
  const { unreadCells: _notNeeded, ...rest } = project;
  const reduced: Project = {
    ...rest,
    phases: phase ? [phase] : [],
    periods: period ? [period] : [],
    duties: [{ ...duty, location: { kind: 'distances', distancesM: distances } }],
    candidates,
    receivers,
  };
  const evaluation = evaluateProject(reduced, undefined, { skipValidation: true });

  const curves = candidates.map((c) => {
    const curve: DistanceCurve = {
      candidateId: c.id,
      label: c.label || c.id,
      isBaseline: c.id === duty.baselineCandidateId,
      points: distancesM.map((distanceM, i) => ({
        distanceM,
        levelDb: evaluation.contributionDb(c.id, `${SYNTHETIC_PREFIX}${i}`),
      })),
    };
    if (currentDistanceM !== undefined)
      curve.atCurrentDb = evaluation.contributionDb(c.id, `${SYNTHETIC_PREFIX}${distancesM.length}`);
    return curve;
  });

  const result: DistanceCurves = { dutyId, curves };
  if (receiverId !== undefined) {
    result.receiverId = receiverId;
    const limit = phase ? limitOf(base, phase.periodId) : undefined;
    if (limit !== undefined) result.limitDb = limit;
    if (currentDistanceM !== undefined) result.currentDistanceM = currentDistanceM;
  }
  return result;
}

/**
 * Distances spaced evenly on a logarithmic axis from `minM` to `maxM` inclusive,
 * `perDecade` steps per factor of ten (a smooth curve on a log distance axis).
 * @example logSpacedDistances(10, 100, 2) // [10, 31.62…, 100]
 */
export function logSpacedDistances(minM: number, maxM: number, perDecade = 12): number[] {
  if (!(minM > 0) || !Number.isFinite(minM))
    throw new InputError('shortest distance', minM, 'is out of range', 'use a distance in metres greater than 0');
  if (!(maxM > minM) || !Number.isFinite(maxM))
    throw new InputError('longest distance', maxM, 'is out of range', `use a distance in metres greater than ${minM}`);
  const steps = Math.max(1, Math.ceil(Math.log10(maxM / minM) * perDecade));
  const out: number[] = [];
  for (let k = 0; k <= steps; k++) out.push(minM * (maxM / minM) ** (k / steps));
  out[out.length - 1] = maxM;
  return out;
}
