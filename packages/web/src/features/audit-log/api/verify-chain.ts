import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AuditVerificationView } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { auditLogKeys } from './keys';

export function verifyChain(): Promise<AuditVerificationView> {
  return apiPost<AuditVerificationView>('/audit-log/verify');
}

/** Verifying seals pending entries and records itself: the lists are stale afterwards. */
export function useVerifyChain() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: verifyChain,
    onSettled: () => queryClient.invalidateQueries({ queryKey: auditLogKeys.lists() }),
  });
}
