/**
 * What the plan draws of a level map: the bands as SVG paths with their colours, the limit
 * line, and the text beside each receiver. Built from the ledger's numbers; formatting only.
 */
import type { LevelGrid } from '../../ledger/map/level-grid.ts';
import { isolineAt, levelBands } from '../../ledger/map/contours.ts';
import { bandColour } from '../../io/map/level-colours.ts';
import { ringsPath } from './plan-view.ts';

export interface MapLayer {
  /** The grid drawn; absent when only the receivers' levels are shown. */
  grid?: LevelGrid;
  bands: { levelDb: number; d: string; colour: string }[];
  limit?: { levelDb: number; d: string; words: string };
  /** Text beside each receiver: its level and margin in the phase's own period. */
  receiverCells: Map<string, { text: string; over: boolean }>;
}

/** The layer of a grid at the given isoline levels, with a limit line when given. */
export function mapLayer(
  grid: LevelGrid,
  levels: readonly number[],
  limit: { levelDb: number; words: string } | undefined,
  receiverCells: MapLayer['receiverCells'],
): MapLayer {
  const bands = levelBands(grid, levels).map((b, k, all) => ({
    levelDb: b.levelDb,
    d: ringsPath(b.polygons),
    colour: bandColour(k, all.length),
  }));
  const layer: MapLayer = { grid, bands, receiverCells };
  if (limit) layer.limit = { ...limit, d: ringsPath(isolineAt(grid, limit.levelDb).polygons) };
  return layer;
}
