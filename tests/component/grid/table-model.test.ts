/**
 * The grid's row model on table-core: groups, sorting within groups,
 * filters, collapsed groups, widths, and the in-place edit fast path.
 * Expected orders are read off the invented fixture by hand.
 */
import { describe, expect, it } from 'vitest';
import { GridModel, MIN_COLUMN_WIDTH_PX } from '../../../src/app/grid/table-model.ts';
import { columns, dutyGroups, machines } from './fixture.ts';
import type { Machine } from './fixture.ts';

function makeModel(rows: Machine[] = machines, grouped = true) {
  return new GridModel<Machine>(
    rows,
    columns,
    (m) => m.id,
    () => (grouped ? dutyGroups : undefined),
  );
}
function lines(model: GridModel<Machine>): string[] {
  return model
    .view()
    .rows.map((line) =>
      line.kind === 'group' ? `[${line.key} ${line.count}${line.expanded ? '' : ' closed'}]` : line.id,
    );
}

describe('GridModel', () => {
  it('view() without grouping lists the rows in the given order', () => {
    expect(lines(makeModel(machines, false))).toEqual(['m1', 'm2', 'm3', 'm4', 'm5']);
  });
  it('view() with grouping puts a header with the row count before each group, groups in order of first appearance', () => {
    const model = makeModel();
    expect(lines(model)).toEqual(['[dig 3]', 'm1', 'm2', 'm3', '[lift 2]', 'm4', 'm5']);
    expect(model.view().dataIds).toEqual(['m1', 'm2', 'm3', 'm4', 'm5']);
    expect(Array.from(model.view().dataIndex)).toEqual([-1, 0, 1, 2, -1, 3, 4]);
  });
  it('setGroupExpanded(false) hides the rows of that group only', () => {
    const model = makeModel();
    model.setGroupExpanded(model.view().rows[0]!.id, false);
    expect(lines(model)).toEqual(['[dig 3 closed]', '[lift 2]', 'm4', 'm5']);
    model.setAllGroupsExpanded(false);
    expect(lines(model)).toEqual(['[dig 3 closed]', '[lift 2 closed]']);
    model.setAllGroupsExpanded(true);
    expect(lines(model)).toHaveLength(7);
  });
  it('cycleSort sorts within groups: ascending, descending, then original order', () => {
    const model = makeModel();
    model.cycleSort('lwa');
    expect(model.sortDirection('lwa')).toBe('asc');
    expect(lines(model)).toEqual(['[dig 3]', 'm2', 'm1', 'm3', '[lift 2]', 'm4', 'm5']); // 99.5 < 104 < 108; 97 < 101
    model.cycleSort('lwa');
    expect(lines(model)).toEqual(['[dig 3]', 'm3', 'm1', 'm2', '[lift 2]', 'm5', 'm4']);
    model.cycleSort('lwa');
    expect(model.sortDirection('lwa')).toBe(false);
    expect(lines(model)).toEqual(['[dig 3]', 'm1', 'm2', 'm3', '[lift 2]', 'm4', 'm5']);
  });
  it('setQuickFilter matches the shown text of any column, case ignored, and group counts follow', () => {
    const model = makeModel();
    model.setQuickFilter('ELECTRIC');
    expect(lines(model)).toEqual(['[dig 1]', 'm2', '[lift 1]', 'm4']);
    model.setQuickFilter('');
    expect(lines(model)).toHaveLength(7);
  });
  it('setColumnFilter keeps rows whose shown text in that column contains the text', () => {
    const model = makeModel();
    model.setColumnFilter('name', 'loam');
    expect(model.columnFilter('name')).toBe('loam');
    expect(lines(model)).toEqual(['[dig 2]', 'm1', 'm2']);
  });
  it('setColumnVisible(false) hides a column from visibleColumns()', () => {
    const model = makeModel();
    model.setColumnVisible('drive', false);
    expect(model.visibleColumns().map((entry) => entry.column.id)).toEqual(['name', 'lwa', 'level']);
    expect(model.columnVisibility().find((entry) => entry.column.id === 'drive')?.visible).toBe(false);
  });
  it('setColumnWidth clamps to the minimum width', () => {
    const model = makeModel();
    model.setColumnWidth('name', 5);
    expect(model.columnWidth('name')).toBe(MIN_COLUMN_WIDTH_PX);
    model.setColumnWidth('name', 212.4);
    expect(model.columnWidth('name')).toBe(212);
  });
  it('update() with a row replaced in place patches the display list and keeps other entries', () => {
    const model = makeModel();
    const before = model.view();
    const edited = machines.map((m) => (m.id === 'm2' ? { ...m, name: 'Renamed' } : m));
    model.update(edited, columns);
    const after = model.view();
    expect(after).not.toBe(before);
    expect(after.rows[2]).toEqual({ kind: 'row', id: 'm2', row: edited[1], group: 'dig' });
    expect(after.rows[1]).toBe(before.rows[1]);
  });
  it('a sort after patched edits uses the edited values', () => {
    const model = makeModel();
    const edited = machines.map((m) => (m.id === 'm1' ? { ...m, name: 'Zz last' } : m));
    model.update(edited, columns);
    model.setSort('name', 'asc');
    expect(lines(model)).toEqual(['[dig 3]', 'm2', 'm3', 'm1', '[lift 2]', 'm5', 'm4']);
  });
  it('update() that changes the sorted value moves the row at once', () => {
    const model = makeModel();
    model.setSort('lwa', 'asc');
    const edited = machines.map((m) => (m.id === 'm3' ? { ...m, lwa: 90 } : m));
    model.update(edited, columns);
    expect(lines(model)).toEqual(['[dig 3]', 'm3', 'm2', 'm1', '[lift 2]', 'm4', 'm5']);
  });
  it('update() that moves a row to another group rebuilds the groups (groups keep order of first appearance)', () => {
    const model = makeModel();
    const edited = machines.map((m) => (m.id === 'm2' ? { ...m, duty: 'lift' } : m));
    model.update(edited, columns);
    expect(lines(model)).toEqual(['[dig 2]', 'm1', 'm3', '[lift 3]', 'm2', 'm4', 'm5']);
  });
  it('update() with an appended row shows it in its group', () => {
    const model = makeModel();
    model.update([...machines, { id: 'm6', duty: 'dig', name: 'New', lwa: 100, drive: 'diesel', level: 50 }], columns);
    expect(lines(model)).toEqual(['[dig 4]', 'm1', 'm2', 'm3', 'm6', '[lift 2]', 'm4', 'm5']);
  });
});

describe('GridModel sorted by a computed column', () => {
  it('update() re-sorts rows the edit did not replace when their computed values changed', () => {
    // A computed column that reads figures held outside the rows, as the app's level and rank columns do.
    const figures = new Map<string, number>([
      ['m1', 3],
      ['m2', 1],
      ['m3', 2],
      ['m4', 5],
      ['m5', 4],
    ]);
    const rank: (typeof columns)[number] = {
      id: 'rank',
      header: 'Rank',
      kind: 'computed',
      editable: false,
      value: (m) => figures.get(m.id),
      display: (m) => String(figures.get(m.id)),
    };
    const cols = [...columns, rank];
    const model = new GridModel<Machine>(
      machines,
      cols,
      (m) => m.id,
      () => undefined,
    );
    model.cycleSort('rank');
    expect(lines(model)).toEqual(['m2', 'm3', 'm1', 'm5', 'm4']);
    // Editing m1 changes the figures of m2 and m4 too; only m1 is a new row object.
    figures.set('m2', 9).set('m4', 0);
    const edited = machines.map((m) => (m.id === 'm1' ? { ...m, lwa: 103 } : m));
    model.update(edited, cols);
    expect(lines(model)).toEqual(['m4', 'm3', 'm1', 'm5', 'm2']);
  });
});
