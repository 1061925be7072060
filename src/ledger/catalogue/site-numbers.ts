/**
 * Numbers shared by several lists of the project: a place on the site grid and a height above
 * the ground. A duty's and a receiver's fields (./duty-fields.ts, ./receiver-fields.ts) are
 * built from these, so both take the same range with the same reason.
 */
import type { NumberField } from './field.ts';
import { METRE_SUFFIXES } from './suffixes.ts';

type Names = Pick<NumberField, 'path' | 'header' | 'describe' | 'workbookHeader'>;

/** A coordinate east (x) or north (y) on the site grid, metres. */
export function coordinate(names: Names): NumberField {
  return {
    ...names,
    unit: 'm',
    min: -100000,
    max: 100000,
    suffixes: METRE_SUFFIXES,
    accepted: 'a site-grid coordinate in metres, within ±100000',
    why: 'the site grid has its origin on or beside the site and construction noise is assessed within a few kilometres of it; ±100 km holds any site with its neighbours and refuses a national-grid coordinate pasted without its false origin (common practice)',
  };
}

/** A height above the local ground, metres: a machine's source height or a receiver's assessment height. */
export function height(names: Names): NumberField {
  return {
    ...names,
    unit: 'm',
    min: 0,
    max: 300,
    suffixes: METRE_SUFFIXES,
    accepted: 'a height in metres from 0 to 300, e.g. 1.5',
    why: 'plant works about 1 to 2 m above the ground and a window is about 1.5 m above its floor, some 3 m a storey (common practice); 300 m reaches a crane jib or the top floor of a tower and catches a height typed in centimetres',
  };
}
