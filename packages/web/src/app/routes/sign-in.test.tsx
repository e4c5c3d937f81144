import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import {
  apiErrorBody,
  degradedHealth,
  demoChapters,
  demoPeople,
  demoRegions,
  sessionFor,
  usersPage,
} from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { currentPath, renderApp } from '@/testing/render-app';

const noSession = () => jsonResponse(apiErrorBody(401, 'No session.'), 401);

function mockSignedOutApi(signIn: Parameters<typeof mockApi>[0][string]) {
  return mockApi({
    'POST /api/auth/refresh': noSession,
    'POST /api/auth/sign-in': signIn,
    '/api/regions': () => jsonResponse(demoRegions),
    '/api/chapters': () => jsonResponse(demoChapters),
    '/api/users': (url) => jsonResponse(usersPage(url)),
  });
}

async function fillAndSubmit(
  user: ReturnType<typeof renderApp>['user'],
  email = 'maren.holt@emberfold.example',
  password = 'quiet harbour lanterns',
) {
  await user.type(await screen.findByLabelText('E-mail'), email);
  await user.type(screen.getByLabelText('Password'), password);
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('signing in', () => {
  it('sends e-mail and password, starts the session and opens the home page', async () => {
    const fetchMock = mockSignedOutApi(() => jsonResponse(sessionFor(demoPeople.admin)));
    const { user, router } = renderApp(paths.signIn.getHref());

    await fillAndSubmit(user);

    expect(await screen.findByRole('heading', { level: 1, name: 'Network' })).toBeInTheDocument();
    expect(currentPath(router)).toBe(paths.network.getHref());
    const [signIn] = seenRequests(fetchMock, '/api/auth/sign-in');
    expect(signIn?.body).toEqual({
      email: 'maren.holt@emberfold.example',
      password: 'quiet harbour lanterns',
    });
    // The session's token goes with the calls that follow.
    const [regions] = seenRequests(fetchMock, '/api/regions');
    expect(regions?.authorization).toBe('Bearer token-1');
  });

  it('says the e-mail or password is wrong, and clears the password for another try', async () => {
    mockSignedOutApi(() =>
      jsonResponse(apiErrorBody(401, 'E-mail or password is incorrect.'), 401),
    );
    const { user, router } = renderApp(paths.signIn.getHref());

    await fillAndSubmit(user);

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('E-mail or password is incorrect.');
    expect(screen.getByLabelText('Password')).toHaveValue('');
    expect(screen.getByLabelText('Password')).toHaveFocus();
    expect(currentPath(router)).toBe(paths.signIn.getHref());
  });

  it("shows the server's lock message when the account is locked", async () => {
    mockSignedOutApi(() =>
      jsonResponse(
        apiErrorBody(423, 'This account is locked for 15 minutes after too many failed attempts.'),
        423,
      ),
    );
    const { user } = renderApp(paths.signIn.getHref());

    await fillAndSubmit(user);

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Account locked for now');
    expect(alert).toHaveTextContent(
      'This account is locked for 15 minutes after too many failed attempts.',
    );
  });

  it('says to slow down when there were too many attempts', async () => {
    mockSignedOutApi(() =>
      jsonResponse(apiErrorBody(429, 'Too many sign-in attempts. Try again in a minute.'), 429),
    );
    const { user } = renderApp(paths.signIn.getHref());

    await fillAndSubmit(user);

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Too many attempts');
    expect(alert).toHaveTextContent('Too many sign-in attempts. Try again in a minute.');
  });

  it('says when the server cannot be reached', async () => {
    mockSignedOutApi(() => Promise.reject(new TypeError('Failed to fetch')));
    const { user } = renderApp(paths.signIn.getHref());

    await fillAndSubmit(user);

    expect(await screen.findByRole('alert')).toHaveTextContent(
      'The Tallyloom server could not be reached.',
    );
  });

  it('asks for both fields before sending anything', async () => {
    const fetchMock = mockSignedOutApi(() => jsonResponse(sessionFor(demoPeople.admin)));
    const { user } = renderApp(paths.signIn.getHref());

    await user.click(await screen.findByRole('button', { name: 'Sign in' }));

    expect(screen.getByText('Enter your e-mail address.')).toBeInTheDocument();
    expect(screen.getByText('Enter your password.')).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/auth/sign-in')).toHaveLength(0);
  });

  it('shows and hides the password on request', async () => {
    mockSignedOutApi(() => jsonResponse(sessionFor(demoPeople.admin)));
    const { user } = renderApp(paths.signIn.getHref());

    const password = await screen.findByLabelText('Password');
    expect(password).toHaveAttribute('type', 'password');
    await user.click(screen.getByRole('button', { name: 'Show password' }));
    expect(password).toHaveAttribute('type', 'text');
    await user.click(screen.getByRole('button', { name: 'Hide password' }));
    expect(password).toHaveAttribute('type', 'password');
  });

  it('links to the forgotten-password page', async () => {
    mockSignedOutApi(() => jsonResponse(sessionFor(demoPeople.admin)));
    const { user } = renderApp(paths.signIn.getHref());

    await user.click(await screen.findByRole('link', { name: 'Forgot your password?' }));

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Forgot your password?' }),
    ).toBeInTheDocument();
  });
});

describe('pages that need a session', () => {
  it('send a visitor without one to sign-in, and back to the page once signed in', async () => {
    mockSignedOutApi(() => jsonResponse(sessionFor(demoPeople.admin)));
    const { user, router } = renderApp(paths.people.getHref());

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(currentPath(router)).toBe('/sign-in?next=/people');

    await fillAndSubmit(user);

    expect(await screen.findByRole('heading', { level: 1, name: 'People' })).toBeInTheDocument();
    expect(currentPath(router)).toBe(paths.people.getHref());
  });

  it('restore the session from the refresh cookie on a fresh page, without asking again', async () => {
    const fetchMock = mockApi({
      'POST /api/auth/refresh': () => jsonResponse(sessionFor(demoPeople.admin)),
      '/api/health': () => jsonResponse(degradedHealth, 503),
    });
    renderApp(paths.status.getHref());

    expect(screen.getByText('Opening Tallyloom…')).toBeInTheDocument();
    expect(
      await screen.findByRole('heading', { level: 1, name: 'System status' }),
    ).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/auth/refresh')).toHaveLength(1);
    expect(seenRequests(fetchMock, '/api/health')[0]?.authorization).toBe('Bearer token-1');
  });

  it('end the session when it can no longer be renewed, keeping the way back', async () => {
    mockApi({
      'POST /api/auth/refresh': noSession,
      '/api/health': () => jsonResponse(apiErrorBody(401, 'The access token has expired.'), 401),
    });
    const { router } = renderApp(paths.status.getHref(), { as: demoPeople.admin });

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(currentPath(router)).toBe('/sign-in?next=/status');
    expect(
      within(screen.getByRole('main')).getByText(
        'Your session has ended. Sign in again to carry on where you were.',
      ),
    ).toBeInTheDocument();
  });

  it('send a signed-in person who opens the sign-in page on to where they were going', async () => {
    mockApi({ '/api/health': () => jsonResponse(degradedHealth, 503) });
    const { router } = renderApp(paths.signIn.getHref({ next: paths.status.getHref() }), {
      as: demoPeople.admin,
    });

    expect(
      await screen.findByRole('heading', { level: 1, name: 'System status' }),
    ).toBeInTheDocument();
    expect(currentPath(router)).toBe(paths.status.getHref());
  });

  it('never follow a "next" that leads off the site', async () => {
    mockSignedOutApi(() => jsonResponse(sessionFor(demoPeople.admin)));
    const { user, router } = renderApp('/sign-in?next=//elsewhere.example/phish');

    await fillAndSubmit(user);

    expect(await screen.findByRole('heading', { level: 1, name: 'Network' })).toBeInTheDocument();
    expect(currentPath(router)).toBe(paths.network.getHref());
  });
});
