/**
 * The distance chart's layout: end labels spread apart within the plot's height, the limit's
 * words in their column, the "now" and phase-total words where no line is drawn, and a line
 * broken where a level is not computed. Levels are invented (6 dB a doubling of distance is
 * common practice for a point source, hemispherical spreading).
 */
import { describe, expect, it } from 'vitest';
import {
  LABEL_CHARS,
  M,
  PLOT_BOTTOM,
  distanceChartLayout,
  shortenLabel,
} from '../../../../src/app/results/distance-chart-layout.ts';
import { alongPolyline, boxHolds } from '../../../../src/app/results/distance-chart-view.ts';
import type { DistanceChartData } from '../../../../src/ledger/prediction/distance-chart.ts';

const D = [10, 20, 50, 100, 200];

function data(overrides: Partial<DistanceChartData> = {}): DistanceChartData {
  const line = (id: string, at10: number, atCurrentDb?: number, isBaseline = false) => ({
    candidateId: id,
    label: `Machine ${id}`,
    isBaseline,
    points: D.map((d) => ({ distanceM: d, levelDb: at10 - 20 * Math.log10(d / 10) })),
    ...(atCurrentDb !== undefined ? { atCurrentDb } : {}),
  });
  return {
    dutyId: 'dig',
    receiverId: 'school',
    limitDb: 65,
    currentDistanceM: 40,
    curves: [line('a', 80, 68, true), line('b', 79.5, 67.5), line('c', 79, 67), line('d', 60)],
    ...overrides,
  } as DistanceChartData;
}

describe('distanceChartLayout', () => {
  it('distanceChartLayout spreads end labels of nearly equal lines at least 24 px apart, within the plot', () => {
    const layout = distanceChartLayout(data());
    const ys = [...layout.lines.map((l) => l.ly), layout.limit!.ly].sort((a, b) => a - b);
    for (let i = 1; i < ys.length; i++) expect(ys[i]! - ys[i - 1]!).toBeGreaterThanOrEqual(24 - 1e-9);
    expect(ys[0]).toBeGreaterThanOrEqual(M.top + 4);
    expect(ys[ys.length - 1]).toBeLessThanOrEqual(PLOT_BOTTOM + 8);
  });

  it('distanceChartLayout places the "now" words where no line passes', () => {
    const layout = distanceChartLayout(data());
    expect(layout.nowText).toBe('now 40 m');
    const now = layout.placed.now!;
    const points = layout.drawn.flatMap((c) =>
      alongPolyline(c.points.map((p) => ({ x: layout.x(p.distanceM), y: layout.y(p.levelDb) }))),
    );
    expect(points.some((p) => boxHolds(now, p))).toBe(false);
  });

  it('distanceChartLayout reads each line at the present distance with the ledger’s level', () => {
    const layout = distanceChartLayout(data());
    expect(layout.readouts.map((r) => r.level)).toEqual([68, 67.5, 67]);
    for (const r of layout.readouts) expect(r.at.x).toBeCloseTo(layout.x(40), 9);
  });

  it('distanceChartLayout breaks a line where a level is not computed, and lists a line with none as missing', () => {
    const broken = data({
      curves: [
        {
          candidateId: 'a',
          label: 'Machine a',
          isBaseline: true,
          points: [
            { distanceM: 10, levelDb: 80 },
            { distanceM: 20, levelDb: NaN },
            { distanceM: 50, levelDb: 66 },
            { distanceM: 100, levelDb: 60 },
          ],
        },
        { candidateId: 'z', label: 'Machine z', isBaseline: false, points: [{ distanceM: 10, levelDb: NaN }] },
      ],
    });
    const layout = distanceChartLayout(broken);
    expect(layout.pathOf(broken.curves[0]!.points).match(/M/g)).toHaveLength(2);
    expect(layout.missing.map((c) => c.candidateId)).toEqual(['z']);
  });

  it('shortenLabel cuts a long name with "…" to the characters the column holds', () => {
    const long = 'Long-reach excavator with quiet pack';
    expect(shortenLabel(long)).toHaveLength(LABEL_CHARS);
    expect(shortenLabel(long).endsWith('…')).toBe(true);
    expect(shortenLabel('Excavator')).toBe('Excavator');
  });
});
