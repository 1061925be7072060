/**
 * ISO 9613-2:1996 clause 8 — meteorological correction C_met for long-term average levels:
 * L_AT(LT) = L_AT(DW) − C_met (eq. 6).
 */
import { inRange, positive } from '../../check.ts';
import { checkHeight } from './geometry.ts';

/**
 * Meteorological correction, dB:
 * C_met = 0 for d_p ≤ 10(h_s + h_r) (eq. 21); C_met = C0·[1 − 10(h_s + h_r)/d_p] otherwise (eq. 22).
 * C0 (dB) depends on the local weather statistics; 0 gives the downwind (worst-case) level.
 * The standard notes that C0 ranges in practice from 0 to about 5 dB (values above 2 dB are
 * exceptional); that range is accepted here.
 * @example meteorologicalCorrectionDb(2, 500, 2, 4) // 1.76
 */
export function meteorologicalCorrectionDb(
  c0Db: number,
  projectedDistanceM: number,
  sourceHeightM: number,
  receiverHeightM: number,
): number {
  const c0 = inRange('C0', c0Db, 0, 5, 'a factor C0 from 0 to 5 dB');
  const dp = positive(
    'projected distance',
    projectedDistanceM,
    'a projected source–receiver distance in metres greater than 0',
  );
  const span = 10 * (checkHeight('source height', sourceHeightM) + checkHeight('receiver height', receiverHeightM));
  return dp <= span ? 0 : c0 * (1 - span / dp);
}
