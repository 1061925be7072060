/**
 * Axis scales and tick positions for the SVG charts (no chart library).
 * Pure layout: maps data values to pixels; it computes no decibels.
 */

/** A scale from a data interval onto a pixel interval. */
export interface Scale {
  (value: number): number;
  domain: [number, number];
  range: [number, number];
  ticks: number[];
}

/**
 * "Nice" round tick values covering [min, max], about `count` of them, steps of 1, 2 or 5 × 10^k.
 * O(count).
 * @example niceTicks(61.3, 78.9, 5) // [60, 65, 70, 75, 80]
 */
export function niceTicks(min: number, max: number, count = 5): number[] {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return [];
  if (min === max) {
    const pad = Math.abs(min) > 0 ? Math.abs(min) * 0.05 : 1;
    min -= pad;
    max += pad;
  }
  if (min > max) [min, max] = [max, min];
  const rough = (max - min) / Math.max(1, count);
  const power = 10 ** Math.floor(Math.log10(rough));
  const fraction = rough / power;
  const step = (fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10) * power;
  const first = Math.floor(min / step) * step;
  const last = Math.ceil(max / step) * step;
  const ticks: number[] = [];
  for (let k = 0; first + k * step <= last + step / 2; k++) {
    ticks.push(Number((first + k * step).toPrecision(12)));
  }
  return ticks;
}

/** A linear scale whose domain is widened to round ticks. */
export function linearScale(values: number[], range: [number, number], count = 5, include: number[] = []): Scale {
  const finiteValues = [...values, ...include].filter(Number.isFinite);
  const lo = finiteValues.length ? Math.min(...finiteValues) : 0;
  const hi = finiteValues.length ? Math.max(...finiteValues) : 1;
  const ticks = niceTicks(lo, hi, count);
  const d0 = ticks[0] ?? lo;
  const d1 = ticks[ticks.length - 1] ?? hi;
  const span = d1 - d0 || 1;
  const scale = ((value: number) => range[0] + ((value - d0) / span) * (range[1] - range[0])) as Scale;
  scale.domain = [d0, d1];
  scale.range = range;
  scale.ticks = ticks;
  return scale;
}

/**
 * Ticks of a base-10 logarithmic axis: 1, 2, 5 × 10^k inside [min, max] (min > 0).
 * @example logTicks(8, 300) // [10, 20, 50, 100, 200]
 */
export function logTicks(min: number, max: number): number[] {
  if (!(min > 0) || !(max > min)) return [];
  const ticks: number[] = [];
  for (let k = Math.floor(Math.log10(min)); k <= Math.ceil(Math.log10(max)); k++) {
    for (const m of [1, 2, 5]) {
      const t = Number((m * 10 ** k).toPrecision(12));
      if (t >= min * (1 - 1e-9) && t <= max * (1 + 1e-9)) ticks.push(t);
    }
  }
  return ticks;
}

/** A base-10 logarithmic scale over [min, max] (both > 0). */
export function logScale(min: number, max: number, range: [number, number]): Scale {
  const l0 = Math.log10(min);
  const l1 = Math.log10(max);
  const span = l1 - l0 || 1;
  const scale = ((value: number) => range[0] + ((Math.log10(value) - l0) / span) * (range[1] - range[0])) as Scale;
  scale.domain = [min, max];
  scale.range = range;
  scale.ticks = logTicks(min, max);
  return scale;
}

/** Short tick text for money: 12,500 → "12.5k", 1,200,000 → "1.2M". */
export function shortAmount(value: number): string {
  const abs = Math.abs(value);
  const sign = value < 0 ? '\u2212' : '';
  const trim = (x: number) => String(Number(x.toFixed(1)));
  if (abs >= 1e6) return `${sign}${trim(abs / 1e6)}M`;
  if (abs >= 1e3) return `${sign}${trim(abs / 1e3)}k`;
  return `${sign}${trim(abs)}`;
}

/** Currency symbol for an ISO 4217 code (e.g. "£" for GBP), or the code itself. */
export function currencySymbol(currency: string, locale?: string): string {
  // Kept per currency and locale: a number format is slow to make, and the results ask after every edit.
  const key = `${locale ?? ''}\u0000${currency}`;
  let symbol = symbols.get(key);
  if (symbol === undefined) {
    symbol = symbolOf(currency, locale);
    if (symbols.size >= SYMBOLS_KEPT) symbols.clear();
    symbols.set(key, symbol);
  }
  return symbol;
}

/** How many currency and locale pairs are kept (a user types a handful; the bound keeps a typing spree small). */
const SYMBOLS_KEPT = 64;
const symbols = new Map<string, string>();

function symbolOf(currency: string, locale?: string): string {
  try {
    const parts = new Intl.NumberFormat(locale, { style: 'currency', currency }).formatToParts(0);
    return parts.find((p) => p.type === 'currency')?.value ?? currency;
  } catch {
    return currency;
  }
}
