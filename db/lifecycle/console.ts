/** Progress lines for the start and test scripts: one prefix, no colours needed to read them. */

export function step(message: string): void {
  process.stdout.write(`[tallyloom] ${message}\n`);
}

/** A failure a person can act on: one line, then a non-zero exit. */
export class LifecycleError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'LifecycleError';
  }
}

export function exitWith(error: unknown): never {
  const line =
    error instanceof LifecycleError ? error.message : String((error as Error)?.stack ?? error);
  process.stderr.write(`[tallyloom] ${line}\n`);
  process.exit(1);
}
