import type { Browser } from 'playwright-core';
import { startTestApp, WEB_DIST, type TestApp } from '../../e2e/support/test-app';
import { launchBrowser, openWatchedPage, type WatchedPage } from './browser';
import { unexpected } from './sign-in';

export interface ServedApp {
  testApp: TestApp;
  browser: Browser;
  /** http://127.0.0.1:<free port>, the address pages are opened at. */
  baseUrl: string;
}

/** The API serving the built web app on a free loopback port, and Debian's Chromium. */
export async function startServedApp(): Promise<ServedApp> {
  const testApp = await startTestApp({ SERVE_WEB: 'true', WEB_DIST_DIR: WEB_DIST });
  await testApp.app.listen(0, '127.0.0.1');
  const baseUrl = (await testApp.app.getUrl()).replace('[::1]', '127.0.0.1');
  return { testApp, browser: await launchBrowser(), baseUrl };
}

export async function stopServedApp(served: ServedApp | undefined): Promise<void> {
  await served?.browser.close();
  await served?.testApp.close();
}

/**
 * For a describe block: starts the served app before its tests and stops it after, and checks
 * after each test that no page opened through `open()` logged anything unexpected.
 */
export function servedAppSuite(): {
  readonly app: ServedApp;
  open(): Promise<WatchedPage>;
  watch(page: WatchedPage): WatchedPage;
} {
  let served: ServedApp | undefined;
  const pages: WatchedPage[] = [];
  beforeAll(async () => {
    served = await startServedApp();
  });
  afterAll(() => stopServedApp(served));
  afterEach(() => {
    for (const { problems } of pages.splice(0)) expect(unexpected(problems)).toEqual([]);
  });
  return {
    get app() {
      if (!served) throw new Error('the served app is not started yet (use it inside a test)');
      return served;
    },
    async open() {
      return this.watch(await openWatchedPage(this.app.browser, this.app.baseUrl));
    },
    watch(page) {
      pages.push(page);
      return page;
    },
  };
}
