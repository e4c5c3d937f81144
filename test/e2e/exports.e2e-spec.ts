import { getModelToken } from '@nestjs/sequelize';
import type { ApiErrorBody, ExportView, ParcelReceiptView, ReceiptPage } from '@tallyloom/core';
import { parse } from 'csv-parse/sync';
import { execFileSync } from 'node:child_process';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import * as XLSX from 'xlsx';
import { ExportRecord } from '../../services/api/src/exports/models/export-record.model';
import { ExportCleanup } from '../../services/api/src/exports/export-cleanup.service';
import { createReceipt, receiptInput } from './fixtures/receipts';
import { libreOfficeCsv } from './support/export-downloads';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

jest.setTimeout(180_000);

type Built = Awaited<ReturnType<ReturnType<typeof aRegion>['build']>>;

describe('table exports', () => {
  let testApp: TestApp;
  let sequelize: Sequelize;
  let home: Built;
  let away: Built;
  let staff: string;
  let coordinator: string;
  let otherCoordinator: string;
  let grantWriter: string;
  let dir: string;
  const tag = uniqueSuffix();

  beforeAll(async () => {
    testApp = await startTestApp();
    sequelize = testApp.app.get<typeof ExportRecord>(getModelToken(ExportRecord))
      .sequelize as Sequelize;
    dir = await mkdtemp(join(tmpdir(), 'exports-e2e-'));
    home = await aRegion()
      .named(`Export Home ${tag}`)
      .withChapter(`Skein Mill ${tag}`)
      .withChapter(`Purl Ford ${tag}`)
      .build(testApp.app);
    away = await aRegion()
      .named(`Export Away ${tag}`)
      .withChapter(`Far Loom ${tag}`)
      .build(testApp.app);
    staff = (await signedIn(testApp, 'national_staff')).token;
    grantWriter = (await signedIn(testApp, 'grant_writer')).token;
    coordinator = (await signedIn(testApp, 'regional_coordinator', { regionId: home.region.id }))
      .token;
    otherCoordinator = (
      await signedIn(testApp, 'regional_coordinator', { regionId: away.region.id })
    ).token;

    const notes = [
      'plain note',
      'comma, "quoted" and\na second line',
      '=HYPERLINK("http://example.invalid","click")',
      '+1+1',
      '-2+3',
      '@SUM(1)',
      '\ttabbed',
    ];
    for (const [index, note] of notes.entries()) {
      await createReceipt(
        testApp,
        staff,
        receiptInput(home.chapters[index % 2].id, {
          receivedOn: `2026-01-${String(10 + index).padStart(2, '0')}`,
          panelsAccepted: 10 + index * 7,
          setAside: { offSize: index, hardCareYarn: 1, soiledOrDamaged: 0, other: index % 2 },
          setAsideOtherNote: index % 2 ? 'felted' : null,
          otherItems: index,
          notes: note,
          sender:
            index === 0 ? { name: `Maker ${tag}`, email: null, address: '1 Loom Lane' } : null,
        }),
      );
    }
    await createReceipt(testApp, staff, receiptInput(away.chapters[0].id, { notes: 'away' }));
  });
  afterAll(async () => {
    await testApp.close();
    await rm(dir, { recursive: true, force: true });
  });

  const as = (token: string) => ({
    get: (url: string) => testApp.http().get(url).set('Authorization', `Bearer ${token}`),
    post: (url: string, body: object) =>
      testApp.http().post(url).set('Authorization', `Bearer ${token}`).send(body),
  });

  async function exportDone(token: string, body: object): Promise<ExportView> {
    const response = await as(token).post('/api/exports', body);
    expect(response.status).toBe(202);
    let view = response.body as ExportView;
    expect(view.state === 'queued' || view.state === 'running' || view.state === 'done').toBe(true);
    // Polls like the web app does; the job runs in-process.
    for (let i = 0; i < 600 && (view.state === 'queued' || view.state === 'running'); i += 1) {
      await new Promise((resolve) => setTimeout(resolve, 100));
      view = (await as(token).get(`/api/exports/${view.id}`)).body as ExportView;
    }
    expect(view.state).toBe('done');
    return view;
  }

  async function download(view: ExportView): Promise<Buffer> {
    const response = await testApp
      .http()
      .get(view.downloadUrl!)
      .buffer(true)
      .parse((res, callback) => {
        const chunks: Buffer[] = [];
        res.on('data', (chunk: Buffer) => chunks.push(chunk));
        res.on('end', () => callback(null, Buffer.concat(chunks)));
      });
    expect(response.status).toBe(200);
    expect(response.headers['content-disposition']).toBe(`attachment; filename="${view.fileName}"`);
    return response.body as Buffer;
  }

  /** Every page of the list endpoint with the same filters: what the screen shows. */
  async function listed(token: string, filters: Record<string, string | number>) {
    const items: ParcelReceiptView[] = [];
    for (let page = 1; ; page += 1) {
      const query = new URLSearchParams({
        ...filters,
        page: String(page),
        pageSize: '100',
      });
      const body = (await as(token).get(`/api/receipts?${query.toString()}`)).body as ReceiptPage;
      items.push(...body.items);
      if (items.length >= body.total) return items;
    }
  }

  async function sqlSum(column: string, regionId: number): Promise<number> {
    const [row] = await sequelize.query<{ total: string }>(
      `SELECT COALESCE(SUM(r.${column}), 0) AS total FROM parcel_receipts r
         JOIN chapters c ON c.id = r.chapter_id WHERE c.region_id = ?`,
      { replacements: [regionId], type: QueryTypes.SELECT },
    );
    return Number(row.total);
  }

  it('exports filtered receipts to xlsx as on screen, with totals, frozen header and properties', async () => {
    const filters = { regionId: home.region.id, sort: 'panelsAccepted', direction: 'asc' } as const;
    const view = await exportDone(staff, { table: 'receipts', format: 'xlsx', filters });
    expect(view).toMatchObject({ rows: 7, sheets: 1, progress: 100, table: 'receipts' });
    expect(view.description).toContain(home.region.name);
    const bytes = await download(view);
    const file = join(dir, view.fileName);
    await writeFile(file, bytes);

    // SheetJS, independent of the writer.
    const book = XLSX.read(bytes, {
      type: 'buffer',
      cellDates: true,
      cellStyles: true,
    });
    expect(book.SheetNames).toEqual(['Parcel receipts']);
    expect(book.Props?.Author).toBe('Tallyloom');
    expect(book.Props?.Title).toBe('Parcel receipts');
    expect(book.Props?.CreatedDate).toBeInstanceOf(Date);
    const sheet = book.Sheets['Parcel receipts'];
    const rows = XLSX.utils.sheet_to_json<Record<string, unknown>>(sheet, { raw: true });
    const totals = rows.pop()!;
    const expected = await listed(staff, filters);
    expect(rows.map((row) => row['Receipt no.'])).toEqual(expected.map((r) => r.id));
    rows.forEach((row, index) => {
      const r = expected[index];
      expect((row['Received on'] as Date).toISOString().slice(0, 10)).toBe(r.receivedOn);
      expect(row).toMatchObject({
        Region: r.regionName,
        Chapter: r.chapterName,
        'Panels accepted (panels)': r.panelsAccepted,
        'Set aside: off-size (panels)': r.setAside.offSize,
        'Set aside: hard-care yarn (panels)': r.setAside.hardCareYarn,
        'Set aside: other (panels)': r.setAside.other,
        'Set aside in all (panels)': r.setAsideTotal,
        'Finished blankets (blankets)': r.finishedBlanketsTotal,
        'Other items (items)': r.otherItems,
        'Scans (files)': r.scanCount,
        'Credited to a campaign': r.credited ? 'yes' : 'no',
        // xlsx cells are typed: text stays text, a leading '=' included (no formula made).
        Notes: r.notes,
      });
      expect(row['Sender name'] ?? null).toBe(r.sender?.name ?? null);
    });
    // The totals row: formulas with cached results equal to a direct SQL sum.
    expect(totals['Receipt no.']).toBe('Total');
    expect(totals['Panels accepted (panels)']).toBe(
      await sqlSum('panels_accepted', home.region.id),
    );
    expect(totals['Other items (items)']).toBe(await sqlSum('other_items', home.region.id));
    const range = XLSX.utils.decode_range(sheet['!ref']!);
    const totalsRow = range.e.r + 1;
    const headers = XLSX.utils.sheet_to_json<string[]>(sheet, { header: 1 })[0];
    const letter = (name: string) => XLSX.utils.encode_col(headers.indexOf(name));
    const panels = letter('Panels accepted (panels)');
    expect((sheet[`${panels}${totalsRow}`] as XLSX.CellObject).f).toBe(
      `SUBTOTAL(109,${panels}2:${panels}${totalsRow - 1})`,
    );
    expect(sheet['!autofilter']?.ref).toBe(`A1:${letter('Notes')}${totalsRow - 1}`);
    expect(sheet['!cols']?.[3]?.wch ?? sheet['!cols']?.[3]?.width).toBeGreaterThan(10);
    expect((sheet.B2 as XLSX.CellObject).z).toBe('yyyy-mm-dd');
    expect((sheet[`${panels}2`] as XLSX.CellObject).z).toBe('#,##0');
    // The frozen header is a pane in the sheet's XML (SheetJS does not read panes).
    const sheetXml = execFileSync('unzip', ['-p', file, 'xl/worksheets/sheet1.xml']).toString();
    expect(sheetXml).toMatch(/<pane [^>]*ySplit="1"[^>]*state="frozen"/);

    // LibreOffice opens it and recalculates the formulas: the totals it prints equal SQL's.
    const printed = await libreOfficeCsv(file, dir);
    const header = printed[0];
    const printedTotals = printed.at(-1)!;
    expect(printedTotals[0]).toBe('Total');
    const printedPanels = printedTotals[header.indexOf('Panels accepted (panels)')];
    expect(Number(printedPanels.replace(/,/g, ''))).toBe(
      await sqlSum('panels_accepted', home.region.id),
    );
  });

  it("exports a coordinator's receipts to CSV: their region only, no senders, neutralised cells", async () => {
    const view = await exportDone(coordinator, { table: 'receipts', format: 'csv', filters: {} });
    const bytes = await download(view);
    // No byte-order mark unless asked; records end with CRLF.
    expect(bytes.subarray(0, 3).equals(Buffer.from([0xef, 0xbb, 0xbf]))).toBe(false);
    const text = bytes.toString('utf8');
    expect(text.endsWith('\r\n')).toBe(true);
    const records = parse(text, { columns: true }) as Array<Record<string, string>>;
    const expected = await listed(coordinator, {});
    expect(records.map((r) => Number(r['Receipt no.']))).toEqual(expected.map((r) => r.id));
    expect(new Set(records.map((r) => r.Region))).toEqual(new Set([home.region.name]));
    expect(Object.keys(records[0]).filter((name) => /sender/i.test(name))).toEqual([]);
    expect(text).not.toContain(`Maker ${tag}`);
    records.forEach((record, index) => {
      const r = expected[index];
      expect(Number(record['Panels accepted (panels)'])).toBe(r.panelsAccepted);
      expect(record['Received on']).toBe(r.receivedOn);
      // Source: OWASP "CSV Injection": text starting with =, +, -, @, tab or CR gets a quote.
      const note = r.notes ?? '';
      expect(record.Notes).toBe(/^[=+\-@\t\r]/.test(note) ? `'${note}` : note);
    });
    expect(records.map((r) => r.Notes)).toContain('comma, "quoted" and\na second line');
  });

  it('begins the CSV with a BOM when asked', async () => {
    const view = await exportDone(coordinator, {
      table: 'receipts',
      format: 'csv',
      bom: true,
      filters: { chapterId: home.chapters[0].id },
    });
    const bytes = await download(view);
    expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    const records = parse(bytes, { bom: true, columns: true }) as Array<Record<string, string>>;
    expect(records).toHaveLength(4);
    expect(new Set(records.map((r) => r.Chapter))).toEqual(new Set([home.chapters[0].name]));
  });

  it('names the field of bad input, hides regions out of scope, refuses tables a role may not read', async () => {
    const refused = async (token: string, body: object, status: number, field?: string) => {
      const response = await as(token).post('/api/exports', body);
      expect(response.status).toBe(status);
      if (field)
        expect((response.body as ApiErrorBody).fields?.map((f) => f.field)).toContain(field);
    };
    await refused(staff, { table: 'parcels', format: 'xlsx', filters: {} }, 400, 'table');
    await refused(staff, { table: 'receipts', format: 'ods', filters: {} }, 400, 'format');
    await refused(
      staff,
      { table: 'receipts', format: 'csv', filters: { from: '2026-13-01' } },
      400,
      'filters.from',
    );
    await refused(
      staff,
      { table: 'receipts', format: 'csv', filters: { colour: 'red' } },
      400,
      'filters.colour',
    );
    await refused(staff, { table: 'receipts', format: 'csv' }, 400, 'filters');
    await refused(
      coordinator,
      { table: 'receipts', format: 'csv', filters: { regionId: away.region.id } },
      404,
    );
    await refused(grantWriter, { table: 'receipts', format: 'csv', filters: {} }, 403);
    await refused(grantWriter, { table: 'tallies', format: 'csv', filters: {} }, 403);
  });

  it("lists one's own exports and hides everyone else's", async () => {
    const mine = await exportDone(coordinator, { table: 'receipts', format: 'csv', filters: {} });
    const list = (await as(coordinator).get('/api/exports?pageSize=100')).body as {
      items: ExportView[];
    };
    expect(list.items[0].id).toBe(mine.id);
    expect((await as(otherCoordinator).get(`/api/exports/${mine.id}`)).status).toBe(404);
    const theirs = (await as(otherCoordinator).get('/api/exports?pageSize=100')).body as {
      items: ExportView[];
    };
    expect(theirs.items.map((item) => item.id)).not.toContain(mine.id);
    // The audit log says who exported what, with which filters.
    const [entry] = await sequelize.query<{ action: string; after_json: unknown }>(
      "SELECT action, after_json FROM audit_entries WHERE entity_type = 'export' AND entity_id = ?",
      { replacements: [mine.id], type: QueryTypes.SELECT },
    );
    expect(entry.action).toBe('export.requested');
    expect(JSON.stringify(entry.after_json)).toContain('receipts');
  });

  it('serves the file only with a valid signature and before expiry; cleanup removes it', async () => {
    const view = await exportDone(coordinator, { table: 'receipts', format: 'csv', filters: {} });
    const url = new URL(view.downloadUrl!, 'http://x');
    const signature = url.searchParams.get('signature')!;
    const wrong = `${signature.slice(0, -1)}${signature.endsWith('0') ? '1' : '0'}`;
    expect(
      (
        await testApp
          .http()
          .get(`${url.pathname}?expires=${url.searchParams.get('expires')}&signature=${wrong}`)
      ).status,
    ).toBe(404);
    expect((await testApp.http().get(url.pathname)).status).toBe(404);
    // A link whose time has passed (signed by the server for a past time) is gone.
    await sequelize.query('UPDATE exports SET expires_at = ? WHERE id = ?', {
      replacements: [new Date(Date.now() - 60_000), view.id],
    });
    const past = (await as(coordinator).get(`/api/exports/${view.id}`)).body as ExportView;
    expect((await testApp.http().get(past.downloadUrl!)).status).toBe(410);
    // The cleanup job removes the file and marks the row expired.
    const { removed } = await testApp.app.get(ExportCleanup).removeExpired();
    expect(removed).toBeGreaterThanOrEqual(1);
    const after = (await as(coordinator).get(`/api/exports/${view.id}`)).body as ExportView;
    expect(after).toMatchObject({ state: 'expired', downloadUrl: null });
    expect((await testApp.http().get(view.downloadUrl!)).status).toBe(410);
    const [row] = await sequelize.query<{ file_key: string | null }>(
      'SELECT file_key FROM exports WHERE id = ?',
      { replacements: [view.id], type: QueryTypes.SELECT },
    );
    expect(row.file_key).toBeNull();
  });

  it('validates the impact pack request like the dashboards do', async () => {
    const post = (token: string, body: object) => as(token).post('/api/exports/impact-pack', body);
    const bad = await post(grantWriter, { scope: 'region', period: 'FY2026' });
    expect(bad.status).toBe(400);
    expect((bad.body as ApiErrorBody).fields?.map((f) => f.field)).toContain('scopeId');
    const badPeriod = await post(grantWriter, {
      scope: 'network',
      periodKind: 'month',
      period: '2026-13',
    });
    expect(badPeriod.status).toBe(400);
    expect((badPeriod.body as ApiErrorBody).fields?.map((f) => f.field)).toContain('period');
    expect((await post(grantWriter, { scope: 'region', scopeId: 999_999_999 })).status).toBe(404);
    expect((await post(coordinator, { scope: 'network' })).status).toBe(403);
    const queued = await post(grantWriter, {
      scope: 'region',
      scopeId: home.region.id,
      period: '2026-01',
    });
    expect(queued.status).toBe(202);
    expect((queued.body as ExportView).kind).toBe('impact-pack');
  });
});
