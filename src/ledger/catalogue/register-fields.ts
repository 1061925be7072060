/**
 * The fields of the buyer's register that a project's machine does not have: a bought
 * machine's working life, kept in years or in working days, and the unit it is kept in. The
 * life's range depends on its unit, so it has one field per unit and the register's grid
 * (`app/register/register-table.ts`) and validation (`register/validate-register.ts`) read
 * them; the register workbook (`io/register-workbook/register-columns.ts`) and
 * `static/register.schema.json` read the widest of the two.
 */
import type { LifeUnit } from '../register/model.ts';
import type { ChoiceField, NumberField } from './field.ts';
import { MACHINE_NUMBERS } from './machine-numbers.ts';

const life = {
  path: 'purchase.life',
  header: 'Life',
  describe: 'how long a bought machine works for you, in the unit of the next column',
  workbookHeader: 'Life',
} as const;

export const REGISTER_LIFE = {
  years: {
    ...life,
    unit: 'years',
    min: 0,
    aboveMin: true,
    max: 100,
    suffixes: ['years', 'year', 'yrs', 'yr'],
    accepted: 'a working life in years above 0 and up to 100, e.g. 8',
    why: 'contractors write plant off over some 5 to 15 years (common practice); a purchase is spread over more than no time, and a century catches a life typed in days or months with the unit left at years',
  },
  /** A life in working days: the range of a project machine's life in days. */
  workingDays: {
    ...life,
    unit: 'working days',
    min: MACHINE_NUMBERS.lifeDays.min,
    aboveMin: true,
    max: MACHINE_NUMBERS.lifeDays.max,
    suffixes: MACHINE_NUMBERS.lifeDays.suffixes,
    accepted: 'a working life in working days above 0 and up to 36500, e.g. 1600',
    why: MACHINE_NUMBERS.lifeDays.why,
  },
} as const satisfies Record<string, NumberField>;

/**
 * A life whose unit is not known yet, as a register workbook's cell is read before its row's
 * unit: the widest range (working days) and both units' words. The schema states this range;
 * validation then holds the life to its unit's.
 */
export const REGISTER_LIFE_ANY_UNIT: NumberField = {
  ...REGISTER_LIFE.workingDays,
  unit: '',
  suffixes: [...REGISTER_LIFE.years.suffixes, ...REGISTER_LIFE.workingDays.suffixes],
  accepted: 'a working life above 0: up to 100 in years, or up to 36500 in working days, e.g. 8',
};

/** The life's field for the unit it is kept in. */
export const lifeFieldOf = (unit: unknown): NumberField =>
  unit === 'working-days' ? REGISTER_LIFE.workingDays : REGISTER_LIFE.years;

export const LIFE_UNIT: ChoiceField<LifeUnit> = {
  path: 'purchase.lifeUnit',
  choices: [
    { value: 'years', label: 'years', words: ['years', 'year', 'yrs', 'y'] },
    { value: 'working-days', label: 'working days', words: ['working days', 'working-days', 'days', 'd'] },
  ],
  header: 'Life in',
  describe: 'years, or working days (converted with your working days a year)',
  workbookHeader: 'Life unit',
};
