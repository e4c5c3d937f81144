import { getModelToken } from '@nestjs/sequelize';
import type { ParcelReceiptView, ReceiptListParams, ReceiptPage } from '@tallyloom/core';
import { BlanketSize } from '../../services/api/src/blanket-sizes/models/blanket-size.model';
import { attachScan, createReceipt, receiptInput } from './fixtures/receipts';
import { csvRecords, downloadExport, exportFinished } from './support/export-downloads';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

jest.setTimeout(180_000);

/**
 * The receipts export reads the list in one streamed query whose WHERE and ORDER BY are written
 * from the list's own filters, scope and sort keys: every sort, both directions, the scan filter
 * and a chapter lead's scope give the list's rows in the list's order, with the same figures.
 */
describe('receipts exports in every order of the list', () => {
  let testApp: TestApp;
  let staff: string;
  let lead: string;
  let regionId: number;
  let leadChapter: { id: number; name: string };
  const tag = uniqueSuffix();

  beforeAll(async () => {
    // The default uploads folder: every test app of a run takes export jobs from the shared queue,
    // so one with a folder of its own would store other suites' files where they cannot find them.
    testApp = await startTestApp();
    // Chapter names sort against their ids, so a name sort cannot pass by id order.
    const built = await aRegion()
      .named(`Order Region ${tag}`)
      .withChapter(`Zephyr Loom ${tag}`)
      .withChapter(`Alder Purl ${tag}`)
      .build(testApp.app);
    regionId = built.region.id;
    leadChapter = built.chapters[1];
    staff = (await signedIn(testApp, 'national_staff')).token;
    lead = (await signedIn(testApp, 'chapter_lead', { chapterId: leadChapter.id })).token;
    const size = await testApp.app
      .get<typeof BlanketSize>(getModelToken(BlanketSize))
      .create({ name: `Order lap ${tag}`, columns: 5, rows: 6, active: true });
    // Repeated dates and panel counts: ties that only the id breaks.
    for (let index = 0; index < 12; index += 1) {
      const receipt = await createReceipt(
        testApp,
        staff,
        receiptInput(built.chapters[index % 2].id, {
          receivedOn: `2026-03-${String(1 + (index % 3)).padStart(2, '0')}`,
          panelsAccepted: 5 + (index % 4),
          finishedBlankets: index % 3 === 0 ? [{ blanketSizeId: size.id, count: 1 + index }] : [],
          notes: `order note ${index}`,
        }),
      );
      for (let scan = 0; scan < index % 3; scan += 1) await attachScan(testApp, staff, receipt.id);
    }
  });
  afterAll(() => testApp.close());

  async function listed(token: string, filters: ReceiptListParams): Promise<ParcelReceiptView[]> {
    const items: ParcelReceiptView[] = [];
    for (let page = 1; ; page += 1) {
      const query = new URLSearchParams({
        ...Object.fromEntries(Object.entries(filters).map(([key, value]) => [key, String(value)])),
        page: String(page),
        pageSize: '100',
      });
      const response = await testApp
        .http()
        .get(`/api/receipts?${query.toString()}`)
        .set('Authorization', `Bearer ${token}`);
      expect(response.status).toBe(200);
      const body = response.body as ReceiptPage;
      items.push(...body.items);
      if (items.length >= body.total) return items;
    }
  }

  async function exported(token: string, filters: ReceiptListParams) {
    const { view } = await exportFinished(testApp, token, '/api/exports', {
      table: 'receipts',
      format: 'csv',
      filters,
    });
    return csvRecords(await downloadExport(testApp, view));
  }

  async function expectSameAsList(token: string, filters: ReceiptListParams) {
    const [records, expected] = await Promise.all([
      exported(token, filters),
      listed(token, filters),
    ]);
    expect(expected.length).toBeGreaterThan(0);
    expect(records.map((record) => Number(record['Receipt no.']))).toEqual(
      expected.map((receipt) => receipt.id),
    );
    records.forEach((record, index) => {
      const receipt = expected[index];
      expect(record).toMatchObject({
        'Received on': receipt.receivedOn,
        Chapter: receipt.chapterName,
        Region: receipt.regionName,
        'Panels accepted (panels)': String(receipt.panelsAccepted),
        'Set aside in all (panels)': String(receipt.setAsideTotal),
        'Finished blankets (blankets)': String(receipt.finishedBlanketsTotal),
        'Scans (files)': String(receipt.scanCount),
        Notes: receipt.notes ?? '',
      });
    });
  }

  it.each([
    ['receivedOn', 'desc'],
    ['receivedOn', 'asc'],
    ['panelsAccepted', 'desc'],
    ['panelsAccepted', 'asc'],
    ['chapterName', 'desc'],
    ['chapterName', 'asc'],
  ] as const)('sorts by %s %s as the list does', async (sort, direction) => {
    await expectSameAsList(staff, { regionId, sort, direction });
  });

  it('keeps the scan filter and a date range, both ways', async () => {
    await expectSameAsList(staff, { regionId, hasScan: true, from: '2026-03-02' });
    await expectSameAsList(staff, { regionId, hasScan: false, to: '2026-03-02' });
  });

  it("keeps a chapter lead to their own chapter's receipts", async () => {
    const records = await exported(lead, { sort: 'chapterName', direction: 'asc' });
    expect(new Set(records.map((record) => record.Chapter))).toEqual(new Set([leadChapter.name]));
    await expectSameAsList(lead, { sort: 'chapterName', direction: 'asc' });
  });
});
