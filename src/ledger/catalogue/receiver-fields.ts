/**
 * The fields typed for a receiver (a place where people hear the works): where it is, its
 * assessment height, its kind, its limit in each assessment period, the ambient level, and
 * how it is screened from each duty. Each range is chosen from the trade with the reason
 * beside it. Validation (`validate/validate-rules.ts`, `validate/validate.ts`), the receivers
 * grid (`app/tables/receivers.ts`), the workbook's receivers and screening tables
 * (`io/workbook/inputs-sheet.ts`), the command line's flags (`cli/flag-rules.ts`) and
 * `static/project.schema.json` read them.
 */
import { RECEIVER_KINDS, type ReceiverKind } from '../model/model.ts';
import { SCREENING_EXPLICIT_MAX_DB } from '../../core/corrections.ts';
import type { ChoiceField, NumberField } from './field.ts';
import { coordinate, height } from './site-numbers.ts';
import { DB_SUFFIXES, METRE_SUFFIXES } from './suffixes.ts';

export const RECEIVER_NUMBERS = {
  x: coordinate({ path: 'x', header: 'X', describe: 'metres east on the site grid', workbookHeader: 'x east (m)' }),
  y: coordinate({ path: 'y', header: 'Y', describe: 'metres north on the site grid', workbookHeader: 'y north (m)' }),
  heightM: height({
    path: 'heightM',
    header: 'Height',
    describe: 'height of the assessment position above the ground, metres (about 1.5 m a storey up from 1.5 m)',
    workbookHeader: 'Assessment height (m)',
  }),
  limitDb: {
    path: 'limitsDb',
    unit: 'dB',
    min: 20,
    max: 120,
    suffixes: DB_SUFFIXES,
    accepted: 'a limit LAeq,T in dB from 20 to 120, e.g. 75',
    why: 'construction noise limits at homes run from about 40–45 dB LAeq at night to 65–75 dB by day (from memory: BS 5228-1:2009+A1:2014 Annex E); 20 dB is below the quietest rural night and 120 dB above any limit, so a level typed in the wrong unit or with a slipped digit is caught',
    header: 'Limit',
    describe: 'the limit LAeq over the period in dB, e.g. 65; empty: not assessed in that period',
    workbookHeader: 'Limit LAeq (dB)',
  },
  ambientDb: {
    path: 'ambientDb',
    unit: 'dB',
    min: 0,
    max: 140,
    suffixes: DB_SUFFIXES,
    accepted: 'an ambient level LAeq,T in dB from 0 to 140',
    why: 'a measured ambient runs from about 25 dB on a quiet rural night to about 75 dB at a busy road’s façade (common practice); 140 dB, Directive 2003/10/EC’s peak limit, is beyond any ambient',
    header: 'Ambient',
    describe: 'the ambient level LAeq measured without the works, dB; empty when not measured',
    workbookHeader: 'Ambient LAeq (dB)',
  },
  screeningDb: {
    path: 'screening.db',
    unit: 'dB',
    min: 0,
    max: SCREENING_EXPLICIT_MAX_DB,
    suffixes: DB_SUFFIXES,
    accepted: `a reduction in dB from 0 to ${SCREENING_EXPLICIT_MAX_DB}, e.g. 7.5`,
    why: `a stated screening reduction; ISO 9613-2:1996 clause 7.4 caps a barrier’s D_z at 20 dB (single diffraction) and 25 dB (double), so ${SCREENING_EXPLICIT_MAX_DB} dB is the most any stated screen may be credited with`,
    header: 'Screening from',
    describe: 'a reduction in dB stated for the screen between the duty and the receiver',
    workbookHeader: 'Stated screening reduction (dB)',
  },
  pathDifferenceM: {
    path: 'screening.pathDifferenceM',
    unit: 'm',
    min: 0,
    max: 100,
    suffixes: METRE_SUFFIXES,
    accepted: 'a path difference z in metres from 0 to 100, e.g. 0.8',
    why: 'z of ISO 9613-2:1996 eq. 14 over a barrier’s top: a site hoarding gives centimetres to a few metres; the barrier term reaches its 20 dB cap (clause 7.4) long before 100 m, so a larger z is a slipped digit',
    header: 'Screening from',
    describe: 'the barrier’s path difference z in metres, over its top edge (ISO 9613-2:1996 method only)',
    workbookHeader: 'Barrier path difference z (m)',
  },
} as const satisfies Record<string, NumberField>;

export type ReceiverNumberKey = keyof typeof RECEIVER_NUMBERS;

export const RECEIVER_KIND: ChoiceField<ReceiverKind> = {
  path: 'kind',
  choices: RECEIVER_KINDS.map((k) => ({ value: k, label: k, words: [k] })),
  header: 'Kind',
  describe: 'what the building is used for: home, school, hospital, office or other',
  workbookHeader: 'Kind',
};

/** The façade field: yes when the level is assessed 1 m in front of a façade (+3 dB). */
export const FACADE = {
  path: 'facade',
  header: 'Façade',
  describe: 'yes: assessed 1 m in front of a façade (+3 dB)',
  workbookHeader: 'Façade, 1 m in front (TRUE/FALSE)',
} as const;
