import { useMutation } from '@tanstack/react-query';
import type { SessionResponse, SignInRequest } from '@tallyloom/core';
import { apiPost } from '@/lib/api-client';
import { startSession } from '@/lib/session/session';

/** Also sets the refresh cookie (httpOnly, path /api/auth), which later restores the session. */
export function signIn(request: SignInRequest): Promise<SessionResponse> {
  return apiPost<SessionResponse>('/auth/sign-in', request, { anonymous: true });
}

export function useSignIn() {
  return useMutation({
    mutationFn: signIn,
    onSuccess: (session) => startSession(session),
  });
}
