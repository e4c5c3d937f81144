import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RegionView, SaveRegionRequest } from '@tallyloom/core';
import { apiPatch } from '@/lib/api-client';
import { chapterKeys } from './get-chapters';
import { regionKeys } from './get-regions';

export interface UpdateRegionInput {
  id: number;
  changes: Partial<SaveRegionRequest>;
}

/** Renames a region or changes its code; only the fields sent change. */
export function updateRegion({ id, changes }: UpdateRegionInput): Promise<RegionView> {
  return apiPatch<RegionView>(`/regions/${id}`, changes);
}

export function useUpdateRegion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRegion,
    // Chapters carry their region's name.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: regionKeys.all }),
        queryClient.invalidateQueries({ queryKey: chapterKeys.all }),
      ]),
  });
}
