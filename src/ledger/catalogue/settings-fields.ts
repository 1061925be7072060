/**
 * The numbers typed in a project's settings: the ISO 9613-2:1996 propagation's weather, ground
 * and default source height, and the distance of the reference receiver used to rank machines
 * when no site exists. Each range is chosen from the trade or the standard with the reason
 * beside it. Validation (`validate/validate-rules.ts`), the Settings pane
 * (`app/shell/SettingsPane.svelte`), the workbook's assumptions sheet
 * (`io/workbook/assumptions-sheet.ts`), the command line's flags (`cli/flag-rules.ts`) and
 * `static/project.schema.json` read them.
 */
import type { NumberField } from './field.ts';
import type { Reading } from './read-number.ts';
import { height } from './site-numbers.ts';
import { DB_SUFFIXES, METRE_SUFFIXES, PERCENT_SUFFIXES } from './suffixes.ts';

export const SETTINGS_NUMBERS = {
  temperatureC: {
    path: 'propagation.temperatureC',
    unit: '°C',
    min: -20,
    max: 50,
    suffixes: ['°C', 'C'],
    accepted: 'a temperature from -20 to 50 °C, e.g. 10',
    why: 'ISO 9613-1:1993 gives the atmospheric absorption for air from -20 to +50 °C; outside it the standard states nothing, and a level worked there would be a guess',
    header: 'Temperature',
    describe: 'air temperature, °C, for the atmospheric absorption (ISO 9613-1:1993); 10 °C is the usual choice',
    workbookHeader: 'Air temperature',
  },
  humidityPct: {
    path: 'propagation.humidityPct',
    unit: '%',
    min: 10,
    max: 100,
    suffixes: PERCENT_SUFFIXES,
    accepted: 'a relative humidity from 10 to 100 %, e.g. 70',
    why: 'ISO 9613-1:1993 gives the atmospheric absorption for relative humidity from 10 to 100 %; below 10 % the standard states nothing',
    header: 'Relative humidity',
    describe:
      'relative humidity of the air, %, for the atmospheric absorption (ISO 9613-1:1993); 70 % is the usual choice',
    workbookHeader: 'Relative humidity',
  },
  pressureKPa: {
    path: 'propagation.pressureKPa',
    unit: 'kPa',
    min: 50,
    max: 200,
    suffixes: ['kPa'],
    accepted: 'an atmospheric pressure in kPa from 50 to 200, e.g. 101.325',
    why: 'the air at sea level is 101.325 kPa and about half that at 5,500 m, above any building site (from memory: the standard atmosphere); ISO 9613-1:1993 covers pressures up to 200 kPa. A pressure typed in hPa (1013) or atmospheres (1) is caught',
    header: 'Air pressure',
    describe: 'atmospheric pressure, kPa, for the atmospheric absorption (ISO 9613-1:1993); 101.325 kPa at sea level',
    workbookHeader: 'Air pressure',
  },
  groundFactor: {
    path: 'propagation.groundFactor',
    unit: '',
    min: 0,
    max: 1,
    suffixes: [],
    accepted: 'a ground factor G from 0 (hard) to 1 (porous), e.g. 0.5',
    why: 'ISO 9613-2:1996 clause 7.3.1 defines G as the porous share of the ground: 0 for hard ground (paving, water, compacted site), 1 for porous ground (grass, crops), between for a mixture',
    header: 'Ground factor G',
    describe: 'the porous share of the ground between the works and the receivers: 0 hard … 1 porous',
    workbookHeader: 'Ground factor G',
  },
  c0Db: {
    path: 'propagation.c0Db',
    unit: 'dB',
    min: 0,
    max: 5,
    suffixes: DB_SUFFIXES,
    accepted: 'a factor C0 of the meteorological correction in dB from 0 to 5, e.g. 2 (0 for downwind)',
    why: 'ISO 9613-2:1996 clause 8: C0 depends on the local weather statistics and lies in practice from 0 to about 5 dB, values over 2 dB being exceptional; 0 gives the downwind, short-term level',
    header: 'Meteorological factor C0',
    describe: 'C0 of the meteorological correction C_met (ISO 9613-2:1996 clause 8), dB; 0 for the downwind level',
    workbookHeader: 'Meteorological factor C0',
  },
  sourceHeightM: height({
    path: 'propagation.sourceHeightM',
    header: 'Source height',
    describe: 'height of a machine’s noise above the ground, metres, for every duty that gives none',
    workbookHeader: 'Source height when a duty gives none',
  }),
  referenceDistanceM: {
    path: 'settings.referenceDistanceM',
    unit: 'm',
    min: 1,
    max: 10000,
    suffixes: METRE_SUFFIXES,
    accepted: 'a reference distance in metres from 1 to 10000, e.g. 10',
    why: 'machines are compared at a stated distance such as 10 m (common practice); closer than about a metre a machine is no longer a point source, and beyond 10 km nothing on a site is assessed',
    header: 'Reference distance',
    describe: 'distance of the reference receiver machines are ranked at when the project has no receivers, metres',
    workbookHeader: 'Reference receiver distance',
  },
} as const satisfies Record<string, NumberField>;

export type SettingsNumberKey = keyof typeof SETTINGS_NUMBERS;

/** The project's currency: a code, not a number. */
export const CURRENCY_CODE = {
  path: 'currency',
  pattern: /^[A-Z]{3}$/,
  accepted: 'an ISO 4217 currency code of three capital letters, e.g. "GBP" or "EUR"',
  why: 'ISO 4217 names every currency by three letters; costs are kept in one currency per project and shown with its code',
  header: 'Currency (ISO 4217 code)',
  describe: 'the currency every cost of the project is in, as its three-letter ISO 4217 code',
} as const;

/**
 * Reads a currency code as typed: surrounding spaces dropped, letters taken in either case.
 *
 * @example readCurrencyCode(' eur ') // { ok: true, value: 'EUR' }
 * @example readCurrencyCode('pounds') // { ok: false, problem: 'is not accepted', accepted: 'use an ISO 4217 …' }
 */
export function readCurrencyCode(text: string): Reading<string> {
  const code = text.trim().toUpperCase();
  return CURRENCY_CODE.pattern.test(code)
    ? { ok: true, value: code }
    : { ok: false, problem: 'is not accepted', accepted: `use ${CURRENCY_CODE.accepted}` };
}
