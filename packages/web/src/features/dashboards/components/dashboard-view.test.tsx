import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import type { ChartProps } from '@/components/charts/chart';
import { paths } from '@/config/paths';
import { apiErrorBody, demoPeople } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { networkDashboard, regionDashboard, figures } from '@/testing/report-fixtures';
import { currentPath, renderApp } from '@/testing/render-app';

// jsdom has no canvas for ECharts: stand in with the chart's description in words. The options
// are tested on their own (*-option.test.ts).
vi.mock('@/components/charts/chart', () => ({
  Chart: ({ description }: ChartProps) => <div role="img" aria-label={description} />,
}));

const march = '?periodKind=month&period=2026-03';

function lastRequest(fetchMock: ReturnType<typeof mockApi>, path: string): URLSearchParams {
  const last = seenRequests(fetchMock, path).at(-1);
  if (!last) throw new Error(`${path} was never requested`);
  return last.url.searchParams;
}

function card(name: string) {
  return within(screen.getByRole('list', { name: 'Figures for Mar 2026' })).getByRole('listitem', {
    name,
  });
}

describe('Dashboards', () => {
  beforeAll(async () => {
    await Promise.all([
      import('@/app/routes/dashboard'),
      import('@/app/routes/dashboard-region'),
      import('@/app/routes/dashboard-chapter'),
    ]);
  });

  it('shows each figure with its change on the previous period, in words for screen readers', async () => {
    mockApi({ '/api/dashboards/network': () => jsonResponse(networkDashboard()) });
    renderApp(paths.dashboard.getHref(march), { as: demoPeople.staff });

    await screen.findByRole('heading', { level: 1, name: 'Emberfold network: Mar 2026' });
    // 1,000 → 1,250 panels: a quarter more.
    const panels = card('Panels received');
    expect(panels).toHaveTextContent('1,250');
    expect(panels).toHaveTextContent('▲ 25%');
    expect(panels).toHaveTextContent('up 25 percent on Feb 2026');
    // 50 → 40 blankets made: a fifth fewer.
    expect(card('Blankets made')).toHaveTextContent('▼ 20%');
    expect(card('Blankets made')).toHaveTextContent('down 20 percent on Feb 2026');
    expect(card('Blankets given')).toHaveTextContent('No change');
    // From none to 38: no percent to speak of.
    expect(card('People served')).toHaveTextContent('New');
    expect(card('People served')).toHaveTextContent('none in Feb 2026');
    expect(card('Volunteer hours')).toHaveTextContent('212.5');

    expect(screen.getByText('3 tallies awaiting approval are not included.')).toBeInTheDocument();
    // 2 missing + 1 open chapter-months in the fixture's compliance.
    expect(
      screen.getByText(
        '3 chapter-months have not filed for this period yet: the change against the previous period may be understated.',
      ),
    ).toBeInTheDocument();
    expect(
      screen.getByText('Figures for funders are estimates built from volunteer reports.'),
    ).toBeInTheDocument();
    expect(screen.getByText(/^As of \d+ Apr 2026, \d\d:\d\d\.$/)).toBeInTheDocument();
    expect(
      screen.getByRole('img', { name: /People served by group: Infants 4, Children 10/ }),
    ).toBeInTheDocument();
    expect(
      screen.getByRole('img', {
        name: /North Ridge: 12 tallies expected; 8 on time, 1 late, 2 missing, 1 open/,
      }),
    ).toBeInTheDocument();
  });

  it('links each figure to its trace for roles that may trace, the region figures too', async () => {
    mockApi({ '/api/dashboards/network': () => jsonResponse(networkDashboard()) });
    renderApp(paths.dashboard.getHref(march), { as: demoPeople.staff });
    await screen.findByRole('list', { name: 'Figures for Mar 2026' });
    expect(within(card('Panels received')).getByRole('link', { name: '1,250' })).toHaveAttribute(
      'href',
      paths.trace.getHref('network:2026-03', 'panelsAccepted'),
    );
    const table = screen.getByRole('table', { name: 'Regions compared' });
    const riverlands = within(table).getByRole('row', { name: /^Riverlands/ });
    const links = within(riverlands).getAllByRole('link');
    expect(links.map((link) => link.getAttribute('href'))).toContain(
      paths.trace.getHref('region:2:2026-03', 'blanketsGiven'),
    );
  });

  it('links a custom range to the approved tallies instead: it has no stored figure to trace', async () => {
    const custom = networkDashboard();
    const range = {
      kind: 'custom' as const,
      key: '2026-02..2026-03',
      from: '2026-02',
      to: '2026-03',
      label: 'Feb–Mar 2026',
    };
    custom.current = { ...custom.current, period: range };
    mockApi({ '/api/dashboards/network': () => jsonResponse(custom) });
    renderApp(paths.dashboard.getHref('?periodKind=custom&from=2026-02&to=2026-03'), {
      as: demoPeople.staff,
    });
    const cards = await screen.findByRole('list', { name: 'Figures for Feb–Mar 2026' });
    expect(
      within(within(cards).getByRole('listitem', { name: 'Panels received' })).getByRole('link'),
    ).toHaveAttribute('href', paths.tallyReview.getHref('?state=approved'));
  });

  it('shows grant writers the figures without links to the tallies', async () => {
    mockApi({ '/api/dashboards/network': () => jsonResponse(networkDashboard()) });
    renderApp(paths.dashboard.getHref(march), { as: demoPeople.grantWriter });
    await screen.findByRole('list', { name: 'Figures for Mar 2026' });
    expect(card('Panels received')).toHaveTextContent('1,250');
    expect(within(card('Panels received')).queryByRole('link')).toBeNull();
  });

  it('keeps the chosen period in the address and asks the server for it', async () => {
    const fetchMock = mockApi({
      '/api/dashboards/network': () => jsonResponse(networkDashboard()),
    });
    const { user, router } = renderApp(paths.dashboard.getHref(march), { as: demoPeople.admin });
    const picker = await screen.findByRole('group', { name: 'Period' });
    await waitFor(() =>
      expect(lastRequest(fetchMock, '/api/dashboards/network').get('period')).toBe('2026-03'),
    );

    await user.selectOptions(within(picker).getByRole('combobox', { name: 'Period' }), 'Quarter');
    const quarters = within(picker).getByRole('combobox', { name: 'Quarter' });
    // The list ends at today's quarter: take one a year back, whatever today is.
    const quarter = within(quarters).getAllByRole('option')[4] as HTMLOptionElement;
    expect(quarter.value).toMatch(/^\d{4}-Q[1-4]$/);
    await user.selectOptions(quarters, quarter);
    await waitFor(() =>
      expect(lastRequest(fetchMock, '/api/dashboards/network').get('period')).toBe(quarter.value),
    );
    expect(lastRequest(fetchMock, '/api/dashboards/network').get('periodKind')).toBe('quarter');
    expect(currentPath(router)).toBe(
      paths.dashboard.getHref(`?periodKind=quarter&period=${quarter.value}`),
    );

    await user.selectOptions(
      within(picker).getByRole('combobox', { name: 'Period' }),
      'Custom range',
    );
    const fromPicker = within(picker).getByRole('combobox', { name: 'From' });
    const toPicker = within(picker).getByRole('combobox', { name: 'To' });
    const from = within(fromPicker).getAllByRole('option')[14] as HTMLOptionElement;
    const to = within(toPicker).getAllByRole('option')[12] as HTMLOptionElement;
    await user.selectOptions(fromPicker, from);
    await user.selectOptions(toPicker, to);
    await waitFor(() =>
      expect(lastRequest(fetchMock, '/api/dashboards/network').get('to')).toBe(to.value),
    );
    const params = lastRequest(fetchMock, '/api/dashboards/network');
    expect(params.get('periodKind')).toBe('custom');
    expect(params.get('from')).toBe(from.value);
    expect(params.get('period')).toBeNull();
    expect(currentPath(router)).toBe(
      paths.dashboard.getHref(`?periodKind=custom&from=${from.value}&to=${to.value}`),
    );
  });

  it('drills down from a region in the comparison to its own dashboard, keeping the period', async () => {
    const fetchMock = mockApi({
      '/api/dashboards/network': () => jsonResponse(networkDashboard()),
      '/api/dashboards/regions/2': () => jsonResponse(regionDashboard(2, 'Riverlands')),
    });
    const { user, router } = renderApp(paths.dashboard.getHref(march), { as: demoPeople.staff });
    const comparison = await screen.findByRole('region', { name: 'Regions compared' });
    const table = within(comparison).getByRole('table');
    const link = within(table).getByRole('link', { name: 'Riverlands' });
    expect(link).toHaveAttribute('href', paths.dashboardRegion.getHref(2, march));
    expect(within(table).getAllByRole('row')[2]).toHaveTextContent('480');

    await user.click(link);
    await screen.findByRole('heading', { level: 1, name: 'Riverlands: Mar 2026' });
    expect(currentPath(router)).toBe(paths.dashboardRegion.getHref(2, march));
    expect(lastRequest(fetchMock, '/api/dashboards/regions/2').get('period')).toBe('2026-03');
    expect(
      within(screen.getByRole('region', { name: 'Chapters compared' })).getByRole('link', {
        name: 'Alder Falls',
      }),
    ).toHaveAttribute('href', paths.dashboardChapter.getHref(11, march));
  });

  it('takes a coordinator to their own region’s dashboard', async () => {
    const fetchMock = mockApi({
      '/api/dashboards/regions/1': () => jsonResponse(regionDashboard()),
    });
    const { router } = renderApp(paths.dashboard.getHref(march), { as: demoPeople.coordinator });
    await screen.findByRole('heading', { level: 1, name: 'North Ridge: Mar 2026' });
    expect(currentPath(router)).toBe(paths.dashboardRegion.getHref(1, march));
    expect(seenRequests(fetchMock, '/api/dashboards/network')).toHaveLength(0);
  });

  it('sends a chapter lead to their chapter, with figures that trace their own tallies', async () => {
    const chapter = regionDashboard(11, 'Alder Falls');
    mockApi({
      '/api/dashboards/chapters/11': () =>
        jsonResponse({
          ...chapter,
          scope: 'chapter',
          current: { ...chapter.current, scope: 'chapter' },
          breakdown: [],
        }),
    });
    const { router } = renderApp(paths.dashboard.getHref(), { as: demoPeople.chapterLead });
    await screen.findByRole('heading', { level: 1, name: 'Alder Falls: Mar 2026' });
    expect(router.state.location.pathname).toBe(paths.dashboardChapter.getHref(11));
    expect(screen.queryByRole('region', { name: /compared/ })).toBeNull();
    expect(
      within(screen.getByRole('listitem', { name: 'Blankets given' })).getByRole('link'),
    ).toHaveAttribute('href', paths.trace.getHref('chapter:11:2026-03', 'blanketsGiven'));
  });

  it('says so when the period has no tallies yet', async () => {
    const empty = networkDashboard();
    empty.current = {
      ...empty.current,
      figures: figures({ approvedTallies: 0 }),
      pendingTallies: 0,
    };
    mockApi({ '/api/dashboards/network': () => jsonResponse(empty) });
    renderApp(paths.dashboard.getHref(march), { as: demoPeople.staff });
    expect(
      await screen.findByRole('heading', { name: 'No approved tallies for Mar 2026' }),
    ).toBeInTheDocument();
    expect(screen.queryByRole('list', { name: 'Figures for Mar 2026' })).toBeNull();
    expect(screen.getByRole('group', { name: 'Period' })).toBeInTheDocument();
  });

  it('shows the server’s reason and a retry when the figures cannot be loaded', async () => {
    mockApi({
      '/api/dashboards/regions/9': () =>
        jsonResponse(apiErrorBody(404, 'Region 9 was not found.'), 404),
    });
    renderApp(paths.dashboardRegion.getHref(9, march), { as: demoPeople.staff });
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('The figures could not be loaded');
    expect(alert).toHaveTextContent('Region 9 was not found.');
    expect(within(alert).getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });

  it('shows a loading state while the figures are on their way', async () => {
    mockApi({ '/api/dashboards/network': () => new Promise<Response>(() => {}) });
    renderApp(paths.dashboard.getHref(march), { as: demoPeople.staff });
    expect(await screen.findByText('Loading the figures…')).toBeInTheDocument();
  });
});
