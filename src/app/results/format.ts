/**
 * Text for the numbers the results views show. These helpers only FORMAT values the
 * ledger has computed; they never add, subtract or otherwise compute a decibel.
 *
 * Conventions: levels with one decimal and "dB"; margins signed (+ headroom, − over);
 * a level that could not be computed (NaN) reads "not computed"; money in the project's
 * currency through Intl.NumberFormat.
 */

/** Decimal separator a project writes numbers with. */
export type DecimalSeparator = '.' | ',';

/** Shown wherever an input a result needs is missing or unreadable. */
export const NOT_COMPUTED = 'not computed';

/** Typographic minus sign, used for negative values. */
export const MINUS = '\u2212';

/** Writes a finite number with a fixed number of decimals, a real minus sign and the project's separator. */
export function fixed(value: number, decimals: number, decimal: DecimalSeparator = '.'): string {
  const text = Math.abs(value).toFixed(decimals);
  const rounded = Number(text);
  const sign = value < 0 && rounded !== 0 ? MINUS : '';
  return sign + (decimal === ',' ? text.replace('.', ',') : text);
}

/**
 * A level: one decimal and "dB"; NaN → "not computed"; −Infinity (nothing running) → "no machines".
 * @example formatLevel(67.34) // "67.3 dB"
 */
export function formatLevel(levelDb: number | undefined, decimal: DecimalSeparator = '.'): string {
  if (levelDb === undefined || Number.isNaN(levelDb)) return NOT_COMPUTED;
  if (levelDb === -Infinity) return 'no machines';
  if (!Number.isFinite(levelDb)) return NOT_COMPUTED;
  return `${fixed(levelDb, 1, decimal)} dB`;
}

/**
 * A signed difference in dB (margins, reductions, terms): "+2.1 dB", "−3.4 dB", "0.0 dB".
 * @example formatSignedDb(-3.42) // "−3.4 dB"
 */
export function formatSignedDb(db: number | undefined, decimal: DecimalSeparator = '.'): string {
  if (db === undefined || !Number.isFinite(db)) return NOT_COMPUTED;
  const text = fixed(db, 1, decimal);
  if (text.startsWith(MINUS)) return `${text} dB`;
  return Number(Math.abs(db).toFixed(1)) === 0 ? `${text} dB` : `+${text} dB`;
}

/**
 * A reduction in dB with its sign, as formatSignedDb, except that a reduction which is not zero
 * but would read "0.0 dB" keeps two significant figures, so a cost per dB beside it (which
 * divides by it) is not read as the price of nothing.
 * @example formatReductionDb(0.0437) // "+0.044 dB"
 * @example formatReductionDb(0) // "0.0 dB"
 */
export function formatReductionDb(db: number | undefined, decimal: DecimalSeparator = '.'): string {
  if (db === undefined || !Number.isFinite(db) || db === 0 || Math.abs(db) >= 0.05) return formatSignedDb(db, decimal);
  const text = Math.abs(db).toPrecision(2);
  return `${db < 0 ? MINUS : '+'}${decimal === ',' ? text.replace('.', ',') : text} dB`;
}

/** A limit: "65.0 dB", or "no limit" when the receiver has none for the period. */
export function formatLimit(limitDb: number | undefined, decimal: DecimalSeparator = '.'): string {
  if (limitDb === undefined) return 'no limit';
  return formatLevel(limitDb, decimal);
}

/**
 * Margin = limit − level in words a reader cannot misread: "3.4 dB over", "2.1 dB under", "at the limit".
 * @example describeMargin(-3.42) // "3.4 dB over the limit"
 */
export function describeMargin(marginDb: number | undefined, decimal: DecimalSeparator = '.'): string {
  if (marginDb === undefined) return 'no limit';
  if (!Number.isFinite(marginDb)) return NOT_COMPUTED;
  const size = fixed(Math.abs(marginDb), 1, decimal);
  if (Number(Math.abs(marginDb).toFixed(1)) === 0) return marginDb < 0 ? `${size} dB over the limit` : 'at the limit';
  return marginDb < 0 ? `${size} dB over the limit` : `${size} dB under the limit`;
}

const moneyFormats = new Map<string, Intl.NumberFormat>();

function moneyFormat(
  currency: string,
  locale: string | undefined,
  fractionDigits: number,
): Intl.NumberFormat | undefined {
  const key = `${locale ?? ''}|${currency}|${fractionDigits}`;
  let format = moneyFormats.get(key);
  if (!format) {
    try {
      format = new Intl.NumberFormat(locale, {
        style: 'currency',
        currency,
        minimumFractionDigits: fractionDigits,
        maximumFractionDigits: fractionDigits,
      });
    } catch {
      return undefined;
    }
    moneyFormats.set(key, format);
  }
  return format;
}

/**
 * An amount of money in the project currency (ISO 4217 code), whole units by default.
 * An unknown code falls back to "1,234 XYZ". NaN → "not computed".
 * @example formatMoney(12500, 'GBP', 'en-GB') // "£12,500"
 */
export function formatMoney(amount: number | undefined, currency: string, locale?: string, fractionDigits = 0): string {
  if (amount === undefined || !Number.isFinite(amount)) return NOT_COMPUTED;
  const format = moneyFormat(currency, locale, fractionDigits);
  if (format) return format.format(amount).replace('-', MINUS);
  const plain = new Intl.NumberFormat(locale, {
    maximumFractionDigits: fractionDigits,
    minimumFractionDigits: fractionDigits,
  });
  return `${plain.format(amount).replace('-', MINUS)} ${currency}`;
}

/** A signed amount of money: "+£1,200", "−£300", "£0". */
export function formatSignedMoney(amount: number | undefined, currency: string, locale?: string): string {
  if (amount === undefined || !Number.isFinite(amount)) return NOT_COMPUTED;
  const text = formatMoney(amount, currency, locale);
  return amount > 0 && Math.round(amount) !== 0 ? `+${text}` : text;
}

/**
 * dB of reduction per 1,000 of currency, two decimals; undefined (no extra cost) → "—".
 * @example formatDbPer1000(0.456) // "0.46 dB"
 */
export function formatDbPer1000(value: number | undefined, decimal: DecimalSeparator = '.'): string {
  if (value === undefined) return '—';
  if (!Number.isFinite(value)) return NOT_COMPUTED;
  return `${fixed(value, 2, decimal)} dB`;
}

/**
 * Cost per dB of reduction in the project currency; undefined (no reduction) → "—". A negative
 * value (the quieter machine is also cheaper) is said as the saving it is, never as a negative cost.
 * @example formatCostPerDb(-250, 'GBP', 'en-GB') // "saves £250 a dB"
 */
export function formatCostPerDb(value: number | undefined, currency: string, locale?: string): string {
  if (value === undefined) return '—';
  if (value < 0) return `saves ${formatMoney(-value, currency, locale)} a dB`;
  return formatMoney(value, currency, locale);
}

/** A distance in metres: whole metres from 10 m, one decimal below. */
export function formatDistance(distanceM: number, decimal: DecimalSeparator = '.'): string {
  if (!Number.isFinite(distanceM)) return NOT_COMPUTED;
  return `${fixed(distanceM, distanceM >= 10 ? 0 : 1, decimal)} m`;
}
