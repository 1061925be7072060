/**
 * The ranges a project file accepts, with the words shown when a value is outside them.
 * Bounds are wide enough for any real plant and site and narrow enough to catch a slipped
 * digit or a value in the wrong unit. A machine's, a duty's and a receiver's numbers come
 * from the field catalogue (`ledger/catalogue`), where each range's reason is written; the
 * propagation settings' are set here.
 */
import type { NumberRule } from './field-checks.ts';
import {
  CURRENCY_SIGNS,
  DB_SUFFIXES,
  DUTY_NUMBERS,
  MACHINE_NUMBERS,
  METRE_SUFFIXES,
  PERCENT_SUFFIXES,
  PERIOD_TIMES,
  RECEIVER_NUMBERS,
  type NumberField,
} from '../catalogue/index.ts';

/** A catalogue field as validation's rule. */
function validationRule(field: NumberField): NumberRule {
  return {
    min: field.min,
    max: field.max,
    ...(field.aboveMin ? { aboveMin: true } : {}),
    ...(field.integer ? { integer: true } : {}),
    accepted: field.accepted,
    suffixes: field.money ? CURRENCY_SIGNS : field.suffixes,
    ...(field.money ? { prefixes: CURRENCY_SIGNS } : {}),
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
  count: validationRule(DUTY_NUMBERS.count),
  onTimePct: validationRule(DUTY_NUMBERS.onTimePct),
  durationDays: validationRule(DUTY_NUMBERS.durationDays),
  /** A height above the ground: a duty's source height, a receiver's, the project's default source height. */
  heightM: validationRule(DUTY_NUMBERS.sourceHeightM),
  coordinateM: validationRule(DUTY_NUMBERS.x),
  distanceM: validationRule(DUTY_NUMBERS.distanceM),
  limitDb: validationRule(RECEIVER_NUMBERS.limitDb),
  ambientDb: validationRule(RECEIVER_NUMBERS.ambientDb),
  screeningDb: validationRule(RECEIVER_NUMBERS.screeningDb),
  pathDifferenceM: validationRule(RECEIVER_NUMBERS.pathDifferenceM),
  temperatureC: {
    min: -20,
    max: 50,
    suffixes: ['°C', 'C'],
    accepted: 'a temperature from -20 to 50 °C (the range ISO 9613-1:1993 covers)',
  },
  humidityPct: {
    min: 10,
    max: 100,
    suffixes: PERCENT_SUFFIXES,
    accepted: 'a relative humidity from 10 to 100 % (the range ISO 9613-1:1993 covers)',
  },
  pressureKPa: {
    min: 0,
    max: 200,
    aboveMin: true,
    suffixes: ['kPa'],
    accepted: 'an atmospheric pressure in kPa above 0 and up to 200, e.g. 101.325',
  },
  groundFactor: { min: 0, max: 1, accepted: 'a ground factor G from 0 (hard) to 1 (porous), e.g. 0.5' },
  c0Db: {
    min: 0,
    max: 5,
    suffixes: DB_SUFFIXES,
    accepted:
      'a factor C0 of the meteorological correction in dB from 0 to 5 (0 for downwind, ISO 9613-2:1996 clause 8)',
  },
  referenceDistanceM: {
    min: 0,
    max: 10000,
    aboveMin: true,
    suffixes: METRE_SUFFIXES,
    accepted: 'a reference distance in metres above 0, e.g. 10',
  },
} satisfies Record<string, NumberRule>;

export const ID_ACCEPTED = 'use a short identifier, unique in its list, e.g. "c12"';
export const CLOCK_ACCEPTED = `use ${PERIOD_TIMES.start.accepted}`;
export const CURRENCY_ACCEPTED = 'use an ISO 4217 currency code of three capital letters, e.g. "GBP" or "EUR"';
