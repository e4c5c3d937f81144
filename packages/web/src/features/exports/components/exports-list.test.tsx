import { screen, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoPeople } from '@/testing/fixtures';
import { aFinishedExport, anExport } from '@/testing/export-fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { renderApp } from '@/testing/render-app';

const ready = aFinishedExport();
const running = anExport({
  id: 'a1b2c3d4-0000-4000-8000-000000000002',
  table: 'review-queue',
  state: 'running',
  progress: 65,
  fileName: 'tallyloom-review-queue-2026-12-02.csv',
  format: 'csv',
  description: 'Review queue · Submitted',
});
const failed = anExport({
  id: 'a1b2c3d4-0000-4000-8000-000000000003',
  state: 'failed',
  error: 'The file could not be written: the disk is full.',
  description: 'Parcel receipts · whole network',
});

describe('My exports', () => {
  beforeAll(async () => {
    await import('@/app/routes/exports');
  });

  it("lists the person's exports with their state, contents, expiry and download", async () => {
    const fetchMock = mockApi({
      'GET /api/exports': () =>
        jsonResponse({ items: [running, ready, failed], total: 3, page: 1, pageSize: 25 }),
    });
    renderApp(paths.exports.getHref(), { as: demoPeople.chapterLead });

    const table = await screen.findByRole('table', { name: 'Your exports' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(3);
    expect(rows[0]).toHaveTextContent('Review queue · Submitted');
    expect(rows[0]).toHaveTextContent('Writing 65%');
    expect(within(rows[0]).queryByRole('link')).toBeNull();
    expect(rows[1]).toHaveTextContent('Ready');
    expect(rows[1]).toHaveTextContent('1,204 rows on 1 sheet');
    expect(rows[1]).toHaveTextContent('2 Dec 2026');
    expect(
      within(rows[1]).getByRole('link', { name: `Download ${ready.fileName}` }),
    ).toHaveAttribute('href', ready.downloadUrl);
    expect(rows[2]).toHaveTextContent('Failed');
    expect(rows[2]).toHaveTextContent('the disk is full');
    expect(seenRequests(fetchMock, '/api/exports')[0].url.searchParams.get('pageSize')).toBe('25');
  });

  it('says what to do first when there are none, and what went wrong when they cannot be read', async () => {
    mockApi({
      'GET /api/exports': () => jsonResponse({ items: [], total: 0, page: 1, pageSize: 25 }),
    });
    const empty = renderApp(paths.exports.getHref(), { as: demoPeople.auditor });
    expect(await screen.findByRole('heading', { name: 'No exports yet' })).toBeInTheDocument();
    empty.unmount();

    mockApi({
      'GET /api/exports': () =>
        jsonResponse(apiErrorBody(503, 'The database is not answering.'), 503),
    });
    renderApp(paths.exports.getHref(), { as: demoPeople.auditor });
    expect(await screen.findByText('The database is not answering.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
