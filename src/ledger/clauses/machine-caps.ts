/**
 * Per-machine caps of a tender: each machine's A-weighted sound power level L_WA at most a
 * figure, or its sound pressure level at a stated distance at most a figure.
 *
 * The pressure level at distance d is worked under the simple method with hemispherical
 * spreading (a point source on hard ground, Q = 2): Lp = L_WA + 10·lg(2/(4π·d²))
 * (the point-source relation; at 10 m this is L_WA − 28.0 dB, exactly −27.98).
 * The L_WA compared is the one the project rates the machine on (./../rating.ts: the
 * guaranteed value L + K by default, or the measured L), a stand-in marked as such.
 */
import type { Candidate, ProjectSettings } from '../model/model.ts';
import type { Clause } from './clause.ts';
import { CLAUSE_DEFAULTS } from './clause.ts';
import { ratedSoundPower, type PermissibleLookup } from '../rating/rating.ts';
import { pointSourceLevelDb } from '../../core/point-source.ts';
import { LIMIT_TOLERANCE_DB } from '../optimise/outcome.ts';

/** Directivity of the cap's stated distance: hemispherical spreading. */
export const CAP_DIRECTIVITY_Q = 2;

/** A machine's figure against a cap. */
export interface CapFigure {
  /** The figure compared with the cap, dB (L_WA, or Lp at the distance); NaN when unknown. */
  figureDb: number;
  /** The L_WA it comes from, dB. */
  lwaDb: number;
  /** Words: "LWA 104.0 dB (guaranteed 104.0)" or "Lp at 10 m 76.0 dB = LWA 104.0 − 28.0". */
  explanation: string;
  standIn: boolean;
}

/**
 * Sound pressure level at a distance from a machine's L_WA under hemispherical spreading:
 * Lp = L_WA + 10·lg(2/(4π·d²)).
 * @example pressureAtDistanceDb(100, 10) // 72.02
 */
export function pressureAtDistanceDb(lwaDb: number, distanceM: number): number {
  return pointSourceLevelDb(lwaDb, distanceM, CAP_DIRECTIVITY_Q);
}

/** The figure of a candidate under an `lwa-cap` or `lp-cap` clause. */
export function capFigure(
  clause: Clause,
  candidate: Candidate,
  settings: ProjectSettings,
  permissible?: PermissibleLookup,
): CapFigure {
  const rated = ratedSoundPower(candidate, settings, permissible);
  const lwa = rated.lwaDb;
  const standIn = rated.standIn;
  const mark = standIn ? ', a stand-in' : '';
  if (!Number.isFinite(lwa))
    return { figureDb: NaN, lwaDb: lwa, explanation: `not computed: ${rated.explanation}`, standIn };
  if (clause.kind === 'lp-cap') {
    const d = clause.distanceM ?? CLAUSE_DEFAULTS.distanceM;
    if (!Number.isFinite(d) || d <= 0)
      return { figureDb: NaN, lwaDb: lwa, explanation: 'not computed: the distance is not readable', standIn };
    const lp = pressureAtDistanceDb(lwa, d);
    return {
      figureDb: lp,
      lwaDb: lwa,
      explanation: `Lp at ${fmtM(d)} m ${lp.toFixed(1)} dB = LWA ${lwa.toFixed(1)} ${signed(lp - lwa)} (hemispherical spreading; ${rated.explanation}${mark})`,
      standIn,
    };
  }
  return { figureDb: lwa, lwaDb: lwa, explanation: `LWA ${lwa.toFixed(1)} dB (${rated.explanation}${mark})`, standIn };
}

/** True when a figure meets a cap: at most the cap (a cap exactly met passes). */
export function meetsCap(figureDb: number, capDb: number): boolean {
  return figureDb <= capDb + LIMIT_TOLERANCE_DB;
}

function fmtM(x: number): string {
  return Number.isInteger(x) ? String(x) : x.toFixed(1);
}
function signed(x: number): string {
  return x < 0 ? `− ${(-x).toFixed(1)}` : `+ ${x.toFixed(1)}`;
}
