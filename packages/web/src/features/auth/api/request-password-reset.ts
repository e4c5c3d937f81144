import { useMutation } from '@tanstack/react-query';
import type { PasswordResetRequest } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';

/** Answers 202 whether or not the address has an account, so it cannot be used to probe. */
export function requestPasswordReset(request: PasswordResetRequest): Promise<void> {
  return apiPost<void>('/auth/password-reset', request, { anonymous: true });
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
