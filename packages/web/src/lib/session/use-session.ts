import type { SessionUser } from '@tallyloom/core';
import { useSyncExternalStore } from 'react';
import { sessionStore, type SessionState } from './session-store';

/** The session as it is now; re-renders when someone signs in or out, or the token is renewed. */
export function useSession(): SessionState {
  return useSyncExternalStore(sessionStore.subscribe, sessionStore.getSnapshot);
}

/** The signed-in person, for screens that only render inside a session. */
export function useSessionUser(): SessionUser | null {
  const session = useSession();
  return session.status === 'signed-in' ? session.user : null;
}
