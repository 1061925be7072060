/**
 * Active cell and range arithmetic. Expected positions follow the common
 * practice of spreadsheet programs: moves stop at the edges, Tab wraps to the
 * next row, Shift+arrows grow a rectangle from a fixed anchor.
 */
import { describe, expect, it } from 'vitest';
import {
  clampPos,
  clampRange,
  inRange,
  isMultiCell,
  moveBy,
  moveTo,
  rangeCellCount,
  rangeOf,
  tabFrom,
} from '../../../src/app/grid/index.ts';

const bounds = { rows: 5, cols: 3 };

describe('clampPos', () => {
  it('clampPos({ row: 9, col: -2 }) keeps the position inside rows −1…4 and columns 0…2', () => {
    expect(clampPos({ row: 9, col: -2 }, bounds)).toEqual({ row: 4, col: 0 });
    expect(clampPos({ row: -7, col: 8 }, bounds)).toEqual({ row: -1, col: 2 }); // −1 is the header row
  });
  it('clampPos in an empty grid returns the header row', () => {
    expect(clampPos({ row: 3, col: 3 }, { rows: 0, cols: 0 })).toEqual({ row: -1, col: 0 });
  });
});

describe('moveBy', () => {
  it('moveBy stops at the last row and the last column', () => {
    expect(moveBy({ row: 4, col: 2 }, 1, 1, bounds)).toEqual({ row: 4, col: 2 });
  });
  it('moveBy up from the first row reaches the header row', () => {
    expect(moveBy({ row: 0, col: 1 }, -1, 0, bounds)).toEqual({ row: -1, col: 1 });
  });
  it('moveBy with extend never enters the header row', () => {
    expect(moveBy({ row: 0, col: 1 }, -1, 0, bounds, true)).toEqual({ row: 0, col: 1 });
  });
});

describe('moveTo', () => {
  it.each([
    ['rowStart', { row: 2, col: 0 }],
    ['rowEnd', { row: 2, col: 2 }],
    ['colStart', { row: 0, col: 1 }],
    ['colEnd', { row: 4, col: 1 }],
    ['gridStart', { row: 0, col: 0 }],
    ['gridEnd', { row: 4, col: 2 }],
  ] as const)('moveTo(%s) from row 2, column 1', (target, expected) => {
    expect(moveTo({ row: 2, col: 1 }, target, bounds)).toEqual(expected);
  });
});

describe('tabFrom', () => {
  it('tabFrom the last column wraps to the first column of the next row', () => {
    expect(tabFrom({ row: 0, col: 2 }, false, bounds)).toEqual({ row: 1, col: 0 });
  });
  it('tabFrom backwards at the first column goes to the end of the row above', () => {
    expect(tabFrom({ row: 1, col: 0 }, true, bounds)).toEqual({ row: 0, col: 2 });
  });
  it('tabFrom the very last cell returns the same position object (focus may leave the grid)', () => {
    const last = { row: 4, col: 2 };
    expect(tabFrom(last, false, bounds)).toBe(last);
  });
});

describe('rangeOf', () => {
  it('rangeOf orders the corners whichever way the selection grew', () => {
    expect(rangeOf({ row: 3, col: 2 }, { row: 1, col: 0 })).toEqual({ top: 1, bottom: 3, left: 0, right: 2 });
  });
  it('rangeOf leaves the header row out', () => {
    expect(rangeOf({ row: -1, col: 1 }, { row: -1, col: 1 })).toEqual({ top: 0, bottom: 0, left: 1, right: 1 });
  });
  it('inRange, rangeCellCount and isMultiCell read a 3 × 2 range', () => {
    const range = { top: 1, bottom: 3, left: 0, right: 1 };
    expect(inRange(range, 2, 1)).toBe(true);
    expect(inRange(range, 4, 1)).toBe(false);
    expect(rangeCellCount(range)).toBe(6);
    expect(isMultiCell(range)).toBe(true);
    expect(isMultiCell({ top: 2, bottom: 2, left: 1, right: 1 })).toBe(false);
  });
  it('clampRange shrinks a range after rows were removed', () => {
    expect(clampRange({ top: 2, bottom: 9, left: 0, right: 4 }, bounds)).toEqual({
      top: 2,
      bottom: 4,
      left: 0,
      right: 2,
    });
  });
});
