import { createHmac, timingSafeEqual } from 'node:crypto';

/**
 * Download links that work without the sign-in header (the browser follows a plain link): the
 * export id and the expiry time, signed with HMAC-SHA256 under a server secret.
 */
// Source: RFC 2104 (HMAC); constant-time comparison so timing does not leak the signature.

export function signExport(secret: string, id: string, expires: number): string {
  return createHmac('sha256', secret).update(`${id}\n${expires}`).digest('hex');
}

export function exportSignatureValid(
  secret: string,
  id: string,
  expires: number,
  signature: string,
): boolean {
  if (!/^[0-9a-f]{64}$/.test(signature)) return false;
  const expected = Buffer.from(signExport(secret, id, expires), 'hex');
  return timingSafeEqual(expected, Buffer.from(signature, 'hex'));
}

/** The link's path and query; `expires` is in whole seconds since the epoch. */
export function downloadPath(secret: string, id: string, expiresAt: Date): string {
  const expires = Math.floor(expiresAt.getTime() / 1000);
  return `/api/exports/${id}/file?expires=${expires}&signature=${signExport(secret, id, expires)}`;
}
