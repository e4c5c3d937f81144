import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { degradedHealth, demoPeople } from '@/testing/fixtures';
import { jsonResponse, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render-app';

describe('System status page', () => {
  it('reads a 503 health report as "degraded", naming the service that is down', async () => {
    mockApi({ '/api/health': () => jsonResponse(degradedHealth, 503) });
    renderApp(paths.status.getHref(), { as: demoPeople.admin });

    expect(await screen.findByRole('status')).toHaveTextContent('Degraded: database down');

    const database = screen.getByRole('region', { name: 'Database' });
    expect(within(database).getByText('Down')).toBeInTheDocument();
    expect(database).toHaveTextContent('connect ECONNREFUSED 127.0.0.1:3307');

    const queue = screen.getByRole('region', { name: 'Job queue' });
    expect(within(queue).getByText('Up')).toBeInTheDocument();
    const snapshots = within(queue).getByRole('row', { name: /snapshots/ });
    expect(snapshots).toHaveTextContent('1,250');

    const app = screen.getByRole('region', { name: 'Application' });
    expect(app).toHaveTextContent('0.1.0');
    expect(app).toHaveTextContent('3 days 4 hours');
  });

  it('says all is well when every service is up', async () => {
    mockApi({
      '/api/health': () =>
        jsonResponse({
          ...degradedHealth,
          status: 'ok',
          database: { status: 'up', version: '10.11.14-MariaDB' },
        }),
    });
    renderApp(paths.status.getHref(), { as: demoPeople.admin });

    expect(await screen.findByRole('status')).toHaveTextContent('All services are up');
    expect(screen.getByRole('region', { name: 'Database' })).toHaveTextContent('10.11.14-MariaDB');
  });

  it('shows an error with a retry when the API itself does not answer', async () => {
    mockApi({
      '/api/health': () => new Response('', { status: 504, statusText: 'Gateway Timeout' }),
    });
    renderApp(paths.status.getHref(), { as: demoPeople.admin });

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('The health check did not answer');
    expect(alert).toHaveTextContent(
      'The server answered 504 Gateway Timeout without an explanation.',
    );
    expect(within(alert).getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
