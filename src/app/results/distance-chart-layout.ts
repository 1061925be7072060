/**
 * Where everything of the level-against-distance chart goes, in the chart's pixels: the
 * scales, each machine's line as a path, the end labels spread apart beside the plot (with
 * the limit's words in the same column), the dots that read each line at the present distance,
 * and the "now" and phase-total words each placed where nothing is drawn. Pure layout of the
 * ledger's figures (distanceChart in src/ledger/prediction/distance-chart.ts); it computes no
 * decibels. DistanceChart.svelte draws what this returns.
 */
import type { DistanceChartData } from '../../ledger/prediction/distance-chart.ts';
import { linearScale, logScale, type Scale } from './chart-scale.ts';
import { formatDistance, formatLevel, type DecimalSeparator } from './format.ts';
import { alongPolyline, freeBox, spreadLabels, textWidth, type Box, type Point } from './distance-chart-view.ts';

/** The chart's size and margins, px (viewBox units). */
export const W = 640;
export const H = 360;
export const M = { top: 20, right: 180, bottom: 56, left: 56 };
export const PLOT_RIGHT = W - M.right;
export const PLOT_BOTTOM = H - M.bottom;
/** Font size of the end labels and the phase-total words, px (as in the chart's style). */
export const LABEL_PX = 11.5;
/** Longest end label, characters, that fits right of the plot (bold glyphs ≈ 0.66 em wide; the rest is cut with "…"). */
export const LABEL_CHARS = Math.floor((W - PLOT_RIGHT - 14) / (LABEL_PX * 0.66));

type Curve = DistanceChartData['curves'][number];

/** A line's end label: the full name, the text shown, its level at the far end and now, where it points and where it stands. */
export interface EndLabel {
  id: string;
  /** Index of the curve in the chart's data. */
  index: number;
  full: string;
  text: string;
  level: number;
  now: number | undefined;
  /** The line's last point, y px, and the label's baseline, y px. */
  y0: number;
  ly: number;
  /** Position among the drawn lines (its colour and dash). */
  order: number;
}

export interface DistanceChartLayout {
  x: Scale;
  y: Scale;
  dMin: number;
  dMax: number;
  /** The lines with at least one level, and those with none. */
  drawn: Curve[];
  missing: Curve[];
  /** The present distance, m, when it lies on the axis. */
  current: number | undefined;
  /** The phase total, when known. */
  total: DistanceChartData['phaseTotal'];
  readouts: { c: Curve; order: number; level: number; at: Point }[];
  lines: EndLabel[];
  /** The limit line's y and its words' baseline. */
  limit: { y0: number; ly: number } | undefined;
  nowText: string;
  totalText: string;
  /** Boxes of the present-distance and phase-total words, each where nothing is drawn. */
  placed: { now: Box | undefined; mark: Box | undefined };
  /** SVG path of a curve's points (runs broken where a level is not computed). */
  pathOf(points: readonly { distanceM: number; levelDb: number }[]): string;
}

/** A long end label cut to {@link LABEL_CHARS} with "…". */
export function shortenLabel(text: string): string {
  return text.length > LABEL_CHARS ? `${text.slice(0, LABEL_CHARS - 1).trimEnd()}…` : text;
}

/** Lays the chart out. O(lines × points × candidate boxes). */
export function distanceChartLayout(curves: DistanceChartData, decimal: DecimalSeparator = '.'): DistanceChartLayout {
  const distances = curves.curves
    .flatMap((c) => c.points.map((p) => p.distanceM))
    .filter((d) => d > 0 && Number.isFinite(d));
  const levels = curves.curves.flatMap((c) => c.points.map((p) => p.levelDb)).filter(Number.isFinite);
  const dMin = distances.length ? Math.min(...distances) : 1;
  const dMax = distances.length ? Math.max(...distances) : 10;
  const x = logScale(dMin, dMax > dMin ? dMax : dMin * 10, [M.left, PLOT_RIGHT]);
  const total = curves.phaseTotal && Number.isFinite(curves.phaseTotal.levelDb) ? curves.phaseTotal : undefined;
  const y = linearScale(
    levels,
    [PLOT_BOTTOM, M.top],
    6,
    [curves.limitDb, total?.levelDb].filter((v): v is number => v !== undefined),
  );
  const drawn = curves.curves.filter((c) => c.points.some((p) => Number.isFinite(p.levelDb)));
  const missing = curves.curves.filter((c) => !c.points.some((p) => Number.isFinite(p.levelDb)));
  const current =
    curves.currentDistanceM !== undefined && curves.currentDistanceM >= dMin && curves.currentDistanceM <= dMax
      ? curves.currentDistanceM
      : undefined;

  function pixels(points: readonly { distanceM: number; levelDb: number }[]): Point[][] {
    const runs: Point[][] = [];
    let run: Point[] = [];
    for (const p of points) {
      if (!Number.isFinite(p.levelDb)) {
        if (run.length) runs.push(run);
        run = [];
        continue;
      }
      run.push({ x: x(p.distanceM), y: y(p.levelDb) });
    }
    if (run.length) runs.push(run);
    return runs;
  }
  const pathOf = (points: readonly { distanceM: number; levelDb: number }[]) =>
    pixels(points)
      .map((run) => run.map((p, i) => `${i ? 'L' : 'M'}${p.x.toFixed(1)},${p.y.toFixed(1)}`).join(' '))
      .join(' ');

  const readouts =
    current === undefined
      ? []
      : drawn
          .map((c, i) => ({ c, order: i, level: c.atCurrentDb ?? NaN }))
          .filter((r) => Number.isFinite(r.level))
          .map((r) => ({ ...r, at: { x: x(current), y: y(r.level) } }));

  // End labels beside the last drawn point of each line, spread apart and kept beside the plot (above the axis numbers).
  const list = drawn.map((c, i) => {
    const last = [...c.points].reverse().find((p) => Number.isFinite(p.levelDb));
    const full = c.label + (c.isBaseline ? ' (baseline)' : '');
    return {
      id: c.candidateId,
      index: curves.curves.indexOf(c),
      full,
      text: shortenLabel(full),
      level: last?.levelDb ?? NaN,
      now: c.atCurrentDb,
      y0: last ? y(last.levelDb) : PLOT_BOTTOM,
      order: i,
    };
  });
  // The limit's words stand in the same column, at the line's right end, so they never cover a line.
  const limitY = curves.limitDb !== undefined ? y(curves.limitDb) : undefined;
  const ys = spreadLabels(
    [...list.map((l) => l.y0), ...(limitY !== undefined ? [limitY] : [])],
    24,
    M.top + 4,
    PLOT_BOTTOM + 8,
  );
  const lines = list.map((l, i) => ({ ...l, ly: ys[i] as number }));
  const limit = limitY !== undefined ? { y0: limitY, ly: ys[list.length] as number } : undefined;

  // Every point a word must not cover: the lines, the read-out dots and the phase-total mark.
  const obstacles: Point[] = [
    ...drawn.flatMap((c) => pixels(c.points).flatMap((run) => alongPolyline(run))),
    ...readouts.map((r) => r.at),
    ...(total && current !== undefined ? [{ x: x(current), y: y(total.levelDb) }] : []),
  ];
  const nowText = current === undefined ? '' : `now ${formatDistance(current, decimal)}`;
  const totalText = total ? `Phase total ${formatLevel(total.levelDb, decimal)}` : '';

  const h = 14;
  const taken: Box[] = [];
  let now: Box | undefined;
  let mark: Box | undefined;
  if (current !== undefined) {
    const cx = x(current);
    const w = textWidth(nowText, 11);
    const sides = (bw: number) => (cx + 5 + bw <= PLOT_RIGHT ? [cx + 5, cx - 5 - bw] : [cx - 5 - bw, cx + 5]);
    now = freeBox(
      [
        ...sides(w).map((bx) => ({ x: bx, y: M.top, w, h })),
        ...sides(w).map((bx) => ({ x: bx, y: PLOT_BOTTOM - h - 2, w, h })),
      ],
      obstacles,
      taken,
    );
    taken.push(now);
    if (total) {
      const ty = y(total.levelDb);
      const tw = textWidth(totalText, LABEL_PX);
      mark = freeBox(
        [
          ...sides(tw).map((bx) => ({ x: bx, y: ty - h - 4, w: tw, h })),
          ...sides(tw).map((bx) => ({ x: bx, y: ty + 4, w: tw, h })),
        ],
        obstacles,
        taken,
      );
    }
  }

  return {
    x,
    y,
    dMin,
    dMax,
    drawn,
    missing,
    current,
    total,
    readouts,
    lines,
    limit,
    nowText,
    totalText,
    placed: { now, mark },
    pathOf,
  };
}
