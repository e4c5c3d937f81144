import { vi } from 'vitest';

/** A request as the fake server saw it. */
export interface SeenRequest {
  method: string;
  url: URL;
  /** The JSON body, parsed; undefined when there was none. */
  body: unknown;
  /** The Authorization header, e.g. "Bearer token-1". */
  authorization: string | null;
}

type Handler = (url: URL, request: SeenRequest) => Response | Promise<Response>;

function urlOf(input: RequestInfo | URL): URL {
  const raw = input instanceof Request ? input.url : input instanceof URL ? input.href : input;
  return new URL(raw, 'http://localhost');
}

function seen(input: RequestInfo | URL, init: RequestInit | undefined): SeenRequest {
  const headers = new Headers(init?.headers);
  return {
    method: (init?.method ?? 'GET').toUpperCase(),
    url: urlOf(input),
    body: typeof init?.body === 'string' ? (JSON.parse(init.body) as unknown) : undefined,
    authorization: headers.get('Authorization'),
  };
}

export function jsonResponse(body: unknown, status = 200, headers: Record<string, string> = {}) {
  return new Response(JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json', ...headers },
  });
}

/** An answer with no body, such as 204 No Content. */
export function emptyResponse(status = 204) {
  return new Response(null, { status });
}

/**
 * Replaces `fetch` with answers keyed by path ("/api/regions", any method) or by method and
 * path ("POST /api/users"), the latter first. A request with no handler answers 404 in the
 * API's error shape, so a forgotten stub shows up as a visible error, not a hang.
 */
export function mockApi(handlers: Record<string, Handler>) {
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const request = seen(input, init);
    const handler =
      handlers[`${request.method} ${request.url.pathname}`] ?? handlers[request.url.pathname];
    if (handler) return handler(request.url, request);
    return jsonResponse(
      {
        statusCode: 404,
        error: 'Not Found',
        message: `No test handler for ${request.method} ${request.url.pathname}`,
      },
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

/** Every request fetch was called with, in order, optionally only those to one path. */
export function seenRequests(fetchMock: ReturnType<typeof mockApi>, path?: string): SeenRequest[] {
  return fetchMock.mock.calls
    .map(([input, init]) => seen(input, init))
    .filter((request) => path === undefined || request.url.pathname === path);
}
