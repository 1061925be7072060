import { describe, expect, it } from 'vitest';
import { roundPermissible } from '../../../../../src/core/standards/directive-2000-14-ec/index.ts';

describe('roundPermissible (Directive 2000/14/EC Art. 12 rounding: < .5 down, ≥ .5 up)', () => {
  it.each([
    [97.49, 97],
    [97.5, 98],
    [97.51, 98],
    [102, 102],
  ])('roundPermissible(%d) is %d', (x, y) => {
    expect(roundPermissible(x)).toBe(y);
  });
});
