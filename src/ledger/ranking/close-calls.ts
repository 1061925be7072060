/**
 * Which places of a duty's ranking could change within the declared uncertainty K
 * (ISO 4871:1996). Uses the candidates' contributions at the ranking's receiver and each
 * candidate's K (0 when a guaranteed value is given without K).
 *
 * Two levels are too close to call when |La − Lb| ≤ max(Ka, Kb) (`closeCalls` in
 * ../../core/standards/iso4871-1996.ts, which compares every pair: O(n²), kept as the
 * reference). `closePairIndices` finds the same pairs by a sort and a sweep: with the levels
 * in ascending order, the pairs where the quieter one's K covers the gap are a run just after
 * it, and those where the louder one's K covers it a run just before that one; each run is
 * walked only as far as it holds pairs, so the cost is O(n log n + pairs).
 */
import type { Candidate } from '../model/model.ts';
import type { RankingRow } from '../model/results.ts';
import type { UncertainLevel } from '../../core/standards/iso4871-1996.ts';

/** Candidates by id, or a list of them (a map is built from a list: pass a map when ranking many duties). */
export type CandidateLookup = readonly Candidate[] | ReadonlyMap<string, Candidate>;

/** The lookup as a map. O(1) for a map, O(n) for a list. */
export function candidateMap(candidates: CandidateLookup): ReadonlyMap<string, Candidate> {
  return candidates instanceof Map ? candidates : new Map((candidates as readonly Candidate[]).map((c) => [c.id, c]));
}

/**
 * The close pairs of a list of levels as positions [i, j] in the list, i < j, ordered by i then j — the same
 * pairs in the same order as `closeCalls`. Levels that are not finite and K that is NaN take no part (as there).
 * O(n log n + pairs).
 */
export function closePairIndices(levels: readonly UncertainLevel[]): [number, number][] {
  const n = levels.length;
  const level = new Float64Array(n);
  const k = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    level[i] = (levels[i] as UncertainLevel).levelDb;
    k[i] = (levels[i] as UncertainLevel).uncertaintyDb;
  }
  return Array.from(closePairCodes(level, k), (code) => {
    const j = code % n;
    return [(code - j) / n, j] as [number, number];
  });
}

/**
 * The pairs of {@link closePairIndices} for levels and K given as two arrays of n numbers, each pair [i, j] written as
 * the number i·n + j, in ascending order (the same order: i, then j). No object per level or pair: a ranking of every
 * duty of a large project finds hundreds of thousands of pairs. O(n log n + pairs).
 */
export function closePairCodes(levelDb: Float64Array, uncertaintyDb: Float64Array): Float64Array {
  const order: number[] = [];
  for (let i = 0; i < levelDb.length; i++) {
    if (Number.isFinite(levelDb[i]) && !Number.isNaN(uncertaintyDb[i])) order.push(i);
  }
  order.sort((a, b) => (levelDb[a] as number) - (levelDb[b] as number) || a - b);
  const n = order.length;
  const total = levelDb.length;
  const level = new Float64Array(n);
  const k = new Float64Array(n);
  order.forEach((i, p) => {
    level[p] = levelDb[i] as number;
    k[p] = uncertaintyDb[i] as number;
  });
  const codes: number[] = [];
  const push = (p: number, q: number) => {
    const a = order[p] as number;
    const b = order[q] as number;
    codes.push(a < b ? a * total + b : b * total + a);
  };
  for (let p = 0; p < n; p++) {
    const lp = level[p] as number;
    const kp = k[p] as number;
    // Louder ones within this one's K (the gap only grows further on).
    for (let q = p + 1; q < n && (level[q] as number) - lp <= kp; q++) push(p, q);
    // Quieter ones within this one's K that their own K did not already cover.
    for (let q = p - 1; q >= 0 && lp - (level[q] as number) <= kp; q--) {
      if (!(lp - (level[q] as number) <= (k[q] as number))) push(p, q);
    }
  }
  // Each pair once, so plain numeric order (a typed array sorts by value, without a comparator).
  return Float64Array.from(codes).sort();
}

/** K used for a candidate in the close-call rule: its declared K, or 0 when none is declared or readable. */
export function kOrZero(candidate: Candidate | undefined): number {
  const k = candidate?.uncertaintyDb;
  return k !== undefined && Number.isFinite(k) && k > 0 ? k : 0;
}

/** Pairs of candidate ids too close to call, for a ranking, in the rows' order. O(n log n + pairs) in the duty's candidates. */
export function rankingCloseCalls(rows: readonly RankingRow[], candidates: CandidateLookup): [string, string][] {
  const byId = candidateMap(candidates);
  const levels = rows.map((r) => ({
    id: r.candidateId,
    levelDb: r.contributionDb,
    uncertaintyDb: kOrZero(byId.get(r.candidateId)),
  }));
  return closePairIndices(levels).map(([i, j]) => [(levels[i] as UncertainLevel).id, (levels[j] as UncertainLevel).id]);
}
