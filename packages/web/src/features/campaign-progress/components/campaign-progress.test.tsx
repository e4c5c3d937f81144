import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import type { ChartProps } from '@/components/charts/chart';
import { paths } from '@/config/paths';
import { apiErrorBody, demoPeople } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { springCampaign } from '@/testing/report-fixtures';
import { renderApp } from '@/testing/render-app';

// jsdom has no canvas for ECharts: stand in with the chart's description in words.
vi.mock('@/components/charts/chart', () => ({
  Chart: ({ description }: ChartProps) => <div role="img" aria-label={description} />,
}));

function figure(name: string) {
  return within(screen.getByRole('list', { name: 'Campaign figures' })).getByRole('listitem', {
    name,
  });
}

describe('Campaign progress', () => {
  beforeAll(async () => {
    await Promise.all([
      import('@/app/routes/campaigns'),
      import('@/app/routes/campaign'),
      import('@/app/routes/public-progress'),
    ]);
  });

  it('lists the campaigns with their progress, each linking to its page', async () => {
    mockApi({ '/api/dashboards/campaigns': () => jsonResponse([springCampaign]) });
    renderApp(paths.campaigns.getHref(), { as: demoPeople.grantWriter });
    const table = await screen.findByRole('table', { name: 'Campaigns' });
    const row = within(table).getAllByRole('row')[1];
    expect(within(row).getByRole('link', { name: 'Spring warmth drive' })).toHaveAttribute(
      'href',
      paths.campaign.getHref(41),
    );
    expect(row).toHaveTextContent('4,000');
    expect(row).toHaveTextContent('1,300');
    expect(row).toHaveTextContent('32.5%');
    expect(row).toHaveTextContent('260');
  });

  it('says so when there are no campaigns', async () => {
    mockApi({ '/api/dashboards/campaigns': () => jsonResponse([]) });
    renderApp(paths.campaigns.getHref(), { as: demoPeople.staff });
    expect(await screen.findByRole('heading', { name: 'No campaigns yet' })).toBeInTheDocument();
  });

  it('shows credited panels against the goal, the paces, the pending panels and the projection with its method', async () => {
    mockApi({ '/api/dashboards/campaigns/41': () => jsonResponse(springCampaign) });
    renderApp(paths.campaign.getHref(41), { as: demoPeople.staff });

    await screen.findByRole('heading', { level: 1, name: 'Spring warmth drive' });
    const bar = screen.getByRole('progressbar');
    expect(bar).toHaveAttribute('aria-valuenow', '0.325');
    expect(bar).toHaveAttribute('aria-valuetext', '1,300 of 4,000 panels credited, 32.5%');
    expect(figure('Share done')).toHaveTextContent('32.5%');
    // Issue #6's worked example: 1,300 in 5 weeks = 260 a week; 2,700 left over 7 weeks = 385.7.
    expect(figure('Pace so far')).toHaveTextContent('260 a week');
    expect(figure('Pace still needed')).toHaveTextContent('385.7 panels a week');
    expect(figure('Weeks left')).toHaveTextContent('7');
    expect(figure('Pending panels')).toHaveTextContent('220');
    expect(figure('Pending panels')).toHaveTextContent('not counted above');
    expect(
      screen.getByText(
        'About 3,120 panels by 24 May 2026, the goal of 4,000 not met within the campaign. Method: least-squares line over the last 5 weeks of credited panels.',
      ),
    ).toBeInTheDocument();
    expect(screen.getByRole('img', { name: /projected 3,120 by 24 May 2026/ })).toBeInTheDocument();
  });

  it('copies the public progress page’s address', async () => {
    mockApi({ '/api/dashboards/campaigns/41': () => jsonResponse(springCampaign) });
    const { user } = renderApp(paths.campaign.getHref(41), { as: demoPeople.staff });
    // user-event replaces the clipboard with its own stub when set up: read it back from there.
    await user.click(await screen.findByRole('button', { name: 'Share progress page' }));
    expect(await screen.findByText(/Link copied/)).toBeInTheDocument();
    await expect(navigator.clipboard.readText()).resolves.toBe(
      `${window.location.origin}${paths.publicProgress.getHref('SPRING26')}`,
    );
  });

  it('shows why a campaign out of reach cannot be opened', async () => {
    mockApi({
      '/api/dashboards/campaigns/77': () =>
        jsonResponse(apiErrorBody(404, 'Campaign 77 was not found.'), 404),
    });
    renderApp(paths.campaign.getHref(77), { as: demoPeople.coordinator });
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Campaign 77 was not found.');
  });

  it('opens the public page without signing in, and shows counts only', async () => {
    // Even if the server sent more, the page shows only the public counts.
    const fetchMock = mockApi({
      'POST /api/auth/refresh': () => jsonResponse(apiErrorBody(401, 'No session.'), 401),
      '/api/public/campaigns/SPRING26/progress': () => jsonResponse(springCampaign),
    });
    renderApp(paths.publicProgress.getHref('SPRING26'));

    await screen.findByRole('heading', { level: 1, name: 'Spring warmth drive' });
    expect(figure('Credited panels')).toHaveTextContent('1,300');
    expect(figure('Goal')).toHaveTextContent('4,000');
    expect(figure('Pace still needed')).toHaveTextContent('385.7 panels a week');
    expect(screen.queryByRole('listitem', { name: 'Pending panels' })).toBeNull();
    expect(screen.queryByText(/least-squares/)).toBeNull();
    expect(screen.queryByRole('button', { name: 'Share progress page' })).toBeNull();
    // No shell, no navigation: the quiet public frame.
    expect(screen.queryByRole('navigation')).toBeNull();
    const [request] = seenRequests(fetchMock, '/api/public/campaigns/SPRING26/progress');
    expect(request?.authorization).toBeNull();
  });

  it('tells a visitor when the link names no campaign', async () => {
    mockApi({
      'POST /api/auth/refresh': () => jsonResponse(apiErrorBody(401, 'No session.'), 401),
      '/api/public/campaigns/NOPE/progress': () =>
        jsonResponse(apiErrorBody(404, 'No campaign has the code NOPE.'), 404),
    });
    renderApp(paths.publicProgress.getHref('NOPE'));
    await waitFor(() =>
      expect(screen.getByRole('alert')).toHaveTextContent('No campaign has the code NOPE.'),
    );
  });
});
