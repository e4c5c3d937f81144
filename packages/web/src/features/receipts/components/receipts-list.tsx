import { BoxMultiple20Regular } from '@fluentui/react-icons';
import type { ReactNode } from 'react';
import { EmptyState } from '@/components/ui/empty-state';
import { PagedListStates } from '@/components/ui/paged-list-states';
import { SectionHeading } from '@/components/ui/section-heading';
import { useReceipts } from '../api/get-receipts';
import {
  isFiltered,
  noReceiptFilters,
  ReceiptFilters,
  type ReceiptFilterOptions,
  type ReceiptFilterValues,
} from './receipt-filters';
import { ReceiptsTable, type ReceiptOrder } from './receipts-table';

export const RECEIPTS_PAGE_SIZE = 25;

const headingId = 'receipts-heading';

/** What the list shows: a page (from 1), the filters and the order. The page keeps these in its URL. */
export interface ReceiptsQuery extends ReceiptFilterValues, ReceiptOrder {
  page: number;
}

export const defaultReceiptOrder: ReceiptOrder = { sort: 'receivedOn', direction: 'desc' };

export interface ReceiptsListProps {
  query: ReceiptsQuery;
  onQueryChange: (query: ReceiptsQuery) => void;
  filterOptions: ReceiptFilterOptions;
  /** The "Log a parcel" action for an empty list; absent for those who only read. */
  firstParcelAction?: ReactNode;
}

/** Every parcel in the person's scope, a page at a time, with totals over all that match. */
export function ReceiptsList({
  query,
  onQueryChange,
  filterOptions,
  firstParcelAction,
}: ReceiptsListProps) {
  const receipts = useReceipts({
    page: query.page,
    pageSize: RECEIPTS_PAGE_SIZE,
    from: query.from || undefined,
    to: query.to || undefined,
    regionId: query.regionId,
    chapterId: query.chapterId,
    campaignId: query.campaignId,
    hasScan: query.hasScan ? true : undefined,
    sort: query.sort,
    direction: query.direction,
  });

  const filters: ReceiptFilterValues = {
    from: query.from,
    to: query.to,
    regionId: query.regionId,
    chapterId: query.chapterId,
    campaignId: query.campaignId,
    hasScan: query.hasScan,
  };
  const order: ReceiptOrder = { sort: query.sort, direction: query.direction };

  const body = (
    <PagedListStates
      result={receipts}
      page={query.page}
      loadingLabel="Loading parcels…"
      errorTitle="Parcels could not be loaded"
      onFirstPage={() => onQueryChange({ ...query, page: 1 })}
      noMatch={
        isFiltered(filters)
          ? {
              title: 'No parcels match',
              onClear: () => onQueryChange({ ...query, ...noReceiptFilters, page: 1 }),
              text: 'No parcel fits these dates, places, campaign and scan filters together. Widen the dates or clear the filters.',
            }
          : null
      }
      empty={
        <EmptyState
          title="No parcels logged yet"
          icon={<BoxMultiple20Regular />}
          headingLevel={3}
          action={firstParcelAction}
        >
          {firstParcelAction
            ? 'Log the first parcel as it arrives: the date, the chapter, and the panels counted and set aside.'
            : 'Parcels appear here once a chapter logs them.'}
        </EmptyState>
      }
    >
      {(data) => (
        <ReceiptsTable
          receipts={data.items}
          totals={data.totals}
          labelledBy={headingId}
          order={order}
          onOrderChange={(next) => onQueryChange({ ...query, ...next, page: 1 })}
          pagination={{
            pageIndex: data.page - 1,
            pageSize: RECEIPTS_PAGE_SIZE,
            rowCount: data.total,
            onPageChange: (pageIndex) => onQueryChange({ ...query, page: pageIndex + 1 }),
            label: 'parcels',
          }}
        />
      )}
    </PagedListStates>
  );
  return (
    <section aria-labelledby={headingId}>
      <SectionHeading id={headingId}>Parcels received</SectionHeading>
      <ReceiptFilters
        values={filters}
        onChange={(next) => onQueryChange({ ...query, ...next, page: 1 })}
        options={filterOptions}
      />
      {body}
    </section>
  );
}
