import { can, type Policy } from '@tallyloom/core';
import { join } from 'node:path';
import type { Browser } from 'playwright-core';
import { DEMO_SIGN_INS } from '../../db/seeders/demo-sign-ins';
import { startTestApp, type TestApp } from '../e2e/support/test-app';
import { launchBrowser, openWatchedPage, screenshot } from './support/browser';

const WEB_DIST = join(__dirname, '..', '..', 'packages', 'web', 'dist');

/** Navigation entries and the policy each one needs; a role must see exactly the ones it may use. */
const NAVIGATION: Array<{ label: string; policy: Policy | null }> = [
  { label: 'Network', policy: 'network.read' },
  { label: 'System status', policy: 'system.read' },
  { label: 'People', policy: 'people.manage' },
  { label: 'Dev outbox', policy: 'outbox.read' },
];

describe('each demo role signs in and sees its own navigation', () => {
  let testApp: TestApp;
  let browser: Browser;
  let baseUrl: string;

  beforeAll(async () => {
    testApp = await startTestApp({ SERVE_WEB: 'true', WEB_DIST_DIR: WEB_DIST });
    await testApp.app.listen(0, '127.0.0.1');
    baseUrl = (await testApp.app.getUrl()).replace('[::1]', '127.0.0.1');
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await testApp?.close();
  });

  for (const person of DEMO_SIGN_INS) {
    it(`${person.roleLabel}`, async () => {
      const { page, problems, context } = await openWatchedPage(browser, baseUrl);
      await page.goto('/');
      await page.waitForURL(/\/sign-in/);
      await page.getByLabel('E-mail').fill(person.email);
      await page.getByLabel('Password', { exact: true }).fill(person.password);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByRole('heading', { name: 'Network', level: 1 }).waitFor();

      const navigation = page.getByRole('navigation', { name: /main/i });
      for (const entry of NAVIGATION) {
        const link = navigation.getByRole('link', { name: entry.label, exact: true });
        const expected = entry.policy === null || can(person.role, entry.policy);
        expect(`${entry.label}: ${(await link.count()) > 0 ? 'shown' : 'hidden'}`).toBe(
          `${entry.label}: ${expected ? 'shown' : 'hidden'}`,
        );
      }
      await page.getByText(person.displayName).first().waitFor();
      if (person.chapterName) {
        // A chapter lead's network page lists their own chapter only.
        await page.getByRole('cell', { name: person.chapterName }).waitFor();
        expect(await page.getByRole('cell', { name: 'Brindle Bay' }).count()).toBe(0);
      }
      await screenshot(page, `role-${person.role}`);
      // The 401 of the first, signed-out page load is expected; nothing else may go wrong.
      expect(problems.filter((p) => !p.includes('401'))).toEqual([]);
      await context.close();
    });
  }
});
