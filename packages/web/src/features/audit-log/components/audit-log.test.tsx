import { screen, waitFor, within } from '@testing-library/react';
import type { AuditLogEntryView, AuditLogPage, AuditVerificationView } from '@tallyloom/core';
import { beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoPeople } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { currentPath, renderApp } from '@/testing/render-app';

// Invented entries in the demo network's spirit (BRIEF §7).
function anEntry(overrides: Partial<AuditLogEntryView> = {}): AuditLogEntryView {
  return {
    id: 9120,
    occurredAt: '2026-12-01T10:15:00.000Z',
    actorUserId: 2,
    actorEmail: 'tobias.wren@emberfold.example',
    action: 'tally.approved',
    entityType: 'monthly_tally',
    entityId: '311',
    before: { state: 'submitted' },
    after: { state: 'approved' },
    requestId: 'b7c1f0e2-1111-4000-8000-000000000001',
    ip: '10.0.0.8',
    sealed: true,
    chainSeq: 9118,
    entryHash: 'a'.repeat(64),
    ...overrides,
  };
}

const sealed = anEntry();
const pending = anEntry({
  id: 9121,
  action: 'receipt.created',
  entityType: 'parcel_receipt',
  entityId: '5012',
  before: null,
  after: { panelsAccepted: 42 },
  sealed: false,
  chainSeq: null,
  entryHash: null,
});

const pageOf = (items: AuditLogEntryView[], total = items.length): AuditLogPage => ({
  items,
  total,
  page: 1,
  pageSize: 50,
});

const holds: AuditVerificationView = {
  ok: true,
  entriesChecked: 9120,
  firstBrokenLink: null,
  verifiedAt: '2026-12-02T08:00:00.000Z',
  headChainSeq: 9120,
  sealedBeforeCheck: 2,
};

describe('Audit log', () => {
  beforeAll(async () => {
    await import('@/app/routes/audit-log');
  });

  beforeEach(() => {
    Object.defineProperty(URL, 'createObjectURL', {
      configurable: true,
      value: vi.fn(() => 'blob:audit-log'),
    });
    Object.defineProperty(URL, 'revokeObjectURL', { configurable: true, value: vi.fn() });
  });

  it('lists entries newest first with their seal, and asks with the filters in the URL', async () => {
    const fetchMock = mockApi({
      'GET /api/audit-log': () => jsonResponse(pageOf([pending, sealed])),
    });
    renderApp(paths.auditLog.getHref('?who=tobias&what=tally.&from=2026-11-01'), {
      as: demoPeople.auditor,
    });

    const table = await screen.findByRole('table', { name: 'Entries, newest first' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    expect(rows[0]).toHaveTextContent('receipt.created');
    expect(rows[0]).toHaveTextContent('Not sealed yet');
    expect(rows[1]).toHaveTextContent('tally.approved');
    expect(rows[1]).toHaveTextContent('monthly_tally 311');
    expect(rows[1]).toHaveTextContent('#9,118');
    expect(rows[1]).toHaveTextContent('{"state":"submitted"} → {"state":"approved"}');

    const asked = seenRequests(fetchMock, '/api/audit-log')[0].url.searchParams;
    expect(asked.get('who')).toBe('tobias');
    expect(asked.get('what')).toBe('tally.');
    expect(asked.get('from')).toBe('2026-11-01');
    expect(asked.get('pageSize')).toBe('50');
    expect(screen.getByRole('textbox', { name: /Who/ })).toHaveValue('tobias');
  });

  it('applies typed filters on Apply, back to page 1, and keeps them in the URL', async () => {
    const fetchMock = mockApi({
      'GET /api/audit-log': () => jsonResponse(pageOf([sealed], 120)),
    });
    const { user, router } = renderApp(paths.auditLog.getHref('?page=2'), {
      as: demoPeople.admin,
    });
    await screen.findByRole('table', { name: 'Entries, newest first' });

    await user.type(screen.getByRole('textbox', { name: 'Entity type' }), 'monthly_tally');
    await user.type(screen.getByRole('textbox', { name: 'Entity id' }), '311');
    expect(seenRequests(fetchMock, '/api/audit-log')).toHaveLength(1);
    await user.click(screen.getByRole('button', { name: 'Apply' }));

    await waitFor(() =>
      expect(currentPath(router)).toBe('/audit-log?entityType=monthly_tally&entityId=311'),
    );
    await waitFor(() => {
      const last = seenRequests(fetchMock, '/api/audit-log').at(-1)!.url.searchParams;
      expect(last.get('entityType')).toBe('monthly_tally');
      expect(last.get('entityId')).toBe('311');
      expect(last.get('page')).toBe('1');
    });
  });

  it('verifies the chain and says that it holds', async () => {
    const fetchMock = mockApi({
      'GET /api/audit-log': () => jsonResponse(pageOf([sealed])),
      'POST /api/audit-log/verify': () => jsonResponse(holds),
    });
    const { user } = renderApp(paths.auditLog.getHref(), { as: demoPeople.auditor });
    await screen.findByRole('table', { name: 'Entries, newest first' });

    await user.click(screen.getByRole('button', { name: 'Verify the chain' }));
    const status = await screen.findByRole('status');
    expect(status).toHaveTextContent('The chain holds');
    expect(status).toHaveTextContent('9,120 entries checked');
    expect(seenRequests(fetchMock, '/api/audit-log/verify')).toHaveLength(1);
  });

  it('shows the first broken link plainly', async () => {
    mockApi({
      'GET /api/audit-log': () => jsonResponse(pageOf([sealed])),
      'POST /api/audit-log/verify': () =>
        jsonResponse({
          ...holds,
          ok: false,
          entriesChecked: 41,
          headChainSeq: 40,
          firstBrokenLink: {
            chainSeq: 41,
            entryId: 57,
            reason: 'content-changed',
            message:
              'Entry #41 (entry 57) was changed after it was sealed: its content no longer gives its stored hash.',
          },
        } satisfies AuditVerificationView),
    });
    const { user } = renderApp(paths.auditLog.getHref(), { as: demoPeople.admin });
    await screen.findByRole('table', { name: 'Entries, newest first' });

    await user.click(screen.getByRole('button', { name: 'Verify the chain' }));
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('The chain is broken at entry #41');
    expect(alert).toHaveTextContent('An entry was changed after it was sealed');
    expect(alert).toHaveTextContent("The entry's number is 57");
  });

  it('exports what the filters show as xlsx', async () => {
    const fetchMock = mockApi({
      'GET /api/audit-log': () => jsonResponse(pageOf([sealed])),
      'GET /api/audit-log/export': () =>
        new Response('xlsx bytes', {
          status: 200,
          headers: {
            'Content-Type': 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
          },
        }),
    });
    const { user } = renderApp(paths.auditLog.getHref('?what=tally.&page=3'), {
      as: demoPeople.auditor,
    });
    await screen.findByRole('table', { name: 'Entries, newest first' });

    await user.click(screen.getByRole('button', { name: 'Export to xlsx' }));
    await waitFor(() => expect(URL.createObjectURL).toHaveBeenCalled());
    const asked = seenRequests(fetchMock, '/api/audit-log/export')[0].url.searchParams;
    expect(asked.get('what')).toBe('tally.');
    expect(asked.has('page')).toBe(false);
  });

  it('says when the export fails, and keeps the list', async () => {
    mockApi({
      'GET /api/audit-log': () => jsonResponse(pageOf([sealed])),
      'GET /api/audit-log/export': () =>
        jsonResponse(apiErrorBody(503, 'The database is not answering.'), 503),
    });
    const { user } = renderApp(paths.auditLog.getHref(), { as: demoPeople.auditor });
    await screen.findByRole('table', { name: 'Entries, newest first' });

    await user.click(screen.getByRole('button', { name: 'Export to xlsx' }));
    expect(
      await screen.findByRole('heading', { name: 'The export could not be made' }),
    ).toBeInTheDocument();
    expect(screen.getByText('The database is not answering.')).toBeInTheDocument();
    expect(URL.createObjectURL).not.toHaveBeenCalled();
    expect(screen.getByRole('table', { name: 'Entries, newest first' })).toBeInTheDocument();
  });

  it('says when nothing matches, and what went wrong when the log cannot be read', async () => {
    mockApi({ 'GET /api/audit-log': () => jsonResponse(pageOf([])) });
    const empty = renderApp(paths.auditLog.getHref('?what=nothing.'), { as: demoPeople.auditor });
    expect(await screen.findByRole('heading', { name: 'No entries match' })).toBeInTheDocument();
    empty.unmount();

    mockApi({
      'GET /api/audit-log': () =>
        jsonResponse(
          apiErrorBody(400, 'Invalid input: to', {
            fields: [{ field: 'to', messages: ['to must be on or after from'] }],
          }),
          400,
        ),
    });
    renderApp(paths.auditLog.getHref('?from=2026-03-02&to=2026-03-01'), { as: demoPeople.auditor });
    expect(await screen.findByText('Invalid input: to')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });

  it('is not shown to people without audit.read', async () => {
    mockApi({});
    renderApp(paths.auditLog.getHref(), { as: demoPeople.staff });
    expect(
      await screen.findByRole('heading', { level: 1, name: 'No access to Audit log' }),
    ).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Verify the chain' })).toBeNull();
  });
});
