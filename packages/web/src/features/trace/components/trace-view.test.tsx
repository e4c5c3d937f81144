import type { TraceTallyLine, TraceView } from '@tallyloom/core';
import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoPeople } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { currentPath, renderApp } from '@/testing/render-app';

// Invented demo figures (BRIEF §7).
const REFERENCE = 'region:1:2026-Q1';
const API_PATH = `/api/trace/${encodeURIComponent(REFERENCE)}`;

function aLine(overrides: Partial<TraceTallyLine> = {}): TraceTallyLine {
  return {
    tallyId: 901,
    chapterId: 11,
    chapterName: 'Alder Falls',
    regionName: 'North Ridge',
    month: '2026-01',
    revision: 1,
    approvedBy: 'Priya Castell',
    approvedAt: '2026-02-06T10:15:00Z',
    value: { panelsAccepted: 600 },
    amendments: [],
    receipts: [],
    ...overrides,
  };
}

const amended = aLine({
  tallyId: 902,
  month: '2026-02',
  revision: 2,
  value: { panelsAccepted: 650 },
  amendments: [
    {
      revision: 2,
      reason: 'Two parcels were logged late.',
      changes: [{ field: 'panelsAccepted', label: 'Panels accepted', before: 610, after: 650 }],
    },
  ],
  receipts: [
    {
      id: 501,
      receivedOn: '2026-02-03',
      panelsAccepted: 650,
      setAsideTotal: 4,
      campaignCode: 'DWD26',
      scanCount: 1,
      scans: [{ id: 31, fileName: 'label-front.png', url: '/api/receipts/501/scans/31/file' }],
    },
  ],
});

function aTrace(overrides: Partial<TraceView> = {}): TraceView {
  return {
    reference: REFERENCE,
    scope: 'region',
    scopeId: 1,
    scopeName: 'North Ridge',
    period: { kind: 'quarter', key: '2026-Q1', from: '2026-01', to: '2026-03', label: 'Q1 2026' },
    measure: 'panelsAccepted',
    figure: { panelsAccepted: 1_250 },
    recomputed: { panelsAccepted: 1_250 },
    agrees: true,
    asOf: '2026-04-02T03:00:00Z',
    tallies: [aLine(), amended],
    ...overrides,
  };
}

describe('Trace page', () => {
  beforeAll(async () => {
    await import('@/app/routes/trace');
  });

  beforeEach(() => {
    // jsdom has no object URLs; the scan link only needs one to exist.
    Object.defineProperty(URL, 'createObjectURL', {
      configurable: true,
      value: vi.fn(() => 'blob:scan-1'),
    });
    Object.defineProperty(URL, 'revokeObjectURL', { configurable: true, value: vi.fn() });
  });

  it('shows the subject, the figure against the re-added total, and each tally down to its scan', async () => {
    const fetchMock = mockApi({
      [API_PATH]: () => jsonResponse(aTrace()),
      '/api/receipts/501/scans/31/file': () =>
        new Response('png-bytes', { headers: { 'Content-Type': 'image/png' } }),
    });
    const { user } = renderApp(paths.trace.getHref(REFERENCE, 'panelsAccepted'), {
      as: demoPeople.auditor,
    });

    expect(await screen.findByText('Agrees')).toBeInTheDocument();
    // The auditor can raise a finding linked to this trace from here.
    expect(screen.getByRole('button', { name: 'New finding' })).toBeInTheDocument();
    expect(screen.getAllByRole('term').map((term) => term.textContent)).toEqual([
      'Region',
      'Period',
      'Measure',
      'Report as of',
      'Reference',
    ]);
    expect(screen.getAllByRole('definition').map((detail) => detail.textContent)).toEqual([
      'North Ridge',
      'Q1 2026',
      'Panels received',
      expect.stringMatching(/2026/),
      REFERENCE,
    ]);
    const figures = screen.getByRole('table', { name: 'Figure and re-added total' });
    expect(within(figures).getAllByRole('row')[1]).toHaveTextContent(
      'Panels received1,2501,250Matches',
    );
    expect(seenRequests(fetchMock, API_PATH)[0].url.searchParams.get('measure')).toBe(
      'panelsAccepted',
    );

    const lines = screen.getByRole('table', { name: 'Approved tally revisions (2)' });
    const rows = within(lines).getAllByRole('row').slice(1);
    expect(rows[0]).toHaveTextContent('Alder FallsNorth RidgeJan 20261Priya Castell');
    expect(within(rows[0]).getByRole('link', { name: 'Alder Falls' })).toHaveAttribute(
      'href',
      paths.tally.getHref(901),
    );
    expect(rows[1]).toHaveTextContent('2 (amended)');
    expect(rows[1]).toHaveTextContent('650');

    await user.click(
      within(rows[1]).getByRole('button', {
        name: 'Show amendments and receipts of Alder Falls, Feb 2026',
      }),
    );
    const amendments = screen.getByRole('table', { name: 'Amendments of Alder Falls, 2026-02' });
    expect(within(amendments).getAllByRole('row')[1]).toHaveTextContent(
      '2Two parcels were logged late.Panels accepted610650',
    );
    const receipts = screen.getByRole('table', { name: 'Parcel receipts of Alder Falls, 2026-02' });
    expect(within(receipts).getByRole('link', { name: /Parcel 3 Feb 2026/ })).toHaveAttribute(
      'href',
      paths.receipt.getHref(501),
    );
    const scan = await within(receipts).findByRole('link', { name: 'Open scan label-front.png' });
    expect(scan).toHaveAttribute('href', 'blob:scan-1');
    expect(seenRequests(fetchMock, '/api/receipts/501/scans/31/file')[0].authorization).toBe(
      `Bearer token-${demoPeople.auditor.id}`,
    );

    expect(screen.getByRole('textbox', { name: 'Stable address of this trace' })).toHaveValue(
      `${window.location.origin}${paths.trace.getHref(REFERENCE, 'panelsAccepted')}`,
    );
    await user.click(screen.getByRole('button', { name: 'Copy link' }));
    await expect(navigator.clipboard.readText()).resolves.toBe(
      `${window.location.origin}${paths.trace.getHref(REFERENCE, 'panelsAccepted')}`,
    );
  });

  it('says plainly when the re-added total does not agree', async () => {
    mockApi({
      [API_PATH]: () =>
        jsonResponse(aTrace({ recomputed: { panelsAccepted: 1_240 }, agrees: false })),
    });
    renderApp(paths.trace.getHref(REFERENCE, 'panelsAccepted'), { as: demoPeople.auditor });
    expect(await screen.findByText('Does not agree')).toBeInTheDocument();
    const figures = screen.getByRole('table', { name: 'Figure and re-added total' });
    expect(within(figures).getAllByRole('row')[1]).toHaveTextContent('1,2501,240Differs');
  });

  it('asks again with the measure chosen, and keeps it in the address', async () => {
    const fetchMock = mockApi({ [API_PATH]: () => jsonResponse(aTrace()) });
    const { user, router } = renderApp(paths.trace.getHref(REFERENCE), { as: demoPeople.auditor });
    await screen.findByText('Agrees');
    expect(seenRequests(fetchMock, API_PATH)[0].url.searchParams.get('measure')).toBeNull();
    await user.selectOptions(screen.getByRole('combobox', { name: 'Measure' }), 'blanketsGiven');
    await waitFor(() =>
      expect(seenRequests(fetchMock, API_PATH).at(-1)?.url.searchParams.get('measure')).toBe(
        'blanketsGiven',
      ),
    );
    expect(currentPath(router)).toBe(paths.trace.getHref(REFERENCE, 'blanketsGiven'));
  });

  it('pages through a long trace fifty tallies at a time', async () => {
    const many = Array.from({ length: 120 }, (_, index) =>
      aLine({ tallyId: 1_000 + index, chapterName: `Chapter ${index + 1}` }),
    );
    mockApi({ [API_PATH]: () => jsonResponse(aTrace({ tallies: many })) });
    const { user } = renderApp(paths.trace.getHref(REFERENCE), { as: demoPeople.auditor });
    const lines = await screen.findByRole('table', { name: 'Approved tally revisions (120)' });
    expect(within(lines).getAllByRole('row')).toHaveLength(51);
    expect(screen.getByText('1–50 of 120')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Next page' }));
    expect(within(lines).getByRole('link', { name: 'Chapter 51' })).toBeInTheDocument();
    expect(within(lines).queryByRole('link', { name: 'Chapter 50' })).toBeNull();
  });

  it('explains a figure outside the scope, and an address that is no reference', async () => {
    mockApi({
      [API_PATH]: () => jsonResponse(apiErrorBody(404, 'No such figure in your scope.'), 404),
    });
    const outside = renderApp(paths.trace.getHref(REFERENCE), { as: demoPeople.chapterLead });
    expect(
      await screen.findByRole('heading', {
        name: 'Nothing to trace here: outside your scope, or no report built',
      }),
    ).toBeInTheDocument();
    expect(screen.getByText('No such figure in your scope.')).toBeInTheDocument();
    outside.unmount();

    const fetchMock = mockApi({});
    renderApp(paths.trace.getHref('region:x:2026'), { as: demoPeople.auditor });
    expect(
      await screen.findByRole('heading', {
        name: 'This address names no figure that can be traced',
      }),
    ).toBeInTheDocument();
    expect(seenRequests(fetchMock).filter((r) => r.url.pathname.startsWith('/api/trace'))).toEqual(
      [],
    );
  });
});
