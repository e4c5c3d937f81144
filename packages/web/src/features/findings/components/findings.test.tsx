import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { FindingSummaryView, FindingView, SessionUser } from '@tallyloom/core';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { beforeAll, describe, expect, it } from 'vitest';
import { AppProvider } from '@/app/provider';
import { paths } from '@/config/paths';
import { createQueryClient } from '@/lib/query-client';
import { startSession } from '@/lib/session/session';
import { apiErrorBody, demoPeople, sessionFor } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { currentPath, renderApp } from '@/testing/render-app';
import { NewFindingButton } from './new-finding-button';

// Invented for these screens (BRIEF §7 spirit): one finding by the demo auditor, Oskar Lind.
function aFinding(overrides: Partial<FindingView> = {}): FindingView {
  return {
    id: 41,
    title: 'January parcels without label scans',
    severity: 'medium',
    status: 'responded',
    createdBy: demoPeople.auditor.displayName,
    createdById: demoPeople.auditor.id,
    createdAt: '2026-11-30T10:15:00.000Z',
    updatedAt: '2026-12-01T09:00:00.000Z',
    version: 3,
    responseCount: 2,
    body: 'Three parcels behind the January panel count have no scan of the label.',
    links: [
      { kind: 'trace', reference: 'region:3:2026-Q1' },
      { kind: 'sample', reference: '12' },
      { kind: 'sample_item', reference: '12:345' },
      { kind: 'receipt', reference: '345' },
    ],
    responses: [
      {
        id: 7,
        body: 'The chapter is scanning the labels this week.',
        respondedBy: demoPeople.staff.displayName,
        respondedAt: '2026-11-30T15:00:00.000Z',
      },
      {
        id: 9,
        body: 'Scans now attached to all three parcels.',
        respondedBy: demoPeople.admin.displayName,
        respondedAt: '2026-12-01T09:00:00.000Z',
      },
    ],
    closedAt: null,
    ...overrides,
  };
}

const summary = (finding: FindingView): FindingSummaryView => ({
  id: finding.id,
  title: finding.title,
  severity: finding.severity,
  status: finding.status,
  createdBy: finding.createdBy,
  createdById: finding.createdById,
  createdAt: finding.createdAt,
  updatedAt: finding.updatedAt,
  version: finding.version,
  responseCount: finding.responseCount,
});

describe('Findings list', () => {
  beforeAll(async () => {
    await import('@/app/routes/findings');
  });

  it('shows findings with severity, status and responses, and filters through the URL', async () => {
    const high = aFinding({ id: 42, title: 'Amended tally without a reason', severity: 'high' });
    const fetchMock = mockApi({
      'GET /api/findings': (url) =>
        jsonResponse({
          items:
            url.searchParams.get('status') === 'open' ? [] : [summary(high), summary(aFinding())],
          total: url.searchParams.get('status') === 'open' ? 0 : 2,
          page: 1,
          pageSize: 25,
        }),
    });
    const { user, router } = renderApp(paths.findings.getHref(), { as: demoPeople.staff });

    const table = await screen.findByRole('table', { name: 'Findings' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    expect(rows[0]).toHaveTextContent('Amended tally without a reason');
    expect(rows[0]).toHaveTextContent('High');
    expect(within(rows[1]).getByRole('link', { name: aFinding().title })).toHaveAttribute(
      'href',
      paths.finding.getHref(41),
    );
    expect(rows[1]).toHaveTextContent('Responded');
    // Staff respond; they do not write findings.
    expect(screen.queryByRole('button', { name: 'New finding' })).toBeNull();

    await user.selectOptions(screen.getByRole('combobox', { name: 'Status' }), 'open');
    expect(await screen.findByRole('heading', { name: 'No findings match' })).toBeInTheDocument();
    expect(currentPath(router)).toBe('/findings?status=open');
    const asked = seenRequests(fetchMock, '/api/findings').map((r) => r.url.searchParams);
    expect(asked[asked.length - 1].get('status')).toBe('open');
    expect(asked[asked.length - 1].get('pageSize')).toBe('25');
  });

  it('offers an auditor the first finding on an empty list, and says what failed on an error', async () => {
    mockApi({
      'GET /api/findings': () => jsonResponse({ items: [], total: 0, page: 1, pageSize: 25 }),
    });
    const empty = renderApp(paths.findings.getHref(), { as: demoPeople.auditor });
    expect(await screen.findByRole('heading', { name: 'No findings yet' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Record the first finding' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'New finding' })).toBeInTheDocument();
    empty.unmount();

    mockApi({
      'GET /api/findings': () =>
        jsonResponse(apiErrorBody(503, 'The database is not answering.'), 503),
    });
    renderApp(paths.findings.getHref(), { as: demoPeople.auditor });
    expect(await screen.findByText('The database is not answering.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});

describe('Finding page', () => {
  beforeAll(async () => {
    await import('@/app/routes/finding');
  });

  it('shows staff the links as links, the responses in order, and lets them respond', async () => {
    const finding = aFinding();
    const answered = aFinding({
      version: 4,
      responses: [
        ...finding.responses,
        {
          id: 11,
          body: 'Checked again: all scans present.',
          respondedBy: demoPeople.staff.displayName,
          respondedAt: '2026-12-02T08:00:00.000Z',
        },
      ],
    });
    const fetchMock = mockApi({
      'GET /api/findings/41': () => jsonResponse(finding),
      'POST /api/findings/41/responses': () => jsonResponse(answered, 201),
    });
    const { user } = renderApp(paths.finding.getHref(41), { as: demoPeople.staff });

    expect(await screen.findByRole('heading', { level: 1, name: finding.title })).toBeVisible();
    expect(screen.getByRole('link', { name: 'Trace region:3:2026-Q1' })).toHaveAttribute(
      'href',
      paths.trace.getHref('region:3:2026-Q1'),
    );
    expect(screen.getByRole('link', { name: 'Audit sample 12' })).toHaveAttribute(
      'href',
      paths.sample.getHref(12),
    );
    expect(screen.getByRole('link', { name: 'Sample item 12:345' })).toHaveAttribute(
      'href',
      paths.sample.getHref(12),
    );
    expect(screen.getByRole('link', { name: 'Parcel 345' })).toHaveAttribute(
      'href',
      paths.receipt.getHref(345),
    );
    const responses = within(screen.getByRole('list', { name: 'Responses, oldest first' }));
    expect(responses.getAllByRole('listitem').map((item) => item.textContent)).toEqual([
      expect.stringContaining('The chapter is scanning the labels this week.'),
      expect.stringContaining('Scans now attached to all three parcels.'),
    ]);
    expect(screen.queryByRole('button', { name: 'Edit' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Close finding' })).toBeNull();

    // An empty response is stopped before it is sent.
    await user.click(screen.getByRole('button', { name: 'Add response' }));
    expect(await screen.findByText('Write your response first.')).toBeInTheDocument();
    await user.type(
      screen.getByRole('textbox', { name: /Your response/ }),
      'Checked again: all scans present.',
    );
    await user.click(screen.getByRole('button', { name: 'Add response' }));
    await waitFor(() =>
      expect(
        screen.getByRole('list', { name: 'Responses, oldest first' }).querySelectorAll('li'),
      ).toHaveLength(3),
    );
    const posted = seenRequests(fetchMock, '/api/findings/41/responses');
    expect(posted.map((r) => [r.method, r.body])).toEqual([
      ['POST', { body: 'Checked again: all scans present.' }],
    ]);
  });

  it('lets the author close a finding only after confirming, sending the version read', async () => {
    const finding = aFinding();
    const fetchMock = mockApi({
      'GET /api/findings/41': () => jsonResponse(finding),
      'POST /api/findings/41/close': () =>
        jsonResponse(
          aFinding({ status: 'closed', version: 4, closedAt: '2026-12-02T09:00:00.000Z' }),
        ),
    });
    const { user } = renderApp(paths.finding.getHref(41), { as: demoPeople.auditor });

    await user.click(await screen.findByRole('button', { name: 'Close finding' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Close this finding?' });
    // Cancelling sends nothing.
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).toBeNull());
    expect(seenRequests(fetchMock, '/api/findings/41/close')).toHaveLength(0);

    await user.click(await screen.findByRole('button', { name: 'Close finding' }));
    const again = await screen.findByRole('alertdialog', { name: 'Close this finding?' });
    await user.click(within(again).getByRole('button', { name: 'Close finding' }));
    await waitFor(() => expect(screen.queryByRole('button', { name: 'Edit' })).toBeNull());
    expect(screen.getByText('Closed', { selector: '.fui-Badge' })).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/findings/41/close').map((r) => r.body)).toEqual([
      { version: 3 },
    ]);
    // An auditor never gets the response form.
    expect(screen.queryByRole('button', { name: 'Add response' })).toBeNull();
  });

  it('shows the author the edit, and the server’s word when someone changed it meanwhile', async () => {
    const finding = aFinding();
    const fetchMock = mockApi({
      'GET /api/findings/41': () => jsonResponse(finding),
      'PATCH /api/findings/41': () =>
        jsonResponse(
          {
            ...apiErrorBody(409, 'This finding changed since you opened it (it is now version 4).'),
            current: aFinding({ version: 4, title: 'Changed meanwhile' }),
          },
          409,
        ),
    });
    const { user } = renderApp(paths.finding.getHref(41), { as: demoPeople.auditor });

    await user.click(await screen.findByRole('button', { name: 'Edit' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit the finding' });
    await user.click(within(dialog).getByRole('radio', { name: 'High' }));
    await user.click(within(dialog).getByRole('button', { name: 'Save changes' }));
    expect(await screen.findByText(/This finding changed since you opened it/)).toBeInTheDocument();
    expect(
      seenRequests(fetchMock, '/api/findings/41')
        .filter((r) => r.method === 'PATCH')
        .map((r) => r.body),
    ).toEqual([
      {
        version: 3,
        title: finding.title,
        body: finding.body,
        severity: 'high',
        addLinks: [],
      },
    ]);
    // Behind the dialog, the page now shows the finding as it is.
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Changed meanwhile' }),
    ).toBeVisible();
  });

  it("shows another auditor's finding without the edit, and a closed one without actions", async () => {
    mockApi({ 'GET /api/findings/41': () => jsonResponse(aFinding({ createdById: 999 })) });
    const other = renderApp(paths.finding.getHref(41), { as: demoPeople.auditor });
    expect(await screen.findByRole('button', { name: 'Close finding' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Edit' })).toBeNull();
    other.unmount();

    mockApi({
      'GET /api/findings/41': () =>
        jsonResponse(aFinding({ status: 'closed', closedAt: '2026-12-02T09:00:00.000Z' })),
    });
    renderApp(paths.finding.getHref(41), { as: demoPeople.staff });
    expect(await screen.findByRole('heading', { level: 1, name: aFinding().title })).toBeVisible();
    expect(screen.getByText('Closed', { selector: '.fui-Badge' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Add response' })).toBeNull();
  });
});

/** The button on its own, as another screen would place it, with the finding page behind it. */
function renderButton(as: SessionUser, element: React.ReactNode) {
  startSession(sessionFor(as));
  const queryClient = createQueryClient({ queries: { retry: false } });
  const router = createMemoryRouter(
    [
      { path: '/', element },
      { path: paths.finding.path, element: <p>Finding page</p> },
    ],
    { initialEntries: ['/'] },
  );
  const user = userEvent.setup();
  render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { user, router };
}

describe('NewFindingButton', () => {
  it('renders nothing for those who may not write findings', () => {
    mockApi({});
    renderButton(
      demoPeople.staff,
      <>
        <p>Trace page</p>
        <NewFindingButton link={{ kind: 'trace', reference: 'region:3:2026-Q1' }} />
      </>,
    );
    expect(screen.getByText('Trace page')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'New finding' })).toBeNull();
  });

  it('starts with the link it was given, names a bad field, and opens the saved finding', async () => {
    let attempts = 0;
    const fetchMock = mockApi({
      'POST /api/findings': () =>
        ++attempts === 1
          ? jsonResponse(
              {
                ...apiErrorBody(400, 'Invalid input: links.1.reference'),
                fields: [
                  { field: 'links.1.reference', messages: ['There is no audit sample 99.'] },
                ],
              },
              400,
            )
          : jsonResponse(aFinding({ id: 77, status: 'open', responses: [] }), 201),
    });
    const { user, router } = renderButton(
      demoPeople.auditor,
      <NewFindingButton link={{ kind: 'trace', reference: 'region:3:2026-Q1' }} />,
    );

    await user.click(screen.getByRole('button', { name: 'New finding' }));
    const dialog = await screen.findByRole('dialog', { name: 'New finding' });
    expect(within(dialog).getByRole('group', { name: 'Links' })).toHaveTextContent(
      'Trace region:3:2026-Q1',
    );
    // Nothing is sent until the title and text are there.
    await user.click(within(dialog).getByRole('button', { name: 'Record finding' }));
    expect(await within(dialog).findByText('Give the finding a short title.')).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/findings')).toHaveLength(0);

    await user.type(within(dialog).getByRole('textbox', { name: /Title/ }), 'Scans missing');
    await user.type(
      within(dialog).getByRole('textbox', { name: /What you found/ }),
      'Three parcels have no label scan.',
    );
    await user.selectOptions(within(dialog).getByRole('combobox', { name: 'Kind' }), 'sample');
    await user.type(within(dialog).getByRole('textbox', { name: /Reference/ }), '99{Enter}');
    await user.click(within(dialog).getByRole('button', { name: 'Record finding' }));
    expect(await within(dialog).findByText('There is no audit sample 99.')).toBeInTheDocument();

    await user.click(within(dialog).getByRole('button', { name: 'Do not add Audit sample 99' }));
    await user.click(within(dialog).getByRole('button', { name: 'Record finding' }));
    await waitFor(() => expect(currentPath(router)).toBe(paths.finding.getHref(77)));
    expect(seenRequests(fetchMock, '/api/findings').map((r) => r.body)).toEqual([
      {
        title: 'Scans missing',
        body: 'Three parcels have no label scan.',
        severity: 'medium',
        links: [
          { kind: 'trace', reference: 'region:3:2026-Q1' },
          { kind: 'sample', reference: '99' },
        ],
      },
      {
        title: 'Scans missing',
        body: 'Three parcels have no label scan.',
        severity: 'medium',
        links: [{ kind: 'trace', reference: 'region:3:2026-Q1' }],
      },
    ]);
  });
});
