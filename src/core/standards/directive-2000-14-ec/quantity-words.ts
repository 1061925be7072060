/**
 * The words of each quantity an Article 12 limit depends on (Directive 2000/14/EC): the
 * command-line flag, the directive's symbol in words, and the unit, for messages and help.
 */
import type { LimitQuantity } from './types.ts';

/** Words of each quantity for messages and help. */
export const QUANTITY_WORDS: Record<LimitQuantity, { flag: string; words: string; unit: string }> = {
  'net-power-kw': { flag: 'power', words: 'net installed power P', unit: 'kW' },
  'electric-power-kw': { flag: 'power', words: 'electric power Pel', unit: 'kW' },
  'mass-kg': { flag: 'mass', words: 'mass m', unit: 'kg' },
  'cutting-width-cm': { flag: 'width', words: 'cutting width L', unit: 'cm' },
};
