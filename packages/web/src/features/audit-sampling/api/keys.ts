import type { ListSamplesParams, SamplePlanRequest } from '@tallyloom/core';

/** Hierarchical keys: a draw invalidates every list, a worksheet entry its sample and the lists. */
export const sampleKeys = {
  all: ['samples'] as const,
  lists: () => [...sampleKeys.all, 'list'] as const,
  list: (params: ListSamplesParams) => [...sampleKeys.lists(), params] as const,
  details: () => [...sampleKeys.all, 'detail'] as const,
  detail: (id: number) => [...sampleKeys.details(), id] as const,
  plan: (request: SamplePlanRequest | null) => [...sampleKeys.all, 'plan', request] as const,
  attachment: (id: number, itemId: number) =>
    [...sampleKeys.all, 'attachment', id, itemId] as const,
};
