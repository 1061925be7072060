/**
 * The Workspace's rankings: every duty ranked (src/ledger/ranking/rank.ts) at the chosen receiver
 * or at its phase's worst-affected receiver, the chosen duty's ranking, and whether its
 * order is firm within the declared uncertainty.
 */
import type { Candidate, Project } from '../../ledger/model/model.ts';
import { REFERENCE_RECEIVER_ID } from '../../ledger/model/model.ts';
import type { Evaluation, RankingRow } from '../../ledger/model/results.ts';
import { rankDuty } from '../../ledger/ranking/rank.ts';
import { rankingFirmness, type RankingFirmness } from './ranking-firmness.ts';
import { own } from '../../ledger/model/own.ts';

/** The receiver choice for rankings: a receiver id, or the worst-affected receiver of the duty's phase. */
export type ReceiverChoice = string | 'worst';

/** What the rankings are computed from (read inside `$derived`, so reactive). */
export interface RankingSources {
  project(): Project;
  evaluation(): Evaluation | undefined;
  /** The duty whose ranking is shown. */
  dutyId(): string | undefined;
  receiver(): ReceiverChoice;
}

export class WorkspaceRankings {
  #sources: RankingSources;

  constructor(sources: RankingSources) {
    this.#sources = sources;
  }

  /**
   * Each duty's ranking at the chosen receiver, worked out on first use after each change
   * of the project, evaluation or receiver: an edit re-ranks only the duties on screen,
   * not all of them. O(ranking cost of one duty) per duty asked for.
   */
  readonly #cache = $derived.by(() => {
    const project = this.#sources.project();
    const evaluation = this.#sources.evaluation();
    void this.#sources.receiver();
    return { project, evaluation, byDuty: new Map<string, Map<string, RankingRow> & { rows: RankingRow[] }>() };
  });

  /** The candidates the look-up by id was made for, and the look-up (not reactive: a cache). */
  #byIdMade: { candidates: readonly Candidate[]; map: Map<string, Candidate> } | undefined;

  /**
   * Every candidate by id: after an edit that added, removed and reordered none, the same map
   * with the replaced machines put in (one pass of comparisons instead of a new map of 5,000).
   * A cache keyed by the candidate list rather than a `$derived`, because the grid reads it
   * untracked (a derived read so, whose value stays the same object, would run at each read).
   */
  #byId(): Map<string, Candidate> {
    const candidates = this.#sources.project().candidates;
    const made = this.#byIdMade;
    if (made?.candidates === candidates) return made.map;
    const map = made && patchById(made.map, made.candidates, candidates) ? made.map : byIdMap(candidates);
    this.#byIdMade = { candidates, map };
    return map;
  }

  /** One candidate of the open project by id. */
  candidateOf(candidateId: string): Candidate | undefined {
    return this.#byId().get(candidateId);
  }

  /**
   * The rows each duty was last ranked into (not reactive: a cache). A new ranking keeps the
   * earlier object of every row whose figures are all the same, so the grid, which re-reads a
   * row only when what it is made from changed, leaves alone the rows an edit did not move.
   */
  #lastRows = new Map<string, Map<string, RankingRow>>();

  #duty(dutyId: string): Map<string, RankingRow> & { rows: RankingRow[] } {
    const cache = this.#cache;
    let kept = cache.byDuty.get(dutyId);
    if (kept) return kept;
    let rows: RankingRow[] = [];
    if (cache.evaluation && cache.project.duties.some((d) => d.id === dutyId)) {
      try {
        rows = rankDuty(cache.project, cache.evaluation, dutyId, this.receiverFor(dutyId));
      } catch {
        rows = [];
      }
    }
    const last = this.#lastRows.get(dutyId);
    if (last) rows = rows.map((row) => keepRow(last.get(row.candidateId), row));
    kept = Object.assign(new Map(rows.map((row) => [row.candidateId, row] as const)), { rows });
    this.#lastRows.set(dutyId, kept);
    cache.byDuty.set(dutyId, kept);
    return kept;
  }

  /** The ranking of one duty at the chosen receiver. */
  rowsOf(dutyId: string): RankingRow[] {
    return this.#duty(dutyId).rows;
  }

  /** The ranking of the chosen duty at the chosen receiver. */
  get ranking(): RankingRow[] {
    const id = this.#sources.dutyId();
    return id ? this.rowsOf(id) : [];
  }

  /** Whether the chosen ranking's order could change within the declared uncertainty K, and which pairs are too close to call. */
  readonly #firmness = $derived.by(() => rankingFirmness(this.ranking, this.#sources.project().candidates));

  get firmness(): RankingFirmness {
    return this.#firmness;
  }

  /** Ranking rows by candidate id, looked up (and ranked) on demand: only `get` and `has` answer. */
  readonly byCandidate: Map<string, RankingRow> = new RankingLookup((id) => this.rankingOf(id));

  /** The ranking row of one candidate (in its own duty, at the chosen receiver). */
  rankingOf(candidateId: string): RankingRow | undefined {
    const candidate = this.#byId().get(candidateId);
    return candidate === undefined ? undefined : this.#duty(candidate.dutyId).get(candidateId);
  }

  /**
   * The receiver a duty is ranked at: the chosen one, or for 'worst' the receiver with the
   * least margin in the duty's phase (else the first receiver, else the reference receiver).
   */
  receiverFor(dutyId: string): string {
    const chosen = this.#sources.receiver();
    const receivers = this.#sources.project().receivers;
    if (chosen !== 'worst' && (chosen === REFERENCE_RECEIVER_ID || receivers.some((r) => r.id === chosen)))
      return chosen;
    const duty = this.#sources.project().duties.find((d) => d.id === dutyId);
    const worst = duty ? own(this.#sources.evaluation()?.worstReceiverByPhase, duty.phaseId) : undefined;
    // The same rule as the report, the workbook and `ledger evaluate` (ledger/ranking/rank-every-duty.ts):
    // the phase's worst receiver, else the reference receiver.
    return worst ?? REFERENCE_RECEIVER_ID;
  }

  /** Words for the chosen receiver, for column headers. */
  get receiverName(): string {
    const chosen = this.#sources.receiver();
    if (chosen === REFERENCE_RECEIVER_ID) return 'reference receiver';
    return this.#sources.project().receivers.find((r) => r.id === chosen)?.name ?? 'worst receiver';
  }
}

/**
 * The earlier row when every figure of the new one is the same (NaN equal to NaN, an absent
 * figure equal only to an absent one), else the new row. O(fields).
 */
export function keepRow(earlier: RankingRow | undefined, next: RankingRow): RankingRow {
  if (!earlier) return next;
  const a = earlier as unknown as Record<string, unknown>;
  const b = next as unknown as Record<string, unknown>;
  let fields = 0;
  for (const key in b) {
    if (!Object.hasOwn(b, key)) continue;
    if (!Object.hasOwn(a, key) || !Object.is(a[key], b[key])) return next;
    fields++;
  }
  return Object.keys(a).length === fields ? earlier : next;
}

/** A Map whose `get` and `has` ask a function: the candidate table reads rankings through it. */
class RankingLookup extends Map<string, RankingRow> {
  readonly #find: (id: string) => RankingRow | undefined;

  constructor(find: (id: string) => RankingRow | undefined) {
    super();
    this.#find = find;
  }

  override get(id: string): RankingRow | undefined {
    return this.#find(id);
  }

  override has(id: string): boolean {
    return this.#find(id) !== undefined;
  }
}

function byIdMap(candidates: readonly Candidate[]): Map<string, Candidate> {
  return new Map(candidates.map((c) => [c.id, c] as const));
}

/**
 * Brings `map` (made from list `a`) up to list `b` when `b` holds the same ids in the same order,
 * putting in each machine replaced at its place; false, and the map left to be thrown away,
 * when an id was added, removed or moved. With an id twice, the map keeps the later machine,
 * as a new map would. O(candidates).
 */
export function patchById(map: Map<string, Candidate>, a: readonly Candidate[], b: readonly Candidate[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) {
    const x = a[i]!;
    const y = b[i]!;
    if (x === y) continue;
    if (x.id !== y.id) return false;
    if (map.get(x.id) === x) map.set(y.id, y);
  }
  return true;
}
