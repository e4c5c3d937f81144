import { Badge, makeStyles, tokens } from '@fluentui/react-components';
import { createColumnHelper, type SortingState } from '@tanstack/react-table';
import type { ParcelReceiptView, ReceiptListParams, ReceiptTotals } from '@tallyloom/core';
import { useMemo } from 'react';
import { DataTable, type ServerPagination } from '@/components/ui/data-table';
import { NumberCell } from '@/components/ui/number-cell';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { formatCount, formatDate } from '@/lib/format';

export type ReceiptSort = NonNullable<ReceiptListParams['sort']>;
export type SortDirection = NonNullable<ReceiptListParams['direction']>;

export interface ReceiptOrder {
  sort: ReceiptSort;
  direction: SortDirection;
}

const sortableColumns: ReceiptSort[] = ['receivedOn', 'chapterName', 'panelsAccepted'];

function isReceiptSort(value: string): value is ReceiptSort {
  return (sortableColumns as string[]).includes(value);
}

const useStyles = makeStyles({
  totalsLabel: { whiteSpace: 'nowrap' },
  region: { color: tokens.colorNeutralForeground2, fontSize: tokens.fontSizeBase200 },
  code: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalXS },
});

const column = createColumnHelper<ParcelReceiptView>();

export interface ReceiptsTableProps {
  receipts: ParcelReceiptView[];
  totals: ReceiptTotals;
  labelledBy: string;
  pagination: ServerPagination;
  order: ReceiptOrder;
  onOrderChange: (order: ReceiptOrder) => void;
}

/** A page of parcels, ordered by the server, with a totals row over every matching parcel. */
export function ReceiptsTable({
  receipts,
  totals,
  labelledBy,
  pagination,
  order,
  onOrderChange,
}: ReceiptsTableProps) {
  const styles = useStyles();
  const columns = useMemo(
    () => [
      column.accessor('receivedOn', {
        id: 'receivedOn',
        header: 'Received',
        cell: (info) => (
          <RouterLink to={paths.receipt.getHref(info.row.original.id)}>
            {formatDate(info.getValue())}
          </RouterLink>
        ),
        footer: () => (
          <span className={styles.totalsLabel}>
            Totals of all {formatCount(totals.receipts)} matching{' '}
            {totals.receipts === 1 ? 'parcel' : 'parcels'}
          </span>
        ),
      }),
      column.accessor('chapterName', {
        id: 'chapterName',
        header: 'Chapter',
        cell: (info) => (
          <>
            {info.getValue()}
            <div className={styles.region}>{info.row.original.regionName}</div>
          </>
        ),
      }),
      column.accessor('campaignCode', {
        header: 'Campaign code',
        enableSorting: false,
        cell: (info) => {
          const code = info.getValue();
          if (!code) return '—';
          return (
            <span className={styles.code}>
              {code}
              {info.row.original.credited ? null : (
                <Badge appearance="outline" color="warning" size="small">
                  Uncredited
                </Badge>
              )}
            </span>
          );
        },
      }),
      column.accessor('panelsAccepted', {
        id: 'panelsAccepted',
        header: 'Panels accepted',
        meta: { numeric: true },
        cell: (info) => <NumberCell value={info.getValue()} />,
        footer: () => <NumberCell value={totals.panelsAccepted} />,
      }),
      column.accessor('setAsideTotal', {
        header: 'Set aside',
        enableSorting: false,
        meta: { numeric: true },
        cell: (info) => <NumberCell value={info.getValue()} />,
        footer: () => <NumberCell value={totals.setAside} />,
      }),
      column.accessor('finishedBlanketsTotal', {
        header: 'Finished blankets',
        enableSorting: false,
        meta: { numeric: true },
        cell: (info) => <NumberCell value={info.getValue()} />,
        footer: () => <NumberCell value={totals.finishedBlankets} />,
      }),
      column.accessor('otherItems', {
        header: 'Other items',
        enableSorting: false,
        meta: { numeric: true },
        cell: (info) => <NumberCell value={info.getValue()} />,
        footer: () => <NumberCell value={totals.otherItems} />,
      }),
      column.accessor('scanCount', {
        header: 'Scans',
        enableSorting: false,
        meta: { numeric: true },
        cell: (info) => <NumberCell value={info.getValue()} />,
      }),
    ],
    [styles, totals],
  );

  const sorting: SortingState = [{ id: order.sort, desc: order.direction === 'desc' }];

  return (
    <DataTable
      data={receipts}
      columns={columns}
      labelledBy={labelledBy}
      getRowId={(receipt) => String(receipt.id)}
      pagination={pagination}
      sorting={{
        state: sorting,
        onChange: (next) => {
          const first = next[0];
          if (first && isReceiptSort(first.id)) {
            onOrderChange({ sort: first.id, direction: first.desc ? 'desc' : 'asc' });
          }
        },
      }}
    />
  );
}
