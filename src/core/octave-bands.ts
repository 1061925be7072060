/**
 * The eight octave bands used throughout: nominal mid-band frequencies 63 Hz … 8 kHz
 * (IEC 61260-1; ISO 9613-2:1996 works in these bands).
 */
import { InputError } from './input-error.ts';
import { finite } from './check.ts';

/** Nominal octave-band mid-band frequencies, Hz, in the order every band array uses. */
export const OCTAVE_BANDS_NOMINAL_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000] as const;

export type NominalOctaveHz = (typeof OCTAVE_BANDS_NOMINAL_HZ)[number];

/** Checks that a list holds exactly eight finite levels (63 Hz … 8 kHz) and returns a copy. */
export function checkOctaveBands(input: string, bandsDb: readonly number[]): number[] {
  if (!Array.isArray(bandsDb) || bandsDb.length !== OCTAVE_BANDS_NOMINAL_HZ.length) {
    throw new InputError(input, bandsDb, 'is not eight octave bands', 'give eight levels in dB, 63 Hz to 8 kHz');
  }
  return bandsDb.map((v, i) => finite(`${input} at ${OCTAVE_BANDS_NOMINAL_HZ[i]} Hz`, v, 'a level in dB'));
}
