/**
 * The level map last drawn on the site plan, as an SVG picture, so the printed report can
 * show it. Kept for the session only (a map is recomputed from the project when needed).
 */
class LastMap {
  /** Project name, phase and the SVG text's data URL, or undefined when no map was drawn. */
  current = $state<{ projectName: string; caption: string; dataUrl: string } | undefined>();
}

export const lastMap = new LastMap();
