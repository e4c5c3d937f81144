import type { SessionResponse, SessionUser } from '@tallyloom/core';

/** Why there is no session: never had one, signed out, ran out, or the server could not say. */
export type SessionEndReason = 'none' | 'signed-out' | 'expired' | 'unreachable';

export type SessionState =
  | { status: 'unknown' }
  | { status: 'signed-in'; user: SessionUser; accessToken: string; expiresAt: number }
  | { status: 'signed-out'; reason: SessionEndReason };

type Listener = () => void;

const unknownState: SessionState = { status: 'unknown' };

let state: SessionState = unknownState;
const listeners = new Set<Listener>();

function setState(next: SessionState): void {
  state = next;
  for (const listener of listeners) listener();
}

/**
 * The one session of this tab. The access token lives only here, in memory: a reload forgets it,
 * and the refresh cookie (httpOnly, out of the page's reach) brings the session back.
 */
export const sessionStore = {
  getSnapshot: (): SessionState => state,

  subscribe: (listener: Listener): (() => void) => {
    listeners.add(listener);
    return () => {
      listeners.delete(listener);
    };
  },

  start: (session: SessionResponse): void => {
    setState({
      status: 'signed-in',
      user: session.user,
      accessToken: session.accessToken,
      expiresAt: Date.parse(session.accessTokenExpiresAt),
    });
  },

  end: (reason: SessionEndReason): void => {
    setState({ status: 'signed-out', reason });
  },

  /** Back to "not yet known", as on a fresh page load, without telling anyone. For tests. */
  reset: (): void => {
    state = unknownState;
  },
};

/** The signed-in person, or null. */
export function currentUser(): SessionUser | null {
  return state.status === 'signed-in' ? state.user : null;
}
