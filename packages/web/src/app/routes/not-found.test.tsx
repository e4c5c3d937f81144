import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { demoChapters, demoPeople, demoRegions } from '@/testing/fixtures';
import { jsonResponse, mockApi } from '@/testing/mock-api';
import { renderApp } from '@/testing/render-app';

describe('an unknown address', () => {
  it('says the page was not found, inside the shell, with a way back', async () => {
    mockApi({
      '/api/regions': () => jsonResponse(demoRegions),
      '/api/chapters': () => jsonResponse(demoChapters),
    });
    const { user } = renderApp('/harvests/2026-13', { as: demoPeople.admin });

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Page not found' }),
    ).toBeInTheDocument();
    expect(screen.getByText('/harvests/2026-13')).toBeInTheDocument();
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeInTheDocument();

    await user.click(screen.getByRole('link', { name: 'Back to Network' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Network' })).toBeInTheDocument();
  });
});
