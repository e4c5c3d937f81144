import { getModelToken } from '@nestjs/sequelize';
import type { ApiErrorBody, CampaignView } from '@tallyloom/core';
import { CampaignsService } from '../../services/api/src/campaigns/campaigns.service';
import { Campaign } from '../../services/api/src/campaigns/models/campaign.model';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { aCampaign, aRequestId, auditedBy, fieldsNamed } from './support/setup-builders';
import { startTestApp, uniqueSuffix, type TestApp } from './support/test-app';

jest.setTimeout(30_000);

type Built = Awaited<ReturnType<ReturnType<typeof aRegion>['build']>>;

describe('network set-up: campaigns', () => {
  let testApp: TestApp;
  let campaigns: typeof Campaign;
  let admin: string;
  let home: Built;
  let away: Built;

  beforeAll(async () => {
    testApp = await startTestApp();
    campaigns = testApp.app.get<typeof Campaign>(getModelToken(Campaign));
    admin = `Bearer ${(await signedIn(testApp, 'network_admin')).token}`;
    home = await aRegion().named('Drive Home').withChapter('Cast On').build(testApp.app);
    away = await aRegion().named('Drive Away').withChapter('Bind Off').build(testApp.app);
  });
  afterAll(() => testApp.close());

  const get = (url: string, auth = admin) => testApp.http().get(url).set('Authorization', auth);
  const send = (
    method: 'post' | 'patch',
    url: string,
    body: object,
    auth = admin,
    requestId = aRequestId(`campaign-${method}`),
  ) => {
    const http = testApp.http();
    return (method === 'post' ? http.post(url) : http.patch(url))
      .set('Authorization', auth)
      .set('X-Request-Id', requestId)
      .send(body);
  };
  const aCode = () => `T-${uniqueSuffix()}`;
  const aDrive = (overrides: object = {}) => ({
    code: aCode(),
    name: 'Thaw Drive',
    goalPanels: 2500,
    startsOn: '2026-03-01',
    endsOn: '2026-05-31',
    ...overrides,
  });

  describe('create and update', () => {
    it('creates a network-wide campaign with its code trimmed and upper-cased, and audits it', async () => {
      const code = aCode();
      const requestId = aRequestId('campaign-create');
      const response = await send(
        'post',
        '/api/campaigns',
        aDrive({ code: `  ${code.toLowerCase()} ` }),
        admin,
        requestId,
      );
      expect(response.status).toBe(201);
      const campaign = response.body as CampaignView;
      expect(campaign).toEqual({
        id: campaign.id,
        code,
        name: 'Thaw Drive',
        goalPanels: 2500,
        startsOn: '2026-03-01',
        endsOn: '2026-05-31',
        regionId: null,
        regionName: null,
      });
      expect(await auditedBy(testApp.app, requestId)).toEqual([
        expect.objectContaining({
          action: 'campaign.created',
          entityType: 'campaign',
          entityId: String(campaign.id),
          before: null,
          after: {
            code,
            name: 'Thaw Drive',
            goalPanels: 2500,
            startsOn: '2026-03-01',
            endsOn: '2026-05-31',
            regionId: null,
          },
        }),
      ]);
    });

    it('creates a regional campaign and names its region', async () => {
      const response = await send('post', '/api/campaigns', aDrive({ regionId: home.region.id }));
      expect(response.status).toBe(201);
      expect(response.body as CampaignView).toMatchObject({
        regionId: home.region.id,
        regionName: home.region.name,
      });
    });

    const CODE = 'code must be 2 to 24 letters A–Z, digits or hyphens';
    const GOAL = 'goalPanels must be a whole number from 1 to 10,000,000';
    it.each([
      ['code', { code: 'A' }, CODE],
      ['code', { code: 'HAS SPACE' }, CODE],
      ['code', { code: 'DWD_26' }, CODE],
      ['code', { code: 'X'.repeat(25) }, CODE],
      ['code', { code: 26 }, 'code must be text'],
      ['goalPanels', { goalPanels: 0 }, GOAL],
      ['goalPanels', { goalPanels: 10_000_001 }, GOAL],
      ['goalPanels', { goalPanels: 12.5 }, GOAL],
      ['goalPanels', { goalPanels: '4000' }, GOAL],
      ['startsOn', { startsOn: '2026-13-01' }, 'startsOn must be a date written as YYYY-MM-DD'],
      ['endsOn', { endsOn: '2026-02-28' }, 'endsOn must be on or after startsOn (2026-03-01).'],
      ['regionId', { regionId: 999999999 }, 'No such region.'],
      ['regionId', { regionId: 0 }, 'regionId must be a whole number from 1 to 4,294,967,295'],
      ['name', { name: '' }, 'name is required'],
    ])(
      'refuses a bad %s with 400 naming it, and stores nothing (%j)',
      async (field, override, message) => {
        const body = aDrive(override) as { code: unknown };
        const requestId = aRequestId('campaign-bad');
        const response = await send('post', '/api/campaigns', body, admin, requestId);
        expect(response.status).toBe(400);
        expect((response.body as ApiErrorBody).fields).toEqual([{ field, messages: [message] }]);
        if (typeof body.code === 'string') {
          expect(await campaigns.count({ where: { code: body.code.trim().toUpperCase() } })).toBe(
            0,
          );
        }
        expect(await auditedBy(testApp.app, requestId)).toEqual([]);
      },
    );

    it('accepts a one-day campaign and a goal of exactly 10,000,000 panels', async () => {
      const response = await send(
        'post',
        '/api/campaigns',
        aDrive({ startsOn: '2026-04-01', endsOn: '2026-04-01', goalPanels: 10_000_000 }),
      );
      expect(response.status).toBe(201);
    });

    it('refuses a code already in use (409 code), whatever its case', async () => {
      const existing = await aCampaign().build(testApp.app);
      const name = `Copycat ${uniqueSuffix()}`;
      const response = await send(
        'post',
        '/api/campaigns',
        aDrive({ code: existing.code.toLowerCase(), name }),
      );
      expect(response.status).toBe(409);
      expect(fieldsNamed(response.body)).toEqual(['code']);
      expect((response.body as ApiErrorBody).message).toBe(
        'Another campaign already has this code.',
      );
      expect(await campaigns.count({ where: { name } })).toBe(0);
    });

    it('changes the goal with PATCH, auditing before and after; a network-wide drive becomes regional', async () => {
      const campaign = await aCampaign().build(testApp.app);
      const requestId = aRequestId('campaign-update');
      const response = await send(
        'patch',
        `/api/campaigns/${campaign.id}`,
        { goalPanels: 1800, regionId: away.region.id },
        admin,
        requestId,
      );
      expect(response.status).toBe(200);
      expect(response.body as CampaignView).toMatchObject({
        code: campaign.code,
        goalPanels: 1800,
        regionId: away.region.id,
        regionName: away.region.name,
      });
      const [entry] = await auditedBy(testApp.app, requestId);
      expect(entry).toMatchObject({
        action: 'campaign.updated',
        before: { goalPanels: 1000, regionId: null },
        after: { goalPanels: 1800, regionId: away.region.id },
      });
    });

    it('refuses a PATCH that ends a campaign before it starts (400 endsOn), changing nothing', async () => {
      const campaign = await aCampaign().running('2025-11-01', '2026-02-28').build(testApp.app);
      const response = await send('patch', `/api/campaigns/${campaign.id}`, {
        endsOn: '2025-10-31',
      });
      expect(response.status).toBe(400);
      expect(fieldsNamed(response.body)).toEqual(['endsOn']);
      expect((await campaigns.findByPk(campaign.id))?.endsOn).toBe('2026-02-28');
    });

    it('refuses a chapter lead (403) and stores nothing', async () => {
      const { token } = await signedIn(testApp, 'chapter_lead', { chapterId: home.chapters[0].id });
      const body = aDrive();
      const response = await send('post', '/api/campaigns', body, `Bearer ${token}`);
      expect(response.status).toBe(403);
      expect(await campaigns.count({ where: { code: body.code } })).toBe(0);
    });
  });

  describe('who sees which campaigns', () => {
    let everyone: Campaign;
    let ours: Campaign;
    let theirs: Campaign;
    beforeAll(async () => {
      everyone = await aCampaign().build(testApp.app);
      ours = await aCampaign().inRegion(home.region.id).build(testApp.app);
      theirs = await aCampaign().inRegion(away.region.id).build(testApp.app);
    });

    const seen = async (auth: string) =>
      ((await get('/api/campaigns', auth).expect(200)).body as CampaignView[])
        .map((campaign) => campaign.id)
        .filter((id) => [everyone.id, ours.id, theirs.id].includes(id))
        .sort((a, b) => a - b);

    it('a regional campaign is invisible outside its region, by list and by id', async () => {
      const lead = `Bearer ${(await signedIn(testApp, 'chapter_lead', { chapterId: home.chapters[0].id })).token}`;
      const coordinator = `Bearer ${(await signedIn(testApp, 'regional_coordinator', { regionId: home.region.id })).token}`;
      for (const auth of [lead, coordinator]) {
        expect(await seen(auth)).toEqual([everyone.id, ours.id].sort((a, b) => a - b));
        await get(`/api/campaigns/${ours.id}`, auth).expect(200);
        await get(`/api/campaigns/${everyone.id}`, auth).expect(200);
        const hidden = await get(`/api/campaigns/${theirs.id}`, auth).expect(404);
        expect(JSON.stringify(hidden.body)).not.toContain(theirs.code);
      }
    });

    it('network roles see every campaign', async () => {
      const grants = `Bearer ${(await signedIn(testApp, 'grant_writer')).token}`;
      expect(await seen(grants)).toEqual([everyone.id, ours.id, theirs.id].sort((a, b) => a - b));
    });

    it('filters by the day a campaign runs on, start and end days included', async () => {
      const spring = await aCampaign().running('2031-03-01', '2031-05-31').build(testApp.app);
      const active = async (day: string) =>
        ((await get(`/api/campaigns?activeOn=${day}`).expect(200)).body as CampaignView[]).map(
          (campaign) => campaign.id,
        );
      expect(await active('2031-03-01')).toContain(spring.id);
      expect(await active('2031-05-31')).toContain(spring.id);
      expect(await active('2031-02-28')).not.toContain(spring.id);
      expect(await active('2031-06-01')).not.toContain(spring.id);
    });

    it('refuses an activeOn that is not a date (400 activeOn)', async () => {
      const response = await get('/api/campaigns?activeOn=tomorrow').expect(400);
      expect(fieldsNamed(response.body)).toEqual(['activeOn']);
    });

    it('shows the Deep Winter Drive from the seed', async () => {
      const all = (await get('/api/campaigns').expect(200)).body as CampaignView[];
      expect(all.find((campaign) => campaign.code === 'DWD26')).toMatchObject({
        name: 'Deep Winter Drive',
        goalPanels: 4000,
        startsOn: '2025-11-01',
        endsOn: '2026-02-28',
        regionId: null,
      });
    });
  });

  describe('findCreditable, for parcel receipts', () => {
    let service: CampaignsService;
    beforeAll(() => {
      service = testApp.app.get(CampaignsService);
    });

    it('matches a label code whatever its case or spacing, on any day the campaign runs', async () => {
      const campaign = await aCampaign().running('2032-01-10', '2032-01-20').build(testApp.app);
      const label = ` ${campaign.code.toLowerCase()} `;
      for (const day of ['2032-01-10', '2032-01-15', '2032-01-20']) {
        expect((await service.findCreditable(label, day, home.region.id))?.id).toBe(campaign.id);
      }
      expect(await service.findCreditable(label, '2032-01-09', home.region.id)).toBeNull();
      expect(await service.findCreditable(label, '2032-01-21', home.region.id)).toBeNull();
      expect(await service.findCreditable('NO-SUCH-CODE', '2032-01-15', home.region.id)).toBeNull();
      expect(await service.findCreditable('', '2032-01-15', home.region.id)).toBeNull();
      expect(await service.findCreditable(campaign.code, 'not-a-date', home.region.id)).toBeNull();
    });

    it('credits a regional campaign only to chapters of its own region', async () => {
      const campaign = await aCampaign()
        .inRegion(home.region.id)
        .running('2032-02-01', '2032-02-28')
        .build(testApp.app);
      expect((await service.findCreditable(campaign.code, '2032-02-14', home.region.id))?.id).toBe(
        campaign.id,
      );
      expect(await service.findCreditable(campaign.code, '2032-02-14', away.region.id)).toBeNull();
    });
  });
});
