import { headlineRows } from '@tallyloom/reports';
import type { DashboardView, ReceiptPage } from '@tallyloom/core';
import type { Page } from 'playwright-core';
import * as XLSX from 'xlsx';
import { DEMO_SIGN_INS } from '../../db/seeders/demo-sign-ins';
import { signIn } from '../e2e/support/people-builders';
import { screenshot } from './support/browser';
import { servedAppSuite } from './support/served-app';
import { signInThroughForm } from './support/sign-in';

const grantWriter = DEMO_SIGN_INS.find((person) => person.role === 'grant_writer')!;
const staff = DEMO_SIGN_INS.find((person) => person.role === 'national_staff')!;

// Building a workbook is a background job on a two-core machine: allow it minutes, not seconds.
jest.setTimeout(300_000);

/** A fiscal year of the demo history with approved tallies in every region. */
const FISCAL_YEAR = 'FY2026';
/** A month of that history, and a region with parcels in it. */
const MONTH = { from: '2026-03-01', to: '2026-03-31' };
const REGION = 'North Ridge';

type Rows = unknown[][];

/** Every sheet of the downloaded workbook as rows of cached values (no recalculation). */
async function readDownload(
  page: Page,
  startDownload: () => Promise<void>,
): Promise<XLSX.WorkBook> {
  const [download] = await Promise.all([page.waitForEvent('download'), startDownload()]);
  const path = await download.path();
  if (!path) throw new Error(`the download of ${download.suggestedFilename()} failed`);
  return XLSX.readFile(path);
}

function sheetRows(workbook: XLSX.WorkBook, name: string): Rows {
  const sheet = workbook.Sheets[name];
  if (!sheet) throw new Error(`no sheet "${name}" in ${workbook.SheetNames.join(', ')}`);
  return XLSX.utils.sheet_to_json<unknown[]>(sheet, { header: 1, blankrows: false });
}

/** Follows the export dialog: the bar while the job writes, then the download link. */
async function downloadFromDialog(page: Page, dialogName: string, shot: string) {
  const dialog = page.getByRole('dialog', { name: dialogName });
  // The server answers "queued" first, so the bar shows before any poll can say "done".
  await dialog.getByRole('progressbar').waitFor();
  await screenshot(page, `${shot}-progress`);
  const link = dialog.getByRole('link', { name: /^Download / });
  const failed = dialog.getByText('The export failed');
  await link.or(failed).waitFor({ timeout: 240_000 });
  if (await failed.isVisible()) throw new Error(`the export failed: ${await dialog.innerText()}`);
  await screenshot(page, `${shot}-ready`);
  return readDownload(page, () => link.click());
}

describe('exports: the impact pack and a filtered parcels table, downloaded and read back', () => {
  const suite = servedAppSuite();

  /** The API's own network figures for the year, once the snapshot job has built them. */
  async function networkFigures(token: string): Promise<DashboardView> {
    for (let attempt = 0; attempt < 60; attempt++) {
      const response = await suite.app.testApp
        .http()
        .get('/api/dashboards/network')
        .query({ periodKind: 'fiscal_year', period: FISCAL_YEAR })
        .set('Authorization', `Bearer ${token}`)
        .expect(200);
      const view = response.body as DashboardView;
      if (view.current.figures.approvedTallies > 0) return view;
      await new Promise((resolve) => setTimeout(resolve, 2_000));
    }
    throw new Error(`the network snapshot for ${FISCAL_YEAR} was never built`);
  }

  it('a grant writer builds the network impact pack for a fiscal year and its figures match the dashboard', async () => {
    const { token } = await signIn(suite.app.testApp, grantWriter.email, grantWriter.password);
    const dashboard = await networkFigures(token);

    const watched = await suite.open();
    const { page } = watched;
    await page.goto('/impact-pack');
    await signInThroughForm(page, grantWriter.email, grantWriter.password);
    await page.getByRole('heading', { level: 1, name: 'Impact pack' }).waitFor();
    await page.getByRole('radio', { name: 'Whole network' }).check();
    const period = page.getByRole('group', { name: 'Period' });
    await period.getByLabel('Period').selectOption('fiscal_year');
    await period.getByLabel('Fiscal year').selectOption(FISCAL_YEAR);
    await screenshot(page, 'exports-1-impact-pack-form');
    await page.getByRole('button', { name: 'Build impact pack' }).click();

    const workbook = await downloadFromDialog(page, 'Impact pack', 'exports-2-impact-pack');
    // The headline sheet: one row per measure (people served spelled out by group).
    const shown = sheetRows(workbook, 'Headline figures')
      .slice(1)
      .map((row) => [row[0], row[1]]);
    // Other suites approve tallies of this year meanwhile: the pack must equal the dashboard as
    // read just before it was built or just after it was downloaded.
    const after = await networkFigures(token);
    const rowsOf = (view: DashboardView) =>
      headlineRows(view.current.figures).map((row) => [row.measure, row.figure]);
    expect([rowsOf(dashboard), rowsOf(after)]).toContainEqual(shown);
    expect(shown.some(([, figure]) => (figure as number) > 0)).toBe(true);
    // The cover names the period and who exported it.
    const cover = sheetRows(workbook, 'Cover').flat().join(' | ');
    expect(cover).toContain(dashboard.period.label);
    expect(cover).toContain(grantWriter.displayName);
  });

  it('national staff export the parcels of a region and a month, and the file holds what the list totals', async () => {
    const { token } = await signIn(suite.app.testApp, staff.email, staff.password);
    const watched = await suite.open();
    const { page } = watched;
    await page.goto('/receipts');
    await signInThroughForm(page, staff.email, staff.password);
    await page.getByRole('heading', { level: 1, name: 'Parcels' }).waitFor();

    const filters = page.getByRole('search', { name: 'Filter parcels' });
    await filters.getByLabel('Region').selectOption({ label: REGION });
    await page.waitForURL(/region=\d+/);
    await filters.getByLabel('Received from').fill(MONTH.from);
    await filters.getByLabel('Received to').fill(MONTH.to);
    await page.waitForURL(new RegExp(`from=${MONTH.from}.*to=${MONTH.to}`));
    const regionId = Number(new URL(page.url()).searchParams.get('region'));

    // The list's totals for these filters, from the API the list reads.
    const list = await suite.app.testApp
      .http()
      .get('/api/receipts')
      .query({ regionId, from: MONTH.from, to: MONTH.to, page: 1, pageSize: 1 })
      .set('Authorization', `Bearer ${token}`)
      .expect(200);
    const { totals } = list.body as ReceiptPage;
    expect(totals.receipts).toBeGreaterThan(0);
    await page
      .getByText(`Totals of all ${totals.receipts.toLocaleString('en-US')} matching`)
      .waitFor();
    await screenshot(page, 'exports-3-receipts-filtered');

    await page.getByRole('button', { name: 'Export parcels' }).click();
    await page.getByRole('menuitem', { name: 'Spreadsheet (.xlsx)' }).click();
    const workbook = await downloadFromDialog(page, 'Export parcels', 'exports-4-receipts');

    const rows = sheetRows(workbook, workbook.SheetNames[0]);
    const header = rows[0];
    const idColumn = header.indexOf('Receipt no.');
    const panelsColumn = header.indexOf('Panels accepted (panels)');
    const regionColumn = header.indexOf('Region');
    expect([idColumn, panelsColumn, regionColumn].every((index) => index >= 0)).toBe(true);
    const data = rows.slice(1).filter((row) => typeof row[idColumn] === 'number');
    expect(data).toHaveLength(totals.receipts);
    const panels = data.reduce((sum, row) => sum + (row[panelsColumn] as number), 0);
    expect(panels).toBe(totals.panelsAccepted);
    expect(new Set(data.map((row) => row[regionColumn]))).toEqual(new Set([REGION]));
  });
});
