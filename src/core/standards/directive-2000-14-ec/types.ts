/**
 * The shape of a row of Directive 2000/14/EC's Article 12 table as this program keeps it: the
 * quantity a limit depends on, the bands of the quantity with their Stage I and Stage II
 * formulas, Article 12's power limit on a type, and the type itself with its source.
 */
/** The quantity a limit depends on. */
export type LimitQuantity = 'net-power-kw' | 'mass-kg' | 'electric-power-kw' | 'cutting-width-cm';

/** One band of a limit: applies while the quantity is within (above, atMost]. */
export interface LimitBand {
  /** Lower bound, exclusive; undefined = from 0. */
  above?: number;
  /** Upper bound, inclusive; undefined = no upper bound. */
  atMost?: number;
  /** Upper bound is exclusive instead (the breaker row 15 < m < 30). */
  below?: number;
  /** Lower bound, inclusive (the breaker row m ≥ 30). */
  atLeast?: number;
  /** Stage I: constant + slope·lg(quantity), dB. */
  stageI: { constant: number; slope: number };
  /** Stage II: constant + slope·lg(quantity), dB. */
  stageII: { constant: number; slope: number };
  /** This band alone is listed as Stage II indicative only by 2005/88/EC: its Stage I figures apply. */
  stageIIIndicative?: boolean;
}

/** Article 12's power limit on a type: it applies only below `belowKw`. */
export interface ScopeLimit {
  belowKw: number;
  /** The list's words, e.g. "dozers (< 500 kW)". */
  words: string;
  /** Where a machine at or above the limit goes, e.g. "Article 13: marking only". */
  above: string;
}

export interface Article12Type {
  /** Our category word, used on the command line and in project files. */
  category: string;
  /** The directive's own words for the type(s) this category covers. */
  directiveName: string;
  /** Annex I item number(s) of the definition(s) the type refers to (the directive's numbering). */
  annexI: readonly number[];
  /** The line of the Article 12 table whose figures apply, in the table's words. */
  tableLine: string;
  quantity: LimitQuantity;
  bands: readonly LimitBand[];
  /** Stage II listed as indicative only by 2005/88/EC: the Stage I figures apply. */
  stageIIIndicative?: boolean;
  /** Article 12's power limit, when its list sets one. */
  scope?: ScopeLimit;
  /** Where the row comes from, named beside it; "from memory" where that is all it is. */
  source: string;
}
