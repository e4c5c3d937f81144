import { getModelToken } from '@nestjs/sequelize';
import type { ApiErrorBody, ParcelReceiptDetail, ScanView } from '@tallyloom/core';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createHash } from 'node:crypto';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { AuditEntry } from '../../services/api/src/audit/models/audit-entry.model';
import { ReceiptScan } from '../../services/api/src/receipts/models/receipt-scan.model';
import { isStorageKey, pathForKey } from '../../services/api/src/storage/storage-layout';
import {
  attachScan,
  createReceipt,
  elfExecutable,
  receiptInput,
  tinyJpeg,
  tinyPdf,
  tinyPng,
  tinyWebp,
  windowsExecutable,
} from './fixtures/receipts';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(60_000);

describe('scans of parcel receipts', () => {
  const uploadsDir = mkdtempSync(join(tmpdir(), 'tallyloom-scans-'));
  let testApp: TestApp;
  let scans: typeof ReceiptScan;
  let admin: string;
  let lead: string;
  let otherLead: string;
  let coordinator: string;
  let grantWriter: string;
  let receipt: ParcelReceiptDetail;

  beforeAll(async () => {
    // Its own uploads folder, so no job processors: every test app takes jobs from the shared
    // queues, and an export written here would land where its own suite cannot find it.
    testApp = await startTestApp({ UPLOADS_DIR: uploadsDir, JOB_PROCESSORS: 'off' });
    scans = testApp.app.get<typeof ReceiptScan>(getModelToken(ReceiptScan));
    const { region, chapters } = await aRegion()
      .named('Scan Home')
      .withChapter('Label Mill')
      .withChapter('Slip Ford')
      .build(testApp.app);
    admin = (await signedIn(testApp, 'network_admin')).token;
    lead = (await signedIn(testApp, 'chapter_lead', { chapterId: chapters[0].id })).token;
    otherLead = (await signedIn(testApp, 'chapter_lead', { chapterId: chapters[1].id })).token;
    coordinator = (await signedIn(testApp, 'regional_coordinator', { regionId: region.id })).token;
    grantWriter = (await signedIn(testApp, 'grant_writer')).token;
    receipt = await createReceipt(testApp, lead, receiptInput(chapters[0].id));
  });
  afterAll(async () => {
    await testApp.close();
    rmSync(uploadsDir, { recursive: true, force: true });
  });

  const upload = (token: string, content: Buffer, fileName: string, receiptId = receipt.id) =>
    testApp
      .http()
      .post(`/api/receipts/${receiptId}/scans`)
      .set('Authorization', `Bearer ${token}`)
      .attach('file', content, fileName);
  const download = (token: string, url: string) =>
    testApp
      .http()
      .get(url)
      .set('Authorization', `Bearer ${token}`)
      .buffer(true)
      .parse((response, callback) => {
        const chunks: Buffer[] = [];
        response.on('data', (chunk: Buffer) => chunks.push(chunk));
        response.on('end', () => callback(null, Buffer.concat(chunks)));
      });
  const scanCount = () => scans.count({ where: { receiptId: receipt.id } });

  /** Uploads a bad file; expects the status, a message, and no scan stored. */
  async function refused(content: Buffer, fileName: string, status: number): Promise<string> {
    const before = await scanCount();
    const response = await upload(lead, content, fileName);
    expect(response.status).toBe(status);
    expect(await scanCount()).toBe(before);
    return (response.body as ApiErrorBody).message;
  }

  it('stores a PNG under a generated key, with its sha256, and serves it back inline', async () => {
    const content = tinyPng(7);
    const scan = await attachScan(testApp, lead, receipt.id, content, 'label.png');
    expect(scan).toMatchObject({
      fileName: 'label.png',
      mediaType: 'image/png',
      sizeBytes: content.length,
    });

    const row = await scans.findByPk(scan.id);
    expect(isStorageKey(row!.storageKey)).toBe(true);
    expect(row!.sha256).toBe(createHash('sha256').update(content).digest('hex'));
    expect(readFileSync(pathForKey(uploadsDir, row!.storageKey))).toEqual(content);

    const response = await download(coordinator, scan.url).expect(200);
    expect(response.headers['content-type']).toBe('image/png');
    expect(response.headers['content-disposition']).toBe(
      `inline; filename="label.png"; filename*=UTF-8''label.png`,
    );
    expect(response.body).toEqual(content);

    const detail = (
      await testApp.http().get(`/api/receipts/${receipt.id}`).set('Authorization', `Bearer ${lead}`)
    ).body as ParcelReceiptDetail;
    expect(detail.scans.map((s) => s.id)).toContain(scan.id);
  });

  it('accepts JPEG, WebP and PDF, recognised by their content', async () => {
    for (const [content, name, type] of [
      [tinyJpeg(), 'slip.jpg', 'image/jpeg'],
      [tinyWebp(), 'photo.webp', 'image/webp'],
      [tinyPdf(), 'packing slip.pdf', 'application/pdf'],
    ] as const) {
      const scan = await attachScan(testApp, lead, receipt.id, content, name);
      expect(scan).toMatchObject({ fileName: name, mediaType: type });
    }
  });

  it('refuses an executable renamed .png (415), whatever the name says', async () => {
    expect(await refused(elfExecutable(), 'label.png', 415)).toContain(
      'Only JPEG, PNG, WebP or PDF',
    );
    expect(await refused(windowsExecutable(), 'label.png', 415)).toContain(
      'Only JPEG, PNG, WebP or PDF',
    );
    expect(await refused(Buffer.from('just some text'), 'notes.pdf', 415)).toContain(
      'Only JPEG, PNG, WebP or PDF',
    );
  });

  it('refuses an empty file and a request without a file (400)', async () => {
    expect(await refused(Buffer.alloc(0), 'empty.png', 400)).toBe('The file is empty.');
    const response = await testApp
      .http()
      .post(`/api/receipts/${receipt.id}/scans`)
      .set('Authorization', `Bearer ${lead}`)
      .field('note', 'no file here');
    expect(response.status).toBe(400);
    expect((response.body as ApiErrorBody).fields?.[0].field).toBe('file');
  });

  it('refuses a file over the default 10 MB limit (413)', async () => {
    const big = Buffer.concat([tinyPng(3), Buffer.alloc(11 * 1024 * 1024)]);
    const message = await refused(big, 'huge.png', 413);
    expect(message).toContain('larger than the 10 MB limit');
  });

  it('keeps a path out of the stored name, and cleans the name shown', async () => {
    const scan = await attachScan(testApp, lead, receipt.id, tinyPng(9), '../../etc/\u202Egnp.exe');
    const row = await scans.findByPk(scan.id);
    expect(isStorageKey(row!.storageKey)).toBe(true);
    expect(row!.storageKey).not.toContain('..');
    expect(scan.fileName).toBe('gnp.exe.png');
    expect(existsSync(pathForKey(uploadsDir, row!.storageKey))).toBe(true);
    const response = await download(lead, scan.url).expect(200);
    expect(response.headers['content-disposition']).toBe(
      `inline; filename="gnp.exe.png"; filename*=UTF-8''gnp.exe.png`,
    );
  });

  it('hides scans outside scope (404), and from grant writers (403)', async () => {
    const scan = await attachScan(testApp, admin, receipt.id);
    await download(otherLead, scan.url).expect(404);
    await download(grantWriter, scan.url).expect(403);
    const before = await scanCount();
    await upload(otherLead, tinyPng(), 'mine.png').expect(404);
    await testApp
      .http()
      .delete(`/api/receipts/${receipt.id}/scans/${scan.id}`)
      .set('Authorization', `Bearer ${otherLead}`)
      .expect(404);
    expect(await scanCount()).toBe(before);
  });

  it('removes a scan and its file, and records both the upload and the removal', async () => {
    const scan = await attachScan(testApp, lead, receipt.id, tinyPng(11), 'to-remove.png');
    const key = (await scans.findByPk(scan.id))!.storageKey;
    await testApp
      .http()
      .delete(`/api/receipts/${receipt.id}/scans/${scan.id}`)
      .set('Authorization', `Bearer ${lead}`)
      .expect(204);
    expect(await scans.findByPk(scan.id)).toBeNull();
    expect(existsSync(pathForKey(uploadsDir, key))).toBe(false);
    await download(lead, scan.url).expect(404);

    const actions = (
      await testApp.app
        .get<typeof AuditEntry>(getModelToken(AuditEntry))
        .findAll({ where: { entityType: 'parcel_receipt', entityId: String(receipt.id) } })
    ).map((e) => e.action);
    expect(actions).toContain('receipt.scan_added');
    expect(actions).toContain('receipt.scan_removed');
  });
});

describe('scans with a small upload limit', () => {
  const uploadsDir = mkdtempSync(join(tmpdir(), 'tallyloom-scans-small-'));
  let testApp: TestApp;
  let admin: string;
  let receipt: ParcelReceiptDetail;

  beforeAll(async () => {
    testApp = await startTestApp({
      UPLOADS_DIR: uploadsDir,
      UPLOAD_MAX_BYTES: '1024',
      JOB_PROCESSORS: 'off',
    });
    const { chapters } = await aRegion().withChapter('Tiny Post').build(testApp.app);
    admin = (await signedIn(testApp, 'network_admin')).token;
    receipt = await createReceipt(testApp, admin, receiptInput(chapters[0].id));
  });
  afterAll(async () => {
    await testApp.close();
    rmSync(uploadsDir, { recursive: true, force: true });
  });

  it('refuses a file over the limit (413, standing in for a 50 MB upload) and stores nothing', async () => {
    const scans = testApp.app.get<typeof ReceiptScan>(getModelToken(ReceiptScan));
    const response = await testApp
      .http()
      .post(`/api/receipts/${receipt.id}/scans`)
      .set('Authorization', `Bearer ${admin}`)
      .attach('file', Buffer.concat([tinyPng(), Buffer.alloc(4096)]), 'big.png');
    expect(response.status).toBe(413);
    expect((response.body as ApiErrorBody).message).toContain('larger than the 1 KB limit');
    expect(await scans.count({ where: { receiptId: receipt.id } })).toBe(0);

    const small: ScanView = await attachScan(testApp, admin, receipt.id, tinyJpeg(), 'ok.jpg');
    expect(small.sizeBytes).toBeLessThanOrEqual(1024);
  });
});
