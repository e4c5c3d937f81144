import { createHash, randomBytes } from 'node:crypto';

/** A random, URL-safe secret for refresh tokens and e-mailed links (256 bits). */
export function newSecret(): string {
  return randomBytes(32).toString('base64url');
}

/** What we store instead of the secret: a leaked table gives no usable token. */
export function hashSecret(secret: string): string {
  return createHash('sha256').update(secret, 'utf8').digest('hex');
}
