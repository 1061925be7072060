/**
 * Directivity factor Q of a point source (common practice; textbook):
 * 1 free field (sphere), 2 on hard ground (hemisphere), 4 ground and one wall, 8 a corner.
 */
import { InputError } from './input-error.ts';

export type DirectivityFactor = 1 | 2 | 4 | 8;

/** The accepted values of Q. */
export const DIRECTIVITY_FACTORS: readonly DirectivityFactor[] = [1, 2, 4, 8];

/** Checks a directivity factor Q and returns it typed. */
export function checkDirectivity(q: number, input = 'directivity Q'): DirectivityFactor {
  if (!(DIRECTIVITY_FACTORS as readonly number[]).includes(q)) {
    throw new InputError(
      input,
      q,
      'is not accepted',
      'use 1 free field, 2 on hard ground, 4 ground and a wall, or 8 a corner',
    );
  }
  return q as DirectivityFactor;
}
