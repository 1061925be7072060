/**
 * Filled bands and isolines of a level grid, by marching squares (d3-contour), in site-grid
 * metres. A band at threshold L is the area where the level is L or more; its boundary is
 * the isoline at L, interpolated linearly between grid points. Points not computed (NaN)
 * count as below every threshold.
 */
import { contours as d3Contours } from 'd3-contour';
import type { LevelGrid } from './level-grid.ts';

/** Default spacing of the isolines, dB. */
export const DEFAULT_ISOLINE_STEP_DB = 5;

/** The region at or above one level: rings of [x, y] site-grid points (outer rings and holes). */
export interface LevelBand {
  levelDb: number;
  /** Polygons, each a list of rings, each a list of [x, y] in metres. */
  polygons: [number, number][][][];
}

/**
 * Thresholds every `stepDb` from the grid's lowest to its highest computed level, on whole
 * multiples of the step (e.g. 45, 50, 55 … for 5 dB). At most 60 thresholds.
 * @example isolineLevels(grid with levels 47.2 … 71.9, 5) // [50, 55, 60, 65, 70]
 */
export function isolineLevels(grid: Pick<LevelGrid, 'levelsDb'>, stepDb: number = DEFAULT_ISOLINE_STEP_DB): number[] {
  let min = Infinity;
  let max = -Infinity;
  for (const v of grid.levelsDb) {
    if (!Number.isFinite(v)) continue;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  if (!(max >= min) || !(stepDb > 0)) return [];
  const out: number[] = [];
  for (let l = Math.ceil(min / stepDb) * stepDb; l <= max && out.length < 60; l += stepDb)
    out.push(Math.round(l * 1000) / 1000);
  return out;
}

/** Grid coordinates of d3-contour (a value at index i sits at i + 0.5) to site-grid metres. */
function toSite(grid: LevelGrid, [gx, gy]: [number, number]): [number, number] {
  return [grid.x0 + (gx - 0.5) * grid.spacingM, grid.y0 + (gy - 0.5) * grid.spacingM];
}

/**
 * The bands at each level, in site-grid metres. O(points × levels).
 */
export function levelBands(grid: LevelGrid, levels: readonly number[]): LevelBand[] {
  if (grid.nx < 2 || grid.ny < 2 || levels.length === 0) return [];
  const generator = d3Contours()
    .size([grid.nx, grid.ny])
    .thresholds([...levels]);
  return generator(grid.levelsDb).map((m) => ({
    levelDb: m.value,
    polygons: m.coordinates.map((polygon) => polygon.map((ring) => ring.map((p) => toSite(grid, p)))),
  }));
}

/** The single isoline at `levelDb` (e.g. a receiver's limit), in site-grid metres. O(points). */
export function isolineAt(grid: LevelGrid, levelDb: number): LevelBand {
  if (grid.nx < 2 || grid.ny < 2 || !Number.isFinite(levelDb)) return { levelDb, polygons: [] };
  const m = d3Contours().size([grid.nx, grid.ny]).contour(grid.levelsDb, levelDb);
  return { levelDb, polygons: m.coordinates.map((polygon) => polygon.map((ring) => ring.map((p) => toSite(grid, p)))) };
}
