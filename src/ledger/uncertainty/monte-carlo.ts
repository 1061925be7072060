/**
 * The probability of meeting each limit, and every limit at once, by Monte Carlo.
 *
 * Each draw takes one standard normal value per machine and per shared path, and one
 * uniform on-time per duty with a range (./spread-model.ts), in a fixed order from a
 * seeded xoroshiro128+ stream (pure-rand), so a seed reproduces a result exactly. Normal
 * values come from the Box–Muller transform (common practice). A cell is met in a draw
 * when the energy of its sum is at or under the limit's.
 *
 * Sampling error: a probability p estimated from n draws has standard error
 * √(p(1−p)/n) (binomial; common practice); when no draw fails, the chance of failure is
 * below 3/n with 95 % confidence (the "rule of three", common practice). The level a cell
 * stays under with probability q is the order statistic at rank ⌈n·q⌉; its 95 % range
 * is given by the ranks n·q ± 1.96·√(n·q(1−q)) (distribution-free interval for a
 * quantile, common practice).
 *
 * Cost: O(draws × (duties + paths + Σ cell terms)) plus sorting each cell's draws,
 * O(cells × draws·log draws).
 */
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import type { SpreadModel } from './spread-model.ts';
import { NEPERS_PER_DB } from '../../core/energetic-sum-spread.ts';
import { dbFromRatio, ratioFromDb } from '../../core/decibel.ts';

export interface SimulatedCell {
  probability: number;
  /** Standard error of `probability` from the number of draws. */
  standardError: number;
  /** Level the cell stayed under in the chosen share of draws, dB. */
  boundDb: number;
  /** 95 % range of `boundDb` from the number of draws, dB. */
  boundRangeDb: [number, number];
}

export interface Simulation {
  draws: number;
  seed: number;
  boundProbability: number;
  cells: SimulatedCell[];
  /** Every computable cell met in the same draw. NaN when a cell is not computable. */
  joint: { probability: number; standardError: number };
}

export interface SimulateOptions {
  draws: number;
  seed: number;
  /** The share of draws the bound level is not exceeded in (default 0.9). */
  boundProbability?: number;
  /** Keep no per-cell draws (no bound levels): faster when only probabilities are needed. */
  probabilitiesOnly?: boolean;
}

/** Standard error of a binomial proportion; 3/n (rule of three) stands in when p is 0 or 1. */
export function proportionError(p: number, n: number): number {
  return p <= 0 || p >= 1 ? 3 / n : Math.sqrt((p * (1 - p)) / n);
}

/**
 * Simulates the model. Deterministic for a seed.
 * @example simulateCompliance(model, { draws: 10000, seed: 1 }).joint.probability // 0.87
 */
export function simulateCompliance(model: SpreadModel, options: SimulateOptions): Simulation {
  const n = Math.max(1, Math.floor(options.draws));
  const q = options.boundProbability ?? 0.9;
  const rng = xoroshiro128plus(options.seed >>> 0);
  const nd = model.duties.length;
  const np = model.paths.length;
  const dutySigma = Float64Array.from(model.duties, (d) => NEPERS_PER_DB * d.machine.sigmaDb);
  const onLow = Float64Array.from(model.duties, (d) => (d.onTime ? d.onTime.lowPct / d.onTime.nominalPct : NaN));
  const onSpan = Float64Array.from(model.duties, (d) =>
    d.onTime ? (d.onTime.highPct - d.onTime.lowPct) / d.onTime.nominalPct : 0,
  );
  const pathSigma = Float64Array.from(model.paths, (p) => NEPERS_PER_DB * p.sigmaDb);
  const dutyFactor = new Float64Array(nd);
  const nr = model.cells.reduce((m, c) => Math.max(m, ...c.terms.map((t) => t.receiver + 1)), 0);
  // Position factors of the drawn position, by duty and receiver (1 where a duty has no position spread).
  const positionFactor = new Float64Array(nd * Math.max(1, nr)).fill(1);
  const pathFactor = new Float64Array(np);

  const cells = model.cells;
  const live = cells.map((c) => c.computable);
  const termDuty = cells.map((c) => Int32Array.from(c.terms, (t) => t.duty));
  const termPath = cells.map((c) => Int32Array.from(c.terms, (t) => t.path));
  const termPosition = cells.map((c) => Int32Array.from(c.terms, (t) => t.duty * Math.max(1, nr) + t.receiver));
  const termEnergy = cells.map((c) => Float64Array.from(c.terms, (t) => ratioFromDb(t.centreDb - c.limitDb)));
  const met = new Int32Array(cells.length);
  const samples = options.probabilitiesOnly
    ? undefined
    : cells.map((_, i) => (live[i] ? new Float64Array(n) : undefined));
  let jointMet = 0;
  const anyDead = live.some((x) => !x);

  let spare = NaN;
  const normal = (): number => {
    if (!Number.isNaN(spare)) {
      const s = spare;
      spare = NaN;
      return s;
    }
    const u1 = 1 - uniformFloat64(rng); // (0, 1]
    const u2 = uniformFloat64(rng);
    const r = Math.sqrt(-2 * Math.log(u1));
    spare = r * Math.sin(2 * Math.PI * u2);
    return r * Math.cos(2 * Math.PI * u2);
  };

  for (let draw = 0; draw < n; draw++) {
    for (let d = 0; d < nd; d++) {
      let f = Math.exp((dutySigma[d] as number) * normal());
      if (!Number.isNaN(onLow[d] as number)) f *= (onLow[d] as number) + (onSpan[d] as number) * uniformFloat64(rng);
      dutyFactor[d] = f;
      const pos = model.duties[d]?.position;
      if (pos) {
        const k = Math.min(pos.count - 1, Math.floor(uniformFloat64(rng) * pos.count));
        for (let r = 0; r < nr; r++) positionFactor[d * nr + r] = pos.factors[k * nr + r] as number;
      }
    }
    for (let p = 0; p < np; p++) pathFactor[p] = Math.exp((pathSigma[p] as number) * normal());
    let all = true;
    for (let c = 0; c < cells.length; c++) {
      if (!live[c]) continue;
      const dutyIdx = termDuty[c] as Int32Array;
      const pathIdx = termPath[c] as Int32Array;
      const base = termEnergy[c] as Float64Array;
      const posIdx = termPosition[c] as Int32Array;
      let energy = 0;
      for (let t = 0; t < base.length; t++)
        energy +=
          (base[t] as number) *
          (dutyFactor[dutyIdx[t] as number] as number) *
          (pathFactor[pathIdx[t] as number] as number) *
          (positionFactor[posIdx[t] as number] as number);
      if (energy <= 1) met[c] = (met[c] as number) + 1;
      else all = false;
      if (samples) (samples[c] as Float64Array)[draw] = energy;
    }
    if (all) jointMet++;
  }

  const z95 = 1.959963984540054;
  const out: SimulatedCell[] = cells.map((cell, c) => {
    if (!live[c]) return { probability: NaN, standardError: NaN, boundDb: NaN, boundRangeDb: [NaN, NaN] };
    const p = (met[c] as number) / n;
    const s = samples?.[c];
    if (!s) return { probability: p, standardError: proportionError(p, n), boundDb: NaN, boundRangeDb: [NaN, NaN] };
    s.sort();
    const at = (rank: number) => cell.limitDb + dbFromRatio(s[Math.min(n - 1, Math.max(0, rank))] as number);
    const half = z95 * Math.sqrt(n * q * (1 - q));
    return {
      probability: p,
      standardError: proportionError(p, n),
      boundDb: at(Math.ceil(n * q) - 1),
      boundRangeDb: [at(Math.floor(n * q - half) - 1), at(Math.ceil(n * q + half) - 1)],
    };
  });
  const jp = anyDead ? NaN : jointMet / n;
  return {
    draws: n,
    seed: options.seed,
    boundProbability: q,
    cells: out,
    joint: { probability: jp, standardError: anyDead ? NaN : proportionError(jp, n) },
  };
}
