import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import {
  demoAgencies,
  demoCampaigns,
  demoChapters,
  demoPeople,
  demoRegions,
} from '@/testing/fixtures';
import { jsonResponse, mockApi, requestedUrls } from '@/testing/mock-api';
import { renderApp } from '@/testing/render-app';

/** The page also lists partner agencies and campaigns; tests about regions leave those be. */
function mockNetworkApi(handlers: Parameters<typeof mockApi>[0]) {
  return mockApi({
    '/api/agencies': () => jsonResponse(demoAgencies),
    '/api/campaigns': () => jsonResponse(demoCampaigns),
    ...handlers,
  });
}

function chaptersFor(url: URL) {
  const regionId = url.searchParams.get('regionId');
  return regionId ? demoChapters.filter((c) => c.regionId === Number(regionId)) : demoChapters;
}

describe('Network page', () => {
  it('lists the regions with their codes and chapter counts', async () => {
    mockNetworkApi({
      '/api/regions': () => jsonResponse(demoRegions),
      '/api/chapters': (url) => jsonResponse(chaptersFor(url)),
    });
    renderApp(paths.network.getHref(), { as: demoPeople.admin });

    expect(await screen.findByRole('heading', { level: 1, name: 'Network' })).toBeInTheDocument();
    const regions = await screen.findByRole('table', { name: 'Regions' });
    const rows = within(regions).getAllByRole('row');
    expect(rows.map((row) => row.textContent)).toEqual([
      'RegionCodeChapters',
      'Coastal PlainCP3',
      'High MesaHM3',
      'North RidgeNR4',
      'RiverlandsRL2',
    ]);
  });

  it('shows every chapter with its reporting deadline and start month', async () => {
    mockNetworkApi({
      '/api/regions': () => jsonResponse(demoRegions),
      '/api/chapters': (url) => jsonResponse(chaptersFor(url)),
    });
    renderApp(paths.network.getHref(), { as: demoPeople.admin });

    const chapters = await screen.findByRole('table', { name: 'Chapters' });
    const alderFalls = within(chapters).getByRole('row', { name: /Alder Falls/ });
    expect(alderFalls).toHaveTextContent('North Ridge');
    expect(alderFalls).toHaveTextContent('Day 10 of the following month');
    expect(alderFalls).toHaveTextContent('Mar 2026');
    expect(within(chapters).getByRole('row', { name: /Cedar Hollow/ })).toHaveTextContent(
      'Jan 2022 (closed Jun 2025)',
    );
  });

  it("narrows the chapters to one region and asks the server for that region's list", async () => {
    const fetchMock = mockNetworkApi({
      '/api/regions': () => jsonResponse(demoRegions),
      '/api/chapters': (url) => jsonResponse(chaptersFor(url)),
    });
    const { user, router } = renderApp(paths.network.getHref(), { as: demoPeople.admin });

    await screen.findByRole('table', { name: 'Chapters' });
    await user.selectOptions(screen.getByRole('combobox', { name: 'Region' }), 'Riverlands');

    const chapters = await screen.findByRole('table', { name: 'Chapters in Riverlands' });
    await waitFor(() =>
      expect(within(chapters).queryByText('Alder Falls')).not.toBeInTheDocument(),
    );
    expect(within(chapters).getByText('Brindle Bay')).toBeInTheDocument();
    expect(requestedUrls(fetchMock).map((url) => url.search)).toContain('?regionId=2');
    expect(router.state.location.search).toBe('?region=2');
  });

  it('says what to do first when the network has no regions', async () => {
    mockNetworkApi({
      '/api/regions': () => jsonResponse([]),
      '/api/chapters': () => jsonResponse([]),
      '/api/agencies': () => jsonResponse([]),
      '/api/campaigns': () => jsonResponse([]),
    });
    renderApp(paths.network.getHref(), { as: demoPeople.admin });

    expect(await screen.findByRole('heading', { name: 'No regions yet' })).toBeInTheDocument();
    expect(screen.getByText(/A network admin sets up the regions first/)).toBeInTheDocument();
    expect(screen.getByText('npm start')).toBeInTheDocument();
    expect(screen.queryByRole('table')).not.toBeInTheDocument();
  });

  it('shows a spinner while the regions load', async () => {
    mockNetworkApi({
      '/api/regions': () => new Promise<Response>(() => {}),
      '/api/chapters': () => new Promise<Response>(() => {}),
    });
    renderApp(paths.network.getHref(), { as: demoPeople.admin });

    expect(await screen.findByText('Loading regions…')).toBeInTheDocument();
  });

  it('shows what went wrong with the request id, and recovers on retry', async () => {
    let regionsFail = true;
    mockNetworkApi({
      '/api/regions': () =>
        regionsFail
          ? jsonResponse(
              {
                statusCode: 500,
                error: 'Internal Server Error',
                message: 'The database did not answer in time.',
                requestId: 'req-7f3a2c',
                path: '/api/regions',
              },
              500,
            )
          : jsonResponse(demoRegions),
      '/api/chapters': (url) => jsonResponse(chaptersFor(url)),
    });
    const { user } = renderApp(paths.network.getHref(), { as: demoPeople.admin });

    const alert = await screen.findByRole('alert');
    expect(within(alert).getByRole('heading', { name: 'The network could not be loaded' }));
    expect(alert).toHaveTextContent('The database did not answer in time.');
    expect(alert).toHaveTextContent('Request id: req-7f3a2c');

    regionsFail = false;
    await user.click(within(alert).getByRole('button', { name: 'Try again' }));

    expect(await screen.findByRole('table', { name: 'Regions' })).toBeInTheDocument();
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('lists partner agencies and campaigns read-only, with no set-up actions', async () => {
    mockNetworkApi({
      '/api/regions': () => jsonResponse(demoRegions),
      '/api/chapters': (url) => jsonResponse(chaptersFor(url)),
    });
    renderApp(paths.network.getHref(), { as: demoPeople.staff });

    const agencies = await screen.findByRole('table', { name: 'Partner agencies' });
    expect(within(agencies).getByRole('row', { name: /Riverside Care Home/ })).toHaveTextContent(
      'Care homeBrindle Bay, Cedar HollowActive',
    );
    expect(
      within(agencies).getByRole('row', { name: /Brindle Bay Community Pantry/ }),
    ).toHaveTextContent('Inactive');
    const campaigns = await screen.findByRole('table', { name: 'Campaigns' });
    expect(within(campaigns).getByRole('row', { name: /DWD26/ })).toHaveTextContent(
      'Deep Winter Drive4,0001 Nov 2025 – 28 Feb 2026Whole network',
    );
    expect(screen.queryByRole('button', { name: /Actions for/ })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Add agency' })).not.toBeInTheDocument();
  });

  it("lists a chapter lead's agencies under their chapter's name, as a short list", async () => {
    mockNetworkApi({
      '/api/regions': () => jsonResponse(demoRegions.filter((region) => region.id === 1)),
      '/api/chapters': () => jsonResponse(demoChapters.filter((chapter) => chapter.id === 11)),
      '/api/agencies': () => jsonResponse(demoAgencies.slice(0, 1)),
    });
    renderApp(paths.network.getHref(), { as: demoPeople.chapterLead });

    const agencies = await screen.findByRole('list', {
      name: 'Partner agencies Alder Falls serves',
    });
    expect(within(agencies).getByRole('listitem')).toHaveTextContent(
      'Maple Street Family ShelterFamily shelter',
    );
    // The chapter's own name sits in one cell only: the chapters table's.
    expect(screen.getAllByRole('cell', { name: /Alder Falls/ })).toHaveLength(1);
  });
});
