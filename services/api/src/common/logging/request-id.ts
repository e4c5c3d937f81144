import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';

export const REQUEST_ID_HEADER = 'x-request-id';

/**
 * One id per request: taken from a trusted proxy's header when it looks like an id, generated
 * otherwise, and echoed back so a person can quote it when something goes wrong.
 */
export function assignRequestId(request: IncomingMessage, response: ServerResponse): string {
  const incoming = request.headers[REQUEST_ID_HEADER];
  const candidate = Array.isArray(incoming) ? incoming[0] : incoming;
  const id = candidate && /^[A-Za-z0-9._-]{8,64}$/.test(candidate) ? candidate : randomUUID();
  response.setHeader('X-Request-Id', id);
  return id;
}
