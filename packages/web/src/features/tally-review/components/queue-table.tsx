import { makeStyles, tokens } from '@fluentui/react-components';
import { createColumnHelper, type SortingState } from '@tanstack/react-table';
import { monthLabel, type TallyListParams, type TallySummary } from '@tallyloom/core';
import { useMemo } from 'react';
import { TallyStateBadge } from '@/components/tallies/tally-state-badge';
import { DataTable, type ServerPagination } from '@/components/ui/data-table';
import { RouterLink } from '@/components/ui/router-link';
import { paths } from '@/config/paths';
import { formatDate, formatFigure } from '@/lib/format';
import { AmendmentBadge, ReportingText } from './tally-badges';

export type QueueSort = NonNullable<TallyListParams['sort']>;
export type SortDirection = NonNullable<TallyListParams['direction']>;

export interface QueueOrder {
  sort: QueueSort;
  direction: SortDirection;
}

export const QUEUE_SORTS: readonly QueueSort[] = ['submittedAt', 'month', 'chapterName', 'state'];

export function isQueueSort(value: string | null): value is QueueSort {
  return value !== null && (QUEUE_SORTS as readonly string[]).includes(value);
}

/** Oldest submission first: the one that has waited longest is decided first. */
export const defaultQueueOrder: QueueOrder = { sort: 'submittedAt', direction: 'asc' };

const useStyles = makeStyles({
  state: { display: 'inline-flex', gap: tokens.spacingHorizontalXS, alignItems: 'center' },
  number: { display: 'block', textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
  nowrap: { whiteSpace: 'nowrap' },
});

const column = createColumnHelper<TallySummary>();

export interface QueueTableProps {
  tallies: TallySummary[];
  labelledBy: string;
  pagination: ServerPagination;
  order: QueueOrder;
  onOrderChange: (order: QueueOrder) => void;
}

/** A page of tallies, ordered by the server; each row opens the tally's review page. */
export function QueueTable({
  tallies,
  labelledBy,
  pagination,
  order,
  onOrderChange,
}: QueueTableProps) {
  const styles = useStyles();
  const columns = useMemo(() => {
    const figure = (key: keyof TallySummary['headline'], header: string) =>
      column.accessor((row) => row.headline[key], {
        id: key,
        header,
        enableSorting: false,
        meta: { numeric: true },
        cell: (info) => <span className={styles.number}>{formatFigure(info.getValue())}</span>,
      });
    return [
      column.accessor('chapterName', {
        id: 'chapterName',
        header: 'Chapter',
        cell: (info) => (
          <RouterLink
            to={paths.tallyReviewItem.getHref(info.row.original.id)}
            className={styles.nowrap}
          >
            {info.getValue()}
          </RouterLink>
        ),
      }),
      column.accessor('regionName', { header: 'Region', enableSorting: false }),
      column.accessor('month', {
        id: 'month',
        header: 'Month',
        cell: (info) => <span className={styles.nowrap}>{monthLabel(info.getValue())}</span>,
      }),
      column.accessor('state', {
        id: 'state',
        header: 'State',
        cell: (info) => (
          <span className={styles.state}>
            <TallyStateBadge state={info.getValue()} />
            {info.row.original.amendmentPending ? <AmendmentBadge /> : null}
          </span>
        ),
      }),
      column.accessor('reporting', {
        header: 'Reporting',
        enableSorting: false,
        cell: (info) => <ReportingText status={info.getValue()} />,
      }),
      column.accessor('submittedAt', {
        id: 'submittedAt',
        header: 'Submitted',
        // The day is enough to scan; the review page shows the time.
        cell: (info) => {
          const at = info.getValue();
          return at ? formatDate(at) : 'Not yet';
        },
      }),
      figure('panelsAccepted', 'Panels accepted'),
      figure('blanketsAssembled', 'Blankets assembled'),
      figure('blanketsGiven', 'Blankets given'),
      figure('peopleServed', 'People served'),
      figure('volunteerHours', 'Volunteer hours'),
    ];
  }, [styles]);

  const sorting: SortingState = [{ id: order.sort, desc: order.direction === 'desc' }];

  return (
    <DataTable
      data={tallies}
      columns={columns}
      labelledBy={labelledBy}
      getRowId={(tally) => String(tally.id)}
      pagination={pagination}
      sorting={{
        state: sorting,
        onChange: (next) => {
          const first = next[0];
          if (first && isQueueSort(first.id)) {
            onOrderChange({ sort: first.id, direction: first.desc ? 'desc' : 'asc' });
          }
        },
      }}
    />
  );
}
