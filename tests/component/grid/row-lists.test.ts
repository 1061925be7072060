/**
 * The lists a grid row is told and keeps: the selection, active cell and edit as far as they
 * concern one row, and lists kept as the same object while their items are the same (what
 * lets an edit redraw only the cells it changed).
 */
import { describe, expect, it } from 'vitest';
import { keepSame, keeper, sameEntry } from '../../../src/app/grid/keep-same.ts';
import { activeColumnOn, editOn, selectedColumnsOn } from '../../../src/app/grid/row-focus.ts';
import { startEdit } from '../../../src/app/grid/edit-session.ts';

describe('keepSame', () => {
  it('gives back the kept list when every item is the same (from memory: what the list is for)', () => {
    const kept = ['68.1', '0.0'];
    expect(keepSame(kept, ['68.1', '0.0'])).toBe(kept);
  });

  it('gives the new list when one item, or the length, differs', () => {
    const kept = ['68.1', '0.0'];
    const changed = ['68.1', '0.4'];
    expect(keepSame(kept, changed)).toBe(changed);
    const longer = ['68.1', '0.0', ''];
    expect(keepSame(kept, longer)).toBe(longer);
    expect(keepSame(undefined, changed)).toBe(changed);
  });

  it('compares column entries by column object and width', () => {
    const column = { id: 'lwa' };
    const kept = [{ column, width: 84 }];
    expect(keepSame(kept, [{ column, width: 84 }], sameEntry)).toBe(kept);
    const wider = [{ column, width: 90 }];
    expect(keepSame(kept, wider, sameEntry)).toBe(wider);
    const other = [{ column: { id: 'lwa' }, width: 84 }];
    expect(keepSame(kept, other, sameEntry)).toBe(other);
  });

  it('a keeper returns its last list while the new one reads the same, then the new one', () => {
    const keep = keeper<string | undefined>();
    const first = keep(['a', undefined]);
    expect(keep(['a', undefined])).toBe(first);
    const second = keep(['a', 'flagged']);
    expect(second).not.toBe(first);
    expect(keep(['a', 'flagged'])).toBe(second);
  });
});

describe('what of the selection, the active cell and the edit a row is told', () => {
  const range = { top: 2, bottom: 4, left: 1, right: 3 };

  it('a row inside the selection gets its columns, a row outside an empty span', () => {
    expect(selectedColumnsOn(range, 2)).toEqual({ left: 1, right: 3 });
    expect(selectedColumnsOn(range, 4)).toEqual({ left: 1, right: 3 });
    const outside = selectedColumnsOn(range, 5);
    expect(outside.right).toBeLessThan(outside.left);
    // the same object for every row outside, so those rows see no change when the selection moves
    expect(selectedColumnsOn(range, 1)).toBe(outside);
  });

  it('the active column only on the active row', () => {
    expect(activeColumnOn({ row: 3, col: 2 }, 3)).toBe(2);
    expect(activeColumnOn({ row: 3, col: 2 }, 4)).toBe(-1);
  });

  it('the edit only on the row it is in', () => {
    const edit = startEdit({ row: 0, col: 1 }, 'c7', 'lwaDb', '104', '1');
    expect(editOn(edit, 'c7')).toBe(edit);
    expect(editOn(edit, 'c8')).toBeNull();
    expect(editOn(null, 'c7')).toBeNull();
  });
});
