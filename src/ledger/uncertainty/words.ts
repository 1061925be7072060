/**
 * Probabilities in words, the same in the app, the report, the workbook and the command
 * line: "93.6 % ± 0.4 %", and when no draw failed "above 99.97 % (no draw of 10,000 failed)".
 */
import type { SimulatedCell } from './monte-carlo.ts';

/** A probability as a percentage with one decimal, e.g. "93.6 %"; "n/a" for NaN. */
export function percent(p: number, digits = 1): string {
  return Number.isFinite(p) ? `${(100 * p).toFixed(digits)} %` : 'n/a';
}

/** A probability with two decimals near 0 and 1 (where one decimal would read 100.0 %), else one. */
export function percentNear(p: number): string {
  return percent(p, p > 0.995 || p < 0.005 ? 2 : 1);
}

/**
 * A simulated probability with its sampling error. With every draw met (or none), the rule
 * of three bounds the other side: failure below 3/n with 95 % confidence.
 * @example simulatedWords(0.936, 0.0024, 10000) // "93.6 % ± 0.2 %"
 */
export function simulatedWords(probability: number, standardError: number, draws: number): string {
  if (!Number.isFinite(probability)) return 'not computed';
  const n = draws.toLocaleString('en-GB');
  if (probability >= 1) return `above ${percent(1 - 3 / draws, 2)} (no draw of ${n} failed)`;
  if (probability <= 0) return `below ${percent(3 / draws, 2)} (no draw of ${n} met it)`;
  const digits = probability > 0.995 || probability < 0.005 ? 2 : 1;
  return `${percent(probability, digits)} ± ${percent(standardError, digits)}`;
}

/** A simulated cell's probability in words. */
export function cellProbabilityWords(cell: SimulatedCell, draws: number): string {
  return simulatedWords(cell.probability, cell.standardError, draws);
}
