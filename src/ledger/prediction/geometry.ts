/**
 * Where sound travels: the distance from a duty's machines to a receiver.
 *
 * A duty works at a point on the site grid (x east, y north, m) or at a stated distance
 * from each receiver. For a point, the distance is the straight line between the source
 * (at its height above ground) and the receiver (at its assessment height):
 * d = √(Δx² + Δy² + (h_s − h_r)²). A line or area is represented by one source point per
 * receiver (./work-area.ts). A stated distance is used as given.
 */
import type { Duty, Propagation, Receiver, SitePoint } from '../model/model.ts';
import { own } from '../model/own.ts';
import { sourcePoint } from './work-area.ts';

/** Source height used when neither the duty nor the propagation setting gives one, m. */
export const DEFAULT_SOURCE_HEIGHT_M = 1.5;

/**
 * Height of a duty's machines above ground, m: the duty's own, else the ISO 9613-2
 * propagation setting, else {@link DEFAULT_SOURCE_HEIGHT_M}.
 */
export function sourceHeightOf(duty: Duty, propagation: Propagation): number {
  if (duty.sourceHeightM !== undefined && duty.sourceHeightM !== null) return duty.sourceHeightM;
  if (propagation.method === 'iso9613-2:1996') return propagation.sourceHeightM;
  return DEFAULT_SOURCE_HEIGHT_M;
}

export interface PathGeometry {
  /** Straight-line (slant) distance source → receiver, m; NaN when not known. */
  distanceM: number;
  /** Distance projected on the ground plane, m. */
  horizontalM: number;
  /** How the distance was found, for the explanation of a result. */
  basis: 'grid' | 'stated';
  /** The source point on the site grid (grid basis only). */
  sourceAt?: SitePoint;
}

/**
 * Distance from a duty's location to a receiver.
 * Point location: slant distance from grid positions and heights. Distances table: the
 * distance stated for that receiver (NaN when missing); its horizontal part is
 * √(d² − Δh²) when d exceeds the height difference, else d.
 * @example pathGeometry({x:0,y:0} duty at 1.5 m, receiver at (30, 40) and 4 m).distanceM // 50.06
 */
export function pathGeometry(duty: Duty, receiver: Receiver, sourceHeightM: number): PathGeometry {
  const dh = sourceHeightM - receiver.heightM;
  const loc = duty.location;
  if (loc.kind !== 'distances') {
    const at = sourcePoint(loc, receiver);
    if (!at) return { distanceM: NaN, horizontalM: NaN, basis: 'grid' };
    const dx = receiver.x - at.x;
    const dy = receiver.y - at.y;
    const horizontalM = Math.hypot(dx, dy);
    return { distanceM: Math.hypot(horizontalM, dh), horizontalM, basis: 'grid', sourceAt: at };
  }
  const stated = own(loc.distancesM, receiver.id);
  const d = typeof stated === 'number' ? stated : NaN;
  const horizontalM = d > Math.abs(dh) ? Math.sqrt(d * d - dh * dh) : d;
  return { distanceM: d, horizontalM, basis: 'stated' };
}
