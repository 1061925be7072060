/**
 * Row marks as short text badges (never colour alone): the badge text is
 * visible, the long form is the tooltip and what screen readers hear.
 */
import type { RowMarks } from './types.ts';
import { FLAG_WORDS } from '../../ledger/ranking/flag-words.ts';

export interface MarkBadge {
  key: keyof RowMarks;
  short: string;
  long: string;
}

const BADGES: readonly MarkBadge[] = [
  { key: 'over', short: 'over', long: 'over a limit' },
  {
    key: 'dominated',
    short: 'beaten',
    long: `${FLAG_WORDS.dominated}: another choice is at least as quiet and as cheap`,
  },
  { key: 'freeWin', short: 'no dearer', long: `${FLAG_WORDS.freeWin}: quieter than the baseline at no extra cost` },
  { key: 'baseline', short: 'base', long: 'baseline choice' },
  { key: 'pinned', short: 'pin', long: 'pinned into the fleet' },
  { key: 'excluded', short: 'excl', long: 'excluded from the fleet' },
];

/**
 * The badges to show for a row, in a fixed order.
 * @example markBadges({ over: true, pinned: true }).map((badge) => badge.short) // → ['over', 'pin']
 */
export function markBadges(marks: RowMarks | undefined): MarkBadge[] {
  if (!marks) return [];
  return BADGES.filter((badge) => marks[badge.key] === true);
}
