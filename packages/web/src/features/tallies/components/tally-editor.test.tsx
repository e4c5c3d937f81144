import type { TallyDetail } from '@tallyloom/core';
import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoPeople } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { renderApp } from '@/testing/render-app';
import { draftTally, marchValues } from '@/testing/tally-fixtures';

type Handlers = Parameters<typeof mockApi>[0];

async function openTally(detail: TallyDetail, extra: Handlers = {}) {
  const fetchMock = mockApi({
    [`GET /api/tallies/${detail.id}`]: () => jsonResponse(detail),
    ...extra,
  });
  const view = renderApp(paths.tally.getHref(detail.id), { as: demoPeople.chapterLead });
  await screen.findByRole('form', { name: 'Monthly tally' });
  return { fetchMock, ...view };
}

const checks = () => screen.getByRole('complementary', { name: 'Checks' });

function panelsBox(label: RegExp) {
  const section = screen.getByRole('region', { name: 'Panels' });
  return within(section).getByRole('spinbutton', { name: label });
}

describe('the tally form', () => {
  beforeAll(async () => {
    await import('@/app/routes/tally');
  });

  it('shows what was prefilled and where it came from', async () => {
    await openTally(draftTally());

    const accepted = panelsBox(/^Accepted/);
    expect(accepted).toHaveValue(1480);
    expect(accepted).toHaveAccessibleDescription('From 14 parcel receipts: 1,480 panels');

    const opening = panelsBox(/^Opening stock/);
    expect(opening).toHaveValue(120);
    expect(opening).toHaveAttribute('readonly');
    expect(opening).toHaveAccessibleDescription('Carried from Feb 2026 closing stock');
    expect(screen.getByText('8', { selector: 'strong' })).toBeInTheDocument();
    // Baby blankets are among those given out: the safe-sleep caution sits beside them.
    const blankets = screen.getByRole('region', { name: 'Blankets' });
    expect(
      within(blankets).getByText(/Follow safe-sleep guidance for infants: no loose blankets/),
    ).toBeInTheDocument();
  });

  it('lets a first tally enter its opening stock by hand, and says so', async () => {
    await openTally(
      draftTally({
        openingEnteredByHand: true,
        checkContext: { ...draftTally().checkContext, expectedOpening: null },
      }),
    );

    const opening = panelsBox(/^Opening stock/);
    expect(opening).not.toHaveAttribute('readonly');
    expect(opening).toHaveAccessibleDescription("Entered by hand: the chapter's first tally");
  });

  it('runs the checks as you type: a wrong closing stock is an error until it is fixed', async () => {
    const { user } = await openTally(draftTally());
    expect(within(checks()).getByText('No errors or warnings.')).toBeInTheDocument();

    const closing = panelsBox(/^Closing stock/);
    await user.clear(closing);
    await user.type(closing, '250');

    const problem = await within(checks()).findByRole('button', {
      name: /Panel closing stock should be 200 \(opening 120 \+ accepted 1,480 − used 1,400\); the tally says 250/,
    });
    expect(within(checks()).getByText('1 error, 0 warnings')).toBeInTheDocument();

    // The problem takes the cursor to the field it is about.
    await user.click(problem);
    expect(closing).toHaveFocus();

    await user.clear(closing);
    await user.type(closing, '200');
    expect(await within(checks()).findByText('No errors or warnings.')).toBeInTheDocument();
    expect(within(checks()).queryByRole('button', { name: /closing stock should be/ })).toBeNull();
  });

  it('says in words when a count is not a whole number', async () => {
    const { user } = await openTally(draftTally());

    const used = panelsBox(/^Used in assembly/);
    await user.clear(used);
    await user.type(used, '12.5');

    expect(
      await within(checks()).findByRole('button', {
        name: 'Panels used must be a whole number, 0 or more (up to 10,000,000)',
      }),
    ).toBeInTheDocument();
    expect(used).toHaveAccessibleDescription(
      'Panels used must be a whole number, 0 or more (up to 10,000,000)',
    );
    expect(screen.getByRole('status')).toHaveTextContent(
      'Not saved: Panels used must be a whole number, 0 or more',
    );
  });

  it('will not submit while there is an error, and says why', async () => {
    const { user, fetchMock } = await openTally(draftTally(), {
      'PUT /api/tallies/501': (_url, request) =>
        jsonResponse({
          ...draftTally(),
          version: 4,
          values: (request.body as { values: unknown }).values,
        }),
    });

    const closing = panelsBox(/^Closing stock/);
    await user.clear(closing);
    await user.type(closing, '199');

    const submit = screen.getByRole('button', { name: 'Submit for review' });
    expect(submit).toHaveAttribute('aria-disabled', 'true');
    expect(submit).toHaveAccessibleDescription(
      'Fix the error in the check panel before submitting.',
    );
    await user.click(submit);
    expect(seenRequests(fetchMock, '/api/tallies/501/submit')).toHaveLength(0);
  });

  it('asks to acknowledge each warning with a note, and sends the codes, the note and a key', async () => {
    const values = marchValues();
    // 200 people served with 50 blankets given is more than the network's factor of 3 allows.
    values.peopleServed = [{ partnerAgencyId: 31, group: 'adults', count: 200 }];
    const detail = draftTally({ values });
    const { user, fetchMock } = await openTally(detail, {
      'POST /api/tallies/501/submit': () =>
        jsonResponse({ ...detail, state: 'submitted', version: 4, allowedActions: [] }),
    });

    // Far above the chapter's usual month too: two warnings, both to acknowledge.
    expect(within(checks()).getByText('0 errors, 2 warnings')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Submit for review' }));

    const dialog = await screen.findByRole('dialog', { name: 'Submit with warnings' });
    const usual = within(dialog).getByRole('checkbox', {
      name: /People served \(200\) is far from this chapter's usual month/,
    });
    const factor = within(dialog).getByRole('checkbox', {
      name: /People served \(200\) is more than 3 × the blankets given out/,
    });
    await user.click(usual);
    await user.click(within(dialog).getByRole('button', { name: 'Submit tally' }));
    expect(
      await within(dialog).findByText('Write a note saying why the warnings are acknowledged.'),
    ).toBeInTheDocument();
    expect(within(dialog).getAllByText('Tick to acknowledge this warning.')).toHaveLength(1);
    expect(seenRequests(fetchMock, '/api/tallies/501/submit')).toHaveLength(0);

    await user.click(factor);
    await user.type(
      within(dialog).getByRole('textbox', { name: /Note for the reviewer/ }),
      'The shelter ran a winter night: families shared the blankets.',
    );
    await user.click(within(dialog).getByRole('button', { name: 'Submit tally' }));

    await waitFor(() => expect(seenRequests(fetchMock, '/api/tallies/501/submit')).toHaveLength(1));
    const [submitted] = seenRequests(fetchMock, '/api/tallies/501/submit');
    expect(submitted.body).toEqual({
      version: 3,
      acknowledgedWarnings: ['implausible.peopleServed', 'people-served-high'],
      acknowledgementNote: 'The shelter ran a winter night: families shared the blankets.',
    });
    // The one POST of this test is the submission.
    const init = fetchMock.mock.calls
      .map(([, options]) => options)
      .find((o) => o?.method === 'POST');
    expect(new Headers(init?.headers).get('Idempotency-Key')).toMatch(
      /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/,
    );
    // Submitted: the figures are shown, no longer editable.
    expect(await screen.findByRole('region', { name: 'Blankets given out' })).toBeInTheDocument();
    expect(screen.queryByRole('form', { name: 'Monthly tally' })).toBeNull();
  });

  it('sends the same Idempotency-Key when a submission is tried again', async () => {
    const keys: Array<string | null> = [];
    const { user, fetchMock } = await openTally(draftTally(), {
      'POST /api/tallies/501/submit': () =>
        jsonResponse(apiErrorBody(503, 'The server is busy; try again in a moment.'), 503),
    });
    const button = screen.getByRole('button', { name: 'Submit for review' });

    await user.click(button);
    expect(await screen.findByText('The server is busy; try again in a moment.')).toBeVisible();
    await user.click(button);
    await waitFor(() => expect(seenRequests(fetchMock, '/api/tallies/501/submit')).toHaveLength(2));

    for (const [, init] of fetchMock.mock.calls) {
      if (init?.method === 'POST') keys.push(new Headers(init.headers).get('Idempotency-Key'));
    }
    expect(keys).toHaveLength(2);
    expect(keys[0]).toMatch(/^[0-9a-f-]{36}$/);
    expect(keys[1]).toBe(keys[0]);
  });

  it('saves a moment after a change, each time with the version the last save answered', async () => {
    const saves: Array<{ version: number; values: { panels: { usedInAssembly: number } } }> = [];
    const { user } = await openTally(draftTally(), {
      'PUT /api/tallies/501': (_url, request) => {
        const body = request.body as (typeof saves)[number];
        saves.push(body);
        return jsonResponse({ ...draftTally(), version: body.version + 1, values: body.values });
      },
    });

    const used = panelsBox(/^Used in assembly/);
    await user.clear(used);
    await user.type(used, '1390');
    expect(screen.getByRole('status')).toHaveTextContent('Changes not saved yet');
    expect(saves).toHaveLength(0);
    await waitFor(() => expect(saves).toHaveLength(1));
    expect(saves[0]).toMatchObject({ version: 3, values: { panels: { usedInAssembly: 1390 } } });
    expect(await screen.findByRole('status')).toHaveTextContent(/^Saved \d\d:\d\d$/);

    await user.clear(used);
    await user.type(used, '1400');
    await waitFor(() => expect(saves).toHaveLength(2));
    expect(saves[1]).toMatchObject({ version: 4, values: { panels: { usedInAssembly: 1400 } } });
  });

  it("puts the server's refusal of a figure beside its box", async () => {
    const { user } = await openTally(draftTally(), {
      'POST /api/tallies/501/submit': () =>
        jsonResponse(
          {
            statusCode: 400,
            error: 'Bad Request',
            message: 'Invalid input: values.blankets.closing',
            fields: [
              {
                field: 'values.blankets.closing',
                messages: ['Blanket closing stock does not match the stock count on file.'],
              },
            ],
          },
          400,
        ),
    });

    await user.click(screen.getByRole('button', { name: 'Submit for review' }));

    const blankets = screen.getByRole('region', { name: 'Blankets' });
    expect(
      await within(blankets).findByText(
        'Blanket closing stock does not match the stock count on file.',
      ),
    ).toBeInTheDocument();
    expect(
      within(blankets).getByRole('spinbutton', { name: /^Closing stock/ }),
    ).toHaveAccessibleDescription(/does not match the stock count on file/);
    expect(screen.getByRole('form', { name: 'Monthly tally' })).toBeInTheDocument();
  });

  it('shows which figures differ when someone else saved first, and can save over them', async () => {
    const current = draftTally({
      version: 4,
      updatedAt: '2026-04-02T14:10:00Z',
      values: {
        ...marchValues(),
        volunteerHours: 230,
        notes: 'Hours recounted from the sign-in sheet.',
      },
    });
    const saves: unknown[] = [];
    const { user, fetchMock } = await openTally(draftTally(), {
      'PUT /api/tallies/501': (_url, request) => {
        saves.push(request.body);
        return saves.length === 1
          ? jsonResponse(
              { statusCode: 409, error: 'Conflict', message: 'The tally changed.', current },
              409,
            )
          : jsonResponse({
              ...current,
              version: 5,
              values: (request.body as { values: unknown }).values,
            });
      },
    });

    const hours = screen.getByRole('spinbutton', { name: /^Volunteer hours/ });
    await user.clear(hours);
    await user.type(hours, '220');

    const alert = await screen.findByText('Someone else saved this tally first');
    expect(alert).toBeInTheDocument();
    const table = screen.getByRole('table', { name: 'Figures that differ' });
    const rows = within(table)
      .getAllByRole('row')
      .slice(1)
      .map((row) => row.textContent);
    expect(rows).toEqual([
      'Volunteer hours220230',
      'Notes—Hours recounted from the sign-in sheet.',
    ]);
    expect(screen.getByRole('status')).toHaveTextContent('Not saved: someone else saved');

    await user.click(screen.getByRole('button', { name: 'Save mine over them' }));
    await waitFor(() => expect(saves).toHaveLength(2));
    expect(saves[1]).toMatchObject({ version: 4, values: { volunteerHours: 220, notes: null } });
    expect(await screen.findByRole('status')).toHaveTextContent(/^Saved \d\d:\d\d$/);
    expect(screen.queryByText('Someone else saved this tally first')).toBeNull();
    expect(
      seenRequests(fetchMock, '/api/tallies/501').filter((r) => r.method === 'PUT'),
    ).toHaveLength(2);
  });

  it('can take the saved figures instead, and then saves nothing', async () => {
    const current = draftTally({ version: 4, values: { ...marchValues(), volunteerHours: 230 } });
    const { user, fetchMock } = await openTally(draftTally(), {
      'PUT /api/tallies/501': () =>
        jsonResponse(
          { statusCode: 409, error: 'Conflict', message: 'The tally changed.', current },
          409,
        ),
    });

    const hours = screen.getByRole('spinbutton', { name: /^Volunteer hours/ });
    await user.clear(hours);
    await user.type(hours, '220');
    await user.click(await screen.findByRole('button', { name: 'Take the saved figures' }));

    expect(screen.getByRole('spinbutton', { name: /^Volunteer hours/ })).toHaveValue(230);
    expect(screen.queryByText('Someone else saved this tally first')).toBeNull();
    await new Promise((resolve) => setTimeout(resolve, 1_800));
    expect(
      seenRequests(fetchMock, '/api/tallies/501').filter((r) => r.method === 'PUT'),
    ).toHaveLength(1);
  });
});
