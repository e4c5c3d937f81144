import { useMutation } from '@tanstack/react-query';
import type { AcceptInvitationRequest, SessionResponse } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { startSession } from '@/lib/session/session';

/** Sets the password of an invited person and signs them in (with the refresh cookie). */
export function acceptInvitation(request: AcceptInvitationRequest): Promise<SessionResponse> {
  return apiPost<SessionResponse>('/auth/invitations/accept', request, { anonymous: true });
}

export function useAcceptInvitation() {
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: (session) => startSession(session),
  });
}
