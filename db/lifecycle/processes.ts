import { readFileSync, existsSync, rmSync } from 'node:fs';

export function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

export function readPid(pidFile: string): number | null {
  if (!existsSync(pidFile)) return null;
  const pid = Number.parseInt(readFileSync(pidFile, 'utf8').trim(), 10);
  return Number.isInteger(pid) && pid > 0 ? pid : null;
}

/** Command line of a running process, or '' when it is gone (Linux /proc). */
export function commandLine(pid: number): string {
  try {
    return readFileSync(`/proc/${pid}/cmdline`, 'utf8').replace(/\0/g, ' ');
  } catch {
    return '';
  }
}

export function sleep(ms: number): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, ms));
}

/** Sends SIGTERM, waits for the process to go, then SIGKILL after `graceMs`. */
export async function terminate(pid: number, graceMs: number): Promise<void> {
  if (!isAlive(pid)) return;
  try {
    process.kill(pid, 'SIGTERM');
  } catch {
    return;
  }
  const deadline = Date.now() + graceMs;
  while (isAlive(pid) && Date.now() < deadline) await sleep(100);
  if (isAlive(pid)) {
    try {
      process.kill(pid, 'SIGKILL');
    } catch {
      /* already gone */
    }
    while (isAlive(pid)) await sleep(50);
  }
}

/**
 * A server left running by a crashed earlier run of ours (its pid file points at a live process
 * that `isOurs` recognises by its command line) is stopped; a pid file pointing at nothing, or at
 * someone else's process, is removed.
 */
export async function recoverStale(
  pidFile: string,
  isOurs: (commandLine: string) => boolean,
  leftovers: string[],
): Promise<'stopped' | 'cleaned' | 'none'> {
  const pid = readPid(pidFile);
  let outcome: 'stopped' | 'cleaned' | 'none' = 'none';
  if (pid && isAlive(pid) && isOurs(commandLine(pid))) {
    await terminate(pid, 30_000);
    outcome = 'stopped';
  } else if (pid) {
    outcome = 'cleaned';
  }
  for (const file of [pidFile, ...leftovers]) rmSync(file, { force: true });
  return outcome;
}

/** Last lines of a log file, for one-line failure messages. */
export function tail(file: string, lines = 3): string {
  if (!existsSync(file)) return '';
  return readFileSync(file, 'utf8').trim().split('\n').slice(-lines).join(' | ');
}
