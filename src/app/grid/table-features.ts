/**
 * The table-core v9 features the grid registers: column and quick filters,
 * grouping, sorting, expanding (collapsible groups), column visibility and
 * column sizing, with TanStack Store reactivity (the grid re-reads the model
 * itself after each change). Created per table.
 */
import {
  columnFilteringFeature,
  columnGroupingFeature,
  columnSizingFeature,
  columnVisibilityFeature,
  createExpandedRowModel,
  createFilteredRowModel,
  createGroupedRowModel,
  createSortedRowModel,
  globalFilteringFeature,
  rowExpandingFeature,
  rowSortingFeature,
  tableFeatures,
} from '@tanstack/table-core';
import type { Row, RowData, Table } from '@tanstack/table-core';
import { storeReactivityBindings } from '@tanstack/table-core/store-reactivity-bindings';

export function makeFeatures() {
  return tableFeatures({
    coreReactivityFeature: storeReactivityBindings(),
    columnFilteringFeature,
    globalFilteringFeature,
    filteredRowModel: createFilteredRowModel(),
    columnGroupingFeature,
    groupedRowModel: createGroupedRowModel(),
    rowSortingFeature,
    sortedRowModel: createSortedRowModel(),
    rowExpandingFeature,
    expandedRowModel: createExpandedRowModel(),
    columnVisibilityFeature,
    columnSizingFeature,
  });
}

export type Features = ReturnType<typeof makeFeatures>;
export type GridTable<TData extends RowData> = Table<Features, TData>;
export type GridRowModelRow<TData extends RowData> = Row<Features, TData>;
