/** The rounding rule of Directive 2000/14/EC's Article 12 table. */

/**
 * Rounding rule of the Article 12 table: to the nearest integer, below .5 down, .5 and above up.
 * @example roundPermissible(97.49) // 97; roundPermissible(97.5) // 98
 */
export function roundPermissible(levelDb: number): number {
  return Math.floor(levelDb + 0.5 + 1e-9);
}
