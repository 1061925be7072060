/**
 * Whether a ranking's order holds within the declared uncertainty K (ISO 4871), from the
 * ledger's `rankingUncertainty`, guarded for very large duties.
 *
 * The ledger compares every pair of a duty's candidates and words every pair too close to
 * call: O(n²) time and, when many levels lie within K of each other, O(n²) sentences.
 * Above {@link FIRMNESS_ROW_LIMIT} rows (a duty of hundreds of variants) the Workspace
 * does not run it on every edit and says so instead.
 */
import type { Candidate } from '../../ledger/model/model.ts';
import type { RankingRow } from '../../ledger/model/results.ts';
import { rankingUncertainty, type RankingUncertainty } from '../../ledger/ranking/ranking-uncertainty.ts';

/** Largest ranking whose firmness is worked out with every edit, rows. */
export const FIRMNESS_ROW_LIMIT = 150;

export type RankingFirmness =
  { kind: 'found'; uncertainty: RankingUncertainty } | { kind: 'not-checked'; note: string } | { kind: 'empty' };

/**
 * The firmness of one ranking, or a note saying why it was not worked out.
 * @example rankingFirmness(rows, project.candidates).kind // 'found'
 */
export function rankingFirmness(rows: readonly RankingRow[], candidates: readonly Candidate[]): RankingFirmness {
  if (rows.length === 0) return { kind: 'empty' };
  if (rows.length > FIRMNESS_ROW_LIMIT) {
    return {
      kind: 'not-checked',
      note: `This duty has ${rows.length} machines: the check of which places could change within the declared uncertainty K runs for up to ${FIRMNESS_ROW_LIMIT}.`,
    };
  }
  try {
    return { kind: 'found', uncertainty: rankingUncertainty(rows, candidates) };
  } catch (error) {
    return {
      kind: 'not-checked',
      note: `The firmness of this ranking could not be worked out: ${error instanceof Error ? error.message : String(error)}`,
    };
  }
}
