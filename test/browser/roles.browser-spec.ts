import { can, type Policy } from '@tallyloom/core';
import type { Browser } from 'playwright-core';
import { DEMO_SIGN_INS } from '../../db/seeders/demo-sign-ins';
import { openWatchedPage, screenshot } from './support/browser';
import { signInThroughForm, unexpected } from './support/sign-in';
import { startServedApp, stopServedApp, type ServedApp } from './support/served-app';

/** Navigation entries and the policy each one needs; a role must see exactly the ones it may use. */
const NAVIGATION: Array<{ label: string; policy: Policy | null }> = [
  { label: 'Network', policy: 'network.read' },
  { label: 'Parcels', policy: 'receipts.read' },
  { label: 'System status', policy: 'system.read' },
  { label: 'Network set-up', policy: 'network.manage' },
  { label: 'People', policy: 'people.manage' },
  { label: 'Dev outbox', policy: 'outbox.read' },
  { label: 'Exports', policy: 'exports.tables' },
  { label: 'Impact pack', policy: 'exports.impact-pack' },
];

// A browser journey takes seconds, not the unit-test default of five.
jest.setTimeout(60_000);

describe('each demo role signs in and sees its own navigation', () => {
  let served: ServedApp | undefined;
  let browser: Browser;
  let baseUrl: string;

  beforeAll(async () => {
    served = await startServedApp();
    ({ browser, baseUrl } = served);
  });
  afterAll(() => stopServedApp(served));

  for (const person of DEMO_SIGN_INS) {
    it(`${person.roleLabel}`, async () => {
      const { page, problems, context } = await openWatchedPage(browser, baseUrl);
      await page.goto('/');
      await signInThroughForm(page, person.email, person.password);
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
      expect(unexpected(problems)).toEqual([]);
      await context.close();
    });
  }
});
