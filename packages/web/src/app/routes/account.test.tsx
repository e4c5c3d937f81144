import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoPeople } from '@/testing/fixtures';
import { emptyResponse, jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { renderApp } from '@/testing/render-app';

async function fillPasswords(
  user: ReturnType<typeof renderApp>['user'],
  current: string,
  next: string,
  confirm = next,
) {
  const form = await screen.findByRole('form', { name: 'Change password' });
  await user.type(within(form).getByLabelText('Current password'), current);
  await user.type(within(form).getByLabelText('New password'), next);
  await user.type(within(form).getByLabelText('Confirm new password'), confirm);
  return form;
}

describe('My account', () => {
  it('says who the person is, their role and what they reach', async () => {
    mockApi({ '/api/auth/me': () => jsonResponse(demoPeople.coordinator) });
    renderApp(paths.account.getHref(), { as: demoPeople.coordinator });

    const about = await screen.findByRole('region', { name: 'About you' });
    await waitFor(() => expect(about).toHaveTextContent('NamePriya Castell'));
    expect(about).toHaveTextContent('E-mailpriya.castell@emberfold.example');
    expect(about).toHaveTextContent('RoleRegional coordinator');
    expect(about).toHaveTextContent('ScopeNorth Ridge');
  });

  it('changes the password, then says so and empties the form', async () => {
    const fetchMock = mockApi({
      '/api/auth/me': () => jsonResponse(demoPeople.chapterLead),
      'POST /api/auth/change-password': () => emptyResponse(204),
    });
    const { user } = renderApp(paths.account.getHref(), { as: demoPeople.chapterLead });
    await screen.findByText('Dana Whitlock', { selector: 'dd' });

    const form = await fillPasswords(user, 'old quiet words', 'seven bright lanterns at dusk');
    await user.click(within(form).getByRole('button', { name: 'Change password' }));

    expect(await within(form).findByRole('status')).toHaveTextContent(
      'Your password has been changed.',
    );
    expect(within(form).getByLabelText('Current password')).toHaveValue('');
    expect(seenRequests(fetchMock, '/api/auth/change-password')[0]?.body).toEqual({
      currentPassword: 'old quiet words',
      newPassword: 'seven bright lanterns at dusk',
    });
  });

  it("shows the server's objections beside the fields they concern", async () => {
    mockApi({
      '/api/auth/me': () => jsonResponse(demoPeople.chapterLead),
      'POST /api/auth/change-password': () =>
        jsonResponse(
          apiErrorBody(400, 'The password was not changed.', {
            fields: [
              { field: 'currentPassword', messages: ['Current password is incorrect.'] },
              {
                field: 'newPassword',
                messages: [
                  'This password is on a list of commonly used passwords; choose another.',
                ],
              },
            ],
          }),
          400,
        ),
    });
    const { user } = renderApp(paths.account.getHref(), { as: demoPeople.chapterLead });
    await screen.findByText('Dana Whitlock', { selector: 'dd' });

    const form = await fillPasswords(user, 'wrong one', 'password1234');
    await user.click(within(form).getByRole('button', { name: 'Change password' }));

    await waitFor(() =>
      expect(within(form).getByLabelText('Current password')).toHaveAccessibleDescription(
        'Current password is incorrect.',
      ),
    );
    expect(within(form).getByLabelText('New password')).toHaveAccessibleDescription(
      /This password is on a list of commonly used passwords; choose another\./,
    );
  });

  it('checks length, the account’s own words and the confirmation as the person types', async () => {
    const fetchMock = mockApi({ '/api/auth/me': () => jsonResponse(demoPeople.chapterLead) });
    const { user } = renderApp(paths.account.getHref(), { as: demoPeople.chapterLead });
    await screen.findByText('Dana Whitlock', { selector: 'dd' });
    const form = await screen.findByRole('form', { name: 'Change password' });
    const next = within(form).getByLabelText('New password');

    expect(next).toHaveAccessibleDescription(/At least 8 characters\./);
    await user.type(next, 'short');
    expect(next).toHaveAccessibleDescription(/Use at least 8 characters\./);
    await user.clear(next);
    await user.type(next, 'whitlock');
    expect(next).toHaveAccessibleDescription(/Do not use your name or e-mail address/);
    await user.clear(next);
    await user.type(next, 'four calm winter words');
    expect(next).toHaveAccessibleDescription(/Long enough, and not your name or e-mail\./);

    await user.type(within(form).getByLabelText('Current password'), 'old quiet words');
    await user.type(within(form).getByLabelText('Confirm new password'), 'four calm winter');
    await user.click(within(form).getByRole('button', { name: 'Change password' }));

    expect(within(form).getByLabelText('Confirm new password')).toHaveAccessibleDescription(
      'The two passwords are not the same.',
    );
    expect(seenRequests(fetchMock, '/api/auth/change-password')).toHaveLength(0);
  });
});
