/**
 * Money as the ledger writes it in explanations: the currency's symbol when it has a
 * common one (GBP £, EUR €, USD $), else its ISO 4217 code; thousands separated by commas;
 * pence or cents only when the amount has them.
 */

const SYMBOLS: Record<string, string> = { GBP: '£', EUR: '€', USD: '$', JPY: '¥' };

/**
 * An amount of money for an explanation line.
 * @example formatMoney(1866, 'GBP') // "£1,866"
 * @example formatMoney(37.5, 'CHF') // "CHF 37.50"
 */
export function formatMoney(amount: number, currency: string): string {
  if (!Number.isFinite(amount)) return 'not computed';
  const whole = Math.abs(amount - Math.round(amount)) < 0.005;
  const digits = whole ? 0 : 2;
  const fixed = Math.abs(amount).toFixed(digits);
  const [whole_, fraction] = fixed.split('.') as [string, string | undefined];
  const grouped = whole_.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  const text = fraction === undefined ? grouped : `${grouped}.${fraction}`;
  const symbol = SYMBOLS[currency];
  const sign = amount < 0 ? '−' : '';
  return symbol ? `${sign}${symbol}${text}` : `${sign}${currency} ${text}`;
}
