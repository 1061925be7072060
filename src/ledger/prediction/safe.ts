/**
 * Calls into the core that must not stop an evaluation: an input the core refuses gives
 * NaN (and its message) instead of a throw, so one bad cell leaves the rest computed.
 */
import { dbSum } from '../../core/decibel.ts';

/** The result of `f`, or NaN and the error's message when it throws. */
export function attempt(f: () => number): { value: number; error?: string } {
  try {
    return { value: f() };
  } catch (e) {
    return { value: NaN, error: e instanceof Error ? e.message : String(e) };
  }
}

/** Energetic sum of levels (via the core's dbSum); NaN when any level is NaN. O(n). */
export function dbSumOrNaN(levelsDb: readonly number[]): number {
  for (const l of levelsDb) if (Number.isNaN(l)) return NaN;
  return dbSum(levelsDb);
}
