import * as bcrypt from 'bcryptjs';
import { createHash } from 'node:crypto';

/** bcrypt work factor: 2^10 rounds, about 130 ms here; raise it as hardware gets faster. */
export const BCRYPT_COST = 10;

/**
 * bcrypt reads only the first 72 bytes of its input, which would silently cut long passphrases.
 * So the password is first reduced to its SHA-256 digest in base64 (44 bytes, no NUL bytes) and
 * that is what bcrypt hashes. Every character of a long passphrase therefore counts.
 */
function prehash(password: string): string {
  return createHash('sha256').update(password.normalize('NFKC'), 'utf8').digest('base64');
}

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(prehash(password), BCRYPT_COST);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(prehash(password), hash);
}

/**
 * A real hash of a random value, compared against when the e-mail is unknown, so that an unknown
 * address takes as long to refuse as a wrong password.
 */
let decoyHash: Promise<string> | null = null;
export function decoyPasswordHash(): Promise<string> {
  decoyHash ??= bcrypt.hash(prehash(String(Math.random())), BCRYPT_COST);
  return decoyHash;
}
