/**
 * Finding an Article 12 type of Directive 2000/14/EC by its category word, the band of the
 * table its quantity falls in, and whether the quantity is above the type's power limit.
 */
import { InputError } from '../../input-error.ts';
import { ARTICLE_12_TYPES } from './article-12-table.ts';
import { QUANTITY_WORDS } from './quantity-words.ts';
import type { Article12Type, LimitBand } from './types.ts';

/** Finds an Article 12 type by our category word, or undefined. */
export function article12Type(category: string): Article12Type | undefined {
  return ARTICLE_12_TYPES.find((t) => t.category === category);
}

/** The band of the type's table line its quantity falls in; throws when none holds it. O(bands). */
export function bandFor(type: Article12Type, quantity: number): LimitBand {
  const band = type.bands.find(
    (b) =>
      (b.above === undefined || quantity > b.above) &&
      (b.atLeast === undefined || quantity >= b.atLeast) &&
      (b.atMost === undefined || quantity <= b.atMost) &&
      (b.below === undefined || quantity < b.below),
  );
  if (!band)
    throw new InputError(QUANTITY_WORDS[type.quantity].flag, quantity, 'is outside the table', 'use a positive value');
  return band;
}

/**
 * Why a machine of an Article 12 type has no permissible level at this quantity because it is
 * at or above the power limit of Article 12's list, in words; undefined inside the scope. O(1).
 * @example outsideScope(article12Type('excavator')!, 520) // "is 500 kW or more, above Article 12's scope (excavators (< 500 kW)): no permissible level (…)"
 */
export function outsideScope(type: Article12Type, quantity: number): string | undefined {
  const scope = type.scope;
  if (!scope || !(quantity >= scope.belowKw)) return undefined;
  return `is ${scope.belowKw} kW or more, above Article 12's scope (${scope.words}): ${scope.above}`;
}
