import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UserView } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { userKeys } from './get-users';

/** E-mails the invitation again, with a fresh link; answers 204. */
export function resendInvite(user: Pick<UserView, 'id'>): Promise<void> {
  return apiPost<void>(`/users/${user.id}/resend-invite`);
}

export function useResendInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resendInvite,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }),
  });
}
