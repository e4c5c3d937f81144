import type {
  ImportCommitResponse,
  ImportPreviewResponse,
  ImportPreviewRow,
  ImportUploadResponse,
} from '@tallyloom/core';
import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoChapters, demoPeople, demoRegions } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { demoBlanketSizes, demoCampaigns, receiptsPage } from '@/testing/receipt-fixtures';
import { renderApp } from '@/testing/render-app';

type Handlers = Parameters<typeof mockApi>[0];
type FetchMock = ReturnType<typeof mockApi>;

const IMPORT_ID = 'imp-7f3a';
const PREVIEW = `/api/receipts/imports/${IMPORT_ID}/preview`;
const COMMIT = `/api/receipts/imports/${IMPORT_ID}/commit`;

// Brindle Bay and Alder Falls are open; Cedar Hollow closed in 2025.
const openChapters = demoChapters;

const uploaded: ImportUploadResponse = {
  importId: IMPORT_ID,
  chapterId: 11,
  fileName: 'alder-falls-january.csv',
  sha256: 'ab'.repeat(32),
  fileType: 'csv',
  headers: ['Date', 'Panels', 'Lap done', 'Volunteer'],
  rowCount: 3,
  suggestedMapping: {
    Date: 'receivedOn',
    Panels: 'panelsAccepted',
    'Lap done': 'finished:3',
    Volunteer: null,
  },
  sampleRows: [
    { Date: '2026-01-04', Panels: 120, 'Lap done': 2, Volunteer: 'June' },
    { Date: '2026-01-05', Panels: 80, 'Lap done': null, Volunteer: 'Ray' },
  ],
  expiresAt: '2026-01-10T10:30:00Z',
};

function row(rowNumber: number, extra: Partial<ImportPreviewRow> = {}): ImportPreviewRow {
  return {
    rowNumber,
    values: { receivedOn: '2026-01-04', panelsAccepted: 100 },
    errors: [],
    warnings: [],
    ...extra,
  };
}

function previewOf(rows: ImportPreviewRow[]): ImportPreviewResponse {
  const withErrors = rows.filter((candidate) => candidate.errors.length > 0);
  return {
    rowCount: rows.length,
    validCount: rows.length - withErrors.length,
    errorCount: withErrors.length,
    warningCount: rows.filter((candidate) => candidate.warnings.length > 0).length,
    page: 1,
    pageSize: 500,
    total: rows.length,
    rows,
    rowErrors: withErrors.map(({ rowNumber, errors }) => ({ rowNumber, errors })),
  };
}

const twoErrorRows = previewOf([
  row(2),
  row(3, {
    errors: [
      {
        field: 'receivedOn',
        column: 'Date',
        message: 'receivedOn 2026-13-01 is not a date (YYYY-MM-DD).',
      },
    ],
  }),
  row(4, {
    errors: [
      { field: 'panelsAccepted', column: 'Panels', message: 'panelsAccepted must be 0 or more.' },
    ],
    warnings: [
      {
        field: 'campaignCode',
        column: 'Code',
        message: 'Code ZZZ99 matches no campaign running on 2026-01-04; saved as uncredited.',
      },
    ],
  }),
]);

const cleanRows = previewOf([
  row(2),
  row(3, {
    warnings: [
      {
        field: 'notes',
        column: 'Notes',
        message:
          'Starts with "=", as a spreadsheet formula would; it is kept as plain text and never run.',
      },
    ],
  }),
  row(4),
]);

function mockImportApi(extra: Handlers = {}) {
  return mockApi({
    '/api/chapters': () => jsonResponse(openChapters),
    '/api/blanket-sizes': () => jsonResponse(demoBlanketSizes.filter((size) => size.active)),
    'POST /api/receipts/imports': () => jsonResponse(uploaded, 201),
    ...extra,
  });
}

async function openWizard(extra: Handlers = {}, as = demoPeople.chapterLead) {
  const fetchMock = mockImportApi(extra);
  const view = renderApp(paths.receiptImport.getHref(), { as });
  await screen.findByRole('heading', { level: 1, name: 'Import parcels' });
  await screen.findByRole('combobox', { name: /^Chapter/ });
  return { fetchMock, ...view };
}

function aSheet() {
  return new File(['Date,Panels\n2026-01-04,120\n'], 'alder-falls-january.csv', {
    type: 'text/csv',
  });
}

async function uploadSheet(user: ReturnType<typeof renderApp>['user']) {
  await user.upload(screen.getByLabelText(/^Sheet file/), aSheet());
  await user.click(screen.getByRole('button', { name: 'Upload' }));
  await screen.findByRole('heading', { name: 'Step 2 of 4: Match columns' });
}

function uploadForm(fetchMock: FetchMock): FormData {
  const call = fetchMock.mock.calls.find(([, init]) => init?.body instanceof FormData);
  const body = call?.[1]?.body;
  if (!(body instanceof FormData)) throw new Error('no multipart upload was sent');
  return body;
}

describe('Import parcels', () => {
  beforeAll(async () => {
    await import('./receipts-import');
    await import('./receipts');
  });

  it("preselects a chapter lead's own chapter", async () => {
    await openWizard();

    expect(screen.getByRole('combobox', { name: /^Chapter/ })).toHaveValue('11');
    expect(screen.getByRole('button', { name: 'Download the CSV template' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Download the Excel template' })).toBeInTheDocument();
  });

  it('asks others to choose among the open chapters', async () => {
    const { user } = await openWizard({}, demoPeople.admin);

    const chapter = screen.getByRole('combobox', { name: /^Chapter/ });
    expect(chapter).toHaveValue('');
    expect(
      within(chapter)
        .getAllByRole('option')
        .map((option) => option.textContent),
    ).toEqual(['Choose a chapter', 'Alder Falls', 'Brindle Bay']);

    await user.click(screen.getByRole('button', { name: 'Upload' }));
    expect(screen.getByText('Choose the chapter the parcels came to.')).toBeInTheDocument();
    expect(screen.getByText('Choose a CSV or Excel (.xlsx) file.')).toBeInTheDocument();
  });

  it('uploads the sheet for the chapter and prefills the columns from the suggested mapping', async () => {
    const { user, fetchMock } = await openWizard();

    await uploadSheet(user);

    const form = uploadForm(fetchMock);
    expect(form.get('chapterId')).toBe('11');
    expect((form.get('file') as File).name).toBe('alder-falls-january.csv');

    expect(screen.getByRole('combobox', { name: 'Date' })).toHaveValue('receivedOn');
    expect(screen.getByRole('combobox', { name: 'Panels' })).toHaveValue('panelsAccepted');
    const lap = screen.getByRole('combobox', { name: 'Lap done' });
    expect(lap).toHaveValue('finished:3');
    expect(within(lap).getByRole('option', { selected: true })).toHaveTextContent('Finished: Lap');
    expect(screen.getByRole('combobox', { name: 'Volunteer' })).toHaveValue('');

    const sample = screen.getByRole('table', { name: /The first 2 rows/ });
    expect(within(sample).getAllByRole('row')).toHaveLength(3);
    expect(sample).toHaveTextContent('June');
  });

  it("shows the server's message when the file was imported before", async () => {
    const { user } = await openWizard({
      'POST /api/receipts/imports': () =>
        jsonResponse(
          apiErrorBody(409, 'This file was already imported on 4 Jan 2026 as batch 7.'),
          409,
        ),
    });

    await user.upload(screen.getByLabelText(/^Sheet file/), aSheet());
    await user.click(screen.getByRole('button', { name: 'Upload' }));

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Already imported');
    expect(alert).toHaveTextContent('This file was already imported on 4 Jan 2026 as batch 7.');
    expect(screen.getByRole('heading', { name: 'Step 1 of 4: Upload' })).toBeInTheDocument();
  });

  it('lists the rows with errors first, keeps Import disabled, and goes back for a corrected file', async () => {
    const { user, fetchMock } = await openWizard({
      [`POST ${PREVIEW}`]: () => jsonResponse(twoErrorRows),
    });
    await uploadSheet(user);
    await user.selectOptions(screen.getByRole('combobox', { name: 'Volunteer' }), 'notes');
    await user.click(screen.getByRole('button', { name: 'Check rows' }));

    expect(await screen.findByText('3 rows, 2 with errors, 1 with warnings')).toBeInTheDocument();
    expect(seenRequests(fetchMock, PREVIEW)[0]?.body).toMatchObject({
      mapping: { ...uploaded.suggestedMapping, Volunteer: 'notes' },
      page: 1,
    });
    expect(screen.getByText(/Fix them in your sheet and upload it again/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Import' })).toBeDisabled();

    // Only the rows with problems, errors first, each problem in words.
    expect(screen.getByRole('switch', { name: 'Only rows with problems' })).toBeChecked();
    const table = screen.getByRole('table', { name: 'Rows' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    expect(rows[0]).toHaveTextContent('3');
    expect(rows[0]).toHaveTextContent(
      'Received on (column “Date”): receivedOn 2026-13-01 is not a date (YYYY-MM-DD).',
    );
    expect(rows[1]).toHaveTextContent(
      'Panels accepted (column “Panels”): panelsAccepted must be 0 or more.',
    );
    expect(rows[1]).toHaveTextContent(/saved as uncredited\. The row is still imported\./);

    await user.click(screen.getByRole('switch', { name: 'Only rows with problems' }));
    expect(within(table).getAllByRole('row')).toHaveLength(4);

    await user.click(screen.getByRole('button', { name: 'Upload a corrected file' }));
    expect(await screen.findByRole('heading', { name: 'Step 1 of 4: Upload' })).toHaveFocus();
    expect(screen.getByRole('combobox', { name: /^Chapter/ })).toHaveValue('11');
    expect(seenRequests(fetchMock, COMMIT)).toHaveLength(0);
  });

  it('keeps the chosen chapter when another person uploads a corrected file', async () => {
    const { user } = await openWizard(
      {
        'POST /api/receipts/imports': () => jsonResponse({ ...uploaded, chapterId: 21 }, 201),
        [`POST ${PREVIEW}`]: () => jsonResponse(twoErrorRows),
      },
      demoPeople.admin,
    );
    await user.selectOptions(screen.getByRole('combobox', { name: /^Chapter/ }), '21');
    await uploadSheet(user);
    await user.click(screen.getByRole('button', { name: 'Check rows' }));
    await user.click(await screen.findByRole('button', { name: 'Upload a corrected file' }));

    expect(await screen.findByRole('combobox', { name: /^Chapter/ })).toHaveValue('21');
  });

  it("imports a clean sheet and links to the chapter's parcels", async () => {
    const { user, fetchMock, router } = await openWizard({
      [`POST ${PREVIEW}`]: () => jsonResponse(cleanRows),
      [`POST ${COMMIT}`]: () =>
        jsonResponse({ batchId: 9, created: 3 } satisfies ImportCommitResponse, 201),
      '/api/regions': () => jsonResponse(demoRegions),
      '/api/campaigns': () => jsonResponse(demoCampaigns),
      'GET /api/receipts': (url) => jsonResponse(receiptsPage(url)),
    });
    await uploadSheet(user);
    await user.click(screen.getByRole('button', { name: 'Check rows' }));

    expect(await screen.findByText('3 rows, 0 with errors, 1 with warnings')).toBeInTheDocument();
    expect(screen.getByText('Every row can be imported')).toBeInTheDocument();
    const table = screen.getByRole('table', { name: 'Rows' });
    expect(table).toHaveTextContent(/kept as plain text and never run/);
    const importButton = screen.getByRole('button', { name: 'Import' });
    expect(importButton).toBeEnabled();

    await user.click(importButton);

    expect(await screen.findByText(/^Imported 3 parcels as batch 9/)).toBeInTheDocument();
    expect(seenRequests(fetchMock, COMMIT)[0]?.body).toEqual({
      mapping: uploaded.suggestedMapping,
    });
    const link = screen.getByRole('link', { name: "See the chapter's parcels" });
    expect(link).toHaveAttribute('href', '/receipts?chapter=11');

    await user.click(link);
    await waitFor(() => expect(router.state.location.search).toBe('?chapter=11'));
    expect(await screen.findByRole('heading', { level: 1, name: 'Parcels' })).toBeInTheDocument();
  });

  it('pages through a long preview with a progress bar sized by the upload', async () => {
    const many = Array.from({ length: 600 }, (_, index) => row(index + 2));
    let releaseSecondPage = () => {};
    const secondPage = new Promise<void>((resolve) => {
      releaseSecondPage = resolve;
    });
    const { user, fetchMock } = await openWizard({
      'POST /api/receipts/imports': () => jsonResponse({ ...uploaded, rowCount: 600 }, 201),
      [`POST ${PREVIEW}`]: async (_url, request) => {
        const { page } = request.body as { page: number };
        if (page === 2) await secondPage;
        const all = previewOf(many);
        return jsonResponse({
          ...all,
          page,
          rows: many.slice((page - 1) * 500, page * 500),
        });
      },
    });
    await uploadSheet(user);
    await user.click(screen.getByRole('button', { name: 'Check rows' }));

    expect(await screen.findByText('500 of 600 rows checked')).toBeInTheDocument();
    expect(screen.getByRole('progressbar')).toHaveAttribute('aria-valuenow', String(500 / 600));
    releaseSecondPage();

    expect(await screen.findByText('600 rows, 0 with errors, 0 with warnings')).toBeInTheDocument();
    expect(seenRequests(fetchMock, PREVIEW).map((request) => request.body)).toMatchObject([
      { page: 1, pageSize: 500 },
      { page: 2, pageSize: 500 },
    ]);
    expect(screen.getByRole('switch', { name: 'Only rows with problems' })).not.toBeChecked();
    expect(screen.getByRole('group', { name: 'Pages of rows' })).toHaveTextContent('1–50 of 600');
    expect(screen.getByRole('button', { name: 'Import' })).toBeEnabled();
  });

  it('shows the row problems when the server refuses the commit', async () => {
    const { user } = await openWizard({
      [`POST ${PREVIEW}`]: () => jsonResponse(cleanRows),
      [`POST ${COMMIT}`]: () =>
        jsonResponse(
          apiErrorBody(
            400,
            '1 of 3 rows have errors, so nothing was imported. Correct them in the file and upload it again.',
            {
              fields: [
                {
                  field: 'rows.3.campaignCode',
                  messages: ['Row 3: The campaign DWD26 has been removed.'],
                },
              ],
            },
          ),
          400,
        ),
    });
    await uploadSheet(user);
    await user.click(screen.getByRole('button', { name: 'Check rows' }));
    await user.click(await screen.findByRole('button', { name: 'Import' }));

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('Nothing was imported');
    expect(alert).toHaveTextContent(/so nothing was imported/);
    expect(screen.getByRole('list', { name: 'Rows to correct' })).toHaveTextContent(
      'Row 3: The campaign DWD26 has been removed.',
    );
    expect(screen.getByRole('button', { name: 'Upload a corrected file' })).toBeInTheDocument();
  });

  it('will not check rows until a column gives the date', async () => {
    const { user, fetchMock } = await openWizard();
    await uploadSheet(user);

    await user.selectOptions(screen.getByRole('combobox', { name: 'Date' }), '');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Volunteer' }), 'panelsAccepted');
    expect(screen.getByRole('combobox', { name: 'Volunteer' })).toHaveAccessibleDescription(
      /Panels accepted is already filled from column “Panels”/,
    );
    await user.click(screen.getByRole('button', { name: 'Check rows' }));

    expect(screen.getByText(/Match one column to “Received on”/)).toBeInTheDocument();
    expect(seenRequests(fetchMock, PREVIEW)).toHaveLength(0);
  });

  it('offers the import on the Parcels page to those who log parcels', async () => {
    mockApi({
      '/api/regions': () => jsonResponse(demoRegions),
      '/api/chapters': () => jsonResponse(demoChapters),
      '/api/campaigns': () => jsonResponse(demoCampaigns),
      'GET /api/receipts': (url) => jsonResponse(receiptsPage(url)),
    });
    renderApp(paths.receipts.getHref(), { as: demoPeople.chapterLead });

    expect(await screen.findByRole('link', { name: 'Import a sheet' })).toHaveAttribute(
      'href',
      paths.receiptImport.getHref(),
    );
  });
});
