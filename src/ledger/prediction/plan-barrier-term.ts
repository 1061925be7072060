/**
 * The words of a path screened by a barrier on the plan. The barrier's term itself is the
 * prediction engine's (../../core/path-prediction.ts): under the ISO method the path
 * difference and distances to the edge go into the ISO 9613-2:1996 path (A_bar = D_z − A_gr ≥ 0,
 * eq. 12, D_z by eq. 14 in each band or at 500 Hz); under the simple method D_z at 500 Hz
 * (`simpleMethodBarrierDb`, re-exported here).
 */
import type { ScreeningBarrier } from './barrier-screening.ts';

export { simpleMethodBarrierDb, SIMPLE_METHOD_BARRIER_HZ } from '../../core/path-prediction.ts';

/** The barrier and its geometry in words: name, z and the distances of eq. 16. */
export function barrierWords(b: ScreeningBarrier): string {
  return `barrier “${b.barrierName}” on the plan, top ${b.topHeightM} m, path difference z = ${b.pathDifferenceM.toFixed(3)} m (eq. 16: d_ss ${b.sourceToEdgeM.toFixed(1)} m, d_sr ${b.edgeToReceiverM.toFixed(1)} m, a ${b.lateralM.toFixed(1)} m)`;
}
