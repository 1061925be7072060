/**
 * How firm a ranking is, given the declared uncertainty K of each candidate (ISO 4871:1996).
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
 * Cost: O(n log n + pairs) for the n candidates of a duty: the close pairs come from a sort and
 * a sweep (./close-calls.ts), and each row's range from how many rows rank above it less its
 * close partners above it. The words (each pair's, the summary) are written when first read: a
 * large project has hundreds of thousands of close pairs and shows a few. The pair-by-pair
 * version is kept in the tests as the reference.
 */
import type { Candidate } from '../model/model.ts';
import type { RankingRow } from '../model/results.ts';
import { candidateMap, closePairCodes, type CandidateLookup } from './close-calls.ts';

/** The places one row of a ranking could take within ±K. */
export interface PlaceRange {
  candidateId: string;
  rank: number;
  /** Best (lowest-numbered) place it could take. */
  bestPlace: number;
  /** Worst (highest-numbered) place it could take. */
  worstPlace: number;
  /** K used for it, dB (0 when none is declared). */
  uncertaintyDb: number;
  /** A K was declared (a measured pair, or a guaranteed value with its K). */
  kDeclared: boolean;
}

/** A pair of candidates whose order could change within ±K. */
export interface ClosePair {
  /** The quieter of the two as ranked. */
  quieterId: string;
  louderId: string;
  /** Louder level − quieter level at the receiver, dB (≥ 0). */
  differenceDb: number;
  /** The larger of the two K, dB. */
  uncertaintyDb: number;
  /** e.g. "Robot (107.0 dB) and Crusher (106.0 dB) differ by 1.0 dB, within K 3.0 dB: too close to call". */
  words: string;
}

export interface RankingUncertainty {
  /** One entry per row, in ranking order. */
  places: PlaceRange[];
  /** Pairs too close to call, the quieter first, in ranking order. */
  closePairs: ClosePair[];
  /** No place could change within ±K. */
  firm: boolean;
  /** The whole finding in one or two sentences. */
  summary: string;
}

const fmt = (x: number) => x.toFixed(1);

/**
 * A close pair whose words are written when first read (a large project has hundreds of thousands of close pairs and
 * shows a few): a getter of the class, not of each object. JSON gives the five fields as a plain pair would.
 */
class CloseCall implements ClosePair {
  readonly quieterId: string;
  readonly louderId: string;
  readonly differenceDb: number;
  readonly uncertaintyDb: number;
  #words: string | undefined;
  readonly #quieterDb: number;
  readonly #louderDb: number;
  readonly #label: (id: string) => string;
  constructor(quieter: RankingRow, louder: RankingRow, uncertaintyDb: number, label: (id: string) => string) {
    this.quieterId = quieter.candidateId;
    this.louderId = louder.candidateId;
    this.differenceDb = louder.contributionDb - quieter.contributionDb;
    this.uncertaintyDb = uncertaintyDb;
    this.#quieterDb = quieter.contributionDb;
    this.#louderDb = louder.contributionDb;
    this.#label = label;
  }
  get words(): string {
    this.#words ??= `${this.#label(this.quieterId)} (${fmt(this.#quieterDb)} dB) and ${this.#label(this.louderId)} (${fmt(this.#louderDb)} dB) differ by ${fmt(this.differenceDb)} dB, within K ${fmt(this.uncertaintyDb)} dB: too close to call`;
    return this.#words;
  }
  toJSON(): ClosePair {
    const { quieterId, louderId, differenceDb, uncertaintyDb, words } = this;
    return { quieterId, louderId, differenceDb, uncertaintyDb, words };
  }
}

/** A ranking's firmness whose summary is written when first read; JSON gives the four fields. */
class Firmness implements RankingUncertainty {
  #summary: string | (() => string);
  constructor(
    readonly places: PlaceRange[],
    readonly closePairs: ClosePair[],
    readonly firm: boolean,
    summary: () => string,
  ) {
    this.#summary = summary;
  }
  get summary(): string {
    if (typeof this.#summary !== 'string') this.#summary = this.#summary();
    return this.#summary;
  }
  toJSON(): RankingUncertainty {
    return { places: this.places, closePairs: this.closePairs, firm: this.firm, summary: this.summary };
  }
}

function declaredK(candidate: Candidate | undefined): number | undefined {
  const k = candidate?.uncertaintyDb;
  return k !== undefined && k !== null && Number.isFinite(k) && k > 0 ? k : undefined;
}

/**
 * Which places of a ranking could change within the declared uncertainty, and which pairs
 * are too close to call, with words. `rows` as `rankDuty` returns them (quietest first);
 * `candidates` a map by id (or a list) holding at least the rows' candidates.
 * O(n log n + close pairs) in the rows.
 * @example rankingUncertainty(rows, project.candidates).summary
 *   // "Places 1–2 could change within the declared uncertainty K. Too close to call: Crusher and Robot. 1 of 4 candidates …"
 */
export function rankingUncertainty(rows: readonly RankingRow[], candidates: CandidateLookup): RankingUncertainty {
  const byId = candidateMap(candidates);
  const label = (id: string) => byId.get(id)?.label || id;
  // Rows as rankDuty gives them are in rank order already: then read in place, else a sorted copy.
  let inOrder = true;
  for (let i = 1; i < rows.length && inOrder; i++)
    inOrder = (rows[i - 1] as RankingRow).rank <= (rows[i] as RankingRow).rank;
  const sorted = inOrder ? rows : [...rows].sort((a, b) => a.rank - b.rank);
  const computed: RankingRow[] = [];
  for (const r of sorted) if (Number.isFinite(r.contributionDb)) computed.push(r);
  const n = computed.length;
  const kOf: (number | undefined)[] = new Array(n);
  const levelDb = new Float64Array(n);
  const kOrZero = new Float64Array(n);
  // Whether the computed rows' ranks strictly increase (each rank once, as rankDuty numbers them).
  let distinctRanks = true;
  for (let i = 0; i < n; i++) {
    const r = computed[i] as RankingRow;
    const k = declaredK(byId.get(r.candidateId));
    kOf[i] = k;
    levelDb[i] = r.contributionDb;
    kOrZero[i] = k ?? 0;
    if (i > 0 && (computed[i - 1] as RankingRow).rank >= r.rank) distinctRanks = false;
  }
  // Close partners ranked above (smaller rank) and at-or-below each computed row, by position in `computed`.
  const closeAbove = new Int32Array(n);
  const closeBelow = new Int32Array(n);

  // Pairs come as positions i < j in `computed`, ordered by i then j. With distinct ranks that is the order of the
  // pairs by the quieter's rank, then the louder's, and row i is the quieter: no sort is needed.
  const found: { q: number; l: number; pair: ClosePair }[] = [];
  const direct: ClosePair[] = [];
  for (const code of closePairCodes(levelDb, kOrZero)) {
    const j = code % n;
    const i = (code - j) / n;
    const ra = computed[i] as RankingRow;
    const rb = computed[j] as RankingRow;
    if (rb.rank < ra.rank) closeAbove[i]!++;
    else closeBelow[i]!++;
    if (ra.rank < rb.rank) closeAbove[j]!++;
    else closeBelow[j]!++;
    const first = ra.rank <= rb.rank;
    const q = first ? ra : rb;
    const l = first ? rb : ra;
    const k = Math.max(kOrZero[i] as number, kOrZero[j] as number);
    const pair = new CloseCall(q, l, k, label);
    if (distinctRanks) direct.push(pair);
    else found.push({ q: q.rank, l: l.rank, pair });
  }
  let closePairs = direct;
  if (!distinctRanks) {
    found.sort((x, y) => x.q - y.q || x.l - y.l);
    closePairs = found.map((f) => f.pair);
  }

  // Computed rows ranked strictly above each: the first position of its rank in `computed` (sorted by rank).
  let position = 0;
  let firstOfRank = 0;
  const places: PlaceRange[] = sorted.map((row) => {
    // A computed row's K was read above (kOf, in the same order); the others' are read here.
    const isComputed = Number.isFinite(row.contributionDb);
    const k = isComputed ? kOf[position] : declaredK(byId.get(row.candidateId));
    const place: PlaceRange = {
      candidateId: row.candidateId,
      rank: row.rank,
      bestPlace: row.rank,
      worstPlace: row.rank,
      uncertaintyDb: k ?? 0,
      kDeclared: k !== undefined,
    };
    if (!isComputed) return place;
    const i = position++;
    if (i === 0 || (computed[i - 1] as RankingRow).rank !== row.rank) firstOfRank = i;
    const surelyQuieter = firstOfRank - (closeAbove[i] as number);
    const surelyLouder = n - 1 - firstOfRank - (closeBelow[i] as number);
    place.bestPlace = 1 + surelyQuieter;
    place.worstPlace = n - surelyLouder;
    return place;
  });

  const firm = closePairs.length === 0;
  let withoutK = 0;
  for (let i = 0; i < n; i++) if (kOf[i] === undefined) withoutK++;
  const kWords =
    withoutK === 0
      ? ''
      : withoutK === n
        ? ' No candidate declares a K, so each counts K = 0.'
        : ` ${withoutK} of ${n} candidates declare no K and count K = 0.`;
  return new Firmness(places, closePairs, firm, () => {
    if (n < 2) return 'Fewer than two computed levels: nothing to compare.';
    if (withoutK === n) return 'No candidate declares an uncertainty K: the order cannot be tested against it.';
    if (firm) return `The order holds within the declared uncertainty K.${kWords}`;
    const moving = places.filter((p) => p.bestPlace !== p.worstPlace).map((p) => p.rank);
    return `Places ${placeList(moving)} could change within the declared uncertainty K. Too close to call (our own rule, not ISO 4871’s: levels no further apart than the larger K): ${closePairs.map((p) => `${label(p.quieterId)} and ${label(p.louderId)}`).join('; ')}.${kWords}`;
  });
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
