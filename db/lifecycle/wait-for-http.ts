import { sleep } from './processes';

/** Polls a URL until it answers (any HTTP status below 500 or exactly 503), or gives up. */
export async function waitForHttp(
  url: string,
  timeoutMs: number,
  isExited: () => boolean,
): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (isExited()) return false;
    try {
      const response = await fetch(url);
      if (response.status < 500 || response.status === 503) return true;
    } catch {
      /* not listening yet */
    }
    await sleep(200);
  }
  return false;
}
