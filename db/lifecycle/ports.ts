import { createServer } from 'node:net';
import { LifecycleError } from './console';

/** True when nothing listens on 127.0.0.1:port. */
export function isPortFree(port: number, host = '127.0.0.1'): Promise<boolean> {
  return new Promise((resolve) => {
    const server = createServer();
    server.once('error', () => resolve(false));
    server.listen(port, host, () => server.close(() => resolve(true)));
  });
}

/** Asks the kernel for a free loopback port (used by throwaway test servers). */
export function findFreePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

export async function requirePortFree(port: number, what: string, setting: string): Promise<void> {
  if (!(await isPortFree(port))) {
    throw new LifecycleError(
      `Port ${port} on 127.0.0.1 is already in use, so ${what} cannot start there. Stop whatever uses it, or set ${setting} to another port.`,
    );
  }
}
