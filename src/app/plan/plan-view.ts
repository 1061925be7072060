/**
 * The plan's frame on screen: the site-grid rectangle shown, and the spacing of its grid
 * lines. The SVG draws a site point (x, y) at (x, −y) so north is up.
 */
export { fitBox, placedPoints, type SiteBox } from '../../ledger/map/map-bounds.ts';
export { ringsPath } from '../../io/map/rings-path.ts';

/** A round grid-line spacing giving about eight to twenty lines across `span` metres. */
export function gridStep(span: number): number {
  const raw = span / 10;
  const p = 10 ** Math.floor(Math.log10(raw));
  for (const m of [1, 2, 5, 10]) if (m * p >= raw) return m * p;
  return 10 * p;
}

/** Grid-line positions from `min` to `max` every `step`. */
export function ticks(min: number, max: number, step: number): number[] {
  const out: number[] = [];
  for (let v = Math.ceil(min / step) * step; v <= max && out.length < 200; v += step)
    out.push(Math.round(v * 1e6) / 1e6);
  return out;
}
