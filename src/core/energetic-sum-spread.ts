/**
 * The spread of an energetic sum of uncertain levels, by matching moments.
 *
 * Each term i is a level L_i = m_i + Σ_k a_ik·Z_k in dB, with Z_k independent standard
 * normal variables that several terms may share (the same machine, the same path), times
 * an independent energy factor U_i ≥ 0 of known first and second moments (e.g. an on-time
 * drawn from a range). With β = ln 10 / 10, the energy of a term is X_i = 10^(m_i/10)·
 * exp(β·Σ_k a_ik Z_k)·U_i, and the moments of the sum S = Σ X_i are exact:
 *
 *   E[S]  = Σ_i 10^(m_i/10)·exp(β²·Σ_k a_ik²/2)·E[U_i]
 *   E[S²] = Σ_i Σ_j 10^((m_i+m_j)/10)·exp(β²·Σ_k (a_ik + a_jk)²/2)·E[U_i U_j]
 *
 * (the moment generating function of a normal variable; E[U_i U_j] = E[U_i]·E[U_j] for
 * i ≠ j, E[U_i²] for i = j). The sum is then approximated by a log-normal variable with the
 * same two moments (the Fenton–Wilkinson approximation, Fenton 1960, common practice for
 * sums of log-normal terms): σ_ln² = ln(E[S²]/E[S]²), μ_ln = ln E[S] − σ_ln²/2. In dB the
 * level 10·lg S is then normal with median μ_ln/β and standard deviation σ_ln/β. For a
 * single term without an energy factor the result is exact: median m, deviation √Σ a².
 */
import { finite } from './check.ts';
import { InputError } from './input-error.ts';

/** β = ln 10 / 10: converts a level in dB to the natural logarithm of its energy. */
export const NEPERS_PER_DB = Math.LN10 / 10;

/** One uncertain level in an energetic sum. */
export interface SpreadTerm {
  /** Centre m of the normal part of the level, dB (its median; not its energetic mean). */
  centreDb: number;
  /** Shared standard normal variables k and the level's loading a_k on each, dB per unit of Z_k. */
  loadings: readonly { factor: number; sigmaDb: number }[];
  /** E[U] of the term's own energy factor (1 when it has none). */
  energyFactorMean?: number;
  /** E[U²] of the term's own energy factor (1 when it has none). */
  energyFactorSquareMean?: number;
}

/** Moments of the energy of the sum, relative to the energy of a reference level. */
export interface SumMoments {
  /** E[S] / 10^(ref/10). */
  mean: number;
  /** E[S²] / 10^(2·ref/10). */
  squareMean: number;
  referenceDb: number;
}

/**
 * Exact first and second moments of the energy of Σ terms (see the module comment),
 * scaled by the reference level's energy so the numbers stay near 1. O(n² × loadings).
 * @example energeticSumMoments([{ centreDb: 70, loadings: [{ factor: 0, sigmaDb: 2 }] }], 70).mean // exp((β·2)²/2) = 1.0214
 */
export function energeticSumMoments(terms: readonly SpreadTerm[], referenceDb: number): SumMoments {
  finite('reference level', referenceDb, 'a level in dB');
  const n = terms.length;
  const b2 = NEPERS_PER_DB * NEPERS_PER_DB;
  const energy = terms.map((t, i) => {
    if (!Number.isFinite(t.centreDb) && t.centreDb !== -Infinity)
      throw new InputError(`term ${i + 1} centre`, t.centreDb, 'is not a level', 'use a level in dB');
    return 10 ** ((t.centreDb - referenceDb) / 10);
  });
  const loadingMaps = terms.map((t) => {
    const m = new Map<number, number>();
    for (const l of t.loadings) m.set(l.factor, (m.get(l.factor) ?? 0) + l.sigmaDb);
    return m;
  });
  let mean = 0;
  let squareMean = 0;
  for (let i = 0; i < n; i++) {
    const ei = energy[i] as number;
    if (ei === 0) continue;
    const li = loadingMaps[i] as Map<number, number>;
    const u1 = terms[i]?.energyFactorMean ?? 1;
    const u2 = terms[i]?.energyFactorSquareMean ?? 1;
    let vi = 0;
    for (const a of li.values()) vi += a * a;
    mean += ei * Math.exp((b2 * vi) / 2) * u1;
    // Diagonal term: (a + a)² = 4a².
    squareMean += ei * ei * Math.exp(2 * b2 * vi) * u2;
    for (let j = i + 1; j < n; j++) {
      const ej = energy[j] as number;
      if (ej === 0) continue;
      const lj = loadingMaps[j] as Map<number, number>;
      let v = 0;
      for (const [k, a] of li) {
        const s = a + (lj.get(k) ?? 0);
        v += s * s;
      }
      for (const [k, a] of lj) if (!li.has(k)) v += a * a;
      const uj = terms[j]?.energyFactorMean ?? 1;
      squareMean += 2 * ei * ej * Math.exp((b2 * v) / 2) * u1 * uj;
    }
  }
  return { mean, squareMean, referenceDb };
}

/** A level in dB taken as normal: its median and standard deviation. */
export interface NormalLevel {
  medianDb: number;
  sigmaDb: number;
}

/**
 * The log-normal variable with the same two moments (Fenton–Wilkinson), as a normal level
 * in dB. An empty sum is silence: median −∞, deviation 0. O(1).
 * @example levelFromMoments({ mean: 2, squareMean: 4, referenceDb: 70 }) // { medianDb: 73.01, sigmaDb: 0 }
 */
export function levelFromMoments(m: SumMoments): NormalLevel {
  if (m.mean === 0) return { medianDb: -Infinity, sigmaDb: 0 };
  const ratio = m.squareMean / (m.mean * m.mean);
  const varLn = Math.max(0, Math.log(ratio));
  const muLn = Math.log(m.mean) - varLn / 2;
  return { medianDb: m.referenceDb + muLn / NEPERS_PER_DB, sigmaDb: Math.sqrt(varLn) / NEPERS_PER_DB };
}

/**
 * E[U] and E[U²] of the energy factor U = η/η₀ of an on-time η drawn uniformly from
 * [low, high] (%), relative to the on-time η₀ the level was computed with:
 * E[η] = (low + high)/2, E[η²] = (low² + low·high + high²)/3 (uniform distribution).
 * @example onTimeFactorMoments(40, 80, 60) // { mean: 1, squareMean: 1.037 }
 */
export function onTimeFactorMoments(
  lowPct: number,
  highPct: number,
  nominalPct: number,
): { mean: number; squareMean: number } {
  const lo = lowPct / nominalPct;
  const hi = highPct / nominalPct;
  return { mean: (lo + hi) / 2, squareMean: (lo * lo + lo * hi + hi * hi) / 3 };
}
