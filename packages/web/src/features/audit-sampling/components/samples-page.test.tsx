import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { demoChapters, demoPeople, demoRegions } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { currentPath, renderApp } from '@/testing/render-app';
import { recentQuarters } from './plan-period';
import { aPlanView, aSample, aSummary } from './sample-fixtures';

const lists = {
  '/api/regions': () => jsonResponse(demoRegions),
  '/api/chapters': () => jsonResponse(demoChapters),
};

describe('Audit samples page', () => {
  beforeAll(async () => {
    await Promise.all([import('@/app/routes/samples'), import('@/app/routes/sample')]);
  });

  it('shows the sample size live as the plan changes, then draws it and opens the worksheet', async () => {
    const drawn = aSample({ id: 42 });
    const fetchMock = mockApi({
      ...lists,
      'GET /api/samples': () => jsonResponse({ items: [], total: 0, page: 1, pageSize: 25 }),
      'POST /api/samples/plan': (_url, request) =>
        jsonResponse(aPlanView(request.body as never, 412)),
      'POST /api/samples': () => jsonResponse(drawn, 201),
      'GET /api/samples/42': () => jsonResponse(drawn),
    });
    const { user, router } = renderApp(paths.samples.getHref(), { as: demoPeople.auditor });
    const form = await screen.findByRole('form', { name: 'Plan a sample' });
    const size = within(form).getByRole('group', { name: 'Sample size' });

    // Source: AICPA Audit Sampling guide (2017), Table A-1: 5 % risk, 5 % tolerable, 0 expected → 59.
    expect(size).toHaveTextContent('Sample size: 59 items');
    expect(await within(size).findByText('Population: 412 parcel receipts')).toBeInTheDocument();

    await user.click(within(form).getByRole('radio', { name: '90 %' }));
    const rate = within(form).getByRole('spinbutton', { name: 'Tolerable deviation rate (%)' });
    await user.clear(rate);
    await user.type(rate, '20');
    // Source: AICPA Audit Sampling guide (2017), Table A-2: 10 % risk, 20 % tolerable, 0 expected → 11.
    expect(size).toHaveTextContent('Sample size: 11 items');

    await user.selectOptions(within(form).getByRole('combobox', { name: 'Scope' }), 'region');
    await user.selectOptions(within(form).getByRole('combobox', { name: 'Region' }), '1');
    await user.click(
      within(form).getByRole('checkbox', { name: 'Finite-population adjustment (hypergeometric)' }),
    );
    await waitFor(() => expect(size).toHaveTextContent('Finite-population adjustment:'));

    await user.click(within(form).getByRole('button', { name: 'Draw the sample' }));
    await waitFor(() => expect(currentPath(router)).toBe(paths.sample.getHref(42)));
    const quarter = recentQuarters()[0];
    expect(seenRequests(fetchMock, '/api/samples').find((r) => r.method === 'POST')?.body).toEqual({
      plan: {
        population: {
          kind: 'parcel-receipts',
          scope: 'region',
          scopeId: 1,
          from: quarter.from,
          to: quarter.to,
        },
        confidence: 0.9,
        tolerableRate: 0.2,
        expectedDeviations: 0,
        finitePopulationAdjustment: true,
      },
    });
    expect(await screen.findByText(drawn.seed)).toBeInTheDocument();
  });

  it('names the broken rule and holds the draw while the plan is impossible', async () => {
    const fetchMock = mockApi({
      ...lists,
      'GET /api/samples': () => jsonResponse({ items: [], total: 0, page: 1, pageSize: 25 }),
      'POST /api/samples/plan': (_url, request) => jsonResponse(aPlanView(request.body as never)),
    });
    const { user } = renderApp(paths.samples.getHref(), { as: demoPeople.auditor });
    const form = await screen.findByRole('form', { name: 'Plan a sample' });
    const rate = within(form).getByRole('spinbutton', { name: 'Tolerable deviation rate (%)' });
    await user.clear(rate);
    await user.type(rate, '60');
    // Core's own rule, under the field and in the size box.
    expect(
      within(form).getAllByText(/^The tolerable deviation rate must be above 0 % and at most 50 %/),
    ).toHaveLength(2);
    const draw = within(form).getByRole('button', { name: 'Draw the sample' });
    expect(draw).toHaveAttribute('aria-disabled', 'true');

    await user.clear(rate);
    await user.type(rate, '5');
    const expected = within(form).getByRole('spinbutton', { name: 'Expected deviations' });
    await user.clear(expected);
    await user.type(expected, '1.5');
    expect(
      within(form).getByText('Enter a whole number of deviations, 0 or more.'),
    ).toBeInTheDocument();
    await user.click(draw);
    expect(seenRequests(fetchMock, '/api/samples').filter((r) => r.method === 'POST')).toEqual([]);
  });

  it('lists the samples drawn with their progress or conclusion, and says what to do when none', async () => {
    const open = aSample({ id: 8, items: 3, recorded: 1 });
    const done = aSample({ id: 7, items: 3, recorded: 3, deviationsAt: [1] });
    mockApi({
      ...lists,
      'GET /api/samples': () =>
        jsonResponse({ items: [aSummary(open), aSummary(done)], total: 2, page: 1, pageSize: 25 }),
    });
    const first = renderApp(paths.samples.getHref(), { as: demoPeople.auditor });
    const table = await screen.findByRole('table', { name: 'Samples drawn' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows[0]).toHaveTextContent('Sample #8');
    expect(rows[0]).toHaveTextContent('Region North Ridge');
    expect(rows[0]).toHaveTextContent('1 of 3 recorded');
    expect(rows[1]).toHaveTextContent('Does not support reliance');
    expect(within(rows[0]).getByRole('link', { name: 'Sample #8' })).toHaveAttribute(
      'href',
      paths.sample.getHref(8),
    );
    first.unmount();

    mockApi({
      ...lists,
      'GET /api/samples': () => jsonResponse({ items: [], total: 0, page: 1, pageSize: 25 }),
    });
    renderApp(paths.samples.getHref(), { as: demoPeople.auditor });
    expect(
      await screen.findByRole('heading', { name: 'No samples drawn yet' }),
    ).toBeInTheDocument();
  });
});
