import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { demoChapters, demoRegions } from '@/testing/fixtures';
import { jsonResponse, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render-app';

function mockNetwork() {
  mockApi({
    '/api/regions': () => jsonResponse(demoRegions),
    '/api/chapters': () => jsonResponse(demoChapters),
  });
}

describe('the app shell', () => {
  it('names the product and the network, with header, navigation and main landmarks', async () => {
    mockNetwork();
    renderApp(paths.network.getHref());

    const banner = await screen.findByRole('banner');
    expect(banner).toHaveTextContent('Tallyloom');
    expect(banner).toHaveTextContent('Emberfold Blanket Network');
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeInTheDocument();
    expect(screen.getByRole('main')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Network' })).toHaveAttribute('aria-current', 'page');
    expect(screen.getByRole('link', { name: 'System status' })).not.toHaveAttribute('aria-current');
  });

  it('lets a keyboard user skip straight to the content', async () => {
    mockNetwork();
    const { user } = renderApp(paths.network.getHref());
    await screen.findByRole('banner');

    await user.tab();
    const skipLink = screen.getByRole('link', { name: 'Skip to content' });
    expect(skipLink).toHaveFocus();
    await user.keyboard('{Enter}');
    expect(screen.getByRole('main')).toHaveFocus();
  });

  it('moves between pages from the navigation', async () => {
    mockNetwork();
    const { user } = renderApp(paths.network.getHref());

    await user.click(await screen.findByRole('link', { name: 'System status' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'System status' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'System status' })).toHaveAttribute(
      'aria-current',
      'page',
    );
  });

  it('opens the sign-in placeholder, whose button explains why it is held back', async () => {
    mockNetwork();
    const { user } = renderApp(paths.network.getHref());

    await user.click(await screen.findByRole('link', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(screen.getByLabelText('E-mail')).toHaveAttribute('type', 'email');
    expect(screen.getByLabelText('Password')).toHaveAttribute('type', 'password');
    const submit = screen.getByRole('button', { name: 'Sign in' });
    expect(submit).toHaveAttribute('aria-disabled', 'true');
    expect(submit).toHaveAccessibleDescription(/comes with accounts and roles/);
  });
});
