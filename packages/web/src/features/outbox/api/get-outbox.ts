import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OutboxMessage } from '@tallyloom/core';
import { apiGet } from '@/lib/api-client';

export const outboxKeys = {
  all: ['outbox'] as const,
  list: () => [...outboxKeys.all, 'list'] as const,
};

/** E-mails the development mail catcher captured, newest first; 404 with a real mail server. */
export function getOutbox(signal?: AbortSignal): Promise<OutboxMessage[]> {
  return apiGet<OutboxMessage[]>('/dev/outbox', { signal });
}

export function getOutboxQueryOptions() {
  return queryOptions({
    queryKey: outboxKeys.list(),
    queryFn: ({ signal }) => getOutbox(signal),
    // A tester waiting for an invitation wants it as soon as it is sent.
    staleTime: 0,
  });
}

export function useOutbox() {
  return useQuery(getOutboxQueryOptions());
}
