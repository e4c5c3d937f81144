import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoChapters, demoPeople, demoRegions } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { demoCampaigns, receiptsPage } from '@/testing/receipt-fixtures';
import { currentPath, renderApp } from '@/testing/render-app';

type Handlers = Parameters<typeof mockApi>[0];

function mockReceiptsApi(extra: Handlers = {}) {
  return mockApi({
    '/api/regions': () => jsonResponse(demoRegions),
    '/api/chapters': () => jsonResponse(demoChapters),
    '/api/campaigns': () => jsonResponse(demoCampaigns),
    'GET /api/receipts': (url) => jsonResponse(receiptsPage(url)),
    ...extra,
  });
}

function lastListRequest(fetchMock: ReturnType<typeof mockApi>): URLSearchParams {
  const last = seenRequests(fetchMock, '/api/receipts').at(-1);
  if (!last) throw new Error('the list was never requested');
  return last.url.searchParams;
}

describe('Parcels list', () => {
  // The page is a lazy route: load its code once, so the first test does not time out on it.
  beforeAll(async () => {
    await import('./receipts');
  });

  it('lists a page of parcels with dates, right-aligned counts and totals of every match', async () => {
    mockReceiptsApi({
      'GET /api/receipts': (url) =>
        jsonResponse(receiptsPage(url, undefined, { receipts: 1_234, panelsAccepted: 1_502_750 })),
    });
    renderApp(paths.receipts.getHref(), { as: demoPeople.staff });

    const table = await screen.findByRole('table', { name: 'Parcels received' });
    const rows = within(table).getAllByRole('row');
    // Header, 25 parcels, totals.
    expect(rows).toHaveLength(27);
    expect(rows[0]).toHaveTextContent(
      'ReceivedChapterCampaign codePanels acceptedSet asideFinished blanketsOther itemsScans',
    );
    const first = rows[1];
    expect(within(first).getByRole('link', { name: '28 Jan 2026' })).toHaveAttribute(
      'href',
      paths.receipt.getHref(600),
    );
    expect(first).toHaveTextContent('Alder Falls');
    expect(first).toHaveTextContent('North Ridge');
    expect(rows[2]).toHaveTextContent('ZZZ99Uncredited');
    expect(rows[25]).toHaveTextContent('1,300');

    const totals = rows[26];
    expect(totals).toHaveTextContent('Totals of all 1,234 matching parcels');
    expect(totals).toHaveTextContent('1,502,750');
    expect(screen.getByRole('group', { name: 'Pages of parcels' })).toHaveTextContent('1–25 of 30');
  });

  it('sends the filters and the order to the server, and keeps them in the address', async () => {
    const fetchMock = mockReceiptsApi();
    const { user, router } = renderApp(paths.receipts.getHref(), { as: demoPeople.admin });
    const filters = await screen.findByRole('search', { name: 'Filter parcels' });
    await screen.findByRole('table', { name: 'Parcels received' });

    await user.selectOptions(
      within(filters).getByRole('combobox', { name: 'Chapter' }),
      'Brindle Bay',
    );
    await user.click(within(filters).getByRole('checkbox', { name: 'Only with a scan' }));
    await user.selectOptions(
      within(filters).getByRole('combobox', { name: 'Campaign' }),
      'DWD26 · Deep Winter Drive',
    );
    await user.type(within(filters).getByLabelText('Received from'), '2026-01-10');

    await waitFor(() => expect(lastListRequest(fetchMock).get('from')).toBe('2026-01-10'));
    const params = lastListRequest(fetchMock);
    expect(params.get('chapterId')).toBe('21');
    expect(params.get('hasScan')).toBe('true');
    expect(params.get('campaignId')).toBe('7');
    expect(params.get('page')).toBe('1');
    expect(params.get('pageSize')).toBe('25');
    expect(currentPath(router)).toContain('chapter=21');

    const table = screen.getByRole('table', { name: 'Parcels received' });
    await user.click(within(table).getByRole('button', { name: 'Panels accepted' }));
    await waitFor(() => expect(lastListRequest(fetchMock).get('sort')).toBe('panelsAccepted'));
    expect(lastListRequest(fetchMock).get('chapterId')).toBe('21');
  }, 15_000);

  it('offers only the region and chapter pickers the person has more than one of', async () => {
    mockReceiptsApi({
      '/api/regions': () => jsonResponse(demoRegions.filter((region) => region.id === 1)),
      '/api/chapters': () => jsonResponse(demoChapters.filter((chapter) => chapter.id === 11)),
    });
    renderApp(paths.receipts.getHref(), { as: demoPeople.chapterLead });

    const filters = await screen.findByRole('search', { name: 'Filter parcels' });
    await screen.findByRole('table', { name: 'Parcels received' });
    expect(within(filters).queryByRole('combobox', { name: 'Region' })).not.toBeInTheDocument();
    expect(within(filters).queryByRole('combobox', { name: 'Chapter' })).not.toBeInTheDocument();
  });

  it('says what to do first when no parcel has been logged', async () => {
    mockReceiptsApi({ 'GET /api/receipts': (url) => jsonResponse(receiptsPage(url, [])) });
    const { user, router } = renderApp(paths.receipts.getHref(), { as: demoPeople.chapterLead });

    expect(
      await screen.findByRole('heading', { name: 'No parcels logged yet' }),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('link', { name: 'Log the first parcel' }));
    await waitFor(() => expect(currentPath(router)).toBe(paths.receiptNew.getHref()));
  });

  it('does not offer "Log a parcel" to a regional coordinator, who only reads', async () => {
    mockReceiptsApi({ 'GET /api/receipts': (url) => jsonResponse(receiptsPage(url, [])) });
    renderApp(paths.receipts.getHref(), { as: demoPeople.coordinator });

    expect(
      await screen.findByText('Parcels appear here once a chapter logs them.'),
    ).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: /Log/ })).not.toBeInTheDocument();
  });

  it('shows what went wrong when the list cannot be loaded', async () => {
    mockReceiptsApi({
      'GET /api/receipts': () =>
        jsonResponse(apiErrorBody(500, 'The database did not answer in time.'), 500),
    });
    renderApp(paths.receipts.getHref(), { as: demoPeople.staff });

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Parcels could not be loaded');
    expect(alert).toHaveTextContent('The database did not answer in time.');
  });

  it('is closed to a grant writer, who sees aggregates only', async () => {
    const fetchMock = mockReceiptsApi();
    renderApp(paths.receipts.getHref(), { as: demoPeople.grantWriter });

    expect(
      await screen.findByRole('heading', { level: 1, name: 'No access to Parcels' }),
    ).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/receipts')).toHaveLength(0);
  });
});
