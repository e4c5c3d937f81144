import type { UserView } from '@tallyloom/core';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import {
  apiErrorBody,
  demoChapters,
  demoPeople,
  demoRegions,
  demoUserViews,
  usersPage,
} from '@/testing/fixtures';
import { emptyResponse, jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { renderApp } from '@/testing/render-app';

type Handlers = Parameters<typeof mockApi>[0];

function mockPeopleApi(extra: Handlers = {}) {
  return mockApi({
    '/api/regions': () => jsonResponse(demoRegions),
    '/api/chapters': () => jsonResponse(demoChapters),
    'GET /api/users': (url) => jsonResponse(usersPage(url)),
    ...extra,
  });
}

function personNamed(name: string): UserView {
  const person = demoUserViews.find((candidate) => candidate.displayName === name);
  if (!person) throw new Error(`no demo person called ${name}`);
  return person;
}

async function openInviteDialog(user: ReturnType<typeof renderApp>['user']) {
  await user.click(await screen.findByRole('button', { name: 'Invite person' }));
  return screen.findByRole('dialog', { name: 'Invite a person' });
}

async function openRowActions(user: ReturnType<typeof renderApp>['user'], name: string) {
  const table = await screen.findByRole('table', { name: 'Everyone with an account' });
  await user.click(within(table).getByRole('button', { name: `Actions for ${name}` }));
}

describe('People page', () => {
  it('shows a chapter lead who opens it that they have no access, and fetches nothing', async () => {
    const fetchMock = mockPeopleApi();
    renderApp(paths.people.getHref(), { as: demoPeople.chapterLead });

    expect(
      await screen.findByRole('heading', { level: 1, name: 'No access to People' }),
    ).toBeInTheDocument();
    const main = screen.getByRole('main');
    expect(main).toHaveTextContent(
      'You are signed in as Dana Whitlock (Chapter lead, Alder Falls). People is open to the Network admin role only.',
    );
    expect(within(main).getByRole('link', { name: 'Back to Network' })).toBeInTheDocument();
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/users')).toHaveLength(0);
  });

  it('lists the first page of people with their role, scope, status and last sign-in', async () => {
    mockPeopleApi();
    renderApp(paths.people.getHref(), { as: demoPeople.admin });

    const table = await screen.findByRole('table', { name: 'Everyone with an account' });
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(26);
    expect(rows[0]).toHaveTextContent('NameE-mailRoleScopeStatusLast sign-inActions');

    const adaAshby = within(table).getByRole('row', { name: /Ada Ashby/ });
    expect(adaAshby).toHaveTextContent('ada.ashby@emberfold.example');
    expect(adaAshby).toHaveTextContent('Chapter lead');
    expect(adaAshby).toHaveTextContent('Brindle Bay');
    expect(adaAshby).toHaveTextContent('Active');
    expect(adaAshby).toHaveTextContent(/14 Mar 2026, \d\d:05/);

    const bramAshby = within(table).getByRole('row', { name: /Bram Ashby/ });
    expect(bramAshby).toHaveTextContent('Regional coordinator');
    expect(bramAshby).toHaveTextContent('Riverlands');

    const cleoAshby = within(table).getByRole('row', { name: /Cleo Ashby/ });
    expect(cleoAshby).toHaveTextContent('Whole network');
    expect(cleoAshby).toHaveTextContent('Invited');
    expect(cleoAshby).toHaveTextContent('Never');

    expect(screen.getByRole('group', { name: 'Pages of people' })).toHaveTextContent('1–25 of 40');
  });

  it('asks the server for the next page and says which rows it shows', async () => {
    const fetchMock = mockPeopleApi();
    const { user, router } = renderApp(paths.people.getHref(), { as: demoPeople.admin });

    const pages = await screen.findByRole('group', { name: 'Pages of people' });
    expect(within(pages).getByRole('button', { name: 'Previous page' })).toHaveAttribute(
      'aria-disabled',
      'true',
    );
    await user.click(within(pages).getByRole('button', { name: 'Next page' }));

    await waitFor(() => expect(pages).toHaveTextContent('26–40 of 40'));
    const table = screen.getByRole('table', { name: 'Everyone with an account' });
    expect(within(table).getAllByRole('row')).toHaveLength(16);
    expect(within(pages).getByRole('button', { name: 'Next page' })).toHaveAttribute(
      'aria-disabled',
      'true',
    );
    const lastList = seenRequests(fetchMock, '/api/users').at(-1);
    expect(lastList?.url.searchParams.get('page')).toBe('2');
    expect(lastList?.url.searchParams.get('pageSize')).toBe('25');
    expect(router.state.location.search).toBe('?page=2');
  });

  it('narrows by role and by a search sent once typing pauses', async () => {
    const fetchMock = mockPeopleApi();
    const { user } = renderApp(paths.people.getHref(), { as: demoPeople.admin });
    const filters = await screen.findByRole('search', { name: 'Find people' });

    await user.selectOptions(within(filters).getByRole('combobox', { name: 'Role' }), 'Auditor');
    await user.type(within(filters).getByRole('searchbox', { name: 'Search' }), 'finn ashby');

    const table = await screen.findByRole('table', { name: 'Everyone with an account' });
    await waitFor(() => expect(within(table).getAllByRole('row')).toHaveLength(2));
    expect(within(table).getByRole('row', { name: /Finn Ashby/ })).toBeInTheDocument();
    const searches = seenRequests(fetchMock, '/api/users').map((r) => r.url.searchParams);
    // One request for the settled search, not one per key.
    expect(searches.filter((params) => params.get('search'))).toHaveLength(1);
    expect(searches.at(-1)?.get('search')).toBe('finn ashby');
    expect(searches.at(-1)?.get('role')).toBe('auditor');
  });

  it('says when no one matches, and clears the filters on request', async () => {
    mockPeopleApi();
    const { user } = renderApp(`${paths.people.getHref()}?status=locked&search=nobody`, {
      as: demoPeople.admin,
    });

    expect(await screen.findByRole('heading', { name: 'No one matches' })).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Clear search and filters' }));

    expect(
      await screen.findByRole('table', { name: 'Everyone with an account' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('searchbox', { name: 'Search' })).toHaveValue('');
  });

  it('shows what went wrong when the list cannot be loaded', async () => {
    mockPeopleApi({
      'GET /api/users': () =>
        jsonResponse(apiErrorBody(500, 'The database did not answer in time.'), 500),
    });
    renderApp(paths.people.getHref(), { as: demoPeople.admin });

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('People could not be loaded');
    expect(alert).toHaveTextContent('The database did not answer in time.');
  });
});

describe('inviting a person', () => {
  it('asks for a chapter for a chapter lead and a region for a regional coordinator', async () => {
    mockPeopleApi();
    const { user } = renderApp(paths.people.getHref(), { as: demoPeople.admin });
    const dialog = await openInviteDialog(user);

    expect(within(dialog).queryByRole('combobox', { name: 'Chapter' })).not.toBeInTheDocument();
    await user.selectOptions(
      within(dialog).getByRole('combobox', { name: 'Role' }),
      'Chapter lead',
    );
    const chapter = within(dialog).getByRole('combobox', { name: 'Chapter' });
    await waitFor(() => expect(chapter).toBeEnabled());
    expect(within(chapter).getByRole('group', { name: 'Riverlands' })).toHaveTextContent(
      'Brindle Bay',
    );
    expect(within(dialog).queryByRole('combobox', { name: 'Region' })).not.toBeInTheDocument();

    await user.selectOptions(
      within(dialog).getByRole('combobox', { name: 'Role' }),
      'Regional coordinator',
    );
    const region = within(dialog).getByRole('combobox', { name: 'Region' });
    expect(within(region).getByRole('option', { name: 'High Mesa' })).toBeInTheDocument();
    expect(within(dialog).queryByRole('combobox', { name: 'Chapter' })).not.toBeInTheDocument();

    await user.selectOptions(within(dialog).getByRole('combobox', { name: 'Role' }), 'Auditor');
    expect(within(dialog).queryByRole('combobox', { name: 'Region' })).not.toBeInTheDocument();
  });

  it('sends the invitation and names the address it went to', async () => {
    const fetchMock = mockPeopleApi({
      'POST /api/users': (_url, request) =>
        jsonResponse({ ...personNamed('Ada Ashby'), ...(request.body as object) }, 201),
    });
    const { user } = renderApp(paths.people.getHref(), { as: demoPeople.admin });
    const dialog = await openInviteDialog(user);

    await user.type(within(dialog).getByLabelText('E-mail'), 'wren.ollis@emberfold.example');
    await user.type(within(dialog).getByLabelText('Display name'), 'Wren Ollis');
    await user.selectOptions(
      within(dialog).getByRole('combobox', { name: 'Role' }),
      'Chapter lead',
    );
    const chapter = within(dialog).getByRole('combobox', { name: 'Chapter' });
    await waitFor(() => expect(chapter).toBeEnabled());
    await user.selectOptions(chapter, 'Alder Falls');
    await user.click(within(dialog).getByRole('button', { name: 'Send invitation' }));

    expect(
      await screen.findByText('Invitation sent to wren.ollis@emberfold.example.'),
    ).toBeInTheDocument();
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(seenRequests(fetchMock, '/api/users').find((r) => r.method === 'POST')?.body).toEqual({
      email: 'wren.ollis@emberfold.example',
      displayName: 'Wren Ollis',
      role: 'chapter_lead',
      regionId: null,
      chapterId: 11,
    });
  });

  it("shows the server's complaint about the address under the e-mail field", async () => {
    mockPeopleApi({
      'POST /api/users': () =>
        jsonResponse(
          apiErrorBody(400, 'Some details need another look.', {
            fields: [
              { field: 'email', messages: ['Someone already has an account with this address.'] },
            ],
          }),
          400,
        ),
    });
    const { user } = renderApp(paths.people.getHref(), { as: demoPeople.admin });
    const dialog = await openInviteDialog(user);

    await user.type(within(dialog).getByLabelText('E-mail'), 'ada.ashby@emberfold.example');
    await user.type(within(dialog).getByLabelText('Display name'), 'Ada Ashby');
    await user.selectOptions(within(dialog).getByRole('combobox', { name: 'Role' }), 'Auditor');
    await user.click(within(dialog).getByRole('button', { name: 'Send invitation' }));

    const email = within(dialog).getByLabelText('E-mail');
    await waitFor(() =>
      expect(email).toHaveAccessibleDescription(
        'Someone already has an account with this address.',
      ),
    );
    expect(email).toHaveAttribute('aria-invalid', 'true');
    // The field says it all; no vaguer line repeats it above the form.
    expect(within(dialog).queryByText('Some details need another look.')).not.toBeInTheDocument();
  });

  it('says what is missing before sending anything', async () => {
    const fetchMock = mockPeopleApi();
    const { user } = renderApp(paths.people.getHref(), { as: demoPeople.admin });
    const dialog = await openInviteDialog(user);

    await user.selectOptions(
      within(dialog).getByRole('combobox', { name: 'Role' }),
      'Regional coordinator',
    );
    await user.click(within(dialog).getByRole('button', { name: 'Send invitation' }));

    expect(within(dialog).getByLabelText('E-mail')).toHaveAccessibleDescription(
      'Enter their e-mail address.',
    );
    expect(within(dialog).getByLabelText('Display name')).toHaveAccessibleDescription(
      'Enter the name others will see.',
    );
    expect(within(dialog).getByRole('combobox', { name: 'Region' })).toHaveAccessibleDescription(
      /Choose the region they coordinate\./,
    );
    expect(seenRequests(fetchMock).filter((r) => r.method === 'POST')).toHaveLength(0);
  });
});

describe('what an admin can do to a person', () => {
  it('asks before deactivating, naming the person, and deactivates only on confirmation', async () => {
    const fetchMock = mockPeopleApi({
      'PATCH /api/users/100': () =>
        jsonResponse({ ...personNamed('Ada Ashby'), status: 'deactivated' }),
    });
    const { user } = renderApp(paths.people.getHref(), { as: demoPeople.admin });

    await openRowActions(user, 'Ada Ashby');
    await user.click(await screen.findByRole('menuitem', { name: 'Deactivate…' }));

    const confirm = await screen.findByRole('alertdialog', { name: 'Deactivate Ada Ashby?' });
    expect(confirm).toHaveTextContent('ada.ashby@emberfold.example');
    expect(seenRequests(fetchMock, '/api/users/100')).toHaveLength(0);

    await user.click(within(confirm).getByRole('button', { name: 'Keep active' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument());
    expect(seenRequests(fetchMock, '/api/users/100')).toHaveLength(0);

    await openRowActions(user, 'Ada Ashby');
    await user.click(await screen.findByRole('menuitem', { name: 'Deactivate…' }));
    const again = await screen.findByRole('alertdialog', { name: 'Deactivate Ada Ashby?' });
    await user.click(within(again).getByRole('button', { name: 'Deactivate' }));

    expect(await screen.findByText('Ada Ashby is deactivated.')).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/users/100')[0]).toMatchObject({
      method: 'PATCH',
      body: { active: false },
    });
  });

  it('offers to resend the invitation only to people still invited', async () => {
    const fetchMock = mockPeopleApi({
      'POST /api/users/102/resend-invite': () => emptyResponse(204),
    });
    const { user } = renderApp(paths.people.getHref(), { as: demoPeople.admin });

    await openRowActions(user, 'Ada Ashby');
    expect(await screen.findByRole('menuitem', { name: 'Edit…' })).toBeInTheDocument();
    expect(screen.queryByRole('menuitem', { name: 'Resend invitation' })).not.toBeInTheDocument();
    await user.keyboard('{Escape}');

    await openRowActions(user, 'Cleo Ashby');
    await user.click(await screen.findByRole('menuitem', { name: 'Resend invitation' }));

    expect(
      await screen.findByText('Invitation sent again to cleo.ashby@emberfold.example.'),
    ).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/users/102/resend-invite')).toHaveLength(1);
  });

  it('edits the role and moves the person to a region', async () => {
    const fetchMock = mockPeopleApi({
      'PATCH /api/users/100': (_url, request) =>
        jsonResponse({ ...personNamed('Ada Ashby'), ...(request.body as object) }),
    });
    const { user } = renderApp(paths.people.getHref(), { as: demoPeople.admin });

    await openRowActions(user, 'Ada Ashby');
    await user.click(await screen.findByRole('menuitem', { name: 'Edit…' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit Ada Ashby' });
    expect(within(dialog).getByLabelText('Display name')).toHaveValue('Ada Ashby');
    expect(within(dialog).getByRole('combobox', { name: 'Chapter' })).toHaveValue('21');

    await user.selectOptions(
      within(dialog).getByRole('combobox', { name: 'Role' }),
      'Regional coordinator',
    );
    await user.selectOptions(
      within(dialog).getByRole('combobox', { name: 'Region' }),
      'Coastal Plain',
    );
    await user.click(within(dialog).getByRole('button', { name: 'Save changes' }));

    expect(await screen.findByText('Changes to Ada Ashby saved.')).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/users/100')[0]?.body).toEqual({
      displayName: 'Ada Ashby',
      role: 'regional_coordinator',
      regionId: 3,
      chapterId: null,
    });
  });

  it('reactivates a deactivated person straight away', async () => {
    const fetchMock = mockPeopleApi({
      'PATCH /api/users/104': () =>
        jsonResponse({ ...personNamed('Edda Ashby'), status: 'active' }),
    });
    const { user } = renderApp(paths.people.getHref(), { as: demoPeople.admin });

    await openRowActions(user, 'Edda Ashby');
    await user.click(await screen.findByRole('menuitem', { name: 'Reactivate' }));

    expect(await screen.findByText('Edda Ashby is active again.')).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/users/104')[0]?.body).toEqual({ active: true });
  });
});
