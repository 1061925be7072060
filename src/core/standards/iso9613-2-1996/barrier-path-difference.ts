/**
 * ISO 9613-2:1996 clause 7.4 — the path difference z over a barrier's top edge, from plan
 * positions and heights (eq. 16, single diffraction):
 *
 *   z = [(d_ss + d_sr)² + a²]^½ − d
 *
 * d_ss the distance from the source to the diffraction edge, d_sr from the edge to the
 * receiver, a the component of the source–receiver distance parallel to the edge, d the
 * direct source–receiver distance. The top edge of one straight barrier segment is taken as
 * a horizontal line at the barrier's top height over flat ground; d_ss and d_sr are the
 * perpendicular distances from source and receiver to that line, and a the distance between
 * the feet of those perpendiculars along it, so z is the shortest path over the edge less d
 * (unfold the two planes through the edge into one).
 *
 * Whether the edge screens at all (the line of sight is cut) is decided by the caller from
 * {@link TopEdgePath.clearanceM}; this module only measures.
 */
import { finite, nonNegative } from '../../check.ts';
import { segmentCrossing, type PlanXY } from '../../plan/plane.ts';

/** A point on the site grid with its height above (flat) ground, m. */
export interface PlanPoint3 extends PlanXY {
  heightM: number;
}

/** The geometry of one path over one straight top edge. */
export interface TopEdgePath {
  /** Path difference z of eq. 16, m (0 when the line of sight touches the edge). */
  pathDifferenceM: number;
  /** d_ss: source to the edge line, m. */
  sourceToEdgeM: number;
  /** d_sr: edge line to the receiver, m. */
  edgeToReceiverM: number;
  /** a: the source–receiver distance component parallel to the edge, m. */
  lateralM: number;
  /** d: direct source–receiver distance, m. */
  distanceM: number;
  /** Where the plan line source → receiver crosses the segment. */
  crossing: PlanXY;
  /**
   * Top height less the height of the line of sight where it crosses the segment in plan, m:
   * above 0 the edge cuts the line of sight, 0 it grazes it, below 0 the line of sight passes over.
   */
  clearanceM: number;
}

/** Perpendicular distance from a 3-D point to the horizontal line through e at height h with unit plan direction (ux, uy), and its foot's position along the line. */
function toEdgeLine(
  p: PlanPoint3,
  e: PlanXY,
  ux: number,
  uy: number,
  topHeightM: number,
): { distanceM: number; along: number } {
  const rx = p.x - e.x;
  const ry = p.y - e.y;
  const along = rx * ux + ry * uy;
  const acrossX = rx - along * ux;
  const acrossY = ry - along * uy;
  const dz = p.heightM - topHeightM;
  return { distanceM: Math.sqrt(acrossX * acrossX + acrossY * acrossY + dz * dz), along };
}

/**
 * The path over the top edge of the barrier segment edgeStart–edgeEnd (top at `topHeightM`
 * above ground) from source to receiver, or undefined when the plan line source → receiver
 * does not cross the segment (or the segment has no length). O(1).
 * @example topEdgePath({x:0,y:0,heightM:1}, {x:20,y:0,heightM:1}, {x:10,y:-50}, {x:10,y:50}, 3)?.pathDifferenceM // 0.396 (2·√104 − 20)
 */
export function topEdgePath(
  source: PlanPoint3,
  receiver: PlanPoint3,
  edgeStart: PlanXY,
  edgeEnd: PlanXY,
  topHeightM: number,
): TopEdgePath | undefined {
  // Checked one by one (no array per call): a level map asks this for every path and segment.
  const grid = 'a site-grid coordinate in metres';
  finite('source x', source.x, grid);
  finite('source y', source.y, grid);
  finite('receiver x', receiver.x, grid);
  finite('receiver y', receiver.y, grid);
  finite('barrier x', edgeStart.x, grid);
  finite('barrier y', edgeStart.y, grid);
  finite('barrier x', edgeEnd.x, grid);
  finite('barrier y', edgeEnd.y, grid);
  nonNegative('source height', source.heightM, 'a height above ground in metres of 0 or more');
  nonNegative('receiver height', receiver.heightM, 'a height above ground in metres of 0 or more');
  nonNegative('barrier height', topHeightM, 'a barrier top height in metres of 0 or more');
  // The plan crossing first: most segments a path is tested against are not crossed.
  const crossing = segmentCrossing(source, receiver, edgeStart, edgeEnd);
  if (!crossing) return undefined;
  const length = Math.hypot(edgeEnd.x - edgeStart.x, edgeEnd.y - edgeStart.y);
  if (length === 0) return undefined;
  const ux = (edgeEnd.x - edgeStart.x) / length;
  const uy = (edgeEnd.y - edgeStart.y) / length;
  const s = toEdgeLine(source, edgeStart, ux, uy, topHeightM);
  const r = toEdgeLine(receiver, edgeStart, ux, uy, topHeightM);
  const lateralM = Math.abs(r.along - s.along);
  const distanceM = Math.hypot(receiver.x - source.x, receiver.y - source.y, receiver.heightM - source.heightM);
  const overEdge = Math.hypot(s.distanceM + r.distanceM, lateralM);
  // The path over the edge is never shorter than the direct one; rounding could make z −1e-15.
  const pathDifferenceM = Math.max(0, overEdge - distanceM);
  const sightHeightM = source.heightM + crossing.t * (receiver.heightM - source.heightM);
  return {
    pathDifferenceM,
    sourceToEdgeM: s.distanceM,
    edgeToReceiverM: r.distanceM,
    lateralM,
    distanceM,
    crossing: crossing.at,
    clearanceM: topHeightM - sightHeightM,
  };
}
