/**
 * Plane geometry on the site grid (x east, y north, metres): nearest points on segments,
 * polylines and polygons, centroids, and where two segments cross. Pure functions on plain
 * `{ x, y }` points; no acoustics here.
 */

/** A point on the site grid, m. */
export interface PlanXY {
  x: number;
  y: number;
}

/** Where two segments cross: `t` along the first (0 at its start, 1 at its end), `u` along the second. */
export interface Crossing {
  t: number;
  u: number;
  at: PlanXY;
}

/**
 * The point of segment a–b nearest to p. A segment of zero length gives a.
 * @example nearestOnSegment({ x: 5, y: 5 }, { x: 0, y: 0 }, { x: 10, y: 0 }) // { x: 5, y: 0 }
 */
export function nearestOnSegment(p: PlanXY, a: PlanXY, b: PlanXY): PlanXY {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  if (len2 === 0) return { x: a.x, y: a.y };
  const t = Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2));
  return { x: a.x + t * dx, y: a.y + t * dy };
}

/**
 * The point of an open polyline (two or more vertices; one vertex is that point) nearest to p.
 * O(vertices).
 */
export function nearestOnPolyline(p: PlanXY, points: readonly PlanXY[]): PlanXY {
  const first = points[0];
  if (!first) throw new RangeError('nearestOnPolyline needs at least one point');
  let best: PlanXY = { x: first.x, y: first.y };
  let bestD2 = (p.x - first.x) ** 2 + (p.y - first.y) ** 2;
  for (let i = 1; i < points.length; i++) {
    const q = nearestOnSegment(p, points[i - 1] as PlanXY, points[i] as PlanXY);
    const d2 = (p.x - q.x) ** 2 + (p.y - q.y) ** 2;
    if (d2 < bestD2) {
      best = q;
      bestD2 = d2;
    }
  }
  return best;
}

/**
 * True when p lies inside the polygon (vertices in order, closed implicitly; either winding).
 * Even–odd rule; a point exactly on an edge may fall either way. O(vertices).
 */
export function insidePolygon(p: PlanXY, points: readonly PlanXY[]): boolean {
  let inside = false;
  for (let i = 0, j = points.length - 1; i < points.length; j = i++) {
    const a = points[i] as PlanXY;
    const b = points[j] as PlanXY;
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

/**
 * The point of a polygon's area nearest to p: p itself when inside, otherwise the nearest
 * point of its boundary. O(vertices).
 */
export function nearestInPolygon(p: PlanXY, points: readonly PlanXY[]): PlanXY {
  if (insidePolygon(p, points)) return { x: p.x, y: p.y };
  const first = points[0];
  return nearestOnPolyline(p, first ? [...points, first] : points);
}

/**
 * Centroid of a polyline: the midpoints of its segments weighted by their lengths (the centre
 * of a uniform line). A polyline of zero length gives the mean of its vertices.
 * @example polylineCentroid([{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 10 }]) // { x: 7.5, y: 2.5 }
 */
export function polylineCentroid(points: readonly PlanXY[]): PlanXY {
  let total = 0;
  let sx = 0;
  let sy = 0;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1] as PlanXY;
    const b = points[i] as PlanXY;
    const len = Math.hypot(b.x - a.x, b.y - a.y);
    total += len;
    sx += (len * (a.x + b.x)) / 2;
    sy += (len * (a.y + b.y)) / 2;
  }
  if (total === 0) return meanOf(points);
  return { x: sx / total, y: sy / total };
}

/**
 * Centroid of a simple polygon's area (the shoelace formula):
 * C_x = Σ (x_i + x_{i+1})(x_i·y_{i+1} − x_{i+1}·y_i) / (6A), likewise C_y, A the signed area.
 * A polygon of zero area gives its boundary's centroid.
 * @example polygonCentroid([{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 10 }, { x: 0, y: 10 }]) // { x: 5, y: 5 }
 */
export function polygonCentroid(points: readonly PlanXY[]): PlanXY {
  let twiceArea = 0;
  let cx = 0;
  let cy = 0;
  for (let i = 0; i < points.length; i++) {
    const a = points[i] as PlanXY;
    const b = points[(i + 1) % points.length] as PlanXY;
    const cross = a.x * b.y - b.x * a.y;
    twiceArea += cross;
    cx += (a.x + b.x) * cross;
    cy += (a.y + b.y) * cross;
  }
  if (twiceArea === 0) {
    const first = points[0];
    return polylineCentroid(first ? [...points, first] : points);
  }
  return { x: cx / (3 * twiceArea), y: cy / (3 * twiceArea) };
}

function meanOf(points: readonly PlanXY[]): PlanXY {
  const n = points.length || 1;
  return { x: points.reduce((s, p) => s + p.x, 0) / n, y: points.reduce((s, p) => s + p.y, 0) / n };
}

/**
 * Where segment p1–p2 crosses segment q1–q2, touching ends included; undefined when they do
 * not meet or are parallel.
 * @example segmentCrossing({x:0,y:0},{x:10,y:0},{x:5,y:-5},{x:5,y:5}) // { t: 0.5, u: 0.5, at: { x: 5, y: 0 } }
 */
export function segmentCrossing(p1: PlanXY, p2: PlanXY, q1: PlanXY, q2: PlanXY): Crossing | undefined {
  const rx = p2.x - p1.x;
  const ry = p2.y - p1.y;
  const sx = q2.x - q1.x;
  const sy = q2.y - q1.y;
  const denominator = rx * sy - ry * sx;
  if (denominator === 0) return undefined;
  const qpx = q1.x - p1.x;
  const qpy = q1.y - p1.y;
  const t = (qpx * sy - qpy * sx) / denominator;
  const u = (qpx * ry - qpy * rx) / denominator;
  if (t < 0 || t > 1 || u < 0 || u > 1) return undefined;
  return { t, u, at: { x: p1.x + t * rx, y: p1.y + t * ry } };
}
