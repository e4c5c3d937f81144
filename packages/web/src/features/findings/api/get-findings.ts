import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { FindingPage, ListFindingsParams } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { findingKeys } from './keys';

/** Findings, newest first, a page at a time. */
export function getFindings(params: ListFindingsParams, signal?: AbortSignal) {
  return apiGet<FindingPage>('/findings', {
    params: {
      status: params.status,
      severity: params.severity,
      page: params.page,
      pageSize: params.pageSize,
    },
    signal,
  });
}

export function getFindingsQueryOptions(params: ListFindingsParams) {
  return queryOptions({
    queryKey: findingKeys.list(params),
    queryFn: ({ signal }) => getFindings(params, signal),
  });
}

/** Keeps the last page on screen while the next one loads, so the table does not jump. */
export function useFindings(params: ListFindingsParams) {
  return useQuery({ ...getFindingsQueryOptions(params), placeholderData: keepPreviousData });
}
