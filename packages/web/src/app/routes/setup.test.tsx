import type { BlanketSizeView, CampaignView, NetworkSettings } from '@tallyloom/core';
import { screen, waitFor, within } from '@testing-library/react';
import { addDays, format, subDays } from 'date-fns';
import { describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import {
  demoAgencies,
  demoCampaigns,
  demoChapters,
  demoPeople,
  demoRegions,
} from '@/testing/fixtures';
import { jsonResponse, mockApi, seenRequests } from '@/testing/mock-api';
import { currentPath, renderApp } from '@/testing/render-app';

type Handlers = Parameters<typeof mockApi>[0];

const demoSizes: BlanketSizeView[] = [
  {
    id: 1,
    name: 'Baby',
    columns: 4,
    rows: 4,
    panels: 16,
    widthIn: 28,
    heightIn: 36,
    widthCm: 71.12,
    heightCm: 91.44,
    active: true,
    sortOrder: 1,
    sourceNote: null,
  },
  {
    id: 4,
    name: 'Old square',
    columns: 6,
    rows: 5,
    panels: 30,
    widthIn: 42,
    heightIn: 45,
    widthCm: 106.68,
    heightCm: 114.3,
    active: false,
    sortOrder: 9,
    sourceNote: 'Retired in 2024',
  },
];

const storedSettings: NetworkSettings = {
  fiscalYearStartMonth: 7,
  panelToleranceIn: 0.5,
  receiptCountCeiling: 10000,
  servedPerBlanketWarnFactor: 3,
  reminderDaysBeforeDue: 3,
  reminderDaysAfterDue: 2,
};

function mockSetupApi(extra: Handlers = {}) {
  return mockApi({
    '/api/regions': () => jsonResponse(demoRegions),
    '/api/chapters': () => jsonResponse(demoChapters),
    '/api/agencies': () => jsonResponse(demoAgencies),
    '/api/campaigns': () => jsonResponse(demoCampaigns),
    '/api/blanket-sizes': () => jsonResponse(demoSizes),
    '/api/settings': () => jsonResponse(storedSettings),
    '/api/settings/volunteer-hour-values': () =>
      jsonResponse([
        {
          id: 1,
          dataYear: 2022,
          hourlyValue: 31.8,
          currency: 'USD',
          source: 'Independent Sector, Value of Volunteer Time (2022 data, released 2023)',
        },
      ]),
    ...extra,
  });
}

describe('Network set-up page', () => {
  it('shows a regional coordinator who opens it that they have no access, and fetches nothing', async () => {
    const fetchMock = mockSetupApi();
    renderApp(paths.setup.getHref(), { as: demoPeople.coordinator });

    expect(
      await screen.findByRole('heading', { level: 1, name: 'No access to Network set-up' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('main')).toHaveTextContent(
      'Network set-up is open to the Network admin role only.',
    );
    expect(screen.queryByRole('tablist')).not.toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/regions')).toHaveLength(0);
  });

  it('moves between its parts with the tabs, from the keyboard too', async () => {
    mockSetupApi();
    const { user, router } = renderApp(paths.setup.getHref(), { as: demoPeople.admin });

    const tabs = await screen.findByRole('tablist', { name: 'Set-up sections' });
    const names = [
      'Regions & chapters',
      'Partner agencies',
      'Campaigns',
      'Blanket sizes',
      'Settings',
    ];
    expect(within(tabs).getAllByRole('tab')).toHaveLength(names.length);
    names.forEach((name, index) =>
      expect(within(tabs).getAllByRole('tab')[index]).toHaveAccessibleName(name),
    );
    expect(within(tabs).getByRole('tab', { name: 'Regions & chapters' })).toHaveAttribute(
      'aria-selected',
      'true',
    );
    expect(await screen.findByRole('table', { name: 'Regions' })).toBeInTheDocument();

    await user.click(within(tabs).getByRole('tab', { name: 'Campaigns' }));
    expect(await screen.findByRole('table', { name: 'Campaigns' })).toBeInTheDocument();
    expect(currentPath(router)).toBe(paths.setupCampaigns.getHref());

    within(tabs).getByRole('tab', { name: 'Campaigns' }).focus();
    await user.keyboard('{ArrowRight}{Enter}');
    expect(await screen.findByRole('table', { name: 'Blanket sizes' })).toBeInTheDocument();
    expect(currentPath(router)).toBe(paths.setupBlanketSizes.getHref());
  });
});

describe('regions and chapters', () => {
  it("shows the server's 409 on the code beside the code field", async () => {
    const fetchMock = mockSetupApi({
      'POST /api/regions': () =>
        jsonResponse(
          {
            statusCode: 409,
            error: 'Conflict',
            message: 'Another region already has this code.',
            fields: [{ field: 'code', messages: ['Another region already has this code.'] }],
          },
          409,
        ),
    });
    const { user } = renderApp(paths.setup.getHref(), { as: demoPeople.admin });

    await user.click(await screen.findByRole('button', { name: 'Add region' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a region' });
    await user.type(within(dialog).getByLabelText(/^Name/), 'Northern Reach');
    await user.type(within(dialog).getByLabelText(/^Code/), 'nr');
    expect(within(dialog).getByLabelText(/^Code/)).toHaveValue('NR');
    await user.click(within(dialog).getByRole('button', { name: 'Add region' }));

    const code = within(dialog).getByLabelText(/^Code/);
    await waitFor(() => expect(code).toHaveAttribute('aria-invalid', 'true'));
    expect(code).toHaveAccessibleDescription(
      expect.stringContaining('Another region already has this code.'),
    );
    // Beside the field only, not repeated above the form.
    expect(within(dialog).getAllByText('Another region already has this code.')).toHaveLength(1);
    expect(seenRequests(fetchMock, '/api/regions').find((r) => r.method === 'POST')?.body).toEqual({
      name: 'Northern Reach',
      code: 'NR',
    });
  });
});

describe('partner agencies', () => {
  it("shows the safe-sleep caution once the kind is a neonatal or children's ward", async () => {
    mockSetupApi();
    const { user } = renderApp(paths.setupAgencies.getHref(), { as: demoPeople.admin });

    await user.click(await screen.findByRole('button', { name: 'Add agency' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a partner agency' });
    expect(within(dialog).queryByText(/safe sleep/i)).not.toBeInTheDocument();

    await user.selectOptions(
      within(dialog).getByRole('combobox', { name: /Kind/ }),
      "Neonatal or children's ward",
    );
    expect(within(dialog).getByText('Baby blankets and safe sleep')).toBeInTheDocument();
    expect(dialog).toHaveTextContent('no loose blankets in the cot');
    expect(dialog).toHaveTextContent('the agency’s own rules');

    await user.selectOptions(within(dialog).getByRole('combobox', { name: /Kind/ }), 'Care home');
    expect(within(dialog).queryByText('Baby blankets and safe sleep')).not.toBeInTheDocument();
  });

  it('adds an agency served by the chapters ticked, grouped by region', async () => {
    const fetchMock = mockSetupApi({
      'POST /api/agencies': () =>
        jsonResponse(
          {
            id: 50,
            name: 'Coastal County Neonatal Unit',
            kind: 'neonatal_or_childrens_ward',
            active: true,
            chapters: [{ id: 21, name: 'Brindle Bay' }],
          },
          201,
        ),
    });
    const { user } = renderApp(paths.setupAgencies.getHref(), { as: demoPeople.admin });

    await user.click(await screen.findByRole('button', { name: 'Add agency' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a partner agency' });
    await user.click(within(dialog).getByRole('button', { name: 'Add agency' }));
    expect(dialog).toHaveTextContent('Choose at least one chapter.');

    await user.type(within(dialog).getByLabelText(/^Name/), 'Coastal County Neonatal Unit');
    await user.selectOptions(
      within(dialog).getByRole('combobox', { name: /Kind/ }),
      "Neonatal or children's ward",
    );
    const riverlands = within(dialog).getByRole('group', { name: 'Riverlands' });
    await user.click(within(riverlands).getByRole('checkbox', { name: 'Brindle Bay' }));
    await user.click(within(dialog).getByRole('button', { name: 'Add agency' }));

    expect(await screen.findByText('Coastal County Neonatal Unit added.')).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/agencies').find((r) => r.method === 'POST')?.body).toEqual(
      {
        name: 'Coastal County Neonatal Unit',
        kind: 'neonatal_or_childrens_ward',
        chapterIds: [21],
      },
    );
  });

  it('asks before deactivating an agency, and deactivates only on confirmation', async () => {
    const fetchMock = mockSetupApi({
      'PATCH /api/agencies/31': () => jsonResponse({ ...demoAgencies[0], active: false }),
    });
    const { user } = renderApp(paths.setupAgencies.getHref(), { as: demoPeople.admin });

    const table = await screen.findByRole('table', { name: 'Partner agencies' });
    await user.click(
      within(table).getByRole('button', { name: 'Actions for Maple Street Family Shelter' }),
    );
    await user.click(await screen.findByRole('menuitem', { name: 'Deactivate…' }));
    const confirm = await screen.findByRole('alertdialog', {
      name: 'Deactivate Maple Street Family Shelter?',
    });
    expect(seenRequests(fetchMock, '/api/agencies/31')).toHaveLength(0);

    await user.click(within(confirm).getByRole('button', { name: 'Deactivate' }));
    expect(
      await screen.findByText('Maple Street Family Shelter is deactivated.'),
    ).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/agencies/31')[0]).toMatchObject({
      method: 'PATCH',
      body: { active: false },
    });
  });
});

describe('campaigns', () => {
  it('says from its dates whether a campaign is running or has ended', async () => {
    const today = new Date();
    const iso = (date: Date) => format(date, 'yyyy-MM-dd');
    const running: CampaignView = {
      ...demoCampaigns[0],
      id: 61,
      code: 'NOW26',
      startsOn: iso(subDays(today, 10)),
      endsOn: iso(addDays(today, 20)),
    };
    const ended: CampaignView = {
      ...demoCampaigns[1],
      id: 62,
      code: 'PAST25',
      startsOn: iso(subDays(today, 90)),
      endsOn: iso(subDays(today, 1)),
    };
    mockSetupApi({ '/api/campaigns': () => jsonResponse([running, ended]) });
    renderApp(paths.setupCampaigns.getHref(), { as: demoPeople.admin });

    const table = await screen.findByRole('table', { name: 'Campaigns' });
    const runningRow = within(table).getByRole('row', { name: /NOW26/ });
    expect(runningRow).toHaveTextContent('Running');
    expect(runningRow).toHaveTextContent('Whole network');
    const endedRow = within(table).getByRole('row', { name: /PAST25/ });
    expect(endedRow).toHaveTextContent('Ended');
    expect(endedRow).toHaveTextContent('Riverlands');
    expect(within(table).getAllByRole('row')[0]).toHaveTextContent(
      'CodeNameGoal (panels)DatesRegionStateActions',
    );
  });

  it('writes the code in capitals as it is typed and sends the campaign', async () => {
    const fetchMock = mockSetupApi({
      'POST /api/campaigns': (_url, request) =>
        jsonResponse({ id: 70, regionName: null, ...(request.body as object) }, 201),
    });
    const { user } = renderApp(paths.setupCampaigns.getHref(), { as: demoPeople.admin });

    await user.click(await screen.findByRole('button', { name: 'Add campaign' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a campaign' });
    await user.type(within(dialog).getByLabelText(/^Code/), 'dwd27');
    expect(within(dialog).getByLabelText(/^Code/)).toHaveValue('DWD27');
    await user.type(within(dialog).getByLabelText(/^Name/), 'Deep Winter Drive 2026–27');
    await user.type(within(dialog).getByLabelText(/^Goal/), '4500');
    await user.type(within(dialog).getByLabelText(/^First day/), '2026-11-01');
    await user.type(within(dialog).getByLabelText(/^Last day/), '2027-02-28');
    await user.click(within(dialog).getByRole('button', { name: 'Add campaign' }));

    expect(await screen.findByText('Campaign DWD27 added.')).toBeInTheDocument();
    expect(
      seenRequests(fetchMock, '/api/campaigns').find((r) => r.method === 'POST')?.body,
    ).toEqual({
      code: 'DWD27',
      name: 'Deep Winter Drive 2026–27',
      goalPanels: 4500,
      startsOn: '2026-11-01',
      endsOn: '2027-02-28',
      regionId: null,
    });
  });
});

describe('blanket sizes', () => {
  it('lists retired sizes too for admins, each with its grid and finished size', async () => {
    const fetchMock = mockSetupApi();
    renderApp(paths.setupBlanketSizes.getHref(), { as: demoPeople.admin });

    const table = await screen.findByRole('table', { name: 'Blanket sizes' });
    expect(within(table).getByRole('row', { name: /Baby/ })).toHaveTextContent(
      'Baby4 × 41628 × 36 in (71.1 × 91.4 cm)Active',
    );
    expect(within(table).getByRole('row', { name: /Old square/ })).toHaveTextContent('Inactive');
    expect(
      seenRequests(fetchMock, '/api/blanket-sizes')[0]?.url.searchParams.get('includeInactive'),
    ).toBe('true');
  });

  it('shows the panels and finished size of the grid as it is typed', async () => {
    mockSetupApi();
    const { user } = renderApp(paths.setupBlanketSizes.getHref(), { as: demoPeople.admin });

    await user.click(await screen.findByRole('button', { name: 'Add size' }));
    const dialog = await screen.findByRole('dialog', { name: 'Add a blanket size' });
    const preview = within(dialog).getByRole('status');
    expect(preview).toHaveTextContent('Enter panels across and down');

    await user.type(within(dialog).getByLabelText(/^Panels across/), '7');
    await user.type(within(dialog).getByLabelText(/^Panels down/), '7');
    // 7 × 7 panels of 7 × 9 in; 1 in = 2.54 cm exactly (NIST SP 811, Appendix B).
    expect(preview).toHaveTextContent('49 panels · finished 49 × 63 in (124.5 × 160.0 cm)');

    await user.clear(within(dialog).getByLabelText(/^Panels down/));
    await user.type(within(dialog).getByLabelText(/^Panels down/), '8');
    expect(preview).toHaveTextContent('56 panels · finished 49 × 72 in (124.5 × 182.9 cm)');
  });
});

describe('settings', () => {
  it('sends the typed settings whole with PUT and says they are saved', async () => {
    const fetchMock = mockSetupApi({
      'PUT /api/settings': (_url, request) => jsonResponse(request.body),
    });
    const { user } = renderApp(paths.setupSettings.getHref(), { as: demoPeople.admin });

    const month = await screen.findByRole('combobox', { name: /Fiscal year starts in/ });
    expect(month).toHaveValue('7');
    await user.selectOptions(month, 'April');
    const tolerance = screen.getByLabelText(/^Panel size tolerance/);
    await user.clear(tolerance);
    await user.type(tolerance, '0.25');
    expect(screen.getByText(/0\.25 in = 0\.64 cm/)).toBeInTheDocument();
    const ceiling = screen.getByLabelText(/^Receipt count ceiling/);
    await user.clear(ceiling);
    await user.type(ceiling, '5000');
    const factor = screen.getByLabelText(/^People served per blanket/);
    await user.clear(factor);
    await user.type(factor, '2.5');
    const remindBefore = screen.getByLabelText(/^Remind before the due day/);
    await user.clear(remindBefore);
    await user.type(remindBefore, '0');
    await user.click(screen.getByRole('button', { name: 'Save settings' }));
    expect(screen.getByText('Enter a whole number of days from 1 to 28.')).toBeInTheDocument();
    expect(seenRequests(fetchMock, '/api/settings').some((r) => r.method === 'PUT')).toBe(false);
    await user.clear(remindBefore);
    await user.type(remindBefore, '5');
    await user.click(screen.getByRole('button', { name: 'Save settings' }));

    expect(await screen.findByText('Settings saved.')).toBeInTheDocument();
    const put = seenRequests(fetchMock, '/api/settings').find((r) => r.method === 'PUT');
    expect(put?.body).toEqual({
      fiscalYearStartMonth: 4,
      panelToleranceIn: 0.25,
      receiptCountCeiling: 5000,
      servedPerBlanketWarnFactor: 2.5,
      reminderDaysBeforeDue: 5,
      reminderDaysAfterDue: 2,
    });
  });

  it('lists volunteer hour values as money, with the note on where they must come from', async () => {
    mockSetupApi();
    renderApp(paths.setupSettings.getHref(), { as: demoPeople.admin });

    const table = await screen.findByRole('table', { name: 'Volunteer hour values' });
    expect(within(table).getByRole('row', { name: /2022/ })).toHaveTextContent(
      '2022$31.80Independent Sector, Value of Volunteer Time (2022 data, released 2023)',
    );
    expect(screen.getByText(/These values feed the impact figures/)).toHaveTextContent(
      'must name the publication it comes from',
    );
  });
});
