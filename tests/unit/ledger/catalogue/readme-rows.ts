/**
 * The rows of README.md's table of ranges, made from the field catalogue, so the test beside
 * this file fails when a range changes and the README does not.
 */
import {
  CALCULATION_NUMBERS,
  DUTY_NUMBERS,
  MACHINE_NUMBERS,
  PERIOD_TIMES,
  PHASE_TIMES,
  PLAN_NUMBERS,
  MAP_NUMBERS,
  RECEIVER_NUMBERS,
  REGISTER_LIFE,
  SETTINGS_NUMBERS,
  UNCERTAINTY_NUMBERS,
  rangeWords,
  type NumberField,
} from '../../../../src/ledger/catalogue/index.ts';

const code = (words: readonly string[]) => (words.length ? words.map((w) => `\`${w}\``).join(' ') : '—');

function numberRow(list: string, field: NumberField, name = field.header): string {
  const range = field.money ? `from ${field.min} to ${field.max.toLocaleString('en-GB')}` : rangeWords(field);
  const whole = field.integer ? ', whole' : '';
  const words = field.money ? 'a currency sign or code' : code(field.suffixes);
  return `| ${list} | ${name} | ${range}${whole} | ${words} |`;
}

/**
 * A field that takes a few values only, none between (Q): the row names the values as the
 * catalogue's words give them, and those words must name exactly the values the core accepts.
 */
export function valuesRow(list: string, field: NumberField): string {
  return `| ${list} | ${field.header} | one of ${field.accepted}, no value between | — |`;
}

export function readmeRangeRows(): string[] {
  const M = MACHINE_NUMBERS;
  const D = DUTY_NUMBERS;
  const R = RECEIVER_NUMBERS;
  const S = SETTINGS_NUMBERS;
  const U = UNCERTAINTY_NUMBERS;
  return [
    numberRow('machine', M.lwaDb),
    numberRow('machine', M.bandDb, 'Octave band Lw'),
    numberRow('machine', M.uncertaintyDb),
    numberRow('machine', M.operatorLpaDb),
    numberRow('machine', M.operatorHoursPerDay),
    numberRow('machine', M.netPowerKw),
    numberRow('machine', M.directiveQuantity),
    numberRow('machine', M.lifeDays),
    numberRow('machine', M.dayRate, 'Rates, price, resale, running, one-off charges'),
    numberRow('duty', D.count),
    numberRow('duty', D.onTimePct, 'On-time, its lowest and highest'),
    numberRow('duty', D.durationDays),
    numberRow('duty, receiver', D.x, 'X, Y'),
    numberRow('duty', D.distanceM, 'Distance to a receiver'),
    numberRow('duty, receiver', D.sourceHeightM, 'Source height, receiver height'),
    numberRow('receiver', R.limitDb, 'Limit in a period'),
    numberRow('receiver', R.ambientDb),
    numberRow('receiver', R.screeningDb, 'Screening: a stated reduction'),
    numberRow('receiver', R.pathDifferenceM, 'Screening: a barrier’s path difference z'),
    `| period, phase | ${PERIOD_TIMES.start.header}, ${PERIOD_TIMES.end.header}; ${PHASE_TIMES.start.header}, ${PHASE_TIMES.end.header} | ${PERIOD_TIMES.start.accepted.replace('a time of day ', '').replace(/, e\.g\..*$/, '')} | — |`,
    numberRow('register', REGISTER_LIFE.years, 'Life, in years'),
    numberRow('register', REGISTER_LIFE.workingDays, 'Life, in working days'),
    numberRow('quick calculation, `ledger level`', CALCULATION_NUMBERS.hoursWorked, 'Hours worked, assessment period'),
    numberRow('quick calculation, `ledger level`', CALCULATION_NUMBERS.characterPenaltyDb),
    valuesRow('settings, quick calculation, `ledger level`', CALCULATION_NUMBERS.directivityQ),
    numberRow('settings', S.temperatureC),
    numberRow('settings', S.humidityPct),
    numberRow('settings', S.pressureKPa),
    numberRow('settings', S.groundFactor),
    numberRow('settings', S.c0Db),
    numberRow('settings', S.sourceHeightM, 'Default source height'),
    numberRow('settings', S.referenceDistanceM),
    numberRow('settings', U.defaultKDb),
    numberRow('settings', U.kPerStandardDeviation),
    numberRow(
      'settings',
      U.simpleMethodAccuracyDb,
      'Accuracy of the point-source method, and where Table 5 states none',
    ),
    numberRow('settings', U.accuracyPerStandardDeviation),
    numberRow('settings', U.draws),
    numberRow('settings', U.seed),
    numberRow('site plan', PLAN_NUMBERS.barrierHeightM, 'Barrier top height'),
    numberRow('site plan', PLAN_NUMBERS.scaleDistanceM, 'Drawing: distance between the two scale points'),
    numberRow('site plan', PLAN_NUMBERS.northDeg, 'Drawing: north'),
    numberRow('level map, `ledger map`', MAP_NUMBERS.pointHeightM, 'Height of the grid points'),
    numberRow('level map, `ledger map`', MAP_NUMBERS.spacingM, 'Grid spacing'),
    numberRow('level map, `ledger map`', MAP_NUMBERS.isolineStepDb),
  ];
}
