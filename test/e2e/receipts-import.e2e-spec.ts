import { getModelToken } from '@nestjs/sequelize';
import {
  RECEIPT_IMPORT_FIELDS,
  type ApiErrorBody,
  type ImportCommitResponse,
  type ImportPreviewResponse,
  type ImportUploadResponse,
  type ReceiptImportField,
} from '@tallyloom/core';
import { parse } from 'csv-parse/sync';
import { Workbook } from 'exceljs';
import type { Response } from 'supertest';
import { AuditEntry } from '../../services/api/src/audit/models/audit-entry.model';
import type { BlanketSize } from '../../services/api/src/blanket-sizes/models/blanket-size.model';
import type { Campaign } from '../../services/api/src/campaigns/models/campaign.model';
import { ImportBatch } from '../../services/api/src/receipts/import/models/import-batch.model';
import { ParcelReceipt } from '../../services/api/src/receipts/models/parcel-receipt.model';
import { ReceiptFinishedBlanket } from '../../services/api/src/receipts/models/receipt-finished-blanket.model';
import { csvOf, uploadSheet } from './fixtures/receipt-imports';
import { elfExecutable, windowsExecutable } from './fixtures/receipts';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { aBlanketSize, aCampaign } from './support/setup-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

jest.setTimeout(120_000);

type Built = Awaited<ReturnType<ReturnType<typeof aRegion>['build']>>;

/** One generated parcel row: what the file holds, before it is written as CSV or XLSX. */
interface SheetRow {
  date: string | Date | number;
  sender: string | null;
  email: string | null;
  campaign: string | null;
  panels: number | string;
  offSize: number;
  notes: string | null;
  finished: number;
}

const ROWS = 500;
/** Two bad rows (by index); their sheet row numbers are index + 2 (the header is row 1). */
const BAD_DATE_AT = 41;
const BAD_PANELS_AT = 310;

function isoDay(offset: number): string {
  return new Date(Date.UTC(2025, 5, 1) + offset * 86_400_000).toISOString().slice(0, 10);
}

describe('bulk import of parcel receipts', () => {
  let testApp: TestApp;
  let receipts: typeof ParcelReceipt;
  let batches: typeof ImportBatch;
  let home: Built;
  let away: Built;
  let admin: string;
  let lead: string;
  let size: BlanketSize;
  let campaign: Campaign;

  beforeAll(async () => {
    testApp = await startTestApp();
    receipts = testApp.app.get<typeof ParcelReceipt>(getModelToken(ParcelReceipt));
    batches = testApp.app.get<typeof ImportBatch>(getModelToken(ImportBatch));
    home = await aRegion()
      .named('Import Home')
      .withChapter('Tension Square', '2024-01-01')
      .withChapter('Gauge Lane', '2024-01-01')
      .build(testApp.app);
    away = await aRegion().named('Import Away').withChapter('Far Swatch').build(testApp.app);
    admin = (await signedIn(testApp, 'network_admin')).token;
    lead = (await signedIn(testApp, 'chapter_lead', { chapterId: home.chapters[0].id })).token;
    size = await aBlanketSize().withGrid(4, 5).build(testApp.app);
    campaign = await aCampaign().running('2025-06-01', '2025-12-31').build(testApp.app);
  });
  afterAll(() => testApp.close());

  const as = (token: string) => ({
    get: (url: string) => testApp.http().get(url).set('Authorization', `Bearer ${token}`),
    post: (url: string, body: object = {}) =>
      testApp.http().post(url).set('Authorization', `Bearer ${token}`).send(body),
  });
  const countIn = (chapterId: number) => receipts.count({ where: { chapterId } });
  const headers = () => [
    'Date',
    'Sender',
    'E-mail',
    'Campaign',
    'Panels',
    'Off-size',
    'Notes',
    `Finished: ${size.name}`,
  ];
  const mapping = (): Record<string, ReceiptImportField | null> => ({
    Date: 'receivedOn',
    Sender: 'senderName',
    'E-mail': 'senderEmail',
    Campaign: 'campaignCode',
    Panels: 'panelsAccepted',
    'Off-size': 'setAsideOffSize',
    Notes: 'notes',
    [`Finished: ${size.name}`]: `finished:${size.id}`,
  });

  /** 500 plausible parcels (the first names the test, so each file is its own content). */
  function goodRows(tag: string): SheetRow[] {
    return Array.from({ length: ROWS }, (_, i) => ({
      date: isoDay(i % 180),
      sender: i % 3 === 0 ? `Maker ${i}` : null,
      email: i % 3 === 0 ? `maker${i}@example.org` : null,
      // Every 100th row from 5 names no running drive (a warning); from 7, the test's drive.
      campaign: i % 100 === 5 ? 'NOPE-1' : i % 100 === 7 ? campaign.code : null,
      panels: (i * 7) % 41,
      offSize: i % 4,
      notes: i === 0 ? `import test ${tag}` : null,
      finished: i % 25 === 0 ? 1 : 0,
    }));
  }

  const cellsOf = (row: SheetRow) => [
    row.date instanceof Date ? row.date.toISOString().slice(0, 10) : row.date,
    row.sender,
    row.email,
    row.campaign,
    row.panels,
    row.offSize,
    row.notes,
    row.finished,
  ];

  const asCsv = (rows: SheetRow[]) => csvOf([headers(), ...rows.map(cellsOf)]);

  async function asXlsx(rows: SheetRow[]): Promise<Buffer> {
    const workbook = new Workbook();
    const sheet = workbook.addWorksheet('Parcels');
    sheet.addRow(headers());
    for (const row of rows) {
      const date =
        typeof row.date === 'string' && /^\d{4}-/.test(row.date)
          ? new Date(`${row.date}T00:00:00Z`)
          : row.date;
      sheet.addRow([date, ...cellsOf(row).slice(1)]);
    }
    sheet.getColumn(1).numFmt = 'yyyy-mm-dd';
    return Buffer.from(await workbook.xlsx.writeBuffer());
  }

  async function upload(
    token: string,
    chapterId: number,
    content: Buffer,
    fileName: string,
  ): Promise<ImportUploadResponse> {
    const response = await uploadSheet(testApp, token, chapterId, content, fileName);
    expect(`${response.status} ${JSON.stringify(response.body).slice(0, 300)}`).toMatch(/^201 /);
    return response.body as ImportUploadResponse;
  }

  const preview = (token: string, importId: string, body: object) =>
    as(token).post(`/api/receipts/imports/${importId}/preview`, body);
  const commit = (token: string, importId: string) =>
    as(token).post(`/api/receipts/imports/${importId}/commit`, { mapping: mapping() });

  /** Uploads that nothing was stored by: the chapter's receipts and the batches stay as they were. */
  async function storesNothing(chapterId: number, act: () => Promise<Response>) {
    const [receiptsBefore, batchesBefore] = await Promise.all([
      countIn(chapterId),
      batches.count(),
    ]);
    const response = await act();
    expect(await countIn(chapterId)).toBe(receiptsBefore);
    expect(await batches.count()).toBe(batchesBefore);
    return response;
  }

  describe.each([
    {
      kind: 'CSV',
      write: (rows: SheetRow[]) => Promise.resolve(asCsv(rows)),
      badDate: '2025-02-30',
      badPanels: -3,
    },
    {
      kind: 'XLSX',
      write: asXlsx,
      badDate: 'next Tuesday',
      badPanels: 2.5,
    },
  ])('$kind: 500 rows, two of them bad', ({ kind, write, badDate, badPanels }) => {
    let rows: SheetRow[];
    let bad: SheetRow[];
    let chapterId: number;
    let corrected: Buffer;

    beforeAll(() => {
      chapterId = home.chapters[0].id;
      rows = goodRows(`${kind}-${uniqueSuffix()}`);
      bad = rows.map((row, i) =>
        i === BAD_DATE_AT
          ? { ...row, date: badDate }
          : i === BAD_PANELS_AT
            ? { ...row, panels: badPanels }
            : row,
      );
    });

    it('reads the upload, suggests the mapping and names exactly the two bad rows', async () => {
      const uploaded = await upload(
        lead,
        chapterId,
        await write(bad),
        `parcels.${kind.toLowerCase()}`,
      );
      expect(uploaded).toMatchObject({
        chapterId,
        fileType: kind.toLowerCase(),
        headers: headers(),
        rowCount: ROWS,
        suggestedMapping: mapping(),
      });
      expect(uploaded.sha256).toMatch(/^[0-9a-f]{64}$/);
      expect(uploaded.sampleRows).toHaveLength(5);

      const response = await preview(lead, uploaded.importId, { mapping: mapping(), pageSize: 50 });
      expect(response.status).toBe(200);
      const body = response.body as ImportPreviewResponse;
      expect(body).toMatchObject({
        rowCount: ROWS,
        validCount: ROWS - 2,
        errorCount: 2,
        total: ROWS,
      });
      expect(body.rows).toHaveLength(50);
      expect(
        body.rowErrors.map((row) => ({
          rowNumber: row.rowNumber,
          fields: row.errors.map((e) => e.field),
        })),
      ).toEqual([
        { rowNumber: BAD_DATE_AT + 2, fields: ['receivedOn'] },
        { rowNumber: BAD_PANELS_AT + 2, fields: ['panelsAccepted'] },
      ]);
      expect(body.rowErrors[0].errors[0].column).toBe('Date');
      // Unknown drive codes are warnings, as on the form: five rows name one.
      expect(body.warningCount).toBe(5);

      const onlyErrors = (
        await preview(lead, uploaded.importId, { mapping: mapping(), only: 'errors' }).expect(200)
      ).body as ImportPreviewResponse;
      expect(onlyErrors.rows.map((row) => row.rowNumber)).toEqual([
        BAD_DATE_AT + 2,
        BAD_PANELS_AT + 2,
      ]);

      // While errors remain, the commit stores nothing and names every bad row and field.
      const refused = await storesNothing(chapterId, () => commit(lead, uploaded.importId));
      expect(refused.status).toBe(400);
      expect((refused.body as ApiErrorBody).fields?.map((f) => f.field)).toEqual([
        `rows.${BAD_DATE_AT + 2}.receivedOn`,
        `rows.${BAD_PANELS_AT + 2}.panelsAccepted`,
      ]);
    });

    it('commits the corrected file: 500 receipts in one batch, the panels summing as in the file', async () => {
      corrected = await write(rows);
      const uploaded = await upload(
        lead,
        chapterId,
        corrected,
        `parcels-fixed.${kind.toLowerCase()}`,
      );
      const checked = (await preview(lead, uploaded.importId, { mapping: mapping() }).expect(200))
        .body as ImportPreviewResponse;
      expect(checked).toMatchObject({ errorCount: 0, validCount: ROWS, rowErrors: [] });

      const before = await countIn(chapterId);
      const response = await commit(lead, uploaded.importId);
      expect(response.status).toBe(201);
      const { batchId, created } = response.body as ImportCommitResponse;
      expect(created).toBe(ROWS);
      expect(await countIn(chapterId)).toBe(before + ROWS);

      const stored = await receipts.findAll({ where: { importBatchId: batchId } });
      expect(stored).toHaveLength(ROWS);
      const expectedPanels = rows.reduce((sum, row) => sum + Number(row.panels), 0);
      expect(stored.reduce((sum, r) => sum + r.panelsAccepted, 0)).toBe(expectedPanels);
      expect(stored.reduce((sum, r) => sum + r.setAsideOffSize, 0)).toBe(
        rows.reduce((sum, row) => sum + row.offSize, 0),
      );
      expect(stored.every((r) => r.chapterId === chapterId)).toBe(true);
      const credited = stored.filter((r) => r.campaignId === campaign.id);
      expect(credited).toHaveLength(5);
      expect(
        stored.filter((r) => r.campaignCodeEntered === 'NOPE-1' && r.campaignId === null),
      ).toHaveLength(5);
      const finished = await testApp.app
        .get<typeof ReceiptFinishedBlanket>(getModelToken(ReceiptFinishedBlanket))
        .sum('count', { where: { receiptId: stored.map((r) => r.id), blanketSizeId: size.id } });
      expect(finished).toBe(rows.reduce((sum, row) => sum + row.finished, 0));

      const batch = await batches.findByPk(batchId);
      expect(batch).toMatchObject({ chapterId, rowCount: ROWS, fileSha256: uploaded.sha256 });

      // One audit entry: batch, hash and count; nothing about senders.
      const entries = await testApp.app
        .get<typeof AuditEntry>(getModelToken(AuditEntry))
        .findAll({ where: { action: 'receipt.import_committed', entityId: String(batchId) } });
      expect(entries).toHaveLength(1);
      const after = entries[0].afterJson;
      const parsed = (typeof after === 'string' ? JSON.parse(after) : after) as Record<
        string,
        unknown
      >;
      expect(parsed).toEqual({ batchId, chapterId, fileSha256: uploaded.sha256, rowCount: ROWS });

      // Committing again, or uploading the same bytes under another name, is refused (409).
      const again = await storesNothing(chapterId, () => commit(lead, uploaded.importId));
      expect(again.status).toBe(409);
      const renamed = await storesNothing(chapterId, () =>
        uploadSheet(testApp, lead, chapterId, corrected, `renamed-copy.${kind.toLowerCase()}`),
      );
      expect(renamed.status).toBe(409);
      expect((renamed.body as ApiErrorBody).message).toMatch(
        new RegExp(`already imported on \\d{4}-\\d{2}-\\d{2} as batch ${batchId}`),
      );
    });
  });

  it('stores a formula-looking cell as its literal text, with a warning', async () => {
    const chapterId = home.chapters[0].id;
    const formula = '=HYPERLINK("http://example.test/x","click")';
    const content = csvOf([
      ['Received on', 'Panels accepted', 'Notes', 'Sender name'],
      ['2025-07-01', 10, formula, '@SUM(1+1)'],
      ['2025-07-02', 11, `plain ${uniqueSuffix()}`, null],
    ]);
    const uploaded = await upload(lead, chapterId, content, 'formula.csv');
    const body = (
      await preview(lead, uploaded.importId, { mapping: uploaded.suggestedMapping }).expect(200)
    ).body as ImportPreviewResponse;
    expect(body).toMatchObject({ errorCount: 0, warningCount: 1 });
    expect(body.rows[0].values.notes).toBe(formula);
    expect(body.rows[0].warnings.map((w) => [w.field, w.column])).toEqual([
      ['notes', 'Notes'],
      ['senderName', 'Sender name'],
    ]);
    expect(body.rows[0].warnings[0].message).toMatch(/plain text/);

    const response = await as(lead)
      .post(`/api/receipts/imports/${uploaded.importId}/commit`, {
        mapping: uploaded.suggestedMapping,
      })
      .expect(201);
    const { batchId } = response.body as ImportCommitResponse;
    const stored = await receipts.findAll({
      where: { importBatchId: batchId },
      order: [['id', 'ASC']],
    });
    expect(stored.map((r) => r.notes)[0]).toBe(formula);
    expect(stored[0].senderName).toBe('@SUM(1+1)');
  });

  describe('refused uploads store nothing', () => {
    it('a 0-byte file (400)', async () => {
      const response = await storesNothing(home.chapters[0].id, () =>
        uploadSheet(testApp, lead, home.chapters[0].id, Buffer.alloc(0), 'empty.csv'),
      );
      expect(response.status).toBe(400);
      expect((response.body as ApiErrorBody).message).toBe('The file is empty.');
    });

    it.each([
      ['a Linux executable', elfExecutable()],
      ['a Windows executable', windowsExecutable()],
    ])('%s renamed .csv (400)', async (_, content) => {
      const response = await storesNothing(home.chapters[0].id, () =>
        uploadSheet(testApp, lead, home.chapters[0].id, content, 'parcels.csv'),
      );
      expect(response.status).toBe(400);
      expect((response.body as ApiErrorBody).message).toMatch(/not a CSV or XLSX file/);
    });

    it('a chapter lead importing for another chapter (404)', async () => {
      for (const other of [home.chapters[1].id, away.chapters[0].id]) {
        const response = await storesNothing(other, () =>
          uploadSheet(testApp, lead, other, asCsv(goodRows(`lead-${uniqueSuffix()}`)), 'other.csv'),
        );
        expect(response.status).toBe(404);
      }
    });

    it("someone else's upload is not found (404), even for an admin", async () => {
      const uploaded = await upload(
        lead,
        home.chapters[0].id,
        asCsv(goodRows(`own-${uniqueSuffix()}`)),
        'own.csv',
      );
      await preview(admin, uploaded.importId, { mapping: mapping() }).expect(404);
      const response = await storesNothing(home.chapters[0].id, () =>
        commit(admin, uploaded.importId),
      );
      expect(response.status).toBe(404);
      await preview(lead, 'no-such-import', { mapping: mapping() }).expect(404);
    });

    it('a mapping that names no date column, or one field twice (400)', async () => {
      const uploaded = await upload(
        lead,
        home.chapters[0].id,
        asCsv(goodRows(`map-${uniqueSuffix()}`)),
        'map.csv',
      );
      const noDate = await preview(lead, uploaded.importId, {
        mapping: { ...mapping(), Date: null },
      });
      expect(noDate.status).toBe(400);
      expect((noDate.body as ApiErrorBody).fields?.map((f) => f.field)).toEqual(['mapping']);
      const twice = await preview(lead, uploaded.importId, {
        mapping: { ...mapping(), Notes: 'panelsAccepted' },
      });
      expect(twice.status).toBe(400);
      expect((twice.body as ApiErrorBody).fields?.map((f) => f.field)).toEqual(['mapping.Notes']);
    });
  });

  describe('templates', () => {
    const fixedLabels = Object.values(RECEIPT_IMPORT_FIELDS);

    it('template.csv parses back to the field labels, and uploads as a clean one-row preview', async () => {
      const response = await as(lead)
        .get('/api/receipts/imports/template.csv')
        .buffer(true)
        .parse((res, done) => {
          const chunks: Buffer[] = [];
          res.on('data', (chunk: Buffer) => chunks.push(chunk));
          res.on('end', () => done(null, Buffer.concat(chunks)));
        })
        .expect(200);
      expect(response.headers['content-type']).toMatch(/^text\/csv/);
      const content = response.body as Buffer;
      const [header, example, ...more] = parse(content, { bom: true }) as string[][];
      expect(more).toEqual([]);
      expect(header.slice(0, fixedLabels.length)).toEqual(fixedLabels);
      expect(header.slice(fixedLabels.length)).toContain(`Finished: ${size.name}`);
      expect(example[0]).toMatch(/^\d{4}-\d{2}-\d{2}$/);
      // No personal data in the example: the sender columns are empty.
      expect(example.slice(1, 4)).toEqual(['', '', '']);

      const uploaded = await upload(lead, home.chapters[0].id, content, 'template.csv');
      expect(Object.values(uploaded.suggestedMapping)).not.toContain(null);
      const checked = (
        await preview(lead, uploaded.importId, { mapping: uploaded.suggestedMapping }).expect(200)
      ).body as ImportPreviewResponse;
      expect(checked).toMatchObject({ rowCount: 1, errorCount: 0 });
    });

    it('template.xlsx has the same headers, a frozen header row and column widths', async () => {
      const response = await as(lead)
        .get('/api/receipts/imports/template.xlsx')
        .buffer(true)
        .parse((res, done) => {
          const chunks: Buffer[] = [];
          res.on('data', (chunk: Buffer) => chunks.push(chunk));
          res.on('end', () => done(null, Buffer.concat(chunks)));
        })
        .expect(200);
      const workbook = new Workbook();
      await workbook.xlsx.load(response.body as ArrayBuffer);
      const sheet = workbook.worksheets[0];
      const header = (sheet.getRow(1).values as unknown[]).slice(1);
      expect(header.slice(0, fixedLabels.length)).toEqual(fixedLabels);
      expect(sheet.views[0]).toMatchObject({ state: 'frozen', ySplit: 1 });
      expect(sheet.getColumn(1).width).toBeGreaterThan(8);
      expect(sheet.getRow(2).getCell(1).value).toBeInstanceOf(Date);
    });
  });
});
