/**
 * The grid's row model on @tanstack/table-core v9: filtering (per column and
 * a quick filter over every column), grouping into collapsible groups,
 * sorting within groups, column visibility and column widths.
 *
 * The table owns its view state (sort, filters, collapsed groups, hidden
 * columns, widths); the owner's rows and columns are pushed in with
 * `update`, and the flattened display list is rebuilt only when table-core's
 * row model changes (new `rows` identity or new view state). Cost per rebuild
 * O(n log n) for n rows when sorted, O(n) otherwise.
 */
import { constructTable } from '@tanstack/table-core';
import type { ColumnDef, RowData } from '@tanstack/table-core';
import { makeFeatures } from './table-features.ts';
import type { Features, GridRowModelRow, GridTable } from './table-features.ts';
import { compareValues, sortableValue } from './compare.ts';
import type { SortableValue } from './compare.ts';
import type { DisplayRow, GridColumn, GridGrouping } from './types.ts';
import { patchDisplay, replacedRows } from './row-patch.ts';

/** Id of the hidden column that carries the group key. */
export const GROUP_COLUMN_ID = '__group';
/**
 * The least width at which a header's longest word fits on its line beside the sort mark and
 * the menu button (bold 0.85rem text is about 8 px a character; 56 px for padding, sort mark
 * and menu), so a default width never cuts a word of the header in two.
 */
export function headerFitWidth(header: string): number {
  const longestWord = Math.max(0, ...header.split(/\s+/).map((w) => w.length));
  return Math.min(MAX_COLUMN_WIDTH_PX, longestWord * 8 + 56);
}

/** Default column width in CSS pixels when a column gives none. */
export const DEFAULT_COLUMN_WIDTH_PX = 120;
/** Narrowest a column can be made, in CSS pixels. */
export const MIN_COLUMN_WIDTH_PX = 48;
/** Widest a column can be made, in CSS pixels. */
export const MAX_COLUMN_WIDTH_PX = 800;

/** The body as displayed, with a map from display rows to data rows. */
export interface DisplayView<Row> {
  rows: DisplayRow<Row>[];
  /** Ids of the displayed data rows, in display order (group headers left out). */
  dataIds: string[];
  /** For each display row, its index in `dataIds`, or −1 for a group header. */
  dataIndex: Int32Array;
}

export type SortDirection = 'asc' | 'desc' | false;

function includesText(haystack: string, needle: unknown): boolean {
  return haystack.toLowerCase().includes(String(needle).toLowerCase());
}

export class GridModel<Row extends RowData> {
  readonly #table: GridTable<Row>;
  #rows: readonly Row[];
  #columns: readonly GridColumn<Row>[];
  /** Reads the owner's current grouping; its identity may change on every read. */
  #getGroup: () => GridGrouping<Row> | undefined;
  #grouped: boolean;
  #byId = new Map<string, GridColumn<Row>>();
  #rowId: (row: Row) => string;
  /** True when `#rows` holds edits not yet pushed into table-core (see row-patch.ts). */
  #tableBehind = false;
  #lastModel: unknown = null;
  #view: DisplayView<Row> = { rows: [], dataIds: [], dataIndex: new Int32Array(0) };

  /**
   * @param getGroup returns the grouping, or undefined for none; only its presence is compared,
   *   so an inline `{ key, label }` object does not rebuild the model
   */
  constructor(
    rows: readonly Row[],
    columns: readonly GridColumn<Row>[],
    rowId: (row: Row) => string,
    getGroup: () => GridGrouping<Row> | undefined = () => undefined,
  ) {
    this.#rows = rows;
    this.#columns = columns;
    this.#getGroup = getGroup;
    this.#grouped = getGroup() !== undefined;
    this.#rowId = rowId;
    this.#indexColumns();
    const isExpanded = (row: GridRowModelRow<Row>): boolean => {
      const expanded = this.#table.atoms.expanded.get();
      return expanded === true ? true : (expanded[row.id] ?? true);
    };
    this.#table = constructTable({
      features: makeFeatures(),
      data: rows,
      columns: this.#columnDefs(),
      getRowId: (row: Row) => rowId(row),
      autoResetAll: false,
      enableSortingRemoval: true,
      getIsRowExpanded: isExpanded,
      globalFilterFn: (row: GridRowModelRow<Row>, columnId: string, filterValue: unknown) =>
        this.#matches(row, columnId, filterValue),
      initialState: {
        grouping: this.#grouped ? [GROUP_COLUMN_ID] : [],
        // `true` keeps every group open; collapsing stores `{ id: false }` entries
        expanded: true,
        columnVisibility: { [GROUP_COLUMN_ID]: false },
      },
    });
  }

  #indexColumns(): void {
    this.#byId = new Map(this.#columns.map((column) => [column.id, column]));
  }

  #matches(row: GridRowModelRow<Row>, columnId: string, filterValue: unknown): boolean {
    const column = this.#byId.get(columnId);
    return column ? includesText(column.display(row.original), filterValue) : false;
  }

  #columnDefs(): ColumnDef<Features, Row, unknown>[] {
    const defs: ColumnDef<Features, Row, unknown>[] = this.#columns.map((column) => ({
      id: column.id,
      header: column.header,
      accessorFn: (row: Row) => sortableValue(column.value(row)),
      sortFn: (a: GridRowModelRow<Row>, b: GridRowModelRow<Row>, id: string) =>
        compareValues(a.getValue<SortableValue>(id), b.getValue<SortableValue>(id)),
      sortUndefined: 'last',
      sortDescFirst: false,
      filterFn: (row: GridRowModelRow<Row>, id: string, filterValue: unknown) => this.#matches(row, id, filterValue),
      size: Math.max(column.width ?? DEFAULT_COLUMN_WIDTH_PX, headerFitWidth(column.header)),
      minSize: MIN_COLUMN_WIDTH_PX,
      maxSize: MAX_COLUMN_WIDTH_PX,
    }));
    if (this.#grouped) {
      defs.push({
        id: GROUP_COLUMN_ID,
        header: '',
        accessorFn: (row: Row) => this.#getGroup()?.key(row) ?? '',
        enableGlobalFilter: false,
        enableHiding: false,
      });
    }
    return defs;
  }

  /**
   * Pushes in the owner's current rows and columns; cheap when neither
   * identity changed, and cheap for in-place edits of an unsorted,
   * unfiltered view (the display list is patched, table-core catches up
   * before the next sort, filter or group change).
   */
  update(rows: readonly Row[], columns: readonly GridColumn<Row>[]): void {
    const grouped = this.#getGroup() !== undefined;
    const columnsChanged = columns !== this.#columns || grouped !== this.#grouped;
    if (!columnsChanged && rows === this.#rows) return;
    if (!columnsChanged && !this.#viewDependsOnComputed()) {
      const replaced = replacedRows(this.#rows, rows, this.#rowId, (before, after) => this.#keepsPlace(before, after));
      if (replaced) {
        this.#rows = rows;
        this.#tableBehind = true;
        this.#view = { ...this.#view, rows: patchDisplay(this.#view.rows, replaced) };
        return;
      }
    }
    this.#tableBehind = false;
    const hadGroup = this.#grouped;
    this.#rows = rows;
    this.#columns = columns;
    this.#grouped = grouped;
    if (columnsChanged) this.#indexColumns();
    this.#table.setOptions((options) => ({
      ...options,
      data: rows,
      ...(columnsChanged ? { columns: this.#columnDefs() } : {}),
    }));
    if (hadGroup !== grouped) this.#table.setGrouping(grouped ? [GROUP_COLUMN_ID] : []);
  }

  /**
   * True when the current sort or a filter reads a computed column. Computed values of rows
   * the edit did not replace can change too (a ranking, a level at a receiver), so the view
   * must be rebuilt rather than patched.
   */
  #viewDependsOnComputed(): boolean {
    const atoms = this.#table.atoms;
    const computed = (id: string) => this.#byId.get(id)?.kind === 'computed';
    if (atoms.sorting.get().some((sort) => computed(sort.id))) return true;
    if (atoms.columnFilters.get().some((filter) => computed(filter.id))) return true;
    return Boolean(atoms.globalFilter.get()) && this.#columns.some((column) => column.kind === 'computed');
  }

  /** Whether a replaced row keeps its group, sort position and filter result. */
  #keepsPlace(before: Row, after: Row): boolean {
    const atoms = this.#table.atoms;
    const group = this.#getGroup();
    if (group && group.key(before) !== group.key(after)) return false;
    for (const sort of atoms.sorting.get()) {
      const column = this.#byId.get(sort.id);
      if (column && sortableValue(column.value(before)) !== sortableValue(column.value(after))) return false;
    }
    for (const filter of atoms.columnFilters.get()) {
      const column = this.#byId.get(filter.id);
      if (
        column &&
        includesText(column.display(before), filter.value) !== includesText(column.display(after), filter.value)
      )
        return false;
    }
    const quick = atoms.globalFilter.get();
    if (quick) {
      const matches = (row: Row) => this.#columns.some((column) => includesText(column.display(row), quick));
      if (matches(before) !== matches(after)) return false;
    }
    return true;
  }

  /** Brings table-core up to date with patched rows before the view state changes. */
  #catchUp(): void {
    if (!this.#tableBehind) return;
    this.#tableBehind = false;
    this.#table.setOptions((options) => ({ ...options, data: this.#rows }));
  }

  /** The body in display order; rebuilt only when table-core's row model changed. */
  view(): DisplayView<Row> {
    const model = this.#table.getRowModel();
    if (model === this.#lastModel) return this.#view;
    this.#lastModel = model;
    this.#view = this.#flatten(model.rows);
    return this.#view;
  }

  #flatten(modelRows: readonly GridRowModelRow<Row>[]): DisplayView<Row> {
    const rows: DisplayRow<Row>[] = new Array(modelRows.length);
    const dataIndex = new Int32Array(modelRows.length);
    const dataIds: string[] = [];
    for (let i = 0; i < modelRows.length; i++) {
      const row = modelRows[i] as GridRowModelRow<Row>;
      if (row.getIsGrouped()) {
        const key = String(row.groupingValue);
        rows[i] = { kind: 'group', id: row.id, key, count: row.subRows.length, expanded: row.getIsExpanded() };
        dataIndex[i] = -1;
      } else {
        const group = this.#grouped ? String(row.getValue(GROUP_COLUMN_ID)) : undefined;
        rows[i] =
          group === undefined
            ? { kind: 'row', id: row.id, row: row.original }
            : { kind: 'row', id: row.id, row: row.original, group };
        dataIndex[i] = dataIds.length;
        dataIds.push(row.id);
      }
    }
    return { rows, dataIds, dataIndex };
  }

  /** Visible columns in display order with their widths in CSS pixels. */
  visibleColumns(): { column: GridColumn<Row>; width: number }[] {
    const result: { column: GridColumn<Row>; width: number }[] = [];
    for (const tableColumn of this.#table.getVisibleLeafColumns()) {
      const column = this.#byId.get(tableColumn.id);
      if (column) result.push({ column, width: tableColumn.getSize() });
    }
    return result;
  }

  /** Every column with whether it is shown, for the show/hide menu. */
  columnVisibility(): { column: GridColumn<Row>; visible: boolean }[] {
    const state = this.#table.atoms.columnVisibility.get();
    return this.#columns.map((column) => ({ column, visible: state[column.id] !== false }));
  }

  setColumnVisible(columnId: string, visible: boolean): void {
    this.#table.setColumnVisibility((old) => ({ ...old, [columnId]: visible }));
  }

  sortDirection(columnId: string): SortDirection {
    const entry = this.#table.atoms.sorting.get().find((sort) => sort.id === columnId);
    return entry ? (entry.desc ? 'desc' : 'asc') : false;
  }

  /** Sorts by one column: ascending, descending, then unsorted. */
  cycleSort(columnId: string): void {
    const current = this.sortDirection(columnId);
    this.setSort(columnId, current === false ? 'asc' : current === 'asc' ? 'desc' : false);
  }

  setSort(columnId: string, direction: SortDirection): void {
    this.#catchUp();
    this.#table.setSorting(direction === false ? [] : [{ id: columnId, desc: direction === 'desc' }]);
  }

  quickFilter(): string {
    return String(this.#table.atoms.globalFilter.get() ?? '');
  }

  setQuickFilter(text: string): void {
    this.#catchUp();
    this.#table.setGlobalFilter(text === '' ? undefined : text);
  }

  columnFilter(columnId: string): string {
    const entry = this.#table.atoms.columnFilters.get().find((filter) => filter.id === columnId);
    return entry ? String(entry.value) : '';
  }

  setColumnFilter(columnId: string, text: string): void {
    this.#catchUp();
    this.#table.setColumnFilters((old) => {
      const rest = old.filter((filter) => filter.id !== columnId);
      return text === '' ? rest : [...rest, { id: columnId, value: text }];
    });
  }

  /** Opens or closes one group; `groupRowId` is the id of its header row. */
  setGroupExpanded(groupRowId: string, expanded: boolean): void {
    this.#catchUp();
    this.#table.setExpanded((old) => ({ ...(old === true ? {} : old), [groupRowId]: expanded }));
  }

  /** Opens or closes every group. */
  setAllGroupsExpanded(expanded: boolean): void {
    this.#catchUp();
    if (expanded) {
      this.#table.setExpanded(true);
      return;
    }
    const closed: Record<string, boolean> = {};
    for (const row of this.#table.getGroupedRowModel().rows) if (row.getIsGrouped()) closed[row.id] = false;
    this.#table.setExpanded(Object.keys(closed).length ? closed : true);
  }

  columnWidth(columnId: string): number {
    return this.#table.getColumn(columnId)?.getSize() ?? DEFAULT_COLUMN_WIDTH_PX;
  }

  setColumnWidth(columnId: string, width: number): void {
    const clamped = Math.round(Math.min(Math.max(width, MIN_COLUMN_WIDTH_PX), MAX_COLUMN_WIDTH_PX));
    this.#table.setColumnSizing((old) => ({ ...old, [columnId]: clamped }));
  }
}
