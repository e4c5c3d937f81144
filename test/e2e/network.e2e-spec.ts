import type { ApiErrorBody, ChapterView, RegionView } from '@tallyloom/core';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { startTestApp, type TestApp } from './support/test-app';

describe('network: regions and chapters', () => {
  let testApp: TestApp;
  let auth: string;
  const get = (url: string) => testApp.http().get(url).set('Authorization', auth);
  beforeAll(async () => {
    testApp = await startTestApp();
    auth = `Bearer ${(await signedIn(testApp, 'national_staff')).token}`;
  });
  afterAll(() => testApp.close());

  it('lists a region with the number of its chapters, sorted by name', async () => {
    const { region } = await aRegion()
      .named('Quillmoor')
      .withChapter('Ashby')
      .withChapter('Brackwater')
      .build(testApp.app);
    const response = await get('/api/regions').expect(200);
    const regions = response.body as RegionView[];
    const ours = regions.find((r) => r.id === region.id);
    expect(ours).toEqual({ id: region.id, name: region.name, code: region.code, chapterCount: 2 });
    const names = regions.map((r) => r.name);
    expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b)));
  });

  it('shows the demo network loaded by the seed', async () => {
    const regions = (await get('/api/regions').expect(200)).body as RegionView[];
    expect(regions.find((r) => r.name === 'North Ridge')?.chapterCount).toBe(4);
    const chapters = (await get('/api/chapters').expect(200)).body as ChapterView[];
    expect(chapters.find((c) => c.name === 'Alder Falls')?.regionName).toBe('North Ridge');
  });

  it("filters chapters by region and returns only that region's chapters", async () => {
    const { region, chapters } = await aRegion()
      .withChapter('Zephyr Mill', '2023-05-01', 12)
      .withChapter('Cobble End')
      .build(testApp.app);
    await aRegion().withChapter('Elsewhere').build(testApp.app);

    const response = await get(`/api/chapters?regionId=${region.id}`).expect(200);
    const listed = response.body as ChapterView[];
    expect(listed.map((c) => c.name)).toEqual([chapters[1].name, chapters[0].name]); // by name
    expect(listed.every((c) => c.regionId === region.id && c.regionName === region.name)).toBe(
      true,
    );
    expect(listed.find((c) => c.id === chapters[0].id)).toMatchObject({
      reportingDueDay: 12,
      activeFrom: '2023-05-01',
      activeTo: null,
    });
  });

  it('rejects a region id that is not a whole number with 400 naming the field', async () => {
    const response = await get('/api/chapters?regionId=abc').expect(400);
    const body = response.body as ApiErrorBody;
    expect(body.fields).toEqual([
      { field: 'regionId', messages: ['regionId must be a whole number'] },
    ]);
    expect(body.message).toContain('regionId');
    expect(body.requestId).toBeTruthy();
  });

  it('rejects an unknown query parameter with 400 naming it', async () => {
    const response = await get('/api/chapters?colour=teal').expect(400);
    expect((response.body as ApiErrorBody).fields?.[0]?.field).toBe('colour');
  });
});
