import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { aFinishedExport, anExport } from '@/testing/export-fixtures';
import { demoPeople, demoRegions } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { demoCampaigns } from '@/testing/receipt-fixtures';
import { renderApp } from '@/testing/render-app';

const pack = anExport({
  id: '0b7e4c1a-5f2d-4a8e-b3c6-9d1e2f3a4b5c',
  kind: 'impact-pack',
  table: null,
  fileName: 'tallyloom-impact-pack-network-FY2026.xlsx',
  description: 'Impact pack · Whole network · FY 2025–26',
});
const packPath = `/api/exports/${pack.id}`;

function mockPackApi() {
  return mockApi({
    '/api/regions': () => jsonResponse(demoRegions),
    '/api/campaigns': () => jsonResponse(demoCampaigns),
    'POST /api/exports/impact-pack': () => jsonResponse(pack, 202),
    [`GET ${packPath}`]: () =>
      jsonResponse(
        aFinishedExport({
          ...pack,
          state: 'done',
          rows: 96,
          sheets: 11,
          downloadUrl: `${packPath}/file?expires=1&signature=ab`,
        }),
      ),
  });
}

function posted(fetchMock: ReturnType<typeof mockApi>): unknown[] {
  return seenRequests(fetchMock, '/api/exports/impact-pack').map((request) => request.body);
}

// The page opens on the fiscal year that ends this calendar year.
const thisFiscalYear = `FY${new Date().getFullYear()}`;

describe('Impact pack', () => {
  beforeAll(async () => {
    await import('@/app/routes/impact-pack');
  });

  it('builds the network pack for the fiscal year and offers the download', async () => {
    const fetchMock = mockPackApi();
    const { user } = renderApp(paths.impactPack.getHref(), { as: demoPeople.grantWriter });
    await screen.findByRole('heading', { level: 1, name: 'Impact pack' });
    const contents = screen.getByRole('region', { name: 'What the workbook contains' });
    expect(contents).toHaveTextContent('Data dictionary');
    expect(contents).toHaveTextContent('No sender’s name, e-mail or address');

    await user.click(screen.getByRole('button', { name: 'Build impact pack' }));
    await waitFor(() => expect(posted(fetchMock)).toHaveLength(1));
    expect(posted(fetchMock)[0]).toEqual({
      scope: 'network',
      periodKind: 'fiscal_year',
      period: thisFiscalYear,
    });
    const dialog = await screen.findByRole('dialog', { name: 'Impact pack' });
    const link = await within(dialog).findByRole('link', {
      name: 'Download tallyloom-impact-pack-network-FY2026.xlsx',
    });
    expect(link).toHaveAttribute('href', `${packPath}/file?expires=1&signature=ab`);
    expect(dialog).toHaveTextContent('96 rows on 11 sheets');
  });

  it('asks for the region of a regional pack before sending anything', async () => {
    const fetchMock = mockPackApi();
    const { user } = renderApp(paths.impactPack.getHref(), { as: demoPeople.staff });
    await user.click(await screen.findByRole('radio', { name: 'A region' }));
    await user.click(screen.getByRole('button', { name: 'Build impact pack' }));

    expect(await screen.findByText('Choose the region the pack is for.')).toBeInTheDocument();
    expect(posted(fetchMock)).toHaveLength(0);
    expect(screen.queryByRole('dialog')).toBeNull();

    const region = screen.getByRole('combobox', { name: /Region/ });
    await waitFor(() => expect(region).toBeEnabled());
    await user.selectOptions(region, 'Riverlands');
    expect(screen.queryByText('Choose the region the pack is for.')).toBeNull();
    // The dashboards' own period picker: a quarter instead of the fiscal year.
    const period = within(screen.getByRole('group', { name: 'Period' }));
    await user.selectOptions(period.getByRole('combobox', { name: 'Period' }), 'quarter');
    const quarter = period.getByRole<HTMLSelectElement>('combobox', { name: 'Quarter' }).value;
    await user.click(screen.getByRole('button', { name: 'Build impact pack' }));

    await waitFor(() => expect(posted(fetchMock)).toHaveLength(1));
    expect(quarter).toMatch(/^\d{4}-Q[1-4]$/);
    expect(posted(fetchMock)[0]).toEqual({
      scope: 'region',
      scopeId: 2,
      periodKind: 'quarter',
      period: quarter,
    });
  });

  it('asks for the campaign of a campaign pack, and sends a custom range as from and to', async () => {
    const fetchMock = mockPackApi();
    const { user } = renderApp(paths.impactPack.getHref(), { as: demoPeople.admin });
    await user.click(await screen.findByRole('radio', { name: 'A campaign' }));
    await user.click(screen.getByRole('button', { name: 'Build impact pack' }));
    expect(await screen.findByText('Choose the campaign the pack is for.')).toBeInTheDocument();
    expect(posted(fetchMock)).toHaveLength(0);

    const campaign = screen.getByRole('combobox', { name: /Campaign/ });
    await waitFor(() => expect(campaign).toBeEnabled());
    const chosen = demoCampaigns[0];
    await user.selectOptions(campaign, String(chosen.id));
    const period = within(screen.getByRole('group', { name: 'Period' }));
    await user.selectOptions(period.getByRole('combobox', { name: 'Period' }), 'custom');
    const from = period.getByRole<HTMLSelectElement>('combobox', { name: 'From' }).value;
    const to = period.getByRole<HTMLSelectElement>('combobox', { name: 'To' }).value;
    await user.click(screen.getByRole('button', { name: 'Build impact pack' }));

    await waitFor(() => expect(posted(fetchMock)).toHaveLength(1));
    expect(posted(fetchMock)[0]).toEqual({
      scope: 'campaign',
      scopeId: chosen.id,
      periodKind: 'custom',
      from,
      to,
    });
  });

  it('is not open to roles without the impact pack policy, and not in their navigation', async () => {
    const fetchMock = mockPackApi();
    renderApp(paths.impactPack.getHref(), { as: demoPeople.chapterLead });
    expect(
      await screen.findByText(/network admin, national staff and grant writer/i),
    ).toBeInTheDocument();
    const nav = screen.getByRole('navigation', { name: 'Main' });
    expect(within(nav).queryByRole('link', { name: 'Impact pack' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Build impact pack' })).toBeNull();
    expect(posted(fetchMock)).toHaveLength(0);
  });
});
