import { useMutation } from '@tanstack/react-query';
import type { ChangePasswordRequest } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';

/** Answers 204; a 400 names the field at fault (`currentPassword`, `newPassword`). */
export function changePassword(request: ChangePasswordRequest): Promise<void> {
  return apiPost<void>('/auth/change-password', request);
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
