import { TriangleDownIcon, TriangleUpIcon } from '@primer/octicons-react';
import {
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from '@tanstack/react-table';
import { useState } from 'react';
import styles from './reports.module.css';

/** A column's header as plain text, for the label a stacked row shows beside each value on a phone. */
function labelOf(header: unknown): string | undefined {
  return typeof header === 'string' ? header : undefined;
}

/**
 * A compact sortable table for a report's numbers (a dozen rows at most, so no virtual scrolling).
 * The caption is visible: it says what the rows are and in which units. On a phone each row stacks
 * (reports.module.css): the first column as its heading, then every other value with its column's name.
 */
export function ReportTable<T>({
  data,
  columns,
  caption,
  getRowId,
  initialSorting = [],
}: {
  data: T[];
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  columns: ColumnDef<T, any>[];
  caption: string;
  getRowId: (row: T) => string;
  initialSorting?: SortingState;
}) {
  const [sorting, setSorting] = useState<SortingState>(initialSorting);
  const table = useReactTable({
    data,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getRowId,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });
  return (
    <div className={styles.tableScroller}>
      <table className={styles.table}>
        <caption className={styles.tableCaption}>{caption}</caption>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
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
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id}>
              {row.getVisibleCells().map((cell, index) => {
                const numeric = cell.column.columnDef.meta?.numeric;
                const content = flexRender(cell.column.columnDef.cell, cell.getContext());
                return index === 0 ? (
                  <th key={cell.id} scope="row" className={numeric ? styles.numeric : undefined}>
                    {content}
                  </th>
                ) : (
                  <td
                    key={cell.id}
                    className={numeric ? styles.numeric : undefined}
                    data-label={labelOf(cell.column.columnDef.header)}
                  >
                    {content}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
