/** The ranges clause parameters accept, with the words shown when a value is outside them. */
import type { NumberRule } from '../validate/field-checks.ts';

export const CLAUSE_RULES = {
  capDb: { min: 20, max: 160, accepted: 'a level in dB from 20 to 160, e.g. 105' },
  spacingM: { min: 0.5, max: 1000, accepted: 'a spacing in metres from 0.5 to 1000, e.g. 5' },
  sharePct: { min: 0, max: 100, accepted: 'a percentage from 0 to 100, e.g. 25' },
  boundaryAccepted: 'points "x y" in metres separated by ";", e.g. "0 0; 40 0; 40 25"',
} satisfies Record<string, NumberRule | string>;
