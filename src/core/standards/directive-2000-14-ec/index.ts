/**
 * Directive 2000/14/EC (noise emission in the environment by equipment for use outdoors),
 * checked against the consolidated text of Directive 2000/14/EC incl. its amendment by
 * Directive 2005/88/EC (EUR-Lex consolidated version 02000L0014; the Article 12 list and
 * table, Article 13 list and Annex I definitions).
 *
 * Article 12 equipment must not exceed a permissible guaranteed sound power level; the
 * Stage II levels (from 3 January 2006) are given by the table of Article 12 as formulas in
 * net installed power P (kW), the mass m of hand-held breakers (kg), the electric power Pel
 * of generators (kW) or the cutting width L of mowers (cm). The result is rounded to the
 * nearest whole number (below .5 down, .5 and above up).
 *
 * - Scope: Article 12's list limits some types by power (dozers, dumpers, excavators,
 *   excavator-loaders, graders, loaders, loader-type landfill compactors < 500 kW;
 *   compressors < 350 kW; power generators < 400 kW; motor hoes < 3 kW). Above the limit no
 *   permissible level applies: the machine carries its guaranteed level under Article 13
 *   where that article lists it (power generators ≥ 400 kW), and no limit in any case.
 * - Stage II indicative only (2005/88/EC footnote to the table): walk-behind vibrating
 *   rollers; vibratory plates (> 3 kW); vibratory rammers; dozers (steel tracked); loaders
 *   (steel tracked > 55 kW); combustion-engine driven counterbalanced lift trucks; compacting
 *   screed paver-finishers; hand-held internal combustion engine concrete-breakers and picks
 *   (15 < m < 30 kg); lawnmowers, lawn trimmers/lawn-edge trimmers. For these the Stage I
 *   figures continue to apply, and each row or band below says so.
 * - Item numbers are the directive's own: the Annex I definition each type refers to
 *   (Article 12's list: "Definition: Annex I, item N"), not a numbering of the table's lines.
 *
 * Each row names its source beside it (`source`); what rests on memory of the text rather
 * than a reading of it says "from memory". Article 13 equipment carries a guaranteed level on
 * its marking but has no limit. "Each row or band below" is the table in ./article-12-table.ts.
 *
 * One concept a file: the types of a row (./types.ts), the words of each quantity
 * (./quantity-words.ts), the sources named beside the rows (./sources.ts), the table's lines
 * shared by several types (./table-lines.ts), the Article 12 table (./article-12-table.ts),
 * the Article 13 list (./article-13-list.ts), the rounding rule (./rounding.ts), finding a
 * type and its band (./lookup.ts) and the permissible level (./permissible-level.ts).
 */
export type { Article12Type, LimitBand, LimitQuantity, ScopeLimit } from './types.ts';
export { QUANTITY_WORDS } from './quantity-words.ts';
export { DIRECTIVE_TEXT } from './sources.ts';
export { ARTICLE_12_TYPES } from './article-12-table.ts';
export { ARTICLE_13_TYPES, type Article13Type } from './article-13-list.ts';
export { roundPermissible } from './rounding.ts';
export { article12Type, outsideScope } from './lookup.ts';
export { permissibleSoundPower, type PermissibleLevel } from './permissible-level.ts';
