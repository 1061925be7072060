/**
 * What each grid command does: moves the selection, starts and ends edits,
 * and turns clear, fill down, paste and row deletion into one call of the
 * owner's callbacks per user action (so each is one undo step).
 */
import type { CellPos, GridChange, GridColumn, RowMarks } from './types.ts';
import type { GridCommand } from './keyboard.ts';
import { moveBy, moveTo, tabFrom } from './selection.ts';
import type { GridBounds } from './selection.ts';
import { choiceValue, commitEdit, refusalMessage, startEdit } from './edit-session.ts';
import { planClear } from './clear.ts';
import { planFillDown } from './fill.ts';
import { planPaste } from './paste.ts';
import { parseTsv, readBlock, serializeTsv } from './clipboard.ts';
import { cellText } from './cell-text.ts';
import type { ProblemFn, RawTextFn } from './cell-text.ts';
import { dataRowAbove, firstDataIndexFrom, groupAtOrAfter, pasteRowIds, rangeRows } from './display-lookup.ts';
import type { GridState } from './grid-state.svelte.ts';
import type { DisplayView, GridModel } from './table-model.ts';

/** The owner's callbacks, as passed to the grid. */
export interface GridCallbacks<Row> {
  problem?: ProblemFn<Row>;
  rawText?: RawTextFn;
  rowMarks?(row: Row): RowMarks;
  onedit(changes: GridChange[]): void;
  ondeleterows(rowIds: string[]): void;
  /** Undoes the owner's latest edit; may return words for the status line ("Undid …"). */
  onundo(): string | void;
  /** Redoes; may return words for the status line ("Redid …"). */
  onredo(): string | void;
  onselectrow?(rowId: string): void;
  /** Adds a blank row and returns its id (the add button, typing or Enter in an empty grid). */
  onaddrow?(): string | undefined;
}

export interface GridEnv<Row extends object> {
  state: GridState;
  model: GridModel<Row>;
  view(): DisplayView<Row>;
  columns(): GridColumn<Row>[];
  callbacks(): GridCallbacks<Row>;
  /** Body rows that fit in the viewport, for PageUp/PageDown. */
  pageRows(): number;
  /** Re-reads the table model after a view change (sort, filter, groups, widths). */
  refresh(): void;
  focusGrid(): void;
  reveal(pos: CellPos): void;
}

function plural(count: number, word: string): string {
  return `${count} ${word}${count === 1 ? '' : 's'}`;
}

export class GridActions<Row extends object> {
  #env: GridEnv<Row>;
  #lastSelectedRow: string | undefined;

  constructor(env: GridEnv<Row>) {
    this.#env = env;
  }

  bounds(): GridBounds {
    return { rows: this.#env.view().rows.length, cols: this.#env.columns().length };
  }

  /** Moves the active cell (and the range end when extending), scrolls it into view, reports the row. */
  goTo(pos: CellPos, extend = false): void {
    const { state } = this.#env;
    state.select(pos, extend, this.bounds());
    this.#env.reveal(state.active);
    const line = this.#env.view().rows[state.active.row];
    if (line?.kind === 'row' && line.id !== this.#lastSelectedRow) {
      this.#lastSelectedRow = line.id;
      this.#env.callbacks().onselectrow?.(line.id);
    }
  }

  toggleGroup(index: number, expanded?: boolean): void {
    const line = this.#env.view().rows[index];
    if (line?.kind !== 'group') return;
    const next = expanded ?? !line.expanded;
    if (next === line.expanded) return;
    this.#env.model.setGroupExpanded(line.id, next);
    this.#env.refresh();
    this.#env.state.announce(`${next ? 'Opened' : 'Closed'} group, ${plural(line.count, 'row')}`);
  }

  /** Carries out a keyboard command; returns false when the key should keep its default action. */
  run(command: GridCommand): boolean {
    const { state } = this.#env;
    const active = state.active;
    const line = this.#env.view().rows[active.row];
    const column = this.#env.columns()[active.col];
    const onHeader = active.row < 0;
    const onGroup = line?.kind === 'group';
    switch (command.type) {
      case 'move':
        if (onGroup && command.rows === 0 && !command.extend) this.toggleGroup(active.row, command.cols > 0);
        else this.goTo(moveBy(active, command.rows, command.cols, this.bounds(), command.extend), command.extend);
        return true;
      case 'moveTo':
        this.goTo(moveTo(active, command.target, this.bounds()), command.extend);
        return true;
      case 'page':
        this.goTo(
          moveBy(active, command.direction * this.#env.pageRows(), 0, this.bounds(), command.extend),
          command.extend,
        );
        return true;
      case 'tab': {
        const next = tabFrom(active, command.backwards, this.bounds());
        if (next === active) return false; // let focus leave the grid
        this.goTo(next);
        return true;
      }
      case 'edit':
        if (this.#isEmpty()) this.addRow();
        else if (onHeader && column) this.cycleSort(column.id);
        else if (onGroup) this.toggleGroup(active.row);
        else this.beginEdit();
        return true;
      case 'type':
        if (this.#isEmpty()) this.addRow(command.text);
        else if (command.text === ' ' && onHeader && column) this.cycleSort(column.id);
        else if (command.text === ' ' && onGroup) this.toggleGroup(active.row);
        else if (command.text === ' ' && column?.kind === 'boolean') this.toggleBoolean();
        else if (!onHeader && !onGroup) this.beginEdit(command.text);
        return true;
      case 'clear':
        this.clear();
        return true;
      case 'fillDown':
        this.fillDown();
        return true;
      case 'undo': {
        const said = this.#env.callbacks().onundo();
        if (said) this.#env.state.announce(said);
        return true;
      }
      case 'redo': {
        const said = this.#env.callbacks().onredo();
        if (said) this.#env.state.announce(said);
        return true;
      }
      case 'deleteRows':
        this.deleteRows();
        return true;
      case 'copy':
        return false; // the copy event does the work
      case 'selectAll': {
        const bounds = this.bounds();
        state.selectRange({
          top: 0,
          bottom: Math.max(bounds.rows - 1, 0),
          left: 0,
          right: Math.max(bounds.cols - 1, 0),
        });
        return true;
      }
      case 'openMenu':
        if (column) state.menuColumn = column.id;
        return true;
      case 'resize':
        if (!column) return false;
        this.#env.model.setColumnWidth(column.id, this.#env.model.columnWidth(column.id) + command.delta);
        this.#env.refresh();
        state.announce(`${column.header} width ${this.#env.model.columnWidth(column.id)} pixels`);
        return true;
      case 'escape':
        if (state.anchor.row === active.row && state.anchor.col === active.col) return false;
        state.select(active, false, this.bounds());
        return true;
    }
  }

  /** True when the grid shows no data row and no filter hides any (a new, empty list). */
  #isEmpty(): boolean {
    return this.#env.view().dataIds.length === 0 && this.#env.model.quickFilter() === '';
  }

  /**
   * Adds a blank row through the owner, selects its first editable cell and starts editing
   * it (with `typed` as the first characters when the user started typing).
   */
  addRow(typed?: string): void {
    const id = this.#env.callbacks().onaddrow?.();
    if (id === undefined) return;
    this.#env.refresh();
    const view = this.#env.view();
    const index = view.rows.findIndex((line) => line.kind === 'row' && line.id === id);
    if (index < 0) return this.#env.state.announce('Added a row; it is hidden by the filter or a closed group');
    const col = Math.max(
      0,
      this.#env.columns().findIndex((column) => column.editable),
    );
    this.goTo({ row: index, col });
    this.#env.focusGrid();
    this.beginEdit(typed);
    this.#env.state.announce('Added a row; type its name, Enter to keep it');
  }

  cycleSort(columnId: string): void {
    this.#env.model.cycleSort(columnId);
    this.#env.refresh();
    const direction = this.#env.model.sortDirection(columnId);
    const header = this.#env.columns().find((column) => column.id === columnId)?.header ?? columnId;
    this.#env.state.announce(
      direction === false
        ? `Sort removed from ${header}`
        : `Sorted by ${header}, ${direction === 'asc' ? 'ascending' : 'descending'}`,
    );
  }

  /** Starts editing the active cell, or says why it cannot be edited. */
  beginEdit(typed?: string): void {
    const { state } = this.#env;
    const line = this.#env.view().rows[state.active.row];
    const column = this.#env.columns()[state.active.col];
    if (line?.kind !== 'row' || !column) return;
    const refusal = refusalMessage(column);
    if (refusal) {
      state.announce(refusal);
      return;
    }
    const current = cellText(column, line.row, line.id, this.#env.callbacks().rawText);
    state.anchor = state.active;
    state.edit = startEdit(state.active, line.id, column.id, current, typed);
  }

  /** Ends the edit, reporting the change, then moves by the given rows and columns. */
  commitEdit(rows: number, cols: number): void {
    const { state } = this.#env;
    const session = state.edit;
    if (!session) return;
    state.edit = null;
    const change = commitEdit(session);
    const column = this.#env.columns().find((candidate) => candidate.id === session.columnId);
    if (change) {
      if (column?.choices) change.text = choiceValue(column, change.text);
      this.#env.callbacks().onedit([change]);
    }
    this.#env.focusGrid();
    if (rows !== 0 || cols !== 0) {
      const next =
        cols !== 0 ? tabFrom(session.pos, cols < 0, this.bounds()) : moveBy(session.pos, rows, 0, this.bounds());
      this.goTo(next);
    }
  }

  cancelEdit(): void {
    this.#env.state.edit = null;
    this.#env.focusGrid();
  }

  #selection() {
    const { state } = this.#env;
    const range = state.range;
    const columns = this.#env.columns().slice(range.left, range.right + 1);
    const rows = rangeRows(
      this.#env.view(),
      range.top,
      range.bottom,
      this.#env.columns(),
      this.#env.callbacks().rawText,
    );
    return { range, columns, rows };
  }

  #report(changes: GridChange[], doneMessage: string, emptyMessage: string): void {
    if (changes.length === 0) {
      this.#env.state.announce(emptyMessage);
      return;
    }
    this.#env.callbacks().onedit(changes);
    this.#env.state.announce(doneMessage);
  }

  clear(): void {
    if (this.#env.state.active.row < 0) return;
    const { columns, rows } = this.#selection();
    const changes = planClear(rows.rowIds, columns, rows.textOf);
    this.#report(changes, `Cleared ${plural(changes.length, 'cell')}`, 'Nothing to clear in the selection');
  }

  fillDown(): void {
    const { range, columns, rows } = this.#selection();
    const above = dataRowAbove(this.#env.view(), range.top);
    const textOf = (rowId: string, columnId: string): string => {
      if (above && rowId === above.id) {
        const column = columns.find((candidate) => candidate.id === columnId);
        return column ? cellText(column, above.row, above.id, this.#env.callbacks().rawText) : '';
      }
      return rows.textOf(rowId, columnId);
    };
    const changes = planFillDown(rows.rowIds, columns, textOf, above?.id);
    this.#report(changes, `Filled down ${plural(changes.length, 'cell')}`, 'Nothing to fill down');
  }

  toggleBoolean(): void {
    const line = this.#env.view().rows[this.#env.state.active.row];
    const column = this.#env.columns()[this.#env.state.active.col];
    if (line?.kind !== 'row' || !column) return;
    const refusal = refusalMessage(column);
    if (refusal) return this.#env.state.announce(refusal);
    const on = column.value(line.row) === true;
    const two = column.choices?.length === 2 ? column.choices : undefined;
    const text = two ? (two.find((choice) => choice.value !== String(on))?.value ?? String(!on)) : String(!on);
    this.#env.callbacks().onedit([{ rowId: line.id, columnId: column.id, text }]);
  }

  deleteRows(): void {
    const { rows } = this.#selection();
    if (rows.rowIds.length === 0) return;
    this.#env.callbacks().ondeleterows(rows.rowIds);
    this.#env.state.announce(`Deleted ${plural(rows.rowIds.length, 'row')}`);
  }

  /** The selection as tab-separated text, or null when the header row is active. */
  copyText(): string | null {
    if (this.#env.state.active.row < 0) return null;
    const { columns, rows } = this.#selection();
    const text = serializeTsv(readBlock(rows.rowIds, columns, rows.textOf));
    this.#env.state.announce(`Copied ${plural(rows.rowIds.length, 'row')} × ${plural(columns.length, 'column')}`);
    return text;
  }

  /** Pastes tab-separated text at the selection. */
  pasteText(text: string): void {
    const { state } = this.#env;
    const empty = this.#isEmpty();
    if (state.active.row < 0 && !empty) return;
    const block = parseTsv(text);
    if (block.length === 0) return;
    const view = this.#env.view();
    const range = state.range;
    const group = groupAtOrAfter(view, range.top);
    const rowIds = pasteRowIds(view, group);
    const startId = view.dataIds[firstDataIndexFrom(view, range.top)];
    const startRow = startId === undefined ? rowIds.length : Math.max(0, rowIds.indexOf(startId));
    const selected = rangeRows(view, range.top, range.bottom, this.#env.columns());
    const changes = planPaste(block, {
      rowIds,
      startRow,
      columns: this.#env.columns(),
      startCol: range.left,
      fill: { rows: selected.rowIds.length, cols: range.right - range.left + 1 },
      ...(group !== undefined ? { group } : {}),
    });
    const added = new Set(changes.filter((change) => change.rowId === null).map((change) => change.newRow)).size;
    const message = `Pasted ${plural(changes.length, 'cell')}${added ? `, ${plural(added, 'new row')}` : ''}`;
    this.#report(changes, message, 'Nothing pasted: the target columns are read-only');
  }
}
