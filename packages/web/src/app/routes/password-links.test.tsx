import type { OneTimeLinkInfo } from '@tallyloom/core';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import {
  apiErrorBody,
  demoChapters,
  demoPeople,
  demoRegions,
  sessionFor,
} from '@/testing/fixtures';
import { emptyResponse, jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { currentPath, renderApp } from '@/testing/render-app';

const noSession = () => jsonResponse(apiErrorBody(401, 'No session.'), 401);

const invitation: OneTimeLinkInfo = {
  purpose: 'invitation',
  email: demoPeople.chapterLead.email,
  displayName: demoPeople.chapterLead.displayName,
  expiresAt: '2026-03-21T09:00:00',
};

const reset: OneTimeLinkInfo = { ...invitation, purpose: 'password_reset' };

async function choosePassword(user: ReturnType<typeof renderApp>['user'], password: string) {
  await user.type(await screen.findByLabelText('New password'), password);
  await user.type(screen.getByLabelText('Confirm new password'), password);
}

describe('forgotten password', () => {
  it('answers the same neutral way whether or not the address has an account', async () => {
    const fetchMock = mockApi({
      'POST /api/auth/refresh': noSession,
      'POST /api/auth/password-reset': () => emptyResponse(202),
    });
    const { user } = renderApp(paths.forgotPassword.getHref());

    await user.type(await screen.findByLabelText('E-mail'), 'someone@emberfold.example');
    await user.click(screen.getByRole('button', { name: 'Send reset link' }));

    expect(await screen.findByRole('status')).toHaveTextContent(
      'If an account exists for someone@emberfold.example, we have sent a link to it.',
    );
    expect(seenRequests(fetchMock, '/api/auth/password-reset')[0]?.body).toEqual({
      email: 'someone@emberfold.example',
    });
  });
});

describe('a password reset link', () => {
  it('says who it is for, then sets the new password and sends the person to sign in', async () => {
    const fetchMock = mockApi({
      'POST /api/auth/refresh': noSession,
      '/api/auth/links/abc123': () => jsonResponse(reset),
      'POST /api/auth/password-reset/complete': () => emptyResponse(204),
    });
    const { user, router } = renderApp(paths.resetPassword.getHref('abc123'));

    expect(await screen.findByText('Dana Whitlock')).toBeInTheDocument();
    await choosePassword(user, 'a long walk by the river');
    await user.click(screen.getByRole('button', { name: 'Set new password' }));

    expect(
      await screen.findByText('Your new password is set. Sign in with it below.'),
    ).toBeInTheDocument();
    expect(currentPath(router)).toBe('/sign-in?notice=password-changed');
    expect(seenRequests(fetchMock, '/api/auth/password-reset/complete')[0]?.body).toEqual({
      token: 'abc123',
      password: 'a long walk by the river',
    });
  });

  it('says plainly when the link no longer works, with the way to a new one', async () => {
    mockApi({
      'POST /api/auth/refresh': noSession,
      '/api/auth/links/used-one': () =>
        jsonResponse(apiErrorBody(404, 'This link has already been used.'), 404),
    });
    const { user } = renderApp(paths.resetPassword.getHref('used-one'));

    expect(
      await screen.findByRole('heading', { name: 'This link is no longer valid' }),
    ).toBeInTheDocument();
    expect(screen.getByText(/This link has already been used\./)).toBeInTheDocument();
    expect(screen.queryByLabelText('New password')).not.toBeInTheDocument();
    await user.click(screen.getByRole('link', { name: 'Ask for a new link' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Forgot your password?' }),
    ).toBeInTheDocument();
  });

  it('refuses an invitation link on the reset page', async () => {
    mockApi({
      'POST /api/auth/refresh': noSession,
      '/api/auth/links/abc123': () => jsonResponse(invitation),
    });
    renderApp(paths.resetPassword.getHref('abc123'));

    expect(
      await screen.findByText(/This link is for an invitation, not for this page\./),
    ).toBeInTheDocument();
  });
});

describe('an invitation link', () => {
  it('sets the password, signs the person in and opens the home page', async () => {
    const fetchMock = mockApi({
      'POST /api/auth/refresh': noSession,
      '/api/auth/links/inv-9': () => jsonResponse(invitation),
      'POST /api/auth/invitations/accept': () => jsonResponse(sessionFor(demoPeople.chapterLead)),
      '/api/regions': () => jsonResponse(demoRegions),
      '/api/chapters': () => jsonResponse(demoChapters),
    });
    const { user, router } = renderApp(paths.acceptInvitation.getHref('inv-9'));

    const form = await screen.findByRole('form', { name: 'Set password and sign in' });
    expect(form).toHaveTextContent(
      'You have been invited to Tallyloom as Dana Whitlock (dana.whitlock@emberfold.example).',
    );
    await choosePassword(user, 'patchwork of nine squares');
    await user.click(within(form).getByRole('button', { name: 'Set password and sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Network' })).toBeInTheDocument();
    expect(currentPath(router)).toBe(paths.network.getHref());
    expect(screen.getByRole('banner')).toHaveTextContent('Dana Whitlock');
    expect(seenRequests(fetchMock, '/api/auth/invitations/accept')[0]?.body).toEqual({
      token: 'inv-9',
      password: 'patchwork of nine squares',
    });
  });

  it('keeps a password the server finds too common from being used', async () => {
    mockApi({
      'POST /api/auth/refresh': noSession,
      '/api/auth/links/inv-9': () => jsonResponse(invitation),
      'POST /api/auth/invitations/accept': () =>
        jsonResponse(
          apiErrorBody(400, 'Choose another password.', {
            fields: [
              {
                field: 'password',
                messages: [
                  'This password is on a list of commonly used passwords; choose another.',
                ],
              },
            ],
          }),
          400,
        ),
    });
    const { user } = renderApp(paths.acceptInvitation.getHref('inv-9'));

    await choosePassword(user, 'iloveyou123');
    await user.click(screen.getByRole('button', { name: 'Set password and sign in' }));

    expect(await screen.findByLabelText('New password')).toHaveAccessibleDescription(
      /This password is on a list of commonly used passwords; choose another\./,
    );
  });

  it('explains an address that has lost its link code', async () => {
    mockApi({ 'POST /api/auth/refresh': noSession });
    renderApp(paths.acceptInvitation.getHref());

    expect(
      await screen.findByRole('heading', { name: 'This link is no longer valid' }),
    ).toBeInTheDocument();
    expect(screen.getByText(/Ask the network admin who invited you/)).toBeInTheDocument();
  });
});
