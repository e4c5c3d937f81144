import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoChapters, demoPeople, demoRegions } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { currentPath, renderApp } from '@/testing/render-app';
import { queueTallies, talliesPage } from '@/testing/tally-fixtures';

type Handlers = Parameters<typeof mockApi>[0];

function mockQueueApi(extra: Handlers = {}) {
  return mockApi({
    '/api/regions': () => jsonResponse(demoRegions),
    '/api/chapters': () => jsonResponse(demoChapters),
    'GET /api/tallies': (url) => jsonResponse(talliesPage(url)),
    ...extra,
  });
}

function lastListRequest(fetchMock: ReturnType<typeof mockApi>): URLSearchParams {
  const last = seenRequests(fetchMock, '/api/tallies').at(-1);
  if (!last) throw new Error('the queue was never requested');
  return last.url.searchParams;
}

describe('Review queue', () => {
  // The page is a lazy route: load its code once, so the first test does not time out on it.
  beforeAll(async () => {
    await import('@/app/routes/tally-review');
  });

  it('opens on the submitted tallies, oldest submission first, with right-aligned counts', async () => {
    const fetchMock = mockQueueApi();
    renderApp(paths.tallyReview.getHref(), { as: demoPeople.staff });

    const table = await screen.findByRole('table', { name: 'Tallies' });
    const params = lastListRequest(fetchMock);
    expect(params.get('state')).toBe('submitted');
    expect(params.get('sort')).toBe('submittedAt');
    expect(params.get('direction')).toBe('asc');
    expect(params.get('page')).toBe('1');
    expect(params.get('pageSize')).toBe('25');

    const rows = within(table).getAllByRole('row');
    // Header and 25 tallies.
    expect(rows).toHaveLength(26);
    expect(rows[0]).toHaveTextContent(
      'ChapterRegionMonthStateReportingSubmittedPanels acceptedBlankets assembledBlankets givenPeople servedVolunteer hours',
    );
    const first = rows[1];
    expect(within(first).getByRole('link', { name: 'Alder Falls' })).toHaveAttribute(
      'href',
      paths.tallyReviewItem.getHref(600),
    );
    expect(first).toHaveTextContent('North Ridge');
    expect(first).toHaveTextContent('Jan 2025');
    expect(first).toHaveTextContent('Submitted');
    expect(first).toHaveTextContent('On time');
    expect(first).toHaveTextContent('1,000');
    expect(first).toHaveTextContent('212.5');
    expect(rows[2]).toHaveTextContent('Amendment');
    expect(rows[3]).toHaveTextContent('Late');
    expect(rows[25]).toHaveTextContent('25,000');
    expect(screen.getByRole('group', { name: 'Pages of tallies' })).toHaveTextContent('1–25 of 30');
  });

  it('sends the filters and the order to the server, and keeps them in the address', async () => {
    const fetchMock = mockQueueApi();
    const { user, router } = renderApp(paths.tallyReview.getHref(), { as: demoPeople.admin });
    const filters = await screen.findByRole('search', { name: 'Filter tallies' });
    await screen.findByRole('table', { name: 'Tallies' });

    await user.selectOptions(within(filters).getByRole('combobox', { name: 'State' }), 'Returned');
    await user.selectOptions(
      within(filters).getByRole('combobox', { name: 'Region' }),
      'Riverlands',
    );
    await user.selectOptions(
      within(filters).getByRole('combobox', { name: 'Chapter' }),
      'Brindle Bay',
    );
    const monthPicker = within(filters).getByRole('combobox', { name: 'Month' });
    const someMonth = within(monthPicker).getAllByRole('option')[3];
    await user.selectOptions(monthPicker, someMonth);
    const month = (someMonth as HTMLOptionElement).value;
    expect(month).toMatch(/^\d{4}-\d{2}$/);

    await waitFor(() => expect(lastListRequest(fetchMock).get('month')).toBe(month));
    const params = lastListRequest(fetchMock);
    expect(params.get('state')).toBe('returned');
    expect(params.get('regionId')).toBe('2');
    expect(params.get('chapterId')).toBe('21');
    expect(currentPath(router)).toBe(
      paths.tallyReview.getHref(`?state=returned&region=2&chapter=21&month=${month}`),
    );

    const table = screen.getByRole('table', { name: 'Tallies' });
    await user.click(within(table).getByRole('button', { name: 'Month' }));
    await waitFor(() => expect(lastListRequest(fetchMock).get('sort')).toBe('month'));
    expect(lastListRequest(fetchMock).get('chapterId')).toBe('21');
    expect(currentPath(router)).toContain('sort=month');
  }, 20_000);

  it('reads the filters back from a shared link', async () => {
    const fetchMock = mockQueueApi();
    renderApp(paths.tallyReview.getHref('?state=all&chapter=11&month=2026-02&page=2'), {
      as: demoPeople.staff,
    });

    await screen.findByRole('table', { name: 'Tallies' });
    const params = lastListRequest(fetchMock);
    expect(params.get('state')).toBeNull();
    expect(params.get('chapterId')).toBe('11');
    expect(params.get('month')).toBe('2026-02');
    expect(params.get('page')).toBe('2');
    const filters = screen.getByRole('search', { name: 'Filter tallies' });
    expect(within(filters).getByRole('combobox', { name: 'State' })).toHaveValue('all');
    expect(within(filters).getByRole('combobox', { name: 'Month' })).toHaveDisplayValue('Feb 2026');
  });

  it('offers no region picker to a regional coordinator, whose queue is their region', async () => {
    mockQueueApi({
      '/api/chapters': () =>
        jsonResponse(demoChapters.map((chapter) => ({ ...chapter, regionId: 1 }))),
    });
    renderApp(paths.tallyReview.getHref(), { as: demoPeople.coordinator });

    const filters = await screen.findByRole('search', { name: 'Filter tallies' });
    await screen.findByRole('table', { name: 'Tallies' });
    expect(within(filters).queryByRole('combobox', { name: 'Region' })).not.toBeInTheDocument();
    expect(within(filters).getByRole('combobox', { name: 'Chapter' })).toBeInTheDocument();
  });

  it('says so when nothing waits for review', async () => {
    mockQueueApi({ 'GET /api/tallies': (url) => jsonResponse(talliesPage(url, [])) });
    renderApp(paths.tallyReview.getHref(), { as: demoPeople.coordinator });

    expect(
      await screen.findByRole('heading', { name: 'Nothing waiting for review' }),
    ).toBeInTheDocument();
    expect(screen.queryByRole('table', { name: 'Tallies' })).not.toBeInTheDocument();
  });

  it('offers the way back to the default queue when the filters match nothing', async () => {
    const fetchMock = mockQueueApi({
      'GET /api/tallies': (url) =>
        jsonResponse(talliesPage(url, url.searchParams.get('chapterId') ? [] : queueTallies)),
    });
    const { user, router } = renderApp(paths.tallyReview.getHref('?chapter=21'), {
      as: demoPeople.staff,
    });

    await user.click(await screen.findByRole('button', { name: 'Back to what waits for review' }));
    await screen.findByRole('table', { name: 'Tallies' });
    expect(lastListRequest(fetchMock).get('chapterId')).toBeNull();
    expect(currentPath(router)).toBe(paths.tallyReview.getHref());
  });

  it('shows what went wrong when the queue cannot be loaded', async () => {
    mockQueueApi({
      'GET /api/tallies': () =>
        jsonResponse(apiErrorBody(500, 'The database did not answer in time.'), 500),
    });
    renderApp(paths.tallyReview.getHref(), { as: demoPeople.staff });

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('The review queue could not be loaded');
    expect(alert).toHaveTextContent('The database did not answer in time.');
  });

  it('is closed to a chapter lead, and asks the server nothing', async () => {
    const fetchMock = mockQueueApi();
    renderApp(paths.tallyReview.getHref(), { as: demoPeople.chapterLead });

    expect(
      await screen.findByRole('heading', { level: 1, name: 'No access to Review tallies' }),
    ).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/tallies')).toHaveLength(0);
  });

  it('is in the navigation for reviewers only', async () => {
    mockQueueApi();
    const { user, router } = renderApp(paths.network.getHref(), { as: demoPeople.coordinator });
    const nav = await screen.findByRole('navigation', { name: 'Main' });
    await user.click(within(nav).getByRole('link', { name: 'Review' }));
    await waitFor(() => expect(currentPath(router)).toBe(paths.tallyReview.getHref()));
  });
});
