import { Button } from '@fluentui/react-components';
import { ClipboardTaskListLtr20Regular } from '@fluentui/react-icons';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SectionHeading } from '@/components/ui/section-heading';
import { useTallies } from '@/features/tallies/api';
import {
  defaultQueueFilters,
  isFilteredBeyondDefault,
  QueueFilters,
  type QueueFilterOptions,
  type QueueFilterValues,
} from './queue-filters';
import { QueueTable, type QueueOrder } from './queue-table';

export const QUEUE_PAGE_SIZE = 25;

const headingId = 'review-queue-heading';

/** What the queue shows: a page (from 1), the filters and the order. The page keeps these in its URL. */
export interface ReviewQueueQuery extends QueueFilterValues, QueueOrder {
  page: number;
}

export interface ReviewQueueProps {
  query: ReviewQueueQuery;
  onQueryChange: (query: ReviewQueueQuery) => void;
  filterOptions: QueueFilterOptions;
}

/** Tallies in the reviewer's scope, submitted ones first, a page at a time. */
export function ReviewQueue({ query, onQueryChange, filterOptions }: ReviewQueueProps) {
  const tallies = useTallies({
    page: query.page,
    pageSize: QUEUE_PAGE_SIZE,
    state: query.state === 'all' ? undefined : query.state,
    regionId: query.regionId,
    chapterId: query.chapterId,
    month: query.month || undefined,
    sort: query.sort,
    direction: query.direction,
  });

  const filters: QueueFilterValues = {
    state: query.state,
    regionId: query.regionId,
    chapterId: query.chapterId,
    month: query.month,
  };

  let body;
  if (tallies.isPending) {
    body = <LoadingState label="Loading the review queue…" />;
  } else if (tallies.isError) {
    body = (
      <ErrorState
        title="The review queue could not be loaded"
        error={tallies.error}
        onRetry={() => void tallies.refetch()}
        retrying={tallies.isFetching}
        headingLevel={3}
      />
    );
  } else if (tallies.data.items.length === 0) {
    body =
      tallies.data.total > 0 ? (
        <EmptyState
          title={`Nothing on page ${query.page}`}
          headingLevel={3}
          action={<Button onClick={() => onQueryChange({ ...query, page: 1 })}>First page</Button>}
        >
          The queue is shorter than that now.
        </EmptyState>
      ) : isFilteredBeyondDefault(filters) ? (
        <EmptyState
          title="No tallies match"
          headingLevel={3}
          action={
            <Button onClick={() => onQueryChange({ ...query, ...defaultQueueFilters, page: 1 })}>
              Back to what waits for review
            </Button>
          }
        >
          No tally fits this state, place and month together. Choose another month or state.
        </EmptyState>
      ) : (
        <EmptyState
          title="Nothing waiting for review"
          icon={<ClipboardTaskListLtr20Regular />}
          headingLevel={3}
        >
          Every submitted tally you can review has been approved or returned. A tally appears here
          as soon as a chapter submits it.
        </EmptyState>
      );
  } else {
    body = (
      <div aria-busy={tallies.isPlaceholderData}>
        <QueueTable
          tallies={tallies.data.items}
          labelledBy={headingId}
          order={{ sort: query.sort, direction: query.direction }}
          onOrderChange={(next) => onQueryChange({ ...query, ...next, page: 1 })}
          pagination={{
            pageIndex: tallies.data.page - 1,
            pageSize: QUEUE_PAGE_SIZE,
            rowCount: tallies.data.total,
            onPageChange: (pageIndex) => onQueryChange({ ...query, page: pageIndex + 1 }),
            label: 'tallies',
          }}
        />
      </div>
    );
  }

  return (
    <section aria-labelledby={headingId}>
      <SectionHeading id={headingId}>Tallies</SectionHeading>
      <QueueFilters
        values={filters}
        onChange={(next) => onQueryChange({ ...query, ...next, page: 1 })}
        options={filterOptions}
      />
      {body}
    </section>
  );
}
