import { useMutation } from '@tanstack/react-query';
import { apiPost } from '@/lib/api-client';
import { endSession } from '@/lib/session/session';

/** Clears the refresh cookie on the server; answers 204. */
export function signOut(): Promise<void> {
  return apiPost<void>('/auth/sign-out', undefined, { anonymous: true });
}

/**
 * Ends the session here whatever the server answers: a person who chose to leave is not kept
 * signed in because the network failed. Ending it clears the cached data (see AppProvider) and
 * the layout takes the person to the sign-in page.
 */
export function useSignOut() {
  return useMutation({
    mutationFn: signOut,
    onSettled: () => endSession('signed-out'),
  });
}
