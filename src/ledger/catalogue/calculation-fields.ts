/**
 * The numbers of a one-machine calculation that a project keeps elsewhere or as a choice: the
 * directivity Q, the hours worked in an assessment period and the period's length, and a
 * character penalty. The quick calculation's form (`app/results/quick-calc-form.ts`) and
 * `ledger level`'s flags (`cli/flag-rules.ts`) read them, so both accept the same text.
 */
import type { NumberField } from './field.ts';
import { DB_SUFFIXES, HOUR_SUFFIXES } from './suffixes.ts';

const hours = (path: string, header: string, describe: string): NumberField => ({
  path,
  unit: 'h',
  min: 0,
  aboveMin: true,
  max: 24,
  suffixes: HOUR_SUFFIXES,
  accepted: 'a number of hours above 0 and up to 24, e.g. 10',
  why: 'an assessment period is a span of one day’s clock (a project’s periods are times of day), so neither it nor the hours worked in it exceed 24',
  header,
  describe,
  workbookHeader: `${header} (h)`,
});

export const CALCULATION_NUMBERS = {
  directivityQ: {
    path: 'q',
    unit: '',
    min: 1,
    max: 8,
    suffixes: [],
    accepted: '1, 2, 4 or 8',
    why: 'Q is 1 in free air, 2 on hard ground, 4 against a wall and 8 in a corner (point-source spreading, common practice); the values between are refused by the prediction with those words',
    header: 'Directivity Q',
    describe: 'directivity factor Q: 1 free field, 2 hard ground, 4 ground and a wall, 8 a corner',
    workbookHeader: 'Directivity Q',
  },
  hoursWorked: hours(
    'hoursWorked',
    'Hours worked in the period',
    'hours the machine works inside the assessment period (+10·lg of the share of the period)',
  ),
  periodHours: hours('periodHours', 'Assessment period', 'the length of the assessment period, hours'),
  characterPenaltyDb: {
    path: 'penaltyDb',
    unit: 'dB',
    min: 0,
    max: 6,
    suffixes: DB_SUFFIXES,
    accepted: 'a character penalty in dB from 0 to 6 (a project uses 0, 3 or 6), e.g. 3',
    why: 'a tonal or impulsive character adds 3 or 6 dB to the rating level (common practice); a project takes 0, 3 or 6, a one-off calculation any figure up to 6',
    header: 'Character penalty',
    describe: 'dB added for tonal or impulsive noise; empty for none',
    workbookHeader: 'Character penalty (dB)',
  },
} as const satisfies Record<string, NumberField>;
