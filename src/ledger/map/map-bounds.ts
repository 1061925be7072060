/**
 * The part of the site grid a plan or a level map covers: every placed point (receivers,
 * duties on the grid, barriers, the drawing's corners) with a margin.
 */
import type { Project, SitePoint } from '../model/model.ts';
import { siteOfPixel } from './drawing-frame.ts';

export interface SiteBox {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** Every placed point of the project: receivers, duties on the grid, barriers, the drawing's corners. */
export function placedPoints(project: Project): SitePoint[] {
  const out: SitePoint[] = [];
  const add = (p: SitePoint) => {
    if (Number.isFinite(p.x) && Number.isFinite(p.y)) out.push(p);
  };
  project.receivers.forEach(add);
  for (const d of project.duties) {
    const loc = d.location;
    if (loc.kind === 'point') add(loc);
    else if (loc.kind === 'line' || loc.kind === 'polygon') loc.points.forEach(add);
  }
  for (const b of project.barriers ?? []) b.points.forEach(add);
  const img = project.sitePlan?.image;
  if (img) {
    for (const c of [
      { x: 0, y: 0 },
      { x: img.widthPx, y: 0 },
      { x: 0, y: img.heightPx },
      { x: img.widthPx, y: img.heightPx },
    ])
      add(siteOfPixel(img, c));
  }
  return out;
}

/** A box around the points with a margin (a 100 m square around the origin when there is nothing). */
export function fitBox(points: readonly SitePoint[], marginShare = 0.12): SiteBox {
  if (points.length === 0) return { minX: -50, minY: -50, maxX: 50, maxY: 50 };
  let minX = Infinity,
    minY = Infinity,
    maxX = -Infinity,
    maxY = -Infinity;
  for (const p of points) {
    minX = Math.min(minX, p.x);
    minY = Math.min(minY, p.y);
    maxX = Math.max(maxX, p.x);
    maxY = Math.max(maxY, p.y);
  }
  const span = Math.max(maxX - minX, maxY - minY, 40);
  const m = span * marginShare;
  const cx = (minX + maxX) / 2;
  const cy = (minY + maxY) / 2;
  const half = span / 2 + m;
  return { minX: cx - half, minY: cy - half, maxX: cx + half, maxY: cy + half };
}

/** The default map spacing over a box: about `pointsAcross` points across, a round half metre (at least 0.5 m). */
export function defaultSpacingM(box: SiteBox, pointsAcross = 100): number {
  return Math.max(0.5, Math.round(((box.maxX - box.minX) / pointsAcross) * 2) / 2);
}

/** The grid of points covering a box every `spacingM`: south-west corner and points east and north (at least 2 each). */
export function gridOver(box: SiteBox, spacingM: number): { x0: number; y0: number; nx: number; ny: number } {
  return {
    x0: box.minX,
    y0: box.minY,
    nx: Math.max(2, Math.ceil((box.maxX - box.minX) / spacingM) + 1),
    ny: Math.max(2, Math.ceil((box.maxY - box.minY) / spacingM) + 1),
  };
}
