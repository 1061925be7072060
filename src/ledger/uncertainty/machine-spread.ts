/**
 * The spread of a machine's true sound power about its mean, from its declared uncertainty K.
 *
 * ISO 4871:1996: a declaration is the pair (L, K), L the mean measured value, or the single
 * value L_d = L + K. So the model centres every machine on its mean L — given as L, or as
 * L_d − K when only the declared value and K are known — and spreads it normally with
 * σ = K / f (f = 1.645 by default; from memory). It never adds a spread on top of L_d,
 * which already holds K. A machine without K (a guaranteed value alone, a measured value
 * without K, a permissible stand-in) takes the project's default K for this model only,
 * and is marked; the levels of the ledger keep their own basis.
 *
 * All units of a duty are the same model with the same declaration, so they share one
 * error (their levels move together), and the error is the same at every receiver, in
 * every phase and period.
 */
import type { Candidate, ProjectSettings, UncertaintySettings } from '../model/model.ts';
import { standardDeviationFromK } from '../../core/standards/iso4871-1996.ts';
import type { RatedSoundPower } from '../rating/rating.ts';

export interface MachineSpread {
  candidateId: string;
  /** K used, dB. */
  kDb: number;
  /** The machine declares no K: the project default is assumed. */
  kAssumed: boolean;
  /** Standard deviation of its true level, dB. */
  sigmaDb: number;
  /** Mean level − the level the ledger rates it on, dB (−K on the guaranteed basis, 0 on the measured basis with a measured pair). */
  centreShiftDb: number;
  /** e.g. "mean L = 103.0 − K 3.0 = 100.0 dB, σ = K/1.645 = 1.82 dB (K assumed)". */
  words: string;
}

const fmt = (x: number) => x.toFixed(1);

/**
 * The spread of one candidate, given the level the ledger rates it on. O(1).
 * @example machineSpread({ declaration: 'guaranteed', lwaDb: 103, uncertaintyDb: 3.29, … }, rated 103, …) // { centreShiftDb: −3.29, sigmaDb: 2 }
 */
export function machineSpread(
  candidate: Candidate,
  rated: RatedSoundPower,
  settings: ProjectSettings,
  model: UncertaintySettings,
): MachineSpread {
  const k0 = candidate.uncertaintyDb;
  const declaredK = typeof k0 === 'number' && Number.isFinite(k0) && k0 >= 0 ? k0 : undefined;
  const kAssumed = declaredK === undefined || rated.standIn;
  const kDb = kAssumed ? model.defaultKDb : (declaredK as number);
  const sigmaDb = standardDeviationFromK(kDb, model.kPerStandardDeviation);
  // The value the rating started from holds K when it is a guaranteed value or a stand-in.
  const declaredHoldsK = rated.standIn || candidate.declaration === 'guaranteed';
  // What the rating added to or took from the declared value.
  let ratingAddedK = 0;
  if (!rated.standIn && declaredK !== undefined) {
    if (settings.levelBasis === 'guaranteed' && candidate.declaration === 'measured') ratingAddedK = declaredK;
    if (settings.levelBasis === 'measured' && candidate.declaration === 'guaranteed') ratingAddedK = -declaredK;
  }
  // Mean = declared − K when the declared value holds K, else the declared value itself.
  const centreShiftDb = (declaredHoldsK ? -kDb : 0) - ratingAddedK;
  const rate = rated.lwaDb;
  const mean = rate + centreShiftDb;
  const words = Number.isFinite(rate)
    ? `mean ${fmt(mean)} dB (${declaredHoldsK ? `declared ${fmt(rate - ratingAddedK)} − K ${fmt(kDb)}` : `measured ${fmt(mean)}`}), σ = K ${fmt(kDb)} / ${model.kPerStandardDeviation} = ${sigmaDb.toFixed(2)} dB${kAssumed ? ' (K assumed: none declared)' : ''}`
    : 'level not computed';
  return { candidateId: candidate.id, kDb, kAssumed, sigmaDb, centreShiftDb, words };
}
