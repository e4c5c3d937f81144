import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { demoChapters, demoPeople } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { currentPath, renderApp } from '@/testing/render-app';
import { alderFallsCalendar, draftTally } from '@/testing/tally-fixtures';

function rowOf(month: string) {
  const table = screen.getByRole('table', { name: 'Months' });
  return within(table)
    .getAllByRole('row')
    .find((row) => row.textContent?.startsWith(month))!;
}

describe("a chapter lead's monthly tallies", () => {
  beforeAll(async () => {
    await import('@/app/routes/tallies');
    await import('@/app/routes/tally');
  });

  it('lists the months with their state, how the reporting stands and what to do', async () => {
    mockApi({ '/api/tallies/calendar': () => jsonResponse(alderFallsCalendar) });
    renderApp(paths.tallies.getHref(), { as: demoPeople.chapterLead });

    await screen.findByRole('table', { name: 'Months' });
    expect(rowOf('Apr 2026')).toHaveTextContent('Not started');
    expect(rowOf('Apr 2026')).toHaveTextContent('Due by 10 May 2026');
    expect(
      within(rowOf('Apr 2026')).getByRole('button', { name: 'Start the Apr 2026 tally' }),
    ).toBeInTheDocument();

    expect(rowOf('Mar 2026')).toHaveTextContent('Returned');
    expect(rowOf('Mar 2026')).toHaveTextContent('Late (was due 10 Apr 2026)');
    expect(
      within(rowOf('Mar 2026')).getByRole('link', { name: 'Continue the Mar 2026 tally' }),
    ).toHaveAttribute('href', paths.tally.getHref(501));

    expect(rowOf('Feb 2026')).toHaveTextContent('Approved');
    expect(rowOf('Feb 2026')).toHaveTextContent('On time');
    expect(
      within(rowOf('Feb 2026')).getByRole('link', { name: 'Open the Feb 2026 tally' }),
    ).toBeInTheDocument();

    expect(rowOf('Jan 2026')).toHaveTextContent('Amendment in progress (draft)');
  });

  it('puts what was returned, and why, above the list', async () => {
    mockApi({ '/api/tallies/calendar': () => jsonResponse(alderFallsCalendar) });
    renderApp(paths.tallies.getHref(), { as: demoPeople.chapterLead });

    const returned = await screen.findByRole('region', { name: 'Returned for changes' });
    expect(returned).toHaveTextContent('Mar 2026 was returned for changes');
    expect(returned).toHaveTextContent(
      'Blankets given out do not match the shelter’s receipt; please recount the lap blankets.',
    );
    expect(within(returned).getByRole('link', { name: 'Fix it' })).toHaveAttribute(
      'href',
      paths.tally.getHref(501),
    );
  });

  it('starts a month: the server prefills the tally and the form opens', async () => {
    const fetchMock = mockApi({
      '/api/tallies/calendar': () => jsonResponse(alderFallsCalendar),
      'POST /api/tallies': () => jsonResponse(draftTally({ id: 777, month: '2026-04' }), 201),
      'GET /api/tallies/777': () => jsonResponse(draftTally({ id: 777, month: '2026-04' })),
    });
    const { user, router } = renderApp(paths.tallies.getHref(), { as: demoPeople.chapterLead });

    await user.click(await screen.findByRole('button', { name: 'Start the Apr 2026 tally' }));

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Apr 2026 tally' }),
    ).toBeInTheDocument();
    expect(currentPath(router)).toBe(paths.tally.getHref(777));
    expect(
      seenRequests(fetchMock, '/api/tallies').filter((r) => r.method === 'POST')[0].body,
    ).toEqual({
      chapterId: 11,
      month: '2026-04',
    });
  });

  it('says why a month could not be started', async () => {
    mockApi({
      '/api/tallies/calendar': () => jsonResponse(alderFallsCalendar),
      'POST /api/tallies': () =>
        jsonResponse(
          {
            statusCode: 409,
            error: 'Conflict',
            message: 'Alder Falls already has a tally for Apr 2026.',
          },
          409,
        ),
    });
    const { user } = renderApp(paths.tallies.getHref(), { as: demoPeople.chapterLead });

    await user.click(await screen.findByRole('button', { name: 'Start the Apr 2026 tally' }));
    expect(
      await screen.findByText('Alder Falls already has a tally for Apr 2026.'),
    ).toBeInTheDocument();
  });

  it('tells a new chapter what to expect when there is no month yet', async () => {
    mockApi({ '/api/tallies/calendar': () => jsonResponse({ entries: [], today: '2026-03-02' }) });
    renderApp(paths.tallies.getHref(), { as: demoPeople.chapterLead });

    expect(
      await screen.findByRole('heading', { name: 'No months to report on yet' }),
    ).toBeInTheDocument();
  });

  it('shows the error and a retry when the months cannot be loaded', async () => {
    mockApi({
      '/api/tallies/calendar': () =>
        jsonResponse(
          { statusCode: 500, error: 'Internal', message: 'The database is not answering.' },
          500,
        ),
    });
    renderApp(paths.tallies.getHref(), { as: demoPeople.chapterLead });

    expect(await screen.findByRole('alert')).toHaveTextContent('The database is not answering.');
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });

  it('lets national staff choose the chapter, and asks for that chapter only', async () => {
    const fetchMock = mockApi({
      '/api/chapters': () => jsonResponse(demoChapters),
      '/api/tallies/calendar': () => jsonResponse(alderFallsCalendar),
    });
    const { user, router } = renderApp(paths.tallies.getHref(), { as: demoPeople.staff });

    expect(await screen.findByRole('heading', { name: 'Choose a chapter' })).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/tallies/calendar')).toHaveLength(0);

    const picker = await screen.findByRole('combobox', { name: 'Chapter' });
    await waitFor(() => expect(picker).toBeEnabled());
    await user.selectOptions(picker, '11');

    await screen.findByRole('table', { name: 'Months' });
    expect(currentPath(router)).toBe(`${paths.tallies.getHref()}?chapter=11`);
    expect(
      seenRequests(fetchMock, '/api/tallies/calendar')[0].url.searchParams.get('chapterId'),
    ).toBe('11');
  });

  it('shows a coordinator the months to open, but nothing to start', async () => {
    mockApi({
      '/api/chapters': () => jsonResponse(demoChapters.filter((chapter) => chapter.regionId === 1)),
      '/api/tallies/calendar': () => jsonResponse(alderFallsCalendar),
    });
    renderApp(`${paths.tallies.getHref()}?chapter=11`, { as: demoPeople.coordinator });

    await screen.findByRole('table', { name: 'Months' });
    expect(rowOf('Apr 2026')).toHaveTextContent('Not started');
    expect(screen.queryByRole('button', { name: /Start the/ })).toBeNull();
    expect(
      within(rowOf('Mar 2026')).getByRole('link', { name: 'Open the Mar 2026 tally' }),
    ).toBeInTheDocument();
  });
});

describe('the way in for a chapter lead', () => {
  it('puts Monthly tallies first in the navigation and a card on the network home', async () => {
    mockApi({
      '/api/regions': () => jsonResponse([]),
      '/api/chapters': () => jsonResponse(demoChapters.filter((chapter) => chapter.id === 11)),
      '/api/tallies/calendar': () => jsonResponse(alderFallsCalendar),
    });
    renderApp(paths.network.getHref(), { as: demoPeople.chapterLead });

    const nav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(nav).getAllByRole('link')[0]).toHaveTextContent('Monthly tallies');
    const card = await screen.findByRole('region', { name: 'Monthly tallies' });
    expect(
      await within(card).findByText('1 month to file, 1 tally returned for changes.'),
    ).toBeInTheDocument();
    expect(within(card).getByRole('link', { name: 'Go to monthly tallies' })).toHaveAttribute(
      'href',
      paths.tallies.getHref(),
    );
  });

  it('keeps the network home as it was for national staff', async () => {
    mockApi({
      '/api/regions': () => jsonResponse([]),
      '/api/chapters': () => jsonResponse(demoChapters),
    });
    renderApp(paths.network.getHref(), { as: demoPeople.staff });

    const nav = await screen.findByRole('navigation', { name: 'Main' });
    expect(within(nav).getAllByRole('link')[0]).toHaveTextContent('Network');
    expect(screen.queryByRole('region', { name: 'Monthly tallies' })).toBeNull();
  });
});
