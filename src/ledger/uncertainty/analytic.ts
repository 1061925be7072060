/**
 * The probability that a cell meets its limit, by the moments of its energetic sum
 * (../../core/energetic-sum-spread.ts: exact moments, then a log-normal with the same two;
 * exact for a single machine with a normal spread in dB and a known on-time). Fast enough
 * to run on every edit: O(cells × terms² ) with terms the duties of a phase.
 *
 * For one cell: P(L ≤ limit) = Φ((limit − median)/σ), and the level the cell stays under
 * with probability q is median + σ·Φ⁻¹(q). The joint probability of every cell is not
 * given by this approximation (cells share spreads); only its bounds are:
 *   max(0, 1 − Σ(1 − P_i)) ≤ P(all) ≤ min P_i
 * (the union bound, which holds whatever the dependence; common practice).
 */
import { energeticSumMoments, levelFromMoments, type SpreadTerm } from '../../core/energetic-sum-spread.ts';
import { normalCdf, normalQuantile } from '../../core/normal-distribution.ts';
import type { SpreadCell, SpreadModel } from './spread-model.ts';

export interface AnalyticCell {
  /** Probability that the level stays at or under the limit; NaN when not computable. */
  probability: number;
  /** Median of the fitted level, dB. */
  medianDb: number;
  /** Standard deviation of the fitted level, dB. */
  sigmaDb: number;
  /** Level the cell stays under with the chosen probability, dB. */
  boundDb: number;
}

/** The terms of a cell for the moments: factor d for duty d's machine, duties + p for path p. */
export function cellSpreadTerms(model: SpreadModel, cell: SpreadCell): SpreadTerm[] {
  const nd = model.duties.length;
  return cell.terms.map((t) => {
    const duty = model.duties[t.duty];
    const path = model.paths[t.path];
    return {
      centreDb: t.centreDb,
      loadings: [
        { factor: t.duty, sigmaDb: duty?.machine.sigmaDb ?? NaN },
        { factor: nd + t.path, sigmaDb: path?.sigmaDb ?? NaN },
      ],
      // On-time and position are independent: their moments multiply.
      energyFactorMean: (duty?.onTime?.mean ?? 1) * (duty?.position ? (duty.position.mean[t.receiver] as number) : 1),
      energyFactorSquareMean:
        (duty?.onTime?.squareMean ?? 1) * (duty?.position ? (duty.position.squareMean[t.receiver] as number) : 1),
    };
  });
}

const NOT_COMPUTED: AnalyticCell = { probability: NaN, medianDb: NaN, sigmaDb: NaN, boundDb: NaN };

/**
 * One cell by the moments. `boundProbability` (default 0.9) names the bound level.
 * @example analyticCell(model, cell).probability // Φ(margin/σ) for one machine
 */
export function analyticCell(model: SpreadModel, cell: SpreadCell, boundProbability = 0.9): AnalyticCell {
  if (!cell.computable) return NOT_COMPUTED;
  if (cell.terms.length === 0) return { probability: 1, medianDb: -Infinity, sigmaDb: 0, boundDb: -Infinity };
  const fit = levelFromMoments(energeticSumMoments(cellSpreadTerms(model, cell), cell.limitDb));
  if (!Number.isFinite(fit.medianDb))
    return fit.medianDb === -Infinity
      ? { probability: 1, medianDb: -Infinity, sigmaDb: 0, boundDb: -Infinity }
      : NOT_COMPUTED;
  const probability =
    fit.sigmaDb > 0 ? normalCdf((cell.limitDb - fit.medianDb) / fit.sigmaDb) : fit.medianDb <= cell.limitDb ? 1 : 0;
  return {
    probability,
    medianDb: fit.medianDb,
    sigmaDb: fit.sigmaDb,
    boundDb: fit.medianDb + fit.sigmaDb * normalQuantile(boundProbability),
  };
}

/** Bounds on the probability that every cell is met, from the cells' own probabilities. O(cells). */
export function jointBounds(probabilities: readonly number[]): { lower: number; upper: number } {
  let miss = 0;
  let upper = 1;
  for (const p of probabilities) {
    if (Number.isNaN(p)) return { lower: NaN, upper: NaN };
    miss += 1 - p;
    upper = Math.min(upper, p);
  }
  return { lower: Math.max(0, 1 - miss), upper };
}
