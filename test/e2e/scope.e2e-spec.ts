import type { ChapterView, RegionView } from '@tallyloom/core';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { startTestApp, type TestApp } from './support/test-app';

/** BRIEF §2: a person sees only their region or chapter; anything else is "not found", never the row. */
describe('region and chapter scope, enforced in the query', () => {
  let testApp: TestApp;
  let home: Awaited<ReturnType<ReturnType<typeof aRegion>['build']>>;
  let other: Awaited<ReturnType<ReturnType<typeof aRegion>['build']>>;
  let lead: string;
  let coordinator: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    home = await aRegion()
      .named('Home')
      .withChapter('Hearth')
      .withChapter('Kiln')
      .build(testApp.app);
    other = await aRegion().named('Away').withChapter('Yonder').build(testApp.app);
    lead = `Bearer ${(await signedIn(testApp, 'chapter_lead', { chapterId: home.chapters[0].id })).token}`;
    coordinator = `Bearer ${(await signedIn(testApp, 'regional_coordinator', { regionId: home.region.id })).token}`;
  });
  afterAll(() => testApp.close());

  const get = (url: string, auth: string) => testApp.http().get(url).set('Authorization', auth);

  it("a chapter lead lists only their own chapter and their chapter's region", async () => {
    const chapters = (await get('/api/chapters', lead).expect(200)).body as ChapterView[];
    expect(chapters.map((c) => c.id)).toEqual([home.chapters[0].id]);
    const regions = (await get('/api/regions', lead).expect(200)).body as RegionView[];
    expect(regions.map((r) => r.id)).toEqual([home.region.id]);
  });

  it('a chapter lead gets 404 and no row for another chapter or region, by id or by guessing', async () => {
    for (const url of [
      `/api/chapters/${home.chapters[1].id}`,
      `/api/chapters/${other.chapters[0].id}`,
      `/api/regions/${other.region.id}`,
      '/api/chapters/999999999',
    ]) {
      const response = await get(url, lead).expect(404);
      expect(JSON.stringify(response.body)).not.toContain('Yonder');
      expect(JSON.stringify(response.body)).not.toContain('Kiln');
    }
    await get(`/api/chapters/${home.chapters[0].id}`, lead).expect(200);
  });

  it('a chapter lead filtering by another region gets an empty list', async () => {
    const response = await get(`/api/chapters?regionId=${other.region.id}`, lead).expect(200);
    expect(response.body).toEqual([]);
  });

  it('a regional coordinator sees every chapter of their region and nothing outside it', async () => {
    const chapters = (await get('/api/chapters', coordinator).expect(200)).body as ChapterView[];
    expect(chapters.map((c) => c.id).sort()).toEqual(home.chapters.map((c) => c.id).sort());
    await get(`/api/chapters/${other.chapters[0].id}`, coordinator).expect(404);
    await get(`/api/regions/${other.region.id}`, coordinator).expect(404);
    expect(
      (await get(`/api/chapters?regionId=${other.region.id}`, coordinator).expect(200)).body,
    ).toEqual([]);
  });

  it('network roles see every region', async () => {
    for (const role of ['network_admin', 'national_staff', 'grant_writer', 'auditor'] as const) {
      const auth = `Bearer ${(await signedIn(testApp, role)).token}`;
      const regions = (await get('/api/regions', auth).expect(200)).body as RegionView[];
      expect(regions.map((r) => r.id)).toEqual(
        expect.arrayContaining([home.region.id, other.region.id]),
      );
    }
  });
});
