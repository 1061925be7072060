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
