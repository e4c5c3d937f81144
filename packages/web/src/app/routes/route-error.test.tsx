import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { describe, expect, it, vi } from 'vitest';
import { AppProvider } from '@/app/provider';
import { paths } from '@/config/paths';
import { createQueryClient } from '@/lib/query-client';
import { RouteErrorPage } from './route-error';

function BrokenPage(): never {
  throw new Error('Tally totals could not be drawn');
}

describe('the route error page', () => {
  it('says what broke and offers a way back and a reload', async () => {
    // React reports the render error to the console; keep the test output readable.
    vi.spyOn(console, 'error').mockImplementation(() => {});
    const router = createMemoryRouter(
      [
        { path: paths.network.path, element: <p>Network overview</p> },
        { path: '/broken', element: <BrokenPage />, errorElement: <RouteErrorPage standalone /> },
      ],
      { initialEntries: ['/broken'] },
    );
    render(
      <AppProvider queryClient={createQueryClient()}>
        <RouterProvider router={router} />
      </AppProvider>,
    );

    expect(
      screen.getByRole('heading', { level: 1, name: 'This page ran into a problem' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('main')).toHaveTextContent('Tally totals could not be drawn');
    expect(screen.getByRole('button', { name: 'Reload page' })).toBeInTheDocument();

    await userEvent.click(screen.getByRole('link', { name: 'Go to Network' }));
    expect(await screen.findByText('Network overview')).toBeInTheDocument();
  });
});
