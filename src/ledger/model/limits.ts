/**
 * A receiver's limit in a period: the one look-up every computation that compares a level with a limit uses
 * (the matrix, rankings, the optimiser, the level map's limit line, the distance curve, the spread model).
 */
import type { Receiver } from './model.ts';
import { own } from './own.ts';

/**
 * The limit LAeq,T of a receiver in a period, dB; undefined when none is set or what is stored is not a finite
 * number (validation names it). Reads only the receiver's own keys (a period id "__proto__" finds nothing). O(1).
 * @example limitOf({ limitsDb: { day: 75 } }, 'day') // 75
 */
export function limitOf(receiver: Pick<Receiver, 'limitsDb'> | undefined, periodId: string): number | undefined {
  const limit = own(receiver?.limitsDb, periodId);
  return typeof limit === 'number' && Number.isFinite(limit) ? limit : undefined;
}
