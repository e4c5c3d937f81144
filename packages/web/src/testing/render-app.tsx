import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { AppProvider } from '@/app/provider';
import { createAppRoutes } from '@/app/router';
import { createQueryClient } from '@/lib/query-client';

/** Renders the whole app (theme, cache, real route tree) at `path`, without retries or a browser. */
export function renderApp(path: string) {
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
