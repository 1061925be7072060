/**
 * The sound power a candidate's predictions start from: the rated LWA of ./rating.ts, or,
 * when no LWA is declared but octave-band sound power is, the A-weighted total of the
 * bands (IEC 61672-1:2013 A-weighting, summed energetically).
 */
import type { Candidate, ProjectSettings } from '../model/model.ts';
import { ratedSoundPower, type PermissibleLookup, type RatedSoundPower } from './rating.ts';
import { aWeightedTotalDb } from '../../core/standards/iec61672-1-2013.ts';
import { attempt } from '../prediction/safe.ts';

/** Usable octave bands: exactly eight finite numbers. */
export function hasBands(candidate: Candidate): candidate is Candidate & { bandsDb: number[] } {
  const b = candidate.bandsDb;
  return Array.isArray(b) && b.length === 8 && b.every((x) => typeof x === 'number' && Number.isFinite(x));
}

/**
 * Rated LWA of a candidate, dB, with its explanation; NaN when nothing usable is known.
 * @example ratedLevel({ lwaDb: 101, declaration: 'measured', uncertaintyDb: 2, … }, { levelBasis: 'guaranteed', … }).lwaDb // 103
 */
export function ratedLevel(
  candidate: Candidate,
  settings: ProjectSettings,
  permissible?: PermissibleLookup,
): RatedSoundPower {
  const noDeclared = candidate.lwaDb === undefined || candidate.lwaDb === null;
  if (noDeclared && hasBands(candidate)) {
    const fromBands = attempt(() => aWeightedTotalDb(candidate.bandsDb));
    if (Number.isFinite(fromBands.value)) {
      const rated = ratedSoundPower({ ...candidate, lwaDb: fromBands.value }, settings, permissible);
      return {
        ...rated,
        explanation: `A-weighted total of the octave bands ${fromBands.value.toFixed(1)}; ${rated.explanation}`,
      };
    }
  }
  return ratedSoundPower(candidate, settings, permissible);
}
