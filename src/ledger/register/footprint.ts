/**
 * The noise footprint of one working machine: the area around it inside which its level,
 * averaged over the assessment period, exceeds a criterion (e.g. 65 dB L_Aeq over a 10 h
 * working day), and the distance to that criterion.
 *
 * Method (simple method, common practice): a point source with hemispherical spreading
 * (Q = 2, a machine on hard ground) working throughout the period at the stated on-time η:
 * L(r) = LWA + 10·lg η + 10·lg(Q / (4π r²)); the distance is where L(r) = criterion and the
 * footprint the disc π r² inside it (core/criterion-distance.ts). 3 dB less sound power
 * halves the footprint.
 */
import { criterionAreaM2, criterionDistanceM } from '../../core/criterion-distance.ts';
import { onTimeCorrectionDb } from '../../core/corrections.ts';
import { finite } from '../../core/check.ts';

/** Q of hemispherical spreading: a machine standing on hard ground. */
export const FOOTPRINT_Q = 2;

/** The method and its limits, in words, shown beside every footprint figure. */
export const FOOTPRINT_METHOD =
  'Footprint: a point source with hemispherical spreading (Q = 2) working through the whole assessment period at the stated on-time, L = LWA + 10·lg(on-time) + 10·lg(Q/(4πr²)); ' +
  'the distance is where L falls to the criterion and the footprint the disc πr² inside it. ' +
  'Limits: geometric spreading only — no air absorption, ground effect, screening or reflections — so it overstates beyond a few hundred metres and means nothing within a few machine lengths; ' +
  'one machine alone, no other site noise; for comparing machines, not for predicting a site (predictions are ±3 dB at best, ISO 9613-2).';

export interface Footprint {
  /** Distance to the criterion, m. */
  radiusM: number;
  /** Area inside the criterion, m². */
  areaM2: number;
}

export interface FootprintConditions {
  /** Criterion L_Aeq over the assessment period, dB. */
  criterionDb: number;
  /** Share of the period the machine works at full power, % (0 < η ≤ 100). */
  onTimePct: number;
}

/**
 * Footprint of a machine of sound power level `lwaDb`; NaN figures when the level is not known.
 * Throws InputError for a bad criterion or on-time.
 * @example machineFootprint(105, { criterionDb: 65, onTimePct: 100 }) // { radiusM: 39.89, areaM2: 5000 }
 */
export function machineFootprint(lwaDb: number, conditions: FootprintConditions): Footprint {
  const onTime = onTimeCorrectionDb(conditions.onTimePct);
  if (!Number.isFinite(lwaDb)) {
    finite('criterion', conditions.criterionDb, 'a level in dB, e.g. 65');
    return { radiusM: NaN, areaM2: NaN };
  }
  const effective = lwaDb + onTime;
  return {
    radiusM: criterionDistanceM(effective, conditions.criterionDb, FOOTPRINT_Q),
    areaM2: criterionAreaM2(effective, conditions.criterionDb, FOOTPRINT_Q),
  };
}
