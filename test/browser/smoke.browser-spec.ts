import type { Browser } from 'playwright-core';
import { DEMO_SIGN_INS } from '../../db/seeders/demo-sign-ins';
import { openWatchedPage, screenshot } from './support/browser';
import { signInThroughForm, unexpected } from './support/sign-in';
import { startServedApp, stopServedApp, type ServedApp } from './support/served-app';

const staff = DEMO_SIGN_INS.find((person) => person.role === 'national_staff')!;

// A browser journey takes seconds, not the unit-test default of five.
jest.setTimeout(60_000);

describe('smoke: the app in Chromium', () => {
  let served: ServedApp | undefined;
  let browser: Browser;
  let baseUrl: string;

  beforeAll(async () => {
    served = await startServedApp();
    ({ browser, baseUrl } = served);
  });
  afterAll(() => stopServedApp(served));

  it('shows the demo network from the database, in our theme and in Roboto', async () => {
    const { page, problems, context } = await openWatchedPage(browser, baseUrl);
    await page.goto('/');
    await screenshot(page, 'sign-in');
    await signInThroughForm(page, staff.email, staff.password);
    await page.getByRole('heading', { name: 'Network', level: 1 }).waitFor();
    await page.getByText('North Ridge').first().waitFor();
    await page.getByText('Alder Falls').first().waitFor();
    await page.evaluate(() => document.fonts.ready);

    const typography = await page.evaluate(() => ({
      family: getComputedStyle(document.querySelector('main') ?? document.body).fontFamily,
      robotoLoaded: document.fonts.check('16px Roboto'),
    }));
    expect(typography.family).toMatch(/^"?Roboto/);
    expect(typography.robotoLoaded).toBe(true);

    await screenshot(page, 'home-network');
    expect(unexpected(problems)).toEqual([]);
    await context.close();
  });

  it('shows a friendly page for an unknown address, and the system status page', async () => {
    const { page, problems, context } = await openWatchedPage(browser, baseUrl);
    await page.goto('/');
    await signInThroughForm(page, staff.email, staff.password);
    await page.getByRole('heading', { name: 'Network', level: 1 }).waitFor();
    await page.goto('/no/such/page');
    await page.getByText('Page not found').waitFor();
    await screenshot(page, 'not-found');

    await page.goto('/status');
    await page
      .getByText(/MariaDB/)
      .first()
      .waitFor();
    await screenshot(page, 'system-status');
    expect(unexpected(problems)).toEqual([]);
    await context.close();
  });
});
