/**
 * The words the ledger uses, each in one or two plain sentences, with the standard that
 * defines it where there is one. Shown as the glossary in the Settings tab: the trade's terms
 * first, then every result label with the description its hover and focus show (result-terms.ts).
 */
import { RESULT_TERMS } from './result-terms.ts';

export interface GlossaryEntry {
  term: string;
  meaning: string;
}

const TRADE_TERMS: readonly GlossaryEntry[] = [
  {
    term: 'LWA (sound power level)',
    meaning:
      'The A-weighted sound power a machine radiates, in dB re 1 pW, as declared or measured (ISO 3744, ISO 3746). It belongs to the machine, not to a place.',
  },
  {
    term: 'LAeq,T',
    meaning: 'The level at a receiver averaged over the period T (energy average), in dB. Limits are given in it.',
  },
  {
    term: 'LAr,T (rating level)',
    meaning:
      'LAeq,T plus a character penalty for tonal or impulsive sound (ISO 1996-1). Shown only where a machine carries a penalty.',
  },
  {
    term: 'Receiver',
    meaning: 'A place where the level is assessed: a home, school, hospital or office, with a limit per period.',
  },
  {
    term: 'Façade',
    meaning: 'A receiver assessed 1 m in front of a wall: the reflection adds about 3 dB (common practice).',
  },
  {
    term: 'On-time',
    meaning:
      'The share of the working hours a machine actually runs, in per cent; 50 % lowers its contribution by 3 dB.',
  },
  {
    term: 'Directivity Q',
    meaning:
      'How the ground beside a source concentrates its sound: 1 in free space, 2 over hard ground (a half-space).',
  },
  {
    term: 'Ground factor G',
    meaning: 'How soft the ground between source and receiver is: 0 hard, 1 porous (ISO 9613-2:1996, clause 7.3).',
  },
  {
    term: 'Declared uncertainty K',
    meaning:
      'The margin a maker declares with a level (ISO 4871): the true level may lie up to K above the declared L. Rankings say when places could change within ±K.',
  },
  {
    term: 'Duty',
    meaning: 'A job on site that one machine does (e.g. breaking out a slab); the machines offered for it compete.',
  },
  {
    term: 'Baseline',
    meaning: 'The machine a duty would use without noise control; reductions and extra costs are measured from it.',
  },
  {
    term: 'Fleet',
    meaning:
      'One machine for every duty. The assessed fleet is the one the matrix, the statement, the report and the workbook describe.',
  },
  { term: 'Margin', meaning: 'Limit minus predicted level, in dB: negative means over the limit.' },
  {
    term: 'LWA used',
    meaning:
      'The LWA every prediction of a machine starts from (its rated LWA): the guaranteed value L + K, or the measured L when the project ranks on measured values (Settings, ISO 4871:1996), or the permissible level standing in. Not the rating level LAr,T, which belongs to a receiver.',
  },
  {
    term: 'LWA obtained as',
    meaning:
      'Where the LWA came from: declared on the marking or data sheet, worked from a sound power in watts, worked back from a pressure level measured at a distance, or the permissible level standing in.',
  },
  {
    term: 'Size for limit',
    meaning:
      'The size Directive 2000/14/EC sets a machine’s permissible level by when it is not the net power: a hand-held breaker’s mass in kg, a mower’s cutting width in cm, a generator’s electric power in kW.',
  },
  {
    term: 'Power source',
    meaning:
      'What drives the machine: diesel, petrol, electric, battery, hybrid or other. An electric-share clause counts it.',
  },
  {
    term: 'Stand-in LWA',
    meaning:
      'Where a machine declares no LWA, the Directive 2000/14/EC permissible level for its kind stands in for it, and the machine is marked.',
  },
];

/** The trade's terms, then the result labels (first letter capitalised), in the order of the results. */
export const GLOSSARY: readonly GlossaryEntry[] = [
  ...TRADE_TERMS,
  ...Object.values(RESULT_TERMS).map((t) => ({
    term: t.label.charAt(0).toUpperCase() + t.label.slice(1),
    meaning: t.hint,
  })),
];
