import { step } from './console';

type Cleanup = () => Promise<void> | void;

const cleanups: Cleanup[] = [];
let installed = false;
let running: Promise<void> | null = null;

/** Registers work to do on exit (servers to stop), run in reverse order of registration. */
export function onShutdown(cleanup: Cleanup): void {
  cleanups.push(cleanup);
  if (installed) return;
  installed = true;
  const signals: NodeJS.Signals[] = ['SIGINT', 'SIGTERM', 'SIGHUP'];
  for (const signal of signals) {
    process.on(signal, () => {
      // tsx relays the terminal's signal to us as well, so the same Ctrl-C can arrive twice.
      if (running) return;
      step(`${signal} received: stopping…`);
      void shutdown().then(() => {
        step('Stopped.');
        process.exit(signal === 'SIGINT' ? 130 : 143);
      });
    });
  }
}

export function isShuttingDown(): boolean {
  return running !== null;
}

/** Runs every registered cleanup once; safe to call from several places. */
export function shutdown(): Promise<void> {
  running ??= (async () => {
    while (cleanups.length > 0) {
      const cleanup = cleanups.pop()!;
      try {
        await cleanup();
      } catch (error) {
        process.stderr.write(`[tallyloom] while stopping: ${(error as Error).message}\n`);
      }
    }
  })();
  return running;
}
