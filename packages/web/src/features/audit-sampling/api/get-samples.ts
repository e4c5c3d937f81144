import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditSamplePage, ListSamplesParams } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { sampleKeys } from './keys';

/** Drawn samples, newest first, without their items. */
export function getSamples(params: ListSamplesParams, signal?: AbortSignal) {
  return apiGet<AuditSamplePage>('/samples', {
    params: { page: params.page, pageSize: params.pageSize },
    signal,
  });
}

export function getSamplesQueryOptions(params: ListSamplesParams) {
  return queryOptions({
    queryKey: sampleKeys.list(params),
    queryFn: ({ signal }) => getSamples(params, signal),
  });
}

export function useSamples(params: ListSamplesParams) {
  return useQuery({ ...getSamplesQueryOptions(params), placeholderData: keepPreviousData });
}
