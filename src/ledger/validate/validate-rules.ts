/**
 * The ranges a project file accepts, with the words shown when a value is outside them.
 * Bounds are wide enough for any real plant and site and narrow enough to catch a slipped
 * digit or a value in the wrong unit. Every number comes from the field catalogue
 * (`ledger/catalogue`), where each range's reason is written.
 */
import type { NumberRule } from './field-checks.ts';
import {
  CURRENCY_CODE,
  CURRENCY_SIGNS,
  DUTY_NUMBERS,
  MACHINE_NUMBERS,
  PERIOD_TIMES,
  RECEIVER_NUMBERS,
  SETTINGS_NUMBERS,
  type NumberField,
} from '../catalogue/index.ts';

/** A catalogue field as validation's rule. */
export function validationRule(field: NumberField): NumberRule & { min: number; max: number } {
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
  /** A height above the ground: a duty's source height, a receiver's. */
  heightM: validationRule(DUTY_NUMBERS.sourceHeightM),
  coordinateM: validationRule(DUTY_NUMBERS.x),
  distanceM: validationRule(DUTY_NUMBERS.distanceM),
  limitDb: validationRule(RECEIVER_NUMBERS.limitDb),
  ambientDb: validationRule(RECEIVER_NUMBERS.ambientDb),
  screeningDb: validationRule(RECEIVER_NUMBERS.screeningDb),
  pathDifferenceM: validationRule(RECEIVER_NUMBERS.pathDifferenceM),
  temperatureC: validationRule(SETTINGS_NUMBERS.temperatureC),
  humidityPct: validationRule(SETTINGS_NUMBERS.humidityPct),
  pressureKPa: validationRule(SETTINGS_NUMBERS.pressureKPa),
  groundFactor: validationRule(SETTINGS_NUMBERS.groundFactor),
  c0Db: validationRule(SETTINGS_NUMBERS.c0Db),
  defaultSourceHeightM: validationRule(SETTINGS_NUMBERS.sourceHeightM),
  referenceDistanceM: validationRule(SETTINGS_NUMBERS.referenceDistanceM),
} satisfies Record<string, NumberRule>;

export const ID_ACCEPTED = 'use a short identifier, unique in its list, e.g. "c12"';
export const CLOCK_ACCEPTED = `use ${PERIOD_TIMES.start.accepted}`;
export const CURRENCY_ACCEPTED = `use ${CURRENCY_CODE.accepted}`;
