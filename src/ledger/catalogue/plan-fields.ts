/**
 * The numbers typed on the site plan: a barrier's top height, the drawing's scale, origin,
 * size and north (stored in the project, version 7), and the level map's grid height,
 * spacing and isoline step (chosen per map, not stored). Validation
 * (`validate/validate-plan.ts`), the Site plan tab (`app/plan`), `ledger map`'s flags and
 * `static/project.schema.json` read them, so each accepts the same values with the same words.
 */
import type { NumberField } from './field.ts';
import { height } from './site-numbers.ts';
import { DB_SUFFIXES, METRE_SUFFIXES } from './suffixes.ts';

export const PLAN_NUMBERS = {
  barrierHeightM: {
    path: 'barriers[].heightM',
    unit: 'm',
    min: 0,
    aboveMin: true,
    max: 100,
    suffixes: METRE_SUFFIXES,
    accepted: 'a barrier top height in metres above 0 and up to 100, e.g. 2.4',
    why: 'site hoardings stand about 2 to 3.6 m high and stockpiles or buildings used as screens some metres more (common practice); a barrier of no height screens nothing, and 100 m catches a height typed in centimetres',
    header: 'Top height',
    describe: 'height of the barrier’s top edge above the ground, metres, along its whole length',
    workbookHeader: 'Barrier top height',
  },
  metresPerPixel: {
    path: 'sitePlan.image.metresPerPixel',
    unit: 'm/px',
    min: 0,
    aboveMin: true,
    max: 1000,
    suffixes: [],
    accepted: 'a scale in site metres per image pixel above 0, set by two points and the distance between them',
    why: 'a drawing scanned or exported for a site is some centimetres to a few metres a pixel; 1,000 m a pixel would be a map of a country',
    header: 'Scale',
    describe: 'site metres per pixel of the drawing, from two points clicked on it and the distance typed between them',
    workbookHeader: 'Drawing scale (m per pixel)',
  },
  scaleDistanceM: {
    path: 'sitePlan.image.metresPerPixel',
    unit: 'm',
    min: 0,
    aboveMin: true,
    max: 100000,
    suffixes: METRE_SUFFIXES,
    accepted: 'the distance between the two points in metres above 0, e.g. 25',
    why: 'the two points are on the site drawing, so their distance lies within the site grid’s ±100 km (./site-numbers.ts); two points at one place give no scale',
    header: 'Distance between the points',
    describe:
      'the distance on the site between the two points clicked on the drawing, metres (the scale is worked from it)',
    workbookHeader: 'Distance between the scale points',
  },
  pixel: {
    path: 'sitePlan.image.originPx',
    unit: 'px',
    min: -1e6,
    max: 1e6,
    suffixes: [],
    accepted: 'an image pixel position within ±1000000',
    why: 'the origin of the site grid may lie off the drawing, but not further off than a million pixels (no drawing is that large)',
    header: 'Origin pixel',
    describe: 'where the site grid’s origin falls on the drawing, pixels from its top left corner',
    workbookHeader: 'Drawing origin (px)',
  },
  northDeg: {
    path: 'sitePlan.image.northDeg',
    unit: '°',
    min: -360,
    max: 360,
    suffixes: ['°', 'degrees', 'deg'],
    accepted: 'a bearing in degrees from -360 to 360 (0: north is up on the drawing)',
    why: 'a direction once round either way; a drawing turned by more is the same drawing',
    header: 'North',
    describe: 'direction of site-grid north on the drawing, degrees clockwise from the drawing’s up',
    workbookHeader: 'Drawing north (degrees clockwise)',
  },
  imagePx: {
    path: 'sitePlan.image.widthPx',
    unit: 'px',
    min: 1,
    max: 20000,
    integer: true,
    suffixes: [],
    accepted: 'an image size in whole pixels from 1 to 20000',
    why: 'a drawing within the 5 MB limit is well under 20,000 pixels a side; the browser draws nothing larger',
    header: 'Drawing size',
    describe: 'width or height of the drawing, whole pixels',
    workbookHeader: 'Drawing size (px)',
  },
} as const satisfies Record<string, NumberField>;

/** The level map's own numbers: chosen each time a map is worked out, never stored. */
export const MAP_NUMBERS = {
  pointHeightM: height({
    path: 'map.heightM',
    header: 'Height',
    describe: 'height of the map’s grid points above the ground, metres; 4 m is the usual choice for noise maps',
    workbookHeader: 'Map height',
  }),
  spacingM: {
    path: 'map.spacingM',
    unit: 'm',
    min: 0,
    aboveMin: true,
    max: 10000,
    suffixes: METRE_SUFFIXES,
    accepted: 'a grid spacing in metres above 0, e.g. 2',
    why: 'the grid must be finer than the plan to show anything; the number of points it gives is checked as well (at most 250,000)',
    header: 'Spacing',
    describe:
      'distance between neighbouring grid points of the map, metres; empty for about 100 points across the plan',
    workbookHeader: 'Map spacing',
  },
  isolineStepDb: {
    path: 'map.stepDb',
    unit: 'dB',
    min: 0.5,
    max: 20,
    suffixes: DB_SUFFIXES,
    accepted: 'an isoline step in dB from 0.5 to 20, e.g. 5',
    why: 'noise maps draw bands 5 dB wide (common practice); under 0.5 dB the lines are finer than any prediction, over 20 dB a map shows one band',
    header: 'Isoline step',
    describe: 'the map draws a line every so many dB',
    workbookHeader: 'Isoline step',
  },
} as const satisfies Record<string, NumberField>;
