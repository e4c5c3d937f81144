import type { ApiErrorBody, FieldProblem, SessionResponse } from '@tallyloom/core';
import { appConfig } from '@/config/app-config';
import { sessionStore } from './session/session-store';

/** A failed API call, carrying the server's error body so a screen can show its message and request id. */
export class ApiError extends Error {
  readonly body: ApiErrorBody;

  constructor(body: ApiErrorBody) {
    super(body.message);
    this.name = 'ApiError';
    this.body = body;
  }

  get statusCode(): number {
    return this.body.statusCode;
  }

  get fields(): FieldProblem[] | undefined {
    return this.body.fields;
  }

  get requestId(): string | undefined {
    return this.body.requestId;
  }

  /** True when the server was never reached (offline, server stopped), not a refusal by it. */
  get isNetworkFailure(): boolean {
    return this.body.statusCode === 0;
  }
}

export type QueryParams = Record<string, string | number | boolean | undefined>;

export type HttpMethod = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export interface RequestOptions {
  params?: QueryParams;
  signal?: AbortSignal;
  /**
   * Statuses whose JSON body is the answer rather than an error, e.g. the health check answers
   * 503 with a full report when a service is down.
   */
  acceptStatuses?: number[];
  /**
   * For the endpoints that work without a session (sign-in, links, password reset): no bearer
   * token, and a 401 is the answer itself, not a sign that the token needs renewing.
   */
  anonymous?: boolean;
  /** Extra request headers, e.g. an `Idempotency-Key` that makes a retried submission count once. */
  headers?: Record<string, string>;
}

export interface RequestWithBodyOptions extends RequestOptions {
  body?: unknown;
}

const requestIdHeader = 'x-request-id';

/** Answers that carry no body by design. */
const emptyStatuses = new Set([202, 204, 205]);

export function buildUrl(path: string, params?: QueryParams): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params ?? {})) {
    if (value !== undefined) search.set(key, String(value));
  }
  const query = search.toString();
  return `${appConfig.apiBaseUrl}${path}${query ? `?${query}` : ''}`;
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

function isApiErrorBody(value: unknown): value is ApiErrorBody {
  return (
    typeof value === 'object' &&
    value !== null &&
    typeof (value as ApiErrorBody).statusCode === 'number' &&
    typeof (value as ApiErrorBody).message === 'string'
  );
}

/** Builds an error body when the answer is not ours, e.g. a proxy's HTML page while the API is down. */
function errorBodyFrom(response: Response, payload: unknown): ApiErrorBody {
  const headerRequestId = response.headers.get(requestIdHeader) ?? undefined;
  if (isApiErrorBody(payload)) {
    return { ...payload, requestId: payload.requestId ?? headerRequestId };
  }
  return {
    statusCode: response.status,
    error: response.statusText || 'Error',
    message: `The server answered ${response.status}${response.statusText ? ` ${response.statusText}` : ''} without an explanation.`,
    requestId: headerRequestId,
  };
}

/** The error a call gets when there is no session to send it with; nothing goes over the wire. */
function noSessionError(path: string): ApiError {
  return new ApiError({
    statusCode: 401,
    error: 'Unauthorized',
    message: 'You are not signed in, or your session has ended. Sign in to carry on.',
    path,
  });
}

async function send(
  method: HttpMethod,
  path: string,
  options: RequestWithBodyOptions,
  accessToken?: string,
): Promise<Response> {
  const headers: Record<string, string> = { ...options.headers, Accept: 'application/json' };
  // A multipart form (a file upload) sets its own Content-Type, with the boundary.
  const multipart = options.body instanceof FormData;
  if (options.body !== undefined && !multipart) headers['Content-Type'] = 'application/json';
  if (accessToken) headers.Authorization = `Bearer ${accessToken}`;
  try {
    return await fetch(buildUrl(path, options.params), {
      method,
      headers,
      body:
        options.body === undefined
          ? undefined
          : multipart
            ? (options.body as FormData)
            : JSON.stringify(options.body),
      // The refresh cookie rides along only to the API's own origin.
      credentials: 'same-origin',
      signal: options.signal,
    });
  } catch (cause) {
    // Let React Query see cancellations as such, not as a failure to show.
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError({
      statusCode: 0,
      error: 'Network failure',
      message: 'The Tallyloom server could not be reached. Check the connection and try again.',
      path,
    });
  }
}

async function readAnswer<T>(
  response: Response,
  path: string,
  options: RequestOptions,
): Promise<T> {
  const payload = await readJson(response);
  if (response.ok || options.acceptStatuses?.includes(response.status)) {
    if (payload === undefined && !emptyStatuses.has(response.status)) {
      throw new ApiError({
        statusCode: response.status,
        error: 'Unreadable answer',
        message: 'The server answered, but not with the data this page expected.',
        requestId: response.headers.get(requestIdHeader) ?? undefined,
        path,
      });
    }
    return payload as T;
  }
  throw new ApiError(errorBodyFrom(response, payload));
}

let refreshInFlight: Promise<SessionResponse | null> | null = null;

async function requestNewAccessToken(): Promise<SessionResponse | null> {
  const path = '/auth/refresh';
  const hadSession = sessionStore.getSnapshot().status === 'signed-in';
  const response = await send('POST', path, {});
  if (response.ok) {
    const session = await readAnswer<SessionResponse>(response, path, {});
    sessionStore.start(session);
    return session;
  }
  // 401/403: the cookie no longer opens a session. Anything else (a throttle, a 5xx) says
  // nothing about the session, so it stays as it was and the caller sees the error.
  if (response.status === 401 || response.status === 403) {
    sessionStore.end(hadSession ? 'expired' : 'none');
    return null;
  }
  return readAnswer<never>(response, path, {});
}

/**
 * Swaps the refresh cookie for a new access token. Single flight: however many calls need a
 * new token at once, one request goes out and they all share its answer. Resolves to null
 * (and ends the session) when the server no longer recognises the session.
 */
export function refreshSession(): Promise<SessionResponse | null> {
  refreshInFlight ??= requestNewAccessToken().finally(() => {
    refreshInFlight = null;
  });
  return refreshInFlight;
}

async function accessTokenFor(path: string): Promise<string> {
  const session = sessionStore.getSnapshot();
  if (session.status === 'signed-in') return session.accessToken;
  if (session.status === 'signed-out') throw noSessionError(path);
  // Not known yet (a fresh page): the refresh cookie may still open a session.
  const restored = await refreshSession();
  if (!restored) throw noSessionError(path);
  return restored.accessToken;
}

/** After a 401: a token another call has renewed meanwhile, or a freshly renewed one. */
async function renewedAccessToken(rejectedToken: string): Promise<string | null> {
  const session = sessionStore.getSnapshot();
  if (session.status === 'signed-in' && session.accessToken !== rejectedToken) {
    return session.accessToken;
  }
  const renewed = await refreshSession();
  return renewed?.accessToken ?? null;
}

/**
 * Calls the API. Sends the bearer token; on a 401 renews it once and tries again. Throws
 * `ApiError`; shows nothing and redirects nowhere (the screens read the session and decide).
 */
export async function apiRequest<T>(
  method: HttpMethod,
  path: string,
  options: RequestWithBodyOptions = {},
): Promise<T> {
  if (options.anonymous) return readAnswer<T>(await send(method, path, options), path, options);
  return readAnswer<T>(await signedInResponse(method, path, options), path, options);
}

/** Sends with the bearer token; on a 401 renews it once and sends again. */
async function signedInResponse(
  method: HttpMethod,
  path: string,
  options: RequestWithBodyOptions,
): Promise<Response> {
  const token = await accessTokenFor(path);
  let response = await send(method, path, options, token);
  if (response.status === 401) {
    const renewed = await renewedAccessToken(token);
    if (renewed) response = await send(method, path, options, renewed);
  }
  return response;
}

/**
 * GET a file (e.g. a scan) as a Blob. It needs the bearer token, so an `<img src>` cannot load
 * it directly: the screen turns the Blob into an object URL.
 */
export async function apiGetBlob(path: string, options: RequestOptions = {}): Promise<Blob> {
  const response = await signedInResponse('GET', path, options);
  if (!response.ok) throw new ApiError(errorBodyFrom(response, await readJson(response)));
  return response.blob();
}

/** GET a JSON resource from the API. */
export function apiGet<T>(path: string, options: RequestOptions = {}): Promise<T> {
  return apiRequest<T>('GET', path, options);
}

export function apiPost<T>(path: string, body?: unknown, options: RequestOptions = {}): Promise<T> {
  return apiRequest<T>('POST', path, { ...options, body });
}

export function apiPatch<T>(path: string, body: unknown, options: RequestOptions = {}): Promise<T> {
  return apiRequest<T>('PATCH', path, { ...options, body });
}

/** Replaces a resource whole, e.g. the network's settings. */
export function apiPut<T>(path: string, body: unknown, options: RequestOptions = {}): Promise<T> {
  return apiRequest<T>('PUT', path, { ...options, body });
}

export function apiDelete<T>(path: string, options: RequestOptions = {}): Promise<T> {
  return apiRequest<T>('DELETE', path, options);
}
