import type { ReceiptPage } from '@tallyloom/core';
import { createReceipt, receiptInput } from './fixtures/receipts';
import { downloadExport, exportFinished, readBook, sheetTable } from './support/export-downloads';
import { ownRedisUrl } from './support/job-queues';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

jest.setTimeout(180_000);

// Five rows a sheet: the header, three data rows and the totals row.
const ROWS_PER_SHEET = 5;
const DATA_ROWS_PER_SHEET = ROWS_PER_SHEET - 2;
const RECEIPTS = 11;

describe('xlsx exports above the row limit continue on the next sheet', () => {
  let testApp: TestApp;
  let staff: string;
  let regionId: number;
  const tag = uniqueSuffix();

  beforeAll(async () => {
    testApp = await startTestApp({
      EXPORT_XLSX_ROWS_PER_SHEET: String(ROWS_PER_SHEET),
      // Its own queue: the run's other test apps (with the default limit) must not take the job.
      REDIS_URL: ownRedisUrl(6),
    });
    const built = await aRegion()
      .named(`Rollover ${tag}`)
      .withChapter(`Cast On ${tag}`)
      .withChapter(`Bind Off ${tag}`)
      .build(testApp.app);
    regionId = built.region.id;
    staff = (await signedIn(testApp, 'national_staff')).token;
    for (let index = 0; index < RECEIPTS; index += 1) {
      await createReceipt(
        testApp,
        staff,
        receiptInput(built.chapters[index % 2].id, {
          // Pairs share a day, so the order leans on the id too.
          receivedOn: `2026-02-${String(10 + Math.floor(index / 2)).padStart(2, '0')}`,
          panelsAccepted: 5 + index,
        }),
      );
    }
  });
  afterAll(() => testApp.close());

  it('repeats the header on each sheet and loses or repeats no row', async () => {
    const filters = { regionId };
    const { view } = await exportFinished(testApp, staff, '/api/exports', {
      table: 'receipts',
      format: 'xlsx',
      filters,
    });
    const sheets = Math.ceil(RECEIPTS / DATA_ROWS_PER_SHEET);
    expect(view).toMatchObject({ rows: RECEIPTS, sheets });
    const book = readBook(await downloadExport(testApp, view));
    expect(book.SheetNames).toEqual([
      'Parcel receipts',
      ...Array.from({ length: sheets - 1 }, (_, i) => `Parcel receipts (${i + 2})`),
    ]);
    const tables = book.SheetNames.map((name) => sheetTable(book, name));
    for (const table of tables) {
      expect(table.headers).toEqual(tables[0].headers);
      // Each sheet's totals add up its own rows.
      expect(table.totals?.['Panels accepted (panels)']).toBe(
        table.rows.reduce((sum, row) => sum + Number(row['Panels accepted (panels)']), 0),
      );
    }
    expect(tables.map((table) => table.rows.length)).toEqual(
      Array.from({ length: sheets }, (_, i) =>
        Math.min(DATA_ROWS_PER_SHEET, RECEIPTS - i * DATA_ROWS_PER_SHEET),
      ),
    );

    const listed = await testApp
      .http()
      .get(`/api/receipts?regionId=${regionId}&pageSize=100`)
      .set('Authorization', `Bearer ${staff}`);
    const expected = (listed.body as ReceiptPage).items.map((receipt) => receipt.id);
    expect(expected).toHaveLength(RECEIPTS);
    expect(tables.flatMap((table) => table.rows.map((row) => row['Receipt no.']))).toEqual(
      expected,
    );
  });
});
