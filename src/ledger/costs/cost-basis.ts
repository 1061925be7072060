/**
 * Switching a candidate between hire and purchase without losing a figure (project file
 * version 9): the basis in use is `cost`; the other basis's figures, as last typed, are kept
 * in `setAsideCost`. Switching swaps the two, so switching back restores exactly what was
 * there. A basis never filled in starts with its required amounts not filled in (NaN, shown
 * as "not filled in"), never with a number the user did not type.
 */
import type { Candidate, CandidateCost } from '../model/model.ts';

/** Empty figures of a basis: required amounts not filled in, resale 0 (nothing back unless typed). */
export function freshCost(basis: CandidateCost['kind']): CandidateCost {
  return basis === 'hire'
    ? { kind: 'hire', dayRate: NaN }
    : { kind: 'purchase', price: NaN, lifeDays: NaN, resaleValue: 0 };
}

/** A stored figure read back from a file as null (an unread cell) is NaN again. */
function unreadAsNaN(cost: CandidateCost): CandidateCost {
  const out: Record<string, unknown> = { ...cost };
  for (const [key, value] of Object.entries(out)) if (value === null) out[key] = NaN;
  return out as unknown as CandidateCost;
}

/**
 * The candidate costed on `basis`: the figures set aside for that basis come back (or fresh
 * ones when there are none), and the figures in use until now are set aside. The same
 * candidate when it is already on that basis.
 * @example withCostBasis(withCostBasis(hired, 'purchase'), 'hire').cost // hired.cost, rates as typed
 */
export function withCostBasis(candidate: Candidate, basis: CandidateCost['kind']): Candidate {
  if (candidate.cost.kind === basis) return candidate;
  const kept = candidate.setAsideCost;
  const cost = kept && kept.kind === basis ? unreadAsNaN(kept) : freshCost(basis);
  return { ...candidate, cost, setAsideCost: candidate.cost };
}
