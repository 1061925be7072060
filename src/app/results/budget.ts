/**
 * Reading the optimiser's budget as typed: an amount of money in the project currency,
 * written with the project's decimal separator; spaces and thousands separators allowed.
 */
import type { DecimalSeparator } from './format.ts';

export type BudgetReading = { ok: true; budget: number | undefined } | { ok: false; message: string };

/**
 * Reads a budget. Empty text means no budget.
 * @example readBudget('25,000', 'GBP', '.') // { ok: true, budget: 25000 }
 * @example readBudget('25k', 'GBP', '.') // { ok: false, message: 'Budget: "25k" is not an amount (use GBP without the symbol, e.g. 25000)' }
 */
export function readBudget(text: string, currency: string, decimal: DecimalSeparator = '.'): BudgetReading {
  const trimmed = text.trim();
  if (trimmed === '') return { ok: true, budget: undefined };
  const example = decimal === ',' ? '25000 or 25000,50' : '25000 or 25000.50';
  const accepted = `use ${currency} without the symbol, e.g. ${example}`;
  const group = decimal === ',' ? '.' : ',';
  let s = trimmed.replace(/[\s\u00a0\u202f']/g, '');
  const grouped = new RegExp(`^\\d{1,3}(\\${group}\\d{3})+(\\${decimal}\\d+)?$`);
  if (grouped.test(s)) s = s.split(group).join('');
  if (decimal === ',') s = s.replace(',', '.');
  if (!/^\d+(\.\d+)?$/.test(s))
    return { ok: false, message: `Budget: ${JSON.stringify(text)} is not an amount (${accepted})` };
  const budget = Number(s);
  if (!(budget > 0))
    return {
      ok: false,
      message: `Budget: ${JSON.stringify(text)} is out of range (use an amount greater than 0, or leave it empty for no budget)`,
    };
  return { ok: true, budget };
}
