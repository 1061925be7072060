/**
 * The labels of the results (not the grid's column headers): each with the short description
 * shown on hover and keyboard focus (`TermLabel.svelte`) and listed in the glossary. A label
 * is written here once and read by every view that shows it, so a rename happens in one place.
 * The trade's own terms (LAeq,T, LWA, receiver, baseline, K) are kept as the trade writes them.
 */
import { FLAG_WORDS } from '../../ledger/ranking/flag-words.ts';

export interface ResultTerm {
  /** The label as shown. */
  label: string;
  /** One or two plain sentences: what the figure or mark is and how to read it. */
  hint: string;
}

export const RESULT_TERMS = {
  levelsAt: {
    label: 'Levels worked out at',
    hint: 'The receiver at which the machine grid’s level, reduction and rank columns are worked out: one receiver, the worst receiver of each phase, or the reference receiver (a point at the reference distance, hemispherical spreading).',
  },
  referenceReceiver: {
    label: 'Reference receiver',
    hint: 'A stand-in receiver at the reference distance set in Settings (hemispherical spreading, Q = 2, nothing else), used to compare machines before any receiver is placed.',
  },
  ownLevel: {
    label: 'Own level',
    hint: 'The level this machine alone causes at the receiver, with its on-time, working hours and screening (dB LAeq,T).',
  },
  phaseTotal: {
    label: 'Phase total',
    hint: 'The energy sum at the receiver of every machine working in the phase, with this machine in the baseline’s place (dB LAeq,T).',
  },
  reduction: {
    label: 'Reduction',
    hint: 'How much lower the phase total is with this machine than with the duty’s baseline machine, in dB.',
  },
  extraCost: {
    label: 'Extra cost',
    hint: 'This machine’s cost for the duty minus the baseline machine’s; negative means it costs less.',
  },
  dbPer1000: {
    label: 'dB per 1,000',
    hint: 'Reduction for each 1,000 of extra cost: more is better value. Shown only where the machine costs more than the baseline.',
  },
  costPerDb: {
    label: 'Cost per dB',
    hint: 'Extra cost for each dB of reduction. Where the quieter machine is also cheaper it reads “saves … a dB”: the money saved for each dB of reduction. Shown only where the machine is quieter than the baseline.',
  },
  possiblePlaces: {
    label: 'Possible places',
    hint: 'The places in this ranking the machine could take if each declared level were anywhere within its declared uncertainty K (ISO 4871:1996). A single number: its place cannot change.',
  },
  quieterNoDearer: {
    label: FLAG_WORDS.freeWin,
    hint: 'Quieter than the baseline machine at no extra cost: an easy choice.',
  },
  beatenOnBoth: {
    label: FLAG_WORDS.dominated,
    hint: 'Another machine offered for the same duty is at least as quiet and at least as cheap, and better in one of the two: this one is never the better buy.',
  },
  bestBuyFirst: {
    label: 'Best-buy-first fleet',
    hint: 'The fleet reached by hand: from the baselines, repeatedly swap in the machine with the most dB of reduction per 1,000 of extra cost at the worst receiver, until every limit is met. Shown to measure what the exact optimiser saves.',
  },
} as const satisfies Record<string, ResultTerm>;

export type ResultTermKey = keyof typeof RESULT_TERMS;
