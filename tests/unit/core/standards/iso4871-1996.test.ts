import { describe, expect, it } from 'vitest';
import { closeCalls, declaredValueDb } from '../../../../src/core/standards/iso4871-1996.ts';

describe('declaredValueDb (ISO 4871:1996 single-number form Ld = L + K)', () => {
  it('declaredValueDb(101, 2) is 103 (ISO 4871 clause 3: declared value is L + K)', () => {
    expect(declaredValueDb(101, 2)).toBe(103);
  });
  it('declaredValueDb refuses a negative K and names it', () => {
    expect(() => declaredValueDb(101, -1)).toThrow(/uncertainty K/);
  });
});

describe('closeCalls', () => {
  it('pairs levels whose difference is within the larger K (ledger rule from ISO 4871 K)', () => {
    const pairs = closeCalls([
      { id: 'a', levelDb: 100, uncertaintyDb: 2 },
      { id: 'b', levelDb: 101.5, uncertaintyDb: 1 },
      { id: 'c', levelDb: 106, uncertaintyDb: 1.5 },
    ]);
    expect(pairs).toEqual([['a', 'b']]);
  });
  it('closeCalls of an empty list is empty', () => {
    expect(closeCalls([])).toEqual([]);
  });
  it('closeCalls skips levels that are not computed', () => {
    expect(
      closeCalls([
        { id: 'a', levelDb: NaN, uncertaintyDb: 3 },
        { id: 'b', levelDb: 100, uncertaintyDb: 3 },
      ]),
    ).toEqual([]);
  });
});
