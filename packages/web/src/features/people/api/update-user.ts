import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateUserRequest, UserView } from '@tallyloom/core';
import { apiPatch } from '@/lib/api-client';
import { userKeys } from './get-users';

export interface UpdateUserInput {
  id: number;
  changes: UpdateUserRequest;
}

/** Changes name, role or scope, or (`active`) deactivates and reactivates a person. */
export function updateUser({ id, changes }: UpdateUserInput): Promise<UserView> {
  return apiPatch<UserView>(`/users/${id}`, changes);
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }),
  });
}
