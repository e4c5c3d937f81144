import { getModelToken } from '@nestjs/sequelize';
import type { ApiErrorBody, ChapterView, RegionView } from '@tallyloom/core';
import { Op } from 'sequelize';
import { Chapter } from '../../services/api/src/chapters/models/chapter.model';
import { Region } from '../../services/api/src/regions/models/region.model';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { aRequestId, auditedBy, fieldsNamed } from './support/setup-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

jest.setTimeout(30_000);

describe('network set-up: regions and chapters', () => {
  let testApp: TestApp;
  let regions: typeof Region;
  let chapters: typeof Chapter;
  let admin: string;
  let adminId: number;
  let staff: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    regions = testApp.app.get<typeof Region>(getModelToken(Region));
    chapters = testApp.app.get<typeof Chapter>(getModelToken(Chapter));
    const built = await signedIn(testApp, 'network_admin');
    admin = `Bearer ${built.token}`;
    adminId = built.user.id;
    staff = `Bearer ${(await signedIn(testApp, 'national_staff')).token}`;
  });
  afterAll(() => testApp.close());

  const send = (
    method: 'post' | 'patch',
    url: string,
    body: object,
    auth = admin,
    requestId = aRequestId(method),
  ) => {
    const http = testApp.http();
    return (method === 'post' ? http.post(url) : http.patch(url))
      .set('Authorization', auth)
      .set('X-Request-Id', requestId)
      .send(body);
  };
  const aCode = () => uniqueSuffix().slice(-8);

  describe('regions', () => {
    it('creates a region, trimming and upper-casing its code, and audits it', async () => {
      const name = `Heatherfield ${uniqueSuffix()}`;
      const code = aCode();
      const requestId = aRequestId('region-create');
      const response = await send(
        'post',
        '/api/regions',
        { name: `  ${name} `, code: ` ${code.toLowerCase()} ` },
        admin,
        requestId,
      );
      expect(response.status).toBe(201);
      const region = response.body as RegionView;
      expect(region).toEqual({ id: region.id, name, code, chapterCount: 0 });
      expect(await regions.findByPk(region.id)).toMatchObject({ name, code });

      expect(await auditedBy(testApp.app, requestId)).toEqual([
        {
          action: 'region.created',
          entityType: 'region',
          entityId: String(region.id),
          actorUserId: adminId,
          before: null,
          after: { name, code },
        },
      ]);
    });

    it.each([
      ['name', { name: undefined }],
      ['name', { name: 'N'.repeat(81) }],
      ['name', { name: '   ' }],
      ['code', { code: undefined }],
      ['code', { code: 'TOOLONG12' }],
      ['code', { code: 'A-1' }],
      ['code', { code: '' }],
      ['code', { code: 12 }],
    ])('refuses a bad %s with 400 naming it, and stores nothing (%j)', async (field, override) => {
      // A unique name and code, so "nothing stored" cannot be confused by other suites' rows.
      const name = `Fine ${uniqueSuffix()}`;
      const code = aCode();
      const requestId = aRequestId('region-bad');
      const response = await send(
        'post',
        '/api/regions',
        { name, code, ...override },
        admin,
        requestId,
      );
      expect(response.status).toBe(400);
      expect(fieldsNamed(response.body)).toEqual([field]);
      expect(await regions.count({ where: { [Op.or]: [{ name }, { code }] } })).toBe(0);
      expect(await auditedBy(testApp.app, requestId)).toEqual([]);
    });

    it('refuses a name or code already in use (409 naming the field), whatever the case', async () => {
      const { region } = await aRegion().build(testApp.app);

      const freshCode = aCode();
      const sameName = await send('post', '/api/regions', {
        name: region.name.toLowerCase(),
        code: freshCode,
      });
      expect(sameName.status).toBe(409);
      expect(fieldsNamed(sameName.body)).toEqual(['name']);
      expect((sameName.body as ApiErrorBody).message).toBe('Another region already has this name.');
      expect(await regions.count({ where: { code: freshCode } })).toBe(0);

      const freshName = `Other ${uniqueSuffix()}`;
      const sameCode = await send('post', '/api/regions', { name: freshName, code: region.code });
      expect(sameCode.status).toBe(409);
      expect(fieldsNamed(sameCode.body)).toEqual(['code']);
      expect(await regions.count({ where: { name: freshName } })).toBe(0);
    });

    it('answers 409, never 500, when one code is sent three times at once', async () => {
      // A double-clicked "Save": the service's check passes for all three; the index decides.
      const code = aCode();
      const responses = await Promise.all(
        [1, 2, 3].map((n) =>
          send('post', '/api/regions', { name: `Race ${n} ${uniqueSuffix()}`, code }),
        ),
      );
      expect(responses.map((r) => r.status).sort((a, b) => a - b)).toEqual([201, 409, 409]);
      for (const refused of responses.filter((r) => r.status === 409)) {
        expect(fieldsNamed(refused.body)).toEqual(['code']);
      }
      expect(await regions.count({ where: { code } })).toBe(1);
    });

    it('renames a region with PATCH, auditing before and after; other fields stay', async () => {
      const { region } = await aRegion().build(testApp.app);
      const name = `Renamed ${uniqueSuffix()}`;
      const requestId = aRequestId('region-rename');
      const response = await send('patch', `/api/regions/${region.id}`, { name }, admin, requestId);
      expect(response.status).toBe(200);
      expect(response.body as RegionView).toMatchObject({ id: region.id, name, code: region.code });

      const [entry] = await auditedBy(testApp.app, requestId);
      expect(entry).toMatchObject({
        action: 'region.updated',
        entityType: 'region',
        entityId: String(region.id),
        before: { name: region.name, code: region.code },
        after: { name, code: region.code },
      });
    });

    it("refuses a PATCH to another region's code (409) or to null (400), changing nothing", async () => {
      const { region } = await aRegion().build(testApp.app);
      const { region: other } = await aRegion().build(testApp.app);

      const taken = await send('patch', `/api/regions/${region.id}`, { code: other.code });
      expect(taken.status).toBe(409);
      expect(fieldsNamed(taken.body)).toEqual(['code']);

      const cleared = await send('patch', `/api/regions/${region.id}`, { name: null });
      expect(cleared.status).toBe(400);
      expect(fieldsNamed(cleared.body)).toEqual(['name']);

      expect(await regions.findByPk(region.id)).toMatchObject({
        name: region.name,
        code: region.code,
      });
    });

    it('answers 404 for a PATCH to an unknown region', async () => {
      const response = await send('patch', '/api/regions/999999999', { name: 'Nowhere' });
      expect(response.status).toBe(404);
      expect((response.body as ApiErrorBody).message).toBe('No such region.');
    });

    it('refuses national staff (403) and stores nothing', async () => {
      const { region } = await aRegion().build(testApp.app);
      const name = `Staff Made ${uniqueSuffix()}`;
      const created = await send('post', '/api/regions', { name, code: aCode() }, staff);
      expect(created.status).toBe(403);
      expect(await regions.count({ where: { name } })).toBe(0);

      const patched = await send('patch', `/api/regions/${region.id}`, { name }, staff);
      expect(patched.status).toBe(403);
      expect((await regions.findByPk(region.id))?.name).toBe(region.name);
    });
  });

  describe('chapters', () => {
    let home: Awaited<ReturnType<ReturnType<typeof aRegion>['build']>>;
    beforeAll(async () => {
      home = await aRegion().named('Chapter Home').withChapter('Spindle Cross').build(testApp.app);
    });

    const inHome = () => chapters.count({ where: { regionId: home.region.id } });
    const aChapter = (overrides: object = {}) => ({
      name: `Bobbin Hill ${uniqueSuffix()}`,
      regionId: home.region.id,
      reportingDueDay: 12,
      activeFrom: '2025-03-01',
      ...overrides,
    });

    it('creates a chapter in a region, open-ended, and audits it', async () => {
      const body = aChapter();
      const requestId = aRequestId('chapter-create');
      const response = await send('post', '/api/chapters', body, admin, requestId);
      expect(response.status).toBe(201);
      const chapter = response.body as ChapterView;
      expect(chapter).toEqual({
        id: chapter.id,
        name: body.name,
        regionId: home.region.id,
        regionName: home.region.name,
        reportingDueDay: 12,
        activeFrom: '2025-03-01',
        activeTo: null,
      });
      expect(await auditedBy(testApp.app, requestId)).toEqual([
        expect.objectContaining({
          action: 'chapter.created',
          entityType: 'chapter',
          entityId: String(chapter.id),
          after: {
            name: body.name,
            regionId: home.region.id,
            reportingDueDay: 12,
            activeFrom: '2025-03-01',
            activeTo: null,
          },
        }),
      ]);
    });

    it.each([
      ['regionId', { regionId: 999999999 }, 'No such region.'],
      [
        'regionId',
        { regionId: 'north' },
        'regionId must be a whole number from 1 to 4,294,967,295',
      ],
      [
        'reportingDueDay',
        { reportingDueDay: 0 },
        'reportingDueDay must be a whole number from 1 to 28',
      ],
      [
        'reportingDueDay',
        { reportingDueDay: 29 },
        'reportingDueDay must be a whole number from 1 to 28',
      ],
      [
        'reportingDueDay',
        { reportingDueDay: 10.5 },
        'reportingDueDay must be a whole number from 1 to 28',
      ],
      [
        'activeFrom',
        { activeFrom: '2025-02-30' },
        'activeFrom must be a date written as YYYY-MM-DD',
      ],
      [
        'activeFrom',
        { activeFrom: '03/01/2025' },
        'activeFrom must be a date written as YYYY-MM-DD',
      ],
      [
        'activeFrom',
        { activeFrom: '2025-03-01T00:00:00Z' },
        'activeFrom must be a date written as YYYY-MM-DD',
      ],
      [
        'activeTo',
        { activeTo: '2025-02-28' },
        'activeTo must be on or after activeFrom (2025-03-01).',
      ],
      ['activeTo', { activeTo: 'soon' }, 'activeTo must be a date written as YYYY-MM-DD'],
      ['name', { name: 'X'.repeat(81) }, 'name must be at most 80 characters'],
    ])(
      'refuses a bad %s with 400 naming it, and stores nothing (%j)',
      async (field, overrides, message) => {
        // The home region belongs to this file, whose tests run one after another.
        const before = await inHome();
        const requestId = aRequestId('chapter-bad');
        const response = await send('post', '/api/chapters', aChapter(overrides), admin, requestId);
        expect(response.status).toBe(400);
        expect((response.body as ApiErrorBody).fields).toEqual([{ field, messages: [message] }]);
        expect(await inHome()).toBe(before);
        expect(await auditedBy(testApp.app, requestId)).toEqual([]);
      },
    );

    it('accepts a closing day equal to the opening day', async () => {
      const response = await send('post', '/api/chapters', aChapter({ activeTo: '2025-03-01' }));
      expect(response.status).toBe(201);
      expect((response.body as ChapterView).activeTo).toBe('2025-03-01');
    });

    it('refuses a name already in use (409 name), whatever the case', async () => {
      const before = await inHome();
      const response = await send(
        'post',
        '/api/chapters',
        aChapter({ name: home.chapters[0].name.toUpperCase() }),
      );
      expect(response.status).toBe(409);
      expect(fieldsNamed(response.body)).toEqual(['name']);
      expect(await inHome()).toBe(before);
    });

    it('closes and reopens a chapter with PATCH, auditing before and after', async () => {
      const { chapters: built } = await aRegion()
        .withChapter('Loom End', '2024-01-01')
        .build(testApp.app);
      const id = built[0].id;
      const closing = aRequestId('chapter-close');
      const closed = await send(
        'patch',
        `/api/chapters/${id}`,
        { activeTo: '2026-06-30' },
        admin,
        closing,
      );
      expect(closed.status).toBe(200);
      expect(closed.body as ChapterView).toMatchObject({
        activeFrom: '2024-01-01',
        activeTo: '2026-06-30',
      });
      const [entry] = await auditedBy(testApp.app, closing);
      expect(entry).toMatchObject({
        action: 'chapter.updated',
        before: { activeTo: null, reportingDueDay: 10 },
        after: { activeTo: '2026-06-30', reportingDueDay: 10 },
      });

      const reopened = await send('patch', `/api/chapters/${id}`, { activeTo: null });
      expect(reopened.status).toBe(200);
      expect((reopened.body as ChapterView).activeTo).toBeNull();
    });

    it('moves a chapter to another region', async () => {
      const { chapters: built } = await aRegion().withChapter('Drifting').build(testApp.app);
      const response = await send('patch', `/api/chapters/${built[0].id}`, {
        regionId: home.region.id,
      });
      expect(response.status).toBe(200);
      expect(response.body as ChapterView).toMatchObject({
        regionId: home.region.id,
        regionName: home.region.name,
      });
    });

    it('refuses a PATCH whose new start overtakes the stored end (400 activeFrom)', async () => {
      const { chapters: built } = await aRegion()
        .withChapter('Short Lived', '2024-01-01')
        .build(testApp.app);
      const id = built[0].id;
      await send('patch', `/api/chapters/${id}`, { activeTo: '2024-12-31' }).expect(200);
      const response = await send('patch', `/api/chapters/${id}`, { activeFrom: '2025-01-01' });
      expect(response.status).toBe(400);
      expect(fieldsNamed(response.body)).toEqual(['activeFrom']);
      expect(await chapters.findByPk(id)).toMatchObject({
        activeFrom: '2024-01-01',
        activeTo: '2024-12-31',
      });
    });

    it('refuses a PATCH to an unknown region (400 regionId) and changes nothing', async () => {
      const id = home.chapters[0].id;
      const response = await send('patch', `/api/chapters/${id}`, { regionId: 999999999 });
      expect(response.status).toBe(400);
      expect(fieldsNamed(response.body)).toEqual(['regionId']);
      expect((await chapters.findByPk(id))?.regionId).toBe(home.region.id);
    });

    it('refuses a chapter lead (403) and stores nothing', async () => {
      const { token } = await signedIn(testApp, 'chapter_lead', { chapterId: home.chapters[0].id });
      const body = aChapter();
      const response = await send('post', '/api/chapters', body, `Bearer ${token}`);
      expect(response.status).toBe(403);
      expect(await chapters.count({ where: { name: body.name } })).toBe(0);
    });
  });
});
