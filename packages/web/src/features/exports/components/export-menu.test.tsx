import { screen, waitFor, within } from '@testing-library/react';
import type { ExportView } from '@tallyloom/core';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import type { ChartProps } from '@/components/charts/chart';
import { paths } from '@/config/paths';
import { apiErrorBody, demoChapters, demoPeople, demoRegions } from '@/testing/fixtures';
import { aFinishedExport, anExport } from '@/testing/export-fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { demoCampaigns, receiptsPage } from '@/testing/receipt-fixtures';
import { networkDashboard, regionDashboard } from '@/testing/report-fixtures';
import { renderApp } from '@/testing/render-app';
import { talliesPage } from '@/testing/tally-fixtures';

// jsdom has no canvas for ECharts: the dashboard's charts stand in as their description.
vi.mock('@/components/charts/chart', () => ({
  Chart: ({ description }: ChartProps) => <div role="img" aria-label={description} />,
}));

type Handlers = Parameters<typeof mockApi>[0];

const exportPath = `/api/exports/${anExport().id}`;

/** Answers each GET of the export with the next state, the last one from then on. */
function states(...views: ExportView[]) {
  let index = 0;
  return () => jsonResponse(views[Math.min(index++, views.length - 1)]);
}

function mockPages(extra: Handlers = {}) {
  return mockApi({
    '/api/regions': () => jsonResponse(demoRegions),
    '/api/chapters': () => jsonResponse(demoChapters),
    '/api/campaigns': () => jsonResponse(demoCampaigns),
    'GET /api/receipts': (url) => jsonResponse(receiptsPage(url)),
    'GET /api/tallies': (url) => jsonResponse(talliesPage(url)),
    'POST /api/exports': () => jsonResponse(anExport(), 202),
    [`GET ${exportPath}`]: () => jsonResponse(aFinishedExport()),
    ...extra,
  });
}

function postedBodies(fetchMock: ReturnType<typeof mockApi>): unknown[] {
  return seenRequests(fetchMock, '/api/exports')
    .filter((request) => request.method === 'POST')
    .map((request) => request.body);
}

async function choose(user: ReturnType<typeof renderApp>['user'], button: string, item: string) {
  await user.click(await screen.findByRole('button', { name: button }));
  await user.click(await screen.findByRole('menuitem', { name: item }));
}

describe('Export menu', () => {
  beforeAll(async () => {
    await Promise.all([
      import('@/app/routes/receipts'),
      import('@/app/routes/tally-review'),
      import('@/app/routes/tallies'),
      import('@/app/routes/dashboard'),
      import('@/app/routes/dashboard-region'),
    ]);
  });

  it('exports the parcels with the filters and order the list shows, not its page', async () => {
    const fetchMock = mockPages();
    const { user } = renderApp(
      paths.receipts.getHref(
        '?page=2&from=2026-10-01&to=2026-10-31&region=1&hasScan=true&sort=panelsAccepted&direction=asc',
      ),
      { as: demoPeople.staff },
    );
    await screen.findByRole('table', { name: 'Parcels received' });

    await choose(user, 'Export parcels', 'Spreadsheet (.xlsx)');
    await waitFor(() => expect(postedBodies(fetchMock)).toHaveLength(1));
    expect(postedBodies(fetchMock)[0]).toEqual({
      table: 'receipts',
      format: 'xlsx',
      filters: {
        from: '2026-10-01',
        to: '2026-10-31',
        regionId: 1,
        hasScan: true,
        sort: 'panelsAccepted',
        direction: 'asc',
      },
    });
  });

  it('asks for a byte-order mark only for the CSV meant for spreadsheet programs', async () => {
    const fetchMock = mockPages();
    const { user } = renderApp(paths.receipts.getHref('?chapter=11'), { as: demoPeople.staff });
    await screen.findByRole('table', { name: 'Parcels received' });

    await choose(user, 'Export parcels', 'CSV');
    await user.click(await screen.findByRole('button', { name: 'Close' }));
    await choose(user, 'Export parcels', 'CSV for spreadsheet programs (with BOM)');
    await waitFor(() => expect(postedBodies(fetchMock)).toHaveLength(2));
    const filters = { chapterId: 11, sort: 'receivedOn', direction: 'desc' };
    expect(postedBodies(fetchMock)).toEqual([
      { table: 'receipts', format: 'csv', bom: false, filters },
      { table: 'receipts', format: 'csv', bom: true, filters },
    ]);
  });

  it('exports the review queue with its state, region and month', async () => {
    const fetchMock = mockPages();
    const { user } = renderApp(
      paths.tallyReview.getHref('?state=approved&region=2&month=2026-03'),
      { as: demoPeople.coordinator },
    );
    await screen.findByRole('table', { name: 'Tallies' });

    await choose(user, 'Export the review queue', 'Spreadsheet (.xlsx)');
    await waitFor(() => expect(postedBodies(fetchMock)).toHaveLength(1));
    expect(postedBodies(fetchMock)[0]).toEqual({
      table: 'review-queue',
      format: 'xlsx',
      filters: {
        state: 'approved',
        regionId: 2,
        month: '2026-03',
        sort: expect.any(String) as unknown,
        direction: expect.any(String) as unknown,
      },
    });
  });

  it("exports a chapter's monthly tallies once a chapter is chosen, and the lead's own", async () => {
    const fetchMock = mockPages({
      '/api/tallies/calendar': () => jsonResponse({ today: '2026-05-04', entries: [] }),
    });
    const staff = renderApp(paths.tallies.getHref(), { as: demoPeople.staff });
    await screen.findByRole('heading', { name: 'Choose a chapter' });
    expect(screen.queryByRole('button', { name: 'Export monthly tallies' })).toBeNull();
    staff.unmount();

    const chosen = renderApp(`${paths.tallies.getHref()}?chapter=21`, { as: demoPeople.staff });
    await choose(chosen.user, 'Export monthly tallies', 'Spreadsheet (.xlsx)');
    await waitFor(() => expect(postedBodies(fetchMock)).toHaveLength(1));
    chosen.unmount();

    const lead = renderApp(paths.tallies.getHref(), { as: demoPeople.chapterLead });
    await choose(lead.user, 'Export monthly tallies', 'CSV');
    await waitFor(() => expect(postedBodies(fetchMock)).toHaveLength(2));
    expect(postedBodies(fetchMock)).toEqual([
      { table: 'tallies', format: 'xlsx', filters: { chapterId: 21 } },
      { table: 'tallies', format: 'csv', bom: false, filters: { chapterId: 11 } },
    ]);
  });

  it("exports a dashboard's comparison for its scope and period", async () => {
    const fetchMock = mockPages({
      '/api/dashboards/network': () => jsonResponse(networkDashboard()),
      '/api/dashboards/regions/1': () => jsonResponse(regionDashboard()),
    });
    const network = renderApp(paths.dashboard.getHref('?periodKind=month&period=2026-03'), {
      as: demoPeople.grantWriter,
    });
    await choose(network.user, 'Export the region comparison', 'CSV');
    await waitFor(() => expect(postedBodies(fetchMock)).toHaveLength(1));
    network.unmount();

    const region = renderApp(paths.dashboardRegion.getHref(1, '?periodKind=month&period=2026-03'), {
      as: demoPeople.coordinator,
    });
    await choose(region.user, 'Export the chapter comparison', 'Spreadsheet (.xlsx)');
    await waitFor(() => expect(postedBodies(fetchMock)).toHaveLength(2));
    expect(postedBodies(fetchMock)).toEqual([
      {
        table: 'snapshots',
        format: 'csv',
        bom: false,
        filters: { scope: 'network', periodKind: 'month', period: '2026-03' },
      },
      {
        table: 'snapshots',
        format: 'xlsx',
        filters: { scope: 'region', scopeId: 1, periodKind: 'month', period: '2026-03' },
      },
    ]);
  });

  it('shows the bar while the file is written, then the link with its expiry and contents', async () => {
    mockPages({
      [`GET ${exportPath}`]: states(
        anExport({ state: 'running', progress: 40 }),
        aFinishedExport(),
      ),
    });
    const { user } = renderApp(paths.receipts.getHref(), { as: demoPeople.staff });
    await screen.findByRole('table', { name: 'Parcels received' });
    await choose(user, 'Export parcels', 'Spreadsheet (.xlsx)');

    const dialog = await screen.findByRole('dialog', { name: 'Export parcels' });
    // The answer to the request: queued, nothing written yet.
    expect(await within(dialog).findByText('Waiting for its turn…')).toBeInTheDocument();
    expect(within(dialog).getByRole('progressbar')).toHaveAttribute('aria-valuenow', '0');
    // The polls: running at 40 %, then done.
    await waitFor(
      () => expect(within(dialog).getByRole('progressbar')).toHaveAttribute('aria-valuenow', '40'),
      { timeout: 4_000 },
    );
    expect(dialog).toHaveTextContent('40% done');
    const link = await within(dialog).findByRole(
      'link',
      { name: 'Download tallyloom-receipts-2026-12-02.xlsx' },
      { timeout: 4_000 },
    );
    expect(link).toHaveAttribute('href', aFinishedExport().downloadUrl);
    expect(link).toHaveAttribute('download', 'tallyloom-receipts-2026-12-02.xlsx');
    expect(dialog).toHaveTextContent('Ready: 1,204 rows on 1 sheet.');
    expect(dialog).toHaveTextContent('The link works until 2 Dec 2026');
    expect(within(dialog).queryByRole('progressbar')).toBeNull();
  });

  it('shows why an export failed, and exports again on request', async () => {
    const fetchMock = mockPages({
      [`GET ${exportPath}`]: () =>
        jsonResponse(
          anExport({ state: 'failed', error: 'The database stopped answering while reading.' }),
        ),
    });
    const { user } = renderApp(paths.receipts.getHref(), { as: demoPeople.staff });
    await screen.findByRole('table', { name: 'Parcels received' });
    await choose(user, 'Export parcels', 'CSV');

    const dialog = await screen.findByRole('dialog', { name: 'Export parcels' });
    expect(
      await within(dialog).findByText('The database stopped answering while reading.', undefined, {
        timeout: 4_000,
      }),
    ).toBeInTheDocument();
    expect(within(dialog).queryByRole('link')).toBeNull();
    await user.click(within(dialog).getByRole('button', { name: 'Export again' }));
    await waitFor(() => expect(postedBodies(fetchMock)).toHaveLength(2));
    expect(postedBodies(fetchMock)[1]).toEqual(postedBodies(fetchMock)[0]);
  });

  it('says why the server refused to start the export', async () => {
    mockPages({
      'POST /api/exports': () =>
        jsonResponse(apiErrorBody(400, 'filters.to must be on or after filters.from.'), 400),
    });
    const { user } = renderApp(paths.receipts.getHref(), { as: demoPeople.staff });
    await screen.findByRole('table', { name: 'Parcels received' });
    await choose(user, 'Export parcels', 'Spreadsheet (.xlsx)');

    const dialog = await screen.findByRole('dialog', { name: 'Export parcels' });
    expect(await within(dialog).findByText('The export was not started')).toBeInTheDocument();
    expect(dialog).toHaveTextContent('filters.to must be on or after filters.from.');
    expect(within(dialog).getByRole('button', { name: 'Export again' })).toBeInTheDocument();
  });
});
