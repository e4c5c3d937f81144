import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TallyCalendar } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { tallyKeys } from './get-tallies';

/**
 * The months a chapter reports on, newest first, filed or not. Without `chapterId` the server
 * answers for the person's own chapter(s).
 */
export function getTallyCalendar(chapterId?: number, signal?: AbortSignal): Promise<TallyCalendar> {
  return apiGet<TallyCalendar>('/tallies/calendar', { params: { chapterId }, signal });
}

export function getTallyCalendarQueryOptions(chapterId?: number) {
  return queryOptions({
    queryKey: tallyKeys.calendar(chapterId),
    queryFn: ({ signal }) => getTallyCalendar(chapterId, signal),
  });
}

export function useTallyCalendar(chapterId?: number, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getTallyCalendarQueryOptions(chapterId), enabled: options.enabled ?? true });
}
