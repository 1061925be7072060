/**
 * Turning a column header into plain words for matching: lower case, punctuation as
 * spaces, "/" read as "per", "L_WA" and "L(WA)" joined to "lwa".
 * @example headerWords('Rate £/day') // "rate £ per day"
 * @example headerWords('L_WA dB(A)') // "lwa db a"
 */
export function headerWords(header: string): string {
  return header
    .toLowerCase()
    .replace(/\bl\s*[_(]?\s*(wa|pa|w|p|eq)\b\)?/g, 'l$1')
    .replace(/\bl([pw])[\s,_]*a\b/g, 'l$1a')
    .replace(/\//g, ' per ')
    .replace(/[^\p{L}\p{N}£€$.]+/gu, ' ')
    .replace(/(\d)\.(?!\d)|\.(?!\d)/g, '$1 ')
    .replace(/\s+/g, ' ')
    .trim();
}

/**
 * A measurement distance stated in a header, metres: "LpA at 10 m", "SPL @7m", "dB(A) 1m".
 * @example distanceInHeader('LpA at 10 m') // 10
 */
export function distanceInHeader(header: string): number | undefined {
  const m = /(?:^|[^\d.,])(\d+(?:[.,]\d+)?)\s*(?:m|metres?|meters?)\b/i.exec(header);
  if (!m) return undefined;
  const value = Number((m[1] as string).replace(',', '.'));
  return Number.isFinite(value) && value > 0 ? value : undefined;
}
