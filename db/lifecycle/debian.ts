import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { LifecycleError, step } from './console';

const SYSTEM_BIN_DIRS = [
  '/usr/sbin',
  '/usr/bin',
  '/sbin',
  '/bin',
  '/usr/local/bin',
  '/usr/local/sbin',
];

/** Finds a program on PATH or in the usual system folders (mariadbd lives in /usr/sbin). */
export function findProgram(name: string): string | null {
  const dirs = [...(process.env.PATH ?? '').split(':').filter(Boolean), ...SYSTEM_BIN_DIRS];
  for (const dir of dirs) {
    const candidate = `${dir}/${name}`;
    if (existsSync(candidate)) return candidate;
  }
  return null;
}

let aptListsFresh = false;

/**
 * Makes sure a Debian package that provides `program` is installed, installing it with apt-get
 * when we are root. Never asks questions and never starts a system service.
 */
export function ensureDebianPackage(
  program: string,
  debianPackage: string,
  purpose: string,
): string {
  const found = findProgram(program);
  if (found) return found;

  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot) {
    throw new LifecycleError(
      `${program} is missing (${purpose}). Install it with: sudo apt-get install -y ${debianPackage}`,
    );
  }
  const aptGet = findProgram('apt-get');
  if (!aptGet) {
    throw new LifecycleError(
      `${program} is missing (${purpose}) and apt-get is not available: install the ${debianPackage} package by hand, or point the matching *_URL setting at a server you run.`,
    );
  }

  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptListsFresh) {
    step('Updating the Debian package lists (apt-get update)…');
    runApt(aptGet, ['update'], env, debianPackage);
    aptListsFresh = true;
  }
  step(`Installing ${debianPackage} from Debian (${purpose}); this happens once per machine…`);
  runApt(aptGet, ['install', '-y', '--no-install-recommends', debianPackage], env, debianPackage);

  const installed = findProgram(program);
  if (!installed) {
    throw new LifecycleError(
      `apt-get installed ${debianPackage} but ${program} is still not found.`,
    );
  }
  return installed;
}

function runApt(
  aptGet: string,
  args: string[],
  env: NodeJS.ProcessEnv,
  debianPackage: string,
): void {
  // policy-rc.d style: Debian's maintainer scripts may try to start the service; RUNLEVEL=1 asks them not to.
  const result = spawnSync(aptGet, args, { env: { ...env, RUNLEVEL: '1' }, encoding: 'utf8' });
  if (result.status !== 0) {
    const tail =
      `${result.stderr ?? ''}${result.stdout ?? ''}`.trim().split('\n').slice(-1)[0] ?? '';
    throw new LifecycleError(
      `apt-get ${args[0]} ${debianPackage} failed: ${tail || `exit ${result.status}`}`,
    );
  }
}

/** Version line of a program, for progress output. */
export function programVersion(path: string): string {
  try {
    return execFileSync(path, ['--version'], { encoding: 'utf8' }).trim().split('\n')[0] ?? '';
  } catch {
    return '';
  }
}
