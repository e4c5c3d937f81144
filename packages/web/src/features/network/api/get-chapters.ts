import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ChapterView } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export interface ChapterListParams {
  /** Only this region's chapters; every chapter when left out. */
  regionId?: number;
}

export const chapterKeys = {
  all: ['chapters'] as const,
  list: (params: ChapterListParams) => [...chapterKeys.all, 'list', params] as const,
};

export function getChapters(
  params: ChapterListParams,
  signal?: AbortSignal,
): Promise<ChapterView[]> {
  return apiGet<ChapterView[]>('/chapters', { params: { regionId: params.regionId }, signal });
}

export function getChaptersQueryOptions(params: ChapterListParams = {}) {
  return queryOptions({
    queryKey: chapterKeys.list(params),
    queryFn: ({ signal }) => getChapters(params, signal),
  });
}

export function useChapters(params: ChapterListParams = {}) {
  return useQuery({
    ...getChaptersQueryOptions(params),
    // Keep the last list on screen while another region's chapters load, so the table does not jump.
    placeholderData: keepPreviousData,
  });
}
