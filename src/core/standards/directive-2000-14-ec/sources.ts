/**
 * The sources named beside each row of the Article 12 table (Directive 2000/14/EC incl.
 * 2005/88/EC): the consolidated text, the table's figures, the footnote on indicative Stage II
 * figures, the Article 12 list, and what lies above a type's power limit.
 */
import type { ScopeLimit } from './types.ts';

/** The consolidated text checked against. */
export const DIRECTIVE_TEXT = 'Directive 2000/14/EC, consolidated text incl. 2005/88/EC';
/** Source of the table's figures (every row). */
export const FIGURES = `${DIRECTIVE_TEXT}, Art. 12 table (figures from memory of the table)`;
/** Source of the list of indicative Stage II figures. */
export const INDICATIVE =
  '2005/88/EC footnote to the Art. 12 table: Stage II indicative only, Stage I applies (from memory)';
/** Source of the Annex I item numbers and power limits (Art. 12 list, read). */
export const LIST = 'Art. 12 list: Annex I item and power limit';

export const NO_LIMIT_ABOVE =
  'no permissible level (outside Article 12; from memory, Article 13 lists no such type by power)';
export const POWER_500 = (what: string): ScopeLimit => ({
  belowKw: 500,
  words: `${what} (< 500 kW)`,
  above: NO_LIMIT_ABOVE,
});
