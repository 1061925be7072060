/** A named term of a prediction, so every figure can be shown and checked. */
export interface Term {
  /** Stable key, e.g. "lw", "adiv", "aatm", "agr", "abar", "dc", "onTime", "count", "workingHours", "facade", "screening", "penalty". */
  key: string;
  /** Words for the user, e.g. "Geometric divergence A_div". */
  label: string;
  /** Signed dB added to the level (attenuations are negative here). */
  db: number;
  /**
   * The term as a standard defines it, when it differs in sign from `db`: e.g. ISO 9613-2's
   * attenuation A_div = 54.5 dB is `subtracted` (db −54.5); its D_c is `added`.
   */
  standard?: { symbol: string; value: number; applied: 'added' | 'subtracted' };
}
