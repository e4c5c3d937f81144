import { randomBytes } from 'node:crypto';
import { resolve, sep } from 'node:path';

/**
 * How stored files are laid out on disk, shared by LocalDiskStorage and the demo seed (which runs
 * without Nest). Keys are generated, never taken from a client: `ab/cd/<32 hex>`, sharded by the
 * first two byte pairs so no folder grows too large.
 */

/** `<repo>/.data/uploads`, from both src/ and dist/ (four levels below the repository root). */
export const DEFAULT_UPLOADS_DIR = resolve(__dirname, '..', '..', '..', '..', '.data', 'uploads');

const KEY_PATTERN = /^[0-9a-f]{2}\/[0-9a-f]{2}\/[0-9a-f]{32}$/;

/** A new key from 16 bytes; pass bytes only to derive a key deterministically (the demo seed). */
export function newStorageKey(bytes: Buffer = randomBytes(16)): string {
  const hex = bytes.subarray(0, 16).toString('hex');
  if (hex.length !== 32) throw new Error('a storage key needs 16 bytes');
  return `${hex.slice(0, 2)}/${hex.slice(2, 4)}/${hex}`;
}

export function isStorageKey(key: string): boolean {
  return KEY_PATTERN.test(key);
}

/** The file of `key` under `root`; refuses anything that is not a generated key. */
export function pathForKey(root: string, key: string): string {
  if (!isStorageKey(key)) throw new Error(`not a storage key: ${JSON.stringify(key)}`);
  const path = resolve(root, ...key.split('/'));
  if (!path.startsWith(resolve(root) + sep)) throw new Error('storage key escapes the root');
  return path;
}
