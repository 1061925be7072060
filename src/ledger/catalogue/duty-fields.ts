/**
 * The numbers typed for a duty (a piece of work one machine type does): units, on-time and
 * its range, days needed, where it works (a point on the site grid or a distance to each
 * receiver) and its source height. Each range is chosen from the trade with the reason
 * beside it. Validation (`validate/validate-rules.ts`), the duties grid (`app/tables/duties.ts`),
 * the workbook's duties table (`io/workbook/inputs-sheet.ts`), the command line's flags
 * (`cli/flag-rules.ts`) and `static/project.schema.json` read them.
 */
import type { NumberField } from './field.ts';
import { coordinate, height } from './site-numbers.ts';
import { DAY_SUFFIXES, METRE_SUFFIXES, PERCENT_SUFFIXES } from './suffixes.ts';

const onTime = (path: string, header: string, workbookHeader: string, describe: string): NumberField => ({
  path,
  unit: '%',
  min: 0,
  aboveMin: true,
  max: 100,
  suffixes: PERCENT_SUFFIXES,
  accepted: 'a percentage above 0 and up to 100, e.g. 60',
  why: 'the share of the assessment period the machine runs at the power its LWA is declared for (the on-time correction 10·lg η, common practice); 0 % would add nothing (leave the duty out instead) and no machine runs more than the whole period',
  header,
  describe,
  workbookHeader,
});

export const DUTY_NUMBERS = {
  count: {
    path: 'count',
    unit: '',
    min: 1,
    max: 1000,
    integer: true,
    suffixes: ['units', 'unit'],
    accepted: 'a whole number of units from 1 to 1000',
    why: 'identical machines doing the duty together (two breakers, a fleet of dump trucks): a whole number; a thousand is beyond any one site’s fleet and catches a slipped digit',
    header: 'Units',
    describe: 'how many identical machines do the duty at the same time (+10·lg n)',
    workbookHeader: 'Units working',
  },
  onTimePct: onTime(
    'onTimePct',
    'On-time',
    'On-time (%)',
    'share of the period the machine runs at full power, % (+10·lg of the share)',
  ),
  onTimeLowPct: onTime(
    'onTimeRangePct.lowPct',
    'On-time lowest',
    'On-time lowest (%)',
    'the lowest on-time the duty could really run at, for how sure compliance is (the levels use the on-time); leave both ends empty when the on-time is known',
  ),
  onTimeHighPct: onTime(
    'onTimeRangePct.highPct',
    'On-time highest',
    'On-time highest (%)',
    'the highest on-time the duty could really run at, for how sure compliance is (the levels use the on-time); leave both ends empty when the on-time is known',
  ),
  durationDays: {
    path: 'durationDays',
    unit: 'days',
    min: 1,
    max: 3650,
    integer: true,
    suffixes: DAY_SUFFIXES,
    accepted: 'a whole number of days from 1 to 3650, e.g. 9',
    why: 'hire is charged by whole days (day, week and month rates); ten years is beyond any one duty and catches a slipped digit',
    header: 'Days needed',
    describe: 'working days the duty takes; sets the hire cost (days, weeks or months, whichever is cheaper)',
    workbookHeader: 'Duration (days)',
  },
  x: coordinate({
    path: 'location.x',
    header: 'X',
    describe: 'metres east on the site grid; on a line or an area, its centre (typing moves the whole shape)',
    workbookHeader: 'x east (m)',
  }),
  y: coordinate({
    path: 'location.y',
    header: 'Y',
    describe: 'metres north on the site grid; on a line or an area, its centre (typing moves the whole shape)',
    workbookHeader: 'y north (m)',
  }),
  distanceM: {
    path: 'location.distancesM',
    unit: 'm',
    min: 0,
    aboveMin: true,
    max: 100000,
    suffixes: METRE_SUFFIXES,
    accepted: 'a distance in metres above 0, e.g. 45',
    why: 'a point source needs a distance above 0; ISO 9613-2:1996 Table 5 states its accuracy up to 1 km and construction plant is seldom heard beyond a few kilometres, so 100 km is far beyond any assessment and catches a distance typed in millimetres',
    header: 'Distance to',
    describe: 'stated distance from the duty to the receiver, metres, when the duty is not placed on the site grid',
    workbookHeader: 'Stated distance (m; distances location)',
  },
  sourceHeightM: height({
    path: 'sourceHeightM',
    header: 'Source height',
    describe: 'height of the machine’s noise above the ground, metres; empty: the project’s default',
    workbookHeader: 'Source height (m; blank = default)',
  }),
} as const satisfies Record<string, NumberField>;

export type DutyNumberKey = keyof typeof DUTY_NUMBERS;
