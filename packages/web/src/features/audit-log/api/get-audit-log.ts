import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditLogListParams, AuditLogPage } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';
import { auditLogKeys } from './keys';

/** Query-string values of the log's filters; empty ones are left out. */
export function auditLogQueryParams(params: AuditLogListParams) {
  return {
    page: params.page,
    pageSize: params.pageSize,
    who: params.who || undefined,
    what: params.what || undefined,
    entityType: params.entityType || undefined,
    entityId: params.entityId || undefined,
    from: params.from || undefined,
    to: params.to || undefined,
  };
}

export function getAuditLog(params: AuditLogListParams, signal?: AbortSignal) {
  return apiGet<AuditLogPage>('/audit-log', { params: auditLogQueryParams(params), signal });
}

export function getAuditLogQueryOptions(params: AuditLogListParams) {
  return queryOptions({
    queryKey: auditLogKeys.list(params),
    queryFn: ({ signal }) => getAuditLog(params, signal),
  });
}

/** Keeps the previous page on screen while the next one loads. */
export function useAuditLog(params: AuditLogListParams) {
  return useQuery({ ...getAuditLogQueryOptions(params), placeholderData: keepPreviousData });
}
