import type { ParcelReceiptDetail, ParcelReceiptInput } from '@tallyloom/core';
import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { apiErrorBody, demoChapters, demoPeople } from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import {
  aReceipt,
  demoBlanketSizes,
  demoCampaigns,
  demoSettings,
} from '@/testing/receipt-fixtures';
import { currentPath, renderApp } from '@/testing/render-app';

type Handlers = Parameters<typeof mockApi>[0];

const aldersOnly = demoChapters.filter((chapter) => chapter.id === 11);

function mockFormApi(extra: Handlers = {}) {
  return mockApi({
    '/api/chapters': () => jsonResponse(aldersOnly),
    '/api/blanket-sizes': () => jsonResponse(demoBlanketSizes.filter((size) => size.active)),
    '/api/campaigns': () => jsonResponse(demoCampaigns),
    '/api/settings': () => jsonResponse(demoSettings),
    '/api/receipts/501/history': () => jsonResponse([]),
    ...extra,
  });
}

async function openNewForm(extra: Handlers = {}) {
  const fetchMock = mockFormApi(extra);
  const view = renderApp(paths.receiptNew.getHref(), { as: demoPeople.chapterLead });
  await screen.findByRole('form', { name: 'Parcel' });
  return { fetchMock, ...view };
}

async function fillMinimum(user: ReturnType<typeof renderApp>['user']) {
  const date = screen.getByLabelText(/^Received on/);
  await user.clear(date);
  await user.type(date, '2026-01-04');
  await user.type(screen.getByLabelText(/^Panels accepted/), '120');
}

describe('Log a parcel', () => {
  beforeAll(async () => {
    await import('./receipts-new');
    await import('./receipts-edit');
    await import('./receipts-detail');
  });

  it("preselects a chapter lead's own chapter, and asks why panels were set aside as Other", async () => {
    const { user, fetchMock } = await openNewForm();

    const chapter = screen.getByRole('combobox', { name: /^Chapter/ });
    expect(chapter).toHaveValue('11');
    expect(within(chapter).getAllByRole('option')).toHaveLength(1);

    await fillMinimum(user);
    const other = screen.getByLabelText('Other');
    await user.clear(other);
    await user.type(other, '5');
    await user.click(screen.getByRole('button', { name: 'Log parcel' }));

    expect(
      await screen.findByLabelText(/Why the “Other” panels were set aside/),
    ).toHaveAccessibleDescription('Say why these panels were set aside.');
    expect(seenRequests(fetchMock, '/api/receipts')).toHaveLength(0);
  });

  it('shows the safe-sleep caution beside the baby blankets, and no other size', async () => {
    await openNewForm();

    expect(screen.getByLabelText('Baby blankets')).toHaveAccessibleDescription(
      /infants sleep without loose blankets in the cot\. Baby blankets go to the partner agency, whose own rules/,
    );
    expect(screen.getByLabelText('Lap blankets')).not.toHaveAccessibleDescription(/safe sleep/i);
  });

  it('checks a sample panel measured in centimetres against the tolerance setting', async () => {
    const { user } = await openNewForm();

    await user.selectOptions(screen.getByRole('combobox', { name: 'Unit' }), 'cm');
    await user.type(screen.getByLabelText('Width'), '17.8');
    await user.type(screen.getByLabelText('Height'), '22.9');
    expect(await screen.findByText('Within tolerance')).toBeInTheDocument();
    expect(screen.getByText(/within ±0\.5 in of 7 × 9 in/)).toBeInTheDocument();

    const width = screen.getByLabelText('Width');
    await user.clear(width);
    await user.type(width, '20');
    expect(await screen.findByText('Outside tolerance')).toBeInTheDocument();
    expect(
      screen.getByText(
        'Width (shorter side) 20 cm (7.87 in) is 0.87 in over the 7 in target; tolerance is ±0.5 in.',
      ),
    ).toBeInTheDocument();
  });

  it("puts the server's message beside the field it names", async () => {
    const { user } = await openNewForm({
      'POST /api/receipts': () =>
        jsonResponse(
          apiErrorBody(400, 'Invalid input: receivedOn', {
            fields: [
              {
                field: 'receivedOn',
                messages: ['receivedOn 2026-01-04 is before Alder Falls started on 2026-03-01.'],
              },
            ],
          }),
          400,
        ),
    });

    await fillMinimum(user);
    await user.click(screen.getByRole('button', { name: 'Log parcel' }));

    await waitFor(() =>
      expect(screen.getByLabelText(/^Received on/)).toHaveAccessibleDescription(
        'receivedOn 2026-01-04 is before Alder Falls started on 2026-03-01.',
      ),
    );
    expect(screen.getByLabelText(/^Received on/)).toHaveAttribute('aria-invalid', 'true');
  });

  it('sends the parcel, then shows the uncredited-code warning the server gave', async () => {
    let sent: ParcelReceiptInput | undefined;
    const saved = aReceipt({
      id: 777,
      campaignCode: 'ZZZ99',
      campaignId: null,
      credited: false,
      scans: [],
      warnings: ['Code ZZZ99 matches no campaign running on 2026-01-04; saved as uncredited.'],
    });
    const { user, router } = await openNewForm({
      'POST /api/receipts': (_url, request) => {
        sent = request.body as ParcelReceiptInput;
        return jsonResponse(saved, 201);
      },
      '/api/receipts/777/history': () => jsonResponse([]),
    });

    await fillMinimum(user);
    await user.type(screen.getByLabelText('Campaign code'), 'zzz99');
    const baby = screen.getByLabelText('Baby blankets');
    await user.clear(baby);
    await user.type(baby, '2');
    await user.click(screen.getByRole('button', { name: 'Log parcel' }));

    expect(await screen.findByText('Worth a second look')).toBeInTheDocument();
    expect(
      screen.getByText(
        'Code ZZZ99 matches no campaign running on 2026-01-04; saved as uncredited.',
      ),
    ).toBeInTheDocument();
    expect(currentPath(router)).toBe(paths.receipt.getHref(777));
    expect(sent).toMatchObject({
      chapterId: 11,
      receivedOn: '2026-01-04',
      sender: null,
      campaignCode: 'ZZZ99',
      panelsAccepted: 120,
      setAside: { offSize: 0, hardCareYarn: 0, soiledOrDamaged: 0, other: 0 },
      otherItems: 0,
      samplePanel: null,
    });
    expect(sent?.finishedBlankets).toEqual([
      { blanketSizeId: 1, count: 2 },
      { blanketSizeId: 2, count: 0 },
      { blanketSizeId: 3, count: 0 },
      { blanketSizeId: 4, count: 0 },
    ]);
  });
});

describe('Correct a parcel', () => {
  it('says someone else changed it, shows their values, and loads them on request', async () => {
    const mine = aReceipt();
    const theirs: ParcelReceiptDetail = aReceipt({ version: 4, panelsAccepted: 1_300 });
    const patches: Array<Record<string, unknown>> = [];
    mockFormApi({
      'GET /api/receipts/501': () => jsonResponse(mine),
      'PATCH /api/receipts/501': (_url, request) => {
        const body = request.body as Record<string, unknown>;
        patches.push(body);
        if (body.version === 3) {
          return jsonResponse(
            {
              ...apiErrorBody(409, 'Someone changed this receipt since you opened it.'),
              current: theirs,
            },
            409,
          );
        }
        return jsonResponse({ ...theirs, version: 5, panelsAccepted: 1_250 });
      },
    });
    const { user } = renderApp(paths.receiptEdit.getHref(501), { as: demoPeople.chapterLead });

    const panels = await screen.findByLabelText(/^Panels accepted/);
    expect(panels).toHaveValue(1240);
    await user.clear(panels);
    await user.type(panels, '1250');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));

    const conflict = await screen.findByRole('alert');
    expect(conflict).toHaveTextContent('Someone else changed this parcel');
    expect(conflict).toHaveTextContent('version 4');
    expect(conflict).toHaveTextContent('Panels accepted1,300');

    await user.click(within(conflict).getByRole('button', { name: 'Load the current values' }));
    expect(screen.queryByText('Someone else changed this parcel')).not.toBeInTheDocument();
    const reloaded = screen.getByLabelText(/^Panels accepted/);
    expect(reloaded).toHaveValue(1300);

    await user.clear(reloaded);
    await user.type(reloaded, '1250');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(patches).toHaveLength(2));
    expect(patches[1]).toMatchObject({ version: 4, panelsAccepted: 1_250 });
    // The sender shown on the form goes back as it was.
    expect(patches[1]?.sender).toEqual({
      name: 'Wren Example',
      email: 'wren@maker.example',
      address: '12 Loom Lane\nAlder Falls',
    });
  });
});
