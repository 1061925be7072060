/**
 * Pre-processing of the fleet model: leaves out every candidate another candidate of the same duty dominates,
 * so the solver branches over fewer binaries.
 *
 * Option b of a duty dominates option a of the same duty when
 *   cost(b) ≤ cost(a),
 *   ρ_b(c) ≤ ρ_a(c) in every cell c (a missing term is ρ = 0), and
 *   weight_b(h) ≥ weight_a(h) in every share row h,
 * and b differs from a in one of these figures or comes first in the duty (so of two identical options the
 * first is kept).
 *
 * Why no optimum is lost (worked by hand from the rows of ./problem.ts and ./lp-format.ts): take any fleet x
 * choosing a for the duty and put b in its place. Every cell row Σ ρ·x ≤ cap changes by ρ_b − ρ_a ≤ 0 and
 * stays met; every share row Σ weight·x ≥ least changes by weight_b − weight_a ≥ 0 and stays met; the budget
 * row and the objective change by cost(b) − cost(a) ≤ 0; "one option per duty" still holds. So the new fleet
 * is feasible wherever x was, costs no more, and its largest cell ratio (its worst margin) is no worse. Hence
 * the least cost under any cap, the least largest ratio, and every point of the cost / worst-margin
 * frontier are all reached by a fleet without a. The relation is transitive and never circular (the tie rule
 * follows the option order), so every option left out is dominated by one that is kept, and all of them can
 * be left out at once.
 *
 * O(D·K²·R) for D duties of K options with R cells each.
 */
import type { Choice, FleetProblem, ProblemDuty } from './problem.ts';

export interface ReducedProblem {
  /** The model without dominated options (same duties, cells and shares, in the same order). */
  problem: FleetProblem;
  /** For each duty, the original option index of each kept option. */
  kept: number[][];
  /** How many options were left out. */
  removed: number;
}

/** The model without dominated options. */
export function withoutDominated(problem: FleetProblem): ReducedProblem {
  const D = problem.duties.length;
  // Per duty: the cells it appears in (local index), and each option's ratio there.
  const cellSlot: Map<number, number>[] = Array.from({ length: D }, () => new Map());
  const ratios: number[][][] = problem.duties.map((d) => d.options.map(() => []));
  problem.cells.forEach((cell, c) => {
    for (const t of cell.terms) {
      const slots = cellSlot[t.duty] as Map<number, number>;
      let j = slots.get(c);
      if (j === undefined) {
        j = slots.size;
        slots.set(c, j);
      }
      const row = (ratios[t.duty] as number[][])[t.option] as number[];
      row[j] = (row[j] ?? 0) + t.ratio;
    }
  });
  const weights: number[][][] = problem.duties.map((d) => d.options.map(() => []));
  (problem.shares ?? []).forEach((share, h) => {
    for (const t of share.terms) {
      const row = (weights[t.duty] as number[][])[t.option] as number[];
      row[h] = (row[h] ?? 0) + t.weight;
    }
  });
  const shareCount = (problem.shares ?? []).length;

  let removed = 0;
  const kept = problem.duties.map((duty, d) => {
    const n = (cellSlot[d] as Map<number, number>).size;
    const r = ratios[d] as number[][];
    const w = weights[d] as number[][];
    const dominates = (b: number, a: number): boolean => {
      const ob = duty.options[b] as ProblemDuty['options'][number];
      const oa = duty.options[a] as ProblemDuty['options'][number];
      if (ob.cost > oa.cost) return false;
      let differs = ob.cost < oa.cost;
      const rb = r[b] as number[];
      const ra = r[a] as number[];
      for (let j = 0; j < n; j++) {
        const x = rb[j] ?? 0;
        const y = ra[j] ?? 0;
        if (x > y) return false;
        if (x < y) differs = true;
      }
      const wb = w[b] as number[];
      const wa = w[a] as number[];
      for (let h = 0; h < shareCount; h++) {
        const x = wb[h] ?? 0;
        const y = wa[h] ?? 0;
        if (x < y) return false;
        if (x > y) differs = true;
      }
      return differs || b < a;
    };
    const keep: number[] = [];
    for (let a = 0; a < duty.options.length; a++) {
      let dominated = false;
      for (let b = 0; b < duty.options.length && !dominated; b++) if (b !== a && dominates(b, a)) dominated = true;
      if (dominated) removed++;
      else keep.push(a);
    }
    return keep;
  });
  if (removed === 0) return { problem, kept, removed };

  const newIndex = kept.map((keep, d) => {
    const map = new Array<number>((problem.duties[d] as ProblemDuty).options.length).fill(-1);
    keep.forEach((k, i) => (map[k] = i));
    return map;
  });
  const remap = <T extends { duty: number; option: number }>(terms: readonly T[]): T[] =>
    terms.flatMap((t) => {
      const i = (newIndex[t.duty] as number[])[t.option] as number;
      return i < 0 ? [] : [{ ...t, option: i }];
    });
  const reduced: FleetProblem = {
    ...problem,
    duties: problem.duties.map((duty, d) => ({
      ...duty,
      options: (kept[d] as number[]).map((k) => duty.options[k] as ProblemDuty['options'][number]),
    })),
    cells: problem.cells.map((cell) => ({ ...cell, terms: remap(cell.terms) })),
  };
  if (problem.shares) reduced.shares = problem.shares.map((s) => ({ ...s, terms: remap(s.terms) }));
  return { problem: reduced, kept, removed };
}

/** A choice of the reduced model as a choice of the original one. O(D). */
export function expandChoice(reduced: ReducedProblem, choice: Choice): Choice {
  return choice.map((i, d) => (reduced.kept[d] as number[])[i] as number);
}
