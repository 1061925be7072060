/**
 * Where in its work area a machine mainly works, as a spread (a duty on a line or an area
 * of the site plan; a point or stated distances has none).
 *
 * The ledger's level takes the distance from one representative point (the nearest point of
 * the area, the worst case, or its centroid; ../work-area.ts). Here the machine's main
 * working position is uniform over the line or area, represented by an even set of points
 * (64 along a line by length; a grid of about 400 over an area's bounding box, those
 * inside kept). Moving from the representative point at slant distance d_rep to a point at
 * d changes the level at a receiver by geometric divergence alone, 20·lg(d_rep/d) (energy
 * factor (d_rep/d)², common practice); ground, air and screening are taken as unchanged.
 * One position per duty serves every receiver, phase and period (shared).
 * Cost: O(points × receivers) to build.
 */
import type { Duty, Project } from '../model/model.ts';
import { pathGeometry, sourceHeightOf } from '../prediction/geometry.ts';
import { insidePolygon } from '../../core/plan/plane.ts';

/** Points along a line. */
const LINE_POINTS = 64;
/** Grid steps across an area's bounding box, each way. */
const AREA_STEPS = 20;

export interface PositionSpread {
  /** Number of positions K. */
  count: number;
  /** Energy factor (d_rep/d)² at position k for receiver r: factors[k * receivers + r]. */
  factors: Float64Array;
  /** E[factor] and E[factor²] by receiver (over the K positions, uniform). */
  mean: Float64Array;
  squareMean: Float64Array;
  /** e.g. "area of 4 corners: main position uniform over 312 points". */
  words: string;
}

/** Even points of a line (by length) or inside an area; empty for a point or stated distances. */
export function positionsOf(duty: Duty): { x: number; y: number }[] {
  const loc = duty.location;
  if (loc.kind === 'line') {
    const pts = loc.points;
    const lengths = pts.slice(1).map((p, i) => Math.hypot(p.x - (pts[i] as typeof p).x, p.y - (pts[i] as typeof p).y));
    const total = lengths.reduce((a, b) => a + b, 0);
    if (!(total > 0)) return [];
    const out: { x: number; y: number }[] = [];
    for (let k = 0; k < LINE_POINTS; k++) {
      let at = ((k + 0.5) / LINE_POINTS) * total;
      let i = 0;
      while (i < lengths.length - 1 && at > (lengths[i] as number)) at -= lengths[i++] as number;
      const a = pts[i] as { x: number; y: number };
      const b = pts[i + 1] as { x: number; y: number };
      const t = (lengths[i] as number) > 0 ? at / (lengths[i] as number) : 0;
      out.push({ x: a.x + t * (b.x - a.x), y: a.y + t * (b.y - a.y) });
    }
    return out;
  }
  if (loc.kind === 'polygon') {
    const pts = loc.points;
    if (pts.length < 3) return [];
    const xs = pts.map((p) => p.x);
    const ys = pts.map((p) => p.y);
    const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
    const out: { x: number; y: number }[] = [];
    for (let i = 0; i < AREA_STEPS; i++) {
      for (let j = 0; j < AREA_STEPS; j++) {
        const p = { x: x0 + ((i + 0.5) / AREA_STEPS) * (x1 - x0), y: y0 + ((j + 0.5) / AREA_STEPS) * (y1 - y0) };
        if (insidePolygon(p, pts)) out.push(p);
      }
    }
    return out;
  }
  return [];
}

/** The position spread of a duty at the project's receivers, or undefined when it has none. */
export function positionSpread(project: Project, duty: Duty): PositionSpread | undefined {
  const positions = positionsOf(duty);
  if (positions.length === 0) return undefined;
  const hs = sourceHeightOf(duty, project.propagation);
  const nr = project.receivers.length;
  const k = positions.length;
  const factors = new Float64Array(k * nr);
  const mean = new Float64Array(nr);
  const squareMean = new Float64Array(nr);
  project.receivers.forEach((r, ri) => {
    const rep = pathGeometry(duty, r, hs).distanceM;
    const dh = hs - r.heightM;
    positions.forEach((p, pi) => {
      const d = Math.hypot(r.x - p.x, r.y - p.y, dh);
      const f = d > 0 && rep > 0 ? (rep / d) ** 2 : NaN;
      factors[pi * nr + ri] = f;
      mean[ri] = (mean[ri] as number) + f / k;
      squareMean[ri] = (squareMean[ri] as number) + (f * f) / k;
    });
  });
  const what = duty.location.kind === 'line' ? 'line' : 'area';
  return {
    count: k,
    factors,
    mean,
    squareMean,
    words: `${duty.name}: main working position uniform over the ${what} (${k} points), level changed by 20·lg(d_rep/d)`,
  };
}
