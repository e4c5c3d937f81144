import type { SessionUser } from '@tallyloom/core';
import { cleanup, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { demoChapters, demoPeople, demoRegions } from '@/testing/fixtures';
import { emptyResponse, jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { currentPath, renderApp } from '@/testing/render-app';

function mockNetwork(extra: Parameters<typeof mockApi>[0] = {}) {
  return mockApi({
    '/api/regions': () => jsonResponse(demoRegions),
    '/api/chapters': () => jsonResponse(demoChapters),
    ...extra,
  });
}

async function navigationLinks(as: SessionUser): Promise<string[]> {
  mockNetwork();
  renderApp(paths.network.getHref(), { as });
  const nav = await screen.findByRole('navigation', { name: 'Main' });
  return within(nav)
    .getAllByRole('link')
    .map((link) => link.textContent ?? '');
}

describe('the app shell', () => {
  it('names the product and the network, with header, navigation and main landmarks', async () => {
    mockNetwork();
    renderApp(paths.network.getHref(), { as: demoPeople.admin });

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
    const { user } = renderApp(paths.network.getHref(), { as: demoPeople.admin });
    await screen.findByRole('banner');

    await user.tab();
    const skipLink = screen.getByRole('link', { name: 'Skip to content' });
    expect(skipLink).toHaveFocus();
    await user.keyboard('{Enter}');
    expect(screen.getByRole('main')).toHaveFocus();
  });

  it('moves between pages from the navigation', async () => {
    mockNetwork();
    const { user } = renderApp(paths.network.getHref(), { as: demoPeople.admin });

    await user.click(await screen.findByRole('link', { name: 'System status' }));
    expect(
      await screen.findByRole('heading', { level: 1, name: 'System status' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'System status' })).toHaveAttribute(
      'aria-current',
      'page',
    );
  });
});

describe('navigation by role', () => {
  it('gives a network admin every page, People, Network set-up and the dev outbox included', async () => {
    expect(await navigationLinks(demoPeople.admin)).toEqual([
      'Network',
      'Dashboard',
      'Campaigns',
      'Parcels',
      'Monthly tallies',
      'Review',
      'Impact pack',
      'Findings',
      'Audit log',
      'Exports',
      'System status',
      'Jobs',
      'People',
      'Network set-up',
      'Dev outbox',
    ]);
  });

  it('gives national staff the network, parcels and system status, but not People or set-up', async () => {
    expect(await navigationLinks(demoPeople.staff)).toEqual([
      'Network',
      'Dashboard',
      'Campaigns',
      'Parcels',
      'Monthly tallies',
      'Review',
      'Impact pack',
      'Findings',
      'Exports',
      'System status',
      'Jobs',
    ]);
  });

  it('gives a chapter lead their monthly tallies first, and neither People, Network set-up nor the dev outbox', async () => {
    expect(await navigationLinks(demoPeople.chapterLead)).toEqual([
      'Monthly tallies',
      'Network',
      'Dashboard',
      'Campaigns',
      'Parcels',
      'Exports',
    ]);
  });

  it('gives a regional coordinator the parcels of their region to read', async () => {
    expect(await navigationLinks(demoPeople.coordinator)).toEqual([
      'Network',
      'Dashboard',
      'Campaigns',
      'Parcels',
      'Monthly tallies',
      'Review',
      'Exports',
    ]);
  });

  it('gives a grant writer the impact pack first, and neither System status, parcels nor Network set-up', async () => {
    expect(await navigationLinks(demoPeople.grantWriter)).toEqual([
      'Impact pack',
      'Network',
      'Dashboard',
      'Campaigns',
      'Exports',
    ]);
  });

  it('gives an auditor the audit samples first, then findings and the audit log, and nothing to write tallies with', async () => {
    expect(await navigationLinks(demoPeople.auditor)).toEqual([
      'Audit samples',
      'Network',
      'Dashboard',
      'Campaigns',
      'Parcels',
      'Monthly tallies',
      'Findings',
      'Audit log',
      'Exports',
    ]);
  });

  it('shows Network set-up to network admins only', async () => {
    for (const person of Object.values(demoPeople)) {
      const links = await navigationLinks(person);
      expect(`${person.role}: ${links.includes('Network set-up')}`).toBe(
        `${person.role}: ${person.role === 'network_admin'}`,
      );
      cleanup();
    }
  });
});

describe('the signed-in person in the top bar', () => {
  it("shows the person's name, role and chapter, with My account and Sign out", async () => {
    mockNetwork();
    const { user, router } = renderApp(paths.network.getHref(), { as: demoPeople.chapterLead });

    const banner = await screen.findByRole('banner');
    const menuButton = within(banner).getByRole('button', { name: /Dana Whitlock/ });
    expect(menuButton).toHaveTextContent('Chapter lead · Alder Falls');

    await user.click(menuButton);
    await user.click(await screen.findByRole('menuitem', { name: 'My account' }));
    expect(currentPath(router)).toBe(paths.account.getHref());
  });

  it('says "Whole network" for a role that reaches everything', async () => {
    mockNetwork();
    renderApp(paths.network.getHref(), { as: demoPeople.auditor });

    const banner = await screen.findByRole('banner');
    expect(within(banner).getByRole('button', { name: /Oskar Lind/ })).toHaveTextContent(
      'Auditor · Whole network',
    );
  });

  it('signs out: tells the server, forgets the data and goes to sign-in', async () => {
    const fetchMock = mockNetwork({ 'POST /api/auth/sign-out': () => emptyResponse(204) });
    const { user, router, queryClient } = renderApp(paths.network.getHref(), {
      as: demoPeople.admin,
    });
    await screen.findByRole('table', { name: 'Regions' });

    await user.click(screen.getByRole('button', { name: /Maren Holt/ }));
    await user.click(await screen.findByRole('menuitem', { name: 'Sign out' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeInTheDocument();
    expect(screen.getByText('You have signed out.')).toBeInTheDocument();
    expect(currentPath(router)).toBe(paths.signIn.getHref());
    expect(seenRequests(fetchMock, '/api/auth/sign-out')).toHaveLength(1);
    expect(queryClient.getQueryCache().getAll()).toEqual([]);
  });
});
