/**
 * Predicted level of one machine (or n identical ones) at one receiver, with every term shown.
 *
 * The only place that combines the terms for one machine; the command line's `level`, the
 * app's quick calculation and the ledger's evaluation all call it.
 *
 *   L = L_W + propagation + on-time + count − screening + façade
 *
 * - `simple`: propagation = 10·lg(Q/(4πr²)) (point source, common practice); screening is the
 *   rule of thumb (5 dB top visible, 10 dB hidden) or a stated reduction.
 * - `iso9613-2` (ISO 9613-2:1996): propagation = D_c − A − C_met (eqs 3, 4, 6), see
 *   ./iso9613-machine-terms.ts: octave bands with the general ground method; otherwise the
 *   A-weighted estimate (general method's terms at 500 Hz by default, the alternative method
 *   of clause 7.3.2 only when chosen). Screening of any kind is D_z, counted once in
 *   A_bar = D_z − A_gr (eq. 12); a barrier and another screening on one path are refused.
 * - on-time 10·lg(η), count 10·lg n, façade +3 dB.
 *
 * Terms are signed dB added to the level (attenuations negative); `levelDb` is their sum.
 * ISO terms also carry their value as the standard defines it (`standard`).
 */
import type { Term } from './term.ts';
import { finite, oneOf } from './check.ts';
import { InputError } from './input-error.ts';
import { checkDirectivity } from './directivity.ts';
import { pointSourceSpreadingDb } from './point-source.ts';
import {
  countCorrectionDb,
  FACADE_CORRECTION_DB,
  onTimeCorrectionDb,
  screeningReductionDb,
  type ScreeningChoice,
} from './corrections.ts';
import { aWeightedTotalDb } from './standards/iec61672-1-2013.ts';
import type { Accuracy, BarrierInput, PathInput } from './standards/iso9613-2-1996/index.ts';
import { isoMachineTerms, type IsoMachineTerms } from './iso9613-machine-terms.ts';

/** The caution to show next to every prediction; the accuracy of each ISO 9613-2 figure is stated beside it. */
export const PREDICTION_CAUTION =
  'Predictions are estimates (ISO 9613-2 quotes ±3 dB up to 1 km, and states no accuracy beyond 1 km, above 30 m mean height or for screened or reflected paths); a competent acoustician and the local authority’s rules decide.';

/** Screening as a rule of thumb, an explicit dB value, or a barrier's path difference (ISO 9613-2 only). */
export type MachineScreening = ScreeningChoice | { kind: 'barrier'; pathDifferenceM: number };

/** Propagation settings for the ISO 9613-2:1996 method (everything of a path except its distance and screening). */
export type Iso9613Propagation = Omit<PathInput, 'distanceM' | 'statedDzDb'>;

export interface SingleMachineInput {
  /** A-weighted sound power level L_WA, dB. Needed unless `bandsDb` is given. */
  lwDb?: number;
  /** Eight octave-band sound power levels Lw, dB (unweighted), 63 Hz … 8 kHz. */
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

function fmt(x: number, digits = 1): string {
  return Number(x.toFixed(digits)).toString();
}

function screeningLabel(s: MachineScreening): string {
  switch (s.kind) {
    case 'top-visible':
      return 'Screening, top of machine just visible (rule of thumb)';
    case 'hidden':
      return 'Screening, machine fully hidden (rule of thumb)';
    case 'explicit':
      return 'Screening, stated reduction';
    default:
      return 'Screening';
  }
}

function sourceLevel(input: SingleMachineInput, useBands: boolean): Term {
  if (!useBands && input.lwDb !== undefined) {
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
 * Predicted level L at a receiver from one machine, with its terms.
 * @example singleMachineLevel({ lwDb: 105, distanceM: 50 }).levelDb // 63.0 (Q = 2)
 */
export function singleMachineLevel(input: SingleMachineInput): SingleMachineLevel {
  const method = oneOf('method', input.method ?? 'simple', ['simple', 'iso9613-2', 'iso9613-2:1996'] as const);
  const screening: MachineScreening = input.screening ?? { kind: 'none' };
  const terms: Term[] = [];
  let basis: SingleMachineLevel['basis'];
  let iso: IsoMachineTerms | undefined;

  if (method === 'simple') {
    if (screening.kind === 'barrier') {
      throw new InputError(
        'screening',
        'barrier',
        'needs the ISO 9613-2:1996 method',
        'use a rule-of-thumb or explicit screening with the simple method',
      );
    }
    const q = checkDirectivity(input.q ?? 2);
    terms.push(sourceLevel(input, false));
    terms.push({
      key: 'spreading',
      label: `Point-source spreading 10·lg(Q/(4πr²)), Q = ${q}, r = ${fmt(input.distanceM, 2)} m`,
      db: pointSourceSpreadingDb(input.distanceM, q),
    });
    basis = 'point-source';
  } else {
    const p = input.propagation;
    if (!p)
      throw new InputError(
        'propagation',
        undefined,
        'given',
        'give heights, ground factor, temperature and humidity for the ISO 9613-2:1996 method',
      );
    const groundMethod = oneOf('ground method', p.groundMethod ?? 'general', ['general', 'alternative'] as const);
    const path: PathInput = { ...p, groundMethod, distanceM: input.distanceM };
    if (screening.kind === 'barrier') {
      if (p.barrier) throw new InputError('screening', 'barrier', 'is given twice', 'describe the barrier once');
      path.barrier = { pathDifferenceM: screening.pathDifferenceM } satisfies BarrierInput;
    } else if (screening.kind !== 'none') {
      const dz = screeningReductionDb(screening);
      if (p.barrier) {
        throw new InputError(
          'screening',
          screening.kind === 'explicit' ? screening.db : screening.kind,
          'is given together with a barrier path difference',
          'screen a path once: a barrier path difference, or a rule-of-thumb or stated screening, not both',
        );
      }
      if (dz > 0) path.statedDzDb = dz;
    }
    const octave = input.bandsDb !== undefined && groundMethod === 'general';
    terms.push(sourceLevel(input, octave));
    iso = isoMachineTerms(path, octave ? input.bandsDb : undefined, input.facade === true);
    terms.push(...iso.terms);
    basis = octave ? 'iso9613-2-octave-bands' : 'iso9613-2-broadband';
  }

  const onTime = input.onTimePct ?? 100;
  terms.push({ key: 'onTime', label: `On-time ${fmt(onTime)} %`, db: onTimeCorrectionDb(onTime) });
  const count = input.count ?? 1;
  terms.push({
    key: 'count',
    label: count === 1 ? '1 unit' : `${count} identical units`,
    db: countCorrectionDb(count),
  });
  if (basis === 'point-source' && screening.kind !== 'none' && screening.kind !== 'barrier') {
    terms.push({ key: 'screening', label: screeningLabel(screening), db: -screeningReductionDb(screening) });
  }
  if (input.facade !== undefined && typeof input.facade !== 'boolean') {
    throw new InputError('façade', input.facade, 'is not accepted', 'use true (1 m in front of a façade) or false');
  }
  if (input.facade)
    terms.push({ key: 'facade', label: 'Façade reflection, 1 m in front of a façade', db: FACADE_CORRECTION_DB });

  const levelDb = terms.reduce((sum, t) => sum + t.db, 0);
  return { levelDb, terms, basis, ...(iso ? { iso, accuracy: iso.accuracy } : {}) };
}
