import { useMutation } from '@tanstack/react-query';
import type { CompletePasswordResetRequest } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';

/** Sets a new password through a reset link; answers 204. The person then signs in. */
export function completePasswordReset(request: CompletePasswordResetRequest): Promise<void> {
  return apiPost<void>('/auth/password-reset/complete', request, { anonymous: true });
}

export function useCompletePasswordReset() {
  return useMutation({ mutationFn: completePasswordReset });
}
