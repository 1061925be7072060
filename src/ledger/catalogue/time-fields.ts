/**
 * The times of day typed for an assessment period (when a limit applies) and for a phase's
 * working hours. Validation (`validate/validate.ts` through CLOCK_ACCEPTED), the periods and
 * phases grids (`app/tables/periods.ts`, `app/tables/phases.ts`), the workbook's periods and
 * phases tables (`io/workbook/inputs-sheet.ts`) and `static/project.schema.json` (the
 * pattern of CLOCK_PATTERN) read them.
 */
import type { TimeField } from './field.ts';

const CLOCK = {
  accepted: 'a time of day HH:MM from 00:00 to 24:00, e.g. 07:00',
  why: 'periods and working hours are clock times within one day; 24:00 closes the day, and an end earlier than the start runs past midnight (a night 23:00 to 07:00)',
};

export const PERIOD_TIMES = {
  start: {
    ...CLOCK,
    path: 'start',
    header: 'From',
    describe: 'the time the period starts, HH:MM, e.g. 07:00',
    workbookHeader: 'Start (hh:mm)',
  },
  end: {
    ...CLOCK,
    path: 'end',
    header: 'To',
    describe:
      'the time the period ends, HH:MM, e.g. 19:00; an end earlier than the start runs past midnight (night 23:00 to 07:00)',
    workbookHeader: 'End (hh:mm)',
  },
} as const satisfies Record<string, TimeField>;

export const PHASE_TIMES = {
  start: {
    ...CLOCK,
    path: 'start',
    header: 'Work starts',
    describe: 'the time the phase’s working hours start, HH:MM, e.g. 08:00',
    workbookHeader: 'Works start (hh:mm)',
  },
  end: {
    ...CLOCK,
    path: 'end',
    header: 'Work ends',
    describe: 'the time the working hours end, HH:MM, e.g. 18:00; an end earlier than the start runs past midnight',
    workbookHeader: 'Works end (hh:mm)',
  },
} as const satisfies Record<string, TimeField>;
