/**
 * The ranges a project file accepts, with the words shown when a value is outside them.
 * Bounds are wide enough for any real plant and site and narrow enough to catch a slipped
 * digit or a value in the wrong unit. A machine's numbers come from the field catalogue
 * (`ledger/catalogue`), where each range's reason is written; the others are set here.
 */
import type { NumberRule } from './field-checks.ts';
import { MACHINE_NUMBERS, type NumberField } from '../catalogue/index.ts';
import { SCREENING_EXPLICIT_MAX_DB } from '../../core/corrections.ts';

/** A catalogue field as validation's rule. */
function validationRule(field: NumberField): NumberRule {
  return {
    min: field.min,
    max: field.max,
    ...(field.aboveMin ? { aboveMin: true } : {}),
    ...(field.integer ? { integer: true } : {}),
    accepted: field.accepted,
  };
}

export const RULES = {
  lwaDb: validationRule(MACHINE_NUMBERS.lwaDb),
  bandDb: validationRule(MACHINE_NUMBERS.bandDb),
  uncertaintyDb: validationRule(MACHINE_NUMBERS.uncertaintyDb),
  operatorLpaDb: validationRule(MACHINE_NUMBERS.operatorLpaDb),
  operatorHours: validationRule(MACHINE_NUMBERS.operatorHoursPerDay),
  netPowerKw: validationRule(MACHINE_NUMBERS.netPowerKw),
  directiveQuantity: validationRule(MACHINE_NUMBERS.directiveQuantity),
  money: validationRule(MACHINE_NUMBERS.dayRate),
  lifeDays: validationRule(MACHINE_NUMBERS.lifeDays),
  count: { min: 1, max: 1000, integer: true, accepted: 'a whole number of units from 1 to 1000' },
  onTimePct: { min: 0, max: 100, aboveMin: true, accepted: 'a percentage above 0 and up to 100, e.g. 60' },
  durationDays: { min: 1, max: 3650, integer: true, accepted: 'a whole number of days from 1 to 3650, e.g. 9' },
  heightM: { min: 0, max: 300, accepted: 'a height in metres from 0 to 300, e.g. 1.5' },
  coordinateM: { min: -100000, max: 100000, accepted: 'a site-grid coordinate in metres, within ±100000' },
  distanceM: { min: 0, max: 100000, aboveMin: true, accepted: 'a distance in metres above 0, e.g. 45' },
  limitDb: { min: 20, max: 120, accepted: 'a limit LAeq,T in dB from 20 to 120, e.g. 75' },
  ambientDb: { min: 0, max: 140, accepted: 'an ambient level LAeq,T in dB from 0 to 140' },
  screeningDb: {
    min: 0,
    max: SCREENING_EXPLICIT_MAX_DB,
    accepted: `a reduction in dB from 0 to ${SCREENING_EXPLICIT_MAX_DB}`,
  },
  pathDifferenceM: { min: 0, max: 100, accepted: 'a path difference z in metres from 0 to 100, e.g. 0.8' },
  temperatureC: { min: -20, max: 50, accepted: 'a temperature from -20 to 50 °C (the range ISO 9613-1:1993 covers)' },
  humidityPct: {
    min: 10,
    max: 100,
    accepted: 'a relative humidity from 10 to 100 % (the range ISO 9613-1:1993 covers)',
  },
  pressureKPa: {
    min: 0,
    max: 200,
    aboveMin: true,
    accepted: 'an atmospheric pressure in kPa above 0 and up to 200, e.g. 101.325',
  },
  groundFactor: { min: 0, max: 1, accepted: 'a ground factor G from 0 (hard) to 1 (porous), e.g. 0.5' },
  c0Db: {
    min: 0,
    max: 5,
    accepted:
      'a factor C0 of the meteorological correction in dB from 0 to 5 (0 for downwind, ISO 9613-2:1996 clause 8)',
  },
  referenceDistanceM: {
    min: 0,
    max: 10000,
    aboveMin: true,
    accepted: 'a reference distance in metres above 0, e.g. 10',
  },
} satisfies Record<string, NumberRule>;

export const ID_ACCEPTED = 'use a short identifier, unique in its list, e.g. "c12"';
export const CLOCK_ACCEPTED = 'use a time of day "HH:MM" from 00:00 to 24:00, e.g. "07:00"';
export const CURRENCY_ACCEPTED = 'use an ISO 4217 currency code of three capital letters, e.g. "GBP" or "EUR"';
