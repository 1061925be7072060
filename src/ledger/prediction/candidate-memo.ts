/**
 * What an evaluation derives from one candidate alone — its rated LWA, its cost for the
 * duty — kept per candidate object and reused while the inputs it was derived from are unchanged.
 *
 * The app replaces an edited candidate by a new object, so an edit of one candidate
 * recomputes one entry and reuses the other n − 1. A memo is keyed by the candidate
 * object (WeakMap: it goes when the object goes) and keeps a copy of the input values it
 * read; every look-up compares them again, so a caller that changes a candidate in place
 * still gets fresh results. Reuse never changes a result: a memo hit returns what the
 * same inputs computed before.
 *
 * Cost per look-up O(1): about a dozen comparisons, against string formatting and a few
 * powers of ten for a recomputation.
 */
import type { Candidate, Duty, ProjectSettings } from '../model/model.ts';
import type { DutyCost } from '../model/results.ts';
import type { PermissibleLookup, RatedSoundPower } from '../rating/rating.ts';
import { ratedLevel } from '../rating/rated-level.ts';
import { dutyCost } from '../costs/cost.ts';
import { A_WEIGHTING_OCTAVE_DB } from '../../core/standards/iec61672-1-2013.ts';
import { ratioFromDb } from '../../core/decibel.ts';

/** Number of octave bands in a spectrum, 63 Hz … 8 kHz. */
const BANDS = 8;

/** What is kept for one candidate object; each part is filled when first asked for. */
export interface CandidateMemo {
  /** Declared LWA, K, declaration kind and level basis the rating was computed from (fields, not an array: one memory access fewer). */
  ratedLwa?: unknown;
  ratedK?: unknown;
  ratedDeclaration?: unknown;
  ratedBasis?: unknown;
  rated?: RatedSoundPower;
  /** Every value dutyCost read, as fields (not an array: one object per candidate fewer), compared by {@link sameCostInputs}. */
  costId?: unknown;
  costDays?: unknown;
  costCount?: unknown;
  costCurrency?: unknown;
  costRunning?: unknown;
  costCharges?: unknown;
  costKind?: unknown;
  costDayRate?: unknown;
  costWeekRate?: unknown;
  costMonthRate?: unknown;
  costPrice?: unknown;
  costResale?: unknown;
  costLife?: unknown;
  cost?: DutyCost;
}

/** A memo with nothing kept yet, every field present (one object shape for all memos: fast to read). */
function emptyMemo(): CandidateMemo {
  return {
    ratedLwa: undefined,
    ratedK: undefined,
    ratedDeclaration: undefined,
    ratedBasis: undefined,
    rated: undefined,
    costId: undefined,
    costDays: undefined,
    costCount: undefined,
    costCurrency: undefined,
    costRunning: undefined,
    costCharges: undefined,
    costKind: undefined,
    costDayRate: undefined,
    costWeekRate: undefined,
    costMonthRate: undefined,
    costPrice: undefined,
    costResale: undefined,
    costLife: undefined,
    cost: undefined,
  };
}

const memos = new WeakMap<Candidate, CandidateMemo>();

/**
 * The memo of a candidate object. A new object starts from a copy of the memo of the
 * object it replaces (`replaced`, e.g. the candidate at the same position before an edit),
 * if any: each part is still checked against the new object's values before use, so
 * only what the edit changed is recomputed — and a cost left unchanged stays the same
 * object. O(1).
 */
export function memoOf(candidate: Candidate, replaced?: Candidate): CandidateMemo {
  if (typeof candidate !== 'object' || candidate === null) return emptyMemo(); // not a candidate: nothing to keep
  let memo = memos.get(candidate);
  if (memo === undefined) {
    const before = typeof replaced === 'object' && replaced !== null ? memos.get(replaced) : undefined;
    memo = before ? { ...before } : emptyMemo();
    memos.set(candidate, memo);
  }
  return memo;
}

/** The memo kept for a candidate object, if any, without making one. O(1). */
export function knownMemo(candidate: Candidate): CandidateMemo | undefined {
  return typeof candidate === 'object' && candidate !== null ? memos.get(candidate) : undefined;
}

/** A new memo, for a caller that keeps it itself (by position in a list) rather than under the object. O(1). */
export function newMemo(from?: CandidateMemo): CandidateMemo {
  return from ? { ...from } : emptyMemo();
}

/**
 * {@link ratedLevel} of a candidate, reused while its declared LWA, K, declaration kind and
 * the project's level basis are unchanged. Candidates without a declared LWA are computed
 * every time (their stand-in may depend on anything the lookup reads). O(1).
 */
export function ratedLevelOf(
  memo: CandidateMemo,
  candidate: Candidate,
  settings: ProjectSettings,
  permissible?: PermissibleLookup,
): RatedSoundPower {
  const declared = candidate.lwaDb;
  if (declared === undefined || declared === null) return ratedLevel(candidate, settings, permissible);
  const basis = settings.levelBasis;
  if (
    memo.rated &&
    Object.is(memo.ratedLwa, declared) &&
    Object.is(memo.ratedK, candidate.uncertaintyDb) &&
    memo.ratedDeclaration === candidate.declaration &&
    memo.ratedBasis === basis
  ) {
    return memo.rated;
  }
  const rated = ratedLevel(candidate, settings, permissible);
  memo.ratedLwa = declared;
  memo.ratedK = candidate.uncertaintyDb;
  memo.ratedDeclaration = candidate.declaration;
  memo.ratedBasis = basis;
  memo.rated = rated;
  return rated;
}

/**
 * The A-weighted energy share of each octave band of a candidate's sound power,
 * s_b = 10^((L_b + A_b)/10) / Σ_k 10^((L_k + A_k)/10) (A_b the IEC 61672-1:2013 octave
 * A-weighting), so that Σ s_b = 1, written at out[at … at + 7]; false (nothing written) when
 * the candidate has no usable bands (exactly eight finite numbers). Computed every time:
 * eight powers of ten cost less than keeping a small array per candidate. O(8).
 * @example spectrumSharesInto({ bandsDb: [100, 100, 100, 100, 100, 100, 100, 100], … }, out, 0); out[4] // 0.2000 (1 kHz: A = 0 dB; total 106.99 dB)
 */
export function spectrumSharesInto(candidate: Candidate, out: Float64Array, at: number): boolean {
  const bands = candidate.bandsDb;
  if (!Array.isArray(bands) || bands.length !== BANDS) return false;
  for (let b = 0; b < BANDS; b++) {
    const x = bands[b];
    if (typeof x !== 'number' || !Number.isFinite(x)) return false;
  }
  let total = 0;
  for (let b = 0; b < BANDS; b++)
    total += out[at + b] = ratioFromDb((bands[b] as number) + (A_WEIGHTING_OCTAVE_DB[b] as number));
  for (let b = 0; b < BANDS; b++) out[at + b] = (out[at + b] as number) / total;
  return true;
}

type CostFields = Partial<Record<string, unknown>> | undefined | null;

/** Whether the values {@link dutyCost} would read now are those it read for the memo. O(1). */
function sameCostInputs(m: CandidateMemo, candidate: Candidate, duty: Duty, currency: string): boolean {
  const cost = candidate.cost as CostFields;
  return (
    m.costId === candidate.id &&
    Object.is(m.costDays, duty.durationDays) &&
    Object.is(m.costCount, duty.count) &&
    m.costCurrency === currency &&
    Object.is(m.costRunning, candidate.runningPerDay) &&
    Object.is(m.costCharges, candidate.fixedCharges) &&
    m.costKind === cost?.kind &&
    Object.is(m.costDayRate, cost?.dayRate) &&
    Object.is(m.costWeekRate, cost?.weekRate) &&
    Object.is(m.costMonthRate, cost?.monthRate) &&
    Object.is(m.costPrice, cost?.price) &&
    Object.is(m.costResale, cost?.resaleValue) &&
    Object.is(m.costLife, cost?.lifeDays)
  );
}

/**
 * {@link dutyCost} of a candidate for its duty, reused (the same object, whose explanation
 * is written once) while the candidate's costs, the duty's duration and units and the
 * currency are unchanged. O(1).
 */
export function dutyCostOf(memo: CandidateMemo, candidate: Candidate, duty: Duty, currency: string): DutyCost {
  if (memo.cost && sameCostInputs(memo, candidate, duty, currency)) return memo.cost;
  const c = candidate.cost as CostFields;
  const cost = dutyCost(candidate, duty, currency);
  memo.costId = candidate.id;
  memo.costDays = duty.durationDays;
  memo.costCount = duty.count;
  memo.costCurrency = currency;
  memo.costRunning = candidate.runningPerDay;
  memo.costCharges = candidate.fixedCharges;
  memo.costKind = c?.kind;
  memo.costDayRate = c?.dayRate;
  memo.costWeekRate = c?.weekRate;
  memo.costMonthRate = c?.monthRate;
  memo.costPrice = c?.price;
  memo.costResale = c?.resaleValue;
  memo.costLife = c?.lifeDays;
  memo.cost = cost;
  return cost;
}
