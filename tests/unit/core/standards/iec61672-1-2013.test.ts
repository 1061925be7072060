import { describe, expect, it } from 'vitest';
import {
  A_WEIGHTING_OCTAVE_DB,
  aWeightedBandsDb,
  aWeightedTotalDb,
} from '../../../../src/core/standards/iec61672-1-2013.ts';
import { InputError } from '../../../../src/core/input-error.ts';

/**
 * IEC 61672-1:2013 Table 3, frequency weighting A at the octave-band nominal frequencies,
 * dB, as printed (one decimal).
 */
const TABLE_3_A_WEIGHTING: [hz: number, aDb: number][] = [
  [63, -26.2],
  [125, -16.1],
  [250, -8.6],
  [500, -3.2],
  [1000, 0.0],
  [2000, 1.2],
  [4000, 1.0],
  [8000, -1.1],
];

describe('A_WEIGHTING_OCTAVE_DB', () => {
  it.each(TABLE_3_A_WEIGHTING.map(([hz, a], i) => [hz, a, i] as const))('at %s Hz is %s dB', (_hz, a, i) => {
    expect(Math.abs((A_WEIGHTING_OCTAVE_DB[i] as number) - a)).toBeLessThanOrEqual(0.05); // IEC 61672-1:2013 Table 3
  });
});

describe('aWeightedTotalDb', () => {
  it('of eight bands each 100 dB after A-weighting is 109.03 dB', () => {
    // common practice: eight equal levels add 10·lg 8 = 9.03 dB; weights from IEC 61672-1:2013 Table 3
    const bands = TABLE_3_A_WEIGHTING.map(([, a]) => 100 - a);
    expect(aWeightedTotalDb(bands)).toBeCloseTo(109.03, 2);
  });
  it('of a single 1 kHz tone is the tone level', () => {
    // IEC 61672-1:2013 Table 3: A-weighting is 0 dB at 1 kHz
    expect(aWeightedTotalDb([-200, -200, -200, -200, 90, -200, -200, -200])).toBeCloseTo(90, 6);
  });
  it('aWeightedBandsDb of 63 Hz at 90 dB is 63.8 dB(A)', () => {
    expect(aWeightedBandsDb([90, 0, 0, 0, 0, 0, 0, 0])[0]).toBeCloseTo(63.8, 6); // IEC 61672-1:2013 Table 3: −26.2 dB at 63 Hz
  });
  it.each([[[1, 2, 3]], [[1, 2, 3, 4, 5, 6, 7, NaN]]])('aWeightedTotalDb(%j) throws an InputError', (bands) => {
    expect(() => aWeightedTotalDb(bands)).toThrow(InputError);
  });
});
