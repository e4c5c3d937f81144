import type { CampaignProgressView } from '@tallyloom/core';
import type { Campaign } from '../../services/api/src/campaigns/models/campaign.model';
import type { Region } from '../../services/api/src/regions/models/region.model';
import type { Chapter } from '../../services/api/src/chapters/models/chapter.model';
import { putCampaignSnapshot } from './fixtures/snapshot-rows';
import { caller } from './fixtures/tallies';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { aCampaign } from './support/setup-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(30_000);

/** The fields the public page may show (PublicCampaignProgress), and nothing else. */
const PUBLIC_KEYS = [
  'asOf',
  'code',
  'creditedPanels',
  'endsOn',
  'goalPanels',
  'name',
  'neededPerWeek',
  'pacePerWeek',
  'shareDone',
  'startsOn',
  'weekly',
  'weeksLeft',
];

function isoDay(offsetDays: number): string {
  const today = new Date(`${new Date().toISOString().slice(0, 10)}T00:00:00Z`);
  return new Date(today.getTime() + offsetDays * 86_400_000).toISOString().slice(0, 10);
}

describe('campaign progress', () => {
  let testApp: TestApp;
  let home: { region: Region; chapters: Chapter[] };
  let away: { region: Region; chapters: Chapter[] };
  let ours: Campaign;
  let theirs: Campaign;
  let everyone: Campaign;
  const tokens = { writer: '', coordinator: '', lead: '' };
  const as = (who: keyof typeof tokens) => caller(testApp, tokens[who]);

  beforeAll(async () => {
    testApp = await startTestApp();
    home = await aRegion().named('Drive Home').withChapter('Drive Mill').build(testApp.app);
    away = await aRegion().named('Drive Away').withChapter('Drive Far').build(testApp.app);
    tokens.writer = (await signedIn(testApp, 'grant_writer')).token;
    tokens.coordinator = (
      await signedIn(testApp, 'regional_coordinator', { regionId: home.region.id })
    ).token;
    tokens.lead = (
      await signedIn(testApp, 'chapter_lead', { chapterId: home.chapters[0].id })
    ).token;

    // Started 35 days ago and runs 12 weeks (84 days, both ends included): 5 of 12 weeks gone.
    ours = await aCampaign()
      .inRegion(home.region.id)
      .running(isoDay(-35), isoDay(-35 + 83))
      .build(testApp.app);
    await ours.update({ goalPanels: 4000 });
    const weekly = [200, 300, 250, 270, 280].map((panels, week, all) => ({
      weekStart: isoDay(-35 + 7 * week),
      panels,
      cumulative: all.slice(0, week + 1).reduce((sum, value) => sum + value, 0),
    }));
    await putCampaignSnapshot(
      testApp.app,
      ours.id,
      { creditedPanels: 1300, pendingPanels: 45, weekly },
      '2026-01-05T08:00:00.000Z',
    );
    theirs = await aCampaign().inRegion(away.region.id).build(testApp.app);
    everyone = await aCampaign().running(isoDay(-10), isoDay(60)).build(testApp.app);
  });
  afterAll(() => testApp.close());

  it("works out the pace from the snapshot with today's date (the worked example)", async () => {
    // Worked by hand: 1,300 credited after 5 of 12 weeks → 1,300 / 5 = 260 per week so far;
    // 4,000 − 1,300 = 2,700 still needed over 7 weeks → 385.71 per week.
    const response = await as('coordinator')
      .get(`/api/dashboards/campaigns/${ours.id}`)
      .expect(200);
    const view = response.body as CampaignProgressView;
    expect(view).toMatchObject({
      campaignId: ours.id,
      code: ours.code,
      goalPanels: 4000,
      creditedPanels: 1300,
      pendingPanels: 45,
      weeksElapsed: 5,
      weeksTotal: 12,
      weeksLeft: 7,
      asOf: '2026-01-05T08:00:00.000Z',
    });
    expect(view.shareDone).toBeCloseTo(0.325, 10);
    expect(view.pacePerWeek).toBeCloseTo(260, 10);
    expect(view.neededPerWeek).toBeCloseTo(385.714, 3);
    expect(view.weekly.map((week) => week.cumulative)).toEqual([200, 500, 750, 1020, 1300]);
    expect(view.projection.method).toMatch(/least-squares/);
  });

  it('lists the campaigns in scope: network-wide ones and those of the region', async () => {
    const ids = async (who: keyof typeof tokens) =>
      (
        (await as(who).get('/api/dashboards/campaigns').expect(200)).body as CampaignProgressView[]
      ).map((view) => view.campaignId);
    const coordinator = await ids('coordinator');
    expect(coordinator).toEqual(expect.arrayContaining([ours.id, everyone.id]));
    expect(coordinator).not.toContain(theirs.id);
    const lead = await ids('lead');
    expect(lead).toEqual(expect.arrayContaining([ours.id, everyone.id]));
    expect(lead).not.toContain(theirs.id);
    expect(await ids('writer')).toEqual(expect.arrayContaining([ours.id, theirs.id, everyone.id]));
  });

  it("hides another region's campaign (404) and shows an unbuilt one as nothing credited", async () => {
    await as('coordinator').get(`/api/dashboards/campaigns/${theirs.id}`).expect(404);
    await as('lead').get(`/api/dashboards/campaigns/${theirs.id}`).expect(404);
    const response = await as('writer').get(`/api/dashboards/campaigns/${theirs.id}`).expect(200);
    expect(response.body).toMatchObject({ creditedPanels: 0, pendingPanels: 0, shareDone: 0 });
  });

  it('shows the public page without sign-in: counts only, whatever case the code is in', async () => {
    const response = await testApp
      .http()
      .get(`/api/public/campaigns/${ours.code.toLowerCase()}/progress`)
      .expect(200);
    const body = response.body as Record<string, unknown>;
    expect(Object.keys(body).sort()).toEqual(PUBLIC_KEYS);
    expect(body).toMatchObject({ code: ours.code, creditedPanels: 1300, goalPanels: 4000 });
    for (const week of body.weekly as Array<Record<string, unknown>>)
      expect(Object.keys(week).sort()).toEqual(['cumulative', 'panels', 'weekStart']);
    const text = JSON.stringify(body);
    for (const name of [home.region.name, home.chapters[0].name, 'pendingPanels', 'campaignId'])
      expect(text).not.toContain(name);
  });

  it('answers 404 for a code no campaign has', async () => {
    await testApp.http().get('/api/public/campaigns/NO-SUCH-DRIVE-X9/progress').expect(404);
  });
});
