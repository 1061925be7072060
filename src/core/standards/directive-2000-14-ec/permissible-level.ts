/**
 * The permissible sound power level of Directive 2000/14/EC's Article 12 for a type and its
 * quantity: Stage II, or Stage I where 2005/88/EC lists Stage II as indicative only, with the
 * formula's working in words and the row's source.
 */
import { finite, positive } from '../../check.ts';
import { InputError } from '../../input-error.ts';
import { ARTICLE_12_TYPES } from './article-12-table.ts';
import { ARTICLE_13_TYPES } from './article-13-list.ts';
import { article12Type, bandFor, outsideScope } from './lookup.ts';
import { QUANTITY_WORDS } from './quantity-words.ts';
import { roundPermissible } from './rounding.ts';
import type { Article12Type } from './types.ts';

/** The slope of a formula as written in the table: "11·" for 11, nothing for 1. */
const slopeText = (slope: number) => (slope === 1 ? '' : `${slope}·`);

export interface PermissibleLevel {
  /** Permissible guaranteed sound power level LWA, dB re 1 pW, rounded. */
  levelDb: number;
  /** The formula's value before rounding, dB. */
  unroundedDb: number;
  /** The stage whose figures apply. */
  stage: 'II' | 'I (Stage II indicative only)';
  /** The formula in words, e.g. "80 + 11·lg P = 80 + 11·lg 100 = 102.0 → 102". */
  working: string;
  type: Article12Type;
  /** The source of the row, named (see Article12Type.source). */
  source: string;
}

/**
 * Permissible sound power level L_WA (Stage II, or Stage I where Stage II is indicative only)
 * of an Article 12 type for its quantity. Throws for an unknown category (naming the accepted
 * ones), a quantity that is not positive, or one at or above the type's Article 12 power limit.
 * @example permissibleSoundPower('excavator', 100).levelDb // 102
 */
export function permissibleSoundPower(category: string, quantity: number): PermissibleLevel {
  const type = article12Type(category);
  if (!type) {
    const art13 = ARTICLE_13_TYPES.find((t) => t.category === category);
    const problem = art13 ? 'is an Article 13 type (marking only, no permissible level)' : 'is not an Article 12 type';
    throw new InputError('type', category, problem, `use one of ${ARTICLE_12_TYPES.map((t) => t.category).join(', ')}`);
  }
  const words = QUANTITY_WORDS[type.quantity];
  finite(words.flag, quantity, `the ${words.words} in ${words.unit}`);
  positive(words.flag, quantity, `the ${words.words} in ${words.unit}, greater than 0`);
  const outside = outsideScope(type, quantity);
  if (outside)
    throw new InputError(
      words.flag,
      quantity,
      outside,
      `a ${words.words} below ${type.scope!.belowKw} ${words.unit} for a permissible level`,
    );
  const band = bandFor(type, quantity);
  const indicative = type.stageIIIndicative === true || band.stageIIIndicative === true;
  const figures = indicative ? band.stageI : band.stageII;
  const unrounded = figures.constant + figures.slope * Math.log10(quantity);
  const levelDb = roundPermissible(unrounded);
  const symbol = words.words.split(' ').pop() as string;
  const working =
    figures.slope === 0
      ? `${figures.constant} dB (${words.words} ${quantity} ${words.unit})`
      : `${figures.constant} + ${slopeText(figures.slope)}lg ${symbol} = ${figures.constant} + ${slopeText(figures.slope)}lg ${quantity} = ${unrounded.toFixed(2)} → ${levelDb}`;
  return {
    levelDb,
    unroundedDb: unrounded,
    stage: indicative ? 'I (Stage II indicative only)' : 'II',
    working,
    type,
    source: type.source,
  };
}
