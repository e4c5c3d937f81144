import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RegionView, SaveRegionRequest } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { regionKeys } from './get-regions';

/** Adds a region; name and code are unique (409 names the field). */
export function createRegion(request: SaveRegionRequest): Promise<RegionView> {
  return apiPost<RegionView>('/regions', request);
}

export function useCreateRegion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRegion,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: regionKeys.all }),
  });
}
