import { addMonths, isMonthKey, monthsBetween, TALLY_STATES, type MonthKey } from '@tallyloom/core';
import { defaultQueueFilters, type QueueStateFilter } from './queue-filters';
import { defaultQueueOrder, isQueueSort } from './queue-table';
import type { ReviewQueueQuery } from './review-queue';

/** How far back the month picker reaches; older months stay reachable through a link. */
export const RECENT_MONTHS = 24;

function idParam(value: string | null): number | undefined {
  if (!value || !/^\d+$/.test(value)) return undefined;
  const id = Number(value);
  return id > 0 ? id : undefined;
}

function stateParam(value: string | null): QueueStateFilter {
  if (value === 'all') return 'all';
  return TALLY_STATES.find((state) => state === value) ?? defaultQueueFilters.state;
}

/** The queue's query from its URL; anything unreadable falls back to the default. */
export function parseQueueQuery(params: URLSearchParams): ReviewQueueQuery {
  const page = Number(params.get('page'));
  const month = params.get('month');
  const sort = params.get('sort');
  const direction = params.get('direction');
  return {
    page: Number.isInteger(page) && page > 0 ? page : 1,
    state: stateParam(params.get('state')),
    regionId: idParam(params.get('region')),
    chapterId: idParam(params.get('chapter')),
    month: isMonthKey(month) ? month : '',
    sort: isQueueSort(sort) ? sort : defaultQueueOrder.sort,
    direction:
      direction === 'asc' || direction === 'desc' ? direction : defaultQueueOrder.direction,
  };
}

/** The URL's query string for a queue query; defaults are left out, so links stay short. */
export function queueSearchParams(query: ReviewQueueQuery): URLSearchParams {
  const params = new URLSearchParams();
  if (query.page > 1) params.set('page', String(query.page));
  if (query.state !== defaultQueueFilters.state) params.set('state', query.state);
  if (query.regionId) params.set('region', String(query.regionId));
  if (query.chapterId) params.set('chapter', String(query.chapterId));
  if (query.month) params.set('month', query.month);
  if (query.sort !== defaultQueueOrder.sort || query.direction !== defaultQueueOrder.direction) {
    params.set('sort', query.sort);
    params.set('direction', query.direction);
  }
  return params;
}

/** The months the picker offers, newest first, ending with `thisMonth`. */
export function recentMonths(thisMonth: MonthKey, count = RECENT_MONTHS): MonthKey[] {
  return monthsBetween(addMonths(thisMonth, -(count - 1)), thisMonth).reverse();
}
