/**
 * What the grid shows as the table model holds it: the display rows (groups, sort, filter),
 * the visible columns with their widths, and the sort, filter and visibility state for the
 * headers, toolbar and column menu. Rebuilt when the owner passes new rows or columns, or
 * after a change of view made in the grid ({@link GridView.refresh}).
 */
import { untrack } from 'svelte';
import { keeper, sameEntry, type ColumnEntry } from './keep-same.ts';
import { GridModel, type DisplayView, type SortDirection } from './table-model.ts';
import type { GridColumn, GridGrouping } from './types.ts';

/** The owner's rows and columns, read reactively. */
export interface GridSource<Row> {
  rows(): Row[];
  columns(): GridColumn<Row>[];
  rowId(row: Row): string;
  group(): GridGrouping<Row> | undefined;
}

/** Sort, filter and visibility as the table holds them now. */
export interface ViewState<Row> {
  quickFilter: string;
  visibility: { column: GridColumn<Row>; visible: boolean }[];
  sort: Map<string, SortDirection>;
  filter: Map<string, string>;
}

export class GridView<Row extends object> {
  readonly model: GridModel<Row>;
  /** Bumped after a change of view made in the grid (sort, filter, groups, widths). */
  #tick = $state(0);
  #source: GridSource<Row>;

  constructor(source: GridSource<Row>) {
    this.#source = source;
    this.model = untrack(() => new GridModel<Row>(source.rows(), source.columns(), source.rowId, source.group));
  }

  /** Re-reads the table model after a change of view made in the grid. */
  refresh(): void {
    this.#tick++;
  }

  /** The display rows: group headers and data rows in display order. */
  readonly view: DisplayView<Row> = $derived.by(() => {
    void this.#tick;
    this.model.update(this.#source.rows(), this.#source.columns());
    return this.model.view();
  });

  /** The columns as last laid out: kept as the same list while no column or width changed, so an edit leaves the rows' columns alone. */
  readonly #keepVisible = keeper<ColumnEntry<GridColumn<Row>>>(sameEntry);
  readonly visible: readonly ColumnEntry<GridColumn<Row>>[] = $derived.by(() => {
    void this.#tick;
    void this.view;
    return this.#keepVisible(this.model.visibleColumns());
  });

  /** The visible columns alone, in display order. */
  readonly columns: GridColumn<Row>[] = $derived(this.visible.map((entry) => entry.column));

  readonly state: ViewState<Row> = $derived.by(() => {
    void this.#tick;
    const visible = this.visible;
    return {
      quickFilter: this.model.quickFilter(),
      visibility: this.model.columnVisibility(),
      sort: new Map(visible.map(({ column }) => [column.id, this.model.sortDirection(column.id)])),
      filter: new Map(visible.map(({ column }) => [column.id, this.model.columnFilter(column.id)])),
    };
  });

  /** Width of all visible columns, CSS pixels. */
  readonly totalWidth: number = $derived(this.visible.reduce((sum, entry) => sum + entry.width, 0));

  /** Left edge of a visible column from the grid's left edge, CSS pixels. */
  leftOf(columnId: string): number {
    let left = 0;
    for (const entry of this.visible) {
      if (entry.column.id === columnId) break;
      left += entry.width;
    }
    return left;
  }
}
