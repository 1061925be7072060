/**
 * Words the workbook writes beside a candidate's inputs: the stand-in marker (no declared
 * sound power, the Directive 2000/14/EC permissible level used instead) and the quantity a
 * directive limit depends on, with its unit. Also the layout of the candidates table on the
 * inputs sheet: the input columns with these read-only columns placed after the ones they
 * explain.
 */
import type { Candidate } from '../../ledger/model/model.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import {
  ARTICLE_13_TYPES,
  QUANTITY_WORDS,
  article12Type,
  outsideScope,
} from '../../core/standards/directive-2000-14-ec/index.ts';
import { CANDIDATE_COLUMNS, type CandidateColumn } from './candidate-columns.ts';
import { OFF_BASIS_MARK } from '../../ledger/rating/rating.ts';

/** The marker of a stand-in sound power, the same words on every sheet. */
export const STAND_IN_MARK = 'STAND-IN: permissible level, no declared value';

/**
 * The stand-in marker with the level and its source, or undefined when the candidate's
 * sound power is declared (or rated from its octave bands).
 * @example standInWords(check) // "STAND-IN: permissible level, no declared value (101 dB, Directive 2000/14/EC Stage II)"
 */
export function standInWords(check: CandidateCheck | undefined): string | undefined {
  if (!check?.standIn) return undefined;
  const p = check.permissible;
  return p ? `${STAND_IN_MARK} (${p.levelDb} dB, Directive 2000/14/EC Stage ${p.stage})` : STAND_IN_MARK;
}

/**
 * How a candidate's rated LWA is found, in words: the core's explanation, or for a stand-in
 * the marker with the permissible level's working.
 * @example ratedWorkingWords(check) // "measured 101.0 + K 2.0 = 103.0"
 */
export function ratedWorkingWords(check: CandidateCheck | undefined): string {
  if (!check) return '';
  const off = check.offBasis ? `; ${OFF_BASIS_MARK}: ${check.offBasis}` : '';
  const stand = standInWords(check);
  if (stand) return (check.permissible ? `${stand}: ${check.permissible.working}` : stand) + off;
  return check.ratedExplanation + off;
}

const fmt = (x: number) => (Number.isInteger(x) ? String(x) : x.toFixed(1));

/**
 * The quantity a candidate's directive limit depends on, in words with its unit, or the
 * reason there is none.
 * @example limitQuantityWords({ directiveCategory: 'excavator', netPowerKw: 120, … }) // "net installed power P = 120 kW"
 * @example limitQuantityWords({ directiveCategory: 'piling-rig', … }) // "marking only (Article 13): no limit"
 */
export function limitQuantityWords(candidate: Candidate): string {
  const category = candidate.directiveCategory;
  if (!category) return '';
  const type = article12Type(category);
  if (!type)
    return ARTICLE_13_TYPES.some((t) => t.category === category)
      ? 'marking only (Article 13): no limit'
      : 'not a type the directive limits';
  const words = QUANTITY_WORDS[type.quantity];
  const value =
    type.quantity === 'net-power-kw'
      ? (candidate.netPowerKw ?? candidate.directiveQuantity)
      : candidate.directiveQuantity;
  if (value === undefined || value === null || !Number.isFinite(value))
    return `${words.words} (${words.unit}): not given`;
  const outside = outsideScope(type, value);
  if (outside) return `${words.words} = ${fmt(value)} ${words.unit}: ${outside}`;
  return `${words.words} = ${fmt(value)} ${words.unit}`;
}

/** One column of the candidates table: an input, or a read-only note the workbook computes. */
export type CandidateTableEntry =
  | { kind: 'input'; column: CandidateColumn }
  | {
      kind: 'note';
      header: string;
      width: number;
      role: 'core' | 'stand-in';
      value(candidate: Candidate, check: CandidateCheck | undefined): string | null;
    };

/** Header of the stand-in column on the inputs sheet. */
export const STAND_IN_HEADER = 'Stand-in for a missing LWA';
/** Header of the limit-quantity column on the inputs sheet. */
export const LIMIT_QUANTITY_HEADER = 'Directive limit depends on (quantity, unit)';

const NOTES_AFTER: Record<string, Extract<CandidateTableEntry, { kind: 'note' }>> = {
  lwaDb: {
    kind: 'note',
    header: STAND_IN_HEADER,
    width: 24,
    role: 'stand-in',
    value: (_c, check) => (check?.standIn ? STAND_IN_MARK : null),
  },
  directiveQuantity: {
    kind: 'note',
    header: LIMIT_QUANTITY_HEADER,
    width: 28,
    role: 'core',
    value: (c) => limitQuantityWords(c) || null,
  },
};

/** The columns of the candidates table on the inputs sheet, in order. */
export function candidateTableLayout(): CandidateTableEntry[] {
  const out: CandidateTableEntry[] = [];
  for (const column of CANDIDATE_COLUMNS) {
    out.push({ kind: 'input', column });
    const note = NOTES_AFTER[column.field];
    if (note) out.push(note);
  }
  return out;
}
