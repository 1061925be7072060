/**
 * Where the distance chart puts its words: end labels spread apart but kept inside the
 * drawing, and the limit, present-distance and phase-total labels placed where no line or
 * point passes. Pure layout in pixels; it computes no decibels.
 */

export interface Point {
  x: number;
  y: number;
}

/** A label's box: left, top, width and height in pixels. */
export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

/**
 * Label positions at least `gap` apart, each as near its wanted position as the others allow,
 * all within [top, bottom]: pushed down in order, then back up from the bottom when the last
 * would leave the drawing. Returns the positions in the order given. O(n log n).
 * @example spreadLabels([100, 105, 300], 20, 10, 310) // [100, 120, 300]
 */
export function spreadLabels(wanted: readonly number[], gap: number, top: number, bottom: number): number[] {
  const order = wanted.map((y, i) => ({ y: Number.isFinite(y) ? y : bottom, i })).sort((a, b) => a.y - b.y);
  const placed = order.map((o) => Math.min(Math.max(o.y, top), bottom));
  for (let k = 1; k < placed.length; k++) placed[k] = Math.max(placed[k] as number, (placed[k - 1] as number) + gap);
  const over = (placed[placed.length - 1] ?? bottom) - bottom;
  if (over > 0) {
    placed[placed.length - 1] = bottom;
    for (let k = placed.length - 2; k >= 0; k--)
      placed[k] = Math.min(placed[k] as number, (placed[k + 1] as number) - gap);
  }
  const out = new Array<number>(wanted.length);
  order.forEach((o, k) => (out[o.i] = Math.max(placed[k] as number, top)));
  return out;
}

/**
 * Points along a polyline no more than `step` pixels apart (its vertices included), to test
 * label boxes against the line between its vertices. O(length / step).
 */
export function alongPolyline(points: readonly Point[], step = 4): Point[] {
  const out: Point[] = [];
  points.forEach((p, i) => {
    const prev = points[i - 1];
    if (prev) {
      const n = Math.ceil(Math.hypot(p.x - prev.x, p.y - prev.y) / step);
      for (let k = 1; k < n; k++)
        out.push({ x: prev.x + ((p.x - prev.x) * k) / n, y: prev.y + ((p.y - prev.y) * k) / n });
    }
    out.push(p);
  });
  return out;
}

/** True when the box, grown by `pad` pixels, holds the point. */
export function boxHolds(box: Box, p: Point, pad = 2): boolean {
  return p.x >= box.x - pad && p.x <= box.x + box.w + pad && p.y >= box.y - pad && p.y <= box.y + box.h + pad;
}

/** True when two boxes overlap. */
export function boxesMeet(a: Box, b: Box): boolean {
  return a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
}

/**
 * The first of the candidate boxes that holds no obstacle point and meets no box already
 * taken; the one with the fewest such points when none is free. O(candidates × obstacles).
 */
export function freeBox(candidates: readonly Box[], obstacles: readonly Point[], taken: readonly Box[] = []): Box {
  let best = candidates[0] as Box;
  let fewest = Infinity;
  for (const box of candidates) {
    const hits =
      obstacles.reduce((n, p) => n + (boxHolds(box, p) ? 1 : 0), 0) +
      taken.reduce((n, t) => n + (boxesMeet(box, t) ? 100 : 0), 0);
    if (hits === 0) return box;
    if (hits < fewest) {
      fewest = hits;
      best = box;
    }
  }
  return best;
}

/** Rough width of a label in pixels at a font size (average glyph ≈ 0.58 em in the app's sans-serif). */
export function textWidth(text: string, fontPx: number): number {
  return Math.ceil(text.length * fontPx * 0.58);
}
