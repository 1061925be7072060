/**
 * The level map's colour scale, our own: nine steps from pale sand to deep indigo whose
 * lightness falls steadily (so it reads in grey and by colour-blind users: order is carried
 * by lightness, and the hues avoid a red–green contrast). Louder is darker. A band's colour
 * is chosen by its place among the map's thresholds, not by computing with decibels.
 */
export const LEVEL_COLOURS = [
  '#fbf3d5',
  '#f1dfa0',
  '#d9c77a',
  '#a9b36e',
  '#74a07a',
  '#4c8484',
  '#3b6488',
  '#36457c',
  '#2a2358',
] as const;

/** The colour of the k-th of n bands (0 the quietest). */
export function bandColour(k: number, n: number): string {
  if (n <= 1) return LEVEL_COLOURS[4];
  const i = Math.round((k / (n - 1)) * (LEVEL_COLOURS.length - 1));
  return LEVEL_COLOURS[Math.max(0, Math.min(LEVEL_COLOURS.length - 1, i))] as string;
}
