/**
 * Where the drawing lies on the site grid: image pixels (x right, y down) ↔ site-grid metres
 * (x east, y north), from the drawing's scale s (m per pixel), origin pixel (o_x, o_y) and
 * north θ (degrees clockwise from the image's up):
 *
 *   u = s·(p_x − o_x),  v = −s·(p_y − o_y)          (metres right and up on the drawing)
 *   x = u·cos θ − v·sin θ,  y = u·sin θ + v·cos θ   (east and north)
 *
 * The plan's SVG draws a site point (x, y) at (x, −y), so the image's SVG transform is the
 * matrix of pixel → (x, −y).
 */
import type { PlanImage, SitePoint } from '../model/model.ts';

type Frame = Pick<PlanImage, 'metresPerPixel' | 'originPx' | 'northDeg'>;

/** Site-grid point of an image pixel. */
export function siteOfPixel(frame: Frame, px: SitePoint): SitePoint {
  const t = (frame.northDeg * Math.PI) / 180;
  const u = frame.metresPerPixel * (px.x - frame.originPx.x);
  const v = -frame.metresPerPixel * (px.y - frame.originPx.y);
  return { x: u * Math.cos(t) - v * Math.sin(t), y: u * Math.sin(t) + v * Math.cos(t) };
}

/** Image pixel of a site-grid point (the inverse of {@link siteOfPixel}). */
export function pixelOfSite(frame: Frame, at: SitePoint): SitePoint {
  const t = (frame.northDeg * Math.PI) / 180;
  const u = at.x * Math.cos(t) + at.y * Math.sin(t);
  const v = -at.x * Math.sin(t) + at.y * Math.cos(t);
  return { x: frame.originPx.x + u / frame.metresPerPixel, y: frame.originPx.y - v / frame.metresPerPixel };
}

/** SVG `matrix(a b c d e f)` placing the image (in pixels) on the plan drawn at (x, −y). */
export function imageTransform(frame: Frame): string {
  const s = frame.metresPerPixel;
  const t = (frame.northDeg * Math.PI) / 180;
  const cos = Math.cos(t);
  const sin = Math.sin(t);
  const { x: ox, y: oy } = frame.originPx;
  const a = s * cos;
  const b = -s * sin;
  const c = s * sin;
  const d = s * cos;
  const e = -s * (ox * cos + oy * sin);
  const f = s * (ox * sin - oy * cos);
  return `matrix(${a} ${b} ${c} ${d} ${e} ${f})`;
}

/** The scale from two image pixels and the distance typed between them, m per pixel; undefined when it cannot be set. */
export function scaleFromTwoPoints(a: SitePoint, b: SitePoint, distanceM: number): number | undefined {
  const px = Math.hypot(b.x - a.x, b.y - a.y);
  if (!(px > 0) || !(distanceM > 0) || !Number.isFinite(distanceM)) return undefined;
  return distanceM / px;
}
