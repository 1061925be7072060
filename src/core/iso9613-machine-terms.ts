/**
 * One machine's propagation under ISO 9613-2:1996, as the standard writes it:
 * L_AT(DW) = L_W + D_c − A (eq. 3), A = A_div + A_atm + A_gr + A_bar (eq. 4), then
 * L_AT(LT) = L_AT(DW) − C_met (eq. 6). Every A term is an attenuation (positive lowers the
 * level, A_gr may be negative over hard ground), D_c a correction that is added.
 *
 * - With eight octave-band Lw and the general ground method: a table band × term
 *   (Lw, D_c, A_div, A_atm, A_gr, A_bar, A, L_p, A-weighting), summed energetically to the
 *   A-weighted level. No single A-weighted "A_div" or "A_gr" is reported: such a figure
 *   would depend on the order the terms were applied and is not the standard's term.
 * - With L_WA only (or the alternative ground method): the A-weighted estimate's terms, the
 *   general method's at 500 Hz by default, eq. 10 with D_Ω (part of D_c) when chosen.
 * Screening is D_z (a barrier's eq. 14, or a rule of thumb / stated reduction taken as D_z),
 * counted once: A_bar = D_z − A_gr, not below 0 (eq. 12).
 */
import type { Term } from './term.ts';
import { dbSum } from './decibel.ts';
import { checkOctaveBands } from './octave-bands.ts';
import { A_WEIGHTING_OCTAVE_DB } from './standards/iec61672-1-2013.ts';
import {
  aWeightedPathAttenuation,
  octaveBandPathAttenuation,
  pathAccuracy,
  pathCmetDb,
  type Accuracy,
  type AWeightedAttenuation,
  type GroundMethod,
  type PathInput,
} from './standards/iso9613-2-1996/index.ts';

/** The assembly of an ISO 9613-2:1996 level, in words a reviewer can follow. */
export const ISO_ASSEMBLY =
  'Lp = Lw + D_c − A − C_met, A = A_div + A_atm + A_gr + A_bar (ISO 9613-2:1996 eqs 3, 4, 6): A terms are attenuations (positive lowers the level; A_gr may be negative over hard ground), D_c = D_I + D_Ω is added.';

/** Ground factor below which ground is not "mostly porous" (clause 7.3.2; the threshold 0.5 is our reading). */
export const MOSTLY_POROUS_G = 0.5;

/** One octave band of the table, dB, with the standard's signs. */
export interface IsoBandRow {
  nominalHz: number;
  /** Sound power level of the band, unweighted. */
  lw: number;
  /** D_c of the band (0: omnidirectional source; the general method counts the ground reflection in A_gr). */
  dc: number;
  adiv: number;
  aatm: number;
  agr: number;
  abar: number;
  /** D_z of the band when screened. */
  dz?: number;
  /** A = A_div + A_atm + A_gr + A_bar. */
  a: number;
  /** L_p = L_w + D_c − A, unweighted. */
  lp: number;
  /** A-weighting of the band (IEC 61672-1:2013). */
  aWeighting: number;
  /** L_p + A-weighting. */
  lpA: number;
}

/** The A-weighted estimate's terms, dB, with the standard's signs (as the path reports them). */
export type IsoAWeightedTerms = Pick<AWeightedAttenuation, 'adiv' | 'aatm' | 'agr' | 'abar' | 'dz' | 'dc' | 'dOmega'>;

export interface IsoMachineTerms {
  groundMethod: GroundMethod;
  /** Terms that add up (with L_W first) to the level before the working-day corrections. */
  terms: Term[];
  /** The A-weighted estimate's terms (absent with octave bands). */
  aWeighted?: IsoAWeightedTerms;
  /** The band table (octave-band mode only). */
  bands?: IsoBandRow[];
  /** A-weighted L_p from the bands, before C_met (octave-band mode only). */
  bandsLevelDb?: number;
  /** C_met, dB, subtracted (eqs 21, 22). */
  cmet: number;
  accuracy: Accuracy;
  /** Warnings about the method chosen (e.g. the alternative ground method over hard ground). */
  warnings: string[];
}

const EQ = 'ISO 9613-2:1996';

/** A term the standard subtracts; labels read "<symbol> <words>", equation numbers those of ISO 9613-2:1996. */
function attenuationTerm(key: string, symbol: string, words: string, value: number): Term {
  return { key, label: `${symbol} ${words}`, db: -value, standard: { symbol, value, applied: 'subtracted' } };
}

/** The warning when the alternative ground method is chosen over ground that is not mostly porous. */
export function alternativeOverHardGroundWarning(groundFactor: number): string {
  return `Alternative ground method (${EQ} clause 7.3.2) chosen over ground with G = ${groundFactor}: the standard meant it for ground that is mostly porous; the general method (clause 7.3.1) gives hard ground its reflection (A_gr down to −3 dB).`;
}

/**
 * The ISO 9613-2:1996 propagation of one machine. `bandsDb` given and the general ground
 * method: octave bands; otherwise the A-weighted estimate. `screened` and `reflected` feed
 * the accuracy notes (a façade is a reflection). `computed`: the A-weighted estimate of this
 * path already computed (by the prediction engine, ./path-prediction.ts), labelled here
 * without computing it again. Throws InputError on bad input. O(8).
 */
export function isoMachineTerms(
  path: PathInput,
  bandsDb: readonly number[] | undefined,
  reflected: boolean,
  computed?: AWeightedAttenuation,
): IsoMachineTerms {
  const groundMethod: GroundMethod = path.groundMethod ?? 'general';
  const warnings =
    groundMethod === 'alternative' && path.groundFactor < MOSTLY_POROUS_G
      ? [alternativeOverHardGroundWarning(path.groundFactor)]
      : [];
  const accuracyOf = () =>
    pathAccuracy({
      distanceM: path.distanceM,
      sourceHeightM: path.sourceHeightM,
      receiverHeightM: path.receiverHeightM,
      screened: path.barrier !== undefined || (path.statedDzDb ?? 0) > 0,
      reflected,
      temperatureC: path.temperatureC,
      humidityPct: path.humidityPct,
      ...(path.pressureKPa === undefined ? {} : { pressureKPa: path.pressureKPa }),
    });
  const cmetTerm = (cmet: number): Term[] =>
    path.cmet
      ? [
          attenuationTerm(
            'cmet',
            'C_met',
            `meteorological correction, C0 = ${path.cmet.c0Db} dB (${EQ} eqs 21, 22)`,
            cmet,
          ),
        ]
      : [];

  if (bandsDb !== undefined && groundMethod === 'general') {
    const lw = checkOctaveBands('octave-band levels', bandsDb);
    const rows: IsoBandRow[] = octaveBandPathAttenuation(path).map((b, i) => {
      const aWeighting = A_WEIGHTING_OCTAVE_DB[i] as number;
      const lp = (lw[i] as number) + 0 - b.total;
      return {
        nominalHz: b.nominalHz,
        lw: lw[i] as number,
        dc: 0,
        adiv: b.adiv,
        aatm: b.aatm,
        agr: b.agr,
        abar: b.abar,
        ...(b.dz === undefined ? {} : { dz: b.dz }),
        a: b.total,
        lp,
        aWeighting,
        lpA: lp + aWeighting,
      };
    });
    const lwa = dbSum(lw.map((l, i) => l + (A_WEIGHTING_OCTAVE_DB[i] as number)));
    const bandsLevelDb = dbSum(rows.map((r) => r.lpA));
    const cmet = pathCmetDb(path);
    const terms: Term[] = [
      {
        key: 'octavePath',
        label: `Octave bands: L_p = L_w + D_c − A per band (band table), A-weighted and summed, less L_WA (not a term of ${EQ})`,
        db: bandsLevelDb - lwa,
      },
      ...cmetTerm(cmet),
    ];
    return { groundMethod, terms, bands: rows, bandsLevelDb, cmet, accuracy: accuracyOf(), warnings };
  }

  const a = computed ?? aWeightedPathAttenuation(path);
  const general = a.groundMethod === 'general';
  const terms: Term[] = [
    {
      key: 'dc',
      label: general
        ? 'D_c directivity correction D_I + D_Ω = 0 (omnidirectional; general method: reflection in A_gr)'
        : `D_c directivity correction D_I + D_Ω, D_I = 0, D_Ω = ${a.dOmega.toFixed(2)} dB (${EQ} eq. 11)`,
      db: a.dc,
      standard: { symbol: 'D_c', value: a.dc, applied: 'added' },
    },
    attenuationTerm('adiv', 'A_div', `geometrical divergence (${EQ} eq. 7)`, a.adiv),
    attenuationTerm('aatm', 'A_atm', `atmospheric absorption at 500 Hz (${EQ} eq. 8)`, a.aatm),
    attenuationTerm(
      'agr',
      'A_gr',
      general
        ? `ground, general method at 500 Hz, G = ${path.groundFactor} (${EQ} Table 3)`
        : `ground, alternative method (${EQ} eq. 10)`,
      a.agr,
    ),
  ];
  if (a.dz !== undefined) {
    terms.push(
      attenuationTerm(
        'abar',
        'A_bar',
        `screening D_z − A_gr = ${a.dz.toFixed(1)} − (${a.agr.toFixed(1)}), not below 0 (${EQ} eq. 12)`,
        a.abar,
      ),
    );
  }
  terms.push(...cmetTerm(a.cmet));
  const aWeighted: IsoAWeightedTerms = {
    adiv: a.adiv,
    aatm: a.aatm,
    agr: a.agr,
    abar: a.abar,
    ...(a.dz === undefined ? {} : { dz: a.dz }),
    dc: a.dc,
    dOmega: a.dOmega,
  };
  return { groundMethod: a.groundMethod, terms, aWeighted, cmet: a.cmet, accuracy: accuracyOf(), warnings };
}
