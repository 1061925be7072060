/**
 * Machines that no other beats on both cost and noise: B beats A when B costs no more and
 * is no louder, and is cheaper or quieter (common practice: the Pareto front of a
 * two-criterion choice). Points with a figure that is not a finite number take no part.
 * O(n²), for the tens to hundreds of machines a buyer compares.
 */

export interface CostNoisePoint {
  cost: number;
  noise: number;
}

/**
 * For each point, whether no other point beats it on both.
 * @example nonDominated([{ cost: 1, noise: 100 }, { cost: 2, noise: 98 }, { cost: 3, noise: 99 }]) // [true, true, false]
 */
export function nonDominated(points: readonly CostNoisePoint[]): boolean[] {
  return points.map((a, i) => {
    if (!Number.isFinite(a.cost) || !Number.isFinite(a.noise)) return false;
    return !points.some(
      (b, j) =>
        j !== i &&
        Number.isFinite(b.cost) &&
        Number.isFinite(b.noise) &&
        b.cost <= a.cost &&
        b.noise <= a.noise &&
        (b.cost < a.cost || b.noise < a.noise),
    );
  });
}
