import { getConnectionToken } from '@nestjs/sequelize';
import { addDays, format } from 'date-fns';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { Browser } from 'playwright-core';
import { RECEIPT_IMPORT_FIELDS } from '@tallyloom/core';
import { DEMO_SIGN_INS } from '../../db/seeders/demo-sign-ins';
import type { TestApp } from '../e2e/support/test-app';
import { openWatchedPage, screenshot } from './support/browser';
import { signInThroughForm, unexpected } from './support/sign-in';
import { startServedApp, stopServedApp, type ServedApp } from './support/served-app';

const lead = DEMO_SIGN_INS.find((person) => person.role === 'chapter_lead')!;

/** 500 parcels of a sheet a chapter kept before Tallyloom; `broken` rows carry a mistake each. */
function sheet(broken: boolean, marker: string): { csv: string; panels: number } {
  const header = [
    RECEIPT_IMPORT_FIELDS.receivedOn,
    RECEIPT_IMPORT_FIELDS.panelsAccepted,
    RECEIPT_IMPORT_FIELDS.otherItems,
    RECEIPT_IMPORT_FIELDS.notes,
  ];
  const lines = [header.join(',')];
  let panels = 0;
  const start = new Date('2025-01-01T00:00:00Z');
  for (let i = 0; i < 500; i += 1) {
    const count = 5 + ((i * 7) % 40);
    panels += count;
    const day = format(addDays(start, i % 600), 'yyyy-MM-dd');
    let cells = [day, String(count), '0', `${marker} row ${i + 1}`];
    if (broken && i === 41) cells = [day, '-3', '0', `${marker} negative count`];
    if (broken && i === 317) cells = ['2099-01-01', String(count), '0', `${marker} future date`];
    lines.push(cells.join(','));
  }
  return { csv: `${lines.join('\r\n')}\r\n`, panels };
}

// A browser journey takes seconds, not the unit-test default of five.
jest.setTimeout(120_000);

describe('import: a chapter lead imports a sheet of 500 parcels, fixes two bad rows, commits', () => {
  let served: ServedApp | undefined;
  let testApp: TestApp;
  let browser: Browser;
  let baseUrl: string;

  beforeAll(async () => {
    served = await startServedApp();
    ({ testApp, browser, baseUrl } = served);
  });
  afterAll(() => stopServedApp(served));

  it('shows the two bad rows, refuses to import them, then imports the corrected sheet', async () => {
    const marker = `Journey ${Date.now().toString(36)}`;
    const { page, problems, context } = await openWatchedPage(browser, baseUrl);
    await page.goto('/receipts');
    await signInThroughForm(page, lead.email, lead.password);
    await page.getByRole('heading', { name: 'Parcels', level: 1 }).waitFor();
    await page.getByRole('link', { name: 'Import a sheet' }).click();
    await page.getByRole('heading', { name: 'Import parcels', level: 1 }).waitFor();

    const bad = sheet(true, marker);
    await page.getByLabel('Sheet file').setInputFiles({
      name: 'old-parcels.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(bad.csv),
    });
    await page.getByRole('button', { name: 'Upload' }).click();
    await page.getByRole('button', { name: 'Check rows' }).click();
    // Sheet rows count the header as row 1: data rows 42 and 318 are sheet rows 43 and 319.
    await page.getByText('500 rows, 2 with errors').waitFor();
    await page.getByRole('cell', { name: '43', exact: true }).waitFor();
    await page.getByRole('cell', { name: '319', exact: true }).waitFor();
    await page.getByText(/Panels accepted: .*0 or more/).waitFor();
    await page.getByText(/Received on: .*future/).waitFor();
    await screenshot(page, 'import-preview-with-errors');
    expect(await page.getByRole('button', { name: 'Import', exact: true }).isDisabled()).toBe(true);

    await page.getByRole('button', { name: 'Upload a corrected file' }).click();
    const good = sheet(false, marker);
    await page.getByLabel('Sheet file').setInputFiles({
      name: 'old-parcels-fixed.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(good.csv),
    });
    await page.getByRole('button', { name: 'Upload' }).click();
    await page.getByRole('button', { name: 'Check rows' }).click();
    const importButton = page.getByRole('button', { name: 'Import', exact: true });
    await importButton.waitFor();
    await page.waitForFunction(() =>
      [...document.querySelectorAll('button')].some(
        (b) =>
          b.textContent?.trim() === 'Import' &&
          !b.disabled &&
          b.getAttribute('aria-disabled') !== 'true',
      ),
    );
    await importButton.click();
    await page.getByText(/^Imported 500 parcels/).waitFor();
    await screenshot(page, 'import-done');
    expect(unexpected(problems)).toEqual([]);
    await context.close();

    // The figures arrived: 500 receipts whose panels add up to the sheet's.
    const sequelize = testApp.app.get<Sequelize>(getConnectionToken());
    const [row] = await sequelize.query<{ n: number; panels: number }>(
      'SELECT COUNT(*) AS n, SUM(panels_accepted) AS panels FROM parcel_receipts WHERE notes LIKE ?',
      { replacements: [`${marker} row %`], type: QueryTypes.SELECT },
    );
    expect(Number(row.n)).toBe(500);
    expect(Number(row.panels)).toBe(good.panels);
  });
});
