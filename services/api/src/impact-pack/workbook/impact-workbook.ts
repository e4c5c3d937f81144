import { PEOPLE_GROUPS, PEOPLE_GROUP_LABELS, periodDates } from '@tallyloom/core';
import {
  BY_AGENCY_KIND_SHEET,
  BY_MONTH_SHEET,
  byScopeSheet,
  CAMPAIGNS_SHEET,
  CHARTS_SHEET,
  COVER_SHEET,
  dataDictionary,
  DICTIONARY_SHEET,
  FUNDERS_CAUTION,
  headlineRows,
  HEADLINE_SHEET,
  hoursByDataYear,
  impactPackSheets,
  METHODOLOGY_SHEET,
  methodologyRows,
  PEOPLE_BY_GROUP_SHEET,
  PERSONAL_DATA_NOTE,
  SCALAR_MEASURES,
  VOLUNTEER_VALUE_SHEET,
  volunteerValueRows,
  volunteerValueTotal,
} from '@tallyloom/reports';
import { Workbook } from 'exceljs';
import type { ImpactChart } from '../charts/impact-charts';
import type { ImpactFigureRow, ImpactPackData } from '../impact-pack-data';
import {
  currencyFormat,
  dateCell,
  NUMBER_FORMATS,
  writeTable,
  type TableCell,
} from './table-sheet';

export interface BuiltWorkbook {
  workbook: Workbook;
  /** Data rows written (header and totals rows not counted). */
  rows: number;
}

/** Called as each sheet is complete, with the share of the sheets done (0–1). */
export type SheetDone = (share: number) => Promise<void>;

const COVER_HEADER_ROW = 3;

/** Lays the gathered figures out as the impact pack workbook (nothing is read here). */
export async function buildImpactWorkbook(
  data: ImpactPackData,
  charts: readonly ImpactChart[],
  sheetDone: SheetDone = () => Promise.resolve(),
): Promise<BuiltWorkbook> {
  const sheets = impactPackSheets(data.childScope);
  const workbook = new Workbook();
  workbook.creator = 'Tallyloom';
  workbook.lastModifiedBy = 'Tallyloom';
  workbook.title = `Impact pack · ${data.scopeName} · ${data.period.label}`;
  workbook.subject = `Impact figures for ${data.scopeName}, ${data.period.label}`;
  workbook.created = data.exportedAt;
  workbook.modified = data.exportedAt;
  // Sheets are created in order first, so the workbook order is the layout's whatever fills first.
  for (const sheet of sheets) workbook.addWorksheet(sheet.name);

  const hours = volunteerValueRows(
    hoursByDataYear(
      data.byMonth.map((row) => ({ month: row.label, hours: row.figures.volunteerHours })),
    ),
    data.hourValues,
  );
  const writers: Array<() => number> = [
    () => writeCover(workbook, data),
    () => writeHeadline(workbook, data),
    () => writeFigureRows(workbook, data, 'byChild'),
    () => writeFigureRows(workbook, data, 'byMonth'),
    () => writeAgencyKinds(workbook, data),
    () => writePeopleByGroup(workbook, data),
    () => writeCampaigns(workbook, data),
    () => writeVolunteerValue(workbook, hours),
    () => writeCharts(workbook, charts),
    () =>
      writeMethodology(
        workbook,
        data,
        hours.filter((row) => !row.value).map((row) => row.dataYear),
      ),
    () => writeDictionary(workbook, sheets),
  ];
  let rows = 0;
  for (const [index, write] of writers.entries()) {
    rows += write();
    await sheetDone((index + 1) / writers.length);
  }
  return { workbook, rows };
}

function writeCover(workbook: Workbook, data: ImpactPackData): number {
  const { fromDate, toDate } = periodDates(data.period);
  const lines: Array<[string, TableCell]> = [
    ['Scope', data.scopeName],
    ['Period', `${data.period.label}: ${fromDate} to ${toDate}`],
    ['Period starts', dateCell(fromDate)],
    ['Period ends', dateCell(toDate)],
    ['As of', new Date(data.asOf)],
    ['Exported by', `${data.requester.name} (${data.requester.roleLabel})`],
    ['Exported at', data.exportedAt],
    ['Caution', FUNDERS_CAUTION],
    [
      'Pending tallies',
      `${data.pendingTallies} filed but not approved yet: not included in any figure.`,
    ],
    ['Personal data', PERSONAL_DATA_NOTE],
  ];
  const worksheet = writeTable(
    workbook,
    COVER_SHEET,
    lines.map(([item, value]) => ({ item, value })),
    { headerRow: COVER_HEADER_ROW, definedName: 'Cover' },
  );
  const title = worksheet.getCell('A1');
  title.value = 'Impact pack';
  title.font = { bold: true, size: 18 };
  const subtitle = worksheet.getCell('A2');
  subtitle.value = `${data.scopeName} · ${data.period.label}`;
  subtitle.font = { size: 12 };
  // Dates and timestamps as dates: ISO day, or day and time (UTC).
  lines.forEach(([item], index) => {
    const cell = worksheet.getRow(COVER_HEADER_ROW + 1 + index).getCell(2);
    if (item === 'Period starts' || item === 'Period ends') cell.numFmt = NUMBER_FORMATS.date;
    if (item === 'As of' || item === 'Exported at') cell.numFmt = 'yyyy-mm-dd hh:mm "UTC"';
    cell.alignment = { horizontal: 'left', wrapText: true, vertical: 'top' };
  });
  return lines.length;
}

function writeHeadline(workbook: Workbook, data: ImpactPackData): number {
  const rows = headlineRows(data.headline);
  const worksheet = writeTable(
    workbook,
    HEADLINE_SHEET,
    rows.map((row) => ({ ...row })),
    { definedName: 'HeadlineFigures' },
  );
  rows.forEach((row, index) => {
    const decimal = row.unit === 'hours' || row.unit === 'kg';
    worksheet.getRow(2 + index).getCell(2).numFmt = decimal
      ? NUMBER_FORMATS.decimal
      : NUMBER_FORMATS.count;
  });
  return rows.length;
}

/** A by-scope or by-month row: its label cell, every scalar measure, pending, trace key. */
export function figureRecord(
  labelKey: string,
  label: TableCell,
  row: ImpactFigureRow,
): Record<string, TableCell> {
  const record: Record<string, TableCell> = { [labelKey]: label };
  for (const measure of SCALAR_MEASURES) record[measure.key] = row.figures[measure.key];
  record.pendingTallies = row.pendingTallies;
  // The reference stays the cell's text; the hyperlink opens the same trace in the app.
  record.traceReference = { text: row.traceReference, hyperlink: row.traceUrl };
  return record;
}

function writeFigureRows(
  workbook: Workbook,
  data: ImpactPackData,
  which: 'byChild' | 'byMonth',
): number {
  const sheet = which === 'byChild' ? byScopeSheet(data.childScope) : BY_MONTH_SHEET;
  const labelKey = sheet.columns[0].key;
  const records = data[which].map((row) =>
    figureRecord(labelKey, which === 'byMonth' ? dateCell(`${row.label}-01`) : row.label, row),
  );
  const definedName =
    which === 'byMonth' ? 'ByMonth' : data.childScope === 'region' ? 'ByRegion' : 'ByChapter';
  writeTable(workbook, sheet, records, { totals: true, definedName });
  return records.length;
}

function writeAgencyKinds(workbook: Workbook, data: ImpactPackData): number {
  writeTable(
    workbook,
    BY_AGENCY_KIND_SHEET,
    data.byAgencyKind.map((row) => ({
      kind: row.label,
      blanketsGiven: row.blanketsGiven,
      peopleServed: row.peopleServed,
    })),
    { totals: true, definedName: 'ByAgencyKind' },
  );
  return data.byAgencyKind.length;
}

function writePeopleByGroup(workbook: Workbook, data: ImpactPackData): number {
  const total = PEOPLE_GROUPS.reduce(
    (sum, group) => sum + data.headline.peopleServedByGroup[group],
    0,
  );
  const totalRow = 2 + PEOPLE_GROUPS.length;
  writeTable(
    workbook,
    PEOPLE_BY_GROUP_SHEET,
    PEOPLE_GROUPS.map((group, index) => {
      const count = data.headline.peopleServedByGroup[group];
      return {
        group: PEOPLE_GROUP_LABELS[group],
        peopleServed: count,
        // The share divides by the totals row below, guarded for a period with nobody served.
        share: {
          formula: `IF($B$${totalRow}=0,0,B${2 + index}/$B$${totalRow})`,
          result: total === 0 ? 0 : count / total,
        },
      };
    }),
    { totals: true, definedName: 'PeopleByGroup' },
  );
  return PEOPLE_GROUPS.length;
}

function writeCampaigns(workbook: Workbook, data: ImpactPackData): number {
  const worksheet = writeTable(
    workbook,
    CAMPAIGNS_SHEET,
    data.campaigns.map((campaign) => ({
      code: campaign.code,
      name: campaign.name,
      startsOn: dateCell(campaign.startsOn),
      endsOn: dateCell(campaign.endsOn),
      goalPanels: campaign.goalPanels,
      creditedPanels: campaign.creditedPanels,
      pendingPanels: campaign.pendingPanels,
      shareDone: campaign.shareDone,
      pacePerWeek: campaign.pacePerWeek,
      neededPerWeek: campaign.neededPerWeek,
      projectedAtEnd: Math.round(campaign.projection.panelsAtEnd),
    })),
    { definedName: 'Campaigns' },
  );
  if (data.campaigns.length === 0) {
    worksheet.getCell('A2').value = 'No campaign overlaps this period.';
  }
  return data.campaigns.length;
}

function writeVolunteerValue(
  workbook: Workbook,
  rows: ReturnType<typeof volunteerValueRows>,
): number {
  const total = volunteerValueTotal(rows);
  const worksheet = writeTable(
    workbook,
    VOLUNTEER_VALUE_SHEET,
    rows.map((row, index) => ({
      dataYear: String(row.dataYear),
      hours: row.hours,
      hourlyValue: row.value?.hourlyValue ?? null,
      currency: row.value?.currency ?? null,
      estimatedValue:
        row.value && row.estimatedValue !== null
          ? { formula: `B${2 + index}*C${2 + index}`, result: row.estimatedValue }
          : `no value set for ${row.dataYear}`,
      source: row.note,
    })),
    {
      totals: true,
      definedName: 'VolunteerValue',
      currencyFormat: currencyFormat(total?.currency ?? 'USD'),
    },
  );
  // Each year's money in its own currency.
  rows.forEach((row, index) => {
    if (!row.value) return;
    const format = currencyFormat(row.value.currency);
    worksheet.getRow(2 + index).getCell(3).numFmt = format;
    worksheet.getRow(2 + index).getCell(5).numFmt = format;
  });
  const totalRow = worksheet.getRow(2 + rows.length);
  if (!total) {
    // No year valued, or several currencies: a single sum would mean nothing.
    totalRow.getCell(5).value = rows.some((row) => row.value)
      ? 'not summed: the years use different currencies'
      : 'no value set for any year';
  }
  totalRow.getCell(6).value = 'Years with no value set are left out of the total.';
  return rows.length;
}

function writeCharts(workbook: Workbook, charts: readonly ImpactChart[]): number {
  const worksheet = writeTable(workbook, CHARTS_SHEET, [], { definedName: 'Charts' });
  // Each chart: its title on a row, the image below it, 24 rows apart (about 20 px a row).
  charts.forEach((chart, index) => {
    const titleRow = 2 + index * 24;
    worksheet.getCell(`A${titleRow}`).value = chart.title;
    worksheet.getCell(`A${titleRow}`).font = { bold: true };
    const imageId = workbook.addImage({ buffer: chart.png as never, extension: 'png' });
    worksheet.addImage(imageId, {
      tl: { col: 0, row: titleRow },
      ext: { width: chart.width, height: chart.height },
    });
  });
  return 0;
}

function writeMethodology(
  workbook: Workbook,
  data: ImpactPackData,
  yearsWithoutHourValue: number[],
): number {
  const rows = methodologyRows({
    period: data.period,
    fiscalYearStartMonth: data.fiscalYearStartMonth,
    asOf: data.asOf,
    pendingTallies: data.pendingTallies,
    compliance: data.compliance,
    chaptersWithoutApprovedTally: data.chaptersWithoutApprovedTally,
    yearsWithoutHourValue,
  });
  writeTable(
    workbook,
    METHODOLOGY_SHEET,
    rows.map((row) => ({ ...row })),
    {
      definedName: 'Methodology',
    },
  );
  return rows.length;
}

function writeDictionary(workbook: Workbook, sheets: ReturnType<typeof impactPackSheets>): number {
  const rows = dataDictionary(sheets);
  writeTable(
    workbook,
    DICTIONARY_SHEET,
    rows.map((row) => ({ ...row })),
    {
      definedName: 'DataDictionary',
    },
  );
  return rows.length;
}
