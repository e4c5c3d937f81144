import {
  REPORTING_STATUS_LABELS,
  TALLY_STATE_LABELS,
  type TallyListParams,
  type TallyPage,
  type TallySummary,
} from '@tallyloom/core';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { getConnectionToken } from '@nestjs/sequelize';
import type { Actor } from '../../services/api/src/common/access/actor';
import { TallyExportRows } from '../../services/api/src/exports/producers/tally-export-rows';
import {
  csvRecords,
  downloadExport,
  exportFinished,
  readBook,
  sheetTable,
} from './support/export-downloads';
import { aTallyChapter, createTally } from './fixtures/tallies';
import { signedIn } from './support/people-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(300_000);

type Filters = Record<string, string | number>;

const FIGURES = {
  'Panels accepted (panels)': 'panelsAccepted',
  'Blankets assembled (blankets)': 'blanketsAssembled',
  'Blankets given (blankets)': 'blanketsGiven',
  'People served (people)': 'peopleServed',
  'Volunteer hours (hours)': 'volunteerHours',
} as const;

describe('tallies and review-queue exports', () => {
  let testApp: TestApp;
  let sequelize: Sequelize;
  let staff: string;
  let coordinator: string;
  let chapterLead: string;
  let grantWriter: string;
  let regionId: number;
  let chapterId: number;

  const select = <T extends object>(sql: string, replacements: unknown[] = []) =>
    sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements });

  beforeAll(async () => {
    testApp = await startTestApp();
    sequelize = testApp.app.get<Sequelize>(getConnectionToken());
    // The demo region and chapter with the most tallies.
    const [busiest] = await select<{ chapter_id: number; region_id: number }>(
      `SELECT t.chapter_id, c.region_id FROM monthly_tallies t JOIN chapters c ON c.id = t.chapter_id
        GROUP BY t.chapter_id, c.region_id ORDER BY COUNT(*) DESC, t.chapter_id LIMIT 1`,
    );
    regionId = Number(busiest.region_id);
    chapterId = Number(busiest.chapter_id);
    staff = (await signedIn(testApp, 'national_staff')).token;
    coordinator = (await signedIn(testApp, 'regional_coordinator', { regionId })).token;
    chapterLead = (await signedIn(testApp, 'chapter_lead', { chapterId })).token;
    grantWriter = (await signedIn(testApp, 'grant_writer')).token;
  });
  afterAll(() => testApp.close());

  /** Every page of GET /api/tallies with the same filters: what the screen shows. */
  async function listed(token: string, filters: Filters): Promise<TallySummary[]> {
    const items: TallySummary[] = [];
    for (let page = 1; ; page += 1) {
      const query = new URLSearchParams(
        Object.fromEntries(
          Object.entries({ ...filters, page, pageSize: 100 }).map(([k, v]) => [k, String(v)]),
        ),
      );
      const response = await testApp
        .http()
        .get(`/api/tallies?${query.toString()}`)
        .set('Authorization', `Bearer ${token}`);
      expect(response.status).toBe(200);
      const body = response.body as TallyPage;
      items.push(...body.items);
      if (items.length >= body.total || body.items.length === 0) return items;
    }
  }

  const exported = async (token: string, table: string, format: string, filters: Filters) => {
    const { view } = await exportFinished(testApp, token, '/api/exports', {
      table,
      format,
      filters,
    });
    return { view, bytes: await downloadExport(testApp, view) };
  };

  /** The current revisions' sums straight from the tables, for the totals row. */
  async function sqlSums(where: string, replacements: unknown[]) {
    const [row] = await select<{ panels: string; hours: string; given: string }>(
      `SELECT COALESCE(SUM(r.panels_accepted), 0) AS panels, COALESCE(SUM(r.volunteer_hours), 0) AS hours,
              COALESCE(SUM((SELECT SUM(g.count) FROM tally_blankets_given g WHERE g.revision_id = r.id)), 0) AS given
         FROM monthly_tallies t
         JOIN chapters c ON c.id = t.chapter_id
         JOIN tally_revisions r ON r.tally_id = t.id AND r.revision = t.current_revision
        WHERE ${where}`,
      replacements,
    );
    return {
      'Panels accepted (panels)': Number(row.panels),
      'Volunteer hours (hours)': Number(row.hours),
      'Blankets given (blankets)': Number(row.given),
    };
  }

  const near = (cell: unknown, iso: string | null) => {
    if (iso === null) return cell === null;
    return cell instanceof Date && Math.abs(cell.getTime() - Date.parse(iso)) < 1000;
  };

  it('exports the tallies list to xlsx as on screen, every page, with totals equal to SQL', async () => {
    // A demo region: other suites add tallies elsewhere meanwhile.
    const filters = { regionId, from: '2025-07', to: '2026-06' };
    const { view, bytes } = await exported(staff, 'tallies', 'xlsx', filters);
    const expected = await listed(staff, filters);
    expect(expected.length).toBeGreaterThan(20);
    expect(view).toMatchObject({ rows: expected.length, sheets: 1 });
    const { rows, totals } = sheetTable(readBook(bytes), 'Monthly tallies');
    expect(rows.map((row) => row['Tally no.'])).toEqual(expected.map((t) => t.id));
    rows.forEach((row, index) => {
      const t = expected[index];
      expect(row).toMatchObject({
        Chapter: t.chapterName,
        Region: t.regionName,
        Month: t.month,
        State: TALLY_STATE_LABELS[t.state],
        'Amendment pending': t.amendmentPending ? 'yes' : 'no',
        Reporting: REPORTING_STATUS_LABELS[t.reporting],
        Revision: t.revision,
        'Approved revision': t.approvedRevision,
        'Approved by': t.approvedByName,
      });
      expect((row['Due on'] as Date).toISOString().slice(0, 10)).toBe(t.dueOn);
      expect(near(row.Submitted, t.submittedAt)).toBe(true);
      expect(near(row.Approved, t.approvedAt)).toBe(true);
      expect(near(row['First submitted'], t.firstSubmittedAt)).toBe(true);
      for (const [header, key] of Object.entries(FIGURES))
        expect(row[header]).toBe(t.headline[key]);
    });
    const sums = await sqlSums(
      "c.region_id = ? AND t.month BETWEEN '2025-07-01' AND '2026-06-01'",
      [regionId],
    );
    expect(sums['Panels accepted (panels)']).toBeGreaterThan(0);
    for (const [header, sum] of Object.entries(sums)) expect(totals?.[header]).toBeCloseTo(sum, 2);
  });

  it("exports a coordinator's tallies to CSV: their region only, in the list's order", async () => {
    const filters = { sort: 'chapterName', direction: 'asc' };
    const { bytes } = await exported(coordinator, 'tallies', 'csv', filters);
    const records = csvRecords(bytes);
    const expected = await listed(coordinator, filters);
    expect(records.map((r) => Number(r['Tally no.']))).toEqual(expected.map((t) => t.id));
    const [{ name }] = await select<{ name: string }>('SELECT name FROM regions WHERE id = ?', [
      regionId,
    ]);
    expect(new Set(records.map((r) => r.Region))).toEqual(new Set([name]));
    records.forEach((record, index) => {
      const t = expected[index];
      expect(record.Submitted).toBe(t.submittedAt ?? '');
      expect(record['Due on']).toBe(t.dueOn);
      expect(Number(record['Volunteer hours (hours)'])).toBe(t.headline.volunteerHours);
      expect(Number(record['Panels accepted (panels)'])).toBe(t.headline.panelsAccepted);
    });
  });

  it("exports a chapter lead's tallies: their chapter only, nothing of a sender", async () => {
    const { bytes } = await exported(chapterLead, 'tallies', 'csv', {});
    const records = csvRecords(bytes);
    const expected = await listed(chapterLead, {});
    expect(records.map((r) => Number(r['Tally no.']))).toEqual(expected.map((t) => t.id));
    expect(new Set(expected.map((t) => t.chapterId))).toEqual(new Set([chapterId]));
    expect(Object.keys(records[0]).filter((header) => /sender/i.test(header))).toEqual([]);
  });

  it('pages the submittedAt sort by keyset across NULLs, both ways, as the list orders it', async () => {
    const built = await signedIn(testApp, 'national_staff');
    const actor: Actor = {
      id: built.user.id,
      email: built.email,
      role: 'national_staff',
      regionId: null,
      chapterId: null,
    };
    const rowsReader = testApp.app.get(TallyExportRows, { strict: false });
    // A chapter of its own: drafts (NULL submission times), and submitted times with a tie.
    const own = await aTallyChapter(testApp);
    const ids: number[] = [];
    for (let month = 1; month <= 9; month += 1) {
      const tally = await createTally(testApp, own.lead.token, {
        chapterId: own.chapter.id,
        month: `2024-0${month}`,
        ...(month === 1 ? { opening: { panels: 0, blankets: 0 } } : {}),
      });
      ids.push(tally.id);
    }
    const submittedAt = ['2024-05-01 10:00:00', '2024-03-02 09:00:00', '2024-05-01 10:00:00'];
    for (const [index, at] of submittedAt.entries())
      await sequelize.query(
        'UPDATE tally_revisions SET submitted_at = ? WHERE tally_id = ? AND revision = 1',
        { replacements: [at, ids[index * 3 + 1]] },
      );
    const filters: TallyListParams = { chapterId: own.chapter.id };
    for (const direction of ['asc', 'desc'] as const) {
      const read: number[] = [];
      // Two rows a read: page boundaries inside the NULLs and inside the tie.
      for await (const page of rowsReader.pages(
        actor,
        { ...filters, sort: 'submittedAt', direction },
        2,
      ))
        read.push(...page.map((t) => t.id));
      const expected = await listed(built.token, { ...filters, sort: 'submittedAt', direction });
      expect(read).toEqual(expected.map((t) => t.id));
      // MariaDB's order: the six never submitted first going up, last going down.
      const nulls = expected.map((t) => t.submittedAt === null);
      expect(nulls).toEqual(
        direction === 'asc'
          ? [...Array<boolean>(6).fill(true), false, false, false]
          : [false, false, false, ...Array<boolean>(6).fill(true)],
      );
      expect([...read].sort()).toEqual([...ids].sort());
    }
  });

  it('exports the review queue with its own columns and filters', async () => {
    const filters = { state: 'approved', regionId };
    const { view, bytes } = await exported(coordinator, 'review-queue', 'xlsx', filters);
    const expected = await listed(coordinator, filters);
    expect(expected.length).toBeGreaterThan(0);
    const { headers, rows, totals } = sheetTable(readBook(bytes), 'Review queue');
    expect(view.rows).toBe(expected.length);
    expect(headers).toEqual([
      'Tally no.',
      'Chapter',
      'Region',
      'Month',
      'State',
      'Amendment pending',
      'Reporting',
      'Submitted',
      ...Object.keys(FIGURES),
    ]);
    expect(rows.map((row) => row['Tally no.'])).toEqual(expected.map((t) => t.id));
    rows.forEach((row, index) => {
      const t = expected[index];
      expect(row.State).toBe('Approved');
      expect(near(row.Submitted, t.submittedAt)).toBe(true);
      for (const [header, key] of Object.entries(FIGURES))
        expect(row[header]).toBe(t.headline[key]);
    });
    const sums = await sqlSums("t.state = 'approved' AND c.region_id = ?", [regionId]);
    for (const [header, sum] of Object.entries(sums)) expect(totals?.[header]).toBeCloseTo(sum, 2);
  });

  it('refuses tallies to a grant writer and the review queue to a chapter lead', async () => {
    const post = (token: string, table: string) =>
      testApp
        .http()
        .post('/api/exports')
        .set('Authorization', `Bearer ${token}`)
        .send({ table, format: 'csv', filters: {} });
    expect((await post(grantWriter, 'tallies')).status).toBe(403);
    expect((await post(grantWriter, 'review-queue')).status).toBe(403);
    expect((await post(chapterLead, 'review-queue')).status).toBe(403);
    const other = await testApp
      .http()
      .post('/api/exports')
      .set('Authorization', `Bearer ${coordinator}`)
      .send({ table: 'tallies', format: 'csv', filters: { regionId: 999_999_999 } });
    expect(other.status).toBe(404);
  });
});
