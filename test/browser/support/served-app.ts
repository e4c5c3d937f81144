import type { Browser } from 'playwright-core';
import { startTestApp, WEB_DIST, type TestApp } from '../../e2e/support/test-app';
import { launchBrowser } from './browser';

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
