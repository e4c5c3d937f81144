import { openSync, closeSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { isAlive, sleep } from './processes';

/**
 * Runs `work` while holding a lock file, waiting for another process that holds it. Used where a
 * tool allows one run per project at a time (Vite's build), so test runs side by side take turns.
 * A lock left by a process that died is taken over.
 */
export async function withFileLock<T>(lockFile: string, work: () => Promise<T>): Promise<T> {
  for (;;) {
    try {
      const fd = openSync(lockFile, 'wx');
      writeFileSync(fd, String(process.pid));
      closeSync(fd);
      break;
    } catch {
      const holder = Number.parseInt(readFileSync(lockFile, 'utf8') || '0', 10);
      if (!holder || !isAlive(holder)) rmSync(lockFile, { force: true });
      else await sleep(500);
    }
  }
  try {
    return await work();
  } finally {
    rmSync(lockFile, { force: true });
  }
}
