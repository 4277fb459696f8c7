import { SearchIcon, TriangleDownIcon, TriangleUpIcon } from '@primer/octicons-react';
import { ActionList, ActionMenu, Checkbox, FormControl, Select, Text, TextInput } from '@primer/react';
import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type ColumnFiltersState,
  type FilterFn,
  type Row,
  type RowSelectionState,
  type SortingState,
  type VisibilityState,
} from '@tanstack/react-table';
import { useVirtualizer } from '@tanstack/react-virtual';
import { useId, useMemo, useRef, useState, type ReactNode } from 'react';
import styles from './data-table.module.css';

/** Extra facts a column may carry for the table's toolbar. */
export interface DataColumnMeta {
  /** Shown as a drop-down filter ("Kind: Hard bottom"); values are compared exactly with the cell's value. */
  filterOptions?: Array<{ value: string; label: string }>;
  /** Right-align numbers so decimals line up. */
  numeric?: boolean;
  /** Name in the column chooser when the header is not plain text. */
  label?: string;
}

declare module '@tanstack/react-table' {
  // Declaration merging needs an interface with TanStack's own type parameters.
  // eslint-disable-next-line @typescript-eslint/no-unused-vars, @typescript-eslint/no-empty-object-type
  interface ColumnMeta<TData, TValue> extends DataColumnMeta {}
}

export interface DataTableProps<T> {
  data: T[];
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  columns: ColumnDef<T, any>[];
  /** The table's caption: says what the rows are. */
  caption: string;
  getRowId: (row: T) => string;
  initialSorting?: SortingState;
  initialHidden?: VisibilityState;
  /** Placeholder of the free-text filter, e.g. "Filter by name or notes". */
  filterPlaceholder?: string;
  /** Fixed row height in px, for the virtualiser; rows do not wrap. */
  rowHeight?: number;
  /** Height of the scrolling area in px. */
  height?: number;
  /** Shown above the table beside the filters (e.g. an export button). */
  toolbar?: ReactNode;
  /** Marks a row (e.g. a flagged weight); returned class is added to the <tr>. */
  rowClassName?: (row: T) => string | undefined;
  /** Rows can be chosen for a bulk action: a checkbox per row and one for every row the filters match. */
  selection?: RowSelection<T>;
}

export interface RowSelection<T> {
  /** Chosen row ids (getRowId) → true. */
  selected: RowSelectionState;
  onChange: (selected: RowSelectionState) => void;
  /** How a row is called in its checkbox's label: "Select <name>". */
  rowLabel: (row: T) => string;
}

const SELECT_COLUMN = 'select';

/** The checkbox column of a table whose rows can be chosen; "all" means all rows the filters match. */
function selectColumn<T>(rowLabel: (row: T) => string): ColumnDef<T> {
  return {
    id: SELECT_COLUMN,
    enableSorting: false,
    enableHiding: false,
    header: ({ table }) => (
      <Checkbox
        aria-label={`Select all ${table.getFilteredRowModel().rows.length} rows that match`}
        checked={table.getIsAllRowsSelected()}
        indeterminate={table.getIsSomeRowsSelected()}
        onChange={table.getToggleAllRowsSelectedHandler()}
      />
    ),
    cell: ({ row }) => (
      <Checkbox
        aria-label={`Select ${rowLabel(row.original)}`}
        checked={row.getIsSelected()}
        onChange={row.getToggleSelectedHandler()}
      />
    ),
  };
}

const textIncludes: FilterFn<unknown> = (row, columnId, filter: string) => {
  const value = row.getValue(columnId);
  return value !== null && value !== undefined && String(value).toLowerCase().includes(filter.toLowerCase());
};

const exactValue: FilterFn<unknown> = (row, columnId, filter: string) =>
  !filter || String(row.getValue(columnId)) === filter;

/**
 * A sortable, filterable table with a column chooser that renders only the rows in view, so a lake's
 * thousands of finds scroll without lag. Real <table> markup keeps headers and cells related for screen
 * readers; spacer rows stand in for the rows out of view and aria-rowcount tells the true count.
 */
export function DataTable<T>({
  data,
  columns,
  caption,
  getRowId,
  initialSorting = [],
  initialHidden = {},
  filterPlaceholder = 'Filter rows',
  rowHeight = 40,
  height = 520,
  toolbar,
  rowClassName,
  selection,
}: DataTableProps<T>) {
  const [sorting, setSorting] = useState<SortingState>(initialSorting);
  const [globalFilter, setGlobalFilter] = useState('');
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [columnVisibility, setColumnVisibility] = useState<VisibilityState>(initialHidden);
  const filterId = useId();
  const rowLabel = selection?.rowLabel;

  const table = useReactTable({
    data,
    columns: useMemo(
      () => [
        ...(rowLabel ? [selectColumn(rowLabel)] : []),
        ...columns.map((c) => (c.meta?.filterOptions ? { ...c, filterFn: exactValue as FilterFn<T> } : c)),
      ],
      [columns, rowLabel],
    ),
    state: { sorting, globalFilter, columnFilters, columnVisibility, rowSelection: selection?.selected ?? {} },
    enableRowSelection: Boolean(selection),
    onRowSelectionChange: (updater) => {
      if (!selection) return;
      selection.onChange(typeof updater === 'function' ? updater(selection.selected) : updater);
    },
    onSortingChange: setSorting,
    onGlobalFilterChange: setGlobalFilter,
    onColumnFiltersChange: setColumnFilters,
    onColumnVisibilityChange: setColumnVisibility,
    globalFilterFn: textIncludes as FilterFn<T>,
    getRowId,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });

  const rows = table.getRowModel().rows;
  const scrollRef = useRef<HTMLDivElement>(null);
  const virtualizer = useVirtualizer({
    count: rows.length,
    getScrollElement: () => scrollRef.current,
    estimateSize: () => rowHeight,
    overscan: 12,
  });
  const items = virtualizer.getVirtualItems();
  const paddingTop = items.length ? items[0].start : 0;
  const paddingBottom = items.length ? virtualizer.getTotalSize() - items[items.length - 1].end : 0;
  const visibleColumns = table.getVisibleLeafColumns();
  const facetColumns = table.getAllLeafColumns().filter((c) => c.columnDef.meta?.filterOptions);

  return (
    <div className={styles.wrapper}>
      <div className={styles.toolbar}>
        <FormControl className={styles.search} id={filterId}>
          <FormControl.Label>Filter</FormControl.Label>
          <TextInput
            leadingVisual={SearchIcon}
            placeholder={filterPlaceholder}
            value={globalFilter}
            onChange={(e) => setGlobalFilter(e.target.value)}
            block
          />
        </FormControl>
        {facetColumns.map((column) => {
          const label = column.columnDef.meta?.label ?? String(column.columnDef.header ?? column.id);
          return (
            <FormControl key={column.id}>
              <FormControl.Label>{label}</FormControl.Label>
              <Select
                value={(column.getFilterValue() as string) ?? ''}
                onChange={(e) => column.setFilterValue(e.target.value || undefined)}
              >
                <Select.Option value="">All</Select.Option>
                {column.columnDef.meta!.filterOptions!.map((o) => (
                  <Select.Option key={o.value} value={o.value}>
                    {o.label}
                  </Select.Option>
                ))}
              </Select>
            </FormControl>
          );
        })}
        <div className={styles.toolbarEnd}>
          <ActionMenu>
            <ActionMenu.Button>Columns</ActionMenu.Button>
            <ActionMenu.Overlay width="small">
              <ActionList selectionVariant="multiple" aria-label="Columns to show">
                {table
                  .getAllLeafColumns()
                  .filter((c) => c.getCanHide())
                  .map((column) => (
                    <ActionList.Item
                      key={column.id}
                      selected={column.getIsVisible()}
                      onSelect={() => column.toggleVisibility(!column.getIsVisible())}
                    >
                      {column.columnDef.meta?.label ?? String(column.columnDef.header ?? column.id)}
                    </ActionList.Item>
                  ))}
              </ActionList>
            </ActionMenu.Overlay>
          </ActionMenu>
          {toolbar}
        </div>
      </div>
      <Text as="p" size="small" className={styles.count} aria-live="polite">
        {rows.length === data.length ? `${data.length} rows` : `${rows.length} of ${data.length} rows match`}
      </Text>
      <div
        ref={scrollRef}
        className={styles.scroller}
        style={{ maxHeight: height }}
        tabIndex={0}
        aria-label={`${caption}, scrollable`}
        role="region"
      >
        <table className={styles.table} aria-rowcount={rows.length + 1}>
          <caption className={styles.caption}>{caption}</caption>
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} aria-rowindex={1}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const numeric = header.column.columnDef.meta?.numeric;
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      className={numeric ? styles.numeric : undefined}
                      aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                    >
                      {header.column.getCanSort() ? (
                        <button
                          type="button"
                          className={styles.sortButton}
                          onClick={header.column.getToggleSortingHandler()}
                        >
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          {sorted === 'asc' ? (
                            <TriangleUpIcon aria-hidden />
                          ) : sorted === 'desc' ? (
                            <TriangleDownIcon aria-hidden />
                          ) : null}
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {paddingTop > 0 ? (
              <tr aria-hidden="true">
                <td colSpan={visibleColumns.length} style={{ height: paddingTop, padding: 0, border: 0 }} />
              </tr>
            ) : null}
            {items.map((item) => {
              const row = rows[item.index] as Row<T>;
              return (
                <tr
                  key={row.id}
                  aria-rowindex={item.index + 2}
                  style={{ height: rowHeight }}
                  className={rowClassName?.(row.original)}
                >
                  {row.getVisibleCells().map((cell) => (
                    <td key={cell.id} className={cell.column.columnDef.meta?.numeric ? styles.numeric : undefined}>
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              );
            })}
            {paddingBottom > 0 ? (
              <tr aria-hidden="true">
                <td colSpan={visibleColumns.length} style={{ height: paddingBottom, padding: 0, border: 0 }} />
              </tr>
            ) : null}
          </tbody>
        </table>
        {rows.length === 0 && data.length > 0 ? (
          <Text as="p" className={styles.noMatch}>
            No rows match the filter. Clear it to see all {data.length}.
          </Text>
        ) : null}
      </div>
    </div>
  );
}
