import { describe, expect, it } from 'vitest';
import { ARTICLE_12_TYPES } from '../../../../../src/core/standards/directive-2000-14-ec/index.ts';

describe('ARTICLE_12_TYPES (Art. 12 table and list of the consolidated text)', () => {
  it('every row names its source, the consolidated text, and its Annex I item(s) between 1 and 57', () => {
    for (const t of ARTICLE_12_TYPES) {
      expect(t.source).toContain('Directive 2000/14/EC, consolidated text incl. 2005/88/EC');
      expect(t.annexI.length).toBeGreaterThan(0);
      expect(t.annexI.every((n) => Number.isInteger(n) && n >= 1 && n <= 57)).toBe(true);
    }
  });
  it('Annex I items of the types Art. 12 lists: dozers 16, excavators 20, compressors 9, lift trucks 36, tower cranes 53', () => {
    const item = (category: string) => ARTICLE_12_TYPES.find((t) => t.category === category)!.annexI;
    expect(item('tracked-dozer')).toEqual([16]);
    expect(item('excavator')).toEqual([20]);
    expect(item('compressor')).toEqual([9]);
    expect(item('lift-truck')).toEqual([36]);
    expect(item('tower-crane')).toEqual([53]);
  });
});
