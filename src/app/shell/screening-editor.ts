/**
 * The duty × receiver screening editor's cells: what each cell shows (a kind and, for a
 * stated reduction or a barrier, the amount as typed) and the text a choice writes through
 * the receivers table's screening column, so that unreadable amounts are kept and
 * messaged exactly as in the grid.
 *
 * Rule-of-thumb reductions (−5 dB with only the machine's top in sight, −10 dB with it out of
 * sight) are common practice in UK and Hong Kong construction noise guidance
 * (core/screening-words.ts); a barrier path difference z goes into
 * ISO 9613-2:1996 clause 7.4 and needs that method.
 */
import type { Propagation, Screening } from '../../ledger/model/model.ts';
import { formatNumber, type DecimalSeparator } from '../tables/parse.ts';
import { SCREENING_WORDS } from '../../core/screening-words.ts';

export type ScreeningKind = Screening['kind'];

/** The choices of a cell, in the order offered. */
export const SCREENING_CHOICES: readonly { kind: ScreeningKind; label: string }[] = [
  { kind: 'none', label: 'none' },
  { kind: 'top-visible', label: `${SCREENING_WORDS['top-visible'].short} (−5 dB)` },
  { kind: 'hidden', label: `${SCREENING_WORDS.hidden.short} (−10 dB)` },
  { kind: 'explicit', label: 'stated reduction (dB)' },
  { kind: 'barrier', label: 'barrier, path difference (m)' },
];

/** A kind that needs an amount typed beside it. */
export function needsAmount(kind: ScreeningKind): kind is 'explicit' | 'barrier' {
  return kind === 'explicit' || kind === 'barrier';
}

/** What one cell shows: the kind chosen and the amount text (as typed when it could not be read). */
export interface ScreeningCell {
  kind: ScreeningKind;
  amount: string;
  /** The amount is the text a user typed that could not be read. */
  unread: boolean;
}

/**
 * The cell for a stored screening, or for the text kept when it could not be read.
 * @example screeningCell({ kind: 'explicit', db: 7.5 }, undefined, '.') // { kind: 'explicit', amount: '7.5', unread: false }
 * @example screeningCell(undefined, 'z 0,8x', ',') // { kind: 'barrier', amount: '0,8x', unread: true }
 */
export function screeningCell(
  screening: Screening | undefined,
  kept: string | undefined,
  sep: DecimalSeparator,
): ScreeningCell {
  if (kept !== undefined) {
    const t = kept.trim();
    const z = /^z\s*=?\s*(.*?)\s*(m)?$/i.exec(t);
    if (z) return { kind: 'barrier', amount: z[1] ?? '', unread: true };
    return { kind: 'explicit', amount: t.replace(/\s*db$/i, ''), unread: true };
  }
  if (!screening) return { kind: 'none', amount: '', unread: false };
  if (screening.kind === 'explicit')
    return { kind: 'explicit', amount: formatNumber(screening.db, sep), unread: false };
  if (screening.kind === 'barrier')
    return { kind: 'barrier', amount: formatNumber(screening.pathDifferenceM, sep), unread: false };
  return { kind: screening.kind, amount: '', unread: false };
}

/**
 * The text the receivers table's screening column reads for a choice and an amount.
 * @example screeningEntry('barrier', '0.8') // "z 0.8"
 * @example screeningEntry('explicit', '7,5') // "7,5 dB"
 */
export function screeningEntry(kind: ScreeningKind, amount: string): string {
  switch (kind) {
    case 'none':
      return 'none';
    case 'top-visible':
      return SCREENING_WORDS['top-visible'].short;
    case 'hidden':
      return SCREENING_WORDS.hidden.short;
    case 'explicit':
      return `${amount.trim()} dB`;
    case 'barrier':
      return `z ${amount.trim()}`;
  }
}

/** Whether the project's propagation method can use a barrier's path difference (ISO 9613-2:1996 only). */
export function barrierAllowed(propagation: Propagation): boolean {
  return propagation.method === 'iso9613-2:1996';
}
