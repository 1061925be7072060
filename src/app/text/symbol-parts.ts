/**
 * Splits text holding symbols written with an underscore (L_WA, A_div, D_Ω, L_Aeq,T) into
 * plain runs and base–subscript pairs, so a screen can show the subscript as a subscript
 * rather than a raw underscore. Words with an underscore inside an identifier-like run of
 * more than one letter before it (file_name) are left alone.
 *
 * @example symbolParts('Geometric divergence A_div') →
 *   [{ text: 'Geometric divergence ' }, { base: 'A', sub: 'div' }]
 */
export type SymbolPart = { text: string } | { base: string; sub: string };

const SYMBOL = /(?<![\p{L}\p{N}_])(\p{L})_([\p{L}\p{N}Ω]+(?:,[\p{L}\p{N}]+)?)/gu;

export function symbolParts(text: string): SymbolPart[] {
  const parts: SymbolPart[] = [];
  let last = 0;
  for (const m of text.matchAll(SYMBOL)) {
    const at = m.index;
    if (at > last) parts.push({ text: text.slice(last, at) });
    parts.push({ base: m[1] ?? '', sub: m[2] ?? '' });
    last = at + m[0].length;
  }
  if (last < text.length) parts.push({ text: text.slice(last) });
  return parts;
}
