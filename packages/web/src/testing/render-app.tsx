import type { SessionUser } from '@tallyloom/core';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { AppProvider } from '@/app/provider';
import { createAppRoutes } from '@/app/router';
import { createQueryClient } from '@/lib/query-client';
import { startSession } from '@/lib/session/session';
import { sessionFor } from './fixtures';

export interface RenderAppOptions {
  /**
   * Starts the app with this person already signed in, as if the refresh cookie had restored
   * their session. Without it the app starts as after a reload and asks `/api/auth/refresh`.
   */
  as?: SessionUser;
}

/** Renders the whole app (theme, cache, real route tree) at `path`, without retries or a browser. */
export function renderApp(path: string, { as }: RenderAppOptions = {}) {
  if (as) startSession(sessionFor(as));
  const queryClient = createQueryClient({ queries: { retry: false } });
  const router = createMemoryRouter(createAppRoutes(queryClient), { initialEntries: [path] });
  const user = userEvent.setup();
  const view = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...view, user, router, queryClient };
}

/** Where the router is now, as path and query: "/sign-in?next=/people". */
export function currentPath(router: ReturnType<typeof renderApp>['router']): string {
  const { pathname, search } = router.state.location;
  return `${pathname}${search}`;
}
