import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BlanketSizeView, SaveBlanketSizeRequest } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { blanketSizeKeys } from './get-blanket-sizes';

/** Adds a size to the catalogue; the name is unique (409). */
export function createBlanketSize(request: SaveBlanketSizeRequest): Promise<BlanketSizeView> {
  return apiPost<BlanketSizeView>('/blanket-sizes', request);
}

export function useCreateBlanketSize() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createBlanketSize,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: blanketSizeKeys.all }),
  });
}
