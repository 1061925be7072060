/**
 * Which places of a duty's ranking could change within the declared uncertainty K
 * (ISO 4871:1996). Uses the candidates' contributions at the ranking's receiver and each
 * candidate's K (0 when a guaranteed value is given without K).
 */
import type { Candidate } from '../model/model.ts';
import type { RankingRow } from '../model/results.ts';
import { closeCalls } from '../../core/standards/iso4871-1996.ts';

/** Pairs of candidate ids too close to call, for a ranking. O(n²) in the duty's candidates. */
export function rankingCloseCalls(rows: readonly RankingRow[], candidates: readonly Candidate[]): [string, string][] {
  const byId = new Map(candidates.map((c) => [c.id, c]));
  return closeCalls(
    rows.map((r) => {
      const k = byId.get(r.candidateId)?.uncertaintyDb;
      return {
        id: r.candidateId,
        levelDb: r.contributionDb,
        uncertaintyDb: k !== undefined && Number.isFinite(k) && k > 0 ? k : 0,
      };
    }),
  );
}
