/**
 * Whether there are results to show yet: while something is still missing and not one level of
 * the matrix could be worked out, the results tab and the printed report show only what is
 * missing (with where to fill it in), not a matrix, statement or ranking with nothing in them.
 */
import type { MatrixCell, RankingRow } from '../../ledger/model/results.ts';
import type { MissingItem, ReadinessPlace } from '../../ledger/validate/readiness.ts';

/** True when at least one cell of the matrix holds a level that was worked out (a finite number). */
export function hasComputedLevel(matrix: readonly MatrixCell[]): boolean {
  return matrix.some((cell) => Number.isFinite(cell.levelDb));
}

/** True when a ranking holds a machine whose level was worked out (at the reference receiver, say, before any site). */
export function hasRankedLevel(rows: readonly RankingRow[]): boolean {
  return rows.some((row) => Number.isFinite(row.contributionDb));
}

/** True while the project lacks something and no level could be worked out: show the missing list alone. */
export function nothingToShowYet(missing: readonly MissingItem[], matrix: readonly MatrixCell[]): boolean {
  return missing.length > 0 && !hasComputedLevel(matrix);
}

/** The tab where each kind of missing item is filled in. */
export const PLACE_TAB: Record<ReadinessPlace, string> = {
  periods: 'Settings',
  phases: 'Phases',
  receivers: 'Receivers',
  duties: 'Duties',
  candidates: 'Machines',
};
