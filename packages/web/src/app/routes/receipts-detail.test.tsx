import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import type { ReceiptHistoryEntry } from '@/features/receipts/api/get-receipt-history';
import { paths } from '@/config/paths';
import { apiErrorBody, demoPeople } from '@/testing/fixtures';
import { emptyResponse, jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { aReceipt } from '@/testing/receipt-fixtures';
import { renderApp } from '@/testing/render-app';

type Handlers = Parameters<typeof mockApi>[0];

const history: ReceiptHistoryEntry[] = [
  {
    id: 1,
    action: 'receipt.created',
    occurredAt: '2026-01-04T10:10:00Z',
    actorUserId: 4,
    actorEmail: 'dana.whitlock@emberfold.example',
    before: null,
    after: { panelsAccepted: 1_200, notes: null, sender: 'present', version: 1 },
  },
  {
    id: 2,
    action: 'receipt.updated',
    occurredAt: '2026-01-05T08:30:00Z',
    actorUserId: 4,
    actorEmail: 'dana.whitlock@emberfold.example',
    before: { panelsAccepted: 1_200, notes: null, sender: 'present', version: 1 },
    after: {
      panelsAccepted: 1_240,
      notes: 'Two hats in the box as well.',
      sender: 'present',
      version: 2,
    },
  },
];

function mockDetailApi(extra: Handlers = {}) {
  return mockApi({
    'GET /api/receipts/501': () => jsonResponse(aReceipt()),
    '/api/receipts/501/history': () => jsonResponse(history),
    '/api/receipts/501/scans/31/file': () =>
      new Response('png-bytes', { headers: { 'Content-Type': 'image/png' } }),
    '/api/receipts/501/scans/32/file': () =>
      new Response('pdf-bytes', { headers: { 'Content-Type': 'application/pdf' } }),
    ...extra,
  });
}

describe('Parcel page', () => {
  beforeAll(async () => {
    await import('./receipts-detail');
  });

  beforeEach(() => {
    // jsdom has no object URLs; a scan's preview only needs one to exist.
    let next = 0;
    Object.defineProperty(URL, 'createObjectURL', {
      configurable: true,
      value: vi.fn(() => `blob:scan-${(next += 1)}`),
    });
    Object.defineProperty(URL, 'revokeObjectURL', { configurable: true, value: vi.fn() });
  });

  it('shows the figures, the sender, scans fetched with the sign-in, and the history', async () => {
    const fetchMock = mockDetailApi();
    renderApp(paths.receipt.getHref(501), { as: demoPeople.chapterLead });

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Parcel received 4 Jan 2026' }),
    ).toBeInTheDocument();
    const panels = screen.getByRole('region', { name: 'Panels' });
    expect(panels).toHaveTextContent('Accepted1,240');
    expect(panels).toHaveTextContent('Set aside in all16');
    const sender = screen.getByRole('region', { name: 'Sender' });
    expect(sender).toHaveTextContent('Wren Example');
    expect(sender).toHaveTextContent('wren@maker.example');
    // Only an admin erases a sender's details.
    expect(
      within(sender).queryByRole('button', { name: "Erase sender's details" }),
    ).not.toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Finished items' })).toHaveTextContent(
      /infants sleep without loose blankets/,
    );

    const thumbnail = await screen.findByRole('img', { name: 'Scan: label-front.png' });
    expect(thumbnail.getAttribute('src')).toMatch(/^blob:scan-/);
    expect(await screen.findByRole('link', { name: 'Open packing-slip.pdf' })).toHaveAttribute(
      'href',
      expect.stringMatching(/^blob:scan-/),
    );
    expect(seenRequests(fetchMock, '/api/receipts/501/scans/31/file')[0]?.authorization).toBe(
      `Bearer token-${demoPeople.chapterLead.id}`,
    );

    const entries = within(await screen.findByRole('list', { name: 'History' })).getAllByRole(
      'listitem',
    );
    expect(entries).toHaveLength(2);
    expect(entries[0]).toHaveTextContent('Logged by dana.whitlock@emberfold.example');
    expect(entries[1]).toHaveTextContent('Corrected by dana.whitlock@emberfold.example');
    expect(entries[1]).toHaveTextContent('Changed: panels accepted, notes');
  });

  it("hides the sender's details from a regional coordinator, who cannot change anything", async () => {
    mockDetailApi({ 'GET /api/receipts/501': () => jsonResponse(aReceipt({ sender: null })) });
    renderApp(paths.receipt.getHref(501), { as: demoPeople.coordinator });

    const sender = await screen.findByRole('region', { name: 'Sender' });
    expect(sender).toHaveTextContent('Hidden for your role');
    expect(screen.queryByRole('link', { name: 'Correct' })).not.toBeInTheDocument();
    expect(
      screen.queryByRole('button', { name: 'Attach a scan or photo…' }),
    ).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Delete / })).not.toBeInTheDocument();
  });

  it('says when the sender was erased', async () => {
    mockDetailApi({
      'GET /api/receipts/501': () => jsonResponse(aReceipt({ sender: null, senderErased: true })),
      '/api/receipts/501/history': () =>
        jsonResponse([
          ...history,
          {
            id: 3,
            action: 'receipt.sender_erased',
            occurredAt: '2026-02-05T12:00:00Z',
            actorUserId: 1,
            actorEmail: 'maren.holt@emberfold.example',
            before: { sender: 'present' },
            after: { sender: 'absent', erasedFields: ['name', 'email', 'address'] },
          },
        ]),
    });
    renderApp(paths.receipt.getHref(501), { as: demoPeople.admin });

    const sender = await screen.findByRole('region', { name: 'Sender' });
    await waitFor(() => expect(sender).toHaveTextContent('Erased on 5 Feb 2026'));
    expect(within(sender).queryByRole('button')).not.toBeInTheDocument();
  });

  it("asks an admin to confirm before erasing the sender's details, and keeps the counts", async () => {
    let stored = aReceipt();
    const fetchMock = mockDetailApi({
      'GET /api/receipts/501': () => jsonResponse(stored),
      'POST /api/receipts/501/erase-sender': () => {
        stored = aReceipt({ sender: null, senderErased: true, version: 4 });
        return jsonResponse(stored);
      },
    });
    const { user } = renderApp(paths.receipt.getHref(501), { as: demoPeople.admin });

    const sender = await screen.findByRole('region', { name: 'Sender' });
    await user.click(within(sender).getByRole('button', { name: "Erase sender's details" }));
    const dialog = await screen.findByRole('alertdialog', { name: "Erase the sender's details?" });
    expect(dialog).toHaveTextContent(
      'The name, e-mail address and postal address of Wren Example will be erased from this parcel for good.',
    );
    expect(dialog).toHaveTextContent('The counts stay as they are');

    await user.click(within(dialog).getByRole('button', { name: 'Keep the details' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument());
    expect(seenRequests(fetchMock, '/api/receipts/501/erase-sender')).toHaveLength(0);

    await user.click(await within(sender).findByRole('button', { name: "Erase sender's details" }));
    await user.click(
      within(
        await screen.findByRole('alertdialog', { name: "Erase the sender's details?" }),
      ).getByRole('button', { name: "Erase sender's details" }),
    );

    await waitFor(() =>
      expect(screen.getByRole('region', { name: 'Sender' })).toHaveTextContent(/Erased/),
    );
    expect(screen.getByRole('region', { name: 'Sender' })).not.toHaveTextContent('Wren Example');
    expect(seenRequests(fetchMock, '/api/receipts/501/erase-sender')).toHaveLength(1);
    expect(screen.getByRole('region', { name: 'Panels' })).toHaveTextContent('Accepted1,240');
  });

  it('says plainly why an upload was refused', async () => {
    const fetchMock = mockDetailApi({
      'POST /api/receipts/501/scans': () =>
        jsonResponse(
          apiErrorBody(415, 'This file is not a JPEG, PNG, WebP or PDF.', {
            error: 'Unsupported Media Type',
          }),
          415,
        ),
    });
    const { user } = renderApp(paths.receipt.getHref(501), { as: demoPeople.chapterLead });
    await screen.findByRole('region', { name: 'Scans' });

    const file = new File(['not really an image'], 'label.png', { type: 'image/png' });
    await user.upload(screen.getByLabelText('Attach a scan or photo'), file);

    const alert = await screen.findByText('This file is not a JPEG, PNG, WebP or PDF.');
    expect(alert.closest('[role="alert"]')).toHaveTextContent('The file was not attached');
    expect(seenRequests(fetchMock, '/api/receipts/501/scans')).toHaveLength(1);
  });

  it('asks before deleting a scan', async () => {
    const fetchMock = mockDetailApi({
      'DELETE /api/receipts/501/scans/31': () => emptyResponse(204),
    });
    const { user } = renderApp(paths.receipt.getHref(501), { as: demoPeople.chapterLead });

    await user.click(await screen.findByRole('button', { name: 'Delete label-front.png' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Delete label-front.png?' });
    expect(seenRequests(fetchMock, '/api/receipts/501/scans/31')).toHaveLength(0);
    await user.click(within(dialog).getByRole('button', { name: 'Delete scan' }));

    await waitFor(() =>
      expect(
        seenRequests(fetchMock, '/api/receipts/501/scans/31').map((request) => request.method),
      ).toEqual(['DELETE']),
    );
  });
});
