import { getModelToken } from '@nestjs/sequelize';
import type {
  ApiErrorBody,
  ParcelReceiptDetail,
  ParcelReceiptInput,
  ReceiptPage,
} from '@tallyloom/core';
import { AuditEntry } from '../../services/api/src/audit/models/audit-entry.model';
import { BlanketSize } from '../../services/api/src/blanket-sizes/models/blanket-size.model';
import { Campaign } from '../../services/api/src/campaigns/models/campaign.model';
import { ParcelReceipt } from '../../services/api/src/receipts/models/parcel-receipt.model';
import { attachScan, createReceipt, receiptInput } from './fixtures/receipts';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

jest.setTimeout(60_000);

type Built = Awaited<ReturnType<ReturnType<typeof aRegion>['build']>>;

/** JSON columns may come back parsed or as text, depending on the driver. */
const text = (value: unknown) => (typeof value === 'string' ? value : JSON.stringify(value));

function isoDaysFromToday(days: number): string {
  return new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);
}

describe('parcel receipts', () => {
  let testApp: TestApp;
  let receipts: typeof ParcelReceipt;
  let home: Built;
  let away: Built;
  let admin: string;
  let staff: string;
  let auditor: string;
  let lead: string;
  let coordinator: string;
  let grantWriter: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    receipts = testApp.app.get<typeof ParcelReceipt>(getModelToken(ParcelReceipt));
    home = await aRegion()
      .named('Receipt Home')
      .withChapter('Skein Mill', '2024-01-01')
      .withChapter('Purl Ford', '2024-01-01')
      .build(testApp.app);
    away = await aRegion().named('Receipt Away').withChapter('Far Loom').build(testApp.app);
    admin = (await signedIn(testApp, 'network_admin')).token;
    staff = (await signedIn(testApp, 'national_staff')).token;
    auditor = (await signedIn(testApp, 'auditor')).token;
    grantWriter = (await signedIn(testApp, 'grant_writer')).token;
    lead = (await signedIn(testApp, 'chapter_lead', { chapterId: home.chapters[0].id })).token;
    coordinator = (await signedIn(testApp, 'regional_coordinator', { regionId: home.region.id }))
      .token;
  });
  afterAll(() => testApp.close());

  const as = (token: string) => ({
    get: (url: string) => testApp.http().get(url).set('Authorization', `Bearer ${token}`),
    post: (url: string, body: object = {}) =>
      testApp.http().post(url).set('Authorization', `Bearer ${token}`).send(body),
    patch: (url: string, body: object) =>
      testApp.http().patch(url).set('Authorization', `Bearer ${token}`).send(body),
  });
  const countIn = (chapterId: number) => receipts.count({ where: { chapterId } });

  /** Posts a bad receipt; expects the status, a message naming `field`, and nothing stored. */
  async function refused(
    token: string,
    body: object,
    status: number,
    field?: string,
  ): Promise<ApiErrorBody> {
    const chapterId = (body as { chapterId: number }).chapterId;
    const before = await countIn(chapterId);
    const response = await as(token).post('/api/receipts', body);
    expect(response.status).toBe(status);
    const error = response.body as ApiErrorBody;
    if (field) expect(error.fields?.map((f) => f.field)).toContain(field);
    expect(await countIn(chapterId)).toBe(before);
    return error;
  }

  describe('create and read', () => {
    it('creates a receipt, returns it with its totals, and reads it back', async () => {
      const size = await testApp.app
        .get<typeof BlanketSize>(getModelToken(BlanketSize))
        .create({ name: `Test lap ${uniqueSuffix()}`, columns: 5, rows: 6, active: true });
      const created = await createReceipt(
        testApp,
        lead,
        receiptInput(home.chapters[0].id, {
          receivedOn: '2026-02-10',
          panelsAccepted: 31,
          setAside: { offSize: 2, hardCareYarn: 1, soiledOrDamaged: 0, other: 1 },
          setAsideOtherNote: 'Crocheted in the round',
          finishedBlankets: [{ blanketSizeId: size.id, count: 2 }],
          otherItems: 3,
          sender: { name: 'Maren Quenby', email: 'Maren.Quenby@Example.org', address: null },
        }),
      );
      expect(created).toMatchObject({
        chapterId: home.chapters[0].id,
        chapterName: home.chapters[0].name,
        regionId: home.region.id,
        regionName: home.region.name,
        receivedOn: '2026-02-10',
        panelsAccepted: 31,
        setAsideTotal: 4,
        finishedBlankets: [{ blanketSizeId: size.id, name: size.name, count: 2 }],
        finishedBlanketsTotal: 2,
        otherItems: 3,
        sender: { name: 'Maren Quenby', email: 'maren.quenby@example.org', address: null },
        senderErased: false,
        version: 1,
        scans: [],
        warnings: [],
      });
      const read = (await as(staff).get(`/api/receipts/${created.id}`).expect(200))
        .body as ParcelReceiptDetail;
      expect(read).toEqual(created);
    });

    it('refuses a grant writer any receipt (403)', async () => {
      const created = await createReceipt(testApp, admin, receiptInput(home.chapters[0].id));
      await as(grantWriter).get('/api/receipts').expect(403);
      await as(grantWriter).get(`/api/receipts/${created.id}`).expect(403);
    });
  });

  describe('list: filters, sorting, pages and totals', () => {
    let region: Built;
    let made: ParcelReceiptDetail[];

    beforeAll(async () => {
      region = await aRegion()
        .named('Receipt List')
        .withChapter('Aran Row', '2024-01-01')
        .withChapter('Bobble End', '2024-01-01')
        .build(testApp.app);
      const [a, b] = region.chapters.map((c) => c.id);
      const size = await testApp.app
        .get<typeof BlanketSize>(getModelToken(BlanketSize))
        .create({ name: `Test throw ${uniqueSuffix()}`, columns: 6, rows: 7 });
      made = [];
      for (const [chapterId, receivedOn, panelsAccepted, offSize, blankets] of [
        [a, '2025-03-02', 10, 1, 2],
        [a, '2025-03-20', 40, 0, 0],
        [b, '2025-04-01', 25, 2, 0],
        [b, '2025-04-15', 5, 0, 0],
        [a, '2025-05-01', 60, 3, 1],
      ] as const) {
        made.push(
          await createReceipt(
            testApp,
            admin,
            receiptInput(chapterId, {
              receivedOn,
              panelsAccepted,
              otherItems: 1,
              setAside: { offSize, hardCareYarn: 0, soiledOrDamaged: 0, other: 0 },
              finishedBlankets: blankets ? [{ blanketSizeId: size.id, count: blankets }] : [],
            }),
          ),
        );
      }
      await attachScan(testApp, admin, made[2].id);
    });

    const list = (query: string) =>
      as(admin)
        .get(`/api/receipts?regionId=${region.region.id}&${query}`)
        .expect(200)
        .then((r) => r.body as ReceiptPage);

    it('pages by 2 while the totals cover all 5 matching receipts', async () => {
      const first = await list('pageSize=2&sort=panelsAccepted&direction=asc');
      expect(first.total).toBe(5);
      expect(first.items.map((r) => r.panelsAccepted)).toEqual([5, 10]);
      expect(first.totals).toEqual({
        receipts: 5,
        panelsAccepted: 140,
        setAside: 6,
        finishedBlankets: 3,
        otherItems: 5,
      });
      const third = await list('pageSize=2&page=3&sort=panelsAccepted&direction=asc');
      expect(third.items.map((r) => r.panelsAccepted)).toEqual([60]);
      expect(third.totals.panelsAccepted).toBe(140);
    });

    it('filters by dates, chapter and scans; sorts by date and chapter name', async () => {
      const march = await list('from=2025-03-01&to=2025-03-31&sort=receivedOn&direction=asc');
      expect(march.items.map((r) => r.receivedOn)).toEqual(['2025-03-02', '2025-03-20']);
      expect(march.totals).toMatchObject({ receipts: 2, panelsAccepted: 50, finishedBlankets: 2 });

      const chapterB = await list(`chapterId=${region.chapters[1].id}`);
      expect(chapterB.items.map((r) => r.receivedOn)).toEqual(['2025-04-15', '2025-04-01']);

      const withScan = await list('hasScan=true');
      expect(withScan.items.map((r) => r.id)).toEqual([made[2].id]);
      expect(withScan.items[0].scanCount).toBe(1);
      expect((await list('hasScan=false')).total).toBe(4);

      const byName = await list('sort=chapterName&direction=desc');
      expect(byName.items.slice(0, 2).every((r) => r.chapterName.startsWith('Bobble End'))).toBe(
        true,
      );
    });

    it('refuses a page size over 100 and a malformed date', async () => {
      await as(admin).get('/api/receipts?pageSize=101').expect(400);
      const response = await as(admin).get('/api/receipts?from=2025-13-01').expect(400);
      expect((response.body as ApiErrorBody).fields?.[0].field).toBe('from');
    });

    it('shows a regional coordinator only their region, whatever they filter by', async () => {
      const mine = await createReceipt(testApp, admin, receiptInput(home.chapters[1].id));
      const page = (await as(coordinator).get('/api/receipts?pageSize=100').expect(200))
        .body as ReceiptPage;
      expect(page.items.every((r) => r.regionId === home.region.id)).toBe(true);
      expect(page.items.map((r) => r.id)).toContain(mine.id);
      const elsewhere = (
        await as(coordinator).get(`/api/receipts?regionId=${region.region.id}`).expect(200)
      ).body as ReceiptPage;
      expect(elsewhere).toMatchObject({ total: 0, items: [], totals: { receipts: 0 } });
    });
  });

  describe('refused input: a clear 4xx and nothing stored', () => {
    const chapter = () => home.chapters[0].id;
    const body = (overrides: Partial<ParcelReceiptInput>) => receiptInput(chapter(), overrides);

    it('a negative count', async () => {
      const error = await refused(admin, body({ panelsAccepted: -3 }), 400, 'panelsAccepted');
      expect(error.fields?.[0].messages[0]).toBe('panelsAccepted must be 0 or more');
    });

    it('a fractional count', async () => {
      const error = await refused(
        admin,
        body({ setAside: { offSize: 1.5, hardCareYarn: 0, soiledOrDamaged: 0, other: 0 } }),
        400,
        'setAside.offSize',
      );
      expect(error.fields?.[0].messages[0]).toBe('offSize must be a whole number');
    });

    it('an absurd count, above the ceiling', async () => {
      const error = await refused(
        admin,
        body({ panelsAccepted: 10_000_000 }),
        400,
        'panelsAccepted',
      );
      expect(error.fields?.[0].messages[0]).toContain('implausibly large');
      await refused(admin, body({ otherItems: 5_000_000_000 }), 400, 'otherItems');
    });

    it('a date in the future', async () => {
      const error = await refused(
        admin,
        body({ receivedOn: isoDaysFromToday(3) }),
        400,
        'receivedOn',
      );
      expect(error.fields?.[0].messages[0]).toBe('receivedOn must not be in the future.');
    });

    it('a date before the chapter existed', async () => {
      const error = await refused(admin, body({ receivedOn: '2023-12-31' }), 400, 'receivedOn');
      expect(error.fields?.[0].messages[0]).toContain('before');
      expect(error.fields?.[0].messages[0]).toContain('2024-01-01');
    });

    it('a date that is not a date', async () => {
      await refused(admin, body({ receivedOn: '2025-02-30' }), 400, 'receivedOn');
      await refused(admin, body({ receivedOn: '04/01/2026' }), 400, 'receivedOn');
    });

    it('an unknown chapter', async () => {
      const response = await as(admin).post('/api/receipts', receiptInput(4_000_000_000));
      expect(response.status).toBe(400);
      expect((response.body as ApiErrorBody).fields?.[0]).toEqual({
        field: 'chapterId',
        messages: ['No such chapter.'],
      });
    });

    it("a chapter lead's receipt for another chapter (404), or a correction of one", async () => {
      await refused(lead, receiptInput(home.chapters[1].id), 404);
      await refused(lead, receiptInput(away.chapters[0].id), 404);
      const theirs = await createReceipt(testApp, admin, receiptInput(home.chapters[1].id));
      await as(lead)
        .patch(`/api/receipts/${theirs.id}`, { ...receiptInput(home.chapters[0].id), version: 1 })
        .expect(404);
      expect((await receipts.findByPk(theirs.id))?.chapterId).toBe(home.chapters[1].id);
    });

    it('set aside for another reason without saying which', async () => {
      await refused(
        admin,
        body({ setAside: { offSize: 0, hardCareYarn: 0, soiledOrDamaged: 0, other: 2 } }),
        400,
        'setAsideOtherNote',
      );
    });

    it('a bad sender e-mail, an over-long name, unknown or twice-listed blanket sizes', async () => {
      await refused(admin, body({ sender: { email: 'not-an-address' } }), 400, 'sender.email');
      await refused(admin, body({ sender: { name: 'x'.repeat(161) } }), 400, 'sender.name');
      await refused(
        admin,
        body({ finishedBlankets: [{ blanketSizeId: 4_000_000_000, count: 1 }] }),
        400,
        'finishedBlankets.0.blanketSizeId',
      );
      const sizes = testApp.app.get<typeof BlanketSize>(getModelToken(BlanketSize));
      const size = await sizes.create({ name: `Test baby ${uniqueSuffix()}`, columns: 4, rows: 4 });
      const retired = await sizes.create({
        name: `Test retired ${uniqueSuffix()}`,
        columns: 3,
        rows: 3,
        active: false,
      });
      await refused(
        admin,
        body({
          finishedBlankets: [
            { blanketSizeId: size.id, count: 1 },
            { blanketSizeId: size.id, count: 2 },
          ],
        }),
        400,
        'finishedBlankets.1.blanketSizeId',
      );
      await refused(
        admin,
        body({ finishedBlankets: [{ blanketSizeId: retired.id, count: 1 }] }),
        400,
        'finishedBlankets.0.blanketSizeId',
      );
    });

    it('a sample panel of zero or absurd size, or in yards', async () => {
      await refused(
        admin,
        body({ samplePanel: { width: 0, height: 9, unit: 'in' } }),
        400,
        'samplePanel.width',
      );
      await refused(
        admin,
        body({ samplePanel: { width: 7, height: 101, unit: 'in' } }),
        400,
        'samplePanel.height',
      );
      await refused(
        admin,
        { ...body({}), samplePanel: { width: 7, height: 9, unit: 'yd' } },
        400,
        'samplePanel.unit',
      );
    });
  });

  describe('campaign codes', () => {
    it('credits a code running on the day, in any case; keeps an unknown one uncredited with a warning', async () => {
      const code = `T${uniqueSuffix()}`.slice(0, 12);
      const campaign = await testApp.app.get<typeof Campaign>(getModelToken(Campaign)).create({
        code,
        name: `Test drive ${code}`,
        goalPanels: 500,
        startsOn: '2025-11-01',
        endsOn: '2026-02-28',
        regionId: null,
      });
      const credited = await createReceipt(
        testApp,
        admin,
        receiptInput(home.chapters[0].id, { campaignCode: code.toLowerCase() }),
      );
      expect(credited).toMatchObject({ campaignId: campaign.id, credited: true, warnings: [] });

      const before = await countIn(home.chapters[0].id);
      const unknown = await createReceipt(
        testApp,
        admin,
        receiptInput(home.chapters[0].id, { campaignCode: 'XYZ', receivedOn: '2026-01-04' }),
      );
      expect(await countIn(home.chapters[0].id)).toBe(before + 1);
      expect(unknown).toMatchObject({ campaignId: null, campaignCode: 'XYZ', credited: false });
      expect(unknown.warnings).toEqual([
        'Code XYZ matches no campaign running on 2026-01-04; saved as uncredited.',
      ]);

      const afterTheEnd = await createReceipt(
        testApp,
        admin,
        receiptInput(home.chapters[0].id, { campaignCode: code, receivedOn: '2026-03-01' }),
      );
      expect(afterTheEnd).toMatchObject({ campaignId: null, credited: false });
      expect(afterTheEnd.warnings).toHaveLength(1);
    });

    it('credits a regional campaign only to chapters of that region', async () => {
      const code = `R${uniqueSuffix()}`.slice(0, 12);
      await testApp.app.get<typeof Campaign>(getModelToken(Campaign)).create({
        code,
        name: `Regional drive ${code}`,
        goalPanels: 200,
        startsOn: '2025-11-01',
        endsOn: '2026-02-28',
        regionId: home.region.id,
      });
      const here = await createReceipt(
        testApp,
        admin,
        receiptInput(home.chapters[0].id, { campaignCode: code }),
      );
      const there = await createReceipt(
        testApp,
        admin,
        receiptInput(away.chapters[0].id, { campaignCode: code }),
      );
      expect(here.credited).toBe(true);
      expect(there.credited).toBe(false);
    });
  });

  describe('sample panel', () => {
    it('checks a panel measured in cm against the tolerance', async () => {
      const within = await createReceipt(
        testApp,
        admin,
        receiptInput(home.chapters[0].id, {
          samplePanel: { width: 17.78, height: 22.86, unit: 'cm' },
        }),
      );
      expect(within.samplePanel).toEqual({
        width: 17.78,
        height: 22.86,
        unit: 'cm',
        withinTolerance: true,
        messages: [],
      });
      const out = await createReceipt(
        testApp,
        admin,
        receiptInput(home.chapters[0].id, { samplePanel: { width: 20, height: 25, unit: 'cm' } }),
      );
      expect(out.samplePanel?.withinTolerance).toBe(false);
      // 20 cm = 7.87 in (0.87 over 7 in); 25 cm = 9.84 in (0.84 over 9 in).
      expect(out.samplePanel?.messages).toEqual([
        expect.stringContaining('20 cm (7.87 in) is 0.87 in over the 7 in target'),
        expect.stringContaining('25 cm (9.84 in) is 0.84 in over the 9 in target'),
      ]);
    });
  });

  describe("senders' personal data", () => {
    const sender = {
      name: 'Odile Penhallow',
      email: 'odile.p@example.com',
      address: '4 Wool Lane',
    };

    it('is hidden from a regional coordinator, shown to staff, auditors and the chapter lead', async () => {
      const created = await createReceipt(
        testApp,
        lead,
        receiptInput(home.chapters[0].id, { sender }),
      );
      for (const token of [staff, auditor, lead, admin]) {
        const view = (await as(token).get(`/api/receipts/${created.id}`).expect(200))
          .body as ParcelReceiptDetail;
        expect(view.sender).toEqual(sender);
      }
      const hidden = await as(coordinator).get(`/api/receipts/${created.id}`).expect(200);
      expect((hidden.body as ParcelReceiptDetail).sender).toBeNull();
      expect(JSON.stringify(hidden.body)).not.toContain('Penhallow');
      const listed = await as(coordinator)
        .get(`/api/receipts?chapterId=${home.chapters[0].id}&pageSize=100`)
        .expect(200);
      expect(JSON.stringify(listed.body)).not.toContain('Penhallow');
    });

    it('is erased by an admin: counts stay, the details leave the row and every audit entry', async () => {
      const created = await createReceipt(
        testApp,
        lead,
        receiptInput(home.chapters[0].id, { sender, panelsAccepted: 42 }),
      );
      await as(lead)
        .patch(`/api/receipts/${created.id}`, {
          ...receiptInput(home.chapters[0].id, {
            panelsAccepted: 43,
            sender: { ...sender, address: '5 Wool Lane, Fernwick' },
          }),
          version: 1,
        })
        .expect(200);
      await as(lead).post(`/api/receipts/${created.id}/erase-sender`).expect(403);

      const erased = (await as(admin).post(`/api/receipts/${created.id}/erase-sender`).expect(200))
        .body as ParcelReceiptDetail;
      expect(erased).toMatchObject({ sender: null, senderErased: true, panelsAccepted: 43 });

      const row = await receipts.findByPk(created.id);
      expect(row).toMatchObject({
        senderName: null,
        senderEmail: null,
        senderAddress: null,
        panelsAccepted: 43,
        setAsideOffSize: 1,
      });
      expect(row?.senderErasedAt).toBeInstanceOf(Date);

      const entries = await testApp.app
        .get<typeof AuditEntry>(getModelToken(AuditEntry))
        .findAll({ where: { entityType: 'parcel_receipt', entityId: String(created.id) } });
      expect(entries.map((e) => e.action)).toEqual([
        'receipt.created',
        'receipt.updated',
        'receipt.sender_erased',
      ]);
      const everything = entries.map((e) => text(e.beforeJson) + text(e.afterJson)).join(' ');
      for (const detail of ['Odile', 'Penhallow', 'odile.p@example.com', 'Wool Lane']) {
        expect(everything).not.toContain(detail);
      }
      expect(text(entries[2].afterJson)).toContain('erasedFields');

      const history = await as(auditor).get(`/api/receipts/${created.id}/history`).expect(200);
      expect((history.body as Array<{ action: string }>).map((e) => e.action)).toEqual([
        'receipt.created',
        'receipt.updated',
        'receipt.sender_erased',
      ]);
      expect(JSON.stringify(history.body)).not.toContain('Penhallow');

      // Once erased, the details cannot come back through a correction.
      const again = await as(admin).patch(`/api/receipts/${created.id}`, {
        ...receiptInput(home.chapters[0].id, { sender }),
        version: erased.version,
      });
      expect(again.status).toBe(400);
    });
  });

  describe('corrections', () => {
    it('increments the version; a stale version gets 409 with the current values', async () => {
      const created = await createReceipt(testApp, lead, receiptInput(home.chapters[0].id));
      const first = await as(lead)
        .patch(`/api/receipts/${created.id}`, {
          ...receiptInput(home.chapters[0].id, { panelsAccepted: 30 }),
          version: 1,
        })
        .expect(200);
      expect(first.body).toMatchObject({ version: 2, panelsAccepted: 30 });

      const stale = await as(staff).patch(`/api/receipts/${created.id}`, {
        ...receiptInput(home.chapters[0].id, { panelsAccepted: 99 }),
        version: 1,
      });
      expect(stale.status).toBe(409);
      expect(stale.body).toMatchObject({
        statusCode: 409,
        current: { id: created.id, version: 2, panelsAccepted: 30 },
      });
      expect((await receipts.findByPk(created.id))?.panelsAccepted).toBe(30);
    });

    it('applies the same validation as creation, and needs a version', async () => {
      const created = await createReceipt(testApp, admin, receiptInput(home.chapters[0].id));
      await as(admin)
        .patch(`/api/receipts/${created.id}`, {
          ...receiptInput(home.chapters[0].id, { panelsAccepted: -1 }),
          version: 1,
        })
        .expect(400);
      const missing = await as(admin)
        .patch(`/api/receipts/${created.id}`, receiptInput(home.chapters[0].id))
        .expect(400);
      expect((missing.body as ApiErrorBody).fields?.map((f) => f.field)).toEqual(['version']);
      expect((await receipts.findByPk(created.id))?.version).toBe(1);
    });

    it('keeps the history of a receipt in scope only', async () => {
      const theirs = await createReceipt(testApp, admin, receiptInput(away.chapters[0].id));
      await as(lead).get(`/api/receipts/${theirs.id}/history`).expect(404);
      await as(coordinator).get(`/api/receipts/${theirs.id}/history`).expect(404);
      const history = await as(admin).get(`/api/receipts/${theirs.id}/history`).expect(200);
      expect(history.body).toEqual([
        expect.objectContaining({
          action: 'receipt.created',
          before: null,
          after: expect.objectContaining({ sender: 'absent', panelsAccepted: 24 }) as unknown,
        }),
      ]);
    });
  });
});
