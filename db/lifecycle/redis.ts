import { spawn } from 'node:child_process';
import { mkdirSync, openSync } from 'node:fs';
import { join } from 'node:path';
import Redis from 'ioredis';
import { LifecycleError, step } from './console';
import { ensureDebianPackage } from './debian';
import { isAlive, recoverStale, sleep, tail, terminate } from './processes';
import { requirePortFree } from './ports';

export interface RedisOptions {
  dataDir: string;
  port: number;
  /** Keep data across restarts (append-only file) or throw it away (tests). */
  persistent: boolean;
}

export interface RunningRedis {
  port: number;
  url: string;
  stop(): Promise<void>;
}

/** Starts a private Redis on 127.0.0.1 with its own folder; Bull's queues live here. */
export async function startRedis(options: RedisOptions): Promise<RunningRedis> {
  const redisServer = ensureDebianPackage('redis-server', 'redis-server', 'the job queue store');
  mkdirSync(options.dataDir, { recursive: true });
  const pidFile = join(options.dataDir, 'redis.pid');
  const logFile = join(options.dataDir, 'redis.log');

  // Redis renames its process to "redis-server 127.0.0.1:PORT", so it is recognised by its port.
  const recovered = await recoverStale(
    pidFile,
    (cmd) => cmd.includes('redis-server') && cmd.includes(`127.0.0.1:${options.port}`),
    [],
  );
  if (recovered === 'stopped') step('Stopped a Redis server left running by an earlier run.');

  await requirePortFree(options.port, 'Redis', 'REDIS_PORT');

  const args = [
    '--port',
    String(options.port),
    '--bind',
    '127.0.0.1',
    '--daemonize',
    'no',
    '--dir',
    options.dataDir,
    '--pidfile',
    pidFile,
    '--logfile',
    logFile,
    '--save',
    '',
    '--appendonly',
    options.persistent ? 'yes' : 'no',
  ];
  const outFd = openSync(join(options.dataDir, 'redis.out'), 'a');
  const child = spawn(redisServer, args, { detached: true, stdio: ['ignore', outFd, outFd] });
  const pid = child.pid;
  if (!pid) throw new LifecycleError('Redis did not start (no process id).');
  let exited = false;
  child.once('exit', () => (exited = true));

  const url = `redis://127.0.0.1:${options.port}`;
  await waitUntilAnswering(url, () => exited, logFile);
  return {
    port: options.port,
    url,
    async stop() {
      if (isAlive(pid)) await terminate(pid, 30_000);
    },
  };
}

async function waitUntilAnswering(
  url: string,
  hasExited: () => boolean,
  logFile: string,
): Promise<void> {
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    if (hasExited())
      throw new LifecycleError(
        `Redis stopped while starting: ${tail(logFile) || 'no reason logged'} (log: ${logFile})`,
      );
    const client = new Redis(url, {
      lazyConnect: true,
      maxRetriesPerRequest: 0,
      retryStrategy: () => null,
    });
    client.on('error', () => undefined); // refused while starting: expected, we retry
    try {
      await client.connect();
      if ((await client.ping()) === 'PONG') {
        client.disconnect();
        return;
      }
    } catch {
      /* not up yet */
    }
    client.disconnect();
    await sleep(100);
  }
  throw new LifecycleError(`Redis did not answer within 30 s (log: ${logFile}).`);
}
