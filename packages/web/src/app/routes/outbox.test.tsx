import type { OutboxMessage } from '@tallyloom/core';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoPeople } from '@/testing/fixtures';
import { jsonResponse, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render-app';

const messages: OutboxMessage[] = [
  {
    id: 'm2',
    to: ['wren.ollis@emberfold.example'],
    from: 'Tallyloom <no-reply@emberfold.example>',
    subject: 'You are invited to Tallyloom',
    text: 'Maren Holt invited you.\n\nChoose a password: http://localhost:5173/accept-invitation?token=inv-9\n',
    receivedAt: '2026-03-14T09:05:00',
    links: ['http://localhost:5173/accept-invitation?token=inv-9', 'javascript:alert(1)'],
  },
  {
    id: 'm1',
    to: ['dana.whitlock@emberfold.example'],
    from: 'Tallyloom <no-reply@emberfold.example>',
    subject: 'Reset your Tallyloom password',
    text: 'Choose a new password: http://localhost:5173/reset-password?token=abc123\n',
    receivedAt: '2026-03-13T17:40:00',
    links: ['http://localhost:5173/reset-password?token=abc123'],
  },
];

describe('Dev outbox', () => {
  it('lists captured e-mails and shows the chosen one with its links ready to follow', async () => {
    mockApi({ '/api/dev/outbox': () => jsonResponse(messages) });
    const { user } = renderApp(paths.outbox.getHref(), { as: demoPeople.admin });

    const list = await screen.findByRole('table', { name: 'Captured e-mails' });
    const rows = within(list).getAllByRole('row');
    expect(rows[1]).toHaveTextContent(
      'You are invited to Tallyloomwren.ollis@emberfold.example14 Mar 2026, 09:05',
    );
    expect(rows[2]).toHaveTextContent('Reset your Tallyloom password');

    await user.click(within(list).getByRole('button', { name: 'You are invited to Tallyloom' }));

    const message = screen.getByRole('article', { name: 'You are invited to Tallyloom' });
    expect(message).toHaveTextContent('Maren Holt invited you.');
    expect(
      within(message).getByRole('link', {
        name: 'http://localhost:5173/accept-invitation?token=inv-9',
      }),
    ).toHaveAttribute('href', 'http://localhost:5173/accept-invitation?token=inv-9');
    // Only web addresses become links.
    expect(within(message).getAllByRole('link')).toHaveLength(1);
  });

  it('explains what will appear here while it is empty', async () => {
    mockApi({ '/api/dev/outbox': () => jsonResponse([]) });
    renderApp(paths.outbox.getHref(), { as: demoPeople.admin });

    expect(await screen.findByRole('heading', { name: 'No e-mails yet' })).toBeInTheDocument();
    expect(screen.getByText(/E-mails the app sends in development/)).toBeInTheDocument();
  });

  it('says it is switched off when the server sends real e-mail', async () => {
    mockApi({ '/api/dev/outbox': () => jsonResponse(apiErrorBody(404, 'Not Found'), 404) });
    renderApp(paths.outbox.getHref(), { as: demoPeople.admin });

    expect(
      await screen.findByRole('heading', { name: 'The dev outbox is switched off' }),
    ).toBeInTheDocument();
  });

  it('is closed to national staff', async () => {
    mockApi({});
    renderApp(paths.outbox.getHref(), { as: demoPeople.staff });

    expect(
      await screen.findByRole('heading', { level: 1, name: 'No access to Dev outbox' }),
    ).toBeInTheDocument();
  });
});
