import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoPeople } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { currentPath, renderApp } from '@/testing/render-app';
import { amendedTally, marchValues, revisionView } from '@/testing/tally-fixtures';

const tally = amendedTally();
const approvedValues = marchValues();
// Five baby blankets counted twice: fewer given out, more left in stock.
const amendedValues = {
  ...approvedValues,
  blankets: {
    ...approvedValues.blankets,
    given: [
      { blanketSizeId: 1, partnerAgencyId: 33, count: 7 },
      { blanketSizeId: 3, partnerAgencyId: 31, count: 38 },
    ],
    closing: 13,
  },
};

function mockCompareApi(extra: Parameters<typeof mockApi>[0] = {}) {
  return mockApi({
    'GET /api/tallies/501': () => jsonResponse(tally),
    'GET /api/tallies/501/revisions/1': () => jsonResponse(revisionView(tally, 1, approvedValues)),
    'GET /api/tallies/501/revisions/2': () => jsonResponse(revisionView(tally, 2, amendedValues)),
    ...extra,
  });
}

function rowOf(table: HTMLElement, label: string): HTMLElement {
  const row = within(table).getByText(label).closest('tr');
  if (!row) throw new Error(`no row for ${label}`);
  return row;
}

describe('Comparing revisions', () => {
  beforeAll(async () => {
    await import('@/app/routes/tally-revisions');
  });

  it('puts the amendment beside the approved revision and highlights what changed', async () => {
    mockCompareApi();
    renderApp(paths.tallyRevisions.getHref(501, { left: 1, right: 2 }), {
      as: demoPeople.coordinator,
    });

    const table = await screen.findByRole('table', { name: 'Figures side by side' });
    expect(screen.getByText('2 figures differ, highlighted below.')).toBeInTheDocument();

    const given = rowOf(table, 'Given out: Baby to Coastal County Neonatal Unit');
    expect(given).toHaveTextContent('127Changed');
    expect(given).toHaveAttribute('data-changed', 'true');
    const closing = within(table)
      .getAllByRole('row')
      .filter((row) => row.textContent?.startsWith('Closing stock'));
    // Panels' closing stock is the same; blankets' changed from 8 to 13.
    expect(closing.map((row) => row.textContent)).toEqual([
      'Closing stock200200',
      'Closing stock813Changed',
    ]);
    const unchanged = rowOf(table, 'Given out: Lap to Maple Street Family Shelter');
    expect(unchanged).toHaveTextContent('3838');
    expect(unchanged).not.toHaveTextContent('Changed');
    expect(unchanged).not.toHaveAttribute('data-changed');

    const left = screen.getByRole('region', { name: 'Revision 1' });
    expect(left).toHaveTextContent('Approved');
    expect(left).toHaveTextContent('by Priya Castell');
    const right = screen.getByRole('region', { name: 'Revision 2' });
    expect(right).toHaveTextContent('“Five baby blankets were counted twice.”');
    expect(right).toHaveTextContent('Approved' + 'Not yet');
  });

  it('compares the amendment with what was approved when the address names no revisions', async () => {
    mockCompareApi();
    renderApp(paths.tallyRevisions.getHref(501), { as: demoPeople.auditor });

    expect(await screen.findByRole('table', { name: 'Figures side by side' })).toBeInTheDocument();
    const pickers = screen.getByRole('group', { name: 'Revisions to compare' });
    expect(within(pickers).getByRole('combobox', { name: 'Left column' })).toHaveValue('1');
    expect(within(pickers).getByRole('combobox', { name: 'Right column' })).toHaveValue('2');
    expect(screen.getByRole('link', { name: 'Back to the tally' })).toHaveAttribute(
      'href',
      paths.tally.getHref(501),
    );
  });

  it('keeps the chosen revisions in the address', async () => {
    const fetchMock = mockCompareApi();
    const { user, router } = renderApp(paths.tallyRevisions.getHref(501, { left: 1, right: 2 }), {
      as: demoPeople.staff,
    });
    const pickers = await screen.findByRole('group', { name: 'Revisions to compare' });
    await screen.findByRole('table', { name: 'Figures side by side' });

    await user.selectOptions(
      within(pickers).getByRole('combobox', { name: 'Left column' }),
      'Revision 2 · Submitted',
    );
    await waitFor(() =>
      expect(currentPath(router)).toBe(paths.tallyRevisions.getHref(501, { left: 2, right: 2 })),
    );
    expect(
      await screen.findByText(
        'The same revision is on both sides: choose another to see what changed.',
      ),
    ).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/tallies/501/revisions/2').length).toBeGreaterThan(0);
  });

  it('shows what went wrong when a revision cannot be loaded', async () => {
    mockCompareApi({
      'GET /api/tallies/501/revisions/1': () =>
        jsonResponse(apiErrorBody(404, 'No revision 1 of this tally.'), 404),
    });
    renderApp(paths.tallyRevisions.getHref(501, { left: 1, right: 2 }), {
      as: demoPeople.staff,
    });

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('A revision could not be loaded');
    expect(alert).toHaveTextContent('No revision 1 of this tally.');
  });
});
