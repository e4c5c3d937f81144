import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { DATA_ROOT } from './servers';

export type AppSecrets = { JWT_SECRET: string };

/**
 * Secrets the API needs, unless the environment gives them: kept in .data/ for `npm start` (so
 * sessions survive a restart), fresh for every test run.
 */
export function appSecrets(persistent: boolean): AppSecrets {
  if (process.env.JWT_SECRET) return { JWT_SECRET: process.env.JWT_SECRET };
  const fresh = { JWT_SECRET: randomBytes(48).toString('base64url') };
  if (!persistent) return fresh;
  mkdirSync(DATA_ROOT, { recursive: true });
  const file = join(DATA_ROOT, 'app-secrets.json');
  if (existsSync(file)) return JSON.parse(readFileSync(file, 'utf8')) as AppSecrets;
  writeFileSync(file, JSON.stringify(fresh, null, 2), { mode: 0o600 });
  return fresh;
}
