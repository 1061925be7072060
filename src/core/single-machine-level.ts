/**
 * Predicted level of one machine (or n identical ones) at one receiver, with every term shown:
 * the prediction engine's path (./path-prediction.ts) plus the working day's terms
 * (./working-day-terms.ts), the same two parts the ledger's evaluation assembles for every
 * candidate and receiver. The command line's `level` and the app's quick calculation call it;
 * with the same inputs it gives a ledger contribution (tests/unit/core/one-engine.test.ts).
 *
 *   L = L_WA + path + receiver terms + 10·lg n + 10·lg η + 10·lg(T_work / T) + penalty
 *
 * - `simple`: path = 10·lg(Q/(4πr²)) (point source, common practice); screening is the
 *   rule of thumb (5 dB with only the top in sight, 10 dB out of sight) or a stated reduction.
 * - `iso9613-2` (ISO 9613-2:1996): path = D_c − A, receiver terms include −C_met (eqs 3, 4, 6):
 *   with octave bands and the general ground method each band is attenuated by its own A and
 *   the bands A-weighted and summed, 10·lg Σ s_b·10^(−A_b/10) with s_b the A-weighted energy
 *   share of band b (the bands give the spectrum's shape; L_WA, when given, its level);
 *   otherwise the A-weighted estimate. Screening of any kind is D_z, counted once in
 *   A_bar = D_z − A_gr (eq. 12); a barrier and another screening on one path are refused.
 * - façade +3 dB; working hours inside a period of T hours; a character penalty as stated.
 *
 * Terms are signed dB added to the level (attenuations negative); `levelDb` is their sum.
 * ISO terms also carry their value as the standard defines it (`standard`).
 */
import type { Term } from './term.ts';
import { finite, oneOf } from './check.ts';
import { InputError } from './input-error.ts';
import { checkOctaveBands } from './octave-bands.ts';
import { dbFromRatio, ratioFromDb } from './decibel.ts';
import { aWeightedTotalDb, A_WEIGHTING_OCTAVE_DB } from './standards/iec61672-1-2013.ts';
import type { Accuracy } from './standards/iso9613-2-1996/index.ts';
import { isoMachineTerms, type IsoMachineTerms } from './iso9613-machine-terms.ts';
import { pathNumbers, pathTerms, type Iso9613Propagation, type PathScreening } from './path-prediction.ts';
import { penaltyTerm, workingDayTerms } from './working-day-terms.ts';

export type { Iso9613Propagation } from './path-prediction.ts';

/** The caution to show next to every prediction; the accuracy of each ISO 9613-2 figure is stated beside it. */
export const PREDICTION_CAUTION =
  'Predictions are estimates (ISO 9613-2 quotes ±3 dB up to 1 km, and states no accuracy beyond 1 km, above 30 m mean height or for screened or reflected paths); a competent acoustician and the local authority’s rules decide.';

/**
 * Screening as a rule of thumb, a stated reduction, or a barrier's path difference (ISO 9613-2
 * only, unless the distances to the barrier's edge are given as well: then the simple method
 * takes its D_z at 500 Hz, as for a barrier on the plan).
 */
export type MachineScreening = PathScreening;

export interface SingleMachineInput {
  /** A-weighted sound power level L_WA, dB. Needed unless `bandsDb` is given. */
  lwDb?: number;
  /**
   * Eight octave-band sound power levels Lw, dB (unweighted), 63 Hz … 8 kHz. With `lwDb`
   * they give the spectrum's shape only (as a ledger candidate with both); alone, the level too.
   */
  bandsDb?: readonly number[];
  /** Source–receiver distance, m. */
  distanceM: number;
  /** 'simple' (default) or 'iso9613-2' ('iso9613-2:1996' is accepted as the same). */
  method?: 'simple' | 'iso9613-2' | 'iso9613-2:1996';
  /** Directivity Q for the simple method: 1, 2 (default), 4 or 8. */
  q?: number;
  /** On-time, % (default 100). */
  onTimePct?: number;
  /** Number of identical units (default 1). */
  count?: number;
  /** Default none. */
  screening?: MachineScreening;
  /** Assessed 1 m in front of a façade: +3 dB. */
  facade?: boolean;
  /** Required for the ISO 9613-2 method. */
  propagation?: Iso9613Propagation;
  /** Hours worked inside the assessment period, with `periodHours` (both absent: the whole period). */
  hoursWorked?: number;
  /** Length of the assessment period, h. */
  periodHours?: number;
  /** Character penalty for tonal or impulsive noise, dB (default 0), with the character's name for its label. */
  penaltyDb?: number;
  penaltyCharacter?: string;
}

export interface SingleMachineLevel {
  /** Predicted level at the receiver, dB(A). */
  levelDb: number;
  /** Every term, in the order applied; their dB values add up to `levelDb`. */
  terms: Term[];
  /** How the propagation was computed. */
  basis: 'point-source' | 'iso9613-2-octave-bands' | 'iso9613-2-broadband';
  /** The ISO 9613-2:1996 terms as the standard defines them (ISO method only). */
  iso?: IsoMachineTerms;
  /** The accuracy stated for the figure, or why none is stated (ISO method); undefined for the simple method. */
  accuracy?: Accuracy;
}

const LW_ACCEPTED = 'an A-weighted sound power level in dB, e.g. 104.5';

function sourceLevel(input: SingleMachineInput): Term {
  if (input.lwDb !== undefined) {
    return { key: 'lw', label: 'Sound power level L_WA', db: finite('sound power level', input.lwDb, LW_ACCEPTED) };
  }
  if (input.bandsDb === undefined) {
    throw new InputError('sound power level', undefined, 'given', `give ${LW_ACCEPTED}, or eight octave-band levels`);
  }
  return {
    key: 'lw',
    label: 'Sound power level L_WA from octave bands (A-weighting IEC 61672-1:2013)',
    db: aWeightedTotalDb(input.bandsDb),
  };
}

/**
 * 10·lg Σ s_b·10^(−A_b/10): the octave-band path of a spectrum, s_b = 10^((L_b + A-wt_b)/10) / Σ
 * (A-weighted energy shares, Σ s_b = 1), A_b the band attenuations. dB.
 */
function octavePathDb(bandsDb: readonly number[], attenuationDb: Float64Array): number {
  const lw = checkOctaveBands('octave-band levels', bandsDb);
  let total = 0;
  let through = 0;
  for (let b = 0; b < 8; b++) {
    const e = ratioFromDb((lw[b] as number) + (A_WEIGHTING_OCTAVE_DB[b] as number));
    total += e;
    through += e * ratioFromDb(-(attenuationDb[b] as number));
  }
  return dbFromRatio(through / total);
}

/**
 * Predicted level L at a receiver from one machine, with its terms.
 * @example singleMachineLevel({ lwDb: 105, distanceM: 50 }).levelDb // 63.0 (Q = 2)
 */
export function singleMachineLevel(input: SingleMachineInput): SingleMachineLevel {
  const method = oneOf('method', input.method ?? 'simple', ['simple', 'iso9613-2', 'iso9613-2:1996'] as const);
  const iso9613 = method !== 'simple';
  const terms: Term[] = [sourceLevel(input)];
  const bandsOut = iso9613 && input.bandsDb !== undefined ? new Float64Array(8) : undefined;
  const n = pathNumbers(
    {
      distanceM: input.distanceM,
      method: iso9613 ? 'iso9613-2:1996' : 'simple',
      ...(iso9613 ? {} : { q: input.q ?? 2 }),
      ...(input.propagation ? { propagation: input.propagation } : {}),
      ...(input.screening ? { screening: input.screening } : {}),
      ...(input.facade === undefined ? {} : { facade: input.facade }),
    },
    bandsOut,
  );
  const shown = pathTerms(n);
  let iso: IsoMachineTerms | undefined = shown.iso;
  let basis: SingleMachineLevel['basis'] = iso9613 ? 'iso9613-2-broadband' : 'point-source';
  if (n.bands && input.bandsDb !== undefined && n.isoInput) {
    // The standard's band table for display; the level takes the engine's band attenuations.
    iso = isoMachineTerms(n.isoInput, input.bandsDb, input.facade === true);
    terms.push({
      key: 'octavePath',
      label: `Octave bands: L_p = L_w + D_c − A per band (band table), A-weighted and summed, less L_WA (not a term of ISO 9613-2:1996)`,
      db: octavePathDb(input.bandsDb, bandsOut as Float64Array),
    });
    basis = 'iso9613-2-octave-bands';
  } else {
    terms.push(...shown.pathTerms);
  }
  workingDayTerms(
    {
      count: input.count ?? 1,
      onTimePct: input.onTimePct ?? 100,
      ...(input.hoursWorked === undefined ? {} : { hoursWorked: input.hoursWorked }),
      ...(input.periodHours === undefined ? {} : { periodHours: input.periodHours }),
    },
    terms,
  );
  // The order of a ledger contribution's terms: source, path, working day, receiver, penalty.
  terms.push(...shown.receiverTerms);
  const penalty = finite('character penalty', input.penaltyDb ?? 0, 'a penalty in dB, e.g. 5');
  terms.push(...penaltyTerm(penalty, input.penaltyCharacter ?? 'stated'));

  const levelDb = terms.reduce((sum, t) => sum + t.db, 0);
  return { levelDb, terms, basis, ...(iso ? { iso, accuracy: iso.accuracy } : {}) };
}
