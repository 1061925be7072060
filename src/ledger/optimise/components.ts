/**
 * Splits the fleet model into independent parts: duties that share no row. Two duties are linked when some
 * cell or share row has terms of both (a budget row links every duty, so a model solved with its budget is
 * not split). Cells of one phase only hold that phase's duties, so a project of five phases without clauses
 * across phases falls into five parts.
 *
 * Why solving the parts apart is exact (worked by hand): with no row across parts, a fleet is feasible exactly
 * when each part's choice is feasible, its cost is the sum of the parts' costs and its largest cell ratio is
 * the largest of the parts' largest ratios. So the least cost is the sum of the parts' least costs, and the
 * least largest ratio is the largest of the parts' least largest ratios. Branch and bound on a few small
 * parts is far cheaper than on one large model (its work grows much faster than the number of duties).
 *
 * O(terms · α) with a union–find.
 */
import type { FleetProblem } from './problem.ts';

export interface ProblemPart {
  /** The part as a model of its own (duty indexes renumbered from 0). */
  problem: FleetProblem;
  /** Original duty index of each of the part's duties. */
  duties: number[];
  /** Original cell index of each of the part's cells. */
  cells: number[];
}

/** The independent parts of a model without a budget row; one part when it does not split. */
export function independentParts(problem: FleetProblem): ProblemPart[] {
  const D = problem.duties.length;
  const parent = Array.from({ length: D }, (_, i) => i);
  const find = (i: number): number => {
    while (parent[i] !== i) {
      parent[i] = parent[parent[i] as number] as number;
      i = parent[i] as number;
    }
    return i;
  };
  const join = (rows: readonly { duty: number }[]) => {
    const first = rows[0];
    if (!first) return;
    const root = find(first.duty);
    for (const t of rows) {
      const r = find(t.duty);
      if (r !== root) parent[r] = root;
    }
  };
  for (const cell of problem.cells) join(cell.terms);
  for (const share of problem.shares ?? []) join(share.terms);

  const partOf = new Map<number, number>();
  const parts: { duties: number[]; cells: number[]; shares: number[] }[] = [];
  for (let d = 0; d < D; d++) {
    const root = find(d);
    let p = partOf.get(root);
    if (p === undefined) {
      p = parts.length;
      partOf.set(root, p);
      parts.push({ duties: [], cells: [], shares: [] });
    }
    (parts[p] as (typeof parts)[number]).duties.push(d);
  }
  if (parts.length <= 1) return [{ problem, duties: parts[0]?.duties ?? [], cells: problem.cells.map((_, i) => i) }];
  const localDuty = new Array<number>(D);
  for (const part of parts) part.duties.forEach((d, i) => (localDuty[d] = i));
  // A cell without terms stays with the first part (its row is empty whatever the fleet).
  problem.cells.forEach((cell, c) => {
    const first = cell.terms[0];
    (parts[first ? (partOf.get(find(first.duty)) as number) : 0] as (typeof parts)[number]).cells.push(c);
  });
  (problem.shares ?? []).forEach((share, h) => {
    const first = share.terms[0];
    (parts[first ? (partOf.get(find(first.duty)) as number) : 0] as (typeof parts)[number]).shares.push(h);
  });
  const local = <T extends { duty: number }>(t: T): T => ({ ...t, duty: localDuty[t.duty] as number });
  return parts.map((part) => {
    const sub: FleetProblem = {
      duties: part.duties.map((d) => problem.duties[d] as FleetProblem['duties'][number]),
      cells: part.cells.map((c) => {
        const cell = problem.cells[c] as FleetProblem['cells'][number];
        return { ...cell, terms: cell.terms.map(local) };
      }),
      notConsidered: [],
    };
    if (problem.shares && part.shares.length > 0)
      sub.shares = part.shares.map((h) => {
        const share = (problem.shares as NonNullable<FleetProblem['shares']>)[h] as NonNullable<
          FleetProblem['shares']
        >[number];
        return { ...share, terms: share.terms.map(local) };
      });
    return { problem: sub, duties: part.duties, cells: part.cells };
  });
}
