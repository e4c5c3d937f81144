import { beforeEach, describe, expect, it, vi } from 'vitest';
import { apiErrorBody, demoPeople, sessionFor } from '@/testing/fixtures';
import {
  emptyResponse,
  jsonResponse,
  mockApi,
  requestedUrls,
  seenRequests,
} from '@/testing/mock-api';
import { ApiError, apiGet, apiPost } from './api-client';
import { restoreSession, startSession } from './session/session';
import { sessionStore } from './session/session-store';

async function caught(promise: Promise<unknown>): Promise<ApiError> {
  const error = await promise.then(
    () => undefined,
    (reason: unknown) => reason,
  );
  if (!(error instanceof ApiError)) throw new Error(`expected an ApiError, got ${String(error)}`);
  return error;
}

describe('apiGet', () => {
  beforeEach(() => startSession(sessionFor(demoPeople.admin)));

  it('asks the same-origin API and returns the JSON body', async () => {
    const fetchMock = mockApi({ '/api/chapters': () => jsonResponse([{ id: 1 }]) });
    await expect(apiGet('/chapters', { params: { regionId: 2, q: undefined } })).resolves.toEqual([
      { id: 1 },
    ]);
    const [url] = requestedUrls(fetchMock);
    expect(url?.pathname).toBe('/api/chapters');
    expect(url?.search).toBe('?regionId=2');
  });

  it("throws an ApiError carrying the server's error body", async () => {
    mockApi({
      '/api/regions': () =>
        jsonResponse(
          {
            statusCode: 422,
            error: 'Unprocessable Entity',
            message: 'Region code is taken',
            fields: [{ field: 'code', messages: ['already used by North Ridge'] }],
            requestId: 'req-41',
          },
          422,
        ),
    });
    const error = await caught(apiGet('/regions'));
    expect(error.statusCode).toBe(422);
    expect(error.message).toBe('Region code is taken');
    expect(error.requestId).toBe('req-41');
    expect(error.fields).toEqual([{ field: 'code', messages: ['already used by North Ridge'] }]);
  });

  it('explains an answer that is not ours, keeping the request id from the header', async () => {
    mockApi({
      '/api/regions': () =>
        new Response('<html>Bad Gateway</html>', {
          status: 502,
          statusText: 'Bad Gateway',
          headers: { 'Content-Type': 'text/html', 'X-Request-Id': 'edge-9' },
        }),
    });
    const error = await caught(apiGet('/regions'));
    expect(error.statusCode).toBe(502);
    expect(error.message).toBe('The server answered 502 Bad Gateway without an explanation.');
    expect(error.requestId).toBe('edge-9');
  });

  it('turns an unreachable server into a network failure', async () => {
    vi.stubGlobal('fetch', vi.fn().mockRejectedValue(new TypeError('Failed to fetch')));
    const error = await caught(apiGet('/regions'));
    expect(error.isNetworkFailure).toBe(true);
    expect(error.message).toMatch(/could not be reached/);
  });

  it('returns the body of a status the caller accepts, such as a degraded health check', async () => {
    mockApi({ '/api/health': () => jsonResponse({ status: 'degraded' }, 503) });
    await expect(apiGet('/health', { acceptStatuses: [503] })).resolves.toEqual({
      status: 'degraded',
    });
    await expect(apiGet('/health')).rejects.toBeInstanceOf(ApiError);
  });
});

/** A fetch answer that waits until the test lets it go, to hold requests in flight together. */
function deferred() {
  let release!: () => void;
  const gate = new Promise<void>((resolve) => {
    release = resolve;
  });
  return { gate, release };
}

describe('the session in the API client', () => {
  it('sends the access token as a bearer token', async () => {
    startSession(sessionFor(demoPeople.admin, 'first-token'));
    const fetchMock = mockApi({ '/api/regions': () => jsonResponse([]) });

    await apiGet('/regions');

    expect(seenRequests(fetchMock)[0]?.authorization).toBe('Bearer first-token');
  });

  it('renews an expired token once for many calls that meet a 401 together, then retries each', async () => {
    startSession(sessionFor(demoPeople.admin, 'old-token'));
    const refreshAnswer = deferred();
    const fetchMock = mockApi({
      'POST /api/auth/refresh': async () => {
        await refreshAnswer.gate;
        return jsonResponse(sessionFor(demoPeople.admin, 'new-token'));
      },
      '/api/regions': (_url, request) =>
        request.authorization === 'Bearer new-token'
          ? jsonResponse(['regions'])
          : jsonResponse(apiErrorBody(401, 'The access token has expired.'), 401),
      '/api/chapters': (_url, request) =>
        request.authorization === 'Bearer new-token'
          ? jsonResponse(['chapters'])
          : jsonResponse(apiErrorBody(401, 'The access token has expired.'), 401),
    });

    const calls = Promise.all([apiGet('/regions'), apiGet('/chapters'), apiGet('/regions')]);
    await vi.waitFor(() => expect(seenRequests(fetchMock, '/api/auth/refresh')).toHaveLength(1));
    refreshAnswer.release();

    await expect(calls).resolves.toEqual([['regions'], ['chapters'], ['regions']]);
    expect(seenRequests(fetchMock, '/api/auth/refresh')).toHaveLength(1);
    const retried = seenRequests(fetchMock).filter((r) => r.authorization === 'Bearer new-token');
    expect(retried.map((r) => r.url.pathname)).toEqual([
      '/api/regions',
      '/api/chapters',
      '/api/regions',
    ]);
    const session = sessionStore.getSnapshot();
    expect(session.status === 'signed-in' && session.accessToken).toBe('new-token');
  });

  it('uses a token renewed meanwhile by another call, without renewing again', async () => {
    startSession(sessionFor(demoPeople.admin, 'old-token'));
    const slowRegions = deferred();
    const fetchMock = mockApi({
      'POST /api/auth/refresh': () => jsonResponse(sessionFor(demoPeople.admin, 'new-token')),
      '/api/regions': async (_url, request) => {
        if (request.authorization === 'Bearer new-token') return jsonResponse(['regions']);
        await slowRegions.gate;
        return jsonResponse(apiErrorBody(401, 'The access token has expired.'), 401);
      },
      '/api/chapters': (_url, request) =>
        request.authorization === 'Bearer new-token'
          ? jsonResponse(['chapters'])
          : jsonResponse(apiErrorBody(401, 'The access token has expired.'), 401),
    });

    const regions = apiGet('/regions');
    await expect(apiGet('/chapters')).resolves.toEqual(['chapters']);
    slowRegions.release();

    await expect(regions).resolves.toEqual(['regions']);
    expect(seenRequests(fetchMock, '/api/auth/refresh')).toHaveLength(1);
  });

  it('ends the session when the refresh is refused, and gives the caller the 401', async () => {
    startSession(sessionFor(demoPeople.admin, 'old-token'));
    const fetchMock = mockApi({
      'POST /api/auth/refresh': () => jsonResponse(apiErrorBody(401, 'No session.'), 401),
      '/api/regions': () => jsonResponse(apiErrorBody(401, 'The access token has expired.'), 401),
    });

    const error = await caught(apiGet('/regions'));

    expect(error.statusCode).toBe(401);
    expect(sessionStore.getSnapshot()).toEqual({ status: 'signed-out', reason: 'expired' });
    // Once the session has ended, nothing more goes out without one.
    const second = await caught(apiGet('/regions'));
    expect(second.statusCode).toBe(401);
    expect(seenRequests(fetchMock, '/api/regions')).toHaveLength(1);
  });

  it('keeps the session when the refresh fails for want of a network', async () => {
    startSession(sessionFor(demoPeople.admin, 'old-token'));
    mockApi({
      'POST /api/auth/refresh': () => Promise.reject(new TypeError('Failed to fetch')),
      '/api/regions': () => jsonResponse(apiErrorBody(401, 'The access token has expired.'), 401),
    });

    const error = await caught(apiGet('/regions'));

    expect(error.isNetworkFailure).toBe(true);
    expect(sessionStore.getSnapshot().status).toBe('signed-in');
  });

  it('keeps the session when the refresh is only throttled', async () => {
    startSession(sessionFor(demoPeople.admin, 'old-token'));
    mockApi({
      'POST /api/auth/refresh': () =>
        jsonResponse(apiErrorBody(429, 'Too many requests. Try again in a minute.'), 429),
      '/api/regions': () => jsonResponse(apiErrorBody(401, 'The access token has expired.'), 401),
    });

    const error = await caught(apiGet('/regions'));

    expect(error.statusCode).toBe(429);
    expect(sessionStore.getSnapshot().status).toBe('signed-in');
  });

  it('sends public calls without a token, and takes their 401 as the answer', async () => {
    startSession(sessionFor(demoPeople.admin, 'a-token'));
    const fetchMock = mockApi({
      'POST /api/auth/sign-in': () =>
        jsonResponse(apiErrorBody(401, 'E-mail or password is incorrect.'), 401),
    });

    const error = await caught(
      apiPost('/auth/sign-in', { email: 'a@b.example', password: 'x' }, { anonymous: true }),
    );

    expect(error.message).toBe('E-mail or password is incorrect.');
    expect(seenRequests(fetchMock)).toHaveLength(1);
    expect(seenRequests(fetchMock)[0]?.authorization).toBeNull();
  });

  it('reads a 204 as an answer with nothing in it', async () => {
    startSession(sessionFor(demoPeople.admin));
    mockApi({ 'POST /api/users/7/resend-invite': () => emptyResponse(204) });

    await expect(apiPost('/users/7/resend-invite')).resolves.toBeUndefined();
  });

  it('restores the session from the refresh cookie once per page load', async () => {
    const fetchMock = mockApi({
      'POST /api/auth/refresh': () => jsonResponse(sessionFor(demoPeople.chapterLead)),
    });

    const [first, second] = await Promise.all([restoreSession(), restoreSession()]);
    await restoreSession();

    expect(first).toEqual(demoPeople.chapterLead);
    expect(second).toEqual(demoPeople.chapterLead);
    expect(seenRequests(fetchMock, '/api/auth/refresh')).toHaveLength(1);
  });

  it('starts signed out, not broken, when there is no session to restore', async () => {
    mockApi({
      'POST /api/auth/refresh': () => jsonResponse(apiErrorBody(401, 'No session.'), 401),
    });

    await expect(restoreSession()).resolves.toBeNull();
    expect(sessionStore.getSnapshot()).toEqual({ status: 'signed-out', reason: 'none' });
  });
});
