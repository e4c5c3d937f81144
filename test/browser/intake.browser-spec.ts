import { format } from 'date-fns';
import type { Browser } from 'playwright-core';
import { PNG } from 'pngjs';
import { DEMO_SIGN_INS } from '../../db/seeders/demo-sign-ins';
import { openWatchedPage, screenshot } from './support/browser';
import { startServedApp, stopServedApp, type ServedApp } from './support/served-app';
import { signInThroughForm, unexpected } from './support/sign-in';

const lead = DEMO_SIGN_INS.find((person) => person.role === 'chapter_lead')!;

/** A small photo of a parcel label: a real PNG, made here. */
function labelPhoto(): Buffer {
  const png = new PNG({ width: 64, height: 40 });
  for (let i = 0; i < png.data.length; i += 4) {
    const stripe = Math.floor(i / 4 / 64) % 8 < 4;
    png.data[i] = stripe ? 15 : 240;
    png.data[i + 1] = stripe ? 92 : 230;
    png.data[i + 2] = stripe ? 94 : 210;
    png.data[i + 3] = 255;
  }
  return PNG.sync.write(png);
}

// A browser journey takes seconds, not the unit-test default of five.
jest.setTimeout(90_000);

describe('intake: a chapter lead logs a parcel with a scan and finds it in the list', () => {
  let served: ServedApp | undefined;
  let browser: Browser;
  let baseUrl: string;

  beforeAll(async () => {
    served = await startServedApp();
    ({ browser, baseUrl } = served);
  });
  afterAll(() => stopServedApp(served));

  it('logs a parcel, attaches a photo of its label, and sees it among the parcels', async () => {
    const { page, problems, context } = await openWatchedPage(browser, baseUrl);
    await page.goto('/receipts');
    await signInThroughForm(page, lead.email, lead.password);
    await page.getByRole('heading', { name: 'Parcels', level: 1 }).waitFor();
    await page.getByRole('link', { name: 'Log a parcel' }).click();

    const form = page.getByRole('form', { name: 'Parcel' });
    await form.waitFor();
    await form.getByLabel('Received on').fill(format(new Date(), 'yyyy-MM-dd'));
    await form.getByLabel('Panels accepted').fill('1234');
    await form.getByLabel('Campaign code').fill('NO-SUCH-DRIVE');
    await screenshot(page, 'intake-form');
    await form.getByRole('button', { name: 'Log parcel' }).click();

    await page.waitForURL(/\/receipts\/\d+$/);
    const receiptId = Number(/\/receipts\/(\d+)$/.exec(page.url())![1]);
    await page
      .getByText(/NO-SUCH-DRIVE/)
      .first()
      .waitFor();

    await page.getByLabel('Attach a scan or photo').setInputFiles({
      name: 'label photo.png',
      mimeType: 'image/png',
      buffer: labelPhoto(),
    });
    await page.getByRole('list', { name: 'Scans' }).getByRole('img').first().waitFor();
    await screenshot(page, 'intake-detail-with-scan');

    await page.goto('/receipts');
    await page.getByRole('heading', { name: 'Parcels', level: 1 }).waitFor();
    const row = page.locator(`a[href="/receipts/${receiptId}"]`).first();
    await row.waitFor();
    await page.getByText('1,234').first().waitFor();
    await screenshot(page, 'intake-list');
    // Only Alder Falls: the lead's scope.
    expect(await page.getByRole('cell', { name: 'Brindle Bay' }).count()).toBe(0);
    expect(unexpected(problems)).toEqual([]);
    await context.close();
  });
});
