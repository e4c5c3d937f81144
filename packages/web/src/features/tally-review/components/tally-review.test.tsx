import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoPeople } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { renderApp } from '@/testing/render-app';
import { amendedTally, submittedTally } from '@/testing/tally-fixtures';
import type { SparklineInput } from './sparkline-option';

// jsdom has no canvas for ECharts to draw on: stand in for the chart with what it was given.
// The option it builds is tested on its own (sparkline-option.test.ts).
vi.mock('./history-sparkline', () => ({
  HistorySparkline: ({ label, value, history }: SparklineInput) => (
    <span data-testid="sparkline">
      {label}: {value} against {history.map((point) => point.value).join(' ')}
    </span>
  ),
}));

const tallyPath = '/api/tallies/501';

function mockReviewApi(tally = submittedTally(), extra: Parameters<typeof mockApi>[0] = {}) {
  return mockApi({ [`GET ${tallyPath}`]: () => jsonResponse(tally), ...extra });
}

describe('Reviewing a tally', () => {
  beforeAll(async () => {
    await import('@/app/routes/tally-review-item');
  });

  it('shows where it stands, the checks with the lead’s note, the history and every figure', async () => {
    const tally = submittedTally();
    mockReviewApi(tally);
    renderApp(paths.tallyReviewItem.getHref(501), { as: demoPeople.coordinator });

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Alder Falls, Mar 2026' }),
    ).toBeInTheDocument();

    const standing = screen.getByRole('region', { name: 'Where it stands' });
    expect(standing).toHaveTextContent('Submitted');
    expect(standing).toHaveTextContent('On time');
    expect(standing).toHaveTextContent('by Dana Whitlock');

    const checks = screen.getByRole('region', { name: 'Checks' });
    const warning = within(checks).getByText(/Panels accepted \(1,480\) is far above/);
    expect(warning.closest('li')).toHaveTextContent('Acknowledged');
    expect(checks).toHaveTextContent('A school drive brought in extra panels this month.');

    const history = screen.getByRole('table', { name: 'Against the chapter’s history' });
    const accepted = within(history).getByRole('row', { name: /^Panels accepted/ });
    expect(accepted).toHaveTextContent('1,480');
    expect(accepted).toHaveTextContent('1,475');
    expect(accepted).toHaveTextContent('0.11');
    // Each count's own history, oldest first, goes to its sparkline.
    const past = tally.checkContext.history.map((month) => month.panelsAccepted);
    expect(past).toHaveLength(12);
    expect(within(accepted).getByTestId('sparkline')).toHaveTextContent(
      `Panels accepted: 1480 against ${past.join(' ')}`,
    );
    expect(within(history).getAllByTestId('sparkline')).toHaveLength(6);
    expect(within(history).getByRole('row', { name: /^Blankets given out/ })).toHaveTextContent(
      'Same every month',
    );
    expect(within(history).getByRole('row', { name: /^Volunteer hours/ })).toHaveTextContent(
      'Too little history',
    );

    const panels = screen.getByRole('region', { name: 'Panels' });
    expect(panels).toHaveTextContent('Set aside: Off-size12');
    const blankets = screen.getByRole('region', { name: 'Blankets' });
    expect(blankets).toHaveTextContent('Given out50');
    const given = screen.getByRole('table', { name: 'Blankets given out' });
    expect(
      within(given).getByRole('row', { name: /Lap Maple Street Family Shelter 38/ }),
    ).toBeInTheDocument();
    // Agency, then infants, children, adults, older adults, disaster-affected.
    const people = screen.getByRole('table', { name: 'People served' });
    expect(
      within(people).getByRole('row', { name: 'Maple Street Family Shelter 0 8 30 0 0' }),
    ).toBeInTheDocument();
    const other = screen.getByRole('region', { name: 'Hours, yarn and notes' });
    expect(other).toHaveTextContent('Volunteer hours212.5');
    expect(other).toHaveTextContent('Yarn donated4.5 kg ≈ 9.92 lb');
    expect(other).toHaveTextContent('NotesNone');

    const trail = screen.getByRole('region', { name: 'Review trail' });
    expect(within(trail).getAllByRole('listitem')).toHaveLength(2);
    expect(trail).toHaveTextContent('Submitted for review · revision 1');
    expect(screen.getByRole('table', { name: 'Revisions' })).toHaveTextContent('Submitted');
  });

  it('approves with the version it read and an optional comment', async () => {
    const approved = submittedTally({
      state: 'approved',
      approvedRevision: 1,
      version: 8,
      allowedActions: [],
    });
    const fetchMock = mockReviewApi(submittedTally(), {
      [`POST ${tallyPath}/approve`]: () => jsonResponse(approved),
    });
    const { user } = renderApp(paths.tallyReviewItem.getHref(501), { as: demoPeople.coordinator });

    await user.click(await screen.findByRole('button', { name: 'Approve' }));
    const dialog = await screen.findByRole('dialog', { name: 'Approve this tally?' });
    await user.type(within(dialog).getByRole('textbox'), 'Thanks, all clear.');
    await user.click(within(dialog).getByRole('button', { name: 'Approve' }));

    await waitFor(() =>
      expect(seenRequests(fetchMock, `${tallyPath}/approve`)[0]?.body).toEqual({
        version: 7,
        comment: 'Thanks, all clear.',
      }),
    );
    await waitFor(() =>
      expect(screen.queryByRole('button', { name: 'Approve' })).not.toBeInTheDocument(),
    );
    expect(await screen.findByRole('region', { name: 'Where it stands' })).toHaveTextContent(
      'Approved',
    );
    // The button is gone: the keyboard lands on the outcome, with the way back to the queue.
    const back = screen.getByRole('link', { name: 'Back to the review queue' });
    await waitFor(() => expect(document.activeElement).toContainElement(back));
    expect(back).toHaveAttribute('href', paths.tallyReview.getHref());
  });

  it('sends no comment when the reviewer approves without one', async () => {
    const fetchMock = mockReviewApi(submittedTally(), {
      [`POST ${tallyPath}/approve`]: () => jsonResponse(submittedTally({ state: 'approved' })),
    });
    const { user } = renderApp(paths.tallyReviewItem.getHref(501), { as: demoPeople.staff });

    await user.click(await screen.findByRole('button', { name: 'Approve' }));
    const dialog = await screen.findByRole('dialog', { name: 'Approve this tally?' });
    await user.click(within(dialog).getByRole('button', { name: 'Approve' }));
    await waitFor(() =>
      expect(seenRequests(fetchMock, `${tallyPath}/approve`)[0]?.body).toEqual({
        version: 7,
        comment: null,
      }),
    );
  });

  it('will not return a tally without a comment saying what to fix', async () => {
    const fetchMock = mockReviewApi(submittedTally(), {
      [`POST ${tallyPath}/return`]: () =>
        jsonResponse(submittedTally({ state: 'returned', allowedActions: [] })),
    });
    const { user } = renderApp(paths.tallyReviewItem.getHref(501), { as: demoPeople.coordinator });

    await user.click(await screen.findByRole('button', { name: 'Return to chapter' }));
    const dialog = await screen.findByRole('dialog', {
      name: 'Return this tally to the chapter',
    });
    await user.type(within(dialog).getByRole('textbox'), '   ');
    await user.click(within(dialog).getByRole('button', { name: 'Return to chapter' }));
    expect(
      await within(dialog).findByText(
        'Say what the chapter should fix, so the lead knows what to change.',
      ),
    ).toBeInTheDocument();
    expect(seenRequests(fetchMock, `${tallyPath}/return`)).toHaveLength(0);

    await user.type(within(dialog).getByRole('textbox'), 'Closing stock is 20 short.');
    await user.click(within(dialog).getByRole('button', { name: 'Return to chapter' }));
    await waitFor(() =>
      expect(seenRequests(fetchMock, `${tallyPath}/return`)[0]?.body).toEqual({
        version: 7,
        comment: 'Closing stock is 20 short.',
      }),
    );
  });

  it('says in words why the server refused: one’s own tally (403)', async () => {
    const refusal = 'You cannot approve a tally you submitted; another reviewer must approve it.';
    mockReviewApi(submittedTally(), {
      [`POST ${tallyPath}/approve`]: () => jsonResponse(apiErrorBody(403, refusal), 403),
    });
    const { user } = renderApp(paths.tallyReviewItem.getHref(501), { as: demoPeople.staff });

    await user.click(await screen.findByRole('button', { name: 'Approve' }));
    const dialog = await screen.findByRole('dialog', { name: 'Approve this tally?' });
    await user.click(within(dialog).getByRole('button', { name: 'Approve' }));

    expect(await within(dialog).findByRole('alert')).toHaveTextContent(refusal);
    // Nothing changed: the decision is still open to another reviewer.
    expect(within(dialog).getByRole('button', { name: 'Approve' })).toBeInTheDocument();
  });

  it('shows the tally as it is now when someone changed it meanwhile (409)', async () => {
    const current = submittedTally({ state: 'returned', version: 9, allowedActions: [] });
    mockReviewApi(submittedTally(), {
      [`POST ${tallyPath}/approve`]: () =>
        jsonResponse(
          { ...apiErrorBody(409, 'The tally changed since you read it.'), current },
          409,
        ),
    });
    const { user } = renderApp(paths.tallyReviewItem.getHref(501), { as: demoPeople.staff });

    await user.click(await screen.findByRole('button', { name: 'Approve' }));
    const dialog = await screen.findByRole('dialog', { name: 'Approve this tally?' });
    await user.click(within(dialog).getByRole('button', { name: 'Approve' }));

    expect(await screen.findByText('Changed while you were reading')).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Where it stands' })).toHaveTextContent('Returned');
    expect(screen.queryByRole('button', { name: 'Approve' })).not.toBeInTheDocument();
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
  });

  it('offers no decision the server does not allow', async () => {
    mockReviewApi(submittedTally({ allowedActions: ['return'] }));
    renderApp(paths.tallyReviewItem.getHref(501), { as: demoPeople.coordinator });

    expect(await screen.findByRole('button', { name: 'Return to chapter' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Approve' })).not.toBeInTheDocument();
  });

  it('shows an amendment’s reason, with the way to compare it with what was approved', async () => {
    mockReviewApi(amendedTally());
    renderApp(paths.tallyReviewItem.getHref(501), { as: demoPeople.coordinator });

    expect(
      await screen.findByText('Reason given: “Five baby blankets were counted twice.”'),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Compare with approved revision 1' })).toHaveAttribute(
      'href',
      paths.tallyRevisions.getHref(501, { left: 1, right: 2 }),
    );
    expect(screen.getByRole('region', { name: 'Where it stands' })).toHaveTextContent('Amendment');
  });

  it('shows what went wrong when the tally cannot be loaded', async () => {
    mockApi({
      [`GET ${tallyPath}`]: () =>
        jsonResponse(apiErrorBody(404, 'No tally 501 in your scope.'), 404),
    });
    renderApp(paths.tallyReviewItem.getHref(501), { as: demoPeople.coordinator });

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('The tally could not be loaded');
    expect(alert).toHaveTextContent('No tally 501 in your scope.');
  });
});
