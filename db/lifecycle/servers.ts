import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { step } from './console';
import { startMariaDb } from './mariadb';
import { findFreePort } from './ports';
import { isAlive } from './processes';
import { startRedis } from './redis';
import { onShutdown } from './shutdown';

export const REPO_ROOT = resolve(__dirname, '..', '..');
export const DATA_ROOT = join(REPO_ROOT, '.data');

export type ServerMode =
  /** `npm start`: data kept in .data/, fixed ports. */
  | 'persistent'
  /** `npm test`: a fresh folder and free ports every run, removed afterwards. */
  | 'throwaway';

/** Connection settings handed to migrations, seeds, the API and the tests. */
export type ServerEnv = {
  DATABASE_URL: string;
  DATABASE_MIGRATION_URL: string;
  DATABASE_APP_HOSTS: string;
  REDIS_URL: string;
};

interface Credentials {
  owner: { user: string; password: string };
  app: { user: string; password: string };
}

const DATABASE_NAME = 'tallyloom';

/**
 * Brings up MariaDB and Redis for this checkout, unless DATABASE_URL / REDIS_URL point at
 * servers someone runs themselves. Registers their shutdown on exit.
 */
export async function startServers(mode: ServerMode): Promise<ServerEnv> {
  const root = mode === 'persistent' ? DATA_ROOT : throwawayRoot();
  mkdirSync(root, { recursive: true });

  let database: Pick<ServerEnv, 'DATABASE_URL' | 'DATABASE_MIGRATION_URL' | 'DATABASE_APP_HOSTS'>;
  if (process.env.DATABASE_URL) {
    step('DATABASE_URL is set: using that MariaDB server.');
    database = {
      DATABASE_URL: process.env.DATABASE_URL,
      DATABASE_MIGRATION_URL: process.env.DATABASE_MIGRATION_URL ?? process.env.DATABASE_URL,
      DATABASE_APP_HOSTS: process.env.DATABASE_APP_HOSTS ?? '%',
    };
  } else {
    const port =
      mode === 'persistent' ? Number(process.env.MARIADB_PORT ?? 3307) : await findFreePort();
    step(`Starting MariaDB on 127.0.0.1:${port}…`);
    const server = await startMariaDb({
      dataDir: join(root, 'mariadb'),
      runDir: join(root, 'run'),
      port,
      database: DATABASE_NAME,
      ...credentials(mode, root),
    });
    onShutdown(async () => {
      step('Stopping MariaDB…');
      await server.stop();
    });
    step(`MariaDB is up on 127.0.0.1:${port}.`);
    database = {
      DATABASE_URL: server.appUrl,
      DATABASE_MIGRATION_URL: server.ownerUrl,
      DATABASE_APP_HOSTS: server.appHosts.join(','),
    };
  }

  let redisUrl: string;
  if (process.env.REDIS_URL) {
    step('REDIS_URL is set: using that Redis server.');
    redisUrl = process.env.REDIS_URL;
  } else {
    const port =
      mode === 'persistent' ? Number(process.env.REDIS_PORT ?? 6380) : await findFreePort();
    step(`Starting Redis on 127.0.0.1:${port}…`);
    const server = await startRedis({
      dataDir: join(root, 'redis'),
      port,
      persistent: mode === 'persistent',
    });
    onShutdown(async () => {
      step('Stopping Redis…');
      await server.stop();
    });
    redisUrl = server.url;
  }

  if (mode === 'throwaway') {
    // Data goes with the run; the server logs stay in .data/test-runs/<pid>/run for a post-mortem.
    onShutdown(() => {
      for (const dir of ['mariadb', 'redis'])
        rmSync(join(root, dir), { recursive: true, force: true });
    });
  }
  return { ...database, REDIS_URL: redisUrl };
}

/**
 * One folder per throwaway run (`.data/test-runs/<pid>`), so two test runs can go side by side;
 * folders of runs whose process is gone are removed first.
 */
export function throwawayRoot(): string {
  const parent = join(DATA_ROOT, 'test-runs');
  mkdirSync(parent, { recursive: true });
  for (const name of readdirSync(parent)) {
    const pid = Number(name);
    if (!Number.isInteger(pid) || pid === process.pid || !isAlive(pid)) {
      if (pid !== process.pid) rmSync(join(parent, name), { recursive: true, force: true });
    }
  }
  return join(parent, String(process.pid));
}

/** Generated once per data folder and kept beside it, so a second `npm start` reuses the data. */
function credentials(mode: ServerMode, root: string): Credentials {
  const fresh: Credentials = {
    owner: { user: 'tallyloom', password: randomBytes(18).toString('base64url') },
    app: { user: 'tallyloom_app', password: randomBytes(18).toString('base64url') },
  };
  if (mode === 'throwaway') return fresh;
  const file = join(root, 'credentials.json');
  if (existsSync(file)) return JSON.parse(readFileSync(file, 'utf8')) as Credentials;
  writeFileSync(file, JSON.stringify(fresh, null, 2), { mode: 0o600 });
  return fresh;
}
