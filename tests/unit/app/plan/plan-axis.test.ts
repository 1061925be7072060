/** The plan's grid-line numbers: none overlapping, none past the plan's edge. Layouts are invented. */
import { describe, expect, it } from 'vitest';
import { axisLabels, letteringUnit } from '../../../../src/app/plan/plan-axis.ts';
import { boxesMeet, textWidth } from '../../../../src/app/results/distance-chart-view.ts';

describe('axisLabels', () => {
  // a plan from x −100 to 300 and y −150 to 100 m, grid lines every 50 m, unit = width / 100 = 4 m
  const box = { minX: -100, maxX: 300, minY: -150, maxY: 100 };
  const { x, y } = axisLabels(box, 50, 4);

  it('axisLabels keeps "−100" at the bottom-left corner and leaves out the "−150" that would print over it', () => {
    expect(x[0]?.value).toBe(-100);
    expect(y.map((l) => l.value)).not.toContain(-150);
    expect(y.map((l) => l.value)).toContain(0);
  });

  it('axisLabels returns numbers whose boxes never meet and never run past the right edge', () => {
    const font = 4 * 1.6;
    const boxes = [...x, ...y].map((l) => ({ x: l.x, y: l.y - font, w: textWidth(String(l.value), font), h: font }));
    for (let i = 0; i < boxes.length; i++) {
      expect(boxes[i]!.x + boxes[i]!.w).toBeLessThanOrEqual(box.maxX);
      for (let j = i + 1; j < boxes.length; j++) expect(boxesMeet(boxes[i]!, boxes[j]!)).toBe(false);
    }
  });

  it('axisLabels leaves out the "300" at the right edge, whose text would be cut', () => {
    // the x number starts 1.6 m right of its line: 300 + 1.6 + 3 × 6.4 × 0.58 runs past 300
    expect(x.map((l) => l.value)).not.toContain(300);
    expect(x.map((l) => l.value)).toContain(250);
  });

  it('axisLabels leaves out a y number that would stand beside the x numbers, even with room between them', () => {
    // plan x −165…155, y −101…225 (the demo's shape): the y line −100 lies 1 m above the bottom edge
    const demo = axisLabels({ minX: -165, maxX: 155, minY: -101, maxY: 225 }, 50, 3.2);
    expect(demo.x.map((l) => l.value)).toContain(-150);
    expect(demo.y.map((l) => l.value)).not.toContain(-100);
    expect(demo.y.map((l) => l.value)).toContain(-50);
  });
});

describe('letteringUnit', () => {
  // worked by hand: a 350 m wide plan drawn 490 px wide is 1.4 px a metre; one hundredth of it (3.5 m)
  // letters the grid numbers at 3.5 × 1.6 × 1.4 = 7.84 px, so the unit grows to 11.5 / (1.6 × 1.4) = 5.134 m
  it('letteringUnit(3.5, 1.4) grows the unit so the smallest lettering is 11.5 px on screen', () => {
    expect(letteringUnit(3.5, 1.4)).toBeCloseTo(5.134, 3);
    expect(letteringUnit(3.5, 1.4) * 1.6 * 1.4).toBeCloseTo(11.5, 6);
  });

  it('letteringUnit keeps one hundredth of the plan where that is large enough on screen', () => {
    // 3.5 × 1.6 × 3 = 16.8 px
    expect(letteringUnit(3.5, 3)).toBe(3.5);
  });

  it.each([0, NaN, -1])('letteringUnit(3.5, %s) keeps the unit before the plan is laid out', (scale) => {
    expect(letteringUnit(3.5, scale)).toBe(3.5);
  });
});
