import { BadRequestException, NotFoundException } from '@nestjs/common';
import { getConnectionToken } from '@nestjs/sequelize';
import {
  monthsOf,
  parsePeriod,
  PEOPLE_GROUPS,
  SNAPSHOT_MEASURES,
  type CampaignProgressView,
  type DashboardView,
  type ImpactPackRequest,
  type SnapshotFigures,
  type TraceView,
} from '@tallyloom/core';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import * as XLSX from 'xlsx';
import type { Actor } from '../../services/api/src/common/access/actor';
import { AppConfig } from '../../services/api/src/config/app-config';
import { ImpactPackProducer } from '../../services/api/src/impact-pack/impact-pack.producer';
import { SnapshotBuilder } from '../../services/api/src/reports/snapshot-builder.service';
import { SettingsService } from '../../services/api/src/settings/settings.service';
import { caller } from './fixtures/tallies';
import { signedIn } from './support/people-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(300_000);

// The fiscal year before the demo's current one: every demo chapter has approved months in it.
const FISCAL_YEAR = 'FY2026';
const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

type Grid = unknown[][];

/** SheetJS's zip reader (typed loosely by the package): to see the files inside the xlsx. */
interface ZipEntries {
  FullPaths: string[];
}
const zipReader = XLSX.CFB as unknown as {
  read(data: Buffer, options: { type: 'buffer' }): ZipEntries;
  find(zip: ZipEntries, path: string): { content: Uint8Array } | null;
};

/** A cell as text for comparisons and the personal-data scan. */
function textOf(cell: unknown): string {
  if (cell instanceof Date) return cell.toISOString();
  if (typeof cell === 'string' || typeof cell === 'number' || typeof cell === 'boolean')
    return String(cell);
  return JSON.stringify(cell);
}

interface Pack {
  book: XLSX.WorkBook;
  file: Buffer;
  progress: number[];
  result: { rows: number; sheets: number };
}

describe('impact pack workbook on the demo network', () => {
  let testApp: TestApp;
  let sequelize: Sequelize;
  let producer: ImpactPackProducer;
  let writer: Actor;
  let writerName: string;
  let writerToken: string;
  let folder: string;
  let fiscalYearStartMonth: number;
  const packs: Pack[] = [];

  const select = <T extends object>(sql: string, replacements: Record<string, unknown> = {}) =>
    sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements });

  async function produce(params: ImpactPackRequest): Promise<Pack> {
    const filePath = join(folder, `pack-${packs.length}.xlsx`);
    const progress: number[] = [];
    const result = await producer.produce(params, {
      actor: writer,
      filePath,
      progress: (percent) => {
        progress.push(percent);
        return Promise.resolve();
      },
    });
    const file = readFileSync(filePath);
    // SheetJS, not exceljs: an independent reader of what was written.
    const pack = {
      book: XLSX.read(file, { type: 'buffer', cellDates: true }),
      file,
      progress,
      result,
    };
    packs.push(pack);
    return pack;
  }

  function grid(pack: Pack, sheet: string): Grid {
    const worksheet = pack.book.Sheets[sheet];
    if (!worksheet) throw new Error(`no sheet ${sheet}`);
    return XLSX.utils.sheet_to_json<unknown[]>(worksheet, { header: 1, raw: true, defval: null });
  }

  /** Rows of a table sheet keyed by header, with the totals row apart. */
  function table(pack: Pack, sheet: string) {
    const [headers, ...rest] = grid(pack, sheet);
    const keyed = rest.map((row) =>
      Object.fromEntries((headers as string[]).map((header, index) => [header, row[index]])),
    );
    const totalIndex = keyed.findIndex((row) => row[headers[0] as string] === 'Total');
    return {
      headers: headers as string[],
      rows: totalIndex >= 0 ? keyed.slice(0, totalIndex) : keyed,
      total: totalIndex >= 0 ? keyed[totalIndex] : null,
      totalRow: totalIndex + 2,
    };
  }

  /** A figure as the workbook should show it, by measure label (from the header row). */
  function figuresRow(figures: SnapshotFigures): Record<string, number> {
    const labels: Record<(typeof SNAPSHOT_MEASURES)[number], string> = {
      panelsAccepted: 'Panels received',
      panelsSetAside: 'Panels set aside',
      panelsUsed: 'Panels used in assembly',
      blanketsAssembled: 'Blankets made',
      blanketsReceived: 'Finished blankets received',
      blanketsGiven: 'Blankets given',
      peopleServed: 'People served',
      volunteerHours: 'Volunteer hours',
      yarnKg: 'Yarn donated (kg)',
      panelsInStock: 'Panels in stock',
      blanketsInStock: 'Blankets in stock',
      approvedTallies: 'Approved tallies',
    };
    return Object.fromEntries(SNAPSHOT_MEASURES.map((key) => [labels[key], round(figures[key])]));
  }

  const round = (value: unknown) => Math.round(Number(value) * 100) / 100;

  /** Flows of approved revisions per chapter for the months given, straight from the tables. */
  async function recompute(from: string, to: string) {
    return select<{
      chapter_id: number;
      region_id: number;
      panels: string;
      given: string;
      served: string;
      hours: string;
      tallies: number;
    }>(
      `SELECT t.chapter_id, c.region_id, SUM(r.panels_accepted) AS panels,
              SUM((SELECT COALESCE(SUM(g.count), 0) FROM tally_blankets_given g WHERE g.revision_id = r.id)) AS given,
              SUM((SELECT COALESCE(SUM(p.count), 0) FROM tally_people_served p WHERE p.revision_id = r.id)) AS served,
              SUM(r.volunteer_hours) AS hours, COUNT(*) AS tallies
         FROM monthly_tallies t
         JOIN chapters c ON c.id = t.chapter_id
         JOIN tally_revisions r ON r.tally_id = t.id AND r.revision = t.approved_revision
        WHERE t.month >= :from AND t.month <= :to
        GROUP BY t.chapter_id, c.region_id
        ORDER BY t.chapter_id`,
      { from: `${from}-01`, to: `${to}-01` },
    );
  }

  function sumWhere(
    rows: Awaited<ReturnType<typeof recompute>>,
    keep: (row: { chapter_id: number; region_id: number }) => boolean,
  ) {
    const mine = rows.filter((row) =>
      keep({ chapter_id: Number(row.chapter_id), region_id: Number(row.region_id) }),
    );
    const add = (pick: (row: (typeof rows)[number]) => unknown) =>
      round(mine.reduce((sum, row) => sum + Number(pick(row)), 0));
    return {
      'Panels received': add((row) => row.panels),
      'Blankets given': add((row) => row.given),
      'People served': add((row) => row.served),
      'Volunteer hours': add((row) => row.hours),
      'Approved tallies': add((row) => row.tallies),
    };
  }

  const pick = (row: Record<string, unknown>, keys: string[]) =>
    Object.fromEntries(keys.map((key) => [key, round(row[key])]));

  /** Every SUM in a totals row: the formula's range and its cached value against the rows. */
  function checkTotals(pack: Pack, sheet: string) {
    const { headers, rows, totalRow } = table(pack, sheet);
    const worksheet = pack.book.Sheets[sheet];
    const problems: string[] = [];
    let sums = 0;
    headers.forEach((header, index) => {
      const cell = worksheet[XLSX.utils.encode_cell({ r: totalRow - 1, c: index })] as
        XLSX.CellObject | undefined;
      if (!cell?.f) return;
      sums += 1;
      const letter = XLSX.utils.encode_col(index);
      const expected = round(
        rows.reduce((sum, row) => sum + (typeof row[header] === 'number' ? row[header] : 0), 0),
      );
      if (cell.f !== `SUM(${letter}2:${letter}${totalRow - 1})`)
        problems.push(`${header}: formula ${cell.f}`);
      if (round(cell.v) !== expected)
        problems.push(`${header}: cached ${String(cell.v)} ≠ ${expected}`);
    });
    return { problems, sums };
  }

  beforeAll(async () => {
    testApp = await startTestApp();
    sequelize = testApp.app.get<Sequelize>(getConnectionToken());
    producer = testApp.app.get(ImpactPackProducer);
    ({ fiscalYearStartMonth } = await testApp.app.get(SettingsService).current());
    // Snapshots as of now, so the pack, the dashboard and the recompute read the same approvals.
    await testApp.app.get(SnapshotBuilder).rebuildAll();
    const built = await signedIn(testApp, 'grant_writer');
    writer = {
      id: built.user.id,
      email: built.email,
      role: 'grant_writer',
      regionId: null,
      chapterId: null,
    };
    writerName = built.user.displayName;
    writerToken = built.token;
    // One data year of the fiscal year gets an hourly value if it has none, so the pack shows a
    // valued year beside one without (the demo sets values for 2022 and 2023 only).
    const valued = await select<{ n: number }>(
      'SELECT COUNT(*) AS n FROM volunteer_hour_values WHERE data_year = 2025',
    );
    if (Number(valued[0].n) === 0) {
      const admin = await signedIn(testApp, 'network_admin');
      const response = await caller(testApp, admin.token).post(
        '/api/settings/volunteer-hour-values',
        {
          dataYear: 2025,
          hourlyValue: 34.79,
          source: 'Impact pack test value for 2025 (invented)',
        },
      );
      expect(response.status).toBe(201);
    }
    folder = mkdtempSync(join(tmpdir(), 'impact-pack-'));
  });
  afterAll(async () => {
    rmSync(folder, { recursive: true, force: true });
    await testApp.close();
  });

  const dashboard = async (url: string): Promise<DashboardView> => {
    const response = await caller(testApp, writerToken).get(url);
    expect(response.status).toBe(200);
    return response.body as DashboardView;
  };

  describe('a fiscal-year network pack', () => {
    let pack: Pack;
    let view: DashboardView;
    let direct: Awaited<ReturnType<typeof recompute>>;
    let givenByKind: Awaited<ReturnType<typeof blanketsGivenByKind>>;
    const period = () => parsePeriod('fiscal_year', FISCAL_YEAR, fiscalYearStartMonth);
    const blanketsGivenByKind = () =>
      select<{ kind: string; given: string }>(
        `SELECT a.kind, SUM(g.count) AS given FROM tally_blankets_given g
           JOIN partner_agencies a ON a.id = g.partner_agency_id
           JOIN tally_revisions r ON r.id = g.revision_id
           JOIN monthly_tallies t ON t.id = r.tally_id AND t.approved_revision = r.revision
          WHERE t.month BETWEEN :from AND :to GROUP BY a.kind ORDER BY a.kind`,
        { from: `${period().from}-01`, to: `${period().to}-01` },
      );
    const networkView = () =>
      dashboard(`/api/dashboards/network?periodKind=fiscal_year&period=${FISCAL_YEAR}`);
    /** What a concurrent approval or submission elsewhere would change, without the as-of times. */
    const figuresOf = (shown: DashboardView) =>
      JSON.stringify([
        shown.current.figures,
        shown.current.pendingTallies,
        shown.breakdown.map((child) => [child.scopeName, child.figures]),
      ]);

    beforeAll(async () => {
      // Other suites approve and submit tallies of this fiscal year in their own regions while
      // this one runs. The pack, the dashboard and the recompute are compared only when they
      // were read in a window where neither the approvals nor the dashboard changed.
      for (let attempt = 1; ; attempt += 1) {
        const before = JSON.stringify([
          await recompute(period().from, period().to),
          await blanketsGivenByKind(),
        ]);
        await testApp.app.get(SnapshotBuilder).rebuildAll();
        const shownBefore = await networkView();
        pack = await produce({ scope: 'network', periodKind: 'fiscal_year', period: FISCAL_YEAR });
        view = await networkView();
        direct = await recompute(period().from, period().to);
        givenByKind = await blanketsGivenByKind();
        const quiet =
          before === JSON.stringify([direct, givenByKind]) &&
          figuresOf(shownBefore) === figuresOf(view);
        if (quiet) break;
        if (attempt === 5) throw new Error('the network kept changing during five attempts');
      }
    });

    it('has every sheet, reports progress up to 100 and counts its data rows', () => {
      expect(pack.book.SheetNames).toEqual([
        'Cover',
        'Headline figures',
        'By region',
        'By month',
        'By agency kind',
        'People by group',
        'Campaigns',
        'Volunteer value',
        'Charts',
        'Methodology',
        'Data dictionary',
      ]);
      expect(pack.result.sheets).toBe(11);
      expect(pack.progress.at(-1)).toBe(100);
      expect(pack.progress).toEqual([...pack.progress].sort((a, b) => a - b));
      expect(pack.result.rows).toBeGreaterThan(50);
    });

    it('states on the cover the scope, period, as of, who exported and the funders caution', () => {
      const lines = new Map(grid(pack, 'Cover').map((row) => [String(row[0]), row[1]]));
      expect(grid(pack, 'Cover')[0][0]).toBe('Impact pack');
      expect(lines.get('Scope')).toBe('Whole network');
      expect(lines.get('Period')).toBe(`${period().label}: ${period().from}-01 to 2026-06-30`);
      expect(lines.get('Exported by')).toBe(`${writerName} (Grant writer)`);
      // A spreadsheet date keeps about a millisecond: compare within one second.
      const oldest = Math.min(
        ...[view.current, ...view.trend, ...view.breakdown].map((v) => Date.parse(v.asOf)),
      );
      expect(Math.abs((lines.get('As of') as Date).getTime() - oldest)).toBeLessThan(1000);
      expect(String(lines.get('Caution'))).toMatch(
        /^Figures for funders are estimates built from volunteer reports/,
      );
      expect(String(lines.get('Pending tallies'))).toBe(
        `${view.current.pendingTallies} filed but not approved yet: not included in any figure.`,
      );
    });

    it('gives the dashboard’s headline figures, which equal a recompute from approved revisions', () => {
      const headline = new Map(
        grid(pack, 'Headline figures')
          .slice(1)
          .map((row) => [String(row[0]), round(row[1])]),
      );
      const expected = figuresRow(view.current.figures);
      for (const group of PEOPLE_GROUPS) {
        const label = {
          infants: 'Infants',
          children: 'Children',
          adults: 'Adults',
          olderAdults: 'Older adults',
          disasterAffected: 'Disaster-affected',
        }[group];
        expected[`People served by group: ${label}`] =
          view.current.figures.peopleServedByGroup[group];
      }
      expect(Object.fromEntries(headline)).toEqual(expected);
      const whole = sumWhere(direct, () => true);
      expect(pick(Object.fromEntries(headline), Object.keys(whole))).toEqual(whole);
    });

    it('gives one row per region equal to the dashboard and the recompute, with SUM totals', async () => {
      const { rows } = table(pack, 'By region');
      const regions = await select<{ id: number; name: string }>('SELECT id, name FROM regions');
      const idOf = new Map(regions.map((region) => [region.name, Number(region.id)]));
      // Other suites add regions while this one runs: every region the dashboard showed is in
      // the pack, in the same order, and each of them agrees.
      const names = rows.map((row) => row.Region);
      const shown = view.breakdown.map((child) => child.scopeName);
      expect(names.filter((name) => shown.includes(String(name)))).toEqual(shown);
      for (const child of view.breakdown) {
        const row = rows.find((each) => each.Region === child.scopeName)!;
        expect([child.scopeName, pick(row, Object.keys(figuresRow(child.figures)))]).toEqual([
          child.scopeName,
          figuresRow(child.figures),
        ]);
        const own = sumWhere(direct, (r) => r.region_id === idOf.get(child.scopeName));
        expect([child.scopeName, pick(row, Object.keys(own))]).toEqual([child.scopeName, own]);
        expect(row['Trace reference']).toBe(`region:${child.scopeId}:${FISCAL_YEAR}`);
      }
      const totals = checkTotals(pack, 'By region');
      expect(totals.problems).toEqual([]);
      expect(totals.sums).toBeGreaterThan(8);
    });

    it("links each row's trace reference to that trace in the app, which shows the row's figure", async () => {
      const { rows, headers } = table(pack, 'By region');
      const sheet = pack.book.Sheets['By region'];
      const column = headers.indexOf('Trace reference');
      const row = rows.find((each) => Number(each['Approved tallies']) > 0)!;
      const cell = sheet[
        XLSX.utils.encode_cell({ r: rows.indexOf(row) + 1, c: column })
      ] as XLSX.CellObject;
      // The text stays the plain reference; the hyperlink is the app's trace page of it.
      expect(cell.v).toBe(row['Trace reference']);
      const target = new URL(String(cell.l?.Target));
      const appUrl = new URL(testApp.app.get(AppConfig).appUrl);
      expect(target.origin).toBe(appUrl.origin);
      const [, page, encoded] = target.pathname.split('/');
      expect(page).toBe('trace');
      const reference = decodeURIComponent(encoded);
      expect(reference).toBe(row['Trace reference']);

      const auditor = await signedIn(testApp, 'auditor');
      const response = await caller(testApp, auditor.token).get(`/api/trace/${reference}`);
      expect(response.status).toBe(200);
      const trace = response.body as TraceView;
      expect(trace.agrees).toBe(true);
      expect([reference, trace.figure.blanketsGiven, trace.figure.panelsAccepted]).toEqual([
        reference,
        row['Blankets given'],
        row['Panels received'],
      ]);
    });

    it('gives one row per month of the period with totals and trace references', () => {
      const { rows } = table(pack, 'By month');
      expect(rows.map((row) => (row.Month as Date).toISOString().slice(0, 7))).toEqual(
        monthsOf(period()),
      );
      const trend = new Map(view.trend.map((month) => [month.period.from, month]));
      for (const row of rows) {
        const month = (row.Month as Date).toISOString().slice(0, 7);
        expect([month, pick(row, Object.keys(figuresRow(trend.get(month)!.figures)))]).toEqual([
          month,
          figuresRow(trend.get(month)!.figures),
        ]);
        expect(row['Trace reference']).toBe(`network:${month}`);
      }
      expect(checkTotals(pack, 'By month').problems).toEqual([]);
    });

    it('values volunteer hours by data year at the configured rate, and says when none is set', async () => {
      const { rows, total } = table(pack, 'Volunteer value');
      const byMonth = table(pack, 'By month').rows;
      const values = await select<{ data_year: number; hourly_value: string; source: string }>(
        'SELECT data_year, hourly_value, source FROM volunteer_hour_values',
      );
      const rate = new Map(values.map((v) => [Number(v.data_year), v]));
      const sheet = pack.book.Sheets['Volunteer value'];
      let valuedTotal = 0;
      expect(rows.map((row) => row['Data year'])).toEqual(['2025', '2026']);
      rows.forEach((row, index) => {
        const year = Number(row['Data year']);
        const hours = round(
          byMonth
            .filter((m) => (m.Month as Date).getUTCFullYear() === year)
            .reduce((sum, m) => sum + Number(m['Volunteer hours']), 0),
        );
        expect([year, round(row['Volunteer hours'])]).toEqual([year, hours]);
        const setting = rate.get(year);
        const cell = sheet[`E${index + 2}`] as XLSX.CellObject;
        if (setting) {
          expect([year, cell.f, round(cell.v)]).toEqual([
            year,
            `B${index + 2}*C${index + 2}`,
            round(hours * Number(setting.hourly_value)),
          ]);
          expect(String(row['Published source'])).toContain(setting.source);
          valuedTotal += hours * Number(setting.hourly_value);
        } else {
          expect([year, cell.v]).toEqual([year, `no value set for ${year}`]);
        }
      });
      // 2025 has a value (set above if the demo lacked it); the demo sets none for 2026.
      expect(rate.has(2025)).toBe(true);
      expect(round(total?.['Estimated value'])).toBe(round(valuedTotal));
      expect(checkTotals(pack, 'Volunteer value').problems).toEqual([]);
    });

    it('splits blankets given and people served by agency kind, adding up to the headline', () => {
      const { rows, total } = table(pack, 'By agency kind');
      const labels: Record<string, string> = {
        family_shelter: 'Family shelter',
        neonatal_or_childrens_ward: "Neonatal or children's ward",
        care_home: 'Care home',
        outreach: 'Outreach',
        disaster_relief: 'Disaster relief',
        other: 'Other',
      };
      for (const row of givenByKind) {
        expect(rows.find((r) => r['Agency kind'] === labels[row.kind])?.['Blankets given']).toBe(
          Number(row.given),
        );
      }
      expect(total?.['Blankets given']).toBe(view.current.figures.blanketsGiven);
      expect(total?.['People served']).toBe(view.current.figures.peopleServed);
      expect(checkTotals(pack, 'By agency kind').problems).toEqual([]);
    });

    it('documents every column of every sheet in the data dictionary', () => {
      const dictionary = new Set(
        grid(pack, 'Data dictionary')
          .slice(1)
          .map((row) => `${String(row[0])}|${String(row[1])}`),
      );
      const missing: string[] = [];
      for (const name of pack.book.SheetNames) {
        const sheet = pack.book.Sheets[name];
        const frozen = name === 'Cover' ? 3 : 1;
        const header = grid(pack, name)[frozen - 1] ?? [];
        for (const cell of header)
          if (cell !== null && !dictionary.has(`${name}|${textOf(cell)}`))
            missing.push(`${name}|${textOf(cell)}`);
        expect([name, sheet['!ref'] !== undefined]).toEqual([name, true]);
      }
      expect(missing).toEqual([]);
    });

    it('embeds the charts as PNG images', () => {
      const zip = zipReader.read(pack.file, { type: 'buffer' });
      const media = zip.FullPaths.filter((path: string) => /xl\/media\/.+\.png$/.test(path));
      expect(media.length).toBe(3);
      for (const path of media) {
        const content = Buffer.from(zipReader.find(zip, path)!.content);
        expect([
          path,
          content.subarray(0, 8).equals(PNG_SIGNATURE),
          content.length > 10_000,
        ]).toEqual([path, true, true]);
      }
      const titles = grid(pack, 'Charts').map((row) => row[0]);
      expect(titles).toContain(`Blankets given by region · ${period().label}`);
    });

    it('says how the figures were made and names the known gaps', () => {
      const text = grid(pack, 'Methodology')
        .map((row) => `${String(row[0])}: ${String(row[1])}`)
        .join('\n');
      expect(text).toMatch(/Approved tallies only/);
      expect(text).toContain(`This pack has ${view.current.pendingTallies} pending`);
      expect(text).toContain(`${view.current.compliance.missing} missing`);
      expect(text).toMatch(/fiscal year starts in July/);
      expect(text).toContain('No value of an hour is set for 2026');
    });
  });

  describe('a region pack', () => {
    it('gives the region’s dashboard figures, one row per chapter equal to the recompute', async () => {
      const [region] = await select<{ id: number; name: string }>(
        "SELECT id, name FROM regions WHERE name = 'North Ridge'",
      );
      const pack = await produce({
        scope: 'region',
        scopeId: Number(region.id),
        periodKind: 'quarter',
        period: '2026-Q1',
      });
      const view = await dashboard(
        `/api/dashboards/regions/${region.id}?periodKind=quarter&period=2026-Q1`,
      );
      expect(pack.book.SheetNames[2]).toBe('By chapter');
      const headline = new Map(
        grid(pack, 'Headline figures')
          .slice(1)
          .map((row) => [String(row[0]), round(row[1])]),
      );
      expect(
        pick(Object.fromEntries(headline), Object.keys(figuresRow(view.current.figures))),
      ).toEqual(figuresRow(view.current.figures));
      const chapters = await select<{ id: number; name: string }>(
        'SELECT id, name FROM chapters WHERE region_id = :id',
        { id: region.id },
      );
      const idOf = new Map(chapters.map((chapter) => [chapter.name, Number(chapter.id)]));
      const direct = await recompute('2026-01', '2026-03');
      const { rows } = table(pack, 'By chapter');
      expect(rows.map((row) => row.Chapter)).toEqual(
        view.breakdown.map((child) => child.scopeName),
      );
      for (const [index, child] of view.breakdown.entries()) {
        const own = sumWhere(direct, (r) => r.chapter_id === idOf.get(child.scopeName));
        expect([child.scopeName, pick(rows[index], Object.keys(own))]).toEqual([
          child.scopeName,
          own,
        ]);
        expect(pick(rows[index], Object.keys(figuresRow(child.figures)))).toEqual(
          figuresRow(child.figures),
        );
        expect(rows[index]['Trace reference']).toBe(`chapter:${child.scopeId}:2026-Q1`);
      }
      expect(checkTotals(pack, 'By chapter').problems).toEqual([]);
      expect(grid(pack, 'Cover')[1][0]).toBe('North Ridge · Q1 2026');
    });
  });

  describe('a campaign pack', () => {
    it('shows the campaign alone with the progress the campaign dashboard gives', async () => {
      const [campaign] = await select<{ id: number }>(
        "SELECT id FROM campaigns WHERE code = 'DWD26'",
      );
      const pack = await produce({
        scope: 'campaign',
        scopeId: Number(campaign.id),
        periodKind: 'fiscal_year',
        period: FISCAL_YEAR,
      });
      const response = await caller(testApp, writerToken).get(
        `/api/dashboards/campaigns/${campaign.id}`,
      );
      const progress = response.body as CampaignProgressView;
      const { rows } = table(pack, 'Campaigns');
      expect(rows).toHaveLength(1);
      expect(rows[0]).toMatchObject({
        Code: 'DWD26',
        Goal: progress.goalPanels,
        Credited: progress.creditedPanels,
        Pending: progress.pendingPanels,
      });
      expect(round(rows[0]['Share done'])).toBe(round(progress.shareDone));
      expect((rows[0].Starts as Date).toISOString().slice(0, 10)).toBe(progress.startsOn);
      // A network-wide campaign reports the network's figures for the period.
      const view = await dashboard(
        `/api/dashboards/network?periodKind=fiscal_year&period=${FISCAL_YEAR}`,
      );
      const headline = new Map(
        grid(pack, 'Headline figures')
          .slice(1)
          .map((row) => [String(row[0]), round(row[1])]),
      );
      expect(headline.get('Blankets given')).toBe(view.current.figures.blanketsGiven);
      expect(String(new Map(grid(pack, 'Cover').map((row) => [row[0], row[1]])).get('Scope'))).toBe(
        `${progress.name} (DWD26) · Whole network`,
      );
    });
  });

  it('refuses a bad scope (400 naming the field) and a campaign that does not exist (404)', async () => {
    await expect(
      producer.produce(
        { scope: 'galaxy' as 'network', periodKind: 'fiscal_year', period: FISCAL_YEAR },
        { actor: writer, filePath: join(folder, 'bad.xlsx'), progress: () => Promise.resolve() },
      ),
    ).rejects.toBeInstanceOf(BadRequestException);
    await expect(
      producer.produce(
        { scope: 'campaign', scopeId: 999_999, periodKind: 'fiscal_year', period: FISCAL_YEAR },
        { actor: writer, filePath: join(folder, 'none.xlsx'), progress: () => Promise.resolve() },
      ),
    ).rejects.toBeInstanceOf(NotFoundException);
    await expect(
      producer.produce(
        { scope: 'network', periodKind: 'fiscal_year', period: 'FY26' },
        { actor: writer, filePath: join(folder, 'p.xlsx'), progress: () => Promise.resolve() },
      ),
    ).rejects.toBeInstanceOf(BadRequestException);
  });

  it('holds no personal data of any sender in any cell of any pack', async () => {
    expect(packs.length).toBeGreaterThanOrEqual(3);
    const senders = await select<{
      sender_name: string | null;
      sender_email: string | null;
      sender_address: string | null;
    }>(
      'SELECT DISTINCT sender_name, sender_email, sender_address FROM parcel_receipts WHERE sender_name IS NOT NULL OR sender_email IS NOT NULL OR sender_address IS NOT NULL',
    );
    const personal = [
      ...new Set(senders.flatMap((s) => [s.sender_name, s.sender_email, s.sender_address])),
    ]
      .filter((value): value is string => typeof value === 'string' && value.trim() !== '')
      .map((value) => value.toLowerCase());
    expect(personal.length).toBeGreaterThan(10);
    const found: string[] = [];
    for (const pack of packs) {
      for (const name of pack.book.SheetNames) {
        for (const row of grid(pack, name)) {
          for (const cell of row) {
            if (cell === null) continue;
            const text = textOf(cell).toLowerCase();
            for (const value of personal) if (text.includes(value)) found.push(`${name}: ${value}`);
          }
        }
      }
      // Document properties too.
      const props = JSON.stringify(pack.book.Props ?? {}).toLowerCase();
      for (const value of personal) if (props.includes(value)) found.push(`properties: ${value}`);
    }
    expect(found).toEqual([]);
  });
});
