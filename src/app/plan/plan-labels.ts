/**
 * Where the site plan writes the names of its receivers and duties so that no two overlap:
 * each label, in the order given (receivers first), takes the first of right, left, above and
 * below its mark that meets no label or mark already placed and lies within the plan; a label with no free place is
 * left unwritten (its name stays in the list beside the plan and in the item's title). Pure
 * layout in plan units; it computes no decibels.
 */
import { boxesMeet, textWidth, type Box } from '../results/distance-chart-view.ts';

export interface PlanLabelWanted {
  id: string;
  /** The mark's centre on the drawing (SVG coordinates: y grows downwards). */
  x: number;
  y: number;
  text: string;
  fontSize: number;
  /** Half the mark's size. */
  markHalf: number;
}

export interface PlanLabelPlaced {
  id: string;
  /** The text's anchor point and alignment, or undefined when no free place was found. */
  at?: { x: number; y: number; anchor: 'start' | 'end' | 'middle' };
}

/**
 * Places the labels without overlaps and, when `within` is given (the plan's drawn
 * rectangle), inside it: a name that would run past the edge goes to another side of its
 * mark, or above or below it moved along to fit. A label never covers a box of `avoid`
 * (the grid's numbers). O(labels² + labels·avoid).
 */
export function placePlanLabels(
  wanted: readonly PlanLabelWanted[],
  within?: Box,
  avoid: readonly Box[] = [],
): PlanLabelPlaced[] {
  const marks: Box[] = wanted.map((w) => ({
    x: w.x - w.markHalf,
    y: w.y - w.markHalf,
    w: 2 * w.markHalf,
    h: 2 * w.markHalf,
  }));
  const labels: Box[] = [];
  return wanted.map((w, i) => {
    const width = textWidth(w.text, w.fontSize);
    const h = w.fontSize;
    const gap = w.markHalf + w.fontSize * 0.3;
    const options: { box: Box; at: NonNullable<PlanLabelPlaced['at']> }[] = [
      { box: { x: w.x + gap, y: w.y - h / 2, w: width, h }, at: { x: w.x + gap, y: w.y + h * 0.35, anchor: 'start' } },
      {
        box: { x: w.x - gap - width, y: w.y - h / 2, w: width, h },
        at: { x: w.x - gap, y: w.y + h * 0.35, anchor: 'end' },
      },
      {
        box: { x: w.x - width / 2, y: w.y - gap - h, w: width, h },
        at: { x: w.x, y: w.y - gap - h * 0.2, anchor: 'middle' },
      },
      {
        box: { x: w.x - width / 2, y: w.y + gap, w: width, h },
        at: { x: w.x, y: w.y + gap + h * 0.8, anchor: 'middle' },
      },
    ];
    if (within) {
      // above and below, slid along to lie within the plan when centring would cut them
      const left = Math.min(Math.max(w.x - width / 2, within.x), within.x + within.w - width);
      if (left !== w.x - width / 2)
        for (const o of options.slice(2, 4).map((o) => ({ box: { ...o.box, x: left }, at: { ...o.at } }))) {
          o.at.x = left;
          o.at.anchor = 'start';
          options.push(o);
        }
    }
    const fits = (b: Box) =>
      !within ||
      (b.x >= within.x && b.x + b.w <= within.x + within.w && b.y >= within.y && b.y + b.h <= within.y + within.h);
    // Two names meet by their drawn line boxes, a little taller than the letters' size.
    const pad = w.fontSize * 0.12;
    const line = (b: Box): Box => ({ x: b.x, y: b.y - pad, w: b.w, h: b.h + 2 * pad });
    const free = options.find(
      (o) =>
        fits(o.box) &&
        !marks.some((m, j) => j !== i && boxesMeet(o.box, m)) &&
        !avoid.some((b) => boxesMeet(o.box, b)) &&
        !labels.some((l) => boxesMeet(line(o.box), l)),
    );
    if (!free) return { id: w.id };
    labels.push(line(free.box));
    return { id: w.id, at: free.at };
  });
}
