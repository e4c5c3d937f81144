import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

export const SCREENSHOT_DIR = join(__dirname, '..', '..', 'artifacts', 'screenshots');

/** Debian's Chromium, headless, with everything that would reach outside this machine switched off. */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export interface WatchedPage {
  context: BrowserContext;
  page: Page;
  /** Console errors and failed or off-site requests seen so far. */
  problems: string[];
}

/** A page that records what a person would not see but a tester must: errors and stray requests. */
export async function openWatchedPage(browser: Browser, baseUrl: string): Promise<WatchedPage> {
  const context = await browser.newContext({
    viewport: { width: 1366, height: 820 },
    baseURL: baseUrl,
  });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error') problems.push(`console: ${message.text()}`);
  });
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  page.on('request', (req) => {
    // data: and blob: URLs never leave the page (scan previews are blobs fetched with the token).
    const local = [baseUrl, 'data:', `blob:${baseUrl}`].some((prefix) =>
      req.url().startsWith(prefix),
    );
    if (!local) problems.push(`off-site request: ${req.url()}`);
  });
  page.on('requestfailed', (req) => {
    // Aborted means cancelled on purpose (a superseded list query, a page left): not a failure.
    if (req.failure()?.errorText === 'net::ERR_ABORTED') return;
    problems.push(`request failed: ${req.url()} (${req.failure()?.errorText ?? 'no reason'})`);
  });
  return { context, page, problems };
}

/**
 * Saves a full-page screenshot for people to look at. Chromium now and then refuses a capture
 * of a tab it has not painted yet (a freshly opened one, a machine under load), so the tab is
 * brought to the front and the capture tried again before the test is failed.
 */
export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  const path = join(SCREENSHOT_DIR, `${name}.png`);
  const attempts = 3;
  for (let attempt = 1; ; attempt += 1) {
    try {
      await page.screenshot({ path, fullPage: true });
      return path;
    } catch (error) {
      const refused = error instanceof Error && /Unable to capture screenshot/.test(error.message);
      if (!refused || attempt === attempts) throw error;
      await page.bringToFront();
      await page.waitForTimeout(250 * attempt);
    }
  }
}
