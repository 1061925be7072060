/**
 * The mounted grid with the small invented fixture: keyboard editing,
 * clipboard, fill down, undo keys, flagged cells, groups, sorting and
 * virtualisation. Expected behaviour is the common practice of spreadsheet
 * programs and the WAI-ARIA Authoring Practices grid pattern.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/svelte';
import { tick } from 'svelte';
import Grid from '../../../src/app/grid/Grid.svelte';
import { dutyGroups, gridProps, machines } from './fixture.ts';
import type { Machine } from './fixture.ts';

afterEach(() => cleanup());

async function mountGrid(overrides: Record<string, unknown> = {}) {
  const props = gridProps(overrides);
  render(Grid, { props });
  const grid = screen.getByRole('grid', { name: 'Machines' });
  grid.focus();
  await tick();
  return { props, grid };
}

async function press(target: Element, key: string, init: KeyboardEventInit = {}) {
  await fireEvent.keyDown(target, { key, ...init });
}

function activeCell(grid: HTMLElement): HTMLElement {
  const id = grid.getAttribute('aria-activedescendant');
  const cell = id ? document.getElementById(id) : null;
  if (!cell) throw new Error(`no active cell (${id})`);
  return cell;
}

async function paste(target: Element, text: string) {
  const event = new Event('paste', { bubbles: true, cancelable: true });
  Object.defineProperty(event, 'clipboardData', {
    value: { getData: (type: string) => (type === 'text/plain' ? text : '') },
  });
  target.dispatchEvent(event);
  await tick();
}

describe('Grid structure', () => {
  it('renders one grid with row and column counts, headers and cells, named by its label', async () => {
    const { grid } = await mountGrid();
    expect(grid.getAttribute('aria-rowcount')).toBe('6'); // 5 rows + the header row
    expect(grid.getAttribute('aria-colcount')).toBe('4');
    expect(
      within(grid)
        .getAllByRole('columnheader')
        .map((header) => header.textContent?.replace(/\s+/g, ' ').trim()),
    ).toEqual(['Machine ⋯', 'LWA dB ⋯', 'Drive ⋯', 'Level at receiver dB ⋯']);
    expect(within(grid).getAllByRole('row')).toHaveLength(6);
    expect(within(grid).getAllByRole('gridcell')[0]?.textContent).toContain('Loam mover A');
  });
  it('is one Tab stop: the grid takes focus, controls inside it do not', async () => {
    const { grid } = await mountGrid();
    expect(grid.tabIndex).toBe(0);
    for (const button of within(grid).getAllByRole('button')) expect(button.tabIndex).toBe(-1);
    expect(document.activeElement).toBe(grid);
    expect(activeCell(grid).textContent).toContain('Loam mover A');
  });
  it('renders only the rows in view for 2,000 rows', async () => {
    const many: Machine[] = Array.from({ length: 2000 }, (_, i) => ({
      ...machines[0]!,
      id: `x${i}`,
      name: `Unit ${i}`,
    }));
    const { grid } = await mountGrid({ rows: many });
    await new Promise((resolve) => setTimeout(resolve, 0));
    const rendered = within(grid).getAllByRole('row').length;
    expect(grid.getAttribute('aria-rowcount')).toBe('2001');
    expect(rendered).toBeGreaterThan(10);
    expect(rendered).toBeLessThan(60); // 600 px viewport / 30 px rows + overscan
  });
});

describe('Grid editing', () => {
  it('typing in a cell then Enter calls onedit once with the text and moves down', async () => {
    const { props, grid } = await mountGrid();
    await press(grid, 'ArrowRight');
    await press(grid, '9');
    const input = screen.getByRole('textbox', { name: 'LWA (dB)' }) as HTMLInputElement;
    expect(input.value).toBe('9'); // a typed character replaces the content
    await fireEvent.input(input, { target: { value: '98,5' } });
    await press(input, 'Enter');
    expect(props.onedit).toHaveBeenCalledTimes(1);
    expect(props.onedit).toHaveBeenCalledWith([{ rowId: 'm1', columnId: 'lwa', text: '98,5' }]); // passed as typed
    expect(screen.queryByRole('textbox', { name: 'LWA (dB)' })).toBeNull();
    expect(activeCell(grid).id).toMatch(/-r1c1$/);
    expect(document.activeElement).toBe(grid);
  });
  it('Escape cancels an edit without calling onedit', async () => {
    const { props, grid } = await mountGrid();
    await press(grid, 'x');
    const input = screen.getByRole('textbox', { name: 'Machine' });
    await press(input, 'Escape');
    expect(screen.queryByRole('textbox')).toBeNull();
    expect(props.onedit).not.toHaveBeenCalled();
    expect(activeCell(grid).textContent).toContain('Loam mover A');
  });
  it('F2 opens the editor with the current text and Tab commits and moves right', async () => {
    const { props, grid } = await mountGrid();
    await press(grid, 'F2');
    const input = screen.getByRole('textbox', { name: 'Machine' }) as HTMLInputElement;
    expect(input.value).toBe('Loam mover A');
    await fireEvent.input(input, { target: { value: 'Loam mover A2' } });
    await press(input, 'Tab');
    expect(props.onedit).toHaveBeenCalledWith([{ rowId: 'm1', columnId: 'name', text: 'Loam mover A2' }]);
    expect(activeCell(grid).id).toMatch(/-r0c1$/);
  });
  it('Enter on a computed column says why it cannot be edited', async () => {
    const { props, grid } = await mountGrid();
    await press(grid, 'End');
    await press(grid, 'Enter');
    expect(screen.queryByRole('textbox')).toBeNull();
    expect(screen.getByRole('status').textContent).toMatch(/Level at receiver is computed from other columns/);
    expect(props.onedit).not.toHaveBeenCalled();
  });
  it('Delete clears every editable cell of a range in one onedit call', async () => {
    const { props, grid } = await mountGrid();
    await press(grid, 'ArrowDown', { shiftKey: true });
    await press(grid, 'ArrowRight', { shiftKey: true });
    await press(grid, 'Delete');
    expect(props.onedit).toHaveBeenCalledTimes(1);
    expect(props.onedit).toHaveBeenCalledWith([
      { rowId: 'm1', columnId: 'name', text: '' },
      { rowId: 'm1', columnId: 'lwa', text: '' },
      { rowId: 'm2', columnId: 'name', text: '' },
      { rowId: 'm2', columnId: 'lwa', text: '' },
    ]);
  });
  it('Ctrl+D fills the top cell of the selection down', async () => {
    const { props, grid } = await mountGrid();
    await press(grid, 'ArrowRight');
    await press(grid, 'ArrowDown', { shiftKey: true });
    await press(grid, 'ArrowDown', { shiftKey: true });
    await press(grid, 'd', { ctrlKey: true });
    expect(props.onedit).toHaveBeenCalledTimes(1);
    expect(props.onedit).toHaveBeenCalledWith([
      { rowId: 'm2', columnId: 'lwa', text: '104.0' },
      { rowId: 'm3', columnId: 'lwa', text: '104.0' },
    ]);
  });
  it('Ctrl+Z calls onundo; Ctrl+Shift+Z and Ctrl+Y call onredo', async () => {
    const { props, grid } = await mountGrid();
    await press(grid, 'z', { ctrlKey: true });
    expect(props.onundo).toHaveBeenCalledTimes(1);
    await press(grid, 'Z', { ctrlKey: true, shiftKey: true });
    await press(grid, 'y', { ctrlKey: true });
    expect(props.onredo).toHaveBeenCalledTimes(2);
    expect(props.onedit).not.toHaveBeenCalled();
  });
  it('Ctrl+Delete asks to delete the selected rows', async () => {
    const { props, grid } = await mountGrid();
    await press(grid, 'ArrowDown');
    await press(grid, 'ArrowDown', { shiftKey: true });
    await press(grid, 'Delete', { ctrlKey: true });
    expect(props.ondeleterows).toHaveBeenCalledWith(['m2', 'm3']);
  });
  it('onselectrow reports the row the active cell moves to', async () => {
    const onselectrow = vi.fn();
    const { grid } = await mountGrid({ onselectrow });
    await press(grid, 'ArrowDown');
    await press(grid, 'ArrowRight');
    expect(onselectrow.mock.calls).toEqual([['m2']]);
  });
});

describe('Grid clipboard', () => {
  it('pasting 3 × 2 tab-separated text near the end calls onedit once with 6 changes, new rows included', async () => {
    const { props, grid } = await mountGrid();
    await press(grid, 'ArrowDown', { ctrlKey: true }); // last row, m5
    await press(grid, 'ArrowUp'); // m4
    await paste(grid, 'Hoist B\t96,5\r\nLifter C\t99\r\nCutter D\t103\r\n');
    expect(props.onedit).toHaveBeenCalledTimes(1);
    expect(props.onedit).toHaveBeenCalledWith([
      { rowId: 'm4', columnId: 'name', text: 'Hoist B' },
      { rowId: 'm4', columnId: 'lwa', text: '96,5' },
      { rowId: 'm5', columnId: 'name', text: 'Lifter C' },
      { rowId: 'm5', columnId: 'lwa', text: '99' },
      { rowId: null, newRow: 0, columnId: 'name', text: 'Cutter D' },
      { rowId: null, newRow: 0, columnId: 'lwa', text: '103' },
    ]);
  });
  it('pasting over a computed column skips it', async () => {
    const { props, grid } = await mountGrid();
    await press(grid, 'ArrowRight');
    await press(grid, 'ArrowRight');
    await paste(grid, 'Electric\t70\tignored');
    expect(props.onedit).toHaveBeenCalledWith([{ rowId: 'm1', columnId: 'drive', text: 'Electric' }]);
  });
  it('copy puts the selection on the clipboard as tab-separated text', async () => {
    const { grid } = await mountGrid();
    await press(grid, 'ArrowDown', { shiftKey: true });
    await press(grid, 'ArrowRight', { shiftKey: true });
    const setData = vi.fn();
    const event = new Event('copy', { bubbles: true, cancelable: true });
    Object.defineProperty(event, 'clipboardData', { value: { setData } });
    grid.dispatchEvent(event);
    expect(setData).toHaveBeenCalledWith('text/plain', 'Loam mover A\t104.0\r\nLoam mover B\t99.5');
    expect(event.defaultPrevented).toBe(true);
  });
});

describe('Grid flags and marks', () => {
  it('shows the kept raw text of an unread cell, marked invalid with its message', async () => {
    const rows = machines.map((m) => (m.id === 'm2' ? { ...m, lwa: NaN } : m));
    const { grid } = await mountGrid({
      rows,
      rawText: (rowId: string, columnId: string) => (rowId === 'm2' && columnId === 'lwa' ? '12O' : undefined),
      problem: (rowId: string, columnId: string) =>
        rowId === 'm2' && columnId === 'lwa' ? 'Row 2, LWA: "12O" is not a number (use dB, e.g. 104.5)' : undefined,
    });
    const cell = within(grid)
      .getAllByRole('gridcell')
      .find((candidate) => candidate.getAttribute('aria-invalid') === 'true');
    expect(cell).toBeDefined();
    expect(cell!.textContent).toContain('12O');
    expect(cell!.getAttribute('title')).toBe('Row 2, LWA: "12O" is not a number (use dB, e.g. 104.5)');
    const description = document.getElementById(cell!.getAttribute('aria-describedby')!);
    expect(description?.textContent).toBe('Row 2, LWA: "12O" is not a number (use dB, e.g. 104.5)');
    expect(
      within(grid)
        .getAllByRole('gridcell')
        .filter((candidate) => candidate.getAttribute('aria-invalid') === 'true'),
    ).toHaveLength(1);
  });
  it('editing an unread cell starts from the kept raw text', async () => {
    const { grid } = await mountGrid({
      rawText: (rowId: string, columnId: string) => (rowId === 'm1' && columnId === 'lwa' ? '1O4' : undefined),
    });
    await press(grid, 'ArrowRight');
    await press(grid, 'Enter');
    expect((screen.getByRole('textbox', { name: 'LWA (dB)' }) as HTMLInputElement).value).toBe('1O4');
  });
  it('shows row marks as text badges', async () => {
    const { grid } = await mountGrid({ rowMarks: (m: Machine) => ({ over: m.level > 65, pinned: m.id === 'm2' }) });
    const cells = within(grid).getAllByRole('gridcell');
    expect(cells[8]?.textContent).toContain('over'); // m3, 65.2 dB
    expect(cells[8]?.textContent).toContain('over a limit');
    expect(cells[4]?.textContent).toContain('pinned into the fleet');
  });
});

describe('Grid groups and sorting', () => {
  it('closing a group hides its rows and keeps its label and count', async () => {
    const { grid } = await mountGrid({ group: dutyGroups });
    expect(within(grid).getByText('Digging')).toBeTruthy();
    expect(within(grid).getByText('3 rows')).toBeTruthy();
    await fireEvent.click(within(grid).getByRole('button', { name: 'Close group Digging' }));
    expect(within(grid).queryByText('Loam mover A')).toBeNull();
    expect(within(grid).getByText('Mast hoist')).toBeTruthy();
    expect(
      within(grid)
        .getAllByRole('row')
        .find((row) => row.getAttribute('aria-expanded') === 'false')?.textContent,
    ).toContain('Digging');
  });
  it('the keyboard closes and opens a group from its header row', async () => {
    const { grid } = await mountGrid({ group: dutyGroups });
    expect(activeCell(grid).textContent).toContain('Digging');
    await press(grid, 'ArrowLeft');
    expect(within(grid).queryByText('Trench cutter')).toBeNull();
    await press(grid, 'Enter');
    expect(within(grid).getByText('Trench cutter')).toBeTruthy();
  });
  it('clicking a header sorts it: aria-sort goes ascending, descending, none', async () => {
    const { grid } = await mountGrid();
    const header = within(grid).getAllByRole('columnheader')[1]!;
    expect(header.getAttribute('aria-sort')).toBe('none');
    await fireEvent.click(within(header).getByText('LWA'));
    expect(header.getAttribute('aria-sort')).toBe('ascending');
    expect(within(grid).getAllByRole('gridcell')[0]?.textContent).toContain('Mast hoist'); // 97 dB is the lowest
    await fireEvent.click(within(header).getByText('LWA'));
    expect(header.getAttribute('aria-sort')).toBe('descending');
    expect(within(grid).getAllByRole('gridcell')[0]?.textContent).toContain('Trench cutter'); // 108 dB is the highest
    await fireEvent.click(within(header).getByText('LWA'));
    expect(header.getAttribute('aria-sort')).toBe('none');
  });
  it('Enter on the header row sorts, Alt+ArrowRight widens the column', async () => {
    const { grid } = await mountGrid();
    await press(grid, 'ArrowUp');
    expect(activeCell(grid).getAttribute('role')).toBe('columnheader');
    await press(grid, 'Enter');
    expect(activeCell(grid).getAttribute('aria-sort')).toBe('ascending');
    const before = parseFloat(activeCell(grid).style.width);
    await press(grid, 'ArrowRight', { altKey: true });
    expect(parseFloat(activeCell(grid).style.width)).toBe(before + 16);
  });
  it('the quick filter keeps matching rows only', async () => {
    const { grid } = await mountGrid();
    await fireEvent.input(screen.getByRole('searchbox', { name: 'Filter Machines' }), { target: { value: 'hoist' } });
    expect(within(grid).getAllByRole('row')).toHaveLength(2);
  });
});
