import { spawn, type ChildProcess } from 'node:child_process';
import { LifecycleError } from './console';
import { REPO_ROOT } from './servers';

/** Runs a command to completion with the given extra environment, output passed through. */
export function runCommand(
  command: string,
  args: string[],
  env: NodeJS.ProcessEnv,
  label: string,
): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, {
      cwd: REPO_ROOT,
      env: { ...process.env, ...env },
      stdio: 'inherit',
    });
    child.once('error', (error) =>
      reject(new LifecycleError(`${label} could not run: ${error.message}`)),
    );
    child.once('exit', (code, signal) => {
      if (code === 0) resolve();
      else
        reject(
          new LifecycleError(
            `${label} failed (${signal ?? `exit ${code}`}); see the output above.`,
          ),
        );
    });
  });
}

/** Starts a long-running command (the API, Vite) in its own process group, so it can be stopped as a whole. */
export function startLongRunning(
  command: string,
  args: string[],
  env: NodeJS.ProcessEnv,
): ChildProcess {
  return spawn(command, args, {
    cwd: REPO_ROOT,
    env: { ...process.env, ...env },
    stdio: 'inherit',
    detached: true,
  });
}

/** Stops a process group started by startLongRunning and waits for it to exit. */
export function stopLongRunning(child: ChildProcess, graceMs = 10_000): Promise<void> {
  return new Promise((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null || !child.pid) return resolve();
    const pid = child.pid;
    const kill = (signal: NodeJS.Signals) => {
      try {
        process.kill(-pid, signal);
      } catch {
        /* gone */
      }
    };
    const timer = setTimeout(() => kill('SIGKILL'), graceMs);
    child.once('exit', () => {
      clearTimeout(timer);
      resolve();
    });
    kill('SIGTERM');
  });
}
