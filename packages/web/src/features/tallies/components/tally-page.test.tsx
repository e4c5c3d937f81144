import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { demoPeople } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { renderApp } from '@/testing/render-app';
import { approvedTally, draftTally } from '@/testing/tally-fixtures';

describe('an approved tally', () => {
  beforeAll(async () => {
    await import('@/app/routes/tally');
  });

  it('is shown read-only, with who approved it, the trail and a way to compare revisions', async () => {
    mockApi({
      'GET /api/tallies/501': () =>
        jsonResponse(
          approvedTally({
            revision: 2,
            revisions: [
              ...approvedTally().revisions,
              { ...approvedTally().revisions[0], revision: 2, state: 'approved' },
            ],
          }),
        ),
    });
    renderApp(paths.tally.getHref(501), { as: demoPeople.chapterLead });

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Mar 2026 tally' }),
    ).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'Monthly tally' })).toBeNull();
    expect(screen.queryAllByRole('spinbutton')).toHaveLength(0);
    expect(screen.getByText('Approved', { selector: '.fui-Badge' })).toBeInTheDocument();
    expect(
      screen.getByText('8 Apr 2026, 15:10 by Priya Castell', { exact: false }),
    ).toBeInTheDocument();

    const given = screen.getByRole('table', { name: 'Blankets given out' });
    expect(
      within(given).getByRole('row', { name: /Lap Maple Street Family Shelter 38/ }),
    ).toBeInTheDocument();
    // A baby size was handed out: the safe-sleep caution stands beside it.
    expect(
      screen.getByText(
        /Follow safe-sleep guidance for infants: no loose blankets in a sleeping infant's cot/,
      ),
    ).toBeInTheDocument();

    expect(screen.getByRole('link', { name: 'Compare with revision 1' })).toHaveAttribute(
      'href',
      paths.tallyRevisions.getHref(501, { left: 1, right: 2 }),
    );
    const acknowledged = screen.getByRole('region', {
      name: 'Warnings acknowledged on submission',
    });
    expect(acknowledged).toHaveTextContent('Panels accepted (1,480) is far above');
    expect(acknowledged).toHaveTextContent('A school drive brought in extra panels this month.');

    const trail = screen.getByRole('region', { name: 'Review trail' });
    expect(within(trail).getAllByRole('listitem')).toHaveLength(3);
    expect(within(trail).getAllByRole('listitem')[2]).toHaveTextContent(
      'Approved · revision 1by Priya Castell“Thank you.”',
    );
  });

  it('is changed by an amendment: a reason first, then the form opens again', async () => {
    const fetchMock = mockApi({
      'GET /api/tallies/501': () => jsonResponse(approvedTally()),
      'POST /api/tallies/501/amend': () =>
        jsonResponse(
          draftTally({
            revision: 2,
            version: 4,
            approvedRevision: 1,
            amendmentPending: true,
            amendmentReason: 'The shelter returned 2 lap blankets unused.',
          }),
        ),
    });
    const { user } = renderApp(paths.tally.getHref(501), { as: demoPeople.chapterLead });

    await user.click(await screen.findByRole('button', { name: 'Amend' }));
    const dialog = await screen.findByRole('dialog', { name: 'Amend an approved tally' });
    await user.click(within(dialog).getByRole('button', { name: 'Start the amendment' }));
    expect(
      await within(dialog).findByText('Write the reason for the amendment.'),
    ).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/tallies/501/amend')).toHaveLength(0);

    await user.type(
      within(dialog).getByRole('textbox', { name: /Reason/ }),
      'The shelter returned 2 lap blankets unused.',
    );
    await user.click(within(dialog).getByRole('button', { name: 'Start the amendment' }));

    await waitFor(() => expect(seenRequests(fetchMock, '/api/tallies/501/amend')).toHaveLength(1));
    expect(seenRequests(fetchMock, '/api/tallies/501/amend')[0].body).toEqual({
      version: approvedTally().version,
      reason: 'The shelter returned 2 lap blankets unused.',
    });
    expect(await screen.findByRole('form', { name: 'Monthly tally' })).toBeInTheDocument();
    expect(
      screen.getByText('Amendment in progress', { selector: '.fui-MessageBarTitle' }),
    ).toBeInTheDocument();
    expect(screen.getByText(/Revision 1 stays in force in every report/)).toBeInTheDocument();
  });

  it("flags an opening stock entered by hand for the chapter's first tally", async () => {
    mockApi({
      'GET /api/tallies/501': () => jsonResponse(approvedTally({ openingEnteredByHand: true })),
    });
    renderApp(paths.tally.getHref(501), { as: demoPeople.chapterLead });

    expect(
      await screen.findByText("Entered by hand: the chapter's first tally"),
    ).toBeInTheDocument();
  });

  it('offers no Amend to someone who may only read it', async () => {
    mockApi({ 'GET /api/tallies/501': () => jsonResponse(approvedTally({ allowedActions: [] })) });
    renderApp(paths.tally.getHref(501), { as: demoPeople.auditor });

    expect(
      await screen.findByRole('heading', { level: 1, name: 'Mar 2026 tally' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Print' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Amend' })).toBeNull();
  });

  it('says what went wrong when the tally cannot be loaded', async () => {
    mockApi({
      'GET /api/tallies/999': () =>
        jsonResponse({ statusCode: 404, error: 'Not Found', message: 'No tally 999.' }, 404),
    });
    renderApp(paths.tally.getHref(999), { as: demoPeople.chapterLead });

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('The tally could not be loaded');
    expect(alert).toHaveTextContent('No tally 999.');
  });
});
