import { describe, expect, it } from 'vitest';
import { placePlanLabels } from '../../../../src/app/plan/plan-labels.ts';

const label = (id: string, x: number, y: number, text = 'Label') => ({ id, x, y, text, fontSize: 10, markHalf: 3 });

describe('placePlanLabels', () => {
  it('placePlanLabels writes a lone label to the right of its mark', () => {
    const [one] = placePlanLabels([label('a', 0, 0)]);
    expect(one?.at?.anchor).toBe('start');
    expect(one!.at!.x).toBeGreaterThan(0);
  });

  it('placePlanLabels moves the second of two marks side by side to its left, so the labels do not meet', () => {
    const [a, b] = placePlanLabels([label('a', 0, 0), label('b', 0, 4)]);
    expect(a?.at?.anchor).toBe('start');
    expect(b?.at?.anchor).not.toBe('start');
  });

  it('placePlanLabels leaves a label unwritten when every place around its mark is taken', () => {
    const crowd = [
      label('a', 0, 0, 'Long name here'),
      label('b', 2, 0),
      label('c', -2, 0),
      label('d', 0, 2),
      label('e', 0, -2),
    ];
    const placed = placePlanLabels(crowd);
    expect(placed.some((p) => p.at === undefined)).toBe(true);
    expect(placed.map((p) => p.id)).toEqual(['a', 'b', 'c', 'd', 'e']);
  });
});

describe('placePlanLabels within the plan', () => {
  // plans x 0…w, y 0…50 in SVG units; marks near the right edge (invented layouts)
  const plan = { x: 0, y: 0, w: 100, h: 50 };

  it('placePlanLabels writes a long name left of a mark near the right edge, not past the edge', () => {
    // 16 characters × 10 × 0.58 = 92.8 wide, 6 from the mark: right of 180 would end at 278.8, past 200
    const [one] = placePlanLabels([label('r', 180, 25, 'Saltmarsh School')], { x: 0, y: 0, w: 200, h: 50 });
    expect(one?.at).toEqual({ x: 174, y: 28.5, anchor: 'end' });
    // without the plan's edge given it would go right, as before
    expect(placePlanLabels([label('r', 180, 25, 'Saltmarsh School')])[0]?.at?.anchor).toBe('start');
  });

  it('placePlanLabels slides a name above its mark along to fit when neither side has room', () => {
    const [one] = placePlanLabels([label('r', 95, 25, 'Quillhaven Cottage')], { x: 0, y: 0, w: 120, h: 50 });
    // 18 characters × 10 × 0.58 = 104.4 wide: right of 95 runs past 120, left of 95 past 0
    expect(one?.at?.anchor).toBe('start');
    expect(one!.at!.x).toBeGreaterThanOrEqual(0);
    expect(one!.at!.x + 104.4).toBeLessThanOrEqual(120 + 1e-9);
    expect(one!.at!.y).toBeLessThan(25);
  });

  it('placePlanLabels leaves a name unwritten when it cannot lie within the plan at all', () => {
    const [one] = placePlanLabels([label('r', 50, 25, 'A name much wider than the whole plan')], plan);
    expect(one?.at).toBeUndefined();
  });
});
