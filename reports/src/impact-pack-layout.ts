/**
 * The impact pack workbook, defined once: its sheets and every column with the words of the data
 * dictionary (meaning, unit, source). The workbook writer lays sheets out from these, and the
 * data dictionary sheet is generated from them, so no column can go undocumented.
 */
import { PEOPLE_GROUPS, PEOPLE_GROUP_LABELS, type SnapshotFigures } from '@tallyloom/core';
import { TALLY_MEASURES, type SnapshotMeasure } from './tally-snapshot';

/** How a cell shows its value. `currency` takes the currency of the hourly value setting. */
export type CellFormat = 'count' | 'decimal' | 'currency' | 'percent' | 'date' | 'month' | 'text';

export interface ImpactColumn {
  key: string;
  header: string;
  meaning: string;
  unit: string;
  /** Table and field (or the computation) the column comes from. */
  source: string;
  format: CellFormat;
  width: number;
  /** The totals row sums it (a SUM formula); stocks and text are not summed. */
  total?: boolean;
}

export interface ImpactSheet {
  name: string;
  columns: ImpactColumn[];
}

/** The measures with one figure each (people by group are spelled out as their own rows). */
export type ScalarMeasureKey = Exclude<keyof SnapshotFigures, 'peopleServedByGroup'>;

export const MEASURE_UNITS: Record<keyof SnapshotFigures, string> = {
  panelsAccepted: 'panels',
  panelsSetAside: 'panels',
  panelsUsed: 'panels',
  blanketsAssembled: 'blankets',
  blanketsReceived: 'blankets',
  blanketsGiven: 'blankets',
  peopleServed: 'people',
  peopleServedByGroup: 'people',
  volunteerHours: 'hours',
  yarnKg: 'kg',
  panelsInStock: 'panels',
  blanketsInStock: 'blankets',
  approvedTallies: 'tallies',
};

export const SCALAR_MEASURES = TALLY_MEASURES.filter(
  (measure): measure is SnapshotMeasure & { key: ScalarMeasureKey } =>
    measure.key !== 'peopleServedByGroup',
);

const snapshotSource = (measure: SnapshotMeasure): string =>
  `report_snapshots.figures.${measure.key} (from ${measure.reads.join(', ')}; approved revisions only)`;

/** One column per scalar measure, for the by-scope and by-month tables. */
function measureColumns(): ImpactColumn[] {
  return SCALAR_MEASURES.map((measure) => ({
    key: measure.key,
    header: measure.label,
    meaning: measure.description,
    unit: MEASURE_UNITS[measure.key],
    source: snapshotSource(measure),
    format: measure.key === 'volunteerHours' || measure.key === 'yarnKg' ? 'decimal' : 'count',
    width: 14,
    total: measure.aggregation !== 'closing',
  }));
}

const pendingColumn: ImpactColumn = {
  key: 'pendingTallies',
  header: 'Pending tallies',
  meaning:
    'Tallies filed but not approved yet in this row: shown beside the figures, not counted in them.',
  unit: 'tallies',
  source: 'report_snapshots.pending_tallies',
  format: 'count',
  width: 12,
  total: true,
};

const traceColumn: ImpactColumn = {
  key: 'traceReference',
  header: 'Trace reference',
  meaning:
    "A stable key of the row's scope and period (e.g. region:3:FY2026) that leads to the tallies, revisions and receipts behind it.",
  unit: 'text',
  source: 'scope and period of the report snapshot',
  format: 'text',
  width: 24,
};

export const SHEET_NAMES = {
  cover: 'Cover',
  headline: 'Headline figures',
  byRegion: 'By region',
  byChapter: 'By chapter',
  byMonth: 'By month',
  byAgencyKind: 'By agency kind',
  peopleByGroup: 'People by group',
  campaigns: 'Campaigns',
  volunteerValue: 'Volunteer value',
  charts: 'Charts',
  methodology: 'Methodology',
  dictionary: 'Data dictionary',
} as const;

export const COVER_SHEET: ImpactSheet = {
  name: SHEET_NAMES.cover,
  columns: [
    {
      key: 'item',
      header: 'Item',
      meaning: 'What the line states: scope, period, as of, who exported, cautions.',
      unit: 'text',
      source: 'the export request and the signed-in person',
      format: 'text',
      width: 24,
    },
    {
      key: 'value',
      header: 'Value',
      meaning: 'The value of the line.',
      unit: 'text or date',
      source: 'the export request, users.display_name and users.role, report_snapshots.as_of',
      format: 'text',
      width: 90,
    },
  ],
};

export const HEADLINE_SHEET: ImpactSheet = {
  name: SHEET_NAMES.headline,
  columns: [
    {
      key: 'measure',
      header: 'Measure',
      meaning: 'The name of the figure (people served by group spelled out one group a line).',
      unit: 'text',
      source: 'reports/src/tally-snapshot.ts measure labels',
      format: 'text',
      width: 34,
    },
    {
      key: 'figure',
      header: 'Figure',
      meaning: 'The figure for the scope and period, from approved tallies only.',
      unit: 'see Unit',
      source: 'report_snapshots.figures of the scope and period',
      format: 'decimal',
      width: 14,
    },
    {
      key: 'unit',
      header: 'Unit',
      meaning: 'What the figure counts.',
      unit: 'text',
      source: 'the measure definition',
      format: 'text',
      width: 12,
    },
    {
      key: 'meaning',
      header: 'Meaning',
      meaning: 'What the figure means, in plain words.',
      unit: 'text',
      source: 'reports/src/tally-snapshot.ts measure descriptions',
      format: 'text',
      width: 90,
    },
  ],
};

/** By region (network pack) or by chapter (region pack): one row per child scope. */
export function byScopeSheet(child: 'region' | 'chapter'): ImpactSheet {
  const name = child === 'region' ? SHEET_NAMES.byRegion : SHEET_NAMES.byChapter;
  return {
    name,
    columns: [
      {
        key: 'name',
        header: child === 'region' ? 'Region' : 'Chapter',
        meaning: `The ${child} the row's figures belong to; the last row is the total.`,
        unit: 'text',
        source: child === 'region' ? 'regions.name' : 'chapters.name',
        format: 'text',
        width: 22,
      },
      ...measureColumns(),
      pendingColumn,
      traceColumn,
    ],
  };
}

export const BY_MONTH_SHEET: ImpactSheet = {
  name: SHEET_NAMES.byMonth,
  columns: [
    {
      key: 'month',
      header: 'Month',
      meaning: 'The calendar month of the row (stocks are at its end); the last row is the total.',
      unit: 'date (first day of the month)',
      source: 'report_snapshots.period_key of the month',
      format: 'month',
      width: 12,
    },
    ...measureColumns(),
    pendingColumn,
    traceColumn,
  ],
};

export const BY_AGENCY_KIND_SHEET: ImpactSheet = {
  name: SHEET_NAMES.byAgencyKind,
  columns: [
    {
      key: 'kind',
      header: 'Agency kind',
      meaning: 'The kind of partner agency that received the blankets.',
      unit: 'text',
      source: 'partner_agencies.kind',
      format: 'text',
      width: 30,
    },
    {
      key: 'blanketsGiven',
      header: 'Blankets given',
      meaning: 'Blankets handed to agencies of this kind during the period.',
      unit: 'blankets',
      source: 'tally_blankets_given.count by partner_agency_id (approved revisions only)',
      format: 'count',
      width: 16,
      total: true,
    },
    {
      key: 'peopleServed',
      header: 'People served',
      meaning:
        'People that agencies of this kind served with the blankets, as the chapters reported them.',
      unit: 'people',
      source: 'tally_people_served.count by partner_agency_id (approved revisions only)',
      format: 'count',
      width: 16,
      total: true,
    },
  ],
};

export const PEOPLE_BY_GROUP_SHEET: ImpactSheet = {
  name: SHEET_NAMES.peopleByGroup,
  columns: [
    {
      key: 'group',
      header: 'Group',
      meaning: `The group of people served: ${PEOPLE_GROUPS.map((g) => PEOPLE_GROUP_LABELS[g]).join(', ')}.`,
      unit: 'text',
      source: 'tally_people_served.people_group',
      format: 'text',
      width: 22,
    },
    {
      key: 'peopleServed',
      header: 'People served',
      meaning: 'People served in the group during the period.',
      unit: 'people',
      source: 'report_snapshots.figures.peopleServedByGroup',
      format: 'count',
      width: 16,
      total: true,
    },
    {
      key: 'share',
      header: 'Share of people served',
      meaning: "The group's share of all people served (a formula over the column).",
      unit: 'percent',
      source: 'computed: people served in the group ÷ the total',
      format: 'percent',
      width: 16,
      total: true,
    },
  ],
};

export const CAMPAIGNS_SHEET: ImpactSheet = {
  name: SHEET_NAMES.campaigns,
  columns: [
    {
      key: 'code',
      header: 'Code',
      meaning: 'The campaign code written on parcel labels.',
      unit: 'text',
      source: 'campaigns.code',
      format: 'text',
      width: 14,
    },
    {
      key: 'name',
      header: 'Campaign',
      meaning: 'The name of the drive.',
      unit: 'text',
      source: 'campaigns.name',
      format: 'text',
      width: 32,
    },
    {
      key: 'startsOn',
      header: 'Starts',
      meaning: 'First day of the drive.',
      unit: 'date',
      source: 'campaigns.starts_on',
      format: 'date',
      width: 12,
    },
    {
      key: 'endsOn',
      header: 'Ends',
      meaning: 'Last day of the drive.',
      unit: 'date',
      source: 'campaigns.ends_on',
      format: 'date',
      width: 12,
    },
    {
      key: 'goalPanels',
      header: 'Goal',
      meaning: 'Panels the drive asks for.',
      unit: 'panels',
      source: 'campaigns.goal_panels',
      format: 'count',
      width: 12,
    },
    {
      key: 'creditedPanels',
      header: 'Credited',
      meaning:
        'Panels credited to the drive over its whole run so far, from parcels naming it in chapter-months whose tally is approved.',
      unit: 'panels',
      source:
        'campaign_snapshots.figures.creditedPanels (parcel_receipts.panels_accepted by campaign_id)',
      format: 'count',
      width: 12,
    },
    {
      key: 'pendingPanels',
      header: 'Pending',
      meaning:
        'Panels from parcels naming the drive in months not approved yet: shown beside, not counted.',
      unit: 'panels',
      source: 'campaign_snapshots.figures.pendingPanels',
      format: 'count',
      width: 12,
    },
    {
      key: 'shareDone',
      header: 'Share done',
      meaning: 'Credited panels ÷ goal (may pass 100%).',
      unit: 'percent',
      source: 'computed from Credited and Goal',
      format: 'percent',
      width: 12,
    },
    {
      key: 'pacePerWeek',
      header: 'Pace per week',
      meaning: 'Credited panels per week since the start.',
      unit: 'panels per week',
      source: 'computed from campaign_snapshots.figures.weekly',
      format: 'decimal',
      width: 14,
    },
    {
      key: 'neededPerWeek',
      header: 'Needed per week',
      meaning:
        'Panels per week still needed to meet the goal by the end date; empty once the end has passed.',
      unit: 'panels per week',
      source: 'computed from goal, credited panels and weeks left',
      format: 'decimal',
      width: 14,
    },
    {
      key: 'projectedAtEnd',
      header: 'Projected at end',
      meaning: 'Credited panels projected at the end date (least-squares line over recent weeks).',
      unit: 'panels',
      source: 'computed from campaign_snapshots.figures.weekly',
      format: 'count',
      width: 14,
    },
  ],
};

export const VOLUNTEER_VALUE_SHEET: ImpactSheet = {
  name: SHEET_NAMES.volunteerValue,
  columns: [
    {
      key: 'dataYear',
      header: 'Data year',
      meaning: 'The calendar year of the tally months whose hours the row adds up.',
      unit: 'year',
      source: 'monthly_tallies.month (calendar year)',
      format: 'text',
      width: 10,
    },
    {
      key: 'hours',
      header: 'Volunteer hours',
      meaning: 'Volunteer hours of the months of the period that fall in the data year.',
      unit: 'hours',
      source: 'report_snapshots.figures.volunteerHours of each month',
      format: 'decimal',
      width: 16,
      total: true,
    },
    {
      key: 'hourlyValue',
      header: 'Value of an hour',
      meaning: 'The estimated value of one volunteer hour for the data year, as published.',
      unit: 'currency per hour',
      source: 'volunteer_hour_values.hourly_value by data_year',
      format: 'currency',
      width: 16,
    },
    {
      key: 'currency',
      header: 'Currency',
      meaning: 'The currency of the value (ISO 4217 code).',
      unit: 'text',
      source: 'volunteer_hour_values.currency',
      format: 'text',
      width: 10,
    },
    {
      key: 'estimatedValue',
      header: 'Estimated value',
      meaning:
        "Hours × the year's value (a formula); a year with no value set says so and is left out of the total.",
      unit: 'currency',
      source: 'computed: Volunteer hours × Value of an hour',
      format: 'currency',
      width: 18,
      total: true,
    },
    {
      key: 'source',
      header: 'Published source',
      meaning: 'Where the value of an hour comes from, with the value, or that no value is set.',
      unit: 'text',
      source: 'volunteer_hour_values.source',
      format: 'text',
      width: 70,
    },
  ],
};

export const CHARTS_SHEET: ImpactSheet = {
  name: SHEET_NAMES.charts,
  columns: [
    {
      key: 'chart',
      header: 'Chart',
      meaning:
        'The title of the chart image below it; the images draw figures of the other sheets.',
      unit: 'text',
      source: 'By month, By region or By chapter, and People by group',
      format: 'text',
      width: 110,
    },
  ],
};

export const METHODOLOGY_SHEET: ImpactSheet = {
  name: SHEET_NAMES.methodology,
  columns: [
    {
      key: 'topic',
      header: 'Topic',
      meaning: 'What the paragraph explains.',
      unit: 'text',
      source: 'reports/src/impact-methodology.ts',
      format: 'text',
      width: 28,
    },
    {
      key: 'text',
      header: 'How it is done',
      meaning: 'How the figures were made, what counts, and known gaps of this pack.',
      unit: 'text',
      source: 'reports/src/impact-methodology.ts with the counts of this pack',
      format: 'text',
      width: 110,
    },
  ],
};

export const DICTIONARY_SHEET: ImpactSheet = {
  name: SHEET_NAMES.dictionary,
  columns: [
    {
      key: 'sheet',
      header: 'Sheet',
      meaning: 'The sheet of the column described.',
      unit: 'text',
      source: 'reports/src/impact-pack-layout.ts',
      format: 'text',
      width: 20,
    },
    {
      key: 'column',
      header: 'Column',
      meaning: 'The header of the column described.',
      unit: 'text',
      source: 'reports/src/impact-pack-layout.ts',
      format: 'text',
      width: 26,
    },
    {
      key: 'meaning',
      header: 'Meaning',
      meaning: 'What the column holds.',
      unit: 'text',
      source: 'reports/src/impact-pack-layout.ts and tally-snapshot.ts descriptions',
      format: 'text',
      width: 80,
    },
    {
      key: 'unit',
      header: 'Unit',
      meaning: 'What the column counts or measures.',
      unit: 'text',
      source: 'reports/src/impact-pack-layout.ts',
      format: 'text',
      width: 16,
    },
    {
      key: 'source',
      header: 'Source',
      meaning: 'The table and field, or the computation, the column comes from.',
      unit: 'text',
      source: 'reports/src/impact-pack-layout.ts',
      format: 'text',
      width: 70,
    },
  ],
};

/** Every sheet of a pack, in workbook order; the by-scope sheet follows the scope's children. */
export function impactPackSheets(child: 'region' | 'chapter'): ImpactSheet[] {
  return [
    COVER_SHEET,
    HEADLINE_SHEET,
    byScopeSheet(child),
    BY_MONTH_SHEET,
    BY_AGENCY_KIND_SHEET,
    PEOPLE_BY_GROUP_SHEET,
    CAMPAIGNS_SHEET,
    VOLUNTEER_VALUE_SHEET,
    CHARTS_SHEET,
    METHODOLOGY_SHEET,
    DICTIONARY_SHEET,
  ];
}

export interface DictionaryRow {
  sheet: string;
  column: string;
  meaning: string;
  unit: string;
  source: string;
}

/** The data dictionary: one row per column of every sheet given. */
export function dataDictionary(sheets: readonly ImpactSheet[]): DictionaryRow[] {
  return sheets.flatMap((sheet) =>
    sheet.columns.map((column) => ({
      sheet: sheet.name,
      column: column.header,
      meaning: column.meaning,
      unit: column.unit,
      source: column.source,
    })),
  );
}

/** The headline rows: each scalar measure, with people served by group spelled out after it. */
export function headlineRows(
  figures: SnapshotFigures,
): Array<{ measure: string; figure: number; unit: string; meaning: string }> {
  return TALLY_MEASURES.flatMap((measure) => {
    if (measure.key === 'peopleServedByGroup') {
      return PEOPLE_GROUPS.map((group) => ({
        measure: `${measure.label}: ${PEOPLE_GROUP_LABELS[group]}`,
        figure: figures.peopleServedByGroup[group],
        unit: MEASURE_UNITS.peopleServedByGroup,
        meaning: measure.description,
      }));
    }
    return [
      {
        measure: measure.label,
        figure: figures[measure.key],
        unit: MEASURE_UNITS[measure.key],
        meaning: measure.description,
      },
    ];
  });
}
