import type { SessionResponse, SessionUser } from '@tallyloom/core';
import { refreshSession } from '../api-client';
import { sessionStore, type SessionEndReason } from './session-store';

let restoring: Promise<SessionUser | null> | null = null;

/**
 * Settles who is signed in, once per page load: the access token is kept only in memory, so
 * after a reload the refresh cookie is swapped for a new one. Later calls get the same answer.
 */
export function restoreSession(): Promise<SessionUser | null> {
  const session = sessionStore.getSnapshot();
  if (session.status === 'signed-in') return Promise.resolve(session.user);
  if (session.status === 'signed-out') return Promise.resolve(null);
  restoring ??= refreshSession().then(
    (restored) => restored?.user ?? null,
    () => {
      // The server did not answer; the sign-in page says so, and signing in tries again.
      sessionStore.end('unreachable');
      return null;
    },
  );
  return restoring;
}

export function startSession(session: SessionResponse): void {
  sessionStore.start(session);
}

export function endSession(reason: SessionEndReason): void {
  sessionStore.end(reason);
}

/** Renew this long before the access token runs out (less for very short-lived tokens). */
const renewalLeadMs = 60_000;

export function renewalDelay(expiresAt: number, now: number): number {
  const remaining = expiresAt - now;
  const lead = Math.min(renewalLeadMs, remaining / 4);
  return Math.max(remaining - lead, 0);
}

/**
 * Keeps the access token fresh: shortly before it runs out, swap the cookie for a new one, so
 * a person reading a page never meets a 401. Returns the function that stops it.
 */
export function startSessionRenewal(): () => void {
  let timer: ReturnType<typeof setTimeout> | undefined;
  let scheduledFor: number | undefined;

  const schedule = () => {
    const session = sessionStore.getSnapshot();
    const expiresAt = session.status === 'signed-in' ? session.expiresAt : undefined;
    if (expiresAt === scheduledFor) return;
    clearTimeout(timer);
    timer = undefined;
    scheduledFor = expiresAt;
    if (expiresAt === undefined || Number.isNaN(expiresAt)) return;
    timer = setTimeout(
      () => {
        // A failure here is not shown: the next call's 401 renews or ends the session anyway.
        refreshSession().catch(() => undefined);
      },
      renewalDelay(expiresAt, Date.now()),
    );
  };

  schedule();
  const unsubscribe = sessionStore.subscribe(schedule);
  return () => {
    unsubscribe();
    clearTimeout(timer);
  };
}

/** Forgets the session and the page-load restore, as if the page had just opened. For tests. */
export function resetSessionForTests(): void {
  restoring = null;
  sessionStore.reset();
}
