import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InviteUserRequest, UserView } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { userKeys } from './get-users';

/** Creates the person as invited and e-mails them a link to choose a password (201). */
export function inviteUser(request: InviteUserRequest): Promise<UserView> {
  return apiPost<UserView>('/users', request);
}

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }),
  });
}
