/**
 * The range and unit words of every numeric flag of the command line. Where the project file
 * holds the same quantity, the flag takes the project file's rule (`ledger/validate/validate-rules.ts`,
 * which takes a machine's, a duty's and a receiver's numbers from the field catalogue
 * `ledger/catalogue`), and `cli/flags.ts` reads the value with the catalogue's reader, so the
 * command line accepts exactly what a project, the grid and a supplier list accept ("104 dB",
 * "12 m", "1,250"), with the grid's words for what is wrong.
 */
import type { NumberRule } from '../ledger/validate/field-checks.ts';
import { RULES, validationRule } from '../ledger/validate/validate-rules.ts';
import { CALCULATION_NUMBERS, DAY_SUFFIXES, DB_SUFFIXES, MAP_NUMBERS } from '../ledger/catalogue/index.ts';

export const FLAG_RULES = {
  lwaDb: RULES.lwaDb,
  bandDb: RULES.bandDb,
  distanceM: RULES.distanceM,
  onTimePct: RULES.onTimePct,
  count: RULES.count,
  screeningDb: RULES.screeningDb,
  heightM: RULES.heightM,
  groundFactor: RULES.groundFactor,
  c0Db: RULES.c0Db,
  temperatureC: RULES.temperatureC,
  humidityPct: RULES.humidityPct,
  pressureKPa: RULES.pressureKPa,
  pathDifferenceM: RULES.pathDifferenceM,
  money: RULES.money,
  operatorLpaDb: RULES.operatorLpaDb,
  operatorHours: RULES.operatorHours,
  directiveQuantity: RULES.directiveQuantity,
  /** Hours worked inside an assessment period, and the period's length. */
  periodHours: validationRule(CALCULATION_NUMBERS.periodHours),
  /** The level map's grid height, spacing and isoline step (`ledger map`). */
  mapHeightM: validationRule(MAP_NUMBERS.pointHeightM),
  mapSpacingM: validationRule(MAP_NUMBERS.spacingM),
  isolineStepDb: validationRule(MAP_NUMBERS.isolineStepDb),
  /** A character penalty. */
  penaltyDb: validationRule(CALCULATION_NUMBERS.characterPenaltyDb),
  /** Q is one of 1, 2, 4, 8; the core refuses the values between. */
  q: validationRule(CALCULATION_NUMBERS.directivityQ),
  /** Sound power of one machine: the watts of the band-level range, 0 to 170 dB re 1 pW. */
  watts: {
    min: 1e-12,
    max: 1e5,
    suffixes: ['W'],
    accepted: 'a sound power in watts from 1e-12 (0 dB) to 100000 (170 dB), e.g. 0.5',
  },
  /** A sound power level to convert to watts: the band-level range. */
  powerLevelDb: {
    min: 0,
    max: 170,
    suffixes: DB_SUFFIXES,
    accepted: 'a sound power level in dB re 1 pW from 0 to 170, e.g. 104.5',
  },
  /** A measured sound pressure level: the operator-position range widened down to 0 dB. */
  pressureLevelDb: {
    min: 0,
    max: 150,
    suffixes: DB_SUFFIXES,
    accepted: 'a sound pressure level in dB from 0 to 150, e.g. 78',
  },
  /** A spreadsheet row: the import's 100,000-row cap. */
  rowNumber: { min: 1, max: 100000, integer: true, accepted: 'a row number from 1 to 100000' },
  /** A footprint criterion L_Aeq over the working day: the limit range. */
  criterionDb: RULES.limitDb,
  /** A site rule on sound power (the fleet view): the LWA range. */
  lwaCriterionDb: RULES.lwaDb,
  /** Working days a machine works in a year. */
  daysPerYear: {
    min: 1,
    max: 366,
    integer: true,
    suffixes: DAY_SUFFIXES,
    accepted: 'a whole number of days from 1 to 366, e.g. 200',
  },
  /** Seconds the solver may run. */
  timeLimitS: {
    min: 0,
    max: 86400,
    aboveMin: true,
    suffixes: ['seconds', 's'],
    accepted: 'a number of seconds above 0 and up to 86400 (a day), e.g. 120',
  },
} satisfies Record<string, NumberRule>;
