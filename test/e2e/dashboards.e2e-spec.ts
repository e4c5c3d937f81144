import { getConnectionToken } from '@nestjs/sequelize';
import { addMonths, type DashboardView, type SnapshotFigures } from '@tallyloom/core';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { Chapter } from '../../services/api/src/chapters/models/chapter.model';
import type { Region } from '../../services/api/src/regions/models/region.model';
import { caller } from './fixtures/tallies';
import { SnapshotBuilder } from '../../services/api/src/reports/snapshot-builder.service';
import { compliance, figures } from './fixtures/snapshot-rows';
import { putApprovedMonth } from './fixtures/tally-rows';
import { aRegion } from './support/network-builders';
import { signedIn } from './support/people-builders';
import { fieldsNamed } from './support/setup-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(30_000);

// The tallies of this suite live in 2011, far before the demo's history and the other suites'
// months, so the network rows of 2011 hold this suite's tallies only.
const JAN = '2011-01';
const FEB = '2011-02';
const MAR = '2011-03';

const janA = figures({
  panelsAccepted: 100,
  panelsUsed: 60,
  blanketsAssembled: 3,
  blanketsGiven: 2,
  peopleServed: 2,
  peopleServedByGroup: { infants: 1, children: 1, adults: 0, olderAdults: 0, disasterAffected: 0 },
  volunteerHours: 40,
  panelsInStock: 140,
  blanketsInStock: 5,
  approvedTallies: 1,
});
const febA = figures({
  panelsAccepted: 80,
  panelsUsed: 120,
  blanketsAssembled: 6,
  blanketsGiven: 7,
  peopleServed: 7,
  peopleServedByGroup: { infants: 0, children: 3, adults: 4, olderAdults: 0, disasterAffected: 0 },
  volunteerHours: 55.5,
  panelsInStock: 100,
  blanketsInStock: 4,
  approvedTallies: 1,
});
const marA = figures({
  panelsAccepted: 120,
  panelsUsed: 40,
  blanketsAssembled: 2,
  blanketsGiven: 1,
  peopleServed: 1,
  peopleServedByGroup: { infants: 0, children: 0, adults: 0, olderAdults: 1, disasterAffected: 0 },
  volunteerHours: 30,
  panelsInStock: 180,
  blanketsInStock: 5,
  approvedTallies: 1,
});

describe('dashboards', () => {
  let testApp: TestApp;
  let home: { region: Region; chapters: Chapter[] };
  let away: { region: Region; chapters: Chapter[] };
  let startedAt: string;
  const tokens: Record<'admin' | 'writer' | 'coordinator' | 'lead', string> = {
    admin: '',
    writer: '',
    coordinator: '',
    lead: '',
  };
  const as = (who: keyof typeof tokens) => caller(testApp, tokens[who]);

  beforeAll(async () => {
    testApp = await startTestApp();
    // Active from 2011: the suite's months are expected, so compliance counts them.
    home = await aRegion()
      .named('Dash Home')
      .withChapter('Dash Birch', '2011-01-01')
      .withChapter('Dash Aspen', '2011-01-01')
      .build(testApp.app);
    away = await aRegion()
      .named('Dash Away')
      .withChapter('Dash Far', '2011-01-01')
      .build(testApp.app);
    startedAt = new Date().toISOString();
    const [chapterA] = home.chapters;
    tokens.admin = (await signedIn(testApp, 'network_admin')).token;
    tokens.writer = (await signedIn(testApp, 'grant_writer')).token;
    tokens.coordinator = (
      await signedIn(testApp, 'regional_coordinator', { regionId: home.region.id })
    ).token;
    tokens.lead = (await signedIn(testApp, 'chapter_lead', { chapterId: chapterA.id })).token;

    // Real approved tallies: chapters' figures are read live from them, and the builder stores
    // the region and network rows from the same tallies.
    const app = testApp.app;
    const farChapter = away.chapters[0];
    await putApprovedMonth(app, {
      chapterId: chapterA.id,
      month: JAN,
      figures: janA,
      firstSubmittedAt: '2011-02-05T09:00:00Z',
    });
    await putApprovedMonth(app, {
      chapterId: chapterA.id,
      month: FEB,
      figures: febA,
      // Late (due 10 March), and an amendment under way: pending while revision 1 counts.
      firstSubmittedAt: '2011-03-20T09:00:00Z',
      amendmentPending: true,
    });
    await putApprovedMonth(app, {
      chapterId: chapterA.id,
      month: MAR,
      figures: marA,
      firstSubmittedAt: '2011-04-05T09:00:00Z',
    });
    await putApprovedMonth(app, {
      chapterId: farChapter.id,
      month: MAR,
      figures: figures({ panelsAccepted: 9, approvedTallies: 1 }),
      firstSubmittedAt: '2011-04-05T09:00:00Z',
    });
    const builder = app.get(SnapshotBuilder);
    for (const month of [JAN, FEB, MAR]) await builder.rebuildForChapterMonth(chapterA.id, month);
    await builder.rebuildForChapterMonth(farChapter.id, MAR);
  });
  afterAll(() => testApp.close());

  const chapterUrl = (query: string) => `/api/dashboards/chapters/${home.chapters[0].id}?${query}`;

  it('shows a chapter month from its tallies, the month before, twelve months of trend and no breakdown', async () => {
    const response = await as('lead')
      .get(chapterUrl(`periodKind=month&period=${MAR}`))
      .expect(200);
    const view = response.body as DashboardView;
    expect(view.scope).toBe('chapter');
    expect(view.scopeId).toBe(home.chapters[0].id);
    expect(view.scopeName).toBe(home.chapters[0].name);
    expect(view.period).toMatchObject({ kind: 'month', key: MAR, from: MAR, to: MAR });
    expect(view.current.figures).toEqual(marA);
    // A chapter's figures are read live: as of the request, not of a rebuild.
    expect(view.current.asOf >= startedAt).toBe(true);
    expect(view.previous?.period.key).toBe(FEB);
    expect(view.previous?.figures).toEqual(febA);
    expect(view.previous?.pendingTallies).toBe(1);
    expect(view.previous?.compliance).toEqual(compliance({ expected: 1, late: 1 }));
    expect(view.trend.map((entry) => entry.period.key)).toEqual([
      '2010-04',
      '2010-05',
      '2010-06',
      '2010-07',
      '2010-08',
      '2010-09',
      '2010-10',
      '2010-11',
      '2010-12',
      JAN,
      FEB,
      MAR,
    ]);
    expect(view.trend.slice(-3).map((entry) => entry.figures.panelsAccepted)).toEqual([
      100, 80, 120,
    ]);
    expect(view.trend[0].figures).toEqual(figures({}));
    expect(view.breakdown).toEqual([]);
    // Months before the chapter opened are not expected: nothing is counted missing there.
    expect(view.trend[0].compliance).toEqual(compliance({}));
  });

  it('combines a custom range from months: flows summed, stock from the last month', async () => {
    const response = await as('admin')
      .get(chapterUrl(`periodKind=custom&from=${JAN}&to=${MAR}`))
      .expect(200);
    const view = response.body as DashboardView;
    expect(view.period).toMatchObject({ kind: 'custom', from: JAN, to: MAR });
    const current = view.current.figures;
    expect(current.panelsAccepted).toBe(100 + 80 + 120);
    expect(current.panelsUsed).toBe(60 + 120 + 40);
    expect(current.blanketsGiven).toBe(2 + 7 + 1);
    expect(current.volunteerHours).toBeCloseTo(40 + 55.5 + 30, 6);
    expect(current.peopleServedByGroup).toEqual({
      infants: 1,
      children: 4,
      adults: 4,
      olderAdults: 1,
      disasterAffected: 0,
    });
    expect(current.panelsInStock).toBe(180);
    expect(current.blanketsInStock).toBe(5);
    expect(current.approvedTallies).toBe(3);
    expect(view.current.compliance).toEqual(compliance({ expected: 3, onTime: 2, late: 1 }));
    expect(view.current.pendingTallies).toBe(1);
    // The three months before, with no snapshots: empty.
    expect(view.previous?.period).toMatchObject({ kind: 'custom', from: '2010-10', to: '2010-12' });
    expect(view.previous?.figures).toEqual(figures({}));
    expect(view.trend.map((entry) => entry.period.key)).toEqual([JAN, FEB, MAR]);
  });

  it('gives a quarter as its months add up, for the chapter (live) and its region (stored)', async () => {
    const chapter = await as('admin')
      .get(chapterUrl('periodKind=quarter&period=2011-Q1'))
      .expect(200);
    expect((chapter.body as DashboardView).current.figures).toMatchObject({
      panelsAccepted: 300,
      panelsInStock: 180,
      approvedTallies: 3,
    });

    const region = await as('coordinator')
      .get(`/api/dashboards/regions/${home.region.id}?period=2011-Q1`)
      .expect(200);
    const view = region.body as DashboardView;
    expect(view.period).toMatchObject({ kind: 'quarter', key: '2011-Q1', from: JAN, to: MAR });
    expect(view.current.figures.panelsAccepted).toBe(300);
    expect(view.current.figures.panelsInStock).toBe(180);
    expect(view.previous?.period.key).toBe('2010-Q4');
    expect(view.trend.map((entry) => entry.figures.panelsAccepted)).toEqual([100, 80, 120]);
  });

  it('breaks a region down by its chapters, by name, and the network by region', async () => {
    const region = await as('coordinator')
      .get(`/api/dashboards/regions/${home.region.id}?periodKind=month&period=${MAR}`)
      .expect(200);
    const byChapter = (region.body as DashboardView).breakdown;
    expect(
      byChapter.map((entry) => [entry.scope, entry.scopeName, entry.figures.panelsAccepted]),
    ).toEqual([
      ['chapter', home.chapters[1].name, 0],
      ['chapter', home.chapters[0].name, 120],
    ]);

    const network = await as('writer').get(`/api/dashboards/network?period=${MAR}`).expect(200);
    const view = network.body as DashboardView;
    expect(view.scope).toBe('network');
    expect(view.scopeId).toBeNull();
    expect(view.current.figures.panelsAccepted).toBe(129);
    expect(view.previous?.figures.panelsAccepted).toBe(80);
    const ours = view.breakdown.filter((entry) =>
      [home.region.id, away.region.id].includes(entry.scopeId ?? -1),
    );
    expect(
      ours.map((entry) => [entry.scope, entry.scopeName, entry.figures.panelsAccepted]),
    ).toEqual([
      ['region', away.region.name, 9],
      ['region', home.region.name, 120],
    ]);
  });

  it('keeps each role to its scope', async () => {
    const [chapterA, chapterB] = home.chapters;
    const far = away.chapters[0];
    const status = async (who: keyof typeof tokens, url: string) =>
      `${who} ${url.replace(/\d+/g, (id) => idName(Number(id)))} → ${(await as(who).get(url)).status}`;
    const idName = (id: number) =>
      ({
        [chapterA.id]: 'A',
        [chapterB.id]: 'B',
        [far.id]: 'Far',
        [home.region.id]: 'Home',
        [away.region.id]: 'Away',
      })[id] ?? String(id);
    const checks: Array<[keyof typeof tokens, string, number]> = [
      ['lead', `/api/dashboards/chapters/${chapterA.id}`, 200],
      ['lead', `/api/dashboards/chapters/${chapterB.id}`, 404],
      ['lead', `/api/dashboards/chapters/${far.id}`, 404],
      ['lead', `/api/dashboards/regions/${home.region.id}`, 404],
      ['coordinator', `/api/dashboards/regions/${home.region.id}`, 200],
      ['coordinator', `/api/dashboards/chapters/${chapterB.id}`, 200],
      ['coordinator', `/api/dashboards/regions/${away.region.id}`, 404],
      ['coordinator', `/api/dashboards/chapters/${far.id}`, 404],
      ['writer', `/api/dashboards/regions/${away.region.id}`, 200],
      ['writer', `/api/dashboards/chapters/${far.id}`, 200],
      ['admin', '/api/dashboards/regions/987654321', 404],
    ];
    const expected = checks.map(
      ([who, url, code]) => `${who} ${url.replace(/\d+/g, (id) => idName(Number(id)))} → ${code}`,
    );
    const actual: string[] = [];
    for (const [who, url] of checks) actual.push(await status(who, url));
    expect(actual).toEqual(expected);
  });

  it('sends regional roles from the network dashboard to their own (403)', async () => {
    const coordinator = await as('coordinator').get('/api/dashboards/network').expect(403);
    expect((coordinator.body as { message: string }).message).toBe(
      `Your dashboard is your region's: /api/dashboards/regions/${home.region.id}`,
    );
    const lead = await as('lead').get('/api/dashboards/network').expect(403);
    expect((lead.body as { message: string }).message).toBe(
      `Your dashboard is your chapter's: /api/dashboards/chapters/${home.chapters[0].id}`,
    );
    await testApp.http().get('/api/dashboards/network').expect(401);
  });

  it('shows the last complete month when no period is given', async () => {
    const response = await as('lead').get(chapterUrl('')).expect(200);
    const now = new Date().toISOString().slice(0, 7);
    expect((response.body as DashboardView).period).toMatchObject({
      kind: 'month',
      key: addMonths(now, -1),
    });
    const quarter = await as('lead').get(chapterUrl('periodKind=quarter')).expect(200);
    const { from, to } = (quarter.body as DashboardView).period;
    expect(from <= addMonths(now, -1) && addMonths(now, -1) <= to).toBe(true);
  });

  it.each([
    ['periodKind=weekly', 'periodKind'],
    ['periodKind=month&period=2026-13', 'period'],
    ['periodKind=quarter&period=2026-Q5', 'period'],
    ['periodKind=fiscal_year&period=2026', 'period'],
    ['periodKind=custom&to=2011-03', 'from'],
    ['periodKind=custom&from=2011-03', 'to'],
    ['periodKind=custom&from=2011-3&to=2011-04', 'from'],
    ['periodKind=custom&from=2011-05&to=2011-01', 'to'],
    // 37 months: one more than a custom range may span.
    ['periodKind=custom&from=2008-01&to=2011-01', 'to'],
    ['colour=teal', 'colour'],
  ])('refuses %s with a 400 naming %s', async (query, field) => {
    const response = await as('admin').get(chapterUrl(query)).expect(400);
    expect(fieldsNamed(response.body)).toEqual([field]);
  });

  it('accepts a custom range of exactly 36 months', async () => {
    const response = await as('admin')
      .get(chapterUrl('periodKind=custom&from=2008-04&to=2011-03'))
      .expect(200);
    const view = response.body as DashboardView;
    expect(view.trend).toHaveLength(36);
    expect(view.current.figures.panelsAccepted).toBe(300);
  });

  it('shows the network figures exactly as the newest stored network month row holds them', async () => {
    // Whatever wrote the rows (the snapshot builder over the demo, or this suite in 2011), the
    // dashboard must show the stored figures unchanged.
    const sequelize = testApp.app.get<Sequelize>(getConnectionToken());
    const newest = async () => {
      const [row] = await sequelize.query<{ key: string; figures: unknown }>(
        `SELECT period_key AS \`key\`, figures FROM report_snapshots
          WHERE scope = 'network' AND period_kind = 'month' ORDER BY period_key DESC LIMIT 1`,
        { type: QueryTypes.SELECT },
      );
      const figures = (
        typeof row.figures === 'string' ? JSON.parse(row.figures) : row.figures
      ) as SnapshotFigures;
      return { key: row.key, figures };
    };
    // Another suite's rebuild may rewrite the row in between: compare a read the row outlived.
    for (let attempt = 1; ; attempt += 1) {
      const stored = await newest();
      const response = await as('admin')
        .get(`/api/dashboards/network?periodKind=month&period=${stored.key}`)
        .expect(200);
      if (JSON.stringify(await newest()) !== JSON.stringify(stored) && attempt < 5) continue;
      expect((response.body as DashboardView).current.figures).toEqual(stored.figures);
      break;
    }
  });
});
