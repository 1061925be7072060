/**
 * The barrier term of a path screened by a barrier on the plan, and its words.
 *
 * ISO method: the path difference and distances to the edge go into the ISO 9613-2:1996
 * path (A_bar = D_z − A_gr ≥ 0, eq. 12, D_z by eq. 14 in each band or at 500 Hz).
 * Simple method (point source with Q, no ground term): the reduction is D_z of eq. 14 at
 * the 500 Hz wavelength with C2 = 20, C3 = 1 and K_met of eq. 18, capped at 20 dB — the
 * rule the broadband ISO estimate uses (clause 8: terms at 500 Hz), with nothing to subtract
 * because the simple method has no ground term.
 */
import { barrierDzDb, barrierKmet } from '../../core/standards/iso9613-2-1996/barrier.ts';
import type { ScreeningBarrier } from './barrier-screening.ts';

/** Frequency whose wavelength the simple method's barrier term uses, Hz. */
export const SIMPLE_METHOD_BARRIER_HZ = 500;

/**
 * D_z at 500 Hz for a barrier on the plan, dB (positive = reduction).
 * @example simpleMethodBarrierDb({ pathDifferenceM: 0.396, sourceToEdgeM: 10.2, edgeToReceiverM: 10.2, distanceM: 20, … }) // 11.2
 */
export function simpleMethodBarrierDb(
  barrier: Pick<ScreeningBarrier, 'pathDifferenceM' | 'sourceToEdgeM' | 'edgeToReceiverM' | 'distanceM'>,
): number {
  const kmet = barrierKmet(barrier.sourceToEdgeM, barrier.edgeToReceiverM, barrier.distanceM, barrier.pathDifferenceM);
  return barrierDzDb({ frequencyHz: SIMPLE_METHOD_BARRIER_HZ, pathDifferenceM: barrier.pathDifferenceM, kmet });
}

/** The barrier and its geometry in words: name, z and the distances of eq. 16. */
export function barrierWords(b: ScreeningBarrier): string {
  return `barrier “${b.barrierName}” on the plan, top ${b.topHeightM} m, path difference z = ${b.pathDifferenceM.toFixed(3)} m (eq. 16: d_ss ${b.sourceToEdgeM.toFixed(1)} m, d_sr ${b.edgeToReceiverM.toFixed(1)} m, a ${b.lateralM.toFixed(1)} m)`;
}
