import { getModelToken } from '@nestjs/sequelize';
import type { ApiErrorBody, PartnerAgencyView } from '@tallyloom/core';
import { AgencyChapter } from '../../services/api/src/agencies/models/agency-chapter.model';
import { PartnerAgency } from '../../services/api/src/agencies/models/partner-agency.model';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { aRequestId, anAgency, auditedBy, fieldsNamed } from './support/setup-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

jest.setTimeout(30_000);

/** Stands in a test table for a real chapter id of the test. */
const EXISTING = -424242;

type Built = Awaited<ReturnType<ReturnType<typeof aRegion>['build']>>;

describe('network set-up: partner agencies', () => {
  let testApp: TestApp;
  let agencies: typeof PartnerAgency;
  let links: typeof AgencyChapter;
  let admin: string;
  let home: Built;
  let away: Built;

  beforeAll(async () => {
    testApp = await startTestApp();
    agencies = testApp.app.get<typeof PartnerAgency>(getModelToken(PartnerAgency));
    links = testApp.app.get<typeof AgencyChapter>(getModelToken(AgencyChapter));
    admin = `Bearer ${(await signedIn(testApp, 'network_admin')).token}`;
    home = await aRegion()
      .named('Agency Home')
      .withChapter('Purl Row')
      .withChapter('Garter Lane')
      .build(testApp.app);
    away = await aRegion().named('Agency Away').withChapter('Far Stitch').build(testApp.app);
  });
  afterAll(() => testApp.close());

  const get = (url: string, auth = admin) => testApp.http().get(url).set('Authorization', auth);
  const send = (
    method: 'post' | 'patch',
    url: string,
    body: object,
    auth = admin,
    requestId = aRequestId(`agency-${method}`),
  ) => {
    const http = testApp.http();
    return (method === 'post' ? http.post(url) : http.patch(url))
      .set('Authorization', auth)
      .set('X-Request-Id', requestId)
      .send(body);
  };
  const linksOf = (chapterIds: number[]) => links.count({ where: { chapterId: chapterIds } });

  describe('create and update', () => {
    it('creates an agency served by chapters (each once, listed by name), and audits it', async () => {
      const name = `Cradle Lane Family Shelter ${uniqueSuffix()}`;
      const [purl, garter] = home.chapters;
      const requestId = aRequestId('agency-create');
      const response = await send(
        'post',
        '/api/agencies',
        { name, kind: 'family_shelter', chapterIds: [purl.id, garter.id, purl.id] },
        admin,
        requestId,
      );
      expect(response.status).toBe(201);
      const agency = response.body as PartnerAgencyView;
      // Garter Lane sorts before Purl Row.
      expect(agency).toEqual({
        id: agency.id,
        name,
        kind: 'family_shelter',
        active: true,
        chapters: [
          { id: garter.id, name: garter.name },
          { id: purl.id, name: purl.name },
        ],
      });
      expect(await links.count({ where: { agencyId: agency.id } })).toBe(2);

      const ids = [purl.id, garter.id].sort((a, b) => a - b);
      expect(await auditedBy(testApp.app, requestId)).toEqual([
        expect.objectContaining({
          action: 'partner_agency.created',
          entityType: 'partner_agency',
          entityId: String(agency.id),
          after: { name, kind: 'family_shelter', active: true, chapterIds: ids },
        }),
      ]);
      expect((await get(`/api/agencies/${agency.id}`).expect(200)).body).toEqual(agency);
    });

    it.each([
      [
        'kind',
        { kind: 'church' },
        'kind must be one of: family_shelter, neonatal_or_childrens_ward, care_home, outreach, disaster_relief, other',
      ],
      [
        'kind',
        { kind: undefined },
        'kind must be one of: family_shelter, neonatal_or_childrens_ward, care_home, outreach, disaster_relief, other',
      ],
      [
        'chapterIds',
        { chapterIds: [] },
        'chapterIds must list one or more chapter ids (whole numbers)',
      ],
      [
        'chapterIds',
        { chapterIds: undefined },
        'chapterIds must list one or more chapter ids (whole numbers)',
      ],
      [
        'chapterIds',
        { chapterIds: 'all' },
        'chapterIds must list one or more chapter ids (whole numbers)',
      ],
      [
        'chapterIds',
        { chapterIds: [1.5] },
        'chapterIds must list one or more chapter ids (whole numbers)',
      ],
      [
        'chapterIds',
        { chapterIds: [EXISTING, 999999999] },
        'No such chapter: 999999999. An agency must be served by existing chapters.',
      ],
      ['name', { name: '' }, 'name is required'],
      ['name', { name: 'N'.repeat(161) }, 'name must be at most 160 characters'],
      ['active', { active: 'yes' }, 'active must be true or false'],
    ])(
      'refuses a bad %s with 400 naming it, and stores nothing (%j)',
      async (field, override, message) => {
        const name = `Refused Agency ${uniqueSuffix()}`;
        // EXISTING stands for a chapter of this test, known only once it is built.
        const body = JSON.parse(
          JSON.stringify({ name, kind: 'care_home', chapterIds: [EXISTING], ...override }),
          (_, value: unknown) => (value === EXISTING ? home.chapters[0].id : value),
        ) as object;
        const linksBefore = await linksOf([home.chapters[0].id]);
        const requestId = aRequestId('agency-bad');
        const response = await send('post', '/api/agencies', body, admin, requestId);
        expect(response.status).toBe(400);
        expect((response.body as ApiErrorBody).fields).toEqual([{ field, messages: [message] }]);
        expect(await agencies.count({ where: { name } })).toBe(0);
        expect(await linksOf([home.chapters[0].id])).toBe(linksBefore);
        expect(await auditedBy(testApp.app, requestId)).toEqual([]);
      },
    );

    it('refuses a name already in use (409 name), whatever the case, and stores no links', async () => {
      const existing = await anAgency().servedBy(home.chapters[0].id).build(testApp.app);
      const linksBefore = await linksOf([home.chapters[1].id]);
      const response = await send('post', '/api/agencies', {
        name: existing.name.toUpperCase(),
        kind: 'outreach',
        chapterIds: [home.chapters[1].id],
      });
      expect(response.status).toBe(409);
      expect(fieldsNamed(response.body)).toEqual(['name']);
      expect(await agencies.count({ where: { name: existing.name } })).toBe(1);
      expect(await linksOf([home.chapters[1].id])).toBe(linksBefore);
    });

    it('replaces the serving chapters and retires an agency with PATCH, auditing before and after', async () => {
      const agency = await anAgency()
        .ofKind('outreach')
        .servedBy(home.chapters[0].id)
        .build(testApp.app);
      const requestId = aRequestId('agency-update');
      const response = await send(
        'patch',
        `/api/agencies/${agency.id}`,
        { chapterIds: [away.chapters[0].id], active: false },
        admin,
        requestId,
      );
      expect(response.status).toBe(200);
      expect(response.body as PartnerAgencyView).toMatchObject({
        name: agency.name,
        kind: 'outreach',
        active: false,
        chapters: [{ id: away.chapters[0].id, name: away.chapters[0].name }],
      });
      const stored = await links.findAll({ where: { agencyId: agency.id } });
      expect(stored.map((link) => link.chapterId)).toEqual([away.chapters[0].id]);

      const [entry] = await auditedBy(testApp.app, requestId);
      expect(entry).toMatchObject({
        action: 'partner_agency.updated',
        entityId: String(agency.id),
        before: { active: true, chapterIds: [home.chapters[0].id] },
        after: { active: false, chapterIds: [away.chapters[0].id] },
      });
    });

    it('keeps the old chapters when a PATCH names one that does not exist (400 chapterIds)', async () => {
      const agency = await anAgency().servedBy(home.chapters[0].id).build(testApp.app);
      const response = await send('patch', `/api/agencies/${agency.id}`, {
        name: `Renamed ${uniqueSuffix()}`,
        chapterIds: [999999999],
      });
      expect(response.status).toBe(400);
      expect(fieldsNamed(response.body)).toEqual(['chapterIds']);
      const stored = await links.findAll({ where: { agencyId: agency.id } });
      expect(stored.map((link) => link.chapterId)).toEqual([home.chapters[0].id]);
      expect((await agencies.findByPk(agency.id))?.name).toBe(agency.name);
    });

    it('refuses national staff (403) and stores nothing', async () => {
      const staff = `Bearer ${(await signedIn(testApp, 'national_staff')).token}`;
      const name = `Staff Agency ${uniqueSuffix()}`;
      const response = await send(
        'post',
        '/api/agencies',
        { name, kind: 'other', chapterIds: [home.chapters[0].id] },
        staff,
      );
      expect(response.status).toBe(403);
      expect(await agencies.count({ where: { name } })).toBe(0);
    });
  });

  describe('who sees which agencies', () => {
    let ours: PartnerAgency;
    let shared: PartnerAgency;
    let neighbours: PartnerAgency;
    let elsewhere: PartnerAgency;
    let lead: string;
    let coordinator: string;

    beforeAll(async () => {
      const [purl, garter] = home.chapters;
      ours = await anAgency().named('Ours').servedBy(purl.id).build(testApp.app);
      shared = await anAgency()
        .named('Shared')
        .servedBy(purl.id, away.chapters[0].id)
        .build(testApp.app);
      neighbours = await anAgency().named('Neighbours').servedBy(garter.id).build(testApp.app);
      elsewhere = await anAgency()
        .named('Elsewhere')
        .servedBy(away.chapters[0].id)
        .build(testApp.app);
      lead = `Bearer ${(await signedIn(testApp, 'chapter_lead', { chapterId: purl.id })).token}`;
      coordinator = `Bearer ${(await signedIn(testApp, 'regional_coordinator', { regionId: home.region.id })).token}`;
    });

    const listed = async (url: string, auth: string) =>
      ((await get(url, auth).expect(200)).body as PartnerAgencyView[]).filter((agency) =>
        [ours.id, shared.id, neighbours.id, elsewhere.id].includes(agency.id),
      );

    it("a chapter lead sees the agencies their chapter serves, and only their chapter's link", async () => {
      const seen = await listed('/api/agencies', lead);
      expect(seen.map((agency) => agency.id).sort()).toEqual([ours.id, shared.id].sort());
      const sharedSeen = seen.find((agency) => agency.id === shared.id)!;
      expect(sharedSeen.chapters).toEqual([
        { id: home.chapters[0].id, name: home.chapters[0].name },
      ]);

      await get(`/api/agencies/${ours.id}`, lead).expect(200);
      for (const hidden of [neighbours, elsewhere]) {
        const response = await get(`/api/agencies/${hidden.id}`, lead).expect(404);
        expect(JSON.stringify(response.body)).not.toContain(hidden.name);
      }
    });

    it('a regional coordinator sees the agencies of every chapter in the region', async () => {
      const seen = await listed('/api/agencies', coordinator);
      expect(seen.map((agency) => agency.id).sort()).toEqual(
        [ours.id, shared.id, neighbours.id].sort(),
      );
      await get(`/api/agencies/${elsewhere.id}`, coordinator).expect(404);
    });

    it('network roles see every agency with all its chapters', async () => {
      const auditor = `Bearer ${(await signedIn(testApp, 'auditor')).token}`;
      const seen = await listed('/api/agencies', auditor);
      expect(seen).toHaveLength(4);
      expect(
        seen
          .find((agency) => agency.id === shared.id)
          ?.chapters.map((c) => c.id)
          .sort(),
      ).toEqual([home.chapters[0].id, away.chapters[0].id].sort());
    });

    it('filters by chapter; a chapter outside scope finds nothing', async () => {
      const garter = home.chapters[1].id;
      const byGarter = await listed(`/api/agencies?chapterId=${garter}`, admin);
      expect(byGarter.map((agency) => agency.id)).toEqual([neighbours.id]);

      const awayId = away.chapters[0].id;
      expect((await get(`/api/agencies?chapterId=${awayId}`, lead).expect(200)).body).toEqual([]);
      expect((await get(`/api/agencies?chapterId=${garter}`, lead).expect(200)).body).toEqual([]);
      const own = await listed(`/api/agencies?chapterId=${home.chapters[0].id}`, lead);
      expect(own.map((agency) => agency.id).sort()).toEqual([ours.id, shared.id].sort());
    });

    it('refuses a chapter filter that is not a whole number (400 chapterId)', async () => {
      const response = await get('/api/agencies?chapterId=purl').expect(400);
      expect(fieldsNamed(response.body)).toEqual(['chapterId']);
    });

    it('lists the demo agencies from the seed', async () => {
      const all = (await get('/api/agencies').expect(200)).body as PartnerAgencyView[];
      const maple = all.find((agency) => agency.name === 'Maple Street Family Shelter');
      expect(maple).toMatchObject({ kind: 'family_shelter', active: true });
      expect(maple?.chapters.map((chapter) => chapter.name)).toContain('Alder Falls');
      expect(all.find((agency) => agency.name === 'Coastal County Neonatal Unit')?.kind).toBe(
        'neonatal_or_childrens_ward',
      );
    });
  });
});
