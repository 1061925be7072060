/** A named term of a prediction, so every figure can be shown and checked. */
export interface Term {
  /** Stable key, e.g. "lw", "adiv", "aatm", "agr", "abar", "dOmega", "onTime", "count", "workingHours", "facade", "screening", "penalty". */
  key: string;
  /** Words for the user, e.g. "Geometric divergence A_div". */
  label: string;
  /** Signed dB added to the level (attenuations are negative here). */
  db: number;
}
