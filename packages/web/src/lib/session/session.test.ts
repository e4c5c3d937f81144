import { afterEach, describe, expect, it, vi } from 'vitest';
import { demoPeople, sessionFor } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { safeNextPath } from './next-path';
import { renewalDelay, startSession, startSessionRenewal } from './session';
import { sessionStore } from './session-store';

describe('renewing the access token', () => {
  afterEach(() => {
    vi.useRealTimers();
  });

  it('renews a minute before a 15-minute token runs out', () => {
    expect(renewalDelay(15 * 60_000, 0)).toBe(14 * 60_000);
  });

  it('renews a short-lived token when three quarters of its life have passed', () => {
    expect(renewalDelay(80_000, 0)).toBe(60_000);
    expect(renewalDelay(1_000, 5_000)).toBe(0);
  });

  it('asks for a new token shortly before the old one runs out, and again after that', async () => {
    vi.useFakeTimers({ now: new Date('2026-03-14T09:00:00Z') });
    const fetchMock = mockApi({
      'POST /api/auth/refresh': () =>
        jsonResponse({
          ...sessionFor(demoPeople.admin, 'renewed'),
          accessTokenExpiresAt: new Date(Date.now() + 15 * 60_000).toISOString(),
        }),
    });
    startSession({
      ...sessionFor(demoPeople.admin, 'first'),
      accessTokenExpiresAt: '2026-03-14T09:15:00Z',
    });
    const stop = startSessionRenewal();

    await vi.advanceTimersByTimeAsync(13 * 60_000);
    expect(seenRequests(fetchMock, '/api/auth/refresh')).toHaveLength(0);
    await vi.advanceTimersByTimeAsync(60_000);
    expect(seenRequests(fetchMock, '/api/auth/refresh')).toHaveLength(1);
    const session = sessionStore.getSnapshot();
    expect(session.status === 'signed-in' && session.accessToken).toBe('renewed');

    await vi.advanceTimersByTimeAsync(14 * 60_000);
    expect(seenRequests(fetchMock, '/api/auth/refresh')).toHaveLength(2);
    stop();
  });

  it('stops renewing once the session has ended', async () => {
    vi.useFakeTimers({ now: new Date('2026-03-14T09:00:00Z') });
    const fetchMock = mockApi({});
    startSession({ ...sessionFor(demoPeople.admin), accessTokenExpiresAt: '2026-03-14T09:15:00Z' });
    const stop = startSessionRenewal();

    sessionStore.end('signed-out');
    await vi.advanceTimersByTimeAsync(20 * 60_000);

    expect(fetchMock).not.toHaveBeenCalled();
    stop();
  });
});

describe('the page to return to after signing in', () => {
  it('keeps a path inside the app, with its query', () => {
    expect(safeNextPath('/people?role=auditor', '/')).toBe('/people?role=auditor');
  });

  it('refuses anything that could lead to another site', () => {
    expect(safeNextPath('https://elsewhere.example/', '/')).toBe('/');
    expect(safeNextPath('//elsewhere.example/', '/')).toBe('/');
    expect(safeNextPath('/\\elsewhere.example', '/')).toBe('/');
    expect(safeNextPath(null, '/')).toBe('/');
  });
});
