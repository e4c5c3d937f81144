import type { ApiErrorBody, FieldProblem } from '@tallyloom/core';
import { appConfig } from '@/config/app-config';

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

export interface RequestOptions {
  params?: QueryParams;
  signal?: AbortSignal;
  /**
   * Statuses whose JSON body is the answer rather than an error, e.g. the health check answers
   * 503 with a full report when a service is down.
   */
  acceptStatuses?: number[];
}

const requestIdHeader = 'x-request-id';

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

/** GET a JSON resource from the API. Throws `ApiError`; shows nothing and redirects nowhere. */
export async function apiGet<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const url = buildUrl(path, options.params);
  let response: Response;
  try {
    response = await fetch(url, {
      method: 'GET',
      headers: { Accept: 'application/json' },
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

  const payload = await readJson(response);
  if (response.ok || options.acceptStatuses?.includes(response.status)) {
    if (payload === undefined) {
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
