import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoPeople } from '@/testing/fixtures';
import { emptyResponse, jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { snapshotQueue } from '@/testing/report-fixtures';
import { renderApp } from '@/testing/render-app';

const retryPath = '/api/jobs/snapshots/877/retry';

describe('Jobs', () => {
  beforeAll(async () => {
    await import('@/app/routes/jobs');
  });

  it('shows each queue’s counts, running jobs with their progress, failures and the schedule', async () => {
    mockApi({ '/api/jobs': () => jsonResponse([snapshotQueue]) });
    renderApp(paths.jobs.getHref(), { as: demoPeople.staff });

    const queue = await screen.findByRole('region', { name: 'snapshots' });
    const counts = within(queue).getByRole('list', { name: 'snapshots counts' });
    expect(counts).toHaveTextContent('Waiting: 1,250');
    expect(counts).toHaveTextContent('Completed: 48,210');
    const bar = within(queue).getByRole('progressbar');
    expect(bar).toHaveAttribute('aria-valuenow', '40');
    expect(bar).toHaveAttribute('aria-valuemax', '100');
    expect(queue).toHaveTextContent('rebuild (job 901)');
    expect(queue).toHaveTextContent('40% done');
    expect(queue).toHaveTextContent('Deadlock found when trying to get lock');
    expect(queue).toHaveTextContent('3 attempts');
    expect(queue).toHaveTextContent('nightly-rebuild');
    expect(queue).toHaveTextContent('0 2 * * *; next run 13 Apr 2026');
  });

  it('asks before retrying a failed job, and sends nothing when cancelled', async () => {
    const fetchMock = mockApi({
      '/api/jobs': () => jsonResponse([snapshotQueue]),
      [`POST ${retryPath}`]: () => emptyResponse(204),
    });
    const { user } = renderApp(paths.jobs.getHref(), { as: demoPeople.admin });
    const retry = await screen.findByRole('button', { name: 'Retry job 877 (rebuild)' });

    await user.click(retry);
    let dialog = await screen.findByRole('alertdialog', { name: 'Retry this job?' });
    expect(dialog).toHaveTextContent('Job 877 (rebuild) in the snapshots queue');
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).toBeNull());
    expect(seenRequests(fetchMock, retryPath)).toHaveLength(0);

    await user.click(retry);
    dialog = await screen.findByRole('alertdialog', { name: 'Retry this job?' });
    const before = seenRequests(fetchMock, '/api/jobs').length;
    await user.click(within(dialog).getByRole('button', { name: 'Retry' }));
    await waitFor(() => expect(screen.queryByRole('alertdialog')).toBeNull());
    expect(seenRequests(fetchMock, retryPath).map((request) => request.method)).toEqual(['POST']);
    // The queues are asked again at once, not only at the next poll.
    await waitFor(() =>
      expect(seenRequests(fetchMock, '/api/jobs').length).toBeGreaterThan(before),
    );
  });

  it('keeps the dialog open with the reason when the retry is refused', async () => {
    mockApi({
      '/api/jobs': () => jsonResponse([snapshotQueue]),
      [`POST ${retryPath}`]: () =>
        jsonResponse(apiErrorBody(404, 'Job 877 is no longer in the snapshots queue.'), 404),
    });
    const { user } = renderApp(paths.jobs.getHref(), { as: demoPeople.admin });
    await user.click(await screen.findByRole('button', { name: 'Retry job 877 (rebuild)' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Retry this job?' });
    await user.click(within(dialog).getByRole('button', { name: 'Retry' }));
    expect(
      await within(dialog).findByText('Job 877 is no longer in the snapshots queue.'),
    ).toBeInTheDocument();
  });

  it('shows the error with a retry when the queues cannot be read', async () => {
    mockApi({
      '/api/jobs': () => jsonResponse(apiErrorBody(503, 'Redis is not answering.'), 503),
    });
    renderApp(paths.jobs.getHref(), { as: demoPeople.staff });
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('The queues could not be loaded');
    expect(alert).toHaveTextContent('Redis is not answering.');
  });

  it('is closed to roles without jobs.manage, without asking the server', async () => {
    const fetchMock = mockApi({ '/api/jobs': () => jsonResponse([snapshotQueue]) });
    renderApp(paths.jobs.getHref(), { as: demoPeople.coordinator });
    expect(await screen.findByRole('heading', { level: 1 })).toHaveTextContent(/Jobs/);
    expect(screen.getByText(/Network admin and National staff roles/)).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/jobs')).toHaveLength(0);
  });
});
