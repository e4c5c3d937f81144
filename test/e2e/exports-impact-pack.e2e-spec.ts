import { getConnectionToken } from '@nestjs/sequelize';
import type { DashboardView, ExportView } from '@tallyloom/core';
import type { Sequelize } from 'sequelize-typescript';
import { TALLY_MEASURES } from '@tallyloom/reports';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import * as XLSX from 'xlsx';
import {
  downloadExport,
  exportFinished,
  libreOfficeCsv,
  snapshotsBuilt,
} from './support/export-downloads';
import { signedIn } from './support/people-builders';
import { startTestApp, type TestApp } from './support/test-app';

jest.setTimeout(300_000);

// The demo's last complete fiscal year (July to June): every demo chapter has approved months in it.
const FISCAL_YEAR = 'FY2026';

describe('the impact pack through the exports job', () => {
  let testApp: TestApp;
  let writer: string;
  let dir: string;
  let view: ExportView;
  let progress: number[];
  let file: string;
  let book: XLSX.WorkBook;
  let dashboardBefore: DashboardView['current']['figures'];

  beforeAll(async () => {
    testApp = await startTestApp();
    writer = (await signedIn(testApp, 'grant_writer')).token;
    await snapshotsBuilt(testApp.app.get<Sequelize>(getConnectionToken()), FISCAL_YEAR);
    dashboardBefore = (
      (
        await testApp
          .http()
          .get(`/api/dashboards/network?periodKind=fiscal_year&period=${FISCAL_YEAR}`)
          .set('Authorization', `Bearer ${writer}`)
      ).body as DashboardView
    ).current.figures;
    dir = await mkdtemp(join(tmpdir(), 'exports-impact-pack-'));
    ({ view, progress } = await exportFinished(testApp, writer, '/api/exports/impact-pack', {
      scope: 'network',
      periodKind: 'fiscal_year',
      period: FISCAL_YEAR,
    }));
    const bytes = await downloadExport(testApp, view);
    file = join(dir, view.fileName);
    await writeFile(file, bytes);
    // SheetJS, independent of the exceljs that wrote it.
    book = XLSX.read(bytes, { type: 'buffer', cellDates: true });
  });
  afterAll(async () => {
    await testApp.close();
    await rm(dir, { recursive: true, force: true });
  });

  it('runs as a job whose progress rises to 100 and ends with a signed link', () => {
    expect(view).toMatchObject({ kind: 'impact-pack', format: 'xlsx', state: 'done', table: null });
    expect(view.description).toMatch(/^Impact pack · Whole network · FY/);
    expect(progress[0]).toBeLessThan(100);
    expect(progress.at(-1)).toBe(100);
    expect(progress).toEqual([...progress].sort((a, b) => a - b));
    expect(view.sheets).toBe(book.SheetNames.length);
    expect(view.downloadUrl).toMatch(
      /^\/api\/exports\/[0-9a-f-]{36}\/file\?expires=\d+&signature=/,
    );
  });

  it("holds the headline figures of the grant writer's own network dashboard", async () => {
    const dashboard = async () => {
      const response = await testApp
        .http()
        .get(`/api/dashboards/network?periodKind=fiscal_year&period=${FISCAL_YEAR}`)
        .set('Authorization', `Bearer ${writer}`);
      expect(response.status).toBe(200);
      return (response.body as DashboardView).current.figures;
    };
    const rows = XLSX.utils.sheet_to_json<unknown[]>(book.Sheets['Headline figures'], {
      header: 1,
      raw: true,
    });
    const shown = new Map(rows.slice(1).map((row) => [String(row[0]), Number(row[1])]));
    const scalars = TALLY_MEASURES.filter((measure) => measure.key !== 'peopleServedByGroup');
    expect(scalars).toHaveLength(12);
    const inPack = scalars.map((measure) => [measure.label, shown.get(measure.label)]);
    const onScreen = (figures: DashboardView['current']['figures']) =>
      scalars.map((measure) => [measure.label, Number(figures[measure.key])]);
    // Other suites approve tallies meanwhile: the pack equals the dashboard as read just before
    // the export, unless a rebuild landed in between (then the one read now).
    const now = onScreen(await dashboard());
    expect([onScreen(dashboardBefore), now]).toContainEqual(inPack);
    expect(dashboardBefore.blanketsGiven).toBeGreaterThan(0);
  });

  it('opens in LibreOffice, whose first sheet is the cover with the title', async () => {
    const cover = await libreOfficeCsv(file, dir);
    expect(cover[0][0]).toBe('Impact pack');
    expect(cover.map((row) => row[0])).toContain('Scope');
  });
});
