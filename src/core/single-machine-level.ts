/**
 * Predicted level of one machine (or n identical ones) at one receiver, with every term shown.
 *
 * The only place that combines the terms for one machine; the command line's `level`, the
 * app's quick calculation and the ledger's evaluation all call it.
 *
 *   L = L_W + propagation + on-time + count − screening + façade
 *
 * - `simple`: propagation = 10·lg(Q/(4πr²)) (point source, common practice).
 * - `iso9613-2` (ISO 9613-2:1996): with eight octave-band Lw and the general ground method, each
 *   band is propagated (A_div, A_atm, A_gr, A_bar), A-weighted (IEC 61672-1:2013) and summed;
 *   with A-weighted L_WA only (or the alternative ground method), the broadband estimate
 *   (A_div, A_atm at 500 Hz, A_gr eq. 10, D_Ω eq. 11, A_bar). C_met applies in both.
 * - on-time 10·lg(η), count 10·lg n, screening (rule of thumb or explicit dB), façade +3 dB.
 *
 * Terms are signed dB added to the level (attenuations negative); `levelDb` is their sum.
 * With octave bands, each band term is shown as the change it makes to the A-weighted total,
 * applied in the order A_div, A_atm, A_gr, A_bar, so the shown terms still add up.
 * Predictions are estimates: ISO 9613-2 quotes ±3 dB for broadband levels up to 1 km.
 */
import type { Term } from './term.ts';
import { dbSum } from './decibel.ts';
import { finite, oneOf } from './check.ts';
import { InputError } from './input-error.ts';
import { checkOctaveBands } from './octave-bands.ts';
import { checkDirectivity } from './directivity.ts';
import { pointSourceSpreadingDb } from './point-source.ts';
import {
  countCorrectionDb,
  FACADE_CORRECTION_DB,
  onTimeCorrectionDb,
  screeningReductionDb,
  type ScreeningChoice,
} from './corrections.ts';
import { A_WEIGHTING_OCTAVE_DB, aWeightedTotalDb } from './standards/iec61672-1-2013.ts';
import {
  broadbandPathAttenuation,
  meteorologicalCorrectionDb,
  octaveBandPathAttenuation,
  projectedDistanceM,
  type BarrierInput,
  type OctaveBandAttenuation,
  type PathInput,
} from './standards/iso9613-2-1996/index.ts';

/** The caution to show next to every prediction. */
export const PREDICTION_CAUTION =
  'Predictions are estimates (ISO 9613-2 quotes ±3 dB); a competent acoustician and the local authority’s rules decide.';

/** Screening as a rule of thumb, an explicit dB value, or a barrier's path difference (ISO 9613-2 only). */
export type MachineScreening = ScreeningChoice | { kind: 'barrier'; pathDifferenceM: number };

/** Propagation settings for the ISO 9613-2:1996 method (everything of a path except its distance). */
export interface Iso9613Propagation extends Omit<PathInput, 'distanceM' | 'cmet'> {
  /** Ground method: 'general' (clause 7.3.1, octave bands; the default) or 'alternative' (clause 7.3.2, A-weighted). */
  groundMethod?: 'general' | 'alternative';
  /** C_met from C0 (eqs 21, 22). */
  cmet?: { c0Db: number };
  /** C_met as a fixed value in dB (0 to 5), instead of `cmet`. */
  cmetDb?: number;
}

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

function octaveTerms(bandsDb: readonly number[], distanceM: number, p: Iso9613Propagation): Term[] {
  const bands = octaveBandPathAttenuation({ ...p, distanceM });
  const weighted = checkOctaveBands('octave-band levels', bandsDb).map((lw, i) => lw + (A_WEIGHTING_OCTAVE_DB[i] as number));
  const steps: { key: 'adiv' | 'aatm' | 'agr' | 'abar'; label: string }[] = [
    { key: 'adiv', label: 'Geometrical divergence A_div (ISO 9613-2:1996 eq. 7)' },
    { key: 'aatm', label: 'Atmospheric absorption A_atm (ISO 9613-2:1996 eq. 8, α from ISO 9613-1:1993)' },
    { key: 'agr', label: 'Ground attenuation A_gr, general method (ISO 9613-2:1996 clause 7.3.1)' },
    { key: 'abar', label: 'Barrier A_bar (ISO 9613-2:1996 clause 7.4)' },
  ];
  const terms: Term[] = [];
  let current = weighted;
  let currentTotal = dbSum(current);
  for (const step of steps) {
    if (step.key === 'abar' && !p.barrier) continue;
    current = current.map((level, i) => level - (bands[i] as OctaveBandAttenuation)[step.key]);
    const nextTotal = dbSum(current);
    terms.push({ key: step.key, label: step.label, db: nextTotal - currentTotal });
    currentTotal = nextTotal;
  }
  return terms;
}

function broadbandTerms(distanceM: number, p: Iso9613Propagation): Term[] {
  const a = broadbandPathAttenuation({ ...p, distanceM });
  const terms: Term[] = [
    { key: 'adiv', label: 'Geometrical divergence A_div (ISO 9613-2:1996 eq. 7)', db: -a.adiv },
    { key: 'aatm', label: 'Atmospheric absorption A_atm at 500 Hz (ISO 9613-2:1996 eq. 8)', db: -a.aatm },
    { key: 'agr', label: 'Ground attenuation A_gr, alternative method (ISO 9613-2:1996 eq. 10)', db: -a.agr },
    { key: 'dOmega', label: 'Ground reflection near the source D_Ω (ISO 9613-2:1996 eq. 11)', db: a.dOmega },
  ];
  if (p.barrier) terms.push({ key: 'abar', label: 'Barrier A_bar at 500 Hz (ISO 9613-2:1996 clause 7.4)', db: -a.abar });
  return terms;
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

  if (method === 'simple') {
    if (screening.kind === 'barrier') {
      throw new InputError('screening', 'barrier', 'needs the ISO 9613-2:1996 method', 'use a rule-of-thumb or explicit screening with the simple method');
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
    const p0 = input.propagation;
    if (!p0) throw new InputError('propagation', undefined, 'given', 'give heights, ground factor, temperature and humidity for the ISO 9613-2:1996 method');
    let p: Iso9613Propagation = p0;
    if (screening.kind === 'barrier') {
      if (p0.barrier) throw new InputError('screening', 'barrier', 'is given twice', 'describe the barrier once');
      p = { ...p0, barrier: { pathDifferenceM: screening.pathDifferenceM } satisfies BarrierInput };
    }
    const groundMethod = oneOf('ground method', p.groundMethod ?? 'general', ['general', 'alternative'] as const);
    const octave = input.bandsDb !== undefined && groundMethod === 'general';
    terms.push(sourceLevel(input, octave));
    if (octave) {
      terms.push(...octaveTerms(input.bandsDb as readonly number[], input.distanceM, p));
      basis = 'iso9613-2-octave-bands';
    } else {
      terms.push(...broadbandTerms(input.distanceM, p));
      basis = 'iso9613-2-broadband';
    }
    if (p.cmet !== undefined && p.cmetDb !== undefined) {
      throw new InputError('C_met', p.cmetDb, 'is given twice (as C0 and as a value)', 'give C0 or C_met, not both');
    }
    let cmet = 0;
    if (p.cmet !== undefined) {
      const dp = projectedDistanceM(input.distanceM, p.sourceHeightM, p.receiverHeightM);
      cmet = meteorologicalCorrectionDb(p.cmet.c0Db, dp, p.sourceHeightM, p.receiverHeightM);
    } else if (p.cmetDb !== undefined) {
      finite('C_met', p.cmetDb, 'a correction from 0 to 5 dB');
      if (p.cmetDb < 0 || p.cmetDb > 5) throw new InputError('C_met', p.cmetDb, 'is out of range', 'use a correction from 0 to 5 dB');
      cmet = p.cmetDb;
    }
    if (p.cmet !== undefined || p.cmetDb !== undefined) {
      terms.push({ key: 'cmet', label: 'Meteorological correction C_met (ISO 9613-2:1996 clause 8)', db: -cmet });
    }
  }

  const onTime = input.onTimePct ?? 100;
  terms.push({ key: 'onTime', label: `On-time ${fmt(onTime)} %`, db: onTimeCorrectionDb(onTime) });
  const count = input.count ?? 1;
  terms.push({ key: 'count', label: count === 1 ? '1 unit' : `${count} identical units`, db: countCorrectionDb(count) });
  if (screening.kind !== 'none' && screening.kind !== 'barrier') {
    terms.push({ key: 'screening', label: screeningLabel(screening), db: -screeningReductionDb(screening) });
  }
  if (input.facade !== undefined && typeof input.facade !== 'boolean') {
    throw new InputError('façade', input.facade, 'is not accepted', 'use true (1 m in front of a façade) or false');
  }
  if (input.facade) terms.push({ key: 'facade', label: 'Façade reflection, 1 m in front of a façade', db: FACADE_CORRECTION_DB });

  const levelDb = terms.reduce((sum, t) => sum + t.db, 0);
  return { levelDb, terms, basis };
}
