import { describe, expect, it } from 'vitest';
import {
  insidePolygon,
  nearestInPolygon,
  nearestOnPolyline,
  nearestOnSegment,
  polygonCentroid,
  polylineCentroid,
  segmentCrossing,
} from '../../../../src/core/plan/plane.ts';

const square = [
  { x: 0, y: 0 },
  { x: 10, y: 0 },
  { x: 10, y: 10 },
  { x: 0, y: 10 },
];

describe('nearest points', () => {
  it('nearestOnSegment drops a perpendicular inside the segment and clamps past its ends', () => {
    expect(nearestOnSegment({ x: 5, y: 5 }, { x: 0, y: 0 }, { x: 10, y: 0 })).toEqual({ x: 5, y: 0 }); // worked by hand
    expect(nearestOnSegment({ x: 15, y: 3 }, { x: 0, y: 0 }, { x: 10, y: 0 })).toEqual({ x: 10, y: 0 }); // worked by hand: past the end
    expect(nearestOnSegment({ x: 3, y: 3 }, { x: 2, y: 2 }, { x: 2, y: 2 })).toEqual({ x: 2, y: 2 }); // a segment of no length
  });

  it('nearestOnPolyline picks the nearest of its segments', () => {
    // (20, 20) to the polyline (0,0)–(10,0)–(10,10): the corner (10,10) — worked by hand
    expect(
      nearestOnPolyline({ x: 20, y: 20 }, [
        { x: 0, y: 0 },
        { x: 10, y: 0 },
        { x: 10, y: 10 },
      ]),
    ).toEqual({ x: 10, y: 10 });
    expect(
      nearestOnPolyline({ x: 20, y: 4 }, [
        { x: 0, y: 0 },
        { x: 10, y: 0 },
        { x: 10, y: 10 },
      ]),
    ).toEqual({ x: 10, y: 4 });
  });

  it('nearestInPolygon is the point itself inside, the boundary outside (closing edge included)', () => {
    expect(nearestInPolygon({ x: 3, y: 4 }, square)).toEqual({ x: 3, y: 4 });
    expect(nearestInPolygon({ x: 20, y: 5 }, square)).toEqual({ x: 10, y: 5 }); // worked by hand
    expect(nearestInPolygon({ x: -6, y: 5 }, square)).toEqual({ x: 0, y: 5 }); // closing edge (0,10)–(0,0)
  });

  it('insidePolygon by the even–odd rule, either winding', () => {
    expect(insidePolygon({ x: 5, y: 5 }, square)).toBe(true);
    expect(insidePolygon({ x: 5, y: 5 }, [...square].reverse())).toBe(true);
    expect(insidePolygon({ x: 11, y: 5 }, square)).toBe(false);
  });
});

describe('centroids', () => {
  it('polylineCentroid weights segment midpoints by length', () => {
    // (0,0)–(10,0)–(10,10): midpoints (5,0) and (10,5), equal lengths → (7.5, 2.5) — worked by hand
    expect(
      polylineCentroid([
        { x: 0, y: 0 },
        { x: 10, y: 0 },
        { x: 10, y: 10 },
      ]),
    ).toEqual({ x: 7.5, y: 2.5 });
    // (0,0)–(30,0)–(30,10): (30·(15,0) + 10·(30,5)) / 40 = (18.75, 1.25) — worked by hand
    expect(
      polylineCentroid([
        { x: 0, y: 0 },
        { x: 30, y: 0 },
        { x: 30, y: 10 },
      ]),
    ).toEqual({ x: 18.75, y: 1.25 });
  });

  it('polygonCentroid of a square is its middle, of an L the area-weighted mean of its rectangles', () => {
    expect(polygonCentroid(square)).toEqual({ x: 5, y: 5 });
    // L = 20×10 rectangle (centroid (10,5), area 200) + 10×10 square (centroid (5,15), area 100):
    // ((200·10 + 100·5)/300, (200·5 + 100·15)/300) = (8.333, 8.333) — worked by hand
    const l = polygonCentroid([
      { x: 0, y: 0 },
      { x: 20, y: 0 },
      { x: 20, y: 10 },
      { x: 10, y: 10 },
      { x: 10, y: 20 },
      { x: 0, y: 20 },
    ]);
    expect(l.x).toBeCloseTo(25 / 3, 10);
    expect(l.y).toBeCloseTo(25 / 3, 10);
    // clockwise winding gives the same point
    const cw = polygonCentroid([...square].reverse());
    expect(cw.x).toBeCloseTo(5, 12);
    expect(cw.y).toBeCloseTo(5, 12);
  });

  it('polygonCentroid of a polygon with no area falls back to its boundary', () => {
    expect(
      polygonCentroid([
        { x: 0, y: 0 },
        { x: 10, y: 0 },
        { x: 5, y: 0 },
      ]),
    ).toEqual({ x: 5, y: 0 });
  });
});

describe('segmentCrossing', () => {
  it('finds the crossing with its parameters along both segments', () => {
    expect(segmentCrossing({ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 5, y: -5 }, { x: 5, y: 5 })).toEqual({
      t: 0.5,
      u: 0.5,
      at: { x: 5, y: 0 },
    });
  });
  it('returns undefined for segments that miss each other or are parallel', () => {
    expect(segmentCrossing({ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 5, y: 1 }, { x: 5, y: 5 })).toBeUndefined();
    expect(segmentCrossing({ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 0, y: 1 }, { x: 10, y: 1 })).toBeUndefined();
  });
});
