import { vi } from 'vitest';

type Handler = (url: URL) => Response | Promise<Response>;

function urlOf(input: RequestInfo | URL): URL {
  const raw = input instanceof Request ? input.url : input instanceof URL ? input.href : input;
  return new URL(raw, 'http://localhost');
}

export function jsonResponse(body: unknown, status = 200, headers: Record<string, string> = {}) {
  return new Response(JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json', ...headers },
  });
}

/**
 * Replaces `fetch` with answers keyed by path ("/api/regions"). A path with no handler answers 404
 * in the API's error shape, so a forgotten stub shows up as a visible error, not a hang.
 */
export function mockApi(handlers: Record<string, Handler>) {
  const fetchMock = vi.fn(async (input: RequestInfo | URL) => {
    const url = urlOf(input);
    const handler = handlers[url.pathname];
    if (handler) return handler(url);
    return jsonResponse(
      { statusCode: 404, error: 'Not Found', message: `No test handler for ${url.pathname}` },
      404,
    );
  });
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

/** The URLs fetch was called with, for asserting which requests a screen made. */
export function requestedUrls(fetchMock: ReturnType<typeof mockApi>): URL[] {
  return fetchMock.mock.calls.map(([input]) => urlOf(input));
}
