import { monthOf, type TallyListParams } from '@tallyloom/core';
import { useMemo } from 'react';
import { PageHeader } from '@/components/ui/page-header';
import { ExportMenu } from '@/features/exports/components/export-menu';
import { useChapters } from '@/features/network/api/get-chapters';
import { useRegions } from '@/features/network/api/get-regions';
import type { QueueFilterOptions } from '@/features/tally-review/components/queue-filters';
import {
  parseQueueQuery,
  queueSearchParams,
  recentMonths,
} from '@/features/tally-review/components/queue-query';
import {
  ReviewQueue,
  type ReviewQueueQuery,
} from '@/features/tally-review/components/review-queue';
import { useQueryInUrl } from '@/hooks/use-query-in-url';
import { todayIsoDate } from '@/lib/format';
import { useSessionUser } from '@/lib/session/use-session';

/** What the queue shows, every page of it: the filters and order it asks the server for. */
function exportFilters(query: ReviewQueueQuery): TallyListParams {
  return {
    state: query.state === 'all' ? undefined : query.state,
    regionId: query.regionId,
    chapterId: query.chapterId,
    month: query.month || undefined,
    sort: query.sort,
    direction: query.direction,
  };
}

/** The tallies waiting for a decision, in the reviewer's scope. Loaded on demand. */
export function TallyReviewRoute() {
  const [query, changeQuery] = useQueryInUrl(parseQueueQuery, queueSearchParams);
  const user = useSessionUser();
  const regions = useRegions();
  const chapters = useChapters();

  const filterOptions = useMemo<QueueFilterOptions>(
    () => ({
      regions: regions.data ?? [],
      chapters: chapters.data ?? [],
      months: recentMonths(monthOf(todayIsoDate())),
      showRegion: user?.role !== 'regional_coordinator',
    }),
    [regions.data, chapters.data, user?.role],
  );

  return (
    <>
      <PageHeader
        title="Review tallies"
        description="Monthly tallies the chapters have filed: open one to check it, then approve it or return it with a comment."
        actions={
          <ExportMenu
            target={{ table: 'review-queue', filters: exportFilters(query) }}
            what="the review queue"
          />
        }
      />
      <ReviewQueue query={query} onQueryChange={changeQuery} filterOptions={filterOptions} />
    </>
  );
}
