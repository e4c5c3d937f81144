import {
  makeStyles,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  tokens,
} from '@fluentui/react-components';
import {
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type PaginationState,
  type RowData,
  type SortingState,
} from '@tanstack/react-table';
import { useState } from 'react';
import { PaginationBar } from './pagination-bar';

declare module '@tanstack/react-table' {
  // Declaration merging needs the library's exact type parameters, used or not.
  // eslint-disable-next-line @typescript-eslint/no-unused-vars
  interface ColumnMeta<TData extends RowData, TValue> {
    /** Right-aligns the header and cells of a column of numbers. */
    numeric?: boolean;
  }
}

const useStyles = makeStyles({
  table: { minWidth: '100%', tableLayout: 'auto' },
  headerRow: { backgroundColor: tokens.colorNeutralBackground2 },
  headerCell: { fontWeight: tokens.fontWeightSemibold, whiteSpace: 'nowrap' },
  numericHeaderButton: { justifyContent: 'flex-end' },
  numericCell: { textAlign: 'end' },
  footerRow: {
    backgroundColor: tokens.colorNeutralBackground2,
    fontWeight: tokens.fontWeightSemibold,
    borderTop: `2px solid ${tokens.colorNeutralStroke1}`,
  },
});

export interface DataTableProps<TRow> {
  data: TRow[];
  // TanStack's own signature for a mixed list of columns.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  columns: ColumnDef<TRow, any>[];
  /** The id of the heading that names the table. */
  labelledBy: string;
  getRowId: (row: TRow) => string;
  initialSorting?: SortingState;
  /** Off for a page of server rows: sorting one page of many would mislead. */
  enableSorting?: boolean;
  /** Server-side pages: `data` is the current page, `rowCount` the total on the server. */
  pagination?: ServerPagination;
  /** Server-side order: the server sorts every row, the table only shows and changes the order. */
  sorting?: ServerSorting;
}

export interface ServerSorting {
  /** One column at a time. */
  state: SortingState;
  onChange: (sorting: SortingState) => void;
}

export interface ServerPagination {
  pageIndex: number;
  pageSize: number;
  rowCount: number;
  onPageChange: (pageIndex: number) => void;
  /** Names the page controls, e.g. "people". */
  label: string;
}

/**
 * A dense, sortable table: TanStack Table decides rows and order, Fluent draws them.
 * Header cells are buttons, so sorting works from the keyboard; aria-sort tells screen readers.
 */
export function DataTable<TRow>({
  data,
  columns,
  labelledBy,
  getRowId,
  initialSorting = [],
  enableSorting = true,
  pagination,
  sorting: serverSorting,
}: DataTableProps<TRow>) {
  const styles = useStyles();
  const [localSorting, setLocalSorting] = useState<SortingState>(initialSorting);
  const sorting = serverSorting?.state ?? localSorting;
  const paginationState: PaginationState | undefined = pagination
    ? { pageIndex: pagination.pageIndex, pageSize: pagination.pageSize }
    : undefined;
  const table = useReactTable({
    data,
    columns,
    state: { sorting, ...(paginationState ? { pagination: paginationState } : {}) },
    enableSorting,
    onSortingChange: (updater) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      if (serverSorting) serverSorting.onChange(next);
      else setLocalSorting(next);
    },
    manualSorting: !!serverSorting,
    // The server sorts by one column, and always by something.
    enableMultiSort: !serverSorting,
    enableSortingRemoval: !serverSorting,
    manualPagination: !!pagination,
    rowCount: pagination?.rowCount,
    onPaginationChange: (updater) => {
      if (!pagination || !paginationState) return;
      const next = typeof updater === 'function' ? updater(paginationState) : updater;
      if (next.pageIndex !== paginationState.pageIndex) pagination.onPageChange(next.pageIndex);
    },
    getRowId: (row) => getRowId(row),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });

  // A totals row, when a column defines a footer.
  const hasFooter = columns.some((column) => column.footer !== undefined);

  const tableElement = (
    <Table size="small" aria-labelledby={labelledBy} className={styles.table}>
      <TableHeader>
        {table.getHeaderGroups().map((headerGroup) => (
          <TableRow key={headerGroup.id} className={styles.headerRow}>
            {headerGroup.headers.map((header) => {
              const sorted = header.column.getIsSorted();
              const numeric = header.column.columnDef.meta?.numeric;
              return (
                <TableHeaderCell
                  key={header.id}
                  className={styles.headerCell}
                  sortable={header.column.getCanSort()}
                  sortDirection={
                    sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined
                  }
                  onClick={header.column.getToggleSortingHandler()}
                  button={numeric ? { className: styles.numericHeaderButton } : undefined}
                >
                  {header.isPlaceholder
                    ? null
                    : flexRender(header.column.columnDef.header, header.getContext())}
                </TableHeaderCell>
              );
            })}
          </TableRow>
        ))}
      </TableHeader>
      <TableBody>
        {table.getRowModel().rows.map((row) => (
          <TableRow key={row.id}>
            {row.getVisibleCells().map((cell) => (
              <TableCell
                key={cell.id}
                className={cell.column.columnDef.meta?.numeric ? styles.numericCell : undefined}
              >
                {flexRender(cell.column.columnDef.cell, cell.getContext())}
              </TableCell>
            ))}
          </TableRow>
        ))}
      </TableBody>
      {hasFooter ? (
        <tfoot>
          {table.getFooterGroups().map((footerGroup) => (
            <TableRow key={footerGroup.id} className={styles.footerRow}>
              {footerGroup.headers.map((header) => (
                <TableCell
                  key={header.id}
                  className={header.column.columnDef.meta?.numeric ? styles.numericCell : undefined}
                >
                  {header.isPlaceholder
                    ? null
                    : flexRender(header.column.columnDef.footer, header.getContext())}
                </TableCell>
              ))}
            </TableRow>
          ))}
        </tfoot>
      ) : null}
    </Table>
  );

  if (!pagination) return tableElement;
  return (
    <>
      {tableElement}
      <PaginationBar
        pageIndex={pagination.pageIndex}
        pageSize={pagination.pageSize}
        total={pagination.rowCount}
        canPrevious={table.getCanPreviousPage()}
        canNext={table.getCanNextPage()}
        onPrevious={table.previousPage}
        onNext={table.nextPage}
        label={pagination.label}
      />
    </>
  );
}
