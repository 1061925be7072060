import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { alongPolyline, freeBox, spreadLabels } from '../../../../src/app/results/distance-chart-view.ts';

describe('spreadLabels', () => {
  it('spreadLabels([100, 105, 300], 20, 10, 310) pushes the second label down to 120', () => {
    expect(spreadLabels([100, 105, 300], 20, 10, 310)).toEqual([100, 120, 300]);
  });

  it('spreadLabels pushes labels crowded at the bottom back up inside the drawing', () => {
    expect(spreadLabels([300, 300, 300], 24, 20, 310)).toEqual([262, 286, 310]);
  });

  it('spreadLabels keeps the order given when the wanted positions are unsorted', () => {
    expect(spreadLabels([200, 50], 20, 0, 400)).toEqual([200, 50]);
  });

  it('spreadLabels: labels that fit stay within [top, bottom] and at least the gap apart (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -50, max: 500, noNaN: true }), { maxLength: 8 }), (wanted) => {
        const got = spreadLabels(wanted, 24, 20, 344);
        const sorted = [...got].sort((a, b) => a - b);
        for (const y of got) expect(y >= 20 && y <= 344).toBe(true);
        for (let i = 1; i < sorted.length; i++) expect(sorted[i]! - sorted[i - 1]!).toBeGreaterThanOrEqual(24 - 1e-9);
      }),
    );
  });
});

describe('freeBox and alongPolyline', () => {
  it('alongPolyline puts points no more than the step apart between vertices', () => {
    const pts = alongPolyline(
      [
        { x: 0, y: 0 },
        { x: 10, y: 0 },
      ],
      4,
    );
    expect(pts.map((p) => p.x)).toEqual([0, 10 / 3, 20 / 3, 10]);
  });

  it('freeBox takes the first box that no line crosses', () => {
    const line = alongPolyline([
      { x: 0, y: 50 },
      { x: 100, y: 50 },
    ]);
    const over = { x: 10, y: 44, w: 40, h: 12 };
    const above = { x: 10, y: 20, w: 40, h: 12 };
    expect(freeBox([over, above], line)).toBe(above);
  });

  it('freeBox keeps clear of a box already taken', () => {
    const first = { x: 0, y: 0, w: 50, h: 14 };
    const second = { x: 0, y: 30, w: 50, h: 14 };
    expect(freeBox([first, second], [], [{ x: 10, y: 5, w: 10, h: 5 }])).toBe(second);
  });
});
