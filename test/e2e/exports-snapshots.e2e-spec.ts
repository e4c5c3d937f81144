import { getConnectionToken } from '@nestjs/sequelize';
import {
  PEOPLE_GROUP_LABELS,
  PEOPLE_GROUPS,
  type ApiErrorBody,
  type DashboardView,
  type SnapshotView,
} from '@tallyloom/core';
import { TALLY_MEASURES } from '@tallyloom/reports';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import {
  csvRecords,
  downloadExport,
  everyCell,
  exportFinished,
  readBook,
  sheetTable,
  snapshotsBuilt,
} from './support/export-downloads';
import { signedIn } from './support/people-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(300_000);

// The demo's last complete fiscal year (July 2025 to June 2026).
const FY = { periodKind: 'fiscal_year', period: 'FY2026' } as const;

/** Each figure column of the export with how to read it from a snapshot. */
const FIGURE_COLUMNS: Array<[string, (view: SnapshotView) => number]> = [
  ...TALLY_MEASURES.flatMap((measure): Array<[string, (view: SnapshotView) => number]> =>
    measure.key === 'peopleServedByGroup'
      ? PEOPLE_GROUPS.map((group) => [
          `${measure.label}: ${PEOPLE_GROUP_LABELS[group]}`,
          (view) => view.figures.peopleServedByGroup[group],
        ])
      : [[measure.label, (view) => Number(view.figures[measure.key])]],
  ),
  ['Tallies expected', (view) => view.compliance.expected],
  ['Filed on time', (view) => view.compliance.onTime],
  ['Filed late', (view) => view.compliance.late],
  ['Missing', (view) => view.compliance.missing],
  ['Not due yet', (view) => view.compliance.open],
  ['Pending tallies (not in figures)', (view) => view.pendingTallies],
];

describe('snapshots exports', () => {
  let testApp: TestApp;
  let sequelize: Sequelize;
  let grantWriter: string;
  let coordinator: string;
  let chapterLead: string;
  let regionId: number;
  let otherRegionId: number;
  let chapterId: number;

  const select = <T extends object>(sql: string, replacements: unknown[] = []) =>
    sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements });

  beforeAll(async () => {
    testApp = await startTestApp();
    sequelize = testApp.app.get<Sequelize>(getConnectionToken());
    await snapshotsBuilt(sequelize, FY.period);
    const regions = await select<{ id: number }>(
      'SELECT DISTINCT c.region_id AS id FROM monthly_tallies t JOIN chapters c ON c.id = t.chapter_id ORDER BY id LIMIT 2',
    );
    [regionId, otherRegionId] = regions.map((region) => Number(region.id));
    const [chapter] = await select<{ id: number }>(
      'SELECT MIN(t.chapter_id) AS id FROM monthly_tallies t JOIN chapters c ON c.id = t.chapter_id WHERE c.region_id = ?',
      [regionId],
    );
    chapterId = Number(chapter.id);
    grantWriter = (await signedIn(testApp, 'grant_writer')).token;
    coordinator = (await signedIn(testApp, 'regional_coordinator', { regionId })).token;
    chapterLead = (await signedIn(testApp, 'chapter_lead', { chapterId })).token;
  });
  afterAll(() => testApp.close());

  const dashboard = async (token: string, path: string): Promise<DashboardView> => {
    const response = await testApp
      .http()
      .get(`${path}?periodKind=${FY.periodKind}&period=${FY.period}`)
      .set('Authorization', `Bearer ${token}`);
    expect(response.status).toBe(200);
    return response.body as DashboardView;
  };

  const exported = async (token: string, format: string, filters: object) => {
    const { view } = await exportFinished(testApp, token, '/api/exports', {
      table: 'snapshots',
      format,
      filters,
    });
    return { view, bytes: await downloadExport(testApp, view) };
  };

  /** Every sender name, e-mail and address on any parcel receipt. */
  async function senderDetails(): Promise<string[]> {
    const rows = await select<Record<string, string | null>>(
      'SELECT sender_name, sender_email, sender_address FROM parcel_receipts',
    );
    const values = rows.flatMap((row) => Object.values(row)).filter((v): v is string => !!v);
    return [...new Set(values.map((value) => value.trim()))].filter((value) => value.length >= 4);
  }

  /** A row of the export as the figures of the snapshot it copies. */
  const figuresOf = (read: (header: string) => unknown) =>
    FIGURE_COLUMNS.map(([header]) => [header, Number(read(header))]);
  const snapshotFigures = (snapshot: SnapshotView) =>
    FIGURE_COLUMNS.map(([header, read]) => [header, read(snapshot)]);

  /**
   * Other suites approve tallies and rebuild snapshots meanwhile: each row equals the snapshot
   * of its scope as the dashboard showed it just before the export or just after, and its
   * "as of" lies between the two.
   */
  function expectRowsOf(
    rows: Array<{ scope: string; figures: unknown[]; asOf: number }>,
    before: DashboardView,
    after: DashboardView,
  ) {
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) {
      const seen = [before, after].flatMap((dashboard) =>
        dashboard.breakdown.filter((snapshot) => snapshot.scopeName === row.scope),
      );
      expect(seen.length).toBeGreaterThan(0);
      expect(seen.map(snapshotFigures)).toContainEqual(row.figures);
      const times = seen.map((snapshot) => Date.parse(snapshot.asOf));
      expect(row.asOf).toBeGreaterThanOrEqual(Math.min(...times) - 1000);
      expect(row.asOf).toBeLessThanOrEqual(Math.max(...times) + 1000);
    }
    // Every scope on the screen before the export is in it.
    expect(rows.map((row) => row.scope)).toEqual(
      expect.arrayContaining(before.breakdown.map((snapshot) => snapshot.scopeName)),
    );
  }

  it("exports the network's breakdown for a grant writer: the dashboard's rows, totals, no sender data", async () => {
    const before = await dashboard(grantWriter, '/api/dashboards/network');
    const { bytes } = await exported(grantWriter, 'xlsx', { scope: 'network', ...FY });
    const after = await dashboard(grantWriter, '/api/dashboards/network');
    const book = readBook(bytes);
    const { rows, totals } = sheetTable(book, 'Report snapshots');
    expectRowsOf(
      rows.map((row) => ({
        scope: String(row.Scope),
        figures: figuresOf((header) => row[header]),
        asOf: (row['As of'] as Date).getTime(),
      })),
      before,
      after,
    );
    expect(new Set(rows.map((row) => row.Period))).toEqual(new Set([before.period.label]));
    // The totals row adds up the rows (SUBTOTAL formulas with their cached results).
    for (const [header] of FIGURE_COLUMNS)
      expect(totals?.[header]).toBeCloseTo(
        rows.reduce((sum, row) => sum + Number(row[header]), 0),
        2,
      );

    const senders = await senderDetails();
    expect(senders.length).toBeGreaterThan(0);
    const cells = everyCell(book);
    const csv = (await exported(grantWriter, 'csv', { scope: 'network', ...FY })).bytes.toString();
    for (const sender of senders) {
      expect(cells.filter((cell) => cell.includes(sender))).toEqual([]);
      expect(csv.includes(sender) ? sender : null).toBeNull();
    }
  });

  it("exports a coordinator's region: its chapters as the region dashboard shows them, totals equal to SQL", async () => {
    const filters = { scope: 'region', scopeId: regionId, ...FY };
    const path = `/api/dashboards/regions/${regionId}`;
    const before = await dashboard(coordinator, path);
    const csv = await exported(coordinator, 'csv', filters);
    const xlsx = await exported(coordinator, 'xlsx', filters);
    const after = await dashboard(coordinator, path);
    expectRowsOf(
      csvRecords(csv.bytes).map((record) => ({
        scope: record.Scope,
        figures: figuresOf((header) => record[header]),
        asOf: Date.parse(record['As of']),
      })),
      before,
      after,
    );
    // Approved revisions of the region's chapters in the fiscal year, straight from the tables.
    const [direct] = await select<{ panels: string; hours: string }>(
      `SELECT SUM(r.panels_accepted) AS panels, SUM(r.volunteer_hours) AS hours
         FROM monthly_tallies t
         JOIN chapters c ON c.id = t.chapter_id
         JOIN tally_revisions r ON r.tally_id = t.id AND r.revision = t.approved_revision
        WHERE c.region_id = ? AND t.month BETWEEN '2025-07-01' AND '2026-06-01'`,
      [regionId],
    );
    const { totals } = sheetTable(readBook(xlsx.bytes), 'Report snapshots');
    expect(Number(direct.panels)).toBeGreaterThan(0);
    expect(totals?.['Panels received']).toBe(Number(direct.panels));
    expect(totals?.['Volunteer hours']).toBeCloseTo(Number(direct.hours), 2);
  });

  it("exports a chapter lead's own chapter as its one row", async () => {
    const { bytes } = await exported(chapterLead, 'csv', {
      scope: 'chapter',
      scopeId: chapterId,
      ...FY,
    });
    const screen = await dashboard(chapterLead, `/api/dashboards/chapters/${chapterId}`);
    const records = csvRecords(bytes);
    expect(records.map((r) => r.Scope)).toEqual([screen.current.scopeName]);
    expect(Number(records[0]['Panels received'])).toBe(screen.current.figures.panelsAccepted);
  });

  it('refuses what the dashboards refuse, before anything is queued', async () => {
    const post = (token: string, filters: object) =>
      testApp
        .http()
        .post('/api/exports')
        .set('Authorization', `Bearer ${token}`)
        .send({ table: 'snapshots', format: 'csv', filters });
    const counted = async () => {
      let total = 0;
      for (const token of [coordinator, chapterLead, grantWriter]) {
        const list = await testApp
          .http()
          .get('/api/exports?pageSize=1')
          .set('Authorization', `Bearer ${token}`);
        total += (list.body as { total: number }).total;
      }
      return total;
    };
    const before = await counted();
    expect(
      (await post(coordinator, { scope: 'region', scopeId: otherRegionId, ...FY })).status,
    ).toBe(404);
    expect((await post(chapterLead, { scope: 'region', scopeId: regionId, ...FY })).status).toBe(
      404,
    );
    expect((await post(coordinator, { scope: 'network', ...FY })).status).toBe(403);
    const badPeriod = await post(grantWriter, {
      scope: 'network',
      periodKind: 'month',
      period: '2026-13',
    });
    expect(badPeriod.status).toBe(400);
    expect((badPeriod.body as ApiErrorBody).fields?.map((f) => f.field)).toContain(
      'filters.period',
    );
    const noId = await post(grantWriter, { scope: 'region', ...FY });
    expect(noId.status).toBe(400);
    expect((noId.body as ApiErrorBody).fields?.map((f) => f.field)).toContain('filters.scopeId');
    expect(await counted()).toBe(before);
  });
});
