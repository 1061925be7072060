/**
 * Operator exposure of a candidate: from the emission sound pressure level at the operator's
 * position LpA and the hours of use a day, the daily exposure L_EX,8h (ISO 9612:2009), the
 * Directive 2003/10/EC value it reaches, and the time until 85 dB(A) is reached (3 dB exchange).
 * Figures for information: a workplace exposure assessment decides, and the limit value of
 * 87 dB(A) counts the hearing protection worn.
 */
import type { Candidate } from '../model/model.ts';
import { dailyExposureDb } from '../../core/standards/iso9612-2009.ts';
import { exposureBand, type ExposureBand } from '../../core/standards/directive-2003-10-ec.ts';
import { allowedHours, NIOSH_CRITERION } from '../../core/allowed-exposure-time.ts';

export interface OperatorExposure {
  /** L_EX,8h, dB(A). */
  dailyExposureDb: number;
  band: ExposureBand;
  /** Hours a day until L_EX,8h reaches 85 dB(A). */
  hoursTo85: number;
}

export const EXPOSURE_CAUTION =
  'Operator exposure figures are estimates from declared emission values; they do not replace a workplace noise exposure assessment. The 87 dB(A) limit value counts the hearing protection worn.';

/** Exposure for one level and duration; throws InputError for bad input. */
export function exposureFor(levelDb: number, hours: number): OperatorExposure {
  const lex = dailyExposureDb(levelDb, hours);
  return { dailyExposureDb: lex, band: exposureBand(lex), hoursTo85: allowedHours(levelDb, NIOSH_CRITERION) };
}

/** A candidate's operator exposure, or undefined when LpA or hours are not given or not readable. */
export function operatorExposure(candidate: Candidate): OperatorExposure | undefined {
  const lpa = candidate.operatorLpaDb;
  const hours = candidate.operatorHoursPerDay;
  if (
    lpa === undefined ||
    hours === undefined ||
    !Number.isFinite(lpa) ||
    !Number.isFinite(hours) ||
    hours <= 0 ||
    hours > 24
  )
    return undefined;
  return exposureFor(lpa, hours);
}
