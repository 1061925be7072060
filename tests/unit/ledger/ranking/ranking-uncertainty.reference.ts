/**
 * REFERENCE for the tests (the O(n²) version the ledger used before the sort and sweep): how firm a ranking is, given the declared uncertainty K of each candidate (ISO 4871:1996).
 *
 * Two candidates are "too close to call" when their levels at the receiver differ by no
 * more than the larger of their two K (`closeCalls` in ../core/standards/iso4871-1996.ts):
 * either could really be the quieter. This rule is the ledger's own, not ISO 4871's (the
 * standard declares and verifies K; it does not rank machines), and the words shown say so. A candidate without a K (a guaranteed
 * value, a stand-in) counts K = 0, and the words say so.
 *
 * From those pairs, each row's range of places: it cannot rank above a row that is surely
 * quieter, nor below one that is surely louder, so
 *   best place  = 1 + (computed rows surely quieter than it),
 *   worst place = (computed rows) − (computed rows surely louder than it).
 * Rows whose level is not computed keep their place and take no part.
 *
 * Cost: O(n²) for the n candidates of a duty (every pair is compared once).
 */
import type { Candidate } from '../../../../src/ledger/model/model.ts';
import type { RankingRow } from '../../../../src/ledger/model/results.ts';
import type { RankingUncertainty, ClosePair, PlaceRange } from '../../../../src/ledger/ranking/ranking-uncertainty.ts';
import { closeCalls } from '../../../../src/core/standards/iso4871-1996.ts';

/** The pair-by-pair close calls (the O(n²) version the sweep replaced). */
function rankingCloseCalls(rows: readonly RankingRow[], candidates: readonly Candidate[]): [string, string][] {
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

const fmt = (x: number) => x.toFixed(1);

function declaredK(candidate: Candidate | undefined): number | undefined {
  const k = candidate?.uncertaintyDb;
  return k !== undefined && k !== null && Number.isFinite(k) && k > 0 ? k : undefined;
}

/**
 * Which places of a ranking could change within the declared uncertainty, and which pairs
 * are too close to call, with words. `rows` as `rankDuty` returns them (quietest first).
 * O(n²) in the rows.
 * @example rankingUncertainty(rows, project.candidates).summary
 *   // "Places 1–2 could change within the declared uncertainty K. Too close to call: Crusher and Robot. 1 of 4 candidates …"
 */
export function rankingUncertaintyReference(
  rows: readonly RankingRow[],
  candidates: readonly Candidate[],
): RankingUncertainty {
  const byId = new Map(candidates.map((c) => [c.id, c]));
  const label = (id: string) => byId.get(id)?.label || id;
  const rowById = new Map(rows.map((r) => [r.candidateId, r]));
  const sorted = [...rows].sort((a, b) => a.rank - b.rank);
  const computed = sorted.filter((r) => Number.isFinite(r.contributionDb));
  const close = new Set<string>();
  const key = (a: string, b: string) => (a < b ? `${a}\u0000${b}` : `${b}\u0000${a}`);

  const closePairs: ClosePair[] = [];
  for (const [a, b] of rankingCloseCalls(computed, candidates)) {
    close.add(key(a, b));
    const ra = rowById.get(a) as RankingRow;
    const rb = rowById.get(b) as RankingRow;
    const [q, l] = ra.rank <= rb.rank ? [ra, rb] : [rb, ra];
    const k = Math.max(declaredK(byId.get(a)) ?? 0, declaredK(byId.get(b)) ?? 0);
    const differenceDb = l.contributionDb - q.contributionDb;
    closePairs.push({
      quieterId: q.candidateId,
      louderId: l.candidateId,
      differenceDb,
      uncertaintyDb: k,
      words: `${label(q.candidateId)} (${fmt(q.contributionDb)} dB) and ${label(l.candidateId)} (${fmt(l.contributionDb)} dB) differ by ${fmt(differenceDb)} dB, within K ${fmt(k)} dB: too close to call`,
    });
  }
  closePairs.sort(
    (x, y) =>
      rowById.get(x.quieterId)!.rank - rowById.get(y.quieterId)!.rank ||
      rowById.get(x.louderId)!.rank - rowById.get(y.louderId)!.rank,
  );

  const n = computed.length;
  const places: PlaceRange[] = sorted.map((row) => {
    const k = declaredK(byId.get(row.candidateId));
    const base = { candidateId: row.candidateId, rank: row.rank, uncertaintyDb: k ?? 0, kDeclared: k !== undefined };
    if (!Number.isFinite(row.contributionDb)) return { ...base, bestPlace: row.rank, worstPlace: row.rank };
    let surelyQuieter = 0;
    let surelyLouder = 0;
    for (const other of computed) {
      if (other === row || close.has(key(row.candidateId, other.candidateId))) continue;
      if (other.rank < row.rank) surelyQuieter++;
      else surelyLouder++;
    }
    return { ...base, bestPlace: 1 + surelyQuieter, worstPlace: n - surelyLouder };
  });

  const firm = closePairs.length === 0;
  const withoutK = computed.filter((r) => declaredK(byId.get(r.candidateId)) === undefined).length;
  const kWords =
    withoutK === 0
      ? ''
      : withoutK === n
        ? ' No candidate declares a K, so each counts K = 0.'
        : ` ${withoutK} of ${n} candidates declare no K and count K = 0.`;
  let summary: string;
  if (n < 2) summary = 'Fewer than two computed levels: nothing to compare.';
  else if (withoutK === n) summary = 'No candidate declares an uncertainty K: the order cannot be tested against it.';
  else if (firm) summary = `The order holds within the declared uncertainty K.${kWords}`;
  else {
    const moving = places.filter((p) => p.bestPlace !== p.worstPlace).map((p) => p.rank);
    summary = `Places ${placeList(moving)} could change within the declared uncertainty K. Too close to call (our own rule, not ISO 4871’s: levels no further apart than the larger K): ${closePairs.map((p) => `${label(p.quieterId)} and ${label(p.louderId)}`).join('; ')}.${kWords}`;
  }
  return { places, closePairs, firm, summary };
}

/** "1–3, 5" from sorted place numbers. */
function placeList(places: readonly number[]): string {
  const parts: string[] = [];
  let i = 0;
  while (i < places.length) {
    let j = i;
    while (j + 1 < places.length && places[j + 1] === (places[j] as number) + 1) j++;
    parts.push(i === j ? String(places[i]) : `${places[i]}–${places[j]}`);
    i = j + 1;
  }
  return parts.join(', ');
}
