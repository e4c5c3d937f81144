import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BlanketSizeView, SaveBlanketSizeRequest } from '@tallyloom/core';
import { apiPatch } from '@/lib/api-client';
import { blanketSizeKeys } from './get-blanket-sizes';

export interface UpdateBlanketSizeInput {
  id: number;
  /** Only the fields sent change; `active: false` retires the size. */
  changes: Partial<SaveBlanketSizeRequest>;
}

export function updateBlanketSize({
  id,
  changes,
}: UpdateBlanketSizeInput): Promise<BlanketSizeView> {
  return apiPatch<BlanketSizeView>(`/blanket-sizes/${id}`, changes);
}

export function useUpdateBlanketSize() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateBlanketSize,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: blanketSizeKeys.all }),
  });
}
