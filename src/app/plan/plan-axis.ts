/**
 * The site grid's coordinates written along the plan's bottom (x) and left (y) edges: one
 * number per grid line, in SVG coordinates (a site point (x, y) is drawn at (x, −y)). A
 * number that would meet another, or run past the plan's edge, is left out, and no y number
 * stands on the row of the x numbers: the bottom-left corner keeps the x number, so "−100"
 * and "−150" never print over or beside each other. Pure layout.
 */
import { boxesMeet, textWidth, type Box } from '../results/distance-chart-view.ts';
import { ticks, type SiteBox } from './plan-view.ts';

export interface AxisLabel {
  /** The coordinate written, m. */
  value: number;
  /** The text's start point (baseline) on the drawing. */
  x: number;
  y: number;
}

/** Size of the axis numbers in units of one hundredth of the plan's width. */
export const AXIS_FONT_UNITS = 1.6;

/** The smallest lettering on screen, CSS px: names and grid numbers stay readable on a small window. */
export const LETTERING_MIN_PX = 11.5;

/**
 * The unit the plan's lettering is sized in (its smallest, the grid numbers, is AXIS_FONT_UNITS
 * of it): one hundredth of the plan's width, or more where that would draw the numbers under
 * LETTERING_MIN_PX on screen. `pxPerMetre` is the drawing's screen scale (0 before it is laid out).
 * @example letteringUnit(3.5, 1.4) // 5.13…: 3.5 m would letter at 3.5 × 1.6 × 1.4 = 7.8 px
 */
export function letteringUnit(unit: number, pxPerMetre: number): number {
  if (!(pxPerMetre > 0)) return unit;
  return Math.max(unit, LETTERING_MIN_PX / (AXIS_FONT_UNITS * pxPerMetre));
}

/** The box each grid number takes on the drawing (its text at `unit`'s lettering), for labels to keep off. */
export function axisLabelBoxes(labels: { x: AxisLabel[]; y: AxisLabel[] }, unit: number): Box[] {
  const font = unit * AXIS_FONT_UNITS;
  return [...labels.x, ...labels.y].map((l) => ({
    x: l.x,
    y: l.y - font,
    w: textWidth(String(l.value), font),
    h: font,
  }));
}

/** The numbers of the x grid lines (bottom edge) and of the y grid lines (left edge), none overlapping. O(lines²). */
export function axisLabels(box: SiteBox, step: number, unit: number): { x: AxisLabel[]; y: AxisLabel[] } {
  const font = unit * AXIS_FONT_UNITS;
  const right = box.maxX;
  const top = -box.maxY;
  const boxOf = (l: AxisLabel): Box => ({ x: l.x, y: l.y - font, w: textWidth(String(l.value), font), h: font });
  const inside = (b: Box) => b.x + b.w <= right && b.y >= top;
  const taken: Box[] = [];
  const keep = (l: AxisLabel): boolean => {
    const b = boxOf(l);
    if (!inside(b) || taken.some((t) => boxesMeet(b, t))) return false;
    taken.push(b);
    return true;
  };
  const x = ticks(box.minX, box.maxX, step)
    .map((v) => ({ value: v, x: v + unit * 0.4, y: -box.minY - unit }))
    .filter(keep);
  // A y number on the line of the x numbers would read as one of them: the whole row is theirs.
  const row: Box = { x: box.minX, y: -box.minY - unit - font, w: box.maxX - box.minX, h: font };
  const y = ticks(box.minY, box.maxY, step)
    .map((v) => ({ value: v, x: box.minX + unit, y: -v - unit * 0.4 }))
    .filter((l) => !boxesMeet(boxOf(l), row))
    .filter(keep);
  return { x, y };
}
