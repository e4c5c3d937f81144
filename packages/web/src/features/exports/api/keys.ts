/** What the "My exports" list asks for: a page (from 1) of the person's own exports. */
export interface ExportListParams {
  page?: number;
  pageSize?: number;
}

/** Hierarchical keys: a new export invalidates every list, and each export has its own entry. */
export const exportKeys = {
  all: ['exports'] as const,
  lists: () => [...exportKeys.all, 'list'] as const,
  list: (params: ExportListParams) => [...exportKeys.lists(), params] as const,
  details: () => [...exportKeys.all, 'detail'] as const,
  detail: (id: string) => [...exportKeys.details(), id] as const,
};
