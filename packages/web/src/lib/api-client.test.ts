import { describe, expect, it, vi } from 'vitest';
import { jsonResponse, mockApi, requestedUrls } from '@/testing/mock-api';
import { ApiError, apiGet } from './api-client';

async function caught(promise: Promise<unknown>): Promise<ApiError> {
  const error = await promise.then(
    () => undefined,
    (reason: unknown) => reason,
  );
  if (!(error instanceof ApiError)) throw new Error(`expected an ApiError, got ${String(error)}`);
  return error;
}

describe('apiGet', () => {
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
