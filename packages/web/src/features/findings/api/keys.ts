import type { ListFindingsParams } from '@tallyloom/core';

/** Hierarchical keys: every write refreshes the lists and sets the finding's own entry. */
export const findingKeys = {
  all: ['findings'] as const,
  lists: () => [...findingKeys.all, 'list'] as const,
  list: (params: ListFindingsParams) => [...findingKeys.lists(), params] as const,
  details: () => [...findingKeys.all, 'detail'] as const,
  detail: (id: number) => [...findingKeys.details(), id] as const,
};
