import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
// From core's source, not its build: the seed runs before `npm test` builds core.
import { closestGrid } from '../../packages/core/src/panels/blanket-size';
import {
  BLANKET_SIZE_CHART_TARGETS,
  SIZE_CHART_SOURCE,
} from '../../packages/core/src/panels/size-chart';
import type { AgencyKind } from '../../packages/core/src/contract/network-setup';

/** Invented partner agencies (BRIEF §7), each served by one to three demo chapters. */
const DEMO_AGENCIES: Array<{
  name: string;
  kind: AgencyKind;
  chapters: string[];
  active?: boolean;
}> = [
  {
    name: 'Maple Street Family Shelter',
    kind: 'family_shelter',
    chapters: ['Alder Falls', 'Elkhorn'],
  },
  { name: 'Hearthside Family Refuge', kind: 'family_shelter', chapters: ['Cedar Hollow'] },
  {
    name: 'Lanternlight Family House',
    kind: 'family_shelter',
    chapters: ['Juniper Flats', 'Larkspur'],
  },
  { name: 'Riverside Care Home', kind: 'care_home', chapters: ['Dunmore', 'Fernwick'] },
  { name: 'Glenmoor Lodge Care Home', kind: 'care_home', chapters: ['Glenmoor'] },
  {
    name: 'Coastal County Neonatal Unit',
    kind: 'neonatal_or_childrens_ward',
    chapters: ['Brindle Bay', 'Harrowgate', 'Saltmarsh End'],
  },
  {
    name: "North Ridge Children's Ward",
    kind: 'neonatal_or_childrens_ward',
    chapters: ['Alder Falls', 'Kestrel Point'],
  },
  {
    name: 'Alder Falls Street Outreach',
    kind: 'outreach',
    chapters: ['Alder Falls', 'Glenmoor', 'Kestrel Point'],
  },
  {
    name: 'Millbrook Night Outreach Team',
    kind: 'outreach',
    chapters: ['Millbrook Crossing', 'Ivybridge'],
  },
  {
    name: 'Mesa Flood and Fire Relief',
    kind: 'disaster_relief',
    chapters: ['Juniper Flats', 'Sagebrush Gap'],
  },
  { name: 'Saltmarsh Storm Relief Drive', kind: 'disaster_relief', chapters: ['Brindle Bay'] },
  {
    name: 'Brindle Bay Community Pantry',
    kind: 'other',
    chapters: ['Brindle Bay'],
    active: false,
  },
];

/** The demo drives; codes as written on parcel labels. */
const DEMO_CAMPAIGNS: Array<{
  code: string;
  name: string;
  goalPanels: number;
  startsOn: string;
  endsOn: string;
  regionCode: string | null;
}> = [
  {
    code: 'DWD26',
    name: 'Deep Winter Drive',
    goalPanels: 4000,
    startsOn: '2025-11-01',
    endsOn: '2026-02-28',
    regionCode: null,
  },
  {
    // Running on the demo's today (Dec 2026): October is approved, November still pending.
    code: 'DWD27',
    name: 'Deep Winter Drive 2026–27',
    goalPanels: 5000,
    startsOn: '2026-10-15',
    endsOn: '2027-02-28',
    regionCode: null,
  },
  {
    code: 'DWD25',
    name: 'Deep Winter Drive 2024–25',
    goalPanels: 3500,
    startsOn: '2024-11-01',
    endsOn: '2025-02-28',
    regionCode: null,
  },
  {
    code: 'RL-SPRING25',
    name: 'Riverlands Spring Stitch-In',
    goalPanels: 1200,
    startsOn: '2025-03-01',
    endsOn: '2025-05-31',
    regionCode: 'RL',
  },
  {
    code: 'CP-STORM25',
    name: 'Coastal Storm Season Blankets',
    goalPanels: 800,
    startsOn: '2025-08-01',
    endsOn: '2025-10-31',
    regionCode: 'CP',
  },
];

/** Stored with the defaults the API falls back to, so the settings page shows real rows. */
const DEMO_SETTINGS: Record<string, number> = {
  fiscalYearStartMonth: 7,
  panelToleranceIn: 0.5,
  receiptCountCeiling: 10000,
  servedPerBlanketWarnFactor: 3,
  reminderDaysBeforeDue: 3,
  reminderDaysAfterDue: 2,
};

const VOLUNTEER_HOUR_VALUES = [
  {
    data_year: 2022,
    hourly_value: '31.80',
    currency: 'USD',
    source: 'Independent Sector, Value of Volunteer Time (2022 data, released 2023)',
  },
  {
    data_year: 2023,
    // from memory: recalled, not checked against the publication
    hourly_value: '33.49',
    currency: 'USD',
    source: 'Independent Sector, Value of Volunteer Time (2023 data, released 2024; from memory)',
  },
];

async function idsByName(
  sequelize: Sequelize,
  transaction: Transaction,
  table: 'chapters' | 'partner_agencies',
): Promise<Map<string, number>> {
  const rows = await sequelize.query<{ id: number; name: string }>(
    `SELECT id, name FROM ${table}`,
    { type: QueryTypes.SELECT, transaction },
  );
  return new Map(rows.map((row) => [row.name, row.id]));
}

function idOf(ids: Map<string, number>, name: string): number {
  const id = ids.get(name);
  if (id === undefined) throw new Error(`demo seed: nothing found for ${name}`);
  return id;
}

/** Partner agencies, the demo campaigns, the blanket size catalogue and settings. */
export async function seedNetworkSetup(
  sequelize: Sequelize,
  transaction: Transaction,
): Promise<void> {
  const qi = sequelize.getQueryInterface();

  // Each catalogue grid is the one nearest the chart's target size.
  await qi.bulkInsert(
    'blanket_sizes',
    BLANKET_SIZE_CHART_TARGETS.map((target, index) => {
      const grid = closestGrid(target.widthIn, target.heightIn);
      return {
        name: target.name,
        grid_columns: grid.columns,
        grid_rows: grid.rows,
        sort_order: index + 1,
        active: true,
        source_note: `Target ${target.widthIn} × ${target.heightIn} in (${target.chartSize}) from ${SIZE_CHART_SOURCE}; nearest grid of 7 × 9 in panels`,
      };
    }),
    { transaction },
  );

  await qi.bulkInsert(
    'partner_agencies',
    DEMO_AGENCIES.map((agency) => ({
      name: agency.name,
      kind: agency.kind,
      active: agency.active ?? true,
    })),
    { transaction },
  );
  const chapters = await idsByName(sequelize, transaction, 'chapters');
  const agencies = await idsByName(sequelize, transaction, 'partner_agencies');
  await qi.bulkInsert(
    'agency_chapters',
    DEMO_AGENCIES.flatMap((agency) =>
      agency.chapters.map((chapter) => ({
        agency_id: idOf(agencies, agency.name),
        chapter_id: idOf(chapters, chapter),
      })),
    ),
    { transaction },
  );

  const regions = new Map(
    (
      await sequelize.query<{ id: number; code: string }>('SELECT id, code FROM regions', {
        type: QueryTypes.SELECT,
        transaction,
      })
    ).map((row) => [row.code, row.id]),
  );
  await qi.bulkInsert(
    'campaigns',
    DEMO_CAMPAIGNS.map((campaign) => ({
      code: campaign.code,
      name: campaign.name,
      goal_panels: campaign.goalPanels,
      starts_on: campaign.startsOn,
      ends_on: campaign.endsOn,
      region_id: campaign.regionCode ? idOf(regions, campaign.regionCode) : null,
    })),
    { transaction },
  );

  for (const [key, value] of Object.entries(DEMO_SETTINGS)) {
    await sequelize.query('INSERT INTO settings (`key`, value) VALUES (?, ?)', {
      replacements: [key, JSON.stringify(value)],
      transaction,
    });
  }

  await qi.bulkInsert('volunteer_hour_values', VOLUNTEER_HOUR_VALUES, { transaction });
}
