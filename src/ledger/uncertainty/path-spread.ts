/**
 * The spread of each path's prediction: the method's stated accuracy read as a standard
 * deviation.
 *
 * - Simple point-source method: the project setting (default ±3 dB).
 * - ISO 9613-2:1996: the accuracy its Table 5 states for broadband A-weighted levels, read
 *   once for the whole program (core iso9613-2-1996/accuracy.ts, per path through
 *   ../prediction/path-accuracy.ts, the same reading as the notes beside the matrix). Where
 *   the table states nothing (1 km or more, mean height above 30 m, screened or reflected
 *   paths) the project setting applies, marked.
 * σ = stated accuracy / f, with f (default 2) a setting: the standard does not say how
 * many standard deviations its ± stands for.
 *
 * Which paths share one error: a path is the way from a place to a receiver, so duties
 * working at the same point (same x, y and source height) share their error at a receiver
 * in every phase and period; a duty given by distances has its own paths. Different
 * receivers' errors are independent.
 */
import type { Duty, Project, Receiver, UncertaintySettings } from '../model/model.ts';
import { sourceHeightOf } from '../prediction/geometry.ts';
import { pathTable5AccuracyDb } from '../prediction/path-accuracy.ts';

export interface PathSpread {
  dutyId: string;
  receiverId: string;
  /** Duties with the same key at the same receiver share one error. */
  shareKey: string;
  /** The ± accuracy used, dB. */
  accuracyDb: number;
  /** Standard deviation of the path's error, dB. */
  sigmaDb: number;
  /** Where the accuracy comes from. */
  source: 'ISO 9613-2:1996 Table 5' | 'setting: simple method' | 'setting: Table 5 states none';
}

/** The key of the place a duty works at: its point and source height, or the duty itself. */
function placeKey(duty: Duty, sourceHeightM: number): string {
  const loc = duty.location;
  return loc?.kind === 'point' ? `point ${loc.x} ${loc.y} ${sourceHeightM}` : `duty ${duty.id}`;
}

/** The spread of the path from a duty to a receiver. O(1). */
export function pathSpread(
  project: Project,
  duty: Duty,
  receiver: Receiver,
  settings: UncertaintySettings,
): PathSpread {
  const hs = sourceHeightOf(duty, project.propagation);
  const base = { dutyId: duty.id, receiverId: receiver.id, shareKey: `${placeKey(duty, hs)} → ${receiver.id}` };
  const f = settings.accuracyPerStandardDeviation;
  if (project.propagation.method === 'simple') {
    const a = settings.simpleMethodAccuracyDb;
    return { ...base, accuracyDb: a, sigmaDb: a / f, source: 'setting: simple method' };
  }
  const stated = pathTable5AccuracyDb(project, duty, receiver);
  if (stated === undefined) {
    const a = settings.unstatedAccuracyDb;
    return { ...base, accuracyDb: a, sigmaDb: a / f, source: 'setting: Table 5 states none' };
  }
  return { ...base, accuracyDb: stated, sigmaDb: stated / f, source: 'ISO 9613-2:1996 Table 5' };
}
