/**
 * Turning clear, fill down, paste and typing into cell changes. Expected
 * changes follow the common practice of spreadsheet programs: a pasted
 * block lands at the active cell, a single pasted value fills the selection,
 * fill down copies the top cell (or the cell above a one-row selection),
 * read-only cells are left alone.
 */
import { describe, expect, it } from 'vitest';
import {
  cellProblem,
  cellText,
  commitEdit,
  compareValues,
  markBadges,
  planClear,
  planFillDown,
  planPaste,
  refusalMessage,
  rowProblems,
  sortableValue,
  startEdit,
  updateEdit,
} from '../../../src/app/grid/index.ts';
import { replacedRows, patchDisplay } from '../../../src/app/grid/row-patch.ts';
import { choiceValue } from '../../../src/app/grid/edit-session.ts';
import { columns } from './fixture.ts';

const editable = [
  { id: 'name', editable: true },
  { id: 'lwa', editable: true },
  { id: 'level', editable: false },
];

describe('planPaste', () => {
  it('planPaste of a 2 × 2 block writes four cells from the start cell', () => {
    const changes = planPaste(
      [
        ['A', '101'],
        ['B', '102'],
      ],
      { rowIds: ['r1', 'r2', 'r3'], startRow: 1, columns: editable, startCol: 0 },
    );
    expect(changes).toEqual([
      { rowId: 'r2', columnId: 'name', text: 'A' },
      { rowId: 'r2', columnId: 'lwa', text: '101' },
      { rowId: 'r3', columnId: 'name', text: 'B' },
      { rowId: 'r3', columnId: 'lwa', text: '102' },
    ]);
  });
  it('planPaste past the last row asks for new rows numbered from 0, with the group', () => {
    const changes = planPaste([['A'], ['B'], ['C']], {
      rowIds: ['r1'],
      startRow: 0,
      columns: editable,
      startCol: 0,
      group: 'dig',
    });
    expect(changes).toEqual([
      { rowId: 'r1', columnId: 'name', text: 'A' },
      { rowId: null, newRow: 0, group: 'dig', columnId: 'name', text: 'B' },
      { rowId: null, newRow: 1, group: 'dig', columnId: 'name', text: 'C' },
    ]);
  });
  it('planPaste skips read-only columns and drops cells past the last column', () => {
    const changes = planPaste([['99', '70', 'x', 'y']], {
      rowIds: ['r1'],
      startRow: 0,
      columns: editable,
      startCol: 1,
    });
    expect(changes).toEqual([{ rowId: 'r1', columnId: 'lwa', text: '99' }]);
  });
  it('planPaste of one value over a 2 × 2 selection fills all four cells', () => {
    const changes = planPaste([['5']], {
      rowIds: ['r1', 'r2'],
      startRow: 0,
      columns: editable,
      startCol: 0,
      fill: { rows: 2, cols: 2 },
    });
    expect(changes.map((change) => `${change.rowId}.${change.columnId}=${change.text}`)).toEqual([
      'r1.name=5',
      'r1.lwa=5',
      'r2.name=5',
      'r2.lwa=5',
    ]);
  });
  it('planPaste keeps empty cells as empty text but makes no new row from an empty line', () => {
    const changes = planPaste([['', '7'], [''], ['Z']], {
      rowIds: ['r1'],
      startRow: 0,
      columns: editable,
      startCol: 0,
    });
    expect(changes).toEqual([
      { rowId: 'r1', columnId: 'name', text: '' },
      { rowId: 'r1', columnId: 'lwa', text: '7' },
      { rowId: null, newRow: 0, columnId: 'name', text: 'Z' },
    ]);
  });
});

describe('planFillDown', () => {
  const text: Record<string, string> = { 'a.name': 'Top', 'a.lwa': '101', 'b.lwa': '101', 'c.name': 'Old' };
  const textOf = (rowId: string, columnId: string) => text[`${rowId}.${columnId}`] ?? '';
  it('planFillDown copies the top cell of each column into the cells that differ', () => {
    expect(planFillDown(['a', 'b', 'c'], editable, textOf)).toEqual([
      { rowId: 'b', columnId: 'name', text: 'Top' },
      { rowId: 'c', columnId: 'name', text: 'Top' },
      { rowId: 'c', columnId: 'lwa', text: '101' },
    ]);
  });
  it('planFillDown with one selected row copies the row above into it', () => {
    expect(planFillDown(['c'], [{ id: 'name', editable: true }], textOf, 'a')).toEqual([
      { rowId: 'c', columnId: 'name', text: 'Top' },
    ]);
  });
  it('planFillDown with one selected row and nothing above changes nothing', () => {
    expect(planFillDown(['a'], editable, textOf)).toEqual([]);
  });
});

describe('planClear', () => {
  it('planClear empties editable, non-empty cells only', () => {
    const textOf = (rowId: string, columnId: string) => (rowId === 'b' && columnId === 'name' ? '' : 'x');
    expect(planClear(['a', 'b'], editable, textOf)).toEqual([
      { rowId: 'a', columnId: 'name', text: '' },
      { rowId: 'a', columnId: 'lwa', text: '' },
      { rowId: 'b', columnId: 'lwa', text: '' },
    ]);
  });
});

describe('edit session', () => {
  it('startEdit with a typed character replaces the content', () => {
    const session = startEdit({ row: 1, col: 1 }, 'm1', 'lwa', '104.0', '9');
    expect(session.text).toBe('9');
    expect(session.mode).toBe('replace');
  });
  it('startEdit without a character keeps the content for editing', () => {
    expect(startEdit({ row: 1, col: 1 }, 'm1', 'lwa', '104.0').text).toBe('104.0');
  });
  it('commitEdit reports the typed text, or null when unchanged', () => {
    const session = startEdit({ row: 1, col: 1 }, 'm1', 'lwa', '104.0');
    expect(commitEdit(session)).toBeNull();
    expect(commitEdit(updateEdit(session, '12O'))).toEqual({ rowId: 'm1', columnId: 'lwa', text: '12O' });
  });
  it('refusalMessage explains computed and read-only columns', () => {
    expect(refusalMessage({ header: 'Level', kind: 'computed', editable: false })).toMatch(
      /computed from other columns/,
    );
    expect(refusalMessage({ header: 'Id', kind: 'text', editable: false })).toMatch(/read-only/);
    expect(refusalMessage({ header: 'LWA', kind: 'number', editable: true })).toBeUndefined();
  });
  it('choiceValue maps a typed label to the choice value, case ignored', () => {
    const drive = columns.find((column) => column.id === 'drive')!;
    expect(choiceValue(drive, 'electric')).toBe('electric');
    expect(choiceValue(drive, ' Diesel ')).toBe('diesel');
    expect(choiceValue(drive, 'steam')).toBe('steam'); // unknown text goes to the owner as typed
  });
});

describe('cell text and problems', () => {
  const lwa = columns.find((column) => column.id === 'lwa')!;
  const row = { id: 'm1', duty: 'dig', name: 'A', lwa: NaN, drive: 'diesel' as const, level: NaN };
  it('cellText shows the kept raw text instead of the parsed value', () => {
    expect(cellText(lwa, row, 'm1', () => '12O')).toBe('12O');
    expect(cellText(lwa, { ...row, lwa: 104 }, 'm1')).toBe('104.0');
  });
  it("cellProblem prefers the owner's message, else names what the column accepts", () => {
    expect(
      cellProblem(
        lwa,
        'm1',
        row,
        () => 'Row 1, LWA: "12O" is not a number',
        () => '12O',
      ),
    ).toBe('Row 1, LWA: "12O" is not a number');
    expect(cellProblem(lwa, 'm1', row, undefined, () => '12O')).toBe('"12O" could not be read (use dB, e.g. 104.5)');
    expect(cellProblem(lwa, 'm1', row)).toBeUndefined();
  });
  it('rowProblems gives the owner the row, and skips the cells of a row the owner says has no message', () => {
    const seen: string[] = [];
    const problem = (rowId: string, columnId: string, shown: typeof row) => {
      seen.push(`${rowId}/${columnId}/${shown.name}`);
      return columnId === 'lwa' ? 'no LWA' : undefined;
    };
    const all = rowProblems(columns, 'm1', row, problem);
    expect(all[columns.indexOf(lwa)]).toBe('no LWA');
    expect(all.filter((m) => m !== undefined)).toHaveLength(1);
    expect(seen).toContain('m1/lwa/A');
    seen.length = 0;
    expect(rowProblems(columns, 'm1', row, problem, undefined, () => false)).toEqual([]);
    expect(seen).toEqual([]);
    // flagged true: every cell asked as before
    expect(rowProblems(columns, 'm1', row, problem, undefined, () => true)).toEqual(all);
  });
  it('markBadges lists text badges in a fixed order', () => {
    expect(markBadges({ pinned: true, over: true, excluded: false }).map((badge) => badge.short)).toEqual([
      'over',
      'pin',
    ]);
    expect(markBadges(undefined)).toEqual([]);
  });
});

describe('sorting values', () => {
  it('compareValues orders numbers numerically and text naturally', () => {
    expect(compareValues(9, 10)).toBeLessThan(0);
    expect(compareValues('Unit 2', 'Unit 10')).toBeLessThan(0); // natural order, common practice
    expect(compareValues('abc', 'ABC')).toBe(0);
    expect(compareValues(false, true)).toBeLessThan(0);
    expect(compareValues(5, 'a')).toBeLessThan(0);
  });
  it('sortableValue turns NaN and empty text into undefined (sorted last)', () => {
    expect(sortableValue(NaN)).toBeUndefined();
    expect(sortableValue('')).toBeUndefined();
    expect(sortableValue(0)).toBe(0);
  });
});

describe('row patch', () => {
  const a = { id: 'a', g: 'x' };
  const b = { id: 'b', g: 'x' };
  it('replacedRows finds rows replaced in place', () => {
    const b2 = { ...b };
    expect(replacedRows([a, b], [a, b2], (row) => row.id)).toEqual(new Map([['b', b2]]));
  });
  it('replacedRows returns null when rows were added, reordered or would move', () => {
    expect(replacedRows([a], [a, b], (row) => row.id)).toBeNull();
    expect(replacedRows([a, b], [b, a], (row) => row.id)).toBeNull();
    expect(
      replacedRows(
        [a, b],
        [a, { ...b, g: 'y' }],
        (row) => row.id,
        (before, after) => before.g === after.g,
      ),
    ).toBeNull();
  });
  it('patchDisplay swaps in replaced rows and keeps other entries', () => {
    const lines = [
      { kind: 'group' as const, id: 'g', key: 'x', count: 2, expanded: true },
      { kind: 'row' as const, id: 'a', row: a },
      { kind: 'row' as const, id: 'b', row: b },
    ];
    const b2 = { ...b };
    const patched = patchDisplay(lines, new Map([['b', b2]]));
    expect(patched[0]).toBe(lines[0]);
    expect(patched[1]).toBe(lines[1]);
    expect(patched[2]).toEqual({ kind: 'row', id: 'b', row: b2 });
  });
});
