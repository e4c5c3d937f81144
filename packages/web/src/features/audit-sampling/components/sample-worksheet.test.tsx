import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoChapters, demoPeople, demoRegions } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { renderApp } from '@/testing/render-app';
import { aPlanRequest, aSample } from './sample-fixtures';

type Handlers = Parameters<typeof mockApi>[0];

function mockSampleApi(sample: ReturnType<typeof aSample>, extra: Handlers = {}) {
  return mockApi({
    '/api/regions': () => jsonResponse(demoRegions),
    '/api/chapters': () => jsonResponse(demoChapters),
    [`GET /api/samples/${sample.id}`]: () => jsonResponse(sample),
    ...extra,
  });
}

function worksheetRows() {
  return within(screen.getByRole('table', { name: 'Sampled items' }))
    .getAllByRole('row')
    .slice(1);
}

describe('Sample worksheet', () => {
  beforeAll(async () => {
    await import('@/app/routes/sample');
  });

  beforeEach(() => {
    Object.defineProperty(URL, 'createObjectURL', {
      configurable: true,
      value: vi.fn(() => 'blob:attachment-1'),
    });
    Object.defineProperty(URL, 'revokeObjectURL', { configurable: true, value: vi.fn() });
  });

  it('shows the seed, the plan and the items in draw order, and records an item as agreeing', async () => {
    const sample = aSample({ id: 7, items: 3, recorded: 1 });
    const after = aSample({ id: 7, items: 3, recorded: 2 });
    const fetchMock = mockSampleApi(sample, {
      'PUT /api/samples/7/items/508': () => jsonResponse(after),
    });
    const { user } = renderApp(paths.sample.getHref(7), { as: demoPeople.auditor });

    expect(await screen.findByText('f3a9c2d417b8e605')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'New finding' })).toBeInTheDocument();
    const facts = screen.getByRole('region', { name: 'Seed and plan' });
    await waitFor(() => expect(facts).toHaveTextContent('Region North Ridge'));
    expect(facts).toHaveTextContent('95 %');
    expect(facts).toHaveTextContent('5 %');
    expect(screen.getByText('1 of 3 recorded')).toBeInTheDocument();

    const rows = worksheetRows();
    expect(rows.map((row) => within(row).getAllByRole('cell')[0].textContent)).toEqual([
      '1',
      '2',
      '3',
    ]);
    expect(within(rows[1]).getByRole('link', { name: 'Parcel #508' })).toHaveAttribute(
      'href',
      paths.receipt.getHref(508),
    );
    expect(rows[0]).toHaveTextContent('Agrees');
    expect(rows[1]).toHaveTextContent('Not recorded');

    await user.click(within(rows[1]).getByRole('button', { name: 'Agrees: Parcel #508' }));
    expect(await screen.findByText('2 of 3 recorded')).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/samples/7/items/508')[0].body).toEqual({
      result: 'agrees',
    });
  });

  it('asks for a note before recording a deviation, and sends the evidence with it', async () => {
    const sample = aSample({ id: 7, items: 3, recorded: 0 });
    const after = aSample({ id: 7, items: 3, recorded: 1, deviationsAt: [0] });
    const fetchMock = mockSampleApi(sample, {
      'PUT /api/samples/7/items/501': () => jsonResponse(after),
    });
    const { user } = renderApp(paths.sample.getHref(7), { as: demoPeople.auditor });
    await screen.findByText('0 of 3 recorded');

    await user.click(
      within(worksheetRows()[0]).getByRole('button', { name: 'Deviation…: Parcel #501' }),
    );
    const dialog = await screen.findByRole('dialog', { name: 'Parcel #501: worksheet entry' });
    expect(within(dialog).getByRole('radio', { name: 'Deviation' })).toBeChecked();
    await user.click(within(dialog).getByRole('button', { name: 'Record' }));
    expect(
      within(dialog).getByText('Say what was wrong: a deviation needs a note.'),
    ).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/samples/7/items/501')).toEqual([]);

    await user.type(
      within(dialog).getByRole('textbox', { name: /Note/ }),
      'Label says 40, logged 48.',
    );
    const photo = new File(['png-bytes'], 'label.png', { type: 'image/png' });
    await user.upload(within(dialog).getByLabelText(/Attachment/), photo);
    await user.click(within(dialog).getByRole('button', { name: 'Record' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());

    const [, init] = fetchMock.mock.calls.find(
      ([input]) => typeof input === 'string' && input.endsWith('/api/samples/7/items/501'),
    )!;
    const form = init?.body as FormData;
    expect(init?.method).toBe('PUT');
    expect([form.get('result'), form.get('note'), (form.get('attachment') as File).name]).toEqual([
      'deviation',
      'Label says 40, logged 48.',
      'label.png',
    ]);
    expect(await screen.findByText('1 of 3 recorded')).toBeInTheDocument();
    // The page is inert until the dialog has finished closing.
    await waitFor(() => expect(worksheetRows()[0]).toHaveTextContent('Deviation'));
  });

  it('gives the upper deviation limit and the conclusion once every item is recorded', async () => {
    // Source: AICPA Audit Sampling guide (2017), Table A-3: n = 60 with 2 deviations → 10.2 % at 95 %.
    const sample = aSample({ id: 9, items: 60, recorded: 60, deviationsAt: [4, 17] });
    mockSampleApi(sample);
    renderApp(paths.sample.getHref(9), { as: demoPeople.auditor });
    const conclusion = await screen.findByRole('status', { name: 'Conclusion' });
    expect(conclusion).toHaveTextContent('Does not support reliance');
    expect(conclusion).toHaveTextContent(
      'The upper deviation limit, 10.2 %, is above the tolerable rate of 5 %',
    );
    const result = screen.getByRole('region', { name: 'Result' });
    expect(result).toHaveTextContent('Deviations found2');
    expect(result).toHaveTextContent('Upper deviation limit at 95 %10.2 %');
  });

  it('concludes in favour when the limit stays under the tolerable rate', async () => {
    const request = aPlanRequest({ confidence: 0.9, tolerableRate: 0.2 });
    // Source: AICPA Audit Sampling guide (2017), Table A-2: 10 % risk, 20 % tolerable → 11 items.
    const sample = aSample({ id: 10, items: 11, recorded: 11, request });
    mockSampleApi(sample);
    renderApp(paths.sample.getHref(10), { as: demoPeople.auditor });
    const conclusion = await screen.findByRole('status', { name: 'Conclusion' });
    expect(conclusion).toHaveTextContent('Supports reliance');
    expect(conclusion).toHaveTextContent('the sample supports relying on the control');
  });

  it('explains a sample that cannot be read', async () => {
    mockApi({
      '/api/samples/12': () => jsonResponse(apiErrorBody(404, 'No such sample.'), 404),
    });
    renderApp(paths.sample.getHref(12), { as: demoPeople.auditor });
    expect(
      await screen.findByRole('heading', { name: 'The sample could not be loaded' }),
    ).toBeInTheDocument();
    expect(screen.getByText('No such sample.')).toBeInTheDocument();
  });
});
