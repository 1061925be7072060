/**
 * Where on the site grid a duty's sound is taken to come from, seen from one receiver.
 *
 * A point location is its own source point. A line (e.g. a trench) or an area (where a
 * machine roams) is represented by one point per receiver, chosen by the duty's
 * `distanceBy`: `nearest` the point of the line or area nearest the receiver in plan (the
 * worst case for distance alone; a receiver inside an area is at horizontal distance 0),
 * `centroid` the centroid of the line (length-weighted) or of the area (area-weighted),
 * the same for every receiver. Distances stated per receiver have no source point.
 */
import type { DutyLocation, LineLocation, PolygonLocation, SitePoint } from '../model/model.ts';
import { nearestInPolygon, nearestOnPolyline, polygonCentroid, polylineCentroid } from '../../core/plan/plane.ts';

/** How the source point was chosen, in words for the assumptions and a path's terms. */
export const DISTANCE_BY_WORDS = {
  nearest: 'nearest point of the work area to the receiver (worst case for distance)',
  centroid: 'centroid of the work area (representative point)',
} as const;

/**
 * The source point of a duty's location for a receiver at `receiver`, or undefined when the
 * location is a table of stated distances. O(vertices).
 * @example sourcePoint({ kind: 'polygon', points: [{x:0,y:0},{x:10,y:0},{x:10,y:10},{x:0,y:10}], distanceBy: 'nearest' }, { x: 20, y: 5 }) // { x: 10, y: 5 }
 */
export function sourcePoint(location: DutyLocation, receiver: SitePoint): SitePoint | undefined {
  switch (location.kind) {
    case 'point':
      return { x: location.x, y: location.y };
    case 'line':
      if (!usable(location.points, 2)) return undefined;
      return location.distanceBy === 'centroid'
        ? polylineCentroid(location.points)
        : nearestOnPolyline(receiver, location.points);
    case 'polygon':
      if (!usable(location.points, 3)) return undefined;
      return location.distanceBy === 'centroid'
        ? polygonCentroid(location.points)
        : nearestInPolygon(receiver, location.points);
    default:
      return undefined;
  }
}

/**
 * The centroid of a line or area (where the plan puts its handle and the grid shows X and Y),
 * or undefined when it has too few usable points.
 */
export function areaCentre(location: LineLocation | PolygonLocation): SitePoint | undefined {
  if (!usable(location.points, location.kind === 'line' ? 2 : 3)) return undefined;
  return location.kind === 'line' ? polylineCentroid(location.points) : polygonCentroid(location.points);
}

/** Enough points, each with finite coordinates. */
function usable(points: readonly SitePoint[] | undefined, least: number): boolean {
  return (
    Array.isArray(points) &&
    points.length >= least &&
    points.every((p) => p !== null && typeof p === 'object' && Number.isFinite(p.x) && Number.isFinite(p.y))
  );
}

/** True for a location placed on the site grid (point, line or area). */
export function isOnGrid(location: DutyLocation): boolean {
  return location.kind === 'point' || location.kind === 'line' || location.kind === 'polygon';
}
